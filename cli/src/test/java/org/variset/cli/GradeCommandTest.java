package org.variset.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class GradeCommandTest {
    @TempDir
    Path home;

    /** Draper et al. (2015), IRCRA table row 17: YDS 5.11d = French 7a. */
    @Test
    void convertsYdsToFrench() {
        CliRun r = CliRun.run(home, "grade", "5.11d", "--to", "french").exits(ExitCode.OK);
        assertThat(r.out()).contains("IRCRA 17").containsPattern("French\\s+7a\\n");
    }

    @Test
    void readsUpperCaseLettersOnARopeRouteAsFrench() {
        CliRun r = CliRun.run(home, "grade", "6A+", "--discipline", "rope").exits(ExitCode.OK);
        assertThat(r.out()).startsWith("6A+: French 6a+, IRCRA 12");
    }

    @Test
    void namesBothReadingsOfAnAmbiguousGradeAndHowToChoose() {
        CliRun r = CliRun.run(home, "grade", "5+", "--discipline", "rope").exits(ExitCode.BAD_INPUT);
        assertThat(r.err())
                .contains("French 5+")
                .contains("UIAA 5+")
                .contains("--scale french")
                .contains("--scale uiaa");
        assertThat(r.out()).isEmpty();
    }

    @Test
    void settlesTheAmbiguityWithTheScaleOption() {
        CliRun r = CliRun.run(home, "grade", "5+", "--discipline", "rope", "--scale", "uiaa")
                .exits(ExitCode.OK);
        assertThat(r.out()).startsWith("5+: UIAA 5+, IRCRA 8");
    }

    @Test
    void saysWhatAGradeLooksLike() {
        CliRun r = CliRun.run(home, "grade", "banana").exits(ExitCode.BAD_INPUT);
        assertThat(r.err()).contains("'banana' is not a grade").contains("V4").contains("5.10c");
        assertThat(r.err()).doesNotContain("Exception").doesNotContain("\tat ");
    }

    @Test
    void writesJsonForScripts() throws Exception {
        CliRun r = CliRun.run(home, "grade", "V2", "--format", "json").exits(ExitCode.OK);
        JsonNode j = new ObjectMapper().readTree(r.out());
        assertThat(j.required("ircra").asDouble()).isEqualTo(15.5);
        assertThat(j.required("band").asText()).isEqualTo("V2");
        assertThat(j.requiredAt("/equivalents/font").toString()).isEqualTo("[\"5+\",\"6A\",\"6A+\"]");
    }

    @Test
    void refusesAnUnknownScaleAsUsage() {
        CliRun r = CliRun.run(home, "grade", "6a", "--scale", "fnt").exits(ExitCode.USAGE);
        assertThat(r.err()).contains("'fnt' is not a grade scale");
    }

    @Test
    void needsNoArchive() {
        CliRun.run(home, "grade", "V3").exits(ExitCode.OK);
        assertThat(home.resolve(".local")).doesNotExist();
    }
}
