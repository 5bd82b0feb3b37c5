package org.variset.cli.command;

import java.nio.file.Path;
import java.util.List;
import org.variset.archive.location.ArchiveLocation;
import org.variset.cli.ExitCode;
import org.variset.cli.VarisetCli;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ScopeType;

/** The root command: global options and the list of subcommands. */
@Command(
        name = "variset",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        sortOptions = false,
        header = "Variset: the archive of a gym's route setting, and variety audits of every reset.",
        description = {
            "",
            "Keeps every reset, route and hold placement in an archive, and audits resets for "
                    + "variety of grip directions, holds, moves and grades.",
            ""
        },
        footerHeading = "%nExit status:%n",
        footer = {
            "  0   done",
            "  1   bad input (the message names the file, line and what was expected)",
            "  2   bad usage (unknown option or command, missing argument)",
            "  3   archive problem (missing, in use, damaged, or newer than this Variset)",
            "  70  internal fault (run again with --verbose and report the stack trace)",
            "",
            "Where the archive lives: --archive DIR or --db URL, else $VARISET_ARCHIVE or $VARISET_DB, else "
                    + "'archive' or 'db' in $XDG_CONFIG_HOME/variset/variset.properties, else $XDG_DATA_HOME/variset, "
                    + "else ~/.local/share/variset. A shared archive's search index is kept per client in "
                    + "$XDG_CACHE_HOME/variset."
        })
public final class RootCommand implements Runnable {
    private final VarisetCli cli;

    @Option(
            names = "--archive",
            paramLabel = "DIR",
            scope = ScopeType.INHERIT,
            description = "The archive folder (default: $VARISET_ARCHIVE, else 'archive' in the configuration "
                    + "file, else $XDG_DATA_HOME/variset, else ~/.local/share/variset).")
    Path archive;

    @Option(
            names = "--db",
            paramLabel = "URL",
            scope = ScopeType.INHERIT,
            description = "A shared archive on a PostgreSQL server, as postgresql://[user@]host[:port]/database"
                    + "[?currentSchema=name] (default: $VARISET_DB, else 'db' in the configuration file). The "
                    + "password comes from $PGPASSWORD or ~/.pgpass, never from the address.")
    String db;

    @Option(
            names = "--verbose",
            scope = ScopeType.INHERIT,
            description = "Show how long each phase of an import took, library log lines and stack traces on "
                    + "standard error.")
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

    private ArchiveLocation location;

    /** Where the archive lives for this run (resolved once: a server address reads the password file). */
    ArchiveLocation location() {
        if (location == null) {
            location = ArchiveLocation.resolve(archive, db, cli.env(), cli.home());
        }
        return location;
    }

    @Override
    public void run() {
        spec.commandLine().usage(cli.out());
    }

    /**
     * Adds the subcommand a command line names, or all of them when it names none, names one that does not exist
     * (so that picocli can suggest the nearest) or asks for {@code help}. Building picocli's model of every command
     * costs a few hundred milliseconds of start-up, so a run that names its command builds only that one.
     */
    public static void addSubcommands(CommandLine cl, String[] args) {
        CommandCatalog catalog = CommandCatalog.get();
        String wanted = catalog.commandName(args);
        List<CommandCatalog.Entry> chosen =
                catalog.commands().stream().filter(c -> c.name().equals(wanted)).toList();
        for (CommandCatalog.Entry c : chosen.isEmpty() || "help".equals(wanted) ? catalog.commands() : chosen) {
            cl.addSubcommand(c.type());
        }
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
