package org.variset.archive.store;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Statement;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.hibernate.SessionFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.archive.problem.ArchiveException;
import org.variset.archive.problem.Remedy;
import org.variset.archive.schema.SchemaVersion;
import org.variset.archive.testing.TestArchives;

class SchemaTest {

    @Test
    void knowsTheNewestMigrationAsItsLatestVersion() throws IOException, URISyntaxException {
        // SQL steps are resources; a step that needs Java (V5, reading grades again) is a class in db.migration.
        Pattern name = Pattern.compile("V(\\d+)__.+\\.(sql|class)");
        int highest = 0;
        for (java.net.URL url :
                java.util.Collections.list(SchemaTest.class.getClassLoader().getResources("db/migration"))) {
            try (Stream<Path> files = Files.list(Path.of(url.toURI()))) {
                highest = Math.max(
                        highest,
                        files.map(p -> name.matcher(p.getFileName().toString()))
                                .filter(Matcher::matches)
                                .mapToInt(m -> Integer.parseInt(m.group(1)))
                                .max()
                                .orElse(0));
            }
        }
        assertThat(SchemaVersion.LATEST).isEqualTo(highest);
    }

    /** Normal runs skip validation, so this test is the one place the mapping meets the migrated schema. */
    @Test
    void mapsTheEntitiesOntoTheSchemaTheMigrationsBuild() {
        try (Archive archive = TestArchives.fresh()) {
            try (SessionFactory sf = OrmBootstrap.buildValidating(archive.dataSource(), archive.engine())) {
                assertThat(sf.isOpen()).isTrue();
            }
        }
    }

    @Test
    void createsThenReopensAnArchiveWithoutMigratingAgain(@TempDir Path tmp) throws Exception {
        Path dir = tmp.resolve("a");
        try (Archive a = Archive.create(dir)) {
            assertThat(a.schemaVersion()).isEqualTo(new SchemaVersion(SchemaVersion.LATEST, false));
        }
        try (Archive a = Archive.open(dir)) {
            assertThat(a.stats().routes()).isZero();
            try (Statement s = a.connection().createStatement()) {
                var rs = s.executeQuery("SELECT COUNT(*) FROM \"flyway_schema_history\" WHERE \"version\" IS NOT NULL");
                rs.next();
                assertThat(rs.getInt(1)).isEqualTo(SchemaVersion.LATEST);
            }
        }
    }

    @Test
    void refusesAnArchiveFromANewerSchema(@TempDir Path tmp) throws Exception {
        Path dir = tmp.resolve("a");
        try (Archive a = Archive.create(dir);
                Statement s = a.connection().createStatement()) {
            s.executeUpdate("UPDATE \"flyway_schema_history\" SET \"version\" = '99' WHERE \"version\" = '1'");
        }
        assertThatThrownBy(() -> Archive.open(dir))
                .isInstanceOfSatisfying(
                        ArchiveException.class,
                        e -> assertThat(e.problem()).isEqualTo(ArchiveException.Problem.TOO_NEW))
                .hasMessageContaining("schema version 99")
                .hasMessageContaining("newer");
    }

    @Test
    void saysHowToCreateAMissingArchive(@TempDir Path tmp) {
        assertThatThrownBy(() -> Archive.open(tmp.resolve("none")))
                .isInstanceOfSatisfying(
                        ArchiveException.class,
                        e -> assertThat(e.remedy())
                                .isEqualTo(Remedy.of(
                                        Remedy.Kind.CREATE_ARCHIVE,
                                        "where",
                                        tmp.resolve("none").toString(),
                                        "shared",
                                        "false")))
                .hasMessageContaining("No archive at");
        assertThat(Files.exists(tmp.resolve("none"))).isFalse();
    }

    @Test
    void refusesToCreateOverAnExistingArchive(@TempDir Path tmp) {
        Archive.create(tmp).close();
        assertThatThrownBy(() -> Archive.create(tmp)).hasMessageContaining("already an archive");
    }

    @Test
    void makesTheArchiveFolderPrivate(@TempDir Path tmp) throws IOException {
        Path dir = tmp.resolve("private");
        Archive.create(dir).close();
        assertThat(java.nio.file.attribute.PosixFilePermissions.toString(Files.getPosixFilePermissions(dir)))
                .isEqualTo("rwx------");
    }
}
