package org.variset.cli.command;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.app.settings.GymSettingsUse;
import org.variset.archive.settings.SettingKey;
import org.variset.archive.settings.SettingsListing;
import org.variset.cli.ExitCode;
import org.variset.cli.convert.DateConverter;
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
        GymSettingsUse.InEffect e;
        try (Workspace w = workspace()) {
            e = new GymSettingsUse(w).inEffect(gym.gym, on);
        }
        if (format.json()) {
            out().println(Json.write(e.json()));
        } else {
            out().println("Settings of " + e.gym() + " in effect on " + e.on());
            int width = e.rows().stream().mapToInt(r -> label(r).length()).max().orElse(0);
            e.rows()
                    .forEach(r -> out().println("  " + label(r) + " ".repeat(width - label(r).length()) + "  "
                            + r.value() + "  [" + r.source() + "]"));
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
                description = "The day the value takes effect (default: today; for a setting's first value, the "
                        + "start of the archive, so that audits of earlier resets use it).")
        LocalDate from;
    }

    /** Stores a value (or, with a null value, the return to the default) from a day on. */
    static ExitCode change(VarisetSubcommand cmd, Where where, SettingKey key, String text) {
        if (where.discipline != null && where.wall != null) {
            throw new ParameterException(cmd.spec.commandLine(), "give --discipline or --wall, not both");
        }
        GymSettingsUse.Change c;
        try (Workspace w = cmd.workspace()) {
            c = new GymSettingsUse(w)
                    .set(new GymSettingsUse.Scope(where.gym.gym, where.discipline, where.wall, where.from), key, text);
        }
        String what = c.key().word() + c.scopeWords();
        String from = c.fromTheStart()
                ? "From the start of the archive (its first value, so audits of earlier resets use it too; give "
                        + "--from to start it later)"
                : "From " + c.from();
        cmd.out()
                .println(
                        c.valueText() == null
                                ? from + ", " + what + " of " + c.gym() + " is back to its default."
                                : from + ", " + what + " of " + c.gym() + " is " + c.valueText() + ".");
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
            String name;
            List<GymSettingsUse.Past> h;
            try (Workspace w = workspace()) {
                GymSettingsUse settings = new GymSettingsUse(w);
                name = settings.gymName(gym.gym);
                h = settings.history(gym.gym);
            }
            if (format.json()) {
                out().println(Json.write(GymSettingsUse.json(name, h)));
            } else if (h.isEmpty()) {
                out().println(name + " has changed no setting: every value is the default.");
            } else {
                h.forEach(p -> out().println(p.value().fromWords() + "  "
                        + p.value().key().word() + (p.scopeWords().isEmpty() ? "" : " (" + p.scopeWords() + ")") + "  "
                        + p.value().text()));
            }
            return ExitCode.OK;
        }
    }
}
