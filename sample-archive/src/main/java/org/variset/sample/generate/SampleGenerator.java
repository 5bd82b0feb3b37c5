package org.variset.sample.generate;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.stream.Collectors;

/**
 * Writes invented gyms as interchange CSV files ({@code walls.csv}, {@code routes.csv}, {@code holds.csv}), one
 * route at a time, so a chain of fifty gyms over ten years streams to disk in bounded memory. Every random draw comes
 * from a {@link SplittableRandom} seeded from the options and the gym, wall and reset, so the same options give the
 * same bytes.
 *
 * <p>The bundled sample ({@link #sample()}) is the first gym, Lantern Rock, with five stories planted for the audits
 * to find ({@link Stories}).
 */
public final class SampleGenerator {
    /** The bundled sample's seed. */
    public static final long SAMPLE_SEED = 20261130L;
    /** The bundled sample's last day. */
    public static final LocalDate SAMPLE_END = LocalDate.of(2026, 11, 30);

    private static final List<String> ROUTE_COLUMNS = List.of(
            "gym",
            "wall",
            "route",
            "set_on",
            "discipline",
            "grade",
            "grade_scale",
            "stripped_on",
            "setters",
            "color",
            "angle_deg",
            "moves",
            "styles",
            "move_difficulty",
            "notes");
    private static final List<String> HOLD_COLUMNS =
            List.of("gym", "wall", "route", "set_on", "seq", "role", "type", "size", "grip", "hold_ref", "x_m", "y_m");

    private SampleGenerator() {}

    /**
     * What to generate.
     *
     * @param gyms how many gyms
     * @param years how many years of resets, ending on {@code end}
     * @param seed the seed
     * @param end the last day
     * @param stories whether the first gym is Lantern Rock with its planted stories
     */
    public record Options(int gyms, int years, long seed, LocalDate end, boolean stories) {
        /** Checks the options. */
        public Options {
            if (gyms < 1 || years < 1 || gyms > 10_000 || years > 50) {
                throw new IllegalArgumentException(
                        "generate 1 to 10000 gyms over 1 to 50 years (asked: " + gyms + " gyms, " + years + " years)");
            }
        }
    }

    /**
     * What was written.
     *
     * @param gyms gyms
     * @param walls walls
     * @param routes routes
     * @param holds hold placements
     * @param files the files, in the order to import them
     */
    public record Summary(long gyms, long walls, long routes, long holds, List<Path> files) {}

    /** The bundled sample: Lantern Rock, two years to 2026-11-30, with its stories. */
    public static Options sample() {
        return new Options(1, 2, SAMPLE_SEED, SAMPLE_END, true);
    }

