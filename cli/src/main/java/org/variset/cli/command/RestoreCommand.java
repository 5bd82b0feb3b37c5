package org.variset.cli.command;

import java.nio.file.Path;
import org.variset.app.archive.BackupArchive;
import org.variset.cli.ExitCode;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** Restores the archive from a backup. */
@Command(
        name = "restore",
        mixinStandardHelpOptions = true,
        description = {
            "Restore the archive from a backup FILE written by 'variset backup'. The backup is checked "
                    + "against its manifest (checksum, counts), opened in a new folder beside the archive, and only then "
                    + "put in the archive's place: a damaged or foreign file is refused and the archive is never left "
                    + "half-restored. Replacing an existing archive needs --force."
        },
        footer = {"", "Example:", "  variset --archive ~/gym-archive restore backups/archive-2026-12-02.zip --force"})
final class RestoreCommand extends VarisetSubcommand {
    @Parameters(paramLabel = "FILE", description = "The backup file.")
    Path file;

    @Option(names = "--force", description = "Replace the archive that is there.")
    boolean force;

    @Override
    ExitCode execute() {
        BackupArchive.Result r = BackupArchive.restore(root().location(), file, force);
        out().println("Restored " + file + " into " + root().location().dir()
                + (r.replaced() ? " (the archive that was there is replaced)" : "") + ": " + r.routes() + " routes, "
                + r.holds() + " holds, backed up " + r.created() + ". The search index is rebuilt on the next search.");
        return ExitCode.OK;
    }
}
