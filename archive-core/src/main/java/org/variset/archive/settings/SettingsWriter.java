package org.variset.archive.settings;

import com.fasterxml.jackson.databind.JsonNode;
import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import org.hibernate.Session;
import org.variset.archive.changelog.ChangeLog;
import org.variset.archive.grade.BandSet;
import org.variset.archive.grade.Discipline;
import org.variset.archive.gym.Gym;
import org.variset.archive.gym.GymSetting;
import org.variset.archive.problem.InputException;
import org.variset.archive.problem.Remedy;
import org.variset.archive.store.Transaction;

/**
 * Records a new setting value from a day on. Earlier values stay, so an audit of an earlier day still uses the
 * settings of its day.
 */
public final class SettingsWriter {
    private SettingsWriter() {}

    /**
     * Stores a value of a named gym from a day on, in the caller's transaction (see the session form for the rules).
     *
     * @param gym the gym, or null when the archive holds one
     * @param value the new value, or null to go back to the default from that day
     * @return the gym's name
     */
    public static String set(Transaction tx, String gym, SettingKey key, String scope, LocalDate from, JsonNode value) {
        Gym g = new org.variset.archive.store.GymLookup(tx).gym(gym);
        GymSettings before = new SettingsReader(tx.readConnection()).inEffectOn(g.id(), from);
        set(tx.session(), g, key, scope, from, value, before);
        return g.name();
    }

    /**
     * Checks a value against the settings it must agree with, then stores it in the caller's transaction.
     *
     * @param inEffect the settings in effect on {@code from}, before this change
     * @param value the new value, or null to go back to the default from that day
     * @throws IllegalArgumentException when the scope does not fit the key, or a target names a band the
     *     discipline's bands do not have
     */
    public static void set(
            Session session,
            Gym gym,
            SettingKey key,
            String scope,
            LocalDate from,
            JsonNode value,
            GymSettings inEffect) {
        checkScope(key, scope);
        if (value != null && key == SettingKey.TARGET) {
            BandSet bands = inEffect.bands(Discipline.parse(scope));
            List<String> unknown = SettingKey.weightMap(value).keySet().stream()
                    .filter(l -> bands.indexOf(l) < 0)
                    .toList();
            if (!unknown.isEmpty()) {
                throw new IllegalArgumentException("setting target: " + String.join(", ", unknown)
                        + (unknown.size() == 1 ? " is not a band" : " are not bands") + " of " + scope
                        + " grades (bands: " + String.join(" ", bands.labels()) + ")");
            }
        }
        session.persist(new GymSetting(gym, key.word(), scope, from, value == null ? "null" : value.toString()));
        if (key == SettingKey.VOCABULARY || key == SettingKey.BANDS) {
            ChangeLog.gym(session, gym.id()); // the search index reads terms and grade bands through these
        }
    }

    private static void checkScope(SettingKey key, String scope) {
        boolean gym = scope.isEmpty();
        boolean discipline = scope.equals("boulder") || scope.equals("rope");
        boolean wall = scope.startsWith("wall:");
        boolean fits = switch (key.scope()) {
            case GYM -> gym;
            case DISCIPLINE -> discipline;
            case DISCIPLINE_OR_WALL -> discipline || wall;
        };
        if (!fits) {
            throw new InputException(
                    InputException.Reason.INVALID,
                    "setting " + key.word() + " applies to "
                            + switch (key.scope()) {
                                case GYM -> "the whole gym, not to one discipline or wall";
                                case DISCIPLINE -> "one discipline (boulder or rope)";
                                case DISCIPLINE_OR_WALL -> "one discipline or one wall";
                            },
                    Remedy.of(
                            Remedy.Kind.CHOOSE_SCOPE,
                            "scope",
                            key.scope().name().toLowerCase(Locale.ROOT)));
        }
    }
}
