package org.variset.cli.command;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** File names made from wall and setter names never leave the reports folder. */
class DemoReportsTest {
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
        assertThat(DemoReports.file(name)).isEqualTo(expected).doesNotContain("/", "\\", "..");
    }
}
