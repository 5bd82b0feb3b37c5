package org.variset.cli.command;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.variset.archive.grade.Discipline;
import org.variset.archive.gym.Gym;
import org.variset.archive.gym.GymCalendar;
import org.variset.archive.read.ArchiveCatalog;
import org.variset.archive.read.GymRecord;
import org.variset.archive.read.WallRecord;
import org.variset.archive.settings.GymSettings;
import org.variset.archive.settings.SettingKey;
import org.variset.archive.settings.SettingValue;
import org.variset.archive.settings.SettingsListing;
import org.variset.archive.settings.SettingsReader;
import org.variset.archive.settings.SettingsWriter;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveQueries;
import org.variset.cli.ExitCode;
import org.variset.cli.convert.DateConverter;
import org.variset.cli.internal.IndexUpkeep;
import org.variset.cli.internal.Json;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;

/** Shows and changes a gym's settings; every change is kept with the day it took effect. */
@Command(
        name = "settings",
        mixinStandardHelpOptions = true,
        sortOptions = false,
        description = {
            "Show the settings in effect for a gym on a day, with where each value came from. Change "
                    + "them with 'settings set'; every value is kept with the day it took effect, so an audit of an "
                    + "earlier day uses the settings of its day.",
            ""
        },
        subcommands = {SettingsCommand.Set.class, SettingsCommand.Clear.class, SettingsCommand.History.class},
        footer = {
            "",
            "Settings:",
            "  target                 target grade shares per band (--discipline)",
            "  bands                  grade bands as label@lower-edge on the IRCRA axis (--discipline)",
            "  near_repeat_threshold  Jaccard index from which two routes are near-repeats",
            "  lookback_days          how far back a reset is compared",
            "  reach_height_m, reach_factor   spans longer than factor x height are flagged",
            "  score_weights          weights of the score's parts (grip, holds, moves, grades, novelty)",
            "  cycle_days             reset cycle (--discipline or --wall)",
            "  overdue_after_days     days past the cycle before a wall is overdue",
            "  vocabulary             the gym's own terms and spellings (--file)",
            "",
            "Examples:",
            "  variset settings --on 2026-03-01",
            "  variset settings set target \"VB=1 V0=2 V1=3 V2=4 V3=5 V4=5 V5=4 V6=3 V7=2\" --discipline boulder",
            "  variset settings set cycle_days 21 --wall Cave --from 2026-04-01",
            "  variset settings set vocabulary --file our-terms.txt"
        })
final class SettingsCommand extends VarisetSubcommand {
    @Mixin
    GymOptions gym;

    @Option(
            names = "--on",
            paramLabel = "DATE",
            converter = DateConverter.class,
            description = "Show the settings in effect on this day (default: today).")
    LocalDate on;

    @Mixin
    FormatOptions format;

    @Override
    ExitCode execute() {
        try (Archive archive = openArchive()) {
            ArchiveCatalog catalog = new ArchiveCatalog(archive.connection());
            GymRecord g = catalog.gym(gym.gym);
            LocalDate day = on != null ? on : new GymCalendar(root().cli().clock()).today(g.zone());
            GymSettings s = new SettingsReader(archive.connection()).inEffectOn(g.id(), day);
            List<SettingsListing.Row> rows = SettingsListing.of(s, catalog.walls(g.id()));
            if (format.json()) {
                ObjectNode o = Json.object().put("gym", g.name()).put("on", day.toString());
                ArrayNode a = o.putArray("settings");
                rows.forEach(r -> a.addObject()
                        .put("key", r.key())
                        .put("scope", r.scope())
                        .put("value", r.value())
                        .put("source", r.source()));
                out().println(Json.write(o));
            } else {
                out().println("Settings of " + g.name() + " in effect on " + day);
                int w = rows.stream().mapToInt(r -> label(r).length()).max().orElse(0);
                rows.forEach(r -> out().println("  " + label(r) + " ".repeat(w - label(r).length()) + "  " + r.value()
                        + "  [" + r.source() + "]"));
            }
        }
        return ExitCode.OK;
    }

    private static String label(SettingsListing.Row r) {
        return r.key() + (r.scope().isEmpty() ? "" : " (" + r.scope() + ")");
    }

    /** The options that say what a value applies to and from when. */
    static final class Where {
        @Mixin
        GymOptions gym;

        @Option(names = "--discipline", paramLabel = "D", description = "boulder or rope.")
        String discipline;

        @Option(names = "--wall", paramLabel = "WALL", description = "One wall (cycle_days).")
        String wall;

        @Option(
                names = "--from",
                paramLabel = "DATE",
                converter = DateConverter.class,
                description = "The day the value takes effect (default: today).")
        LocalDate from;
    }

