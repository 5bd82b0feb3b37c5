package org.variset.archive.search;

import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.lucene.facet.FacetResult;
import org.apache.lucene.facet.FacetsCollectorManager;
import org.apache.lucene.facet.FacetsConfig;
import org.apache.lucene.facet.LabelAndValue;
import org.apache.lucene.facet.sortedset.DefaultSortedSetDocValuesReaderState;
import org.apache.lucene.facet.sortedset.SortedSetDocValuesFacetCounts;
import org.apache.lucene.index.StoredFields;
import org.apache.lucene.index.Term;
import org.apache.lucene.search.BooleanClause.Occur;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.ScoreDoc;
import org.apache.lucene.search.Sort;
import org.apache.lucene.search.SortField;
import org.apache.lucene.search.TermQuery;
import org.apache.lucene.search.TopDocs;
import org.apache.lucene.search.TopFieldCollectorManager;
import org.variset.archive.vocabulary.Vocabulary;

/** Builds a request's Lucene query (the typed query plus the command line's filters) and runs it. */
final class SearchQueries {
    private static final int FACET_VALUES = 12;

    private SearchQueries() {}

    /** The query of a request. */
    static Query of(SearchRequest r, Vocabulary vocabulary) {
        BooleanQuery.Builder b = new BooleanQuery.Builder();
        b.add(new QueryBuilder(r.query(), vocabulary).build(QueryParser.parse(r.query())), Occur.MUST);
        if (r.gym() != null) {
            b.add(new TermQuery(new Term(SearchFields.GYM, TermKeys.keyword(r.gym()))), Occur.FILTER);
        }
        if (r.wall() != null) {
            b.add(new TermQuery(new Term(SearchFields.WALL, TermKeys.keyword(r.wall()))), Occur.FILTER);
        }
        if (r.standingOn() != null) {
            b.add(QueryBuilder.standing(r.standingOn(), r.standingOn()), Occur.FILTER);
        }
        return b.build();
    }

    /** Runs a query: the first hits in the order asked for, the total, and the facets when asked for. */
    static SearchHits run(IndexSearcher s, Query q, SearchRequest r, FacetsConfig config) throws IOException {
        Sort sort = switch (r.order()) {
            case RELEVANCE ->
                new Sort(SortField.FIELD_SCORE, new SortField(SearchFields.SET, SortField.Type.LONG, true));
            case NEWEST -> new Sort(new SortField(SearchFields.SET, SortField.Type.LONG, true));
            case GRADE ->
                new Sort(
                        new SortField(SearchFields.IRCRA, SortField.Type.DOUBLE),
                        new SortField(SearchFields.SET, SortField.Type.LONG, true));
        };
        TopDocs top;
        Map<String, List<SearchHits.FacetCount>> facets = new LinkedHashMap<>();
        if (r.facets()) {
            FacetsCollectorManager.FacetsResult result =
                    FacetsCollectorManager.search(s, q, r.limit(), sort, true, new FacetsCollectorManager());
            top = result.topDocs();
            facets(s, result, config, facets);
        } else {
            // One pass gives the first hits and the exact number of matches.
            top = s.search(q, new TopFieldCollectorManager(sort, r.limit(), null, Integer.MAX_VALUE, false));
        }
        StoredFields stored = s.storedFields();
        List<SearchHits.Hit> hits = new ArrayList<>();
        for (ScoreDoc d : top.scoreDocs) {
            hits.add(new SearchHits.Hit(Long.parseLong(stored.document(d.doc).get(SearchFields.ID)), score(d)));
        }
        long total = r.facets() && top.totalHits.relation != org.apache.lucene.search.TotalHits.Relation.EQUAL_TO
                ? s.count(q)
                : top.totalHits.value;
        return new SearchHits(total, hits, facets);
    }

    /** A hit's score: a sorted search keeps it among the sort values; 0 where none was computed. */
    private static float score(ScoreDoc d) {
        if (d instanceof org.apache.lucene.search.FieldDoc f) {
            for (Object v : f.fields) {
                if (v instanceof Float x) {
                    return x;
                }
            }
        }
        return Float.isNaN(d.score) ? 0 : d.score;
    }

    private static void facets(
            IndexSearcher s,
            FacetsCollectorManager.FacetsResult result,
            FacetsConfig config,
            Map<String, List<SearchHits.FacetCount>> out)
            throws IOException {
        DefaultSortedSetDocValuesReaderState state;
        try {
            state = new DefaultSortedSetDocValuesReaderState(s.getIndexReader(), config);
        } catch (IllegalArgumentException noFacetsIndexedYet) {
            return;
        }
        SortedSetDocValuesFacetCounts counts = new SortedSetDocValuesFacetCounts(state, result.facetsCollector());
        for (String dim : RouteDocuments.FACETS) {
            List<SearchHits.FacetCount> values = new ArrayList<>();
            FacetResult fr;
            try {
                fr = counts.getTopChildren(FACET_VALUES, dim);
            } catch (IllegalArgumentException dimensionNeverIndexed) {
                fr = null;
            }
            if (fr != null) {
                for (LabelAndValue lv : fr.labelValues) {
                    values.add(new SearchHits.FacetCount(lv.label, lv.value.longValue()));
                }
            }
            out.put(dim, values);
        }
    }
}
