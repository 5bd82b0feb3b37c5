package org.variset.archive.search;

import java.util.Arrays;
import java.util.LinkedHashSet;
import java.util.Set;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.DoubleDocValuesField;
import org.apache.lucene.document.DoublePoint;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.LongPoint;
import org.apache.lucene.document.NumericDocValuesField;
import org.apache.lucene.document.StringField;
import org.apache.lucene.document.TextField;
import org.apache.lucene.facet.FacetsConfig;
import org.apache.lucene.facet.sortedset.SortedSetDocValuesFacetField;
import org.variset.archive.grade.Band;
import org.variset.archive.read.HoldRecord;
import org.variset.archive.read.RouteRecord;
import org.variset.archive.route.GripDirection;
import org.variset.archive.settings.GymSettings;
import org.variset.archive.vocabulary.VocabularyField;

/**
 * Builds the index document of a route. Facet dimensions: move, hold, grip, band, wall, setter (labels as people
 * read them: the term, the direction word, the band label).
 */
final class RouteDocuments {
    static final String[] FACETS = {"move", "hold", "grip", "band", "wall", "setter"};
    /** Term keys by vocabulary (by identity: settings share one vocabulary for as long as it is in effect). */
    private RouteDocuments() {}

    /** The facets configuration every writer and reader shares. */
    static FacetsConfig facetsConfig() {
        FacetsConfig c = new FacetsConfig();
        for (String dim : new String[] {"move", "hold", "grip", "setter"}) {
            c.setMultiValued(dim, true);
        }
        return c;
    }

    /** The grade's value (points for ranges, doc values for sorting) and the scale it was written in. */
    private static void grade(Document d, RouteRecord r) {
        d.add(new DoublePoint(SearchFields.IRCRA, r.ircra()));
        d.add(new DoubleDocValuesField(SearchFields.IRCRA, r.ircra()));
        d.add(new StringField(SearchFields.SCALE, r.gradeScale().name(), Field.Store.NO));
    }

    /** The document of a route, with the bands and vocabulary of the settings in effect on its set date. */
    static Document of(RouteRecord r, GymSettings s) {
        TermKeys keys = TermKeys.of(s.vocabulary());
        Document d = new Document();
        d.add(new StringField(SearchFields.ID, Long.toString(r.id()), Field.Store.YES));
        keyword(d, SearchFields.GYM, r.gym());
        keyword(d, SearchFields.WALL, r.wall());
        keyword(d, SearchFields.LABEL, r.label());
        keyword(d, SearchFields.COLOR, r.color());
        keyword(d, SearchFields.DISCIPLINE, r.discipline().word());
        keyword(d, SearchFields.GRADE, r.gradeText());
        r.setters().forEach(x -> keyword(d, SearchFields.SETTER, x));
        r.setters().stream()
                .flatMap(x -> Arrays.stream(TermKeys.keyword(x).split(" ")))
                .distinct()
                .forEach(w -> keyword(d, SearchFields.SETTER_WORD, w));
        grade(d, r);
        d.add(new LongPoint(SearchFields.SET, r.setOn().toEpochDay()));
        d.add(new NumericDocValuesField(SearchFields.SET, r.setOn().toEpochDay()));
        d.add(new LongPoint(
                SearchFields.STRIPPED,
                r.strippedOn() == null ? Long.MAX_VALUE : r.strippedOn().toEpochDay()));
        if (r.angleDeg() != null) {
            d.add(new DoublePoint(SearchFields.ANGLE, r.angleDeg()));
        }
        String band = s.bands(r.discipline()).bandOf(r.ircra()).map(Band::label).orElse(null);
        keyword(d, SearchFields.BAND, band);
        facet(d, "band", band);
        facet(d, "wall", r.wall());
        r.setters().forEach(x -> facet(d, "setter", x));
        holds(d, r, keys);
        StringBuilder text = new StringBuilder();
        for (String m : r.moves()) {
            d.add(new StringField(SearchFields.MOVE, keys.key(VocabularyField.MOVES, m), Field.Store.NO));
            String term = keys.term(VocabularyField.MOVES, m);
            facet(d, "move", term != null ? term : TermKeys.keyword(m));
            text.append(' ').append(m).append(' ').append(keys.key(VocabularyField.MOVES, m));
        }
        for (String st : r.styles()) {
            d.add(new StringField(SearchFields.STYLE, keys.key(VocabularyField.STYLES, st), Field.Store.NO));
            text.append(' ').append(st);
        }
        if (r.notes() != null) {
            d.add(new TextField(SearchFields.NOTES, r.notes(), Field.Store.NO));
        }
        text.append(' ')
                .append(r.label())
                .append(' ')
                .append(r.wall())
                .append(' ')
                .append(r.gradeText());
        text.append(' ').append(r.color() == null ? "" : r.color()).append(' ').append(String.join(" ", r.setters()));
        r.holds().stream()
                .map(HoldRecord::type)
                .distinct()
                .forEach(t -> text.append(' ').append(t));
        text.append(' ').append(r.notes() == null ? "" : r.notes());
        d.add(new TextField(SearchFields.TEXT, text.toString(), Field.Store.NO));
        return d;
    }

    private static void holds(Document d, RouteRecord r, TermKeys keys) {
        Set<String> hold = new LinkedHashSet<>();
        Set<String> grips = new LinkedHashSet<>();
        Set<String> sizes = new LinkedHashSet<>();
        Set<String> facetTypes = new LinkedHashSet<>();
        for (HoldRecord h : r.holds()) {
            String type = keys.key(VocabularyField.HOLD_TYPES, h.type());
            String size = h.size() == null ? null : "+" + h.size().word();
            hold.add(type);
            facetTypes.add(h.type());
            if (size != null) {
                sizes.add(h.size().word());
                hold.add(type + size);
            }
            if (h.isHand()) {
                for (double g : h.grips()) {
                    int sector = GripDirection.sector(g);
                    hold.add(type + "@" + 45 * sector);
                    if (size != null) {
                        hold.add(type + "@" + 45 * sector + size);
                    }
                    grips.add(Integer.toString(45 * sector));
                }
            }
        }
        hold.forEach(x -> d.add(new StringField(SearchFields.HOLD, x, Field.Store.NO)));
        grips.forEach(x -> {
            d.add(new StringField(SearchFields.GRIP, x, Field.Store.NO));
            facet(d, "grip", GripDirection.sectorWord(Integer.parseInt(x) / 45));
        });
        sizes.forEach(x -> d.add(new StringField(SearchFields.SIZE, x, Field.Store.NO)));
        facetTypes.forEach(x -> facet(d, "hold", x));
    }

    private static void keyword(Document d, String field, String value) {
        if (value != null && !value.isBlank()) {
            d.add(new StringField(field, TermKeys.keyword(value), Field.Store.NO));
        }
    }

    private static void facet(Document d, String dim, String label) {
        if (label != null && !label.isBlank()) {
            d.add(new SortedSetDocValuesFacetField(dim, label));
        }
    }
}
