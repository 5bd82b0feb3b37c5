package org.variset.cli.command;

import java.time.LocalDate;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.app.names.ListWalls;
import org.variset.cli.ExitCode;
import org.variset.cli.convert.DateConverter;
import org.variset.cli.render.NameText;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Lists a gym's walls. */
@Command(
        name = "walls",
        mixinStandardHelpOptions = true,
        description = "List a gym's walls: discipline, angle, reset cycle, how many resets, the latest, and the "
                + "routes up on a day.",
        footer = {"", "Example:", "  variset walls --format json"})
final class WallsCommand extends VarisetSubcommand {
    @Mixin
    GymOptions gym;

    @Option(
            names = "--on",
            paramLabel = "DATE",
            converter = DateConverter.class,
            description = "Count the routes up on this day (default: today).")
    LocalDate on;

    @Mixin
    FormatOptions format;

    @Override
    ExitCode execute() {
        ListWalls.Result r;
        try (Workspace w = workspace()) {
            r = new ListWalls(w).list(gym.gym, on);
        }
        out().print(format.json() ? Json.write(r.json()) + "\n" : NameText.walls(r));
        return ExitCode.OK;
    }
}
