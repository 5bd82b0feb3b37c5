package org.variset.cli.command;

import java.nio.file.Path;
import org.variset.archive.store.ArchiveLocation;
import org.variset.cli.ExitCode;
import org.variset.cli.VarisetCli;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ScopeType;

/** The root command: global options and the list of subcommands. */
@Command(name = "variset", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        sortOptions = false,
        header = "Variset: the archive of a gym's route setting, and variety audits of every reset.",
        description = {"", "Keeps every reset, route and hold placement in an archive, and audits resets for "
                + "variety of grip directions, holds, moves and grades.", ""},
        subcommands = {DemoCommand.class, InitCommand.class, InfoCommand.class, ImportCommand.class, ExportCommand.class,
            AuditCommand.class, PlanCommand.class, TrendCommand.class, SearchCommand.class, SimilarCommand.class, ReindexCommand.class,
            GenerateCommand.class, CheckCommand.class, BackupCommand.class, RestoreCommand.class,
            SettingsCommand.class,
            StripCommand.class, RemoveCommand.class, AmendCommand.class, SetterCommand.class, TemplateCommand.class,
            GradeCommand.class, CommandLine.HelpCommand.class},
        footerHeading = "%nExit status:%n",
        footer = {"  0   done", "  1   bad input (the message names the file, line and what was expected)",
            "  2   bad usage (unknown option or command, missing argument)",
            "  3   archive problem (missing, in use, damaged, or newer than this Variset)",
            "  70  internal fault (run again with --verbose and report the stack trace)", "",
            "Where the archive lives: --archive DIR, else $VARISET_ARCHIVE, else $XDG_DATA_HOME/variset, "
                + "else ~/.local/share/variset."})
public final class RootCommand implements Runnable {
    private final VarisetCli cli;

    @Option(names = "--archive", paramLabel = "DIR", scope = ScopeType.INHERIT,
            description = "The archive folder (default: $VARISET_ARCHIVE, else $XDG_DATA_HOME/variset, "
                    + "else ~/.local/share/variset).")
    Path archive;

    @Option(names = "--verbose", scope = ScopeType.INHERIT,
            description = "Show library log lines and stack traces on standard error.")
    boolean verbose;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** The root command of one run. */
    public RootCommand(VarisetCli cli) {
        this.cli = cli;
    }

    /** The run's environment. */
    VarisetCli cli() {
        return cli;
    }

    /** Where the archive lives for this run. */
    ArchiveLocation location() {
        return ArchiveLocation.resolve(archive, cli.env(), cli.home());
    }

    @Override
    public void run() {
        spec.commandLine().usage(cli.out());
    }

    /** Prints a usage error with the command's short help and returns the usage exit code. */
    public static int onParameterException(ParameterException ex, String[] args) {
        CommandLine cl = ex.getCommandLine();
        cl.getErr().println("variset: " + ex.getMessage());
        CommandLine.UnmatchedArgumentException.printSuggestions(ex, cl.getErr());
        cl.getErr().println("Try '" + cl.getCommandSpec().qualifiedName() + " --help' for more information.");
        return ExitCode.USAGE.code();
    }
}
