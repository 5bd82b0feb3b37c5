package org.variset.archive.bulk;

import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.function.Consumer;

/**
 * Hands chunks to one worker thread, one chunk at a time, so that the caller can produce the next chunk (read rows
 * from a file or the database) while the worker consumes the last (writes or indexes them). At most two chunks are in
 * memory. The worker's failure is thrown to the caller at the next {@link #submit} or at {@link #finish}.
 *
 * @param <T> what a chunk holds
 */
public final class OverlappedChunks<T> implements AutoCloseable {
    private final ExecutorService worker;
    private final Consumer<List<T>> consumer;
    private Future<?> pending;

    /** A worker thread of the given name that passes each chunk to the consumer, in order. */
    public OverlappedChunks(String threadName, Consumer<List<T>> consumer) {
        this.worker = Executors.newSingleThreadExecutor(r -> {
            Thread t = new Thread(r, threadName);
            t.setDaemon(true);
            return t;
        });
        this.consumer = consumer;
    }

    /** Waits for the previous chunk to be consumed, then hands this one over. */
    public void submit(List<T> chunk) {
        finish();
        pending = worker.submit(() -> consumer.accept(chunk));
    }

    /** Waits until every chunk handed over has been consumed. */
    public void finish() {
        if (pending == null) {
            return;
        }
        try {
            pending.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while waiting for the worker thread", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            if (e.getCause() instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(e.getCause());
        } finally {
            pending = null;
        }
    }

    /**
     * Stops the worker once the chunk in hand is done (it is not interrupted: an index writer interrupted in the middle
     * of a write may give up on the whole index).
     */
    @Override
    public void close() {
        worker.shutdown();
        try {
            worker.awaitTermination(10, TimeUnit.MINUTES);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