    /** Stores a value (or, with a null value, the return to the default) from a day on. */
    static ExitCode change(VarisetSubcommand cmd, Where where, SettingKey key, String text) {
        try (Archive archive = cmd.openArchive()) {
            ArchiveCatalog catalog = new ArchiveCatalog(archive.connection());
            GymRecord g = catalog.gym(where.gym.gym);
            if (where.discipline != null && where.wall != null) {
                throw new ParameterException(cmd.spec.commandLine(), "give --discipline or --wall, not both");
            }
            String scope = where.wall != null
                    ? GymSettings.scopeOf(catalog.wall(g, where.wall))
                    : where.discipline != null
                            ? Discipline.parse(where.discipline).word()
                            : "";
            LocalDate from = where.from != null
                    ? where.from
                    : new GymCalendar(cmd.root().cli().clock()).today(g.zone());
            GymSettings before = new SettingsReader(archive.connection()).inEffectOn(g.id(), from);
            archive.inTransaction(s -> {
                Gym entity = new ArchiveQueries(s).gym(g.name()).orElseThrow();
                SettingsWriter.set(s, entity, key, scope, from, text == null ? null : key.parse(text), before);
            });
            IndexUpkeep.afterWrite(archive, cmd.err());
            String what = key.word()
                    + (where.wall != null
                            ? " of wall " + where.wall.strip()
                            : where.discipline != null ? " (" + scope + ")" : "");
            cmd.out()
                    .println(
                            text == null
                                    ? "From " + from + ", " + what + " of " + g.name() + " is back to its " + "default."
                                    : "From " + from + ", " + what + " of " + g.name() + " is "
                                            + key.text(key.parse(text)) + ".");
        }
        return ExitCode.OK;
    }

    /** {@code variset settings set KEY VALUE}. */
    @Command(name = "set", mixinStandardHelpOptions = true, description = "Give a setting a value from a day on.")
    static final class Set extends VarisetSubcommand {
        @Parameters(index = "0", paramLabel = "KEY", description = "The setting (see 'variset settings --help').")
        String key;

        @Parameters(index = "1", paramLabel = "VALUE", arity = "0..1", description = "The value.")
        String value;

        @Option(
                names = "--file",
                paramLabel = "FILE",
                description = "Read the value from a UTF-8 file " + "(vocabulary).")
        Path file;

        @Mixin
        Where where;

        @Override
        ExitCode execute() {
            SettingKey k = SettingKey.of(key);
            if ((value == null) == (file == null)) {
                throw new ParameterException(
                        spec.commandLine(),
                        (value == null
                                        ? "give the value of " + k.word() + " or --file"
                                        : "give the value of " + k.word() + " or --file, not both")
                                + " (expected "
                                + k.expected() + ")");
            }
            String text = value;
            if (file != null) {
                try {
                    text = Files.readString(file, StandardCharsets.UTF_8);
                } catch (IOException e) {
                    throw new IllegalArgumentException("cannot read " + file + ": " + e.getMessage(), e);
                }
            }
            return change(this, where, k, text);
        }
    }

    /** {@code variset settings clear KEY}. */
    @Command(
            name = "clear",
            mixinStandardHelpOptions = true,
            description = "Go back to a setting's default from a day on (earlier values stay for earlier days).")
    static final class Clear extends VarisetSubcommand {
        @Parameters(index = "0", paramLabel = "KEY")
        String key;

        @Mixin
        Where where;

        @Override
        ExitCode execute() {
            return change(this, where, SettingKey.of(key), null);
        }
    }

    /** {@code variset settings history}. */
    @Command(name = "history", mixinStandardHelpOptions = true, description = "List every settings change of a gym.")
    static final class History extends VarisetSubcommand {
        @Mixin
        GymOptions gym;

        @Mixin
        FormatOptions format;

        @Override
        ExitCode execute() {
            try (Archive archive = openArchive()) {
                ArchiveCatalog catalog = new ArchiveCatalog(archive.connection());
                GymRecord g = catalog.gym(gym.gym);
                List<SettingValue> h = new SettingsReader(archive.connection()).history(g.id());
                List<WallRecord> walls = catalog.walls(g.id());
                if (format.json()) {
                    ObjectNode o = Json.object().put("gym", g.name());
                    ArrayNode a = o.putArray("changes");
                    h.forEach(v -> a.addObject()
                            .put("from", v.effectiveOn().toString())
                            .put("key", v.key().word())
                            .put("scope", scope(v, walls))
                            .put("value", v.value() == null ? null : v.text()));
                    out().println(Json.write(o));
                } else if (h.isEmpty()) {
                    out().println(g.name() + " has changed no setting: every value is the default.");
                } else {
                    h.forEach(v -> out().println(v.effectiveOn() + "  "
                            + v.key().word() + (scope(v, walls).isEmpty() ? "" : " (" + scope(v, walls) + ")") + "  "
                            + v.text()));
                }
            }
            return ExitCode.OK;
        }

        private static String scope(SettingValue v, List<WallRecord> walls) {
            return walls.stream()
                    .filter(w -> GymSettings.scopeOf(w).equals(v.scope()))
                    .map(w -> "wall " + w.name())
                    .findFirst()
                    .orElse(v.scope());
        }
    }
}
