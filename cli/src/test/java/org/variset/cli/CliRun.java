package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.BufferedReader;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.Map;

/**
 * Runs one command in-process and keeps what it printed. When an expectation fails, the message shows the
 * command, its exit status and both streams.
 *
 * @param args the command line
 * @param exit the exit status
 * @param out what went to standard output
 * @param err what went to standard error
 */
public record CliRun(String[] args, int exit, String out, String err) {

    /** A fixed "now" for tests: 2026-12-02 10:00 UTC. */
    public static final Clock CLOCK = Clock.fixed(Instant.parse("2026-12-02T10:00:00Z"), ZoneOffset.UTC);

    /** Runs a command with the given environment and home folder. */
    public static CliRun run(Map<String, String> env, Path home, String... args) {
        return withInput("", env, home, args);
    }

    /** Runs a command that reads the given text from standard input (confirmations). */
    public static CliRun withInput(String input, Map<String, String> env, Path home, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int exit = new VarisetCli(
                        new BufferedReader(new StringReader(input)),
                        new PrintWriter(out, true),
                        new PrintWriter(err, true),
                        env,
                        home,
                        CLOCK)
                .run(args);
        return new CliRun(args, exit, out.toString(), err.toString());
    }

    /** Runs a command with an empty environment and the given home folder. */
    public static CliRun run(Path home, String... args) {
        return run(Map.of(), home, args);
    }

    /** Checks the exit status, showing everything when it differs. */
    public CliRun exits(ExitCode expected) {
        assertThat(exit).as(this::describe).isEqualTo(expected.code());
        return this;
    }

    /** Everything the run did, for failure messages. */
    public String describe() {
        return "variset " + String.join(" ", args) + "\nexit " + exit + "\n--- stdout\n" + out + "--- stderr\n" + err;
    }
}
