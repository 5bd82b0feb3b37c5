package org.variset.archive.store;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;

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
        assertThat(l.source()).isEqualTo("the default location");
    }
}
