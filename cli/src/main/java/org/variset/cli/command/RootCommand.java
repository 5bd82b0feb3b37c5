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
    /**
     * The subcommands, in the order the help lists them. They are added per run by {@link #addSubcommands}: building
     * picocli's model of every command costs a few hundred milliseconds of start-up, so a run that names its command
     * builds only that one.
     */
    static final List<Class<?>> SUBCOMMANDS = List.of(
            DemoCommand.class,
            InitCommand.class,
            InfoCommand.class,
            ImportCommand.class,
            ExportCommand.class,
            AuditCommand.class,
            PlanCommand.class,
            TrendCommand.class,
            SearchCommand.class,
            SimilarCommand.class,
            ReindexCommand.class,
            GenerateCommand.class,
            CheckCommand.class,
            BackupCommand.class,
            RestoreCommand.class,
            MigrateToCommand.class,
            SettingsCommand.class,
            StripCommand.class,
            RemoveCommand.class,
            AmendCommand.class,
            SetterCommand.class,
            TemplateCommand.class,
            GradeCommand.class,
            TrainStartUpCommand.class,
            CommandLine.HelpCommand.class);

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
     * (so that picocli can suggest the nearest) or asks for {@code help}.
     */
    public static void addSubcommands(CommandLine cl, String[] args) {
        String wanted = commandName(args);
        List<Class<?>> chosen =
                SUBCOMMANDS.stream().filter(c -> nameOf(c).equals(wanted)).toList();
        for (Class<?> c : chosen.isEmpty() || "help".equals(wanted) ? SUBCOMMANDS : chosen) {
            cl.addSubcommand(c);
        }
    }

    /** The first word of a command line that is neither an option nor the value of {@code --archive} or {@code --db}. */
    static String commandName(String[] args) {
        int i = 0;
        while (i < args.length) {
            String a = args[i];
            if (a.equals("--")) {
                return null;
            }
            if (!a.startsWith("-")) {
                return a;
            }
            i += a.equals("--archive") || a.equals("--db") ? 2 : 1;
        }
        return null;
    }

    static String nameOf(Class<?> command) {
        return command.getAnnotation(Command.class).name();
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
