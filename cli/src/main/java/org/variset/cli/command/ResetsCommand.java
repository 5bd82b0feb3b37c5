package org.variset.cli.command;

import java.time.LocalDate;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.app.names.ListResets;
import org.variset.cli.ExitCode;
import org.variset.cli.convert.DateConverter;
import org.variset.cli.render.NameText;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Lists a gym's resets. */
@Command(
        name = "resets",
        mixinStandardHelpOptions = true,
        description = "List a gym's resets, newest first: label (what 'audit --reset' takes), wall, day, routes set "
                + "and routes still up on a day.",
        footer = {"", "Examples:", "  variset resets", "  variset resets --wall Cave --format json"})
final class ResetsCommand extends VarisetSubcommand {
    @Mixin
    GymOptions gym;

    @Option(names = "--wall", paramLabel = "WALL", description = "Only this wall's resets.")
    String wall;

    @Option(
            names = "--on",
            paramLabel = "DATE",
            converter = DateConverter.class,
            description = "Count the routes still up on this day (default: today).")
    LocalDate on;

    @Mixin
    FormatOptions format;

    @Override
    ExitCode execute() {
        ListResets.Result r;
        try (Workspace w = workspace()) {
            r = new ListResets(w).list(gym.gym, wall, on);
        }
        out().print(format.json() ? Json.write(r.json()) + "\n" : NameText.resets(r));
        return ExitCode.OK;
    }
}
