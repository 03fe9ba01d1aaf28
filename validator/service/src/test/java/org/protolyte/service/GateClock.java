package org.protolyte.service;

import java.time.Clock;
import java.time.Instant;
import java.time.ZoneId;
import java.time.ZoneOffset;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.Semaphore;
import java.util.concurrent.TimeUnit;

/**
 * A fixed clock that, once armed, holds every check that reads it until opened, or makes it fail: a validator reads its
 * clock when a check ends, so a test can keep a worker busy, or make the tool fail, without relying on timing.
 */
final class GateClock extends Clock {

    static final Instant AT = Instant.parse("2026-03-01T09:00:00Z");

    private volatile boolean armed;
    private volatile boolean failing;
    private final CountDownLatch open = new CountDownLatch(1);
    private final Semaphore held = new Semaphore(0);

    void arm() {
        armed = true;
    }

    void fail() {
        failing = true;
    }

    void open() {
        open.countDown();
    }

    /** Waits until a check is being held. */
    boolean awaitHeld(long seconds) throws InterruptedException {
        return held.tryAcquire(seconds, TimeUnit.SECONDS);
    }

    @Override
    public Instant instant() {
        if (failing) {
            throw new IllegalStateException("the test's clock fails on purpose");
        }
        if (armed) {
            held.release();
            try {
                if (!open.await(60, TimeUnit.SECONDS)) {
                    throw new IllegalStateException("the test never opened the gate");
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted at the gate", e);
            }
        }
        return AT;
    }

    @Override
    public ZoneId getZone() {
        return ZoneOffset.UTC;
    }

    @Override
    public Clock withZone(ZoneId zone) {
        return this;
    }
}
