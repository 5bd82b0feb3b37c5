package org.variset.archive.route;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.FetchType;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.ManyToOne;
import jakarta.persistence.SequenceGenerator;
import jakarta.persistence.Table;
import java.time.LocalDate;
import java.util.Objects;
import org.variset.archive.gym.Gym;
import org.variset.archive.gym.Wall;

/**
 * One reset of one wall: the routes set together. Its label is unique within the gym; its date is the earliest
 * set_on of its routes, since a reset may span two days (docs/spec/interchange.md). Its setters are those of its routes.
 */
@Entity
@Table(name = "reset")
public class Reset {
    @Id
    @GeneratedValue(strategy = GenerationType.SEQUENCE, generator = "reset_seq")
    @SequenceGenerator(name = "reset_seq", sequenceName = "reset_seq", allocationSize = 50)
    private Long id;

    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "gym_id", nullable = false)
    private Gym gym;

    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "wall_id", nullable = false)
    private Wall wall;

    @Column(nullable = false)
    private String label;

    @Column(name = "reset_on", nullable = false)
    private LocalDate resetOn;

    /** For Hibernate. */
    protected Reset() {}

    /** A reset of a wall, dated by its first route. */
    public Reset(Wall wall, String label, LocalDate resetOn) {
        this.wall = Objects.requireNonNull(wall, "wall");
        this.gym = wall.gym();
        if (label == null || label.isBlank()) {
            throw new IllegalArgumentException("a reset label must not be blank");
        }
        this.label = label.strip();
        this.resetOn = Objects.requireNonNull(resetOn, "resetOn");
    }

    /** The default label of a reset: {@code <wall> <set_on>} (docs/spec/interchange.md). */
    public static String defaultLabel(String wallName, LocalDate setOn) {
        return wallName + " " + setOn;
    }

    /** The database id, null until stored. */
    public Long id() {
        return id;
    }

    /** The gym. */
    public Gym gym() {
        return gym;
    }

    /** The wall that was reset. */
    public Wall wall() {
        return wall;
    }

    /** The reset's label. */
    public String label() {
        return label;
    }

    /** The date of the reset: the earliest set_on of its routes. */
    public LocalDate resetOn() {
        return resetOn;
    }

    /** Moves the reset's date earlier when a route of it went up before the date known so far. */
    public void includeSetOn(LocalDate setOn) {
        if (setOn.isBefore(resetOn)) {
            resetOn = setOn;
        }
    }

    @Override
    public String toString() {
        return "Reset[" + label + " " + resetOn + "]";
    }
}
