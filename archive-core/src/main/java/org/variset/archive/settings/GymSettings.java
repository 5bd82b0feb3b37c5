package org.variset.archive.settings;

import java.math.BigDecimal;
import java.util.Collection;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import org.variset.archive.grade.BandSet;
import org.variset.archive.grade.Discipline;
import org.variset.archive.read.WallRecord;
import org.variset.archive.vocabulary.Vocabulary;

/**
 * The settings in effect for one gym on one day: the values the gym gave, else the defaults. Defaults are those of
 * the specs (docs/spec/metrics.md, docs/spec/grades.md) or common practice, named beside each constant.
 */
public final class GymSettings {
    /** docs/spec/metrics.md section 5: the default near-repeat threshold. */
    public static final BigDecimal DEFAULT_THRESHOLD = new BigDecimal("0.6");
    /** docs/spec/metrics.md section 5: the default look-back window. */
    public static final int DEFAULT_LOOKBACK_DAYS = 365;
    /**
     * docs/spec/metrics.md section 7: the default weights of the score's parts, in the spec's order (grip, holds,
     * moves, grades, novelty).
     */
    public static final Map<String, Double> DEFAULT_SCORE_WEIGHTS = defaultScoreWeights();
    /** docs/spec/metrics.md section 6: the default climber height. */
    public static final double DEFAULT_REACH_HEIGHT_M = 1.60;
    /** docs/spec/metrics.md section 6: the default span factor. */
    public static final double DEFAULT_REACH_FACTOR = 1.0;
    /**
     * Common practice (Outdoor Insider, Fall 2015, p. 15): boulders due at 4 weeks and overdue at 6, rope routes due
     * at 8 and overdue at 10; both are "overdue two weeks after due".
     */
    public static final int DEFAULT_BOULDER_CYCLE_DAYS = 28;
    /** See {@link #DEFAULT_BOULDER_CYCLE_DAYS}. */
    public static final int DEFAULT_ROPE_CYCLE_DAYS = 56;
    /** See {@link #DEFAULT_BOULDER_CYCLE_DAYS}. */
    public static final int DEFAULT_OVERDUE_AFTER_DAYS = 14;

    private final Map<String, SettingValue> inEffect;
    private Vocabulary vocabulary;
    private final Map<Discipline, BandSet> bandSets = new EnumMap<>(Discipline.class);

    private GymSettings(Map<String, SettingValue> inEffect) {
        this.inEffect = inEffect;
    }

    /** Only the defaults. */
    public static GymSettings defaults() {
        return new GymSettings(Map.of());
    }

    /** The settings from the values in effect (one per key and scope; a null value means the default). */
    public static GymSettings of(Collection<SettingValue> values) {
        Map<String, SettingValue> m = new LinkedHashMap<>();
        values.forEach(v -> m.put(id(v.key(), v.scope()), v));
        return new GymSettings(m);
    }

    /** The scope word of a discipline. */
    public static String scopeOf(Discipline d) {
        return d.word();
    }

    /** The scope word of a wall. */
    public static String scopeOf(WallRecord wall) {
        return "wall:" + wall.id();
    }

    /** The value the gym gave a setting, if one is in effect (a return to the default gives none). */
    public Optional<SettingValue> given(SettingKey key, String scope) {
        SettingValue v = inEffect.get(id(key, scope));
        return v == null || v.value() == null ? Optional.empty() : Optional.of(v);
    }

    /** Every value in effect that the gym gave, in the order read. */
    public Collection<SettingValue> givenValues() {
        return inEffect.values().stream().filter(v -> v.value() != null).toList();
    }

    /**
     * The target weights per band of a discipline (any positive scale; figures normalise them), or null when there
     * is none: boulders default to the common-practice pyramid ({@link TargetPyramid#weights()}); rope routes have no
     * default (docs/spec/metrics.md section 3).
     */
    public Map<String, Double> target(Discipline d) {
        return given(SettingKey.TARGET, scopeOf(d))
                .map(v -> SettingKey.weightMap(v.value()))
                .orElse(d == Discipline.BOULDER ? TargetPyramid.weights() : null);
    }

