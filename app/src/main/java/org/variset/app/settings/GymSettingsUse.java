package org.variset.app.settings;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.time.LocalDate;
import java.util.List;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.archive.grade.Discipline;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.read.WallRecord;
import org.variset.archive.settings.GymSettings;
import org.variset.archive.settings.SettingKey;
import org.variset.archive.settings.SettingValue;
import org.variset.archive.settings.SettingsListing;
import org.variset.archive.settings.SettingsReader;
import org.variset.archive.settings.SettingsWriter;

/**
 * A gym's settings: every value in effect on a day with where it came from, a change from a day on (every value is
 * kept with the day it took effect, so an audit of an earlier day uses the settings of its day), and the history.
 */
public final class GymSettingsUse {
    private final Workspace workspace;

    /** Settings of a workspace's archive. */
    public GymSettingsUse(Workspace workspace) {
        this.workspace = workspace;
    }

    /**
     * The settings in effect.
     *
     * @param gym the gym's name
     * @param on the day
     * @param rows one row per setting and scope
     */
    public record InEffect(String gym, LocalDate on, List<SettingsListing.Row> rows) {
        /** The settings for scripts. */
        public ObjectNode json() {
            ObjectNode o = Json.object().put("gym", gym).put("on", on.toString());
            ArrayNode a = o.putArray("settings");
            rows.forEach(r -> a.addObject()
                    .put("key", r.key())
                    .put("scope", r.scope())
                    .put("value", r.value())
                    .put("source", r.source()));
            return o;
        }
    }

    /**
     * What a change applies to: the whole gym, one discipline, or one wall.
     *
     * @param gym the gym, or null when the archive holds one
     * @param discipline the discipline's word, or null
     * @param wall the wall, or null
     * @param from the day the value takes effect; null for today at the gym, or for the archive's beginning when the
     *     setting has no earlier value in this scope (a first target then applies to every reset already archived)
     */
    public record Scope(String gym, String discipline, String wall, LocalDate from) {}

    /**
     * A change made.
     *
     * @param gym the gym's name
     * @param key the setting
     * @param scopeWords what it applies to, for people ({@code  of wall Cave}, {@code  (rope)}, or empty)
     * @param from the day it takes effect ({@link SettingValue#THE_START} for a first value given no day)
     * @param valueText the value as typed back, or null for a return to the default
     */
    public record Change(String gym, SettingKey key, String scopeWords, LocalDate from, String valueText) {
        /** True when the value applies from the archive's beginning: the gym's first, given no day. */
        public boolean fromTheStart() {
            return !from.isAfter(SettingValue.THE_START);
        }
    }

    /**
     * A change in the history.
     *
     * @param value the value and the day it took effect
     * @param scopeWords its scope for people ({@code wall Cave}, {@code rope}, or empty)
     */
    public record Past(SettingValue value, String scopeWords) {}

    /** The settings in effect on a day (null: today at the gym). */
    public InEffect inEffect(String gym, LocalDate on) {
        ArchiveCatalog catalog = new ArchiveCatalog(workspace.archive().connection());
        GymRecord g = catalog.gym(gym);
        LocalDate day = on != null ? on : workspace.today(g.name());
        GymSettings s = new SettingsReader(workspace.archive().connection()).inEffectOn(g.id(), day);
        return new InEffect(g.name(), day, SettingsListing.of(s, catalog.walls(g.id())));
    }

    /**
     * Gives a setting a value from a day on, or (value null) returns it to its default from then.
     *
     * @throws IllegalArgumentException for an unknown gym, wall or discipline, a scope the setting does not take,
     *     both a discipline and a wall, or a value that cannot be read (the message says what was expected)
     */
    public Change set(Scope where, SettingKey key, String value) {
        if (where.discipline() != null && where.wall() != null) {
            throw new IllegalArgumentException("a setting applies to one discipline or one wall, not both");
        }
        ArchiveCatalog catalog = new ArchiveCatalog(workspace.archive().connection());
        GymRecord g = catalog.gym(where.gym());
        String scope = where.wall() != null
                ? GymSettings.scopeOf(catalog.wall(g, where.wall()))
                : where.discipline() != null
                        ? Discipline.parse(where.discipline()).word()
                        : "";
        boolean first = new SettingsReader(workspace.archive().connection())
                .history(g.id()).stream()
                        .noneMatch(v -> v.key() == key && v.scope().equals(scope));
        LocalDate from =
                where.from() != null ? where.from() : first ? SettingValue.THE_START : workspace.today(g.name());
        var parsed = value == null ? null : key.parse(value);
        workspace.write(tx -> SettingsWriter.set(tx, g.name(), key, scope, from, parsed));
        String words = where.wall() != null
                ? " of wall " + where.wall().strip()
                : where.discipline() != null ? " (" + scope + ")" : "";
        return new Change(g.name(), key, words, from, parsed == null ? null : key.text(parsed));
    }

    /** Every change a gym made, in the order they took effect. */
    public List<Past> history(String gym) {
        ArchiveCatalog catalog = new ArchiveCatalog(workspace.archive().connection());
        GymRecord g = catalog.gym(gym);
        List<WallRecord> walls = catalog.walls(g.id());
        return new SettingsReader(workspace.archive().connection())
                .history(g.id()).stream()
                        .map(v -> new Past(v, scopeWords(v, walls)))
                        .toList();
    }

    /** The history for scripts. */
    public static ObjectNode json(String gym, List<Past> history) {
        ObjectNode o = Json.object().put("gym", gym);
        ArrayNode a = o.putArray("changes");
        history.forEach(p -> a.addObject()
                .put("from", p.value().effectiveOn().toString())
                .put("from_the_start", p.value().fromTheStart())
                .put("key", p.value().key().word())
                .put("scope", p.scopeWords())
                .put("value", p.value().value() == null ? null : p.value().text()));
        return o;
    }

    /** The gym's name as the archive holds it (the only gym's when null). */
    public String gymName(String gym) {
        return new ArchiveCatalog(workspace.archive().connection()).gym(gym).name();
    }

    private static String scopeWords(SettingValue v, List<WallRecord> walls) {
        return walls.stream()
                .filter(w -> GymSettings.scopeOf(w).equals(v.scope()))
                .map(w -> "wall " + w.name())
                .findFirst()
                .orElse(v.scope());
    }
}
