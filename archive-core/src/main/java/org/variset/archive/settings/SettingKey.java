package org.variset.archive.settings;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.variset.archive.grade.Band;
import org.variset.archive.grade.BandSet;
import org.variset.archive.vocabulary.Vocabulary;

/**
 * The settings a gym can change, each with the text a person types for it, its stored JSON form and its scope.
 * {@link #parse} checks a typed value and gives its JSON; {@link #text} gives the JSON back as the same text.
 */
public enum SettingKey {
    /** Target grade shares per band: {@code VB=1 V0=2 V1=3}. */
    TARGET("target", SettingScope.DISCIPLINE, "target grade shares per band, as band=weight pairs: 'VB=1 V0=2 V1=3'"),
    /** Grade bands: {@code VB V0@10 V1@13.5}, each band from its lower edge on the IRCRA axis to the next one's. */
    BANDS(
            "bands",
            SettingScope.DISCIPLINE,
            "grade bands, easiest first, as label@lower-edge on the IRCRA axis "
                    + "(the first may leave its edge out): 'VB V0@10 V1@13.5 V2@14.5'"),
    /** The Jaccard index at or above which two routes are near-repeats. */
    NEAR_REPEAT_THRESHOLD("near_repeat_threshold", SettingScope.GYM, "a number above 0 and at most 1: '0.6'"),
    /** How many days before a reset its routes are compared with. */
    LOOKBACK_DAYS("lookback_days", SettingScope.GYM, "a whole number of days, at least 1: '365'"),
    /** The climber height that move spans are compared with. */
    REACH_HEIGHT_M("reach_height_m", SettingScope.GYM, "metres between 0.5 and 3: '1.60'"),
    /** A span longer than this many times the climber height is flagged. */
    REACH_FACTOR("reach_factor", SettingScope.GYM, "a number above 0 and at most 3: '1.0'"),
    /** Weights of the composite score's parts: {@code grip=0.25 holds=0.2}; parts not named keep their default. */
    SCORE_WEIGHTS(
            "score_weights",
            SettingScope.GYM,
            "part=weight pairs over grip, holds, moves, grades and "
                    + "novelty, each at least 0: 'grip=0.3 novelty=0.3'"),
    /** How many days the gym means to leave a wall's set up. */
    CYCLE_DAYS("cycle_days", SettingScope.DISCIPLINE_OR_WALL, "a whole number of days, at least 1: '28'"),
    /** Days past the cycle before a wall counts as overdue rather than due. */
    OVERDUE_AFTER_DAYS("overdue_after_days", SettingScope.GYM, "a whole number of days, at least 0: '14'"),
    /** The gym's own terms and spellings, added to the default vocabulary (vocabulary file form). */
    VOCABULARY(
            "vocabulary",
            SettingScope.GYM,
            "terms in the vocabulary file form: a '[moves]' line, then lines "
                    + "like 'heel hook: hooky heel' (sections: hold-types, moves, styles)");

    /** The score's parts, in the order of docs/spec/metrics.md section 7. */
    public static final List<String> SCORE_PARTS = List.of("grip", "holds", "moves", "grades", "novelty");

    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private final String word;
    private final SettingScope scope;
    private final String expected;

    SettingKey(String word, SettingScope scope, String expected) {
        this.word = word;
        this.scope = scope;
        this.expected = expected;
    }

    /** The key as typed and stored ({@code near_repeat_threshold}). */
    public String word() {
        return word;
    }

    /** What a value applies to. */
    public SettingScope scope() {
        return scope;
    }

    /** What a value looks like, with an example. */
    public String expected() {
        return expected;
    }

    /**
     * Reads a key word.
     *
     * @throws IllegalArgumentException naming every key
     */
    public static SettingKey of(String word) {
        String w = word == null ? "" : word.strip().toLowerCase(Locale.ROOT).replace('-', '_');
        for (SettingKey k : values()) {
            if (k.word.equals(w)) {
                return k;
            }
        }
        throw new IllegalArgumentException("no setting named '" + word + "' (settings: "
                + String.join(
                        ", ",
                        java.util.Arrays.stream(values()).map(SettingKey::word).toList()) + ")");
    }

    /**
     * Checks a typed value and gives its stored JSON form.
     *
     * @throws IllegalArgumentException saying what is wrong and what was expected
     */
    public JsonNode parse(String text) {
        String t = text == null ? "" : text.strip();
        if (t.isEmpty()) {
            throw bad(text, "it is empty");
        }
        return switch (this) {
            case TARGET -> weights(t, null);
            case BANDS -> bands(t);
            case NEAR_REPEAT_THRESHOLD ->
                NODES.textNode(decimal(t, "0", false, "1", true).toPlainString());
            case LOOKBACK_DAYS, CYCLE_DAYS -> NODES.numberNode(whole(t, 1));
            case OVERDUE_AFTER_DAYS -> NODES.numberNode(whole(t, 0));
            case REACH_HEIGHT_M ->
                NODES.numberNode(decimal(t, "0.5", true, "3", true).doubleValue());
            case REACH_FACTOR ->
                NODES.numberNode(decimal(t, "0", false, "3", true).doubleValue());
            case SCORE_WEIGHTS -> weights(t, SCORE_PARTS);
            case VOCABULARY -> {
                Vocabulary.defaults().extendedWith(t);
                yield NODES.textNode(t);
            }
        };
    }

