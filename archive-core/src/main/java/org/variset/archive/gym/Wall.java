package org.variset.archive.gym;

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
import jakarta.persistence.ManyToOne;
import jakarta.persistence.SequenceGenerator;
import jakarta.persistence.Table;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import org.variset.archive.mapping.ExtraFieldsConverter;

/**
 * A wall or sector of a gym. Its name is unique within the gym. Geometry and reset cycle are optional: a wall
 * first met in a routes file has none until a walls file brings them.
 */
@Entity
@Table(name = "wall")
public class Wall {
    @Id
    @GeneratedValue(strategy = GenerationType.SEQUENCE, generator = "wall_seq")
    @SequenceGenerator(name = "wall_seq", sequenceName = "wall_seq", allocationSize = 50)
    private Long id;

    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "gym_id", nullable = false)
    private Gym gym;

    @Column(nullable = false)
    private String name;

    @Enumerated(EnumType.STRING)
    private WallDiscipline discipline;

    @Column(name = "angle_deg")
    private Double angleDeg;

    @Column(name = "height_m")
    private Double heightM;

    @Column(name = "width_m")
    private Double widthM;

    @Column(name = "cycle_days")
    private Integer cycleDays;

    @Convert(converter = ExtraFieldsConverter.class)
    @Column(name = "extra_fields", length = 100_000)
    private Map<String, String> extraFields = new LinkedHashMap<>();

    /** For Hibernate. */
    protected Wall() {}

    /** A new wall with no geometry yet. */
    public Wall(Gym gym, String name) {
        this.gym = Objects.requireNonNull(gym, "gym");
        this.name = Gym.requireName(name);
    }

    /** The database id, null until stored. */
    public Long id() {
        return id;
    }

    /** The gym the wall belongs to. */
    public Gym gym() {
        return gym;
    }

    /** The wall's name. */
    public String name() {
        return name;
    }

    /** What the wall is set for, or null when unknown. */
    public WallDiscipline discipline() {
        return discipline;
    }

    /** Angle from vertical in degrees (positive overhanging), or null. */
    public Double angleDeg() {
        return angleDeg;
    }

    /** Height in metres, or null. */
    public Double heightM() {
        return heightM;
    }

    /** Width in metres, or null. */
    public Double widthM() {
        return widthM;
    }

    /** How often the gym means to reset the wall, in days, or null. */
    public Integer cycleDays() {
        return cycleDays;
    }

    /** Extra columns the user brought, in file order. */
    public Map<String, String> extraFields() {
        return extraFields;
    }

    /**
     * Sets the wall's attributes; null leaves a value unknown.
     *
     * @throws IllegalArgumentException for an angle outside -45..90, a size not above zero, or a cycle below 1
     */
    public void describe(WallDiscipline discipline, Double angleDeg, Double heightM, Double widthM, Integer cycleDays) {
        if (angleDeg != null && (angleDeg < -45 || angleDeg > 90)) {
            throw new IllegalArgumentException("wall angle " + angleDeg + " is outside -45..90 degrees");
        }
        if (heightM != null && heightM <= 0 || widthM != null && widthM <= 0) {
            throw new IllegalArgumentException("wall height and width must be above zero");
        }
        if (cycleDays != null && cycleDays < 1) {
            throw new IllegalArgumentException("reset cycle must be at least one day");
        }
        this.discipline = discipline;
        this.angleDeg = angleDeg;
        this.heightM = heightM;
        this.widthM = widthM;
        this.cycleDays = cycleDays;
    }

    /** Replaces the extra fields. */
    public void setExtraFields(Map<String, String> extra) {
        this.extraFields = new LinkedHashMap<>(extra);
    }

    @Override
    public String toString() {
        return "Wall[" + name + "]";
    }
}
