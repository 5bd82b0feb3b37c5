package org.variset.bench;

import java.io.IOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.function.Supplier;
import org.apache.lucene.document.DoublePoint;
import org.apache.lucene.document.LongPoint;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.StoredFields;
import org.apache.lucene.index.Term;
import org.apache.lucene.search.BooleanClause.Occur;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.PhraseQuery;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.ScoreDoc;
import org.apache.lucene.search.Sort;
import org.apache.lucene.search.SortField;
import org.apache.lucene.search.TermQuery;
import org.apache.lucene.search.TopDocs;
import org.apache.lucene.search.TopFieldCollectorManager;
import org.apache.lucene.store.FSDirectory;
import org.variset.archive.grade.Discipline;
import org.variset.archive.grade.GradeReader;
import org.variset.archive.search.SearchHits;
import org.variset.archive.search.SearchIndex;
import org.variset.archive.search.SearchOrder;
import org.variset.archive.search.SearchRequest;
import org.variset.archive.search.SearchVocabulary;
import org.variset.archive.store.Archive;
import org.variset.archive.vocabulary.Vocabulary;

/**
 * Search latency in one warm JVM: Variset's search (query language parsed, vocabulary applied, Lucene query built
 * and run, first hits' ids read) against the same Lucene queries built by hand and run on the same index with the
 * same sort, count and hit reading. Each pair is checked to give the same total and the same first hits before
 * anything is timed, so the two sides do the same work.
 */
final class SearchPhase {
    private static final int LIMIT = 20;
    private static final int WARM_UP_ROUNDS = 20;
    private static final int ROUNDS = 60;
    private static final Sort RELEVANCE =
            new Sort(SortField.FIELD_SCORE, new SortField("set", SortField.Type.LONG, true));

    /** A query in Variset's language and the same query built by hand. */
    private record Case(String query, String gym, Supplier<Query> raw) {}

    private final Bench b;

    SearchPhase(Bench b) {
        this.b = b;
    }

    void run(Workload w) throws IOException {
        Path dir = ImportPhase.archive(b, w);
        String gym = "Synthetic Gym " + String.format(Locale.ROOT, "%03d", Math.min(13, w.gyms()));
        try (Archive archive = Archive.open(dir);
                SearchIndex index = SearchIndex.at(dir);
                DirectoryReader reader = DirectoryReader.open(FSDirectory.open(dir.resolve("index")))) {
            IndexSearcher searcher = new IndexSearcher(reader);
            List<Case> cases = cases(gym);
            Vocabulary all = SearchVocabulary.of(archive.connection(), null, Workload.END);
            Vocabulary own = SearchVocabulary.of(archive.connection(), gym, Workload.END);
            for (Case c : cases) {
                SearchHits v = variset(index, c, c.gym() == null ? all : own);
                List<Long> raw = new ArrayList<>();
                long total = raw(searcher, c, raw);
                List<Long> ids = v.hits().stream().map(SearchHits.Hit::routeId).toList();
                if (v.total() != total || !ids.equals(raw)) {
                    throw new IllegalStateException("the hand-built query for '" + c.query() + "' does not match "
                            + "Variset's: " + v.total() + " hits " + ids + " against " + total + " hits " + raw);
                }
                b.results.fact(String.format(
                        Locale.ROOT, "search '%s'%s: %,d hits", c.query(), c.gym() == null ? "" : " (--gym)", total));
            }
            List<Double> vt = new ArrayList<>();
            List<Double> rt = new ArrayList<>();
            int rounds = b.quick ? 5 : ROUNDS;
            for (int round = 0; round < WARM_UP_ROUNDS + rounds; round++) {
                boolean keep = round >= WARM_UP_ROUNDS;
                for (Case c : cases) {
                    Vocabulary voc = c.gym() == null ? all : own;
                    boolean rawFirst = round % 2 == 1;
                    if (rawFirst) {
                        time(keep ? rt : null, () -> raw(searcher, c, new ArrayList<>()));
                    }
                    time(keep ? vt : null, () -> variset(index, c, voc).total());
                    if (!rawFirst) {
                        time(keep ? rt : null, () -> raw(searcher, c, new ArrayList<>()));
                    }
                }
            }
            String note = String.format(
                    Locale.ROOT,
                    "%d queries x %d rounds after %d warm-up rounds, top %d by "
                            + "relevance with exact totals, on the %s chain's index (%,d routes)",
                    cases.size(),
                    rounds,
                    WARM_UP_ROUNDS,
                    LIMIT,
                    w.name(),
                    reader.numDocs());
            for (int p : new int[] {50, 95}) {
                double v = Stats.percentile(vt, p);
                double r = Stats.percentile(rt, p);
                b.results.add(
                        new Results.Row("search p" + p + ", " + w.name() + " chain", ms(v), ms(r), v / r, 1.3, note));
            }
        }
    }