    /** The value as a person types it; {@code parse(text(v))} gives v again. */
    public String text(JsonNode value) {
        return switch (this) {
            case TARGET, SCORE_WEIGHTS -> {
                List<String> pairs = new ArrayList<>();
                value.fields()
                        .forEachRemaining(
                                e -> pairs.add(e.getKey() + "=" + e.getValue().asText()));
                yield String.join(" ", pairs);
            }
            case BANDS -> {
                List<String> parts = new ArrayList<>();
                for (Band b : bandSet(value).bands()) {
                    parts.add(b.lo() == null ? b.label() : b.label() + "@" + plain(b.lo()));
                }
                yield String.join(" ", parts);
            }
            default -> value.asText();
        };
    }

    /** The bands of a stored {@link #BANDS} value. */
    static BandSet bandSet(JsonNode value) {
        List<Band> out = new ArrayList<>();
        for (int i = 0; i < value.size(); i++) {
            JsonNode b = value.get(i);
            Double lo = b.get("lo").isNull() ? null : b.get("lo").asDouble();
            Double hi = i + 1 < value.size() ? value.get(i + 1).get("lo").asDouble() : null;
            out.add(new Band(b.get("label").asText(), lo, hi));
        }
        return new BandSet(out);
    }

    /** The weights of a stored {@link #TARGET} or {@link #SCORE_WEIGHTS} value, in the order given. */
    static Map<String, Double> weightMap(JsonNode value) {
        Map<String, Double> out = new LinkedHashMap<>();
        value.fields().forEachRemaining(e -> out.put(e.getKey(), e.getValue().asDouble()));
        return out;
    }

    /** Reads stored JSON text. */
    static JsonNode read(String json) {
        try {
            return MAPPER.readTree(json);
        } catch (java.io.IOException e) {
            throw new IllegalStateException("the archive holds a setting that is not valid JSON: " + json, e);
        }
    }

    private ObjectNode weights(String t, List<String> allowed) {
        ObjectNode o = NODES.objectNode();
        boolean positive = false;
        for (String pair : t.split("[\\s,;]+")) {
            String[] kv = pair.split("[=:]", 2);
            if (kv.length != 2 || kv[0].isBlank()) {
                throw bad(t, "'" + pair + "' is not a name=weight pair");
            }
            String name = kv[0].strip();
            if (allowed != null && !allowed.contains(name)) {
                throw bad(t, "'" + name + "' is not a part of the score");
            }
            if (o.has(name)) {
                throw bad(t, "'" + name + "' is given twice");
            }
            BigDecimal w = decimal(kv[1].strip(), "0", true, null, false);
            positive |= w.signum() > 0;
            o.put(name, new BigDecimal(w.stripTrailingZeros().toPlainString()));
        }
        if (!positive) {
            throw bad(t, "every weight is zero");
        }
        return o;
    }

    private ArrayNode bands(String t) {
        ArrayNode a = NODES.arrayNode();
        Double previous = null;
        String[] parts = t.split("[\\s,;]+");
        for (int i = 0; i < parts.length; i++) {
            String[] lv = parts[i].split("@", 2);
            String label = lv[0].strip();
            if (label.isEmpty()) {
                throw bad(t, "'" + parts[i] + "' has no band label");
            }
            if (lv.length == 1 && i > 0) {
                throw bad(t, "band '" + label + "' needs its lower edge, as " + label + "@12.5");
            }
            Double lo = lv.length == 1
                    ? null
                    : decimal(lv[1], null, false, null, false).doubleValue();
            if (lo != null && previous != null && lo <= previous) {
                throw bad(t, "band '" + label + "' starts at " + plain(lo) + ", not above the band before it");
            }
            previous = lo;
            a.addObject().put("label", label).put("lo", lo);
        }
        return a;
    }

    private int whole(String t, int min) {
        try {
            int v = Integer.parseInt(t);
            if (v < min) {
                throw bad(t, "it is below " + min);
            }
            return v;
        } catch (NumberFormatException e) {
            throw bad(t, "it is not a whole number");
        }
    }

    private BigDecimal decimal(String t, String min, boolean minIncluded, String max, boolean maxIncluded) {
        BigDecimal v;
        try {
            v = new BigDecimal(t.strip());
        } catch (NumberFormatException e) {
            throw bad(t, "'" + t.strip() + "' is not a number");
        }
        if (min != null
                && (minIncluded ? v.compareTo(new BigDecimal(min)) < 0 : v.compareTo(new BigDecimal(min)) <= 0)) {
            throw bad(t, "it must be " + (minIncluded ? "at least " : "above ") + min);
        }
        if (max != null
                && (maxIncluded ? v.compareTo(new BigDecimal(max)) > 0 : v.compareTo(new BigDecimal(max)) >= 0)) {
            throw bad(t, "it must be " + (maxIncluded ? "at most " : "below ") + max);
        }
        return v;
    }

    private IllegalArgumentException bad(String text, String why) {
        return new IllegalArgumentException(
                "setting " + word + ": '" + text + "' is not a valid value: " + why + " (expected " + expected + ")");
    }

    private static String plain(double d) {
        return BigDecimal.valueOf(d).stripTrailingZeros().toPlainString();
    }
}
