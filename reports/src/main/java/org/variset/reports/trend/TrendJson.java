package org.variset.reports.trend;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.Map;
import org.variset.archive.grade.Discipline;
import org.variset.reports.catalogue.Figures;
import org.variset.reports.figures.FiguresJson;
import org.variset.reports.scoring.grades.GradeFigures;

/** A trend as one JSON document, and its monthly series as CSV. */
public final class TrendJson {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private TrendJson() {}

    /** The trend as a JSON tree, values unrounded. */
    public static ObjectNode of(Trend t) {
        ObjectNode o = MAPPER.createObjectNode()
                .put("gym", t.gym())
                .put("from", t.from().toString())
                .put("to", t.to().toString())
                .put("as_of", t.asOf().toString())
                .put("stops_at_today", t.stopsAtToday());
        ArrayNode months = o.putArray("months");
        for (Trend.MonthPoint p : t.months()) {
            ObjectNode m = months.addObject()
                    .put("day", p.day().toString())
                    .put("scope", p.scope())
                    .put("routes", p.routes());
            FiguresJson.map(m.putObject("figures"), p.figures());
            ObjectNode gaps = m.putObject("grade_gaps");
            p.gradeGaps().forEach((d, bands) -> bands.forEach(gaps.putArray(d)::add));
        }
        walls(o, t);
        o.putObject("lifetime")
                .put("stripped", t.lifetime().stripped())
                .put("median_days", t.lifetime().medianDays())
                .put("still_up", t.lifetime().stillUp());
        setters(o, t);
        ObjectNode grades = o.putObject("grades");
        for (Map.Entry<Discipline, GradeFigures> e : t.grades().entrySet()) {
            ObjectNode g = grades.putObject(e.getKey().word());
            ObjectNode h = g.putObject("histogram");
            e.getValue().histogram().forEach(h::put);
            g.put("emd_to_target", e.getValue().emdToTarget())
                    .put("target_is_example", t.targetIsExample().get(e.getKey()));
        }
        ArrayNode repeats = o.putArray("near_repeats");
        t.repeats()
                .forEach(r -> repeats.addObject()
                        .put("reset", r.reset())
                        .put("route", r.pair().route())
                        .put("other", r.pair().other())
                        .put("jaccard", r.pair().similarity().jaccard()));
        return o;
    }

    /** Each wall's status and resets. */
    private static void walls(ObjectNode o, Trend t) {
        ArrayNode walls = o.putArray("walls");
        for (Trend.WallStatus w : t.walls()) {
            ObjectNode x = walls.addObject()
                    .put("wall", w.wall())
                    .put("discipline", w.discipline().word())
                    .put("mean_score", w.meanScore())
                    .put(
                            "last_reset",
                            w.lastReset() == null ? null : w.lastReset().toString())
                    .put("days_since_reset", w.daysSince())
                    .put("cycle_days", w.cycleDays())
                    .put("overdue_after_days", w.overdueAfterDays())
                    .put("days_past_due", w.daysPastDue())
                    .put("status", w.status());
            ArrayNode resets = x.putArray("resets");
            w.resets()
                    .forEach(r -> resets.addObject()
                            .put("label", r.getKey())
                            .put("on", r.getValue().toString()));
        }
    }

    /** The setter mix. */
    private static void setters(ObjectNode o, Trend t) {
        ArrayNode setters = o.putArray("setters");
        for (Trend.SetterProfile s : t.setters()) {
            ObjectNode x = setters.addObject()
                    .put("setter", s.setter())
                    .put("routes", s.routes())
                    .put("share", s.share());
            FiguresJson.map(x.putObject("grip_shares"), s.gripShares());
            FiguresJson.map(x.putObject("hold_shares"), s.holdShares());
            FiguresJson.map(x.putObject("move_shares"), s.moveShares());
        }
    }

    /** Several gyms: the comparison, then each gym's trend as {@link #of(Trend)} writes it. */
    public static ObjectNode of(ChainComparison c, java.util.List<Trend> trends) {
        ObjectNode o =
                MAPPER.createObjectNode().put("from", c.from().toString()).put("to", c.to().toString());
        ArrayNode rows = o.putArray("comparison");
        for (ChainComparison.Row r : c.rows()) {
            ObjectNode x = rows.addObject()
                    .put("gym", r.gym())
                    .put("routes_set", r.routesSet())
                    .put("resets", r.resets())
                    .put("mean_reset_score", r.meanResetScore())
                    .put("routes_up", r.routesUp());
            FiguresJson.map(x.putObject("figures"), r.figures());
            x.put("walls", r.walls())
                    .put("walls_due", r.wallsDue())
                    .put("walls_overdue", r.wallsOverdue())
                    .put("median_lifetime_days", r.medianLifetimeDays())
                    .put("near_repeats", r.nearRepeats());
        }
        ArrayNode gyms = o.putArray("gyms");
        trends.forEach(t -> gyms.add(of(t)));
        return o;
    }

    /** The comparison as CSV: one row per gym (RFC 4180). */
    public static String csv(ChainComparison c) {
        StringBuilder b = new StringBuilder("gym,from,to,routes_set,resets,mean_reset_score,routes_up");
        Figures.TREND.forEach(k -> b.append(',').append(k.key()));
        b.append(",walls,walls_due,walls_overdue,median_lifetime_days,near_repeats\r\n");
        for (ChainComparison.Row r : c.rows()) {
            b.append(quote(r.gym()))
                    .append(',')
                    .append(c.from())
                    .append(',')
                    .append(c.to())
                    .append(',')
                    .append(r.routesSet())
                    .append(',')
                    .append(r.resets())
                    .append(',')
                    .append(num(r.meanResetScore()))
                    .append(',')
                    .append(r.routesUp());
            Figures.TREND.forEach(k -> b.append(',').append(num(r.figures().get(k.key()))));
            b.append(',')
                    .append(r.walls())
                    .append(',')
                    .append(r.wallsDue())
                    .append(',')
                    .append(r.wallsOverdue())
                    .append(',')
                    .append(num(r.medianLifetimeDays()))
                    .append(',')
                    .append(r.nearRepeats())
                    .append("\r\n");
        }
        return b.toString();
    }

    private static String num(Double v) {
        return v == null ? "" : v.toString();
    }

    /** The monthly series as CSV: one row per day and scope, one column per headline figure (RFC 4180). */
    public static String csv(Trend t) {
        StringBuilder b = new StringBuilder("day,scope,routes");
        Map<String, Double> first =
                t.months().isEmpty() ? Map.of() : t.months().get(0).figures();
        first.keySet().forEach(k -> b.append(',').append(k));
        b.append("\r\n");
        for (Trend.MonthPoint p : t.months()) {
            b.append(p.day()).append(',').append(quote(p.scope())).append(',').append(p.routes());
            p.figures().values().forEach(v -> b.append(',').append(v == null ? "" : v.toString()));
            b.append("\r\n");
        }
        return b.toString();
    }

    private static String quote(String s) {
        return s.matches("[^,\"\r\n]*") ? s : "\"" + s.replace("\"", "\"\"") + "\"";
    }
}
