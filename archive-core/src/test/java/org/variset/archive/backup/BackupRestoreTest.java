package org.variset.archive.backup;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Duration;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.archive.fixture.ResetFixture;
import org.variset.archive.problem.ArchiveException;
import org.variset.archive.problem.InputException;
import org.variset.archive.problem.Remedy;
import org.variset.archive.store.Archive;
import org.variset.archive.store.ArchiveLock;

class BackupRestoreTest {
    @TempDir
    Path tmp;

    private Path original;
    private Path backup;

    @BeforeEach
    void backUpTheFixture() {
        original = tmp.resolve("original");
        try (Archive a = Archive.create(original)) {
            a.inTransaction(ResetFixture::storeFullReset);
        }
        backup = tmp.resolve("backup.zip");
        try (Archive a = Archive.open(original)) {
            ArchiveBackup.write(a, backup, false);
        }
    }

    /** Every row of every table, as H2 scripts it. */
    private static String content(Path dir) throws SQLException {
        StringBuilder b = new StringBuilder();
        try (Archive a = Archive.open(dir);
                Statement s = a.connection().createStatement();
                ResultSet rs = s.executeQuery("SCRIPT NOPASSWORDS NOSETTINGS")) {
            while (rs.next()) {
                b.append(rs.getString(1)).append('\n');
            }
        }
        return b.toString();
    }

    @Test
    void restoresAnIdenticalArchive() throws SQLException {
        Path copy = tmp.resolve("copy");
        ArchiveRestore.Result r = ArchiveRestore.restore(backup, copy, false);
        assertThat(r.replaced()).isFalse();
        assertThat(r.manifest().requiredAt("/counts/routes").asLong()).isEqualTo(2);
        assertThat(content(copy)).isEqualTo(content(original)).contains("Blue 3");
    }

    @Test
    void replacesAnArchiveOnlyWhenAsked() throws SQLException, IOException {
        Path other = tmp.resolve("other");
        try (Archive a = Archive.create(other)) {
            a.stats();
        }
        assertThatThrownBy(() -> ArchiveRestore.restore(backup, other, false))
                .isInstanceOfSatisfying(
                        InputException.class,
                        e -> assertThat(e.remedy().kind()).isEqualTo(Remedy.Kind.REPLACE_EXISTING));
        assertThat(ArchiveRestore.restore(backup, other, true).replaced()).isTrue();
        assertThat(content(other)).isEqualTo(content(original));
        try (var left = Files.list(tmp)) {
            assertThat(left.map(p -> p.getFileName().toString())).noneMatch(n -> n.startsWith("."));
        }
    }

    @Test
    void refusesToOverwriteABackupUnlessAsked() {
        try (Archive a = Archive.open(original)) {
            assertThatThrownBy(() -> ArchiveBackup.write(a, backup, false))
                    .isInstanceOfSatisfying(
                            InputException.class,
                            e -> assertThat(e.remedy())
                                    .isEqualTo(Remedy.of(Remedy.Kind.REPLACE_EXISTING, "file", backup.toString())));
        }
    }

    @Nested
    class RefusesAndLeavesTheArchiveAsItWas {
        private Path target;
        private String before;

        @BeforeEach
        void anArchiveToProtect() throws SQLException {
            target = tmp.resolve("target");
            try (Archive a = Archive.create(target)) {
                a.inTransaction(ResetFixture::storeFullReset);
                a.inTransaction(s ->
                        s.createMutationQuery("update Route set color = 'mine'").executeUpdate());
            }
            before = content(target);
        }

        private void refused(Path file, String why) throws SQLException, IOException {
            assertThatThrownBy(() -> ArchiveRestore.restore(file, target, true))
                    .isInstanceOf(IllegalArgumentException.class)
                    .hasMessageContaining("is not a backup Variset can restore")
                    .hasMessageContaining(why);
            assertThat(content(target)).isEqualTo(before);
            try (var left = Files.list(tmp)) {
                assertThat(left.map(p -> p.getFileName().toString())).noneMatch(n -> n.contains(".restoring-"));
            }
        }

