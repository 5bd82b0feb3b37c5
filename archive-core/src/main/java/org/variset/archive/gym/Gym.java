package org.variset.archive.gym;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.SequenceGenerator;
import jakarta.persistence.Table;
import java.time.ZoneId;
import java.util.Objects;

/** A climbing gym: the top of the archive. Its name is unique in the archive. */
@Entity
@Table(name = "gym")
public class Gym {
    @Id
    @GeneratedValue(strategy = GenerationType.SEQUENCE, generator = "gym_seq")
    @SequenceGenerator(name = "gym_seq", sequenceName = "gym_seq", allocationSize = 50)
    private Long id;

    @Column(nullable = false, unique = true)
    private String name;

    @Column(name = "time_zone", nullable = false)
    private String timeZone;

    /** For Hibernate. */
    protected Gym() {}

    /**
     * A new gym.
     *
     * @param name the gym's name, not blank
     * @param zone the gym's time zone, which decides what "today" is
     */
    public Gym(String name, ZoneId zone) {
        this.name = requireName(name);
        this.timeZone = Objects.requireNonNull(zone, "zone").getId();
    }

    static String requireName(String name) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a name must not be blank");
        }
        return name.strip();
    }

    /** The database id, null until stored. */
    public Long id() {
        return id;
    }

    /** The gym's name. */
    public String name() {
        return name;
    }

    /** Renames the gym. */
    public void rename(String newName) {
        this.name = requireName(newName);
    }

    /** The gym's time zone. */
    public ZoneId zone() {
        return ZoneId.of(timeZone);
    }

    @Override
    public String toString() {
        return "Gym[" + name + "]";
    }
}
