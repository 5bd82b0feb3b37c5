package org.variset.cli.command;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import org.variset.app.Notices;
import org.variset.app.Workspace;
import org.variset.archive.problem.ArchiveException;
import org.variset.archive.problem.InputException;
import org.variset.cli.ExitCode;
import org.variset.cli.internal.Logging;
import org.variset.cli.render.CliWords;
import org.variset.imports.ImportException;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * What every subcommand does the same way: set up logging, run, and turn what went wrong into one clear line
 * on standard error and an {@link ExitCode}. No stack trace reaches the user unless {@code --verbose}.
 */
abstract class VarisetSubcommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    /** The root command of this run (global options and environment). */
    RootCommand root() {
        return (RootCommand) spec.root().userObject();
    }

    /** Where results go. */
    PrintWriter out() {
        return root().cli().out();
    }

    /** Where messages go. */
    PrintWriter err() {
        return root().cli().err();
    }

    /** Notices of the use cases, on standard error. */
    Notices notices() {
        return CliWords.notices(err());
    }

    /** Opens the archive of this run as a workspace, migrating it if it is behind. */
    Workspace workspace() {
        return Workspace.open(root().location(), root().cli().clock(), notices());
    }

    @Override
    public final Integer call() {
        Logging.configure(root().verbose);
        try {
            return execute().code();
        } catch (ParameterException e) {
            throw e; // a usage error found while running: picocli prints it with the usage hint (exit 2)
        } catch (ArchiveException e) {
            return fail(ExitCode.ARCHIVE, CliWords.withRemedy(e.getMessage(), e.remedy()), e);
        } catch (ImportException e) {
            return fail(ExitCode.BAD_INPUT, CliWords.problems(e), e);
        } catch (InputException e) {
            return fail(ExitCode.BAD_INPUT, CliWords.withRemedy(e.getMessage(), e.remedy()), e);
        } catch (IllegalArgumentException e) {
            return fail(ExitCode.BAD_INPUT, e.getMessage(), e);
        } catch (RuntimeException e) {
            return fail(
                    ExitCode.INTERNAL,
                    "internal error: " + e + (root().verbose ? "" : " (run again with --verbose for the stack trace)"),
                    e);
        }
    }

    private int fail(ExitCode code, String message, Throwable e) {
        err().println(spec.qualifiedName() + ": " + message);
        if (root().verbose) {
            e.printStackTrace(err());
        }
        return code.code();
    }

    /** Does the command's work; throws for failures, which {@link #call()} reports. */
    abstract ExitCode execute();
}
