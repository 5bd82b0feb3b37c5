package org.variset.archive.read;

import java.util.List;
import org.variset.archive.route.HoldRole;
import org.variset.archive.route.HoldSize;

/**
 * One hold placement as read from the archive.
 *
 * @param seq order along the route from 1, or null
 * @param role the role
 * @param type the canonical hold type
 * @param size the size, or null
 * @param grips grip directions in degrees [0, 360); empty for no dominant direction
 * @param holdRef inventory label of the shape, or null
 * @param xM position from the wall's left edge in metres, or null
 * @param yM position from the wall's bottom edge in metres, or null
 * @param extraFields the extra columns it was imported with, in file order
 */
public record HoldRecord(
        Integer seq,
        HoldRole role,
        String type,
        HoldSize size,
        List<Double> grips,
        String holdRef,
        Double xM,
        Double yM,
        java.util.Map<String, String> extraFields) {

    /** Copies the lists. */
    public HoldRecord {
        grips = List.copyOf(grips);
        extraFields = java.util.Collections.unmodifiableMap(new java.util.LinkedHashMap<>(extraFields));
    }

    /** True for hand, start and finish (the hand roles of docs/spec/interchange.md). */
    public boolean isHand() {
        return role.isHand();
    }

    /** True when the placement has a position on the wall. */
    public boolean hasPosition() {
        return xM != null && yM != null;
    }
}
