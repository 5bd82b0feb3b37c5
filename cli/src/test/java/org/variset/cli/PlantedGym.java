package org.variset.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * An invented gym written as interchange files, route by route, so that a test can plant one story (a repeat, a
 * missing grade range, a setter's habit) and read what Variset says of it. Every name here is invented.
 */
final class PlantedGym {
    static final String HOLDS_HEADER = "gym,wall,route,set_on,seq,role,type,size,grip,hold_ref,x_m,y_m";
    static final String ROUTES_HEADER =
            "gym,wall,route,set_on,discipline,grade,stripped_on,setters,color,moves,styles,move_difficulty";

    private final String gym;
    private final List<String> walls = new ArrayList<>();
    private final List<Route> routes = new ArrayList<>();

    PlantedGym(String gym) {
        this.gym = gym;
    }

    /** A wall of the gym. */
    PlantedGym wall(String name, String discipline, int angleDeg, double heightM, double widthM) {
        walls.add(String.join(",", gym, name, discipline, Integer.toString(angleDeg), num(heightM), num(widthM), "28"));
        return this;
    }

    /** A route: its holds and fields follow on the route returned. */
    Route route(String wall, String label, String setOn, String discipline, String grade) {
        Route r = new Route(wall, label, setOn, discipline, grade);
        routes.add(r);
        return r;
    }

    /** Writes walls.csv, routes.csv and holds.csv into a folder and returns the three paths as strings. */
    String[] write(Path dir) {
        try {
            Files.createDirectories(dir);
            Path w = dir.resolve("walls.csv");
            Path r = dir.resolve("routes.csv");
            Path h = dir.resolve("holds.csv");
            Files.writeString(
                    w, "gym,wall,discipline,angle_deg,height_m,width_m,cycle_days\n" + String.join("\n", walls) + "\n");
            StringBuilder rs = new StringBuilder(ROUTES_HEADER).append('\n');
            StringBuilder hs = new StringBuilder(HOLDS_HEADER).append('\n');
            for (Route route : routes) {
                rs.append(route.row()).append('\n');
                route.holds.forEach(x -> hs.append(x).append('\n'));
            }
            Files.writeString(r, rs);
            Files.writeString(h, hs);
            return new String[] {w.toString(), r.toString(), h.toString()};
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String num(double v) {
        return String.format(Locale.ROOT, "%.2f", v);
    }

    /** One planted route. */
    final class Route {
        private final String wall;
        private final String label;
        private final String setOn;
        private final String discipline;
        private final String grade;
        private String strippedOn = "";
        private String setters = "Wren Castell";
        private String moves = "";
        private final List<String> holds = new ArrayList<>();

        private Route(String wall, String label, String setOn, String discipline, String grade) {
            this.wall = wall;
            this.label = label;
            this.setOn = setOn;
            this.discipline = discipline;
            this.grade = grade;
        }

        Route stripped(String day) {
            strippedOn = day;
            return this;
        }

        Route by(String names) {
            setters = names;
            return this;
        }

        Route moves(String list) {
            moves = list;
            return this;
        }

        /** A hold; {@code ref} may be empty, and a negative x leaves the position out. */
        Route hold(String role, String type, String size, String grip, String ref, double x, double y) {
            String pos = x < 0 ? "," : num(x) + "," + num(y);
            holds.add(String.join(
                    ",",
                    gym,
                    wall,
                    label,
                    setOn,
                    Integer.toString(holds.size() + 1),
                    role,
                    type,
                    size,
                    grip,
                    ref,
                    pos));
            return this;
        }

        /** A hand hold. */
        Route hand(String type, String grip, String ref, double x, double y) {
            return hold("hand", type, "m", grip, ref, x, y);
        }

        /** A foot chip, with no shape and no direction. */
        Route foot(double x, double y) {
            return hold("foot", "foot-chip", "xs", "", "", x, y);
        }

        /** Back to the gym, for the next route. */
        PlantedGym done() {
            return PlantedGym.this;
        }

        private String row() {
            return String.join(
                    ",", gym, wall, label, setOn, discipline, grade, strippedOn, setters, "red", moves, "", "");
        }
    }
}
