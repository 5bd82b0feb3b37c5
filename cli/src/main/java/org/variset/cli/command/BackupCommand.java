package org.variset.cli.command;

import java.nio.file.Path;
import java.time.Duration;
import org.variset.app.archive.BackupArchive;
import org.variset.cli.ExitCode;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** Writes a consistent backup of the archive. */
@Command(
        name = "backup",
        mixinStandardHelpOptions = true,
        description = {
            "Write a backup of the archive to FILE: the database as one consistent snapshot and a "
                    + "manifest with its SHA-256 checksum and counts. The backup takes the archive's lock like any "
                    + "command, so it waits for a running import to finish (up to --wait) and nothing changes while it "
                    + "copies. The search index is not in it: it is rebuilt from the database after a restore."
        },
        footer = {"", "Example:", "  variset backup backups/archive-2026-12-02.zip"})
final class BackupCommand extends VarisetSubcommand {
    @Parameters(paramLabel = "FILE", description = "The backup file to write (a zip).")
    Path file;

    @Option(names = "--force", description = "Replace FILE if it exists.")
    boolean force;

    @Option(
            names = "--wait",
            paramLabel = "SECONDS",
            defaultValue = "60",
            description = "How long to wait for another process using the archive (default: ${DEFAULT-VALUE}).")
    int waitSeconds;

    @Override
    ExitCode execute() {
        BackupArchive.Result r =
                BackupArchive.backup(root().location(), file, force, Duration.ofSeconds(Math.max(0, waitSeconds)));
        out().println("Backed up " + r.routes() + " routes, " + r.holds() + " holds, " + r.gyms()
                + (r.gyms() == 1 ? " gym" : " gyms") + " to " + file + " (schema version " + r.schemaVersion()
                + ", SHA-256 of the database " + r.sha256().substring(0, 16) + "...).");
        return ExitCode.OK;
    }
}
