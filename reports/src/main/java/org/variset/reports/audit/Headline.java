package org.variset.reports.audit;

import java.util.LinkedHashMap;
import java.util.Map;
import org.variset.reports.figures.SetFigures;
import org.variset.reports.scoring.grades.GradeFigures;

/**
 * The figures an audit sets side by side (this set, the previous reset, the reference set), keyed by their JSON
 * path, with a label for people. {@code grip.up_share} is added to the spec's keys: the share of hand grips facing
 * up (sector 0).
 */
public final class Headline {
    /** Key and label of each headline figure, in display order. */
    public static final Map<String, String> LABELS = new LinkedHashMap<>();

    static {
        LABELS.put("score.score", "score (0-100, heuristic)");
        LABELS.put("grip.sector_entropy", "grip direction spread (sector entropy)");
        LABELS.put("grip.up_share", "share of hand grips facing up");
        LABELS.put("grip.resultant_length", "grip resultant length");
        LABELS.put("holds.hill_n1", "hold types, effective number");
        LABELS.put("holds.coverage", "hold-type coverage");
        LABELS.put("moves.coverage", "move coverage");
        LABELS.put("styles.hill_n1", "styles, effective number");
        LABELS.put("grades.emd_to_target", "grades, bands from target");
        LABELS.put("repetition.novelty", "novelty");
        LABELS.put("repetition.hold_reuse_rate", "hold reuse rate");
        LABELS.put("profiles.split_entropy", "difficulty-profile spread");
        LABELS.put("line.gie_mean", "route line wander (mean GIE)");
    }

    private Headline() {}

    /** The headline figures of a set (null where undefined), in {@link #LABELS} order. */
    public static Map<String, Double> of(SetResult s) {
        SetFigures f = s.figures();
        Map<String, Double> m = new LinkedHashMap<>();
        m.put("score.score", s.score().score());
        m.put("grip.sector_entropy", f.grip().sectorEntropy());
        m.put("grip.up_share", f.sectorShare(0));
        m.put("grip.resultant_length", f.grip().resultantLength());
        m.put("holds.hill_n1", f.holds().hillN1());
        m.put("holds.coverage", f.holds().coverage());
        m.put("moves.coverage", f.moves().coverage());
        m.put("styles.hill_n1", f.styles().hillN1());
        GradeFigures g = Findings.mainGrades(f);
        m.put("grades.emd_to_target", g == null ? null : g.emdToTarget());
        m.put(
                "repetition.novelty",
                s.repetition() == null ? null : s.repetition().novelty());
        m.put("repetition.hold_reuse_rate", s.holdReuseRate());
        m.put("profiles.split_entropy", f.profiles().splitEntropy());
        m.put("line.gie_mean", f.line().gieMean());
        return m;
    }

    /** A figure for people: shares as percentages, the rest through {@link org.variset.reports.format.FigureFormat}. */
    public static String text(String key, Double value) {
        if (key.endsWith("_share") || key.endsWith("_rate")) {
            return org.variset.reports.format.FigureFormat.percent(value);
        }
        return org.variset.reports.format.FigureFormat.of(key, value);
    }
}
