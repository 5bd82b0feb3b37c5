package org.variset.web.page;

import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import org.variset.app.account.Account;
import org.variset.app.names.ListGyms;
import org.variset.app.names.ListResets;
import org.variset.app.names.ListWalls;
import org.variset.archive.read.NameListings;
import org.variset.web.security.Guard;
import org.variset.web.security.Need;

/** The overview of the gyms an account reaches, and a wall's page with its resets. */
public final class GymPages {
    private final Site site;

    /** Gym pages of a site. */
    public GymPages(Site site) {
        this.site = site;
    }

    /**
     * A wall as the overview shows it.
     *
     * @param name the wall's name
     * @param link its page
     * @param discipline boulder, rope or both
     * @param lastReset the day of its last reset, or "never"
     * @param status due, overdue, or how long until due, in words
     * @param statusClass "ok", "due" or "overdue", for the page's colours
     * @param routesUp how many routes are up
     */
    public record WallRow(
            String name,
            String link,
            String discipline,
            String lastReset,
            String status,
            String statusClass,
            long routesUp) {}

    /**
     * A gym as the overview shows it.
     *
     * @param name its name
     * @param on today at the gym
     * @param walls its walls
     */
    public record GymBlock(String name, String on, List<WallRow> walls) {}

    /**
     * A reset on a wall's page.
     *
     * @param label its label
     * @param link its audit's page
     * @param resetOn its day
     * @param routes its routes
     * @param stillUp how many of them are still up
     */
    public record ResetRow(String label, String link, String resetOn, long routes, long stillUp) {}

    /**
     * A wall's page.
     *
     * @param gym the gym
     * @param wall the wall
     * @param resets its resets, newest first
     */
    public record WallView(String gym, String wall, List<ResetRow> resets) {}

    /** Registers the routes. */
    public void register(RoutesConfig r) {
        r.get("/", this::overview, Need.VIEWER);
        r.get("/wall", this::wall, Need.VIEWER);
    }

    private void overview(Context ctx) {
        Account account = Guard.account(ctx);
        List<GymBlock> gyms = site.gate().use(w -> {
            List<GymBlock> out = new ArrayList<>();
            for (String g : new ListGyms(w).names()) {
                if (!account.reaches(g)) {
                    continue;
                }
                ListWalls.Result walls = new ListWalls(w).list(g, null);
                out.add(new GymBlock(
                        g,
                        walls.on().toString(),
                        walls.walls().stream().map(l -> row(g, l, walls.on())).toList()));
            }
            return out;
        });
        site.page(ctx, "overview.jte", "Overview", "gyms", gyms);
    }

    static WallRow row(String gym, NameListings.WallLine l, LocalDate today) {
        String status;
        String cls = "ok";
        if (l.lastReset() == null) {
            status = "never reset";
        } else if (l.cycleDays() == null) {
            status = ChronoUnit.DAYS.between(l.lastReset(), today) + " days up; no cycle set";
        } else {
            long up = ChronoUnit.DAYS.between(l.lastReset(), today);
            long left = l.cycleDays() - up;
            if (left < 0) {
                status = "overdue by " + (-left) + (left == -1 ? " day" : " days") + " (" + up + " of " + l.cycleDays()
                        + ")";
                cls = "overdue";
            } else if (left == 0) {
                status = "due today (" + up + " of " + l.cycleDays() + " days)";
                cls = "due";
            } else {
                status = "due in " + left + (left == 1 ? " day" : " days") + " (" + up + " of " + l.cycleDays() + ")";
            }
        }
        return new WallRow(
                l.name(),
                Links.wall(gym, l.name()),
                l.discipline() == null ? "not set" : l.discipline().name().toLowerCase(java.util.Locale.ROOT),
                l.lastReset() == null ? "never" : l.lastReset().toString(),
                status,
                cls,
                l.routesUp());
    }

    private void wall(Context ctx) {
        String gym = Site.param(ctx, "gym");
        String wall = Site.param(ctx, "wall");
        Site.reach(ctx, gym);
        ListResets.Result r = site.gate().use(w -> new ListResets(w).list(gym, wall, null));
        List<ResetRow> rows = new ArrayList<>();
        for (NameListings.ResetLine l : r.resets()) {
            rows.add(new ResetRow(
                    l.label(), Links.reset(r.gym(), l.label()), l.resetOn().toString(), l.routes(), l.stillUp()));
        }
        rows.sort((a, b) -> b.resetOn().compareTo(a.resetOn()));
        site.page(ctx, "wall.jte", wall + " · " + r.gym(), "view", new WallView(r.gym(), wall, rows));
    }
}
