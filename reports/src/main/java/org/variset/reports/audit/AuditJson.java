package org.variset.reports.audit;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.variset.archive.grade.Discipline;
import org.variset.archive.problem.Remedy;
import org.variset.archive.read.RouteRecord;
import org.variset.reports.catalogue.Figure;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.figures.FiguresJson;
import org.variset.reports.scoring.repetition.RepeatEvidence;
import org.variset.reports.scoring.repetition.RepetitionFigures;

/**
 * An audit as one JSON document: every key of docs/spec/metrics.md for the audited set, the same blocks for the previous reset
 * and the reference set, the side-by-side headline figures with their changes, and the findings. Values are
 * unrounded; a figure that is undefined is null and its reason is under {@code undefined}.
 */
public final class AuditJson {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private AuditJson() {}

    /** The audit as a JSON tree. */
    public static ObjectNode of(Audit a) {
        ObjectNode o = MAPPER.createObjectNode();
        Subject s = a.subject();
        ObjectNode subject = o.putObject("subject");
        subject.put("kind", s.kind().key())
                .put("title", s.title())
                .put("gym", s.gym())
                .put("wall", s.wall())
                .put("reset", s.reset())
                .put("on", s.on().toString())
                .put("from", s.from() == null ? null : s.from().toString())
                .put("setter", s.setter());
        settings(o.putObject("settings_used"), a);
        set(o, a.audited());
        context(o.putObject("context"), a);
        ArrayNode findings = o.putArray("findings");
        for (Finding f : a.findings()) {
            ObjectNode x = findings.addObject().put("kind", f.kind()).put("text", f.text());
            if (f.remedy().kind() != Remedy.Kind.NONE) {
                ObjectNode r = x.putObject("remedy")
                        .put("kind", f.remedy().kind().name().toLowerCase(Locale.ROOT));
                f.remedy().facts().forEach(r::put);
            }
        }
        if (a.previous() != null) {
            set(o.putObject("previous"), a.previous());
        }
        if (a.reference() != null) {
            set(o.putObject("reference"), a.reference());
        }
        return o;
    }

    private static void set(ObjectNode o, SetResult s) {
        o.put("name", s.name());
        o.put("routes", s.routes().size());
        ArrayNode names = o.putArray("route_names");
        s.routes().stream().map(RouteRecord::name).forEach(names::add);
        ObjectNode undefined = MAPPER.createObjectNode();
        ObjectNode score = o.putObject("score");
        score.put("score", s.score().score());
        FiguresJson.map(score.putObject("parts"), s.score().parts());
        FiguresJson.map(score.putObject("weights_used"), s.score().weightsUsed());
        ArrayNode dropped = score.putArray("dropped");
        s.score().dropped().forEach(dropped::add);
        FiguresJson.write(o, s.figures(), undefined);
        repetition(o.putObject("repetition"), s, undefined);
        s.undefined().forEach((k, why) -> undefined.put(k.equals("score") ? "score.score" : "repetition." + k, why));
        o.set("undefined", undefined);
    }

    private static void repetition(ObjectNode o, SetResult s, ObjectNode undefined) {
        RepetitionFigures r = s.repetition();
        o.put("novelty", r == null ? null : r.novelty());
        o.put("hold_reuse_rate", s.holdReuseRate());
        o.put("window_routes", s.windowRoutes());
        pairs(o.putArray("near_repeats"), r == null ? List.of() : r.nearRepeats());
        pairs(o.putArray("internal_repeats"), r == null ? List.of() : r.internalRepeats());
        pairs(o.putArray("similar_not_repeats"), r == null ? List.of() : r.setAside());
        ArrayNode thin = o.putArray("not_enough_detail");
        if (r != null) {
            r.notEnoughDetail().forEach(thin::add);
        }
    }

    private static void pairs(ArrayNode a, List<RepetitionFigures.Pair> pairs) {
        for (RepetitionFigures.Pair p : pairs) {
            ObjectNode x = a.addObject()
                    .put("route", p.route())
                    .put("other", p.other())
                    .put("jaccard", p.similarity().jaccard())
                    .put("shared_count", p.similarity().shared())
                    .put("union_count", p.similarity().union());
            ArrayNode shared = x.putArray("shared");
            p.similarity().sharedFeatures().forEach(shared::add);
            evidence(x.putObject("evidence"), p.evidence());
        }
    }

    private static void evidence(ObjectNode o, RepeatEvidence e) {
        o.put("repeat", e.isRepeat())
                .put("words", e.words())
                .put("shapes_decide", e.shapesDecide())
                .put("shared_shapes", e.sharedShapes())
                .put("placed", e.placed())
                .put("shared_in_place", e.sharedInPlace())
                .put("shift_m", e.shiftM())
                .put("same_grade_band", e.sameGradeBand())
                .put("same_wall", e.sameWall());
        ArrayNode moves = o.putArray("common_moves");
        e.commonMoves().forEach(moves::add);
    }

    private static void context(ObjectNode o, Audit a) {
        List<SetResult> columns = a.columns();
        ArrayNode cols = o.putArray("columns");
        columns.forEach(c ->
                cols.addObject().put("name", c.name()).put("routes", c.routes().size()));
        ObjectNode figures = o.putObject("figures");
        List<Map<String, Double>> values = columns.stream().map(Headline::of).toList();
        for (String key : Figures.HEADLINE.stream().map(Figure::key).toList()) {
            ArrayNode row = figures.putArray(key);
            values.forEach(v -> row.add(v.get(key)));
        }
        if (a.previous() != null) {
            ObjectNode change = o.putObject("change_since_previous");
            Map<String, Double> now = values.get(0);
            Map<String, Double> before = values.get(1);
            for (String key : Figures.HEADLINE.stream().map(Figure::key).toList()) {
                Double n = now.get(key);
                Double b = before.get(key);
                change.put(key, n == null || b == null ? null : n - b);
            }
        }
    }

    private static void settings(ObjectNode o, Audit a) {
        o.put("lookback_days", a.settings().lookbackDays());
        o.put("near_repeat_threshold", a.settings().nearRepeatThreshold().toPlainString());
        o.put("reach_height_m", a.settings().reachHeightM());
        o.put("reach_factor", a.settings().reachFactor());
        FiguresJson.map(o.putObject("score_weights"), a.settings().scoreWeights());
        ObjectNode example = o.putObject("target_is_example");
        for (Discipline d : Discipline.values()) {
            example.put(d.word(), a.settings().target(d) != null && a.settings().targetIsDefault(d));
        }
    }
}