    private interface Timed {
        Object run() throws IOException;
    }

    private static void time(List<Double> into, Timed t) throws IOException {
        long start = System.nanoTime();
        Object sink = t.run();
        long ns = System.nanoTime() - start;
        if (sink == null) {
            throw new IllegalStateException("no result");
        }
        if (into != null) {
            into.add(ns / 1e6);
        }
    }

    private static SearchHits variset(SearchIndex index, Case c, Vocabulary v) {
        return index.search(new SearchRequest(c.query(), c.gym(), null, null, SearchOrder.RELEVANCE, LIMIT, false), v);
    }

    /** Runs a hand-built query as Variset's search does its own: the sort, an exact total and the first ids. */
    private static long raw(IndexSearcher s, Case c, List<Long> ids) throws IOException {
        BooleanQuery.Builder q = new BooleanQuery.Builder().add(c.raw().get(), Occur.MUST);
        if (c.gym() != null) {
            q.add(new TermQuery(new Term("gym", c.gym().toLowerCase(Locale.ROOT))), Occur.FILTER);
        }
        TopDocs top =
                s.search(q.build(), new TopFieldCollectorManager(RELEVANCE, LIMIT, null, Integer.MAX_VALUE, false));
        StoredFields stored = s.storedFields();
        for (ScoreDoc d : top.scoreDocs) {
            ids.add(Long.parseLong(stored.document(d.doc).get("id")));
        }
        return top.totalHits.value;
    }

    private static List<Case> cases(String gym) {
        GradeReader grades = GradeReader.standard();
        double v4 = grades.read("V4", Discipline.BOULDER, null, Set.of()).lowLevel() - 0.5;
        double v6 = Math.nextDown(
                grades.read("V6", Discipline.BOULDER, null, Set.of()).highLevel() + 0.5);
        LocalDate day = LocalDate.of(2024, 6, 15);
        return List.of(
                new Case("hold:crimp@90", null, () -> term("hold", "crimp@90")),
                new Case("move:heel-hook", gym, () -> term("move", "heelhook")),
                new Case(
                        "hold:sloper grade:V4..V6",
                        null,
                        () -> and(
                                term("hold", "sloper"),
                                new BooleanQuery.Builder()
                                        .add(
                                                new BooleanQuery.Builder()
                                                        .add(term("discipline", "boulder"), Occur.FILTER)
                                                        .add(DoublePoint.newRangeQuery("ircra", v4, v6), Occur.MUST)
                                                        .build(),
                                                Occur.SHOULD)
                                        .build())),
                new Case("move:dyno hold:jug@0", null, () -> and(term("move", "dyno"), term("hold", "jug@0"))),
                new Case(
                        "grip:180 standing:2024-06-15",
                        null,
                        () -> and(
                                term("grip", "180"),
                                new BooleanQuery.Builder()
                                        .add(
                                                LongPoint.newRangeQuery("set", Long.MIN_VALUE, day.toEpochDay()),
                                                Occur.FILTER)
                                        .add(
                                                LongPoint.newRangeQuery(
                                                        "stripped", day.toEpochDay() + 1, Long.MAX_VALUE),
                                                Occur.FILTER)
                                        .build())),
                new Case(
                        "hold:pinch -move:dyno",
                        gym,
                        () -> new BooleanQuery.Builder()
                                .add(term("hold", "pinch"), Occur.MUST)
                                .add(term("move", "dyno"), Occur.MUST_NOT)
                                .build()),
                new Case(
                        "hold:crimp@90 OR hold:crimp@270",
                        null,
                        () -> new BooleanQuery.Builder()
                                .add(term("hold", "crimp@90"), Occur.SHOULD)
                                .add(term("hold", "crimp@270"), Occur.SHOULD)
                                .build()),
                new Case(
                        "heel hook",
                        null,
                        () -> and(new BooleanQuery.Builder()
                                .add(term("move", "heelhook"), Occur.SHOULD)
                                .add(new PhraseQuery("text", "heel", "hook"), Occur.SHOULD)
                                .build())));
    }

    private static Query term(String field, String value) {
        return new TermQuery(new Term(field, value));
    }

    private static Query and(Query... qs) {
        BooleanQuery.Builder b = new BooleanQuery.Builder();
        for (Query q : qs) {
            b.add(q, Occur.MUST);
        }
        return b.build();
    }

    private static String ms(double x) {
        return String.format(Locale.ROOT, "%.2f ms", x);
    }
}
