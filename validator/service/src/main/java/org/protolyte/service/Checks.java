package org.protolyte.service;

import java.time.Duration;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.RejectedExecutionException;
import java.util.concurrent.Semaphore;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Supplier;

/**
 * The workers that run checks, and the places for them: a request takes a place when it arrives (so a full service
 * refuses before it reads a body), and gives it back when its check has run or cannot run. A check that passes its
 * time limit is answered as timed out; one still waiting is then skipped, one running finishes unseen.
 */
final class Checks implements AutoCloseable {

    private final ThreadPoolExecutor pool;
    private final Semaphore places;
    private final Duration limit;

    Checks(int workers, int queue, Duration limit) {
        this.places = new Semaphore(workers + queue);
        this.limit = limit;
        AtomicInteger n = new AtomicInteger();
        // the places bound the work; the pool's queue is as long as all of them, so it never refuses a placed check
        this.pool = new ThreadPoolExecutor(workers, workers, 0, TimeUnit.MILLISECONDS,
                new LinkedBlockingQueue<>(workers + queue), r -> {
                    Thread t = new Thread(r, "protolyte-check-" + n.incrementAndGet());
                    t.setDaemon(true);
                    return t;
                });
    }

    Duration limit() {
        return limit;
    }

    /** A place for one check, or empty when every worker is busy and every waiting place is taken. */
    Optional<Ticket> admit() {
        return places.tryAcquire() ? Optional.of(new Ticket()) : Optional.empty();
    }

    /** One admitted check: run it once, or give its place back unused; the place is returned exactly once. */
    final class Ticket {

        private final AtomicBoolean held = new AtomicBoolean(true);

        void release() {
            if (held.compareAndSet(true, false)) {
                places.release();
            }
        }

        /** The work's value, or a failure: its own, {@link java.util.concurrent.TimeoutException} at the limit. */
        <T> CompletableFuture<T> run(Supplier<T> work) {
            CompletableFuture<T> promise = new CompletableFuture<>();
            try {
                pool.execute(() -> {
                    if (promise.isDone()) {          // timed out while waiting: nobody wants it any more
                        release();
                        return;
                    }
                    T value;
                    try {
                        value = work.get();
                    } catch (RuntimeException | Error e) {
                        release();
                        promise.completeExceptionally(e);
                        return;
                    }
                    release();                       // before the answer goes out, so the client's next one has room
                    promise.complete(value);
                });
            } catch (RejectedExecutionException e) {
                release();
                promise.completeExceptionally(e);
            }
            return promise.orTimeout(limit.toMillis(), TimeUnit.MILLISECONDS);
        }
    }

    @Override
    public void close() {
        pool.shutdownNow();
    }
}
