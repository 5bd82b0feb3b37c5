package org.variset.archive.search;

/** The names of the index's fields and facet dimensions. */
final class SearchFields {
    /** The route's database id, stored: the key for updates and for reading hits back from the database. */
    static final String ID = "id";

    static final String GYM = "gym";
    static final String WALL = "wall";
    static final String LABEL = "route";
    static final String COLOR = "color";
    static final String SETTER = "setter";
    /** Each word of each setter's name, so that {@code setter:dario} finds Dario Penhale. */
    static final String SETTER_WORD = "setter_word";

    static final String DISCIPLINE = "discipline";
    static final String GRADE = "grade";
    static final String BAND = "band";
    /** The IRCRA value: points for ranges, doc values for sorting. */
    static final String IRCRA = "ircra";
    /** The scale the route's grade was written in ({@code V}, {@code FONT}, ...): a grade range of that scale reads
     * the route by its order in it (docs/spec/grades.md, "Grade ranges"). */
    static final String SCALE = "scale";
    /** The set date as an epoch day: points for ranges, doc values for sorting. */
    static final String SET = "set";
    /** The strip date as an epoch day, {@link Long#MAX_VALUE} while up. */
    static final String STRIPPED = "stripped";

    static final String ANGLE = "angle";
    /**
     * Hold types and type@direction ({@code crimp}, {@code crimp@90}) of hand-role placements and all types, and the
     * same with the hold's size ({@code sloper+xl}, {@code sloper@90+xl}), so that one query term asks for one hold.
     */
    static final String HOLD = "hold";
    /** Directions of hand grips as sector centres ({@code 0}, {@code 45}, ..., {@code 315}). */
    static final String GRIP = "grip";

    static final String SIZE = "size";
    static final String MOVE = "move";
    static final String STYLE = "style";
    static final String NOTES = "notes";
    /** Everything people may type without a field: label, wall, colour, setters, grade, moves, styles, holds, notes. */
    static final String TEXT = "text";

    private SearchFields() {}
}
