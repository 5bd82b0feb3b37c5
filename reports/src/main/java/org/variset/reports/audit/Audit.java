package org.variset.reports.audit;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.variset.archive.settings.GymSettings;

/**
 * The audit of one set of routes.
 *
 * @param subject what was audited
 * @param settings the gym's settings in effect on the audited day
 * @param audited the audited set
 * @param previous the wall's previous reset (reset audits), or null
 * @param reference the set the audited one is measured against: the gym's routes up that day (reset and wall
 *     audits) or the other setters' routes of the period (setter audits); null for a whole-gym audit
 * @param windowMoveShares for reset audits, the share of the look-back window's routes listing each move
 * @param findings what matters most, in plain words, most important first
 */
public record Audit(
        Subject subject,
        GymSettings settings,
        SetResult audited,
        SetResult previous,
        SetResult reference,
        Map<String, Double> windowMoveShares,
        List<Finding> findings) {

    /** The sets shown side by side: the audited one, then the previous reset and the reference where there are. */
    public List<SetResult> columns() {
        List<SetResult> c = new ArrayList<>();
        c.add(audited);
        if (previous != null) {
            c.add(previous);
        }
        if (reference != null) {
            c.add(reference);
        }
        return c;
    }
}
