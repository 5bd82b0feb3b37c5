package org.variset.cli.command;

import org.variset.app.Workspace;
import org.variset.app.change.SetterNames;
import org.variset.cli.ExitCode;
import org.variset.reports.format.FigureFormat;
import picocli.CommandLine.Command;
import picocli.CommandLine.Parameters;

/** Renames a setter, or merges two names of one person, across the archive. */
@Command(
        name = "setter",
        mixinStandardHelpOptions = true,
        description = "Rename a setter, or merge two names of one person, across the whole archive.",
        subcommands = {SetterCommand.Rename.class, SetterCommand.Merge.class})
final class SetterCommand implements Runnable {
    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** {@code variset setter rename OLD NEW}. */
    @Command(name = "rename", mixinStandardHelpOptions = true, description = "Rename a setter everywhere.")
    static final class Rename extends VarisetSubcommand {
        @Parameters(index = "0", paramLabel = "OLD")
        String from;

        @Parameters(index = "1", paramLabel = "NEW")
        String to;

        @Override
        ExitCode execute() {
            try (Workspace w = workspace()) {
                new SetterNames(w).rename(from, to);
            }
            out().println("Renamed setter '" + from + "' to '" + to.strip() + "' on every route.");
            return ExitCode.OK;
        }
    }

    /** {@code variset setter merge FROM INTO}. */
    @Command(
            name = "merge",
            mixinStandardHelpOptions = true,
            description = "Give every route of FROM to INTO and remove FROM (\"K. Ames\" into \"Kit Ames\").")
    static final class Merge extends VarisetSubcommand {
        @Parameters(index = "0", paramLabel = "FROM")
        String from;

        @Parameters(index = "1", paramLabel = "INTO")
        String into;

        @Override
        ExitCode execute() {
            int n;
            try (Workspace w = workspace()) {
                n = new SetterNames(w).merge(from, into);
            }
            out().println("Merged '" + from + "' into '" + into + "': " + FigureFormat.count(n, "route")
                    + (n == 1 ? " now names '" : " now name '") + into + "'.");
            return ExitCode.OK;
        }
    }
}