        @Test
        void refusesAFileThatIsNoZip() throws Exception {
            refused(Files.writeString(tmp.resolve("notes.zip"), "just text"), "holds no variset-backup.json");
        }

        @Test
        void refusesAZipWithoutAManifest() throws Exception {
            Path z = tmp.resolve("foreign.zip");
            try (ZipOutputStream out = new ZipOutputStream(Files.newOutputStream(z))) {
                out.putNextEntry(new ZipEntry("photo.jpg"));
                out.write(new byte[] {1, 2, 3});
            }
            refused(z, "holds no variset-backup.json");
        }

        @Test
        void refusesADamagedDatabase() throws Exception {
            refused(rewrite(backup, tmp.resolve("damaged.zip"), false, 0), "checksum does not match");
        }

        @Test
        void refusesATruncatedBackup() throws Exception {
            byte[] all = Files.readAllBytes(backup);
            Path cut = Files.write(tmp.resolve("cut.zip"), java.util.Arrays.copyOf(all, all.length / 2));
            assertThatThrownBy(() -> ArchiveRestore.restore(cut, target, true))
                    .hasMessageContaining("is not a backup Variset can restore");
            assertThat(content(target)).isEqualTo(before);
        }

        @Test
        void refusesABackupOfANewerVariset() throws Exception {
            refused(rewrite(backup, tmp.resolve("newer.zip"), true, 99), "made with a newer Variset");
        }
    }

    /** A copy of a backup with one byte of the database flipped, or with another schema version in its manifest. */
    private static Path rewrite(Path from, Path to, boolean manifestOnly, int schema) throws IOException {
        try (ZipInputStream in = new ZipInputStream(Files.newInputStream(from));
                ZipOutputStream out = new ZipOutputStream(Files.newOutputStream(to))) {
            for (ZipEntry e; (e = in.getNextEntry()) != null; ) {
                byte[] b = in.readAllBytes();
                if (e.getName().equals(ArchiveBackup.MANIFEST) && manifestOnly) {
                    b = new String(b, StandardCharsets.UTF_8)
                            .replaceFirst("\"schema_version\" : \\d+", "\"schema_version\" : " + schema)
                            .getBytes(StandardCharsets.UTF_8);
                } else if (e.getName().equals(ArchiveBackup.DATABASE) && !manifestOnly) {
                    b[b.length / 2] ^= 0x5a;
                }
                out.putNextEntry(new ZipEntry(e.getName()));
                out.write(b);
                out.closeEntry();
            }
        }
        return to;
    }

    @Nested
    class OneProcessAtATime {
        @Test
        void saysWhichProcessHoldsTheArchive() {
            try (Archive first = Archive.open(original)) {
                assertThat(first.stats().routes()).isEqualTo(2);
                assertThatThrownBy(() -> Archive.open(original, Duration.ZERO))
                        .isInstanceOfSatisfying(
                                ArchiveException.class,
                                e -> assertThat(e.problem()).isEqualTo(ArchiveException.Problem.IN_USE))
                        .hasMessageContaining("is in use by process "
                                + ProcessHandle.current().pid() + " on host ");
            }
            try (Archive again = Archive.open(original, Duration.ZERO)) {
                assertThat(again.stats().routes()).isEqualTo(2);
            }
        }

        @Test
        void keepsTheLockFileReadableByItsOwnerOnly() throws IOException {
            assertThat(java.nio.file.attribute.PosixFilePermissions.toString(
                            Files.getPosixFilePermissions(original.resolve(ArchiveLock.FILE))))
                    .isEqualTo("rw-------");
            assertThat(java.nio.file.attribute.PosixFilePermissions.toString(Files.getPosixFilePermissions(original)))
                    .isEqualTo("rwx------");
        }
    }
}
