package org.variset.cli.command;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.variset.app.Workspace;
import org.variset.app.change.RemoveRoutes;
import org.variset.archive.change.RouteRemoval;
import org.variset.cli.ExitCode;
import org.variset.imports.ImportException;
import org.variset.imports.ProblemList;
import org.variset.imports.load.RouteKeys;
import org.variset.reports.format.FigureFormat;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Takes back a mistaken import: a reset by its label, or the routes a file lists. */
@Command(
        name = "remove",
        mixinStandardHelpOptions = true,
        description = {
            "Take back a mistaken import: remove the routes of a reset (by its label), or the routes a "
                    + "routes file lists, with their holds. Shows what will go and asks first; --yes answers for "
                    + "scripts."
        },
        footer = {
            "",
            "Examples:",
            "  variset remove --reset \"Cave 2026-03-02\"",
            "  variset remove --file routes.csv --yes"
        })
final class RemoveCommand extends VarisetSubcommand {
    static final class Target {
        @Option(names = "--reset", paramLabel = "LABEL", description = "The reset's label.")
        String reset;

        @Option(
                names = "--file",
                paramLabel = "FILE",
                description = "A routes file (CSV, XLSX or JSON) whose " + "routes to remove.")
        Path file;
    }

    @ArgGroup(exclusive = true, multiplicity = "1")
    Target target;

    @Mixin
    GymOptions gym;

    @Option(names = "--yes", description = "Remove without asking.")
    boolean yes;

    @Override
    ExitCode execute() {
        try (Workspace w = workspace()) {
            RemoveRoutes removal = new RemoveRoutes(w);
            RouteRemoval.Target t = target();
            RouteRemoval.Plan plan = removal.preview(t);
            if (plan.routes().isEmpty()) {
                out().println("Nothing to remove: no archived route matches.");
                return ExitCode.OK;
            }
            out().println("This removes " + FigureFormat.count(plan.routes().size(), "route") + " and "
                    + FigureFormat.count(plan.holds(), "hold")
                    + (plan.emptiedResets().isEmpty()
                            ? ""
                            : ", and the resets " + String.join(", ", plan.emptiedResets()))
                    + ":");
            plan.routes().stream().limit(20).forEach(r -> out().println("  " + r));
            if (plan.routes().size() > 20) {
                out().println("  ... and " + (plan.routes().size() - 20) + " more");
            }
            if (!yes && !confirmed()) {
                out().println("Nothing removed.");
                return ExitCode.OK;
            }
            RouteRemoval.Plan done = removal.remove(t);
            out().println("Removed " + FigureFormat.count(done.routes().size(), "route") + " and "
                    + FigureFormat.count(done.holds(), "hold") + ".");
        }
        return ExitCode.OK;
    }

    private boolean confirmed() {
        out().print("Remove them? [y/N] ");
        out().flush();
        try {
            String answer = root().cli().in().readLine();
            return answer != null
                    && answer.strip().toLowerCase(java.util.Locale.ROOT).startsWith("y");
        } catch (IOException e) {
            return false;
        }
    }

    /** The routes to take back: a reset's, or those a routes file lists (its unreadable rows are problems). */
    private RouteRemoval.Target target() {
        if (target.reset != null) {
            return new RouteRemoval.OfReset(gym.gym, target.reset);
        }
        ProblemList problems = new ProblemList();
        List<RouteRemoval.Named> named = RouteKeys.read(target.file, problems).stream()
                .map(k -> new RouteRemoval.Named(k.gym(), k.wall(), k.label(), k.setOn()))
                .toList();
        if (!problems.isEmpty()) {
            throw new ImportException(problems);
        }
        return new RouteRemoval.Listed(named);
    }
}
