package org.variset.archive.bulk;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

class OverlappedChunksTest {
    @Test
    void consumesEveryChunkInOrderOnTheWorkerThread() {
        List<Integer> seen = Collections.synchronizedList(new ArrayList<>());
        List<String> threads = Collections.synchronizedList(new ArrayList<>());
        try (OverlappedChunks<Integer> lane = new OverlappedChunks<>("test-worker", chunk -> {
            threads.add(Thread.currentThread().getName());
            seen.addAll(chunk);
        })) {
            for (int i = 0; i < 50; i++) {
                lane.submit(IntStream.range(i * 10, i * 10 + 10).boxed().toList());
            }
            lane.finish();
            assertThat(seen)
                    .containsExactlyElementsOf(IntStream.range(0, 500).boxed().toList());
        }
        assertThat(threads).hasSize(50).containsOnly("test-worker");
    }

    @Test
    void throwsTheWorkersFailureToTheCaller() {
        try (OverlappedChunks<Integer> lane = new OverlappedChunks<>("test-worker", chunk -> {
            if (chunk.contains(3)) {
                throw new IllegalArgumentException("chunk with 3");
            }
        })) {
            lane.submit(List.of(1, 2));
            lane.submit(List.of(3));
            assertThatThrownBy(lane::finish)
                    .isInstanceOf(IllegalArgumentException.class)
                    .hasMessage("chunk with 3");
        }
    }
}
