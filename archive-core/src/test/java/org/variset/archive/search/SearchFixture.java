package org.variset.archive.search;

import java.time.LocalDate;
import java.time.ZoneId;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.hibernate.Session;
import org.variset.archive.changelog.ChangeLog;
import org.variset.archive.grade.Discipline;
import org.variset.archive.grade.GradeReader;
import org.variset.archive.gym.Gym;
import org.variset.archive.gym.Wall;
import org.variset.archive.gym.WallDiscipline;
import org.variset.archive.route.HoldPlacement;
import org.variset.archive.route.HoldRole;
import org.variset.archive.route.HoldSize;
import org.variset.archive.route.Reset;
import org.variset.archive.route.Route;
import org.variset.archive.route.Setter;

/**
 * Two invented gyms for search tests. Birchfield (boulders on the Cave, rope routes on the Tower) and Quayside (one
 * boulder on its own Cave):
 * <pre>
 * Birchfield Cave C1 V3  2026-01-10..2026-02-07  heel hook, dyno     crimp@0, pinch@90, jug@0   Ada    red
 * Birchfield Cave C2 V5  2026-02-07..            toe hook, gaston    sloper@180, crimp@0        Ada;Bo blue  "slopey top"
 * Birchfield Cave C3 6A  2026-02-07..            heel hook, mantle   pinch@270, volume          Bo     green
 * Birchfield Cave C4 V8  2026-03-14..            campus, dyno        crimp@45, pocket@0         Cy     black
 * Birchfield Tower T1 6a 2026-01-20..            layback, stem       jug@0, edge@90 (rope)      Cy     teal
 * Birchfield Tower T2 5.11b 2026-01-20..         drop knee           crimp@0 (rope)             Ada    navy
 * Quayside   Cave Q1 V4  2026-02-01..            heel hook, dyno     crimp@0, pinch@90          Dee    red
 * </pre>
 */
final class SearchFixture {
    private SearchFixture() {}

    static void store(Session s) {
        Gym birch = new Gym("Birchfield", ZoneId.of("UTC"));
        Gym quay = new Gym("Quayside", ZoneId.of("UTC"));
        s.persist(birch);
        s.persist(quay);
        Wall cave = wall(s, birch, "Cave", WallDiscipline.BOULDER, 35.0);
        Wall tower = wall(s, birch, "Tower", WallDiscipline.ROPE, 5.0);
        Wall qcave = wall(s, quay, "Cave", WallDiscipline.BOULDER, 20.0);
        Setter ada = setter(s, "Ada Quill");
        Setter bo = setter(s, "Bo Renner");
        Setter cy = setter(s, "Cy Ostrova");
        Setter dee = setter(s, "Dee Hartnell");
        Reset jan = reset(s, cave, "Cave Jan", "2026-01-10");
        Reset feb = reset(s, cave, "Cave Feb", "2026-02-07");
        Reset mar = reset(s, cave, "Cave Mar", "2026-03-14");
        Reset tow = reset(s, tower, "Tower Jan", "2026-01-20");
        Reset q = reset(s, qcave, "Quay Feb", "2026-02-01");
        route(s, jan, List.of(ada), "C1|V3|2026-01-10|2026-02-07|red|heel hook;dyno|power||crimp@0 pinch@90 jug@0");
        route(
                s,
                feb,
                List.of(ada, bo),
                "C2|V5|2026-02-07||blue|toe hook;gaston|slopey|slopey top out|sloper@180 crimp@0+xl");
        route(s, feb, List.of(bo), "C3|6A|2026-02-07||green|heel hook;mantle|technical||pinch@270 volume");
        route(s, mar, List.of(cy), "C4|V8|2026-03-14||black|campus;dyno|power||crimp@45 pocket@0");
        route(s, tow, List.of(cy), "T1|6a|2026-01-20||teal|layback;stem|endurance||jug@0 edge@90");
        route(s, tow, List.of(ada), "T2|5.11b|2026-01-20||navy|drop knee|||crimp@0");
        route(s, q, List.of(dee), "Q1|V4|2026-02-01||red|heel hook;dyno|power||crimp@0 pinch@90");
        s.flush();
        ChangeLog.routes(
                s, s.createSelectionQuery("select id from Route", Long.class).getResultList());
    }

    private static Wall wall(Session s, Gym gym, String name, WallDiscipline d, double angle) {
        Wall w = new Wall(gym, name);
        w.describe(d, angle, 4.0, 8.0, null);
        s.persist(w);
        return w;
    }

    private static Setter setter(Session s, String name) {
        Setter x = new Setter(name);
        s.persist(x);
        return x;
    }

    private static Reset reset(Session s, Wall w, String label, String on) {
        Reset r = new Reset(w, label, LocalDate.parse(on));
        s.persist(r);
        return r;
    }

    /**
     * A route from one row: {@code label|grade|set_on|stripped_on|color|moves|styles|notes|holds}, lists separated by
     * {@code ;}, holds as {@code type@degrees} (size m) or {@code type@degrees+size} separated by spaces; the discipline is the reset's wall's.
     */
    private static void route(Session s, Reset reset, List<Setter> setters, String row) {
        String[] f = row.split("\\|", -1);
        Discipline d = reset.wall().discipline() == WallDiscipline.ROPE ? Discipline.ROPE : Discipline.BOULDER;
        Route r = new Route(
                reset, f[0], LocalDate.parse(f[2]), d, GradeReader.standard().read(f[1], d, null, Set.of()));
        r.setStrippedOn(f[3].isEmpty() ? null : LocalDate.parse(f[3]));
        r.setSetters(setters);
        r.setColor(f[4]);
        r.setMoves(f[5].isEmpty() ? List.of() : List.of(f[5].split(";")));
        r.setStyles(f[6].isEmpty() ? List.of() : List.of(f[6].split(";")));
        r.setNotes(f[7].isEmpty() ? null : f[7]);
        String holds = f[8];
        int seq = 1;
        for (String h : holds.split(" ")) {
            String[] sized = h.split("\\+");
            HoldSize size = sized.length == 1 ? HoldSize.M : HoldSize.parse(sized[1]);
            String[] td = sized[0].split("@");
            List<Double> grips = td.length == 1 ? List.of() : List.of(Double.parseDouble(td[1]));
            r.addHold(new HoldPlacement.Spec(seq++, HoldRole.HAND, td[0], size, grips, null, null, null, Map.of()));
        }
        s.persist(r);
        r.holds().forEach(s::persist);
    }
}
