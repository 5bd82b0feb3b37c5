package org.variset.archive.search;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.variset.archive.vocabulary.Vocabulary;

/**
 * Seeded generated queries (fields, values, ranges, operators, quotes and parentheses in random order, with random
 * characters mixed in) through the parser and the query builder: each must become a query or a
 * {@link QuerySyntaxException} with a position inside the text (or just after it), never anything else. The count is
 * {@code -Dvariset.fuzz.inputs} (default 5,000; the long run is 10,000 or more).
 */
class QueryFuzzTest {
    private static final int INPUTS = Integer.getInteger("variset.fuzz.inputs", 5_000);
    private static final String[] PARTS = {
        "move:",
        "hold:",
        "grade:",
        "set:",
        "standing:",
        "angle:",
        "grip:",
        "gym:",
        "wall:",
        "notes:",
        "band:",
        "size:",
        "discipline:",
        "colr:",
        "V3",
        "V5..V3",
        "6a..6b+",
        "5.10a",
        "..",
        "2026-03",
        "2026-02-30",
        "2026-01..2026-06",
        "crimp@90",
        "pinch@left",
        "@",
        "heel hook",
        "\"",
        "(",
        ")",
        "AND",
        "OR",
        "NOT",
        "-",
        "*",
        "dyno",
        "40",
        "-15..0",
        ":",
        "\u00e9",
        "\uD83E\uDDD7",
        "\t",
        "  ",
        "'",
        "\\",
        "5+",
        "grade:V4.",
        "1:30",
        "x".repeat(300)
    };

    @Test
    void everyQueryReadsOrGivesAPositionedError() {
        Random r = new Random(Long.getLong("variset.fuzz.seed", 20261202L));
        QueryBuilder builder;
        List<String> crashes = new ArrayList<>();
        int errors = 0;
        for (int i = 0; i < INPUTS; i++) {
            StringBuilder q = new StringBuilder();
            for (int k = 0, n = 1 + r.nextInt(7); k < n; k++) {
                q.append(r.nextInt(10) == 0 ? (char) (r.nextInt(0x250) + 1) : PARTS[r.nextInt(PARTS.length)]);
                if (r.nextBoolean()) {
                    q.append(' ');
                }
            }
            String query = q.toString();
            try {
                builder = new QueryBuilder(query, Vocabulary.defaults());
                assertThat(builder.build(QueryParser.parse(query))).isNotNull();
            } catch (QuerySyntaxException e) {
                errors++;
                assertThat(e.position()).as(query).isBetween(1, query.length() + 1);
                assertThat(e.pointer()).contains(query);
            } catch (RuntimeException e) {
                crashes.add(query.replace("\n", "\\n") + " -> " + e);
            }
        }
        System.out.println(
                "QueryFuzzTest: " + INPUTS + " queries, " + errors + " syntax errors, " + crashes.size() + " crashes");
        assertThat(crashes).isEmpty();
    }
}
