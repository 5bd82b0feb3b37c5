package org.variset.cli.command;

import java.time.LocalDate;
import org.variset.app.Workspace;
import org.variset.app.change.StripWall;
import org.variset.archive.change.WallStrip;
import org.variset.cli.ExitCode;
import org.variset.cli.convert.DateConverter;
import org.variset.reports.format.FigureFormat;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Marks a wall's old routes as stripped on the day it was reset. */
@Command(
        name = "strip",
        mixinStandardHelpOptions = true,
        description = {
            "Take a wall's old routes down: every route of the wall set before DATE and still up gets "
                    + "DATE as its strip date. Routes set on DATE (the new set) stay up."
        },
        footer = {"", "Example:", "  variset strip --wall \"Cave\" --on 2026-04-06"})
final class StripCommand extends VarisetSubcommand {
    @Mixin
    GymOptions gym;

    @Option(names = "--wall", required = true, paramLabel = "WALL", description = "The wall that was reset.")
    String wall;

    @Option(
            names = "--on",
            required = true,
            paramLabel = "DATE",
            converter = DateConverter.class,
            description = "The day the old routes came down.")
    LocalDate on;

    @Override
    ExitCode execute() {
        WallStrip.Result r;
        try (Workspace w = workspace()) {
            r = new StripWall(w).strip(gym.gym, wall, on);
        }
        out().println("Stripped " + FigureFormat.count(r.stripped(), "route") + " of " + wall + " on " + on + "; "
                + r.setThatDay()
                + " set that day stay up; " + r.alreadyDown() + " were already down.");
        return ExitCode.OK;
    }
}
