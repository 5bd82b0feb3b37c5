package org.variset.archive.route;

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
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.variset.archive.mapping.DoubleListConverter;
import org.variset.archive.mapping.ExtraFieldsConverter;

/**
 * One hold placed on one route: its type, size, the direction(s) its usable surface faces, the inventory label
 * of its shape and its position on the wall. A hold with no grip direction has no dominant direction.
 */
@Entity
@Table(name = "hold_placement")
public class HoldPlacement {
    @Id
    @GeneratedValue(strategy = GenerationType.SEQUENCE, generator = "hold_seq")
    @SequenceGenerator(name = "hold_seq", sequenceName = "hold_seq", allocationSize = 50)
    private Long id;

    @ManyToOne(fetch = FetchType.LAZY, optional = false)
    @JoinColumn(name = "route_id", nullable = false)
    private Route route;

    /** Position in the file's order of the route's holds, from 0. */
    @Column(nullable = false)
    private int ordinal;

    private Integer seq;

    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    private HoldRole role;

    @Column(name = "hold_type", nullable = false)
    private String type;

    @Enumerated(EnumType.STRING)
    @Column(name = "hold_size")
    private HoldSize size;

    @Convert(converter = DoubleListConverter.class)
    @Column(name = "grip_deg", length = 1000)
    private List<Double> grips = new ArrayList<>();

    @Column(name = "hold_ref")
    private String holdRef;

    @Column(name = "x_m")
    private Double xM;

    @Column(name = "y_m")
    private Double yM;

    @Convert(converter = ExtraFieldsConverter.class)
    @Column(name = "extra_fields", length = 100_000)
    private Map<String, String> extraFields = new LinkedHashMap<>();

    /**
     * What a placement holds, before it belongs to a route.
     *
     * @param seq order along the route from 1, or null
     * @param role the role (never null; see {@link HoldRole#defaultFor})
     * @param type the canonical hold type of the gym's vocabulary
     * @param size the size, or null
     * @param grips directions in degrees [0, 360); empty for no dominant direction
     * @param holdRef inventory label of the shape, or null
     * @param xM position from the wall's left edge in metres, or null
     * @param yM position from the wall's bottom edge in metres, or null
     * @param extraFields extra columns, in file order
     */
    public record Spec(
            Integer seq,
            HoldRole role,
            String type,
            HoldSize size,
            List<Double> grips,
            String holdRef,
            Double xM,
            Double yM,
            Map<String, String> extraFields) {
        /** Checks the values. */
        public Spec {
            Objects.requireNonNull(role, "role");
            if (type == null || type.isBlank()) {
                throw new IllegalArgumentException("a hold needs a type");
            }
            if (seq != null && seq < 1) {
                throw new IllegalArgumentException("seq " + seq + " is below 1");
            }
            grips = List.copyOf(grips == null ? List.of() : grips);
            for (double g : grips) {
                if (!(g >= 0 && g < 360)) {
                    throw new IllegalArgumentException("grip direction " + g + " is outside [0, 360)");
                }
            }
            extraFields = extraFields == null ? Map.of() : new LinkedHashMap<>(extraFields);
        }
    }

    /** For Hibernate. */
    protected HoldPlacement() {}

    HoldPlacement(Route route, int ordinal, Spec spec) {
        this.route = route;
        this.ordinal = ordinal;
        this.seq = spec.seq();
        this.role = spec.role();
        this.type = spec.type();
        this.size = spec.size();
        this.grips = new ArrayList<>(spec.grips());
        this.holdRef = Route.blankToNull(spec.holdRef());
        this.xM = spec.xM();
        this.yM = spec.yM();
        this.extraFields = new LinkedHashMap<>(spec.extraFields());
    }

    /**
     * A placement for bulk loading: it refers to its route (a reference is enough) without adding itself to the
     * route's hold list, which stays unloaded.
     *
     * @param ordinal the placement's position in file order among the route's holds, from 0
     */
    public static HoldPlacement placedOn(Route route, int ordinal, Spec spec) {
        if (ordinal < 0) {
            throw new IllegalArgumentException("ordinal " + ordinal + " is below 0");
        }
        return new HoldPlacement(route, ordinal, spec);
    }

    /** The route. */
    public Route route() {
        return route;
    }

    /** Position in file order, from 0. */
    public int ordinal() {
        return ordinal;
    }

    /** The placement's values. */
    public Spec spec() {
        return new Spec(seq, role, type, size, grips, holdRef, xM, yM, extraFields);
    }

    /** Order along the route from 1, or null. */
    public Integer seq() {
        return seq;
    }

    /** The role. */
    public HoldRole role() {
        return role;
    }

    /** The canonical hold type. */
    public String type() {
        return type;
    }

    /** The size, or null. */
    public HoldSize size() {
        return size;
    }

    /** Grip directions in degrees [0, 360); empty for none. */
    public List<Double> grips() {
        return List.copyOf(grips);
    }

    /** The inventory label of the hold shape, or null. */
    public String holdRef() {
        return holdRef;
    }

    /** Position from the left edge in metres, or null. */
    public Double xM() {
        return xM;
    }

    /** Position from the bottom edge in metres, or null. */
    public Double yM() {
        return yM;
    }
}
