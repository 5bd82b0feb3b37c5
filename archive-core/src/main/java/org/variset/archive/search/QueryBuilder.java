package org.variset.archive.search;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.apache.lucene.document.DoublePoint;
import org.apache.lucene.document.LongPoint;
import org.apache.lucene.index.Term;
import org.apache.lucene.search.BooleanClause.Occur;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.MatchAllDocsQuery;
import org.apache.lucene.search.PhraseQuery;
import org.apache.lucene.search.PrefixQuery;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.TermQuery;
import org.variset.archive.grade.Discipline;
import org.variset.archive.grade.Grade;
import org.variset.archive.grade.GradeException;
import org.variset.archive.grade.GradeReader;
import org.variset.archive.grade.GradeScale;
import org.variset.archive.gym.PartialDate;
import org.variset.archive.route.GripDirection;
import org.variset.archive.route.HoldSize;
import org.variset.archive.vocabulary.Vocabulary;
import org.variset.archive.vocabulary.VocabularyField;

/**
 * Turns a query's syntax tree into a Lucene query. Terms go through the vocabulary ({@link TermKeys}); bare words
 * that together spell a vocabulary term ({@code toe catch}) search that term's field as well as the text. A grade or
 * a range of grades matches as docs/spec/grades.md, "Grade ranges", says: routes graded in the range's own scale by
 * their order in it, routes graded in another scale when the centre of their span lies within the rows the range
 * covers; a grade that reads in both disciplines ({@code 6a}: Font 6A for boulders, French 6a for rope) searches each discipline with its
 * own reading.
 */
final class QueryBuilder {
    private static final int LONGEST_TERM = 3;
    private static final List<VocabularyField> TERM_FIELDS =
            List.of(VocabularyField.MOVES, VocabularyField.HOLD_TYPES, VocabularyField.STYLES);

    private final String query;
    private final TermKeys keys;
    /** Analyzers are thread-safe and keep their token streams per thread for reuse. */
    private static final TextAnalyzer ANALYZER = new TextAnalyzer();

    private final GradeReader grades = GradeReader.standard();

    QueryBuilder(String query, Vocabulary vocabulary) {
        this.query = query;
        this.keys = TermKeys.of(vocabulary);
    }

    Query build(QueryNode n) {
        if (n instanceof QueryNode.And a) {
            return and(a.children());
        }
        if (n instanceof QueryNode.Or o) {
            BooleanQuery.Builder b = new BooleanQuery.Builder();
            o.children().forEach(c -> b.add(build(c), Occur.SHOULD));
            return b.build();
        }
        if (n instanceof QueryNode.Not x) {
            return and(List.of(x));
        }
        if (n instanceof QueryNode.Text t) {
            return t.phrase() ? text(SearchFields.TEXT, t.text(), t.position()) : and(List.of(t));
        }
        return field((QueryNode.Field) n);
    }

    private Query and(List<QueryNode> children) {
        BooleanQuery.Builder b = new BooleanQuery.Builder();
        boolean positive = false;
        List<QueryNode.Text> run = new ArrayList<>();
        for (QueryNode c : children) {
            if (c instanceof QueryNode.Text t && !t.phrase()) {
                run.add(t);
                continue;
            }
            positive |= words(run, b);
            run.clear();
            if (c instanceof QueryNode.Not x) {
                b.add(build(x.child()), Occur.MUST_NOT);
            } else {
                b.add(build(c), Occur.MUST);
                positive = true;
            }
        }
        positive |= words(run, b);
        if (!positive) {
            b.add(new MatchAllDocsQuery(), Occur.MUST);
        }
        return b.build();
    }

    /** Bare words: runs of up to three that spell a vocabulary term search it; the others search the text. */
    private boolean words(List<QueryNode.Text> run, BooleanQuery.Builder b) {
        boolean any = false;
        int i = 0;
        while (i < run.size()) {
            int took = 1;
            Query q = null;
            for (int len = Math.min(LONGEST_TERM, run.size() - i); len >= 1 && q == null; len--) {
                String spelled = String.join(
                        " ",
                        run.subList(i, i + len).stream()
                                .map(QueryNode.Text::text)
                                .toList());
                q = vocabularyTerm(spelled);
                took = len;
            }
            if (q == null) {
                q = text(SearchFields.TEXT, run.get(i).text(), run.get(i).position());
                took = 1;
            }
            b.add(q, Occur.MUST);
            any = true;
            i += took;
        }
        return any;
    }

