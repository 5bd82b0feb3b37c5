package org.variset.web.page;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;
import org.variset.app.change.RemoveRoutes;
import org.variset.app.route.ReadRoute;
import org.variset.archive.change.RouteRemoval;
import org.variset.archive.read.HoldRecord;
import org.variset.archive.read.RouteRecord;
import org.variset.web.chart.Charts;
import org.variset.web.security.Guard;
import org.variset.web.security.Need;
import org.variset.web.security.Refusal;

/** A route's page, and its removal (head setters; shown first, then confirmed with a form). */
public final class RoutePages {
    private final Site site;

    /** Route pages of a site. */
    public RoutePages(Site site) {
        this.site = site;
    }

    /**
     * A field of the route.
     *
     * @param name what it is
     * @param value its value
     */
    public record Field(String name, String value) {}

    /**
     * A hold placement.
     *
     * @param seq its number on the route
     * @param role start, hand, foot, finish
     * @param type its type
     * @param size its size
     * @param grips its grip directions in degrees
     * @param ref the hold's reference in the gym's inventory
     * @param position where it is, in metres
     */
    public record HoldRow(
            String seq, String role, String type, String size, String grips, String ref, String position) {}

    /**
     * The page.
     *
     * @param id the route's id
     * @param title its name
     * @param fields its fields
     * @param holds its holds
     * @param sketch its holds drawn where they are
     * @param wallLink its wall's page
     * @param mayRemove true when the account may remove it
     */
    public record RouteView(
            long id,
            String title,
            List<Field> fields,
            List<HoldRow> holds,
            String sketch,
            String wallLink,
            boolean mayRemove) {}

    /**
     * The removal's confirmation, or its result.
     *
     * @param id the route's id
     * @param title the route's name
     * @param holds how many holds go with it
     * @param done true once removed
     */
    public record RemoveView(long id, String title, long holds, boolean done) {}

    /** Registers the routes. */
    public void register(RoutesConfig r) {
        r.get("/route", this::page, Need.VIEWER);
        r.get("/route/remove", this::confirm, Need.HEAD_SETTER);
        r.post("/route/remove", this::remove, Need.HEAD_SETTER);
    }

    private RouteRecord route(Context ctx) {
        long id;
        try {
            id = Long.parseLong(Site.param(ctx, "id").strip());
        } catch (NumberFormatException e) {
            throw new Refusal(400, "Not a route", "A route's address ends with its number (route?id=123).");
        }
        RouteRecord r = site.gate()
                .use(w -> new ReadRoute(w).byId(id))
                .orElseThrow(() -> new Refusal(
                        404, "No such route", "The archive holds no route " + id + " (it may have been removed)."));
        Site.reach(ctx, r.gym());
        return r;
    }

    static String title(RouteRecord r) {
        return r.label() + " · " + r.wall() + " · " + r.setOn();
    }

    private void page(Context ctx) {
        RouteRecord r = route(ctx);
        List<Field> f = new ArrayList<>();
        f.add(new Field("Gym", r.gym()));
        f.add(new Field("Wall", r.wall()));
        f.add(new Field("Reset", r.reset() == null ? "" : r.reset()));
        f.add(new Field("Grade", r.gradeText() + " (" + r.discipline().name().toLowerCase(Locale.ROOT) + ")"));
        f.add(new Field("Set on", r.setOn().toString()));
        f.add(new Field(
                "Stripped on",
                r.strippedOn() == null ? "still up" : r.strippedOn().toString()));
        f.add(new Field("Setters", String.join(", ", r.setters())));
        f.add(new Field("Moves", String.join(", ", r.moves())));
        f.add(new Field("Styles", String.join(", ", r.styles())));
        f.add(new Field(
                "Move difficulty",
                r.moveDifficulty().stream().map(String::valueOf).collect(Collectors.joining(" "))));
        f.add(new Field("Notes", r.notes() == null ? "" : r.notes()));
        List<HoldRow> holds = new ArrayList<>();
        List<Charts.Mark> marks = new ArrayList<>();
        for (HoldRecord h : r.holds()) {
            String role = h.role() == null ? "" : h.role().name().toLowerCase(Locale.ROOT);
            holds.add(new HoldRow(
                    h.seq() == null ? "" : h.seq().toString(),
                    role,
                    h.type() == null ? "" : h.type(),
                    h.size() == null ? "" : h.size().name().toLowerCase(Locale.ROOT),
                    h.grips().stream()
                            .map(g -> String.format(Locale.ROOT, "%.0f°", g))
                            .collect(Collectors.joining(" ")),
                    h.holdRef() == null ? "" : h.holdRef(),
                    h.xM() == null || h.yM() == null ? "" : String.format(Locale.ROOT, "%.2f, %.2f", h.xM(), h.yM())));
            if (h.xM() != null && h.yM() != null) {
                marks.add(new Charts.Mark(
                        h.xM(),
                        h.yM(),
                        h.grips(),
                        role + " " + (h.type() == null ? "hold" : h.type()),
                        "foot".equals(role)));
            }
        }
        RouteView v = new RouteView(
                r.id(),
                title(r),
                f,
                holds,
                Charts.sketch("Holds of " + r.label(), marks),
                Links.wall(r.gym(), r.wall()),
                Guard.account(ctx).may(org.variset.app.account.Role.HEAD_SETTER));
        site.page(ctx, "route.jte", v.title(), "view", v);
    }

    private RouteRemoval.Target target(RouteRecord r) {
        return new RouteRemoval.Listed(List.of(new RouteRemoval.Named(r.gym(), r.wall(), r.label(), r.setOn())));
    }

    private void confirm(Context ctx) {
        RouteRecord r = route(ctx);
        RouteRemoval.Plan plan = site.gate().use(w -> new RemoveRoutes(w).preview(target(r)));
        site.page(
                ctx,
                "remove.jte",
                "Remove " + r.label(),
                "view",
                new RemoveView(r.id(), title(r), plan.holds(), false));
    }

    private void remove(Context ctx) {
        RouteRecord r = route(ctx);
        RouteRemoval.Plan plan = site.gate().use(w -> new RemoveRoutes(w).remove(target(r)));
        site.page(
                ctx,
                "remove.jte",
                "Removed " + r.label(),
                "view",
                new RemoveView(r.id(), title(r), plan.holds(), true));
    }
}
