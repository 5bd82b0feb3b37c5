package org.variset.archive.gym;

import java.util.List;
import org.variset.archive.problem.InputException;
import org.variset.archive.problem.InputException.Reason;
import org.variset.archive.problem.Remedy;

/**
 * The messages for names the archive does not hold, the same whichever way the name was looked up (the plain read
 * model or the entities): each lists what there is, so that a typing error shows at once.
 */
public final class Unknown {
    private static final int LISTED = 12;

    private Unknown() {}

    /** No gym by that name. */
    public static InputException gym(String name, List<String> gyms) {
        return new InputException(
                Reason.NOT_FOUND,
                "no gym named '" + name + "' (the archive holds " + (gyms.isEmpty() ? "none" : list(gyms)) + ")");
    }

    /** No gym was named, and the archive does not hold exactly one. */
    public static InputException unnamedGym(List<String> gyms) {
        if (gyms.isEmpty()) {
            return new InputException(Reason.NOT_FOUND, "the archive holds no gym yet (import a file first)");
        }
        return new InputException(
                Reason.AMBIGUOUS,
                "the archive holds several gyms (" + list(gyms) + "): say which",
                Remedy.of(Remedy.Kind.NAME_GYM, "gyms", String.join(", ", gyms)));
    }

    /** No wall by that name in the gym. */
    public static InputException wall(String gym, String name, List<String> walls) {
        return new InputException(
                Reason.NOT_FOUND,
                "no wall named '" + name + "' in " + gym + " (walls: " + (walls.isEmpty() ? "none" : list(walls))
                        + ")");
    }

    /** No reset with that label in the gym; {@code recent} are its latest labels. */
    public static InputException reset(String gym, String label, List<String> recent) {
        return new InputException(
                Reason.NOT_FOUND,
                "no reset labelled '" + label + "' in " + gym
                        + (recent.isEmpty() ? " (it has none yet)" : " (latest: " + list(recent) + ")"),
                Remedy.of(Remedy.Kind.LIST_RESETS, "gym", gym));
    }

    /** No setter by that name. */
    public static InputException setter(String name, List<String> setters) {
        return new InputException(
                Reason.NOT_FOUND,
                "no setter named '" + name + "'" + (setters.isEmpty() ? "" : " (setters: " + list(setters) + ")"));
    }

    private static String list(List<String> names) {
        return names.size() <= LISTED
                ? String.join(", ", names)
                : String.join(", ", names.subList(0, LISTED)) + ", ...";
    }
}