    /** The term a text spells in the vocabulary, searched in its field or in the text; null when it spells none. */
    private Query vocabularyTerm(String spelled) {
        for (VocabularyField f : TERM_FIELDS) {
            if (keys.term(f, spelled) != null) {
                String field = f == VocabularyField.MOVES
                        ? SearchFields.MOVE
                        : f == VocabularyField.STYLES ? SearchFields.STYLE : SearchFields.HOLD;
                BooleanQuery.Builder b = new BooleanQuery.Builder();
                b.add(new TermQuery(new Term(field, keys.key(f, spelled))), Occur.SHOULD);
                List<String> tokens = ANALYZER.tokens(SearchFields.TEXT, spelled);
                if (!tokens.isEmpty()) {
                    b.add(phrase(SearchFields.TEXT, tokens), Occur.SHOULD);
                }
                return b.build();
            }
        }
        return null;
    }

    private Query text(String field, String text, int position) {
        Query v = vocabularyTerm(text);
        if (v != null && field.equals(SearchFields.TEXT)) {
            return v;
        }
        List<String> tokens = ANALYZER.tokens(field, text);
        if (tokens.isEmpty()) {
            throw new QuerySyntaxException(query, position, "'" + text + "' has no letters or digits to search for");
        }
        return phrase(field, tokens);
    }

    private static Query phrase(String field, List<String> tokens) {
        return tokens.size() == 1
                ? new TermQuery(new Term(field, tokens.get(0)))
                : new PhraseQuery(field, tokens.toArray(String[]::new));
    }

    private Query field(QueryNode.Field f) {
        String v = f.value().strip();
        return switch (f.field()) {
            case "gym" -> keyword(SearchFields.GYM, v);
            case "wall" -> keyword(SearchFields.WALL, v);
            case "route" -> keyword(SearchFields.LABEL, v);
            case "color" -> keyword(SearchFields.COLOR, v);
            case "setter" -> setter(v);
            case "band" -> keyword(SearchFields.BAND, v);
            case "size" -> keyword(SearchFields.SIZE, v);
            case "discipline" ->
                new TermQuery(new Term(SearchFields.DISCIPLINE, discipline(v, f).word()));
            case "move" -> new TermQuery(new Term(SearchFields.MOVE, keys.key(VocabularyField.MOVES, v)));
            case "style" -> new TermQuery(new Term(SearchFields.STYLE, keys.key(VocabularyField.STYLES, v)));
            case "notes" -> text(SearchFields.NOTES, v, f.valuePosition());
            case "hold" -> hold(v, f);
            case "grip" -> new TermQuery(new Term(SearchFields.GRIP, Integer.toString(direction(v, f))));
            case "grade" -> grade(v, f);
            case "angle" -> angle(v, f);
            case "standing" -> standing(day(v, f).first(), day(v, f).last());
            default -> dates(f.field().equals("set") ? SearchFields.SET : SearchFields.STRIPPED, v, f);
        };
    }

    private static Query keyword(String field, String v) {
        if (v.endsWith("*") && v.length() > 1) {
            return new PrefixQuery(new Term(field, TermKeys.keyword(v.substring(0, v.length() - 1))));
        }
        return new TermQuery(new Term(field, TermKeys.keyword(v)));
    }

    private Discipline discipline(String v, QueryNode.Field f) {
        try {
            return Discipline.parse(v);
        } catch (IllegalArgumentException e) {
            throw new QuerySyntaxException(query, f.valuePosition(), e.getMessage());
        }
    }

    /** A setter's whole name, or one word of it ({@code setter:dario}, {@code setter:pen*}). */
    private static Query setter(String v) {
        Query whole = keyword(SearchFields.SETTER, v);
        if (TermKeys.keyword(v).contains(" ")) {
            return whole;
        }
        return new BooleanQuery.Builder()
                .add(whole, Occur.SHOULD)
                .add(keyword(SearchFields.SETTER_WORD, v), Occur.SHOULD)
                .build();
    }