    /** Writes the gyms into a folder (created if needed); existing files of the same names are replaced. */
    public static Summary write(Options o, Path dir) {
        try {
            Files.createDirectories(dir);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        Path walls = dir.resolve("walls.csv");
        Path routes = dir.resolve("routes.csv");
        Path holds = dir.resolve("holds.csv");
        try (CsvOut w = new CsvOut(
                        walls, List.of("gym", "wall", "discipline", "angle_deg", "height_m", "width_m", "cycle_days"));
                CsvOut r = new CsvOut(routes, ROUTE_COLUMNS);
                CsvOut h = new CsvOut(holds, HOLD_COLUMNS)) {
            for (int g = 0; g < o.gyms(); g++) {
                new GymWriter(o, g, w, r, h).write();
            }
            return new Summary(o.gyms(), w.rows(), r.rows(), h.rows(), List.of(walls, routes, holds));
        }
    }

    /** Writes one gym. */
    private static final class GymWriter {
        private final Options o;
        private final int g;
        private final CsvOut walls;
        private final CsvOut routes;
        private final CsvOut holds;
        private final String gym;
        private final List<String> setters;
        private final boolean stories;

        GymWriter(Options o, int g, CsvOut walls, CsvOut routes, CsvOut holds) {
            this.o = o;
            this.g = g;
            this.walls = walls;
            this.routes = routes;
            this.holds = holds;
            this.stories = o.stories() && g == 0;
            this.gym = stories ? Stories.GYM : String.format(Locale.ROOT, "Synthetic Gym %03d", g + 1);
            this.setters = stories
                    ? Stories.SETTERS
                    : List.of(1, 2, 3, 4, 5, 6).stream()
                            .map(i -> String.format(Locale.ROOT, "Setter %03d-%d", g + 1, i))
                            .toList();
        }

        void write() {
            List<WallPlan> plans = WallPlan.standard();
            for (int i = 0; i < plans.size(); i++) {
                WallPlan w = plans.get(i);
                walls.row(
                        gym,
                        w.name(),
                        w.rope() ? "rope" : "boulder",
                        num(w.angleDeg()),
                        num(w.heightM()),
                        num(w.widthM()),
                        String.valueOf(w.cycleDays()));
                wall(w, i);
            }
        }

        private void wall(WallPlan w, int index) {
            SplittableRandom r = new SplittableRandom(o.seed() * 1_000_003L + g * 7_919L + index * 104_729L);
            List<LocalDate> days = schedule(w, index, r);
            HoldShapes shapes = stories && w.name().equals(Stories.REUSE_WALL)
                    ? HoldShapes.fixedSet("PW", 26, r.split())
                    : HoldShapes.inventory(stories ? "" : "G" + (g + 1));
            RouteMaker make = new RouteMaker(r);
            GeneratedRoute template = null;
            for (int k = 0; k < days.size(); k++) {
                LocalDate day = days.get(k);
                LocalDate stripped = k + 1 < days.size() ? days.get(k + 1) : null;
                int n = w.routesPerReset()[0] + r.nextInt(w.routesPerReset()[1] - w.routesPerReset()[0] + 1);
                for (int i = 0; i < n; i++) {
                    GeneratedRoute route = route(make, r, w, shapes, day, i);
                    if (stories && w.name().equals(Stories.REPEAT_WALL)) {
                        if (template == null && Stories.isRepeatSource(day, o.end()) && i == 0) {
                            template = route;
                        } else if (template != null && k == days.size() - 1 && i == 2) {
                            route = Stories.repeatOf(template, route, w.widthM(), r);
                        }
                    }
                    write(w, day, stripped, route);
                }
            }
        }

        private List<LocalDate> schedule(WallPlan w, int index, SplittableRandom r) {
            List<LocalDate> days = new ArrayList<>();
            LocalDate last =
                    stories && w.name().equals(Stories.OVERDUE_WALL) ? o.end().minusDays(Stories.OVERDUE_BY) : o.end();
            for (LocalDate d = o.end().minusYears(o.years()).plusDays(1 + index * 3L);
                    !d.isAfter(last);
                    d = d.plusDays(w.cycleDays() + r.nextInt(6) - 2)) {
                days.add(d);
            }
            return days;
        }

        private GeneratedRoute route(
                RouteMaker make, SplittableRandom r, WallPlan w, HoldShapes shapes, LocalDate day, int i) {
            Set<String> avoid = stories && !w.rope() ? Stories.avoidedGrades(day, o.end()) : Set.of();
            String grade = make.grade(w.rope(), avoid);
            List<String> team = new ArrayList<>();
            team.add(setters.get(r.nextInt(setters.size())));
            if (r.nextInt(4) == 0) {
                String second = setters.get(r.nextInt(setters.size()));
                if (!team.contains(second)) {
                    team.add(second);
                }
            }
            double upCrimps = stories && team.get(0).equals(Stories.CRIMP_SETTER) ? Stories.CRIMP_SHARE : 0;
            List<String> moves = make.moves(w);
            List<GeneratedRoute.Hold> holdList =
                    make.holds(w, shapes, upCrimps, moves.contains("dyno") && r.nextInt(3) == 0);
            int hand = (int)
                    holdList.stream().filter(h -> !h.role().equals("foot")).count();
            int base = Math.max(
                    2,
                    Math.min(
                            8,
                            2
                                    + grade.chars()
                                                    .filter(Character::isDigit)
                                                    .map(c -> c - '0')
                                                    .sum()
                                            * 2
                                            / 3));
            return new GeneratedRoute(
                    RouteMaker.label(i),
                    grade,
                    team,
                    RouteMaker.color(i),
                    moves,
                    make.styles(w, moves),
                    make.difficulty(hand - 1, base),
                    holdList);
        }

        private void write(WallPlan w, LocalDate day, LocalDate stripped, GeneratedRoute route) {
            routes.row(
                    gym,
                    w.name(),
                    route.label(),
                    day.toString(),
                    w.rope() ? "rope" : "boulder",
                    route.grade(),
                    w.rope() ? "french" : "v",
                    stripped == null ? "" : stripped.toString(),
                    String.join(";", route.setters()),
                    route.color(),
                    "",
                    String.join(";", route.moves()),
                    String.join(";", route.styles()),
                    route.difficulty().stream().map(String::valueOf).collect(Collectors.joining(";")),
                    "");
            for (GeneratedRoute.Hold h : route.holds()) {
                holds.row(
                        gym,
                        w.name(),
                        route.label(),
                        day.toString(),
                        h.seq() == 0 ? "" : String.valueOf(h.seq()),
                        h.role(),
                        h.type(),
                        h.size(),
                        h.grips().stream().map(String::valueOf).collect(Collectors.joining(";")),
                        h.ref(),
                        num(h.x()),
                        num(h.y()));
            }
        }

        private static String num(double v) {
            return v == Math.rint(v) ? String.valueOf((long) v) : String.format(Locale.ROOT, "%.2f", v);
        }
    }
}
