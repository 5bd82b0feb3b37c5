package org.variset.reports.audit;

import java.util.List;
import java.util.Map;
import org.variset.archive.read.RouteRecord;
import org.variset.reports.figures.SetFigures;
import org.variset.reports.scoring.repetition.RepetitionFigures;
import org.variset.reports.scoring.score.CompositeScore;

/**
 * One set of routes with its figures: the audited set, or a set shown beside it.
 *
 * @param name what the set is ({@code previous reset Cave 2026-02-02})
 * @param routes its routes
 * @param figures its per-set figures
 * @param repetition near-repeats and novelty, or null for a set shown only for context
 * @param windowRoutes how many routes of the look-back window it was compared with
 * @param holdReuseRate share of placements reusing a (hold_ref, sector) of the wall's last three resets, or null
 * @param score the composite score
 * @param undefined for each null figure of this level (novelty, hold reuse, score), its key and why
 */
public record SetResult(
        String name,
        List<RouteRecord> routes,
        SetFigures figures,
        RepetitionFigures repetition,
        int windowRoutes,
        Double holdReuseRate,
        CompositeScore score,
        Map<String, String> undefined) {}
