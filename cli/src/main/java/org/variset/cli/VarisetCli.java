package org.variset.cli;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Clock;
import java.util.Map;
import java.util.Objects;
import org.variset.cli.command.RootCommand;
import picocli.CommandLine;

/**
 * Runs one Variset command in-process, with its environment injected so that tests control the archive
 * location, the clock and the output streams.
 *
 * @param in where confirmations are read from
 * @param out where results go
 * @param err where messages, warnings and progress go
 * @param env the environment variables
 * @param home the user's home folder
 * @param clock the clock that decides "today"
 */
public record VarisetCli(
        BufferedReader in, PrintWriter out, PrintWriter err, Map<String, String> env, Path home, Clock clock) {

    static {
        // Hibernate logs through JBoss Logging; send it to java.util.logging, which RootCommand keeps quiet.
        System.setProperty("org.jboss.logging.provider", "jdk");
        // Charts are drawn with Java2D into PDF; there is never a screen.
        System.setProperty("java.awt.headless", "true");
    }

    /** Checks the fields. */
    public VarisetCli {
        Objects.requireNonNull(in, "in");
        Objects.requireNonNull(out, "out");
        Objects.requireNonNull(err, "err");
        Objects.requireNonNull(env, "env");
        Objects.requireNonNull(home, "home");
        Objects.requireNonNull(clock, "clock");
    }

    /** The real console, environment, home folder and clock. */
    public static VarisetCli system() {
        return new VarisetCli(
                new BufferedReader(new InputStreamReader(System.in, StandardCharsets.UTF_8)),
                new PrintWriter(System.out, true, StandardCharsets.UTF_8),
                new PrintWriter(System.err, true, StandardCharsets.UTF_8),
                System.getenv(),
                Path.of(System.getProperty("user.home")),
                Clock.systemUTC());
    }

    /**
     * Runs one command line.
     *
     * @return the exit status (see {@link ExitCode})
     */
    public int run(String... args) {
        CommandLine cl = new CommandLine(new RootCommand(this));
        RootCommand.addSubcommands(cl, args);
        cl.setOut(out);
        cl.setErr(err);
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.setUsageHelpAutoWidth(true);
        cl.setParameterExceptionHandler(RootCommand::onParameterException);
        try {
            return cl.execute(args);
        } finally {
            out.flush();
            err.flush();
        }
    }
}
