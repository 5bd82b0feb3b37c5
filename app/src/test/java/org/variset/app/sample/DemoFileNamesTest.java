package org.variset.app.sample;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** File names made from wall and setter names never leave the reports folder. */
class DemoFileNamesTest {
    @ParameterizedTest(name = "{0}")
    @CsvSource(
            delimiter = '|',
            value = {
                "Cave|cave",
                "../../etc/passwd|etc-passwd",
                "Wall 2 / North|wall-2-north",
                "..|unnamed",
                "Inês Varga|inês-varga",
                "C:\\\\Windows\\\\x|c-windows-x"
            })
    void makesSafeFileNames(String name, String expected) {
        assertThat(RunDemo.fileName(name)).isEqualTo(expected).doesNotContain("/", "\\", "..");
    }
}
