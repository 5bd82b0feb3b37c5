package org.variset.archive.search;

import java.util.LinkedHashSet;
import java.util.Set;
import org.apache.lucene.index.Term;
import org.apache.lucene.search.BooleanClause.Occur;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.TermQuery;
import org.variset.archive.read.HoldRecord;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.route.GripDirection;
import org.variset.archive.vocabulary.Vocabulary;
import org.variset.archive.vocabulary.VocabularyField;

/** The query for routes like a given one: any of its hand-hold directions or moves, same discipline, not itself. */
final class Candidates {
    private Candidates() {}

    /** The query, or null when the route has no hand hold and no move to look for. */
    static Query of(RouteRecord r, Vocabulary vocabulary) {
        TermKeys keys = TermKeys.of(vocabulary);
        Set<Term> terms = new LinkedHashSet<>();
        for (HoldRecord h : r.handHoldsInOrder()) {
            String type = keys.key(VocabularyField.HOLD_TYPES, h.type());
            if (h.grips().isEmpty()) {
                terms.add(new Term(SearchFields.HOLD, type));
            }
            h.grips().forEach(g -> terms.add(new Term(SearchFields.HOLD, type + "@" + 45 * GripDirection.sector(g))));
        }
        r.moves().forEach(m -> terms.add(new Term(SearchFields.MOVE, keys.key(VocabularyField.MOVES, m))));
        if (terms.isEmpty()) {
            return null;
        }
        BooleanQuery.Builder any = new BooleanQuery.Builder();
        terms.forEach(t -> any.add(new TermQuery(t), Occur.SHOULD));
        BooleanQuery.Builder b = new BooleanQuery.Builder();
        b.add(any.build(), Occur.MUST);
        b.add(new TermQuery(new Term(SearchFields.DISCIPLINE, r.discipline().word())), Occur.FILTER);
        b.add(new TermQuery(new Term(SearchFields.ID, Long.toString(r.id()))), Occur.MUST_NOT);
        return b.build();
    }
}