    /**
     * One hold: {@code type}, {@code type@direction}, and either with {@code +size} ({@code sloper+xl},
     * {@code crimp@up+s}): the type, direction and size of the same hold. (Separate terms, {@code hold:sloper size:xl},
     * ask for a sloper and an xl hold, maybe two holds.)
     */
    private Query hold(String v, QueryNode.Field f) {
        int plus = v.indexOf('+');
        String size = plus < 0 ? "" : "+" + size(v.substring(plus + 1), f, plus + 1);
        String body = plus < 0 ? v : v.substring(0, plus);
        int at = body.indexOf('@');
        String type = keys.key(VocabularyField.HOLD_TYPES, at < 0 ? body : body.substring(0, at));
        if (at < 0) {
            return new TermQuery(new Term(SearchFields.HOLD, type + size));
        }
        int deg = direction(
                body.substring(at + 1),
                new QueryNode.Field(f.field(), v, false, f.position(), f.valuePosition() + at + 1));
        return new TermQuery(new Term(SearchFields.HOLD, type + "@" + deg + size));
    }

    private String size(String v, QueryNode.Field f, int offset) {
        try {
            return HoldSize.parse(v).word();
        } catch (IllegalArgumentException e) {
            throw new QuerySyntaxException(
                    query,
                    f.valuePosition() + offset,
                    "'" + v + "' is not a hold size (expected xs, s, m, l or xl after the +, as in hold:sloper+xl)");
        }
    }

    /** A direction as the centre of its sector: {@code 90}, {@code right} and {@code 3:00} all give 90. */
    private int direction(String v, QueryNode.Field f) {
        try {
            return 45 * GripDirection.sector(GripDirection.parse(v));
        } catch (IllegalArgumentException e) {
            throw new QuerySyntaxException(
                    query, f.valuePosition(), "'" + v + "' is not a direction (" + GripDirection.EXPECTED + ")");
        }
    }

    private Query grade(String v, QueryNode.Field f) {
        String[] ends = range(v, f);
        BooleanQuery.Builder b = new BooleanQuery.Builder();
        List<String> problems = new ArrayList<>();
        boolean any = false;
        for (Discipline d : Discipline.values()) {
            try {
                Grade lo = ends[0].isEmpty() ? null : read(ends[0], d);
                Grade hi = ends[1].isEmpty() ? null : read(ends[1], d);
                if (lo != null && hi != null && lo.ircra() > hi.ircra()) {
                    throw new QuerySyntaxException(
                            query,
                            f.valuePosition(),
                            "the range " + v + " runs from harder " + "to easier (expected the easier grade first)");
                }
                b.add(gradeRange(d, lo, hi), Occur.SHOULD);
                any = true;
            } catch (GradeException e) {
                if (e.ambiguous()) {
                    throw new QuerySyntaxException(query, f.valuePosition(), e.getMessage());
                }
                problems.add(e.getMessage());
            }
        }
        if (!any) {
            throw new QuerySyntaxException(query, f.valuePosition(), problems.get(problems.size() - 1));
        }
        return b.build();
    }

