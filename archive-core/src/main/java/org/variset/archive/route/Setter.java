package org.variset.archive.route;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.SequenceGenerator;
import jakarta.persistence.Table;

/**
 * A route setter. Setters are shared across the gyms of an archive (a chain's setters move between gyms); the
 * name, after trimming, is unique.
 */
@Entity
@Table(name = "setter")
public class Setter {
    @Id
    @GeneratedValue(strategy = GenerationType.SEQUENCE, generator = "setter_seq")
    @SequenceGenerator(name = "setter_seq", sequenceName = "setter_seq", allocationSize = 50)
    private Long id;

    @Column(nullable = false, unique = true)
    private String name;

    /** For Hibernate. */
    protected Setter() {}

    /** A setter with a name. */
    public Setter(String name) {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a setter's name must not be blank");
        }
        this.name = name.strip();
    }

    /** The database id, null until stored. */
    public Long id() {
        return id;
    }

    /** The setter's name. */
    public String name() {
        return name;
    }

    /** Renames the setter everywhere (every route refers to this one row). */
    public void rename(String newName) {
        if (newName == null || newName.isBlank()) {
            throw new IllegalArgumentException("a setter's name must not be blank");
        }
        this.name = newName.strip();
    }

    @Override
    public String toString() {
        return name;
    }
}
