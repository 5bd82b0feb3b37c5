package org.variset.archive.location;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.variset.archive.problem.InputException;
import org.variset.archive.problem.Remedy;

class ArchiveLocationTest {
    private final Path home = Path.of("/home/kit");

    @Test
    void ignoresARelativeXdgDataHomeAsTheXdgSpecificationSays() {
        // XDG Base Directory Specification 0.8: relative paths in XDG variables are invalid and should be ignored.
        ArchiveLocation l = ArchiveLocation.resolve(null, Map.of("XDG_DATA_HOME", "rel/data"), home);
        assertThat(l.dir()).isEqualTo(Path.of("/home/kit/.local/share/variset"));
    }

    @Test
    void ignoresABlankEnvironmentVariable() {
        ArchiveLocation l = ArchiveLocation.resolve(null, Map.of("VARISET_ARCHIVE", " "), home);
        assertThat(l.origin().kind()).isEqualTo(ArchiveLocation.Origin.Kind.DEFAULT);
    }

    @Test
    void takesTheServerFromTheOptionBeforeTheEnvironmentAndKeepsItsIndexInTheCache() {
        ArchiveLocation l = ArchiveLocation.resolve(
                null,
                "postgresql://ops@db.example:6543/chain",
                Map.of("VARISET_ARCHIVE", "/srv/a", "XDG_CACHE_HOME", "/var/cache/kit"),
                home);
        assertThat(l.shared()).isTrue();
        assertThat(l.origin().kind()).isEqualTo(ArchiveLocation.Origin.Kind.GIVEN);
        assertThat(l.shown()).isEqualTo("postgresql://ops@db.example:6543/chain");
        assertThat(l.indexDir().toString())
                .startsWith("/var/cache/kit/variset/db.example-6543-chain-")
                .endsWith("/index");
        assertThat(l.clientDir()).isEqualTo(l.indexDir().getParent());
        assertThat(l.dir()).isNull();
    }

    @Test
    void refusesBothKindsAtOneLevel() {
        assertThatThrownBy(() -> ArchiveLocation.resolve(Path.of("/a"), "postgresql://h/d", Map.of(), home))
                .isInstanceOfSatisfying(
                        InputException.class,
                        e -> assertThat(e.remedy())
                                .isEqualTo(Remedy.of(Remedy.Kind.CHOOSE_LOCATION, "level", "given")));
        assertThatThrownBy(() -> ArchiveLocation.resolve(
                        null, null, Map.of("VARISET_ARCHIVE", "/a", "VARISET_DB", "postgresql://h/d"), home))
                .hasMessageContaining("unset one of them")
                .isInstanceOfSatisfying(
                        InputException.class,
                        e -> assertThat(e.remedy())
                                .isEqualTo(Remedy.of(Remedy.Kind.CHOOSE_LOCATION, "level", "environment")));
    }

    @Test
    void readsTheConfigurationFileAfterTheEnvironment(@TempDir Path tmp) throws Exception {
        Path config = tmp.resolve("config/variset/variset.properties");
        Files.createDirectories(config.getParent());
        Files.writeString(config, "# the chain's server\ndb = postgresql://127.0.0.1/chain\n");
        Map<String, String> env =
                Map.of("XDG_CONFIG_HOME", tmp.resolve("config").toString());
        ArchiveLocation l = ArchiveLocation.resolve(null, null, env, home);
        assertThat(l.shown()).endsWith("@127.0.0.1:5432/chain");
        assertThat(l.origin())
                .isEqualTo(new ArchiveLocation.Origin(ArchiveLocation.Origin.Kind.CONFIG_FILE, config.toString()));
        assertThat(l.indexDir()).startsWithRaw(home.resolve(".cache/variset"));
        ArchiveLocation env2 = ArchiveLocation.resolve(
                null,
                null,
                Map.of("XDG_CONFIG_HOME", tmp.resolve("config").toString(), "VARISET_ARCHIVE", "/srv/a"),
                home);
        assertThat(env2.dir()).isEqualTo(Path.of("/srv/a"));
        Files.writeString(config, "db = postgresql://h/d\narchive = /srv/a\n");
        assertThatThrownBy(() -> ArchiveLocation.resolve(null, null, env, home))
                .hasMessageContaining("sets both 'db' and 'archive'");
    }
}