    /**
     * Routes of a discipline between two grades (either may be null: open). Routes graded in the range's scale
     * compare by their order in it (their IRCRA values, which keep that order); others match when the centre of their
     * span lies within the rows the range covers, edges included (at least half of the route's span inside).
     */
    private static Query gradeRange(Discipline d, Grade lo, Grade hi) {
        GradeScale scale = lo == null ? hi.scale() : hi == null || hi.scale() == lo.scale() ? lo.scale() : null;
        BooleanQuery.Builder one = new BooleanQuery.Builder();
        one.add(new TermQuery(new Term(SearchFields.DISCIPLINE, d.word())), Occur.FILTER);
        Query rows = DoublePoint.newRangeQuery(
                SearchFields.IRCRA,
                lo == null ? Double.NEGATIVE_INFINITY : lo.rowsLow(),
                hi == null ? Double.POSITIVE_INFINITY : hi.rowsHigh());
        if (scale == null) {
            one.add(rows, Occur.MUST);
            return one.build();
        }
        Term own = new Term(SearchFields.SCALE, scale.name());
        BooleanQuery.Builder inScale = new BooleanQuery.Builder()
                .add(new TermQuery(own), Occur.FILTER)
                .add(
                        DoublePoint.newRangeQuery(
                                SearchFields.IRCRA,
                                lo == null ? Double.NEGATIVE_INFINITY : lo.ircra(),
                                hi == null ? Double.POSITIVE_INFINITY : hi.ircra()),
                        Occur.MUST);
        BooleanQuery.Builder otherScale =
                new BooleanQuery.Builder().add(rows, Occur.MUST).add(new TermQuery(own), Occur.MUST_NOT);
        one.add(
                new BooleanQuery.Builder()
                        .add(inScale.build(), Occur.SHOULD)
                        .add(otherScale.build(), Occur.SHOULD)
                        .setMinimumNumberShouldMatch(1)
                        .build(),
                Occur.MUST);
        return one.build();
    }

    private Grade read(String text, Discipline d) {
        return grades.read(text, d, null, Set.of());
    }

    private Query angle(String v, QueryNode.Field f) {
        String[] ends = range(v, f);
        try {
            double lo = ends[0].isEmpty() ? Double.NEGATIVE_INFINITY : Double.parseDouble(ends[0].replace(',', '.'));
            double hi = ends[1].isEmpty() ? Double.POSITIVE_INFINITY : Double.parseDouble(ends[1].replace(',', '.'));
            return DoublePoint.newRangeQuery(SearchFields.ANGLE, lo, hi);
        } catch (NumberFormatException e) {
            throw new QuerySyntaxException(
                    query,
                    f.valuePosition(),
                    "'" + v + "' is not an angle or range of angles " + "in degrees (such as 30 or 20..45)");
        }
    }

    private Query dates(String field, String v, QueryNode.Field f) {
        String[] ends = range(v, f);
        long lo = ends[0].isEmpty() ? Long.MIN_VALUE : date(ends[0], f).first().toEpochDay();
        long hi =
                ends[1].isEmpty() ? Long.MAX_VALUE - 1 : date(ends[1], f).last().toEpochDay();
        return LongPoint.newRangeQuery(field, lo, hi);
    }

    /**
     * Routes up at some point from {@code first} to {@code last} (one day: up that day): set on or before the last
     * day, not stripped by the first (a route is up on d when set_on &lt;= d &lt; stripped_on).
     */
    static Query standing(LocalDate first, LocalDate last) {
        BooleanQuery.Builder b = new BooleanQuery.Builder();
        b.add(LongPoint.newRangeQuery(SearchFields.SET, Long.MIN_VALUE, last.toEpochDay()), Occur.FILTER);
        b.add(LongPoint.newRangeQuery(SearchFields.STRIPPED, first.toEpochDay() + 1, Long.MAX_VALUE), Occur.FILTER);
        return b.build();
    }

    private PartialDate day(String v, QueryNode.Field f) {
        if (v.contains("..")) {
            throw new QuerySyntaxException(
                    query, f.valuePosition(), "standing takes one day or one month, not a " + "range");
        }
        return date(v, f);
    }

    private PartialDate date(String v, QueryNode.Field f) {
        try {
            return PartialDate.parse(v);
        } catch (IllegalArgumentException e) {
            throw new QuerySyntaxException(query, f.valuePosition(), e.getMessage());
        }
    }

    /** Splits {@code a..b}, {@code a..} and {@code ..b}; a single value gives both ends. */
    private String[] range(String v, QueryNode.Field f) {
        int dots = v.indexOf("..");
        if (dots < 0) {
            return new String[] {v, v};
        }
        String lo = v.substring(0, dots).strip();
        String hi = v.substring(dots + 2).strip();
        if (lo.isEmpty() && hi.isEmpty()) {
            throw new QuerySyntaxException(
                    query, f.valuePosition(), "a range needs at least one end, as V3..V5 or " + "2026-01..");
        }
        return new String[] {lo, hi};
    }
}
