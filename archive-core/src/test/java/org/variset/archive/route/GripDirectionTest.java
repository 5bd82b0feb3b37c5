package org.variset.archive.route;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class GripDirectionTest {

    /** docs/spec/interchange.md, holds.csv "grip": degrees, clock positions (30 x (H mod 12) + 0.5 x MM) and words. */
    @ParameterizedTest(name = "{0} reads as {1} degrees")
    @CsvSource({
        "0, 0",
        "90, 90",
        "360, 0",
        "37.5, 37.5",
        "12:00, 0",
        "4:30, 135",
        "1:30, 45",
        "9:00, 270",
        "up, 0",
        "Up-Right, 45",
        "down, 180",
        "left, 270",
        "up-left, 315"
    })
    void readsEveryNotationOfTheSpec(String text, double degrees) {
        assertThat(GripDirection.parse(text)).isEqualTo(degrees);
    }

    @ParameterizedTest
    @ValueSource(strings = {"-15", "361", "13:00", "4:75", "upwards", "", "0x10"})
    void refusesWhatIsNoDirectionSayingWhatWasExpected(String text) {
        assertThatThrownBy(() -> GripDirection.parse(text))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("'" + text + "'");
    }

    @ParameterizedTest(name = "a {0}:{1} time cell reads as {2} degrees")
    @CsvSource({"4, 30, 135", "16, 30, 135", "0, 0, 0", "12, 0, 0"})
    void readsSpreadsheetTimeCellsAsClockPositions(int h, int m, double degrees) {
        assertThat(GripDirection.ofClock(h, m)).isEqualTo(degrees);
    }
}
