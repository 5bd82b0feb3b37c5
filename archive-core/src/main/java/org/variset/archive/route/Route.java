package org.variset.archive.route;

import jakarta.persistence.CascadeType;
import jakarta.persistence.Column;
import jakarta.persistence.Convert;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.FetchType;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.JoinTable;
import jakarta.persistence.ManyToMany;
import jakarta.persistence.ManyToOne;
import jakarta.persistence.OneToMany;
import jakarta.persistence.OrderBy;
import jakarta.persistence.OrderColumn;
import jakarta.persistence.SequenceGenerator;
import jakarta.persistence.Table;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.variset.archive.grade.Discipline;
import org.variset.archive.grade.Grade;
import org.variset.archive.grade.GradeScale;
import org.variset.archive.gym.Gym;
import org.variset.archive.gym.Wall;
import org.variset.archive.mapping.ExtraFieldsConverter;
import org.variset.archive.mapping.IntegerListConverter;
import org.variset.archive.mapping.StringListConverter;

/**
 * A route or boulder problem. It is identified by (gym, wall, label, set_on): the same label may come back in
 * a later reset or on another wall (docs/spec/interchange.md). It is standing on date d when set_on &lt;= d and it has not
 * been stripped on or before d.
 */
@Entity
@Table(name = "route")
public class Route {
    @Id
    @GeneratedValue(strategy = GenerationType.SEQUENCE, generator = "route_seq")
    @SequenceGenerator(name = "route_seq", sequenceName = "route_seq", allocationSize = 50)
    private Long id;

    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "gym_id", nullable = false)
    private Gym gym;

    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "wall_id", nullable = false)
    private Wall wall;

    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "reset_id", nullable = false)
    private Reset reset;

    @Column(nullable = false)
    private String label;

    @Column(name = "set_on", nullable = false)
    private LocalDate setOn;

    @Column(name = "stripped_on")
    private LocalDate strippedOn;

    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    private Discipline discipline;

    @Column(name = "grade_text", nullable = false)
    private String gradeText;

    @Enumerated(EnumType.STRING)
    @Column(name = "grade_scale", nullable = false)
    private GradeScale gradeScale;

    @Column(name = "grade_ircra", nullable = false)
    private double gradeIrcra;

    private String color;

    @Column(name = "angle_deg")
    private Double angleDeg;

    @ManyToMany(fetch = FetchType.LAZY)
    @JoinTable(
            name = "route_setter",
            joinColumns = @JoinColumn(name = "route_id"),
            inverseJoinColumns = @JoinColumn(name = "setter_id"))
    @OrderColumn(name = "ord")
    private List<Setter> setters = new ArrayList<>();

    @Convert(converter = StringListConverter.class)
    @Column(length = 10_000)
    private List<String> moves = new ArrayList<>();

    @Convert(converter = StringListConverter.class)
    @Column(length = 10_000)
    private List<String> styles = new ArrayList<>();

    @Convert(converter = IntegerListConverter.class)
    @Column(name = "move_difficulty", length = 10_000)
    private List<Integer> moveDifficulty = new ArrayList<>();

    @Column(length = 100_000)
    private String notes;

    @Convert(converter = ExtraFieldsConverter.class)
    @Column(name = "extra_fields", length = 100_000)
    private Map<String, String> extraFields = new LinkedHashMap<>();

    @OneToMany(mappedBy = "route", cascade = CascadeType.ALL, orphanRemoval = true)
    @OrderBy("ordinal")
    private List<HoldPlacement> holds = new ArrayList<>();

    /** For Hibernate. */
    protected Route() {}

    /**
     * A route of a reset.
     *
     * @throws IllegalArgumentException when the label is blank or the reset is on another wall
     */
    public Route(Reset reset, String label, LocalDate setOn, Discipline discipline, Grade grade) {
        this.reset = Objects.requireNonNull(reset, "reset");
        this.wall = reset.wall();
        this.gym = reset.gym();
        if (label == null || label.isBlank()) {
            throw new IllegalArgumentException("a route label must not be blank");
        }
        this.label = label.strip();
        this.setOn = Objects.requireNonNull(setOn, "setOn");
        this.discipline = Objects.requireNonNull(discipline, "discipline");
        setGrade(grade);
        reset.includeSetOn(setOn);
    }

    /** The database id, null until stored. */
    public Long id() {
        return id;
    }

    /** The gym. */
    public Gym gym() {
        return gym;
    }

    /** The wall. */
    public Wall wall() {
        return wall;
    }

    /** The reset this route belongs to. */
    public Reset reset() {
        return reset;
    }

    /**
     * Moves the route to another reset of the same wall.
     *
     * @throws IllegalArgumentException when the reset is on another wall
     */
    public void setReset(Reset other) {
        Objects.requireNonNull(other, "reset");
        if (!Objects.equals(other.wall().id(), wall.id())) {
            throw new IllegalArgumentException("reset " + other.label() + " is on another wall than route " + label);
        }
        this.reset = other;
        other.includeSetOn(setOn);
    }

    /** The gym's label for the route. */
    public String label() {
        return label;
    }

    /** The date the route went up. */
    public LocalDate setOn() {
        return setOn;
    }

    /** The date it came down, or null while it is up. */
    public LocalDate strippedOn() {
        return strippedOn;
    }

    /** True when the route is up on the date: set_on &lt;= d &lt; stripped_on (docs/spec/metrics.md). */
    public boolean standingOn(LocalDate d) {
        return !setOn.isAfter(d) && (strippedOn == null || d.isBefore(strippedOn));
    }

    /**
     * Marks the route as stripped on a date, or as standing again with null.
     *
     * @throws IllegalArgumentException when the date is not after set_on
     */
    public void setStrippedOn(LocalDate date) {
        if (date != null && !date.isAfter(setOn)) {
            throw new IllegalArgumentException("stripped_on " + date + " is not after set_on " + setOn);
        }
        this.strippedOn = date;
    }

    /** Boulder or rope. */
    public Discipline discipline() {
        return discipline;
    }

    /** The grade as written. */
    public String gradeText() {
        return gradeText;
    }

    /** The scale the grade was read in. */
    public GradeScale gradeScale() {
        return gradeScale;
    }

    /** The grade's value on the IRCRA axis. */
    public double gradeIrcra() {
        return gradeIrcra;
    }

    /** Sets the grade from its reading, keeping the text as written. */
    public void setGrade(Grade grade) {
        Objects.requireNonNull(grade, "grade");
        this.gradeText = grade.text().strip();
        this.gradeScale = grade.scale();
        this.gradeIrcra = grade.ircra();
    }

    /** Tape or hold colour, or null. */
    public String color() {
        return color;
    }

    /** Sets the colour. */
    public void setColor(String color) {
        this.color = blankToNull(color);
    }

    /** The angle where the route climbs, or null to use the wall's. */
    public Double angleDeg() {
        return angleDeg;
    }

    /** The route's angle, else its wall's, else null. */
    public Double effectiveAngleDeg() {
        return angleDeg != null ? angleDeg : wall.angleDeg();
    }

    /**
     * Sets the angle from vertical.
     *
     * @throws IllegalArgumentException outside -45..90
     */
    public void setAngleDeg(Double angleDeg) {
        if (angleDeg != null && (angleDeg < -45 || angleDeg > 90)) {
            throw new IllegalArgumentException("angle " + angleDeg + " is outside -45..90 degrees");
        }
        this.angleDeg = angleDeg;
    }

    /** The setters, in the order given. */
    public List<Setter> setters() {
        return setters;
    }

    /** Replaces the setters. */
    public void setSetters(List<Setter> list) {
        this.setters = new ArrayList<>(list);
    }

    /** Notable move descriptors in climbing order. */
    public List<String> moves() {
        return moves;
    }

    /** Replaces the moves. */
    public void setMoves(List<String> list) {
        this.moves = new ArrayList<>(list);
    }

    /** Style tags. */
    public List<String> styles() {
        return styles;
    }

    /** Replaces the styles. */
    public void setStyles(List<String> list) {
        this.styles = new ArrayList<>(list);
    }

    /** The setters' sense of each hand move's difficulty, 1 to 10, in order. */
    public List<Integer> moveDifficulty() {
        return moveDifficulty;
    }

    /**
     * Replaces the move difficulties.
     *
     * @throws IllegalArgumentException for a value outside 1..10
     */
    public void setMoveDifficulty(List<Integer> list) {
        for (Integer d : list) {
            if (d == null || d < 1 || d > 10) {
                throw new IllegalArgumentException("move difficulty " + d + " is outside 1..10");
            }
        }
        this.moveDifficulty = new ArrayList<>(list);
    }

    /** Free-text notes, or null. */
    public String notes() {
        return notes;
    }

    /** Sets the notes. */
    public void setNotes(String notes) {
        this.notes = blankToNull(notes);
    }

    /** Extra columns the user brought, in file order. */
    public Map<String, String> extraFields() {
        return extraFields;
    }

    /** Replaces the extra fields. */
    public void setExtraFields(Map<String, String> extra) {
        this.extraFields = new LinkedHashMap<>(extra);
    }

    /** The hold placements in file order. */
    public List<HoldPlacement> holds() {
        return holds;
    }

    /** Adds a hold placement at the end. */
    public HoldPlacement addHold(HoldPlacement.Spec spec) {
        HoldPlacement h = new HoldPlacement(this, holds.size(), spec);
        holds.add(h);
        return h;
    }

    /** Removes every hold placement (a route's holds are replaced as one unit). */
    public void clearHolds() {
        holds.clear();
    }

    static String blankToNull(String s) {
        return s == null || s.isBlank() ? null : s;
    }

    @Override
    public String toString() {
        return "Route[" + label + " " + setOn + "]";
    }
}
