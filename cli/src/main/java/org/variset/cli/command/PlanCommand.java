package org.variset.cli.command;

import java.time.LocalDate;
import org.variset.app.Json;
import org.variset.app.Workspace;
import org.variset.app.plan.PlanReset;
import org.variset.cli.ExitCode;
import org.variset.cli.convert.DateConverter;
import org.variset.cli.render.PlanText;
import org.variset.reports.plan.ResetPlan;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Proposes what a wall's next reset should bring. */
@Command(
        name = "plan",
        mixinStandardHelpOptions = true,
        sortOptions = false,
        description = {
            "Propose what a wall's next reset should bring: grade slots that bring the gym's routes up "
                    + "that day as close as possible to the grade target once the wall's current routes come down; grip "
                    + "directions, hold types, moves and styles whose share has fallen behind the gym's last twelve "
                    + "months; and the hold shapes the wall used in its last three resets, to rest.",
            ""
        },
        footer = {
            "",
            "Examples:",
            "  variset plan --wall Cave --routes 8",
            "  variset plan --wall Cave --on 2026-04-06 --routes 8 --margin 0.1 --format json"
        })
final class PlanCommand extends VarisetSubcommand {
    @Mixin
    GymOptions gym;

    @Option(names = "--wall", required = true, paramLabel = "WALL", description = "The wall to reset.")
    String wall;

    @Option(
            names = "--on",
            paramLabel = "DATE",
            converter = DateConverter.class,
            description = "The day of the reset (default: today).")
    LocalDate on;

    @Option(names = "--routes", required = true, paramLabel = "N", description = "How many routes it will bring.")
    int routes;

    @Option(
            names = "--margin",
            paramLabel = "SHARE",
            defaultValue = "0.05",
            description = "How far (as a share, 0.05 = 5 points) a category must be below its twelve-month share "
                    + "to be listed (default: ${DEFAULT-VALUE}).")
    double margin;

    @Mixin
    FormatOptions format;

    @Override
    ExitCode execute() {
        ResetPlan plan;
        try (Workspace w = workspace()) {
            plan = new PlanReset(w).plan(gym.gym, wall, on, routes, margin);
        }
        if (format.json()) {
            out().println(Json.write(PlanReset.json(plan)));
        } else {
            out().print(PlanText.of(plan));
        }
        return ExitCode.OK;
    }
}
