package org.variset.web.page;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.variset.app.VarisetVersion;
import org.variset.app.audit.AuditSets;
import org.variset.archive.read.RouteRecord;
import org.variset.reports.audit.AuditTarget;
import org.variset.reports.audit.Finding;
import org.variset.reports.pdf.PdfOptions;
import org.variset.web.chart.Charts;
import org.variset.web.security.Need;

/**
 * A reset's audit: its score and parts, its findings, the figures beside the previous reset and the gym's routes up
 * that day, charts, its routes, and the PDF the command line writes.
 */
public final class ResetPages {
    private final Site site;

    /** Reset pages of a site. */
    public ResetPages(Site site) {
        this.site = site;
    }

    /**
     * A part of the score.
     *
     * @param name grip, holds, moves, grades, novelty
     * @param percent its value from 0 to 100, or "dropped"
     * @param weight the weight it had
     */
    public record Part(String name, String percent, String weight) {}

    /**
     * A figure across the columns.
     *
     * @param name the figure
     * @param values its value in each column ("" where there is none)
     */
    public record FigureRow(String name, List<String> values) {}

    /**
     * A route of the reset.
     *
     * @param label its label
     * @param grade its grade
     * @param setters who set it
     * @param link its page
     */
    public record RouteRow(String label, String grade, String setters, String link) {}

    /**
     * A chart with its heading.
     *
     * @param heading what it shows
     * @param svg the chart
     */
    public record Chart(String heading, String svg) {}

    /**
     * The page.
     *
     * @param title the audit's title
     * @param gym the gym
     * @param wall the wall
     * @param score the score from 0 to 100, or "none"
     * @param parts the score's parts
     * @param findings the findings, in words
     * @param columns the sets compared
     * @param figures the figures across them
     * @param charts the charts
     * @param routes the routes
     * @param pdf the PDF's address
     */
    public record ResetView(
            String title,
            String gym,
            String wall,
            String score,
            List<Part> parts,
            List<String> findings,
            List<String> columns,
            List<FigureRow> figures,
            List<Chart> charts,
            List<RouteRow> routes,
            String pdf) {}

    /** Registers the routes. */
    public void register(RoutesConfig r) {
        r.get("/reset", this::page, Need.VIEWER);
        r.get("/reset.pdf", this::pdf, Need.VIEWER);
    }

    private AuditSets.Report audit(Context ctx, boolean withPlan) {
        String gym = Site.param(ctx, "gym");
        String label = Site.param(ctx, "label");
        Site.reach(ctx, gym);
        return site.gate().use(w -> new AuditSets(w).audit(new AuditTarget.Reset(gym, label), withPlan));
    }

    private void page(Context ctx) {
        AuditSets.Report report = audit(ctx, false);
        ObjectNode json = report.json();
        JsonNode subject = json.path("subject");
        List<RouteRow> routes = new ArrayList<>();
        for (RouteRecord r : report.audit().audited().routes()) {
            routes.add(new RouteRow(r.label(), r.gradeText(), String.join(", ", r.setters()), Links.route(r.id())));
        }
        ResetView v = new ResetView(
                subject.path("title").asText(),
                subject.path("gym").asText(),
                subject.path("wall").asText(),
                json.path("score").path("score").isNumber()
                        ? String.format(
                                Locale.ROOT,
                                "%.0f",
                                json.path("score").path("score").asDouble())
                        : "none",
                parts(json.path("score")),
                report.audit().findings().stream().map(Finding::text).toList(),
                columns(json.path("context")),
                figures(json.path("context")),
                charts(json),
                routes,
                Links.resetPdf(
                        subject.path("gym").asText(), subject.path("reset").asText()));
        site.page(ctx, "reset.jte", v.title(), "view", v);
    }

    private void pdf(Context ctx) {
        AuditSets.Report report = audit(ctx, true);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        report.document().write(new PdfOptions(PdfOptions.Paper.A4, report.today(), VarisetVersion.current()), out);
        String file = "audit-" + report.audit().subject().title().replaceAll("[^A-Za-z0-9.-]+", "-") + ".pdf";
        ctx.contentType("application/pdf");
        ctx.header("Content-Disposition", "attachment; filename=\"" + file.toLowerCase(Locale.ROOT) + "\"");
        ctx.result(out.toByteArray());
    }

    private static List<Part> parts(JsonNode score) {
        List<Part> out = new ArrayList<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = score.path("parts").fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            out.add(new Part(
                    e.getKey(),
                    e.getValue().isNumber()
                            ? String.format(
                                    Locale.ROOT, "%.0f", 100 * e.getValue().asDouble())
                            : "dropped",
                    score.path("weights_used").path(e.getKey()).isNumber()
                            ? String.format(
                                    Locale.ROOT,
                                    "%.2f",
                                    score.path("weights_used").path(e.getKey()).asDouble())
                            : "-"));
        }
        return out;
    }

    private static List<String> columns(JsonNode context) {
        List<String> out = new ArrayList<>();
        context.path("columns")
                .forEach(c -> out.add(
                        c.path("name").asText() + " (" + c.path("routes").asInt() + " routes)"));
        return out;
    }

    private static List<FigureRow> figures(JsonNode context) {
        List<FigureRow> out = new ArrayList<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = context.path("figures").fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            List<String> values = new ArrayList<>();
            e.getValue().forEach(v -> values.add(v.isNumber() ? figure(v.asDouble()) : ""));
            out.add(new FigureRow(e.getKey(), values));
        }
        return out;
    }

    private static String figure(double v) {
        return Math.abs(v) >= 10 ? String.format(Locale.ROOT, "%.1f", v) : String.format(Locale.ROOT, "%.3f", v);
    }

    private static List<Chart> charts(JsonNode json) {
        List<Chart> out = new ArrayList<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = json.path("grades").fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            List<Charts.Bar> bars = new ArrayList<>();
            JsonNode target = e.getValue().path("target");
            for (Iterator<Map.Entry<String, JsonNode>> h =
                            e.getValue().path("histogram").fields();
                    h.hasNext(); ) {
                Map.Entry<String, JsonNode> b = h.next();
                if (b.getValue().asInt() == 0 && !target.has(b.getKey())) {
                    continue;
                }
                bars.add(new Charts.Bar(
                        b.getKey(),
                        b.getValue().asDouble(),
                        target.has(b.getKey()) ? target.path(b.getKey()).asDouble() : null));
            }
            String heading = "Grades (" + e.getKey() + "), share of routes; the line is the target's share";
            out.add(new Chart(heading, Charts.bars(heading, bars)));
        }
        JsonNode sectors = json.path("grip").path("sectors");
        if (sectors.isArray() && sectors.size() == 8) {
            int[] s = new int[8];
            for (int i = 0; i < 8; i++) {
                s[i] = sectors.get(i).asInt();
            }
            out.add(new Chart("Grip directions (hand holds)", Charts.rose("Grip directions", s)));
        }
        List<Charts.Bar> holds = new ArrayList<>();
        for (Iterator<Map.Entry<String, JsonNode>> it =
                        json.path("holds").path("counts").fields();
                it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            holds.add(new Charts.Bar(e.getKey(), e.getValue().asDouble(), null));
        }
        if (!holds.isEmpty()) {
            out.add(new Chart("Hold types, share of placements", Charts.bars("Hold types", holds)));
        }
        return out;
    }
}
