package org.variset.cli;

import java.nio.file.Path;
import java.util.Map;
import org.variset.archive.testing.TestArchives;

/**
 * The archive a command-line test works on: an embedded archive in a folder, or (in the {@code postgresql} test
 * executions, see {@link TestArchives}) a new schema on the test server, named with {@code --db}, with this client's
 * index in the test's own cache folder.
 *
 * @param where the options that name the archive
 * @param env the environment the commands run with
 */
record TestArchive(String[] where, Map<String, String> env) {

    /** A new archive (none made yet on disk; a server schema is made, empty). */
    static TestArchive fresh(Path home, String name) {
        if (TestArchives.onPostgres()) {
            return new TestArchive(
                    new String[] {"--db", TestArchives.url(TestArchives.newSchema())},
                    Map.of(
                            "XDG_CACHE_HOME",
                            home.resolve("cache-" + name).toAbsolutePath().toString()));
        }
        return new TestArchive(new String[] {"--archive", home.resolve(name).toString()}, Map.of());
    }

    /** Runs a command on this archive. */
    CliRun run(Path home, String... args) {
        return CliRun.run(env, home, on(args));
    }

    /** Runs a command on this archive that reads the given text from standard input. */
    CliRun runWithInput(String input, Path home, String... args) {
        return CliRun.withInput(input, env, home, on(args));
    }

    private String[] on(String... args) {
        String[] all = new String[args.length + where.length];
        System.arraycopy(where, 0, all, 0, where.length);
        System.arraycopy(args, 0, all, where.length, args.length);
        return all;
    }
}
