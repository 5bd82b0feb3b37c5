package org.variset.app.plan;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.time.LocalDate;
import org.variset.app.Workspace;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.WallRecord;
import org.variset.reports.audit.Audit;
import org.variset.reports.audit.Subject;
import org.variset.reports.plan.PlanJson;
import org.variset.reports.plan.ResetPlan;
import org.variset.reports.plan.ResetPlanner;

/**
 * Proposes what a wall's next reset should bring: grade slots closest to the target, what has fallen behind, hold
 * shapes to rest.
 */
public final class PlanReset {
    /** The default margin below the twelve-month share before a category is listed (a heuristic of ours). */
    public static final double DEFAULT_MARGIN = ResetPlanner.DEFAULT_MARGIN;

    private final Workspace workspace;

    /** Plans over a workspace's archive. */
    public PlanReset(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * Plans a reset.
     *
     * @param gym the gym, or null when the archive holds one
     * @param on the day of the reset, or null for today at the gym
     * @param routes how many routes it brings, 1 or more
     * @param margin how far below its twelve-month share a category must be to be listed, in [0, 1)
     * @throws IllegalArgumentException for an unknown gym or wall, or values out of range
     */
    public ResetPlan plan(String gym, String wall, LocalDate on, int routes, double margin) {
        if (!(margin >= 0 && margin < 1)) {
            throw new IllegalArgumentException(
                    "the margin " + margin + " is not a share between 0 and 1 (0.05 is five points)");
        }
        LocalDate day = on != null ? on : workspace.today(gym);
        return new ResetPlanner(workspace.archive().connection()).plan(gym, wall, day, routes, margin);
    }

    /**
     * The plan for the reset after an audited one: due when its wall's cycle ends, as many routes as it had. Null for
     * an audit of anything but one reset, and for a reset the wall has had another after (its next reset is history,
     * not a plan).
     */
    public ResetPlan after(Audit audit) {
        Subject s = audit.subject();
        if (s.kind() != Subject.Kind.RESET || !isLatest(s)) {
            return null;
        }
        ResetPlanner planner = new ResetPlanner(workspace.archive().connection());
        return planner.plan(
                s.gym(),
                s.wall(),
                planner.nextDue(s.gym(), s.wall(), s.on()),
                Math.max(1, audit.audited().routes().size()),
                DEFAULT_MARGIN);
    }

    private boolean isLatest(Subject s) {
        ArchiveCatalog catalog = new ArchiveCatalog(workspace.archive().connection());
        WallRecord wall = catalog.wall(catalog.gym(s.gym()), s.wall());
        LocalDate today = workspace.today(s.gym());
        return catalog.latestResetOnOrBefore(wall.id(), today.isAfter(s.on()) ? today : s.on())
                .map(r -> r.label().equals(s.reset()))
                .orElse(true);
    }

    /** A plan for scripts. */
    public static ObjectNode json(ResetPlan plan) {
        return PlanJson.of(plan);
    }
}
