package org.variset.bench;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ChildRunTest {
    @TempDir
    Path dir;

    @Test
    void readsTheLargestHeapLeftAfterACollectionFromAUnifiedGcLog() throws Exception {
        // Lines in the format of JDK 17's -Xlog:gc (unified logging), written by hand.
        Path log = Files.writeString(
                dir.resolve("gc.log"),
                String.join(
                        "\n",
                        "[0.012s][info][gc] Using Serial",
                        "[0.412s][info][gc] GC(0) Pause Young (Allocation Failure) 34M->12M(123M) 5.678ms",
                        "[0.913s][info][gc] GC(1) Pause Full (Allocation Failure) 300M->211M(512M) 80.1ms",
                        "[1.500s][info][gc] GC(2) Pause Young (Allocation Failure) 250M->140M(512M) 3.2ms"));
        assertThat(ChildRun.liveHeapMb(log)).isEqualTo(211);
        assertThat(ChildRun.liveHeapMb(dir.resolve("missing.log"))).isEqualTo(-1);
    }

    @Test
    void readsTheHighWaterMarkOfResidentMemory() throws Exception {
        Path status = Files.writeString(
                dir.resolve("status"),
                "Name:\tjava\nVmPeak:\t 3000000 kB\n" + "VmHWM:\t  676476 kB\nVmRSS:\t  500000 kB\n");
        assertThat(ChildRun.highWaterMark(status)).isEqualTo(676476);
        assertThat(ChildRun.highWaterMark(dir.resolve("gone"))).isEqualTo(-1);
    }
}
