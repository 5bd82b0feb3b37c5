package org.variset.archive.settings;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.variset.archive.grade.Discipline;
import org.variset.archive.read.WallRecord;

/** Every setting in effect for a gym, as rows a person reads: what, for which scope, the value, and whence it came. */
public final class SettingsListing {
    private SettingsListing() {}

    /**
     * One row of the listing.
     *
     * @param key the setting's word
     * @param scope what it applies to, for people ({@code boulder}, {@code wall Cave}), empty for the gym
     * @param value the value as typed, or {@code none}
     * @param source where it came from: {@code set from 2026-03-01}, {@code default}, {@code walls file}, ...
     */
    public record Row(String key, String scope, String value, String source) {}

    /** The rows of settings in effect, walls' cycles included. */
    public static List<Row> of(GymSettings s, List<WallRecord> walls) {
        List<Row> rows = new ArrayList<>();
        grades(s, rows);
        rows.add(row(
                s,
                SettingKey.NEAR_REPEAT_THRESHOLD,
                "",
                s.nearRepeatThreshold().toPlainString(),
                "default (docs/spec/metrics.md)"));
        rows.add(row(
                s, SettingKey.LOOKBACK_DAYS, "", String.valueOf(s.lookbackDays()), "default (docs/spec/metrics.md)"));
        rows.add(row(s, SettingKey.REACH_HEIGHT_M, "", plain(s.reachHeightM()), "default (docs/spec/metrics.md)"));
        rows.add(row(s, SettingKey.REACH_FACTOR, "", plain(s.reachFactor()), "default (docs/spec/metrics.md)"));
        rows.add(row(s, SettingKey.SCORE_WEIGHTS, "", weights(s.scoreWeights()), "default (docs/spec/metrics.md)"));
        cycles(s, walls, rows);
        rows.add(row(
                s,
                SettingKey.OVERDUE_AFTER_DAYS,
                "",
                String.valueOf(s.overdueAfterDays()),
                "default (common practice: overdue two weeks after due)"));
        rows.add(row(
                s,
                SettingKey.VOCABULARY,
                "",
                s.given(SettingKey.VOCABULARY, "").isPresent() ? "the gym's own terms added" : "the default vocabulary",
                "default (docs/spec/vocabulary.md)"));
        return rows;
    }

    /** The target and the bands of each discipline. */
    private static void grades(GymSettings s, List<Row> rows) {
        for (Discipline d : Discipline.values()) {
            Map<String, Double> t = s.target(d);
            rows.add(row(
                    s,
                    SettingKey.TARGET,
                    d.word(),
                    t == null ? "none" : weights(t),
                    d == Discipline.BOULDER
                            ? "default: an example pyramid (common practice, Outdoor Insider, Fall 2015, p. 15)"
                            : "default: none until the gym sets one"));
        }
        for (Discipline d : Discipline.values()) {
            StringBuilder b = new StringBuilder();
            s.bands(d)
                    .bands()
                    .forEach(x -> b.append(b.length() == 0 ? "" : " ")
                            .append(x.label())
                            .append(x.lo() == null ? "" : "@" + plain(x.lo())));
            rows.add(row(s, SettingKey.BANDS, d.word(), b.toString(), "default (docs/spec/grades.md)"));
        }
    }

    /** The reset cycle of each discipline, then of each wall that has its own. */
    private static void cycles(GymSettings s, List<WallRecord> walls, List<Row> rows) {
        for (Discipline d : Discipline.values()) {
            WallRecord none = new WallRecord(-1, -1, "", null, null, null, null, null);
            rows.add(row(
                    s,
                    SettingKey.CYCLE_DAYS,
                    d.word(),
                    String.valueOf(s.cycleDays(none, d)),
                    "default (common practice, Outdoor Insider, Fall 2015, p. 15)"));
        }
        for (WallRecord w : walls) {
            Optional<SettingValue> own = s.given(SettingKey.CYCLE_DAYS, GymSettings.scopeOf(w));
            if (own.isPresent()) {
                rows.add(new Row(
                        SettingKey.CYCLE_DAYS.word(),
                        "wall " + w.name(),
                        own.get().text(),
                        "set from " + own.get().fromWords()));
            } else if (w.cycleDays() != null) {
                rows.add(new Row(
                        SettingKey.CYCLE_DAYS.word(), "wall " + w.name(), String.valueOf(w.cycleDays()), "walls file"));
            }
        }
    }

    private static Row row(GymSettings s, SettingKey key, String scope, String value, String defaultSource) {
        Optional<SettingValue> v = s.given(key, scope);
        return new Row(
                key.word(),
                scope,
                value,
                v.map(x -> "set from " + x.fromWords()).orElse(defaultSource));
    }

    private static String weights(Map<String, Double> m) {
        StringBuilder b = new StringBuilder();
        m.forEach((k, v) ->
                b.append(b.length() == 0 ? "" : " ").append(k).append('=').append(plain(v)));
        return b.toString();
    }

    private static String plain(double d) {
        return java.math.BigDecimal.valueOf(d).stripTrailingZeros().toPlainString();
    }
}
