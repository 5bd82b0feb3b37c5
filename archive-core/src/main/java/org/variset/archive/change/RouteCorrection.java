package org.variset.archive.change;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.hibernate.Session;
import org.variset.archive.changelog.ChangeLog;
import org.variset.archive.grade.GradeReader;
import org.variset.archive.grade.GradeScale;
import org.variset.archive.gym.Gym;
import org.variset.archive.gym.Wall;
import org.variset.archive.problem.InputException;
import org.variset.archive.route.Route;
import org.variset.archive.route.Setter;
import org.variset.archive.settings.GymVocabularies;
import org.variset.archive.store.ArchiveQueries;
import org.variset.archive.store.GymLookup;
import org.variset.archive.store.Transaction;
import org.variset.archive.vocabulary.Vocabulary;
import org.variset.archive.vocabulary.VocabularyField;

/**
 * Corrects one route's fields without re-importing a file. Every field is optional; what is given replaces the
 * archived value, and the list of what changed is returned.
 *
 * @param grade the grade as written, or null to keep it
 * @param gradeScale the grade's scale when the text fits two, or null
 * @param setters the setters, or null to keep them
 * @param moves the moves (vocabulary spellings become terms), or null
 * @param styles the styles, or null
 * @param moveDifficulty the move difficulties, or null
 * @param strippedOn the strip date, or null to keep it
 * @param standing true to mark the route as up again (clears the strip date)
 * @param color the colour, or null
 * @param notes the notes, or null
 */
public record RouteCorrection(
        String grade,
        GradeScale gradeScale,
        List<String> setters,
        List<String> moves,
        List<String> styles,
        List<Integer> moveDifficulty,
        LocalDate strippedOn,
        boolean standing,
        String color,
        String notes) {

    /**
     * What a correction did.
     *
     * @param route the route corrected, as {@code label (set_on, wall)}
     * @param changed what changed, as {@code field: old -> new}; empty when nothing was given
     */
    public record Result(String route, List<String> changed) {}

    /**
     * Applies the correction to the named route in the caller's transaction; moves and styles are read with the
     * vocabulary its gym had on the day it was set, as an import reads them.
     *
     * @param gym the gym, or null when the archive holds one
     * @throws IllegalArgumentException for an unknown gym, wall or route, or a bad grade, date or value
     */
    public Result apply(Transaction tx, String gym, String wall, String label, LocalDate setOn) {
        GymLookup lookup = new GymLookup(tx);
        Gym g = lookup.gym(gym);
        Wall w = lookup.wall(g, wall);
        Route r = new ArchiveQueries(tx.session())
                .route(w, label, setOn)
                .orElseThrow(() -> new InputException(
                        InputException.Reason.NOT_FOUND,
                        "no route '" + label + "' set on " + setOn + " on " + w.name()));
        Vocabulary v = GymVocabularies.of(tx.readConnection()).on(g.name(), r.setOn());
        return new Result(label + " (" + setOn + ", " + w.name() + ")", apply(tx.session(), r, v));
    }

    /**
     * Applies the correction in the caller's transaction.
     *
     * @return what changed, as {@code field: old -> new}
     * @throws IllegalArgumentException for a bad grade, date or value
     */
    public List<String> apply(Session s, Route r, Vocabulary vocabulary) {
        List<String> changed = new ArrayList<>();
        if (grade != null) {
            changed.add("grade: " + r.gradeText() + " -> " + grade);
            r.setGrade(GradeReader.standard().read(grade, r.discipline(), gradeScale, Set.of()));
        }
        if (setters != null) {
            changed.add("setters: " + r.setters() + " -> " + setters);
            r.setSetters(setters.stream().map(n -> setter(s, n)).toList());
        }
        if (moves != null) {
            List<String> terms = terms(vocabulary, VocabularyField.MOVES, moves);
            changed.add("moves: " + r.moves() + " -> " + terms);
            r.setMoves(terms);
        }
        if (styles != null) {
            List<String> terms = terms(vocabulary, VocabularyField.STYLES, styles);
            changed.add("styles: " + r.styles() + " -> " + terms);
            r.setStyles(terms);
        }
        if (moveDifficulty != null) {
            changed.add("move_difficulty: " + r.moveDifficulty() + " -> " + moveDifficulty);
            r.setMoveDifficulty(moveDifficulty);
        }
        if (standing || strippedOn != null) {
            changed.add("stripped_on: " + r.strippedOn() + " -> " + (standing ? "(still up)" : strippedOn));
            r.setStrippedOn(standing ? null : strippedOn);
        }
        if (color != null) {
            changed.add("color: " + r.color() + " -> " + color);
            r.setColor(color);
        }
        if (notes != null) {
            changed.add("notes: changed");
            r.setNotes(notes);
        }
        if (!changed.isEmpty()) {
            ChangeLog.routes(s, List.of(r.id()));
        }
        return changed;
    }

    private static List<String> terms(Vocabulary v, VocabularyField field, List<String> given) {
        return given.stream().map(t -> v.termOrAsWritten(field, t)).toList();
    }

    private static Setter setter(Session s, String name) {
        Setter x = s.createSelectionQuery("from Setter where name = :n", Setter.class)
                .setParameter("n", name.strip())
                .uniqueResult();
        if (x == null) {
            x = new Setter(name);
            s.persist(x);
        }
        return x;
    }
}
