package org.variset.archive.server;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Server addresses and where their passwords come from. The password file's format and matching rules are those of
 * the PostgreSQL 15 documentation, section 34.16 "The Password File"; the URI form is that of section 34.1.1.2
 * "Connection URIs".
 */
class ServerAddressTest {
    private static final Path HOME = Path.of("/home/kit");

    @Test
    void readsTheThreeSpellingsWithTheDefaultPortAndTheUserFromTheEnvironment() {
        Map<String, String> env = Map.of("PGUSER", "setter");
        for (String url : new String[] {
            "postgresql://db.example/chain", "postgres://db.example/chain", "jdbc:postgresql://db.example/chain"
        }) {
            ServerAddress a = ServerAddress.parse(url, env, HOME);
            assertThat(a.host()).isEqualTo("db.example");
            assertThat(a.port()).isEqualTo(5432); // PostgreSQL's default port (documentation, section 20.3)
            assertThat(a.database()).isEqualTo("chain");
            assertThat(a.user()).isEqualTo("setter");
            assertThat(a.schema()).isNull();
        }
        ServerAddress s = ServerAddress.parse("postgresql://ops@db.example:6543/chain?currentSchema=north", env, HOME);
        assertThat(s.user()).isEqualTo("ops");
        assertThat(s.port()).isEqualTo(6543);
        assertThat(s.schema()).isEqualTo("north");
        assertThat(s.jdbcUrl())
                .isEqualTo("jdbc:postgresql://db.example:6543/chain?currentSchema=north"
                        + "&ApplicationName=variset&reWriteBatchedInserts=true");
    }

    @Test
    void neverTakesAPasswordFromTheAddressAndNeverShowsOne() {
        assertThatThrownBy(() -> ServerAddress.parse("postgresql://ops:hunter2@h/d", Map.of(), HOME))
                .hasMessageContaining("PGPASSWORD")
                .hasMessageNotContaining("hunter2");
        assertThatThrownBy(() -> ServerAddress.parse("postgresql://h/d?password=hunter2", Map.of(), HOME))
                .hasMessageContaining("does not take passwords");
        ServerAddress a = ServerAddress.parse("postgresql://ops@h/d", Map.of("PGPASSWORD", "hunter2"), HOME);
        assertThat(a.password()).isEqualTo("hunter2");
        assertThat(a.shown() + a + a.jdbcUrl() + a.cacheKey()).doesNotContain("hunter2");
    }

    @Test
    void explainsAnAddressItCannotRead() {
        assertThatThrownBy(() -> ServerAddress.parse("mysql://h/d", Map.of(), HOME))
                .hasMessageContaining("postgresql://host[:port]/database");
        assertThatThrownBy(() -> ServerAddress.parse("postgresql://h", Map.of(), HOME))
                .hasMessageContaining("must name a host and a database");
        assertThatThrownBy(() -> ServerAddress.parse("postgresql://h/d?sslmode=off", Map.of(), HOME))
                .hasMessageContaining("'sslmode'");
    }

    @Test
    void findsThePasswordInThePasswordFileByItsMatchingRules(@TempDir Path tmp) throws Exception {
        Path file = tmp.resolve("pgpass");
        // First match wins; '*' matches anything; '\:' is a colon inside a field (PostgreSQL 15 docs, 34.16).
        Files.writeString(file, """
                # host:port:database:user:password
                other.example:5432:*:*:nope
                db.example:5432:chain:ops:first\\:part
                *:*:*:ops:fallback
                """);
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-------"));
        Map<String, String> env = Map.of("PGPASSFILE", file.toString());
        assertThat(ServerAddress.parse("postgresql://ops@db.example/chain", env, HOME)
                        .password())
                .isEqualTo("first:part");
        assertThat(ServerAddress.parse("postgresql://ops@db.example/stock", env, HOME)
                        .password())
                .isEqualTo("fallback");
        assertThat(ServerAddress.parse("postgresql://kit@db.example/chain", env, HOME)
                        .password())
                .isNull();
        assertThat(ServerAddress.parse(
                                "postgresql://ops@db.example/chain",
                                Map.of("PGPASSFILE", file.toString(), "PGPASSWORD", "from-env"),
                                HOME)
                        .password())
                .as("PGPASSWORD comes first")
                .isEqualTo("from-env");

        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-r--r--"));
        assertThatThrownBy(() -> ServerAddress.parse("postgresql://ops@db.example/chain", env, HOME))
                .hasMessageContaining("chmod 600 " + file);
    }

    @Test
    void givesEachArchiveItsOwnCacheFolder() {
        Map<String, String> env = Map.of("PGUSER", "ops");
        String a =
                ServerAddress.parse("postgresql://db.example/chain", env, HOME).cacheKey();
        String b = ServerAddress.parse("postgresql://db.example/chain?currentSchema=north", env, HOME)
                .cacheKey();
        String c = ServerAddress.parse("postgresql://db.example:5433/chain", env, HOME)
                .cacheKey();
        assertThat(a).startsWith("db.example-5432-chain-").isNotEqualTo(b).isNotEqualTo(c);
        assertThat(ServerAddress.parse("postgresql://DB.example/chain", env, HOME)
                        .cacheKey())
                .as("host names ignore" + " case")
                .endsWith(a.substring(a.lastIndexOf('-')));
    }
}
