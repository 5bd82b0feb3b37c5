package org.variset.app.audit;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.time.LocalDate;
import org.variset.app.Document;
import org.variset.app.Workspace;
import org.variset.app.plan.PlanReset;
import org.variset.reports.audit.Audit;
import org.variset.reports.audit.AuditJson;
import org.variset.reports.audit.AuditTarget;
import org.variset.reports.audit.Auditor;
import org.variset.reports.pdf.AuditPdf;
import org.variset.reports.plan.ResetPlan;

/**
 * Audits a set of routes for variety, reading through the plain read model (audits never boot Hibernate). A reset's
 * audit can carry the plan of the wall's next reset, which its document prints.
 */
public final class AuditSets {
    private final Workspace workspace;

    /** Audits over a workspace's archive. */
    public AuditSets(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * An audit, with what its document needs.
     *
     * @param audit the audit
     * @param plan the plan of the wall's next reset, or null (not asked for, or not one reset)
     * @param today today at the gym, for the document's date
     */
    public record Report(Audit audit, ResetPlan plan, LocalDate today) {
        /** The audit for scripts: every figure unrounded, the findings, the sets beside it. */
        public ObjectNode json() {
            return AuditJson.of(audit);
        }

        /** The audit as a PDF document (with the next reset's plan when there is one). */
        public Document document() {
            return (options, out) -> AuditPdf.write(audit, plan, options, out);
        }
    }

    /**
     * Audits a target; a day it leaves out is today at the gym.
     *
     * @param withPlan true to plan the next reset too (a reset's document prints it)
     * @throws IllegalArgumentException when the target names what the archive does not hold (the message lists
     *     what it does)
     */
    public Report audit(AuditTarget target, boolean withPlan) {
        LocalDate today = workspace.today(target.gym());
        Audit a = new Auditor(workspace.archive().connection()).audit(target.onDay(today));
        ResetPlan plan = withPlan ? new PlanReset(workspace).after(a) : null;
        return new Report(a, plan, today);
    }
}