    /** True when the discipline's target is the default example rather than the gym's own. */
    public boolean targetIsDefault(Discipline d) {
        return given(SettingKey.TARGET, scopeOf(d)).isEmpty();
    }

    /** The grade bands of a discipline (docs/spec/grades.md defaults). */
    public synchronized BandSet bands(Discipline d) {
        return bandSets.computeIfAbsent(
                d,
                x -> given(SettingKey.BANDS, scopeOf(x))
                        .map(v -> SettingKey.bandSet(v.value()))
                        .orElse(BandSet.defaults(x)));
    }

    /** The near-repeat threshold. */
    public BigDecimal nearRepeatThreshold() {
        return given(SettingKey.NEAR_REPEAT_THRESHOLD, "")
                .map(v -> new BigDecimal(v.value().asText()))
                .orElse(DEFAULT_THRESHOLD);
    }

    /** The look-back window in days. */
    public int lookbackDays() {
        return given(SettingKey.LOOKBACK_DAYS, "").map(v -> v.value().asInt()).orElse(DEFAULT_LOOKBACK_DAYS);
    }

    /** The climber height for reach flags. */
    public double reachHeightM() {
        return given(SettingKey.REACH_HEIGHT_M, "")
                .map(v -> v.value().asDouble())
                .orElse(DEFAULT_REACH_HEIGHT_M);
    }

    /** The span factor for reach flags. */
    public double reachFactor() {
        return given(SettingKey.REACH_FACTOR, "").map(v -> v.value().asDouble()).orElse(DEFAULT_REACH_FACTOR);
    }

    /** The score weights: docs/spec/metrics.md section 7's defaults, with the parts the gym set replaced. */
    public Map<String, Double> scoreWeights() {
        Map<String, Double> w = new LinkedHashMap<>(DEFAULT_SCORE_WEIGHTS);
        given(SettingKey.SCORE_WEIGHTS, "").ifPresent(v -> w.putAll(SettingKey.weightMap(v.value())));
        return w;
    }

    /**
     * A wall's reset cycle in days: the gym's value for the wall, else the walls file's, else the gym's value for
     * the discipline, else the common-practice default.
     */
    public int cycleDays(WallRecord wall, Discipline d) {
        return given(SettingKey.CYCLE_DAYS, scopeOf(wall))
                .map(v -> v.value().asInt())
                .or(() -> Optional.ofNullable(wall.cycleDays()))
                .or(() -> given(SettingKey.CYCLE_DAYS, scopeOf(d))
                        .map(v -> v.value().asInt()))
                .orElse(d == Discipline.BOULDER ? DEFAULT_BOULDER_CYCLE_DAYS : DEFAULT_ROPE_CYCLE_DAYS);
    }

    /** Days past the cycle before a wall is overdue. */
    public int overdueAfterDays() {
        return given(SettingKey.OVERDUE_AFTER_DAYS, "")
                .map(v -> v.value().asInt())
                .orElse(DEFAULT_OVERDUE_AFTER_DAYS);
    }

    /** The default vocabulary with the gym's own terms added. */
    public synchronized Vocabulary vocabulary() {
        if (vocabulary == null) {
            vocabulary = given(SettingKey.VOCABULARY, "")
                    .map(v -> Vocabulary.defaults().extendedWith(v.value().asText()))
                    .orElse(Vocabulary.defaults());
        }
        return vocabulary;
    }

    private static Map<String, Double> defaultScoreWeights() {
        double[] weights = {0.25, 0.20, 0.20, 0.15, 0.20};
        Map<String, Double> w = new LinkedHashMap<>();
        for (int i = 0; i < weights.length; i++) {
            w.put(SettingKey.SCORE_PARTS.get(i), weights[i]);
        }
        return java.util.Collections.unmodifiableMap(w);
    }

    private static String id(SettingKey key, String scope) {
        return key.word() + "|" + (scope == null ? "" : scope);
    }
}
