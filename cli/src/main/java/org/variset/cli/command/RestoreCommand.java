package org.variset.cli.command;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import org.variset.archive.backup.ArchiveRestore;
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
        Path dir = embeddedDir("restore");
        ArchiveRestore.Result r = ArchiveRestore.restore(file, dir, force);
        JsonNode c = r.manifest().get("counts");
        out().println("Restored " + file + " into " + dir
                + (r.replaced() ? " (the archive that was there is " + "replaced)" : "") + ": "
                + c.get("routes").asLong() + " routes, " + c.get("holds").asLong()
                + " holds, backed up " + r.manifest().get("created").asText() + ". The search index is rebuilt on the "
                + "next search.");
        return ExitCode.OK;
    }
}
