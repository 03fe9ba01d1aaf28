package org.protolyte.service;

import java.time.Duration;
import java.util.Objects;
import java.util.function.Consumer;

/**
 * How a {@link ValidationService} listens and how much it takes on. Immutable; start from {@link #defaults()} and
 * change what differs with the {@code with...} methods.
 *
 * @param host          the address to bind (default 127.0.0.1: loopback only)
 * @param port          the TCP port, 0 for any free one
 * @param workers       threads that run checks (default twice the processors)
 * @param queue         checks that may wait for a worker; one more request is answered 503 with Retry-After
 * @param idleTimeout   how long a connection may send nothing before it is answered 408 and closed
 * @param checkLimit    how long one check may take before it is answered 504
 * @param accessLog     receives one JSON line per request (default: standard error)
 */
public record Settings(String host, int port, int workers, int queue, Duration idleTimeout, Duration checkLimit,
                       Consumer<String> accessLog) {

    public Settings {
        Objects.requireNonNull(host, "host");
        Objects.requireNonNull(idleTimeout, "idleTimeout");
        Objects.requireNonNull(checkLimit, "checkLimit");
        Objects.requireNonNull(accessLog, "accessLog");
        if (host.isBlank()) {
            throw new IllegalArgumentException("host must name an address, e.g. 127.0.0.1");
        }
        if (port < 0 || port > 65_535) {
            throw new IllegalArgumentException("port must be 0 (any free port) to 65535, not " + port);
        }
        if (workers < 1 || workers > 1024) {
            throw new IllegalArgumentException("workers must be 1 to 1024, not " + workers);
        }
        if (queue < 0 || queue > 100_000) {
            throw new IllegalArgumentException("queue must be 0 to 100000, not " + queue);
        }
        if (idleTimeout.toMillis() < 1) {
            throw new IllegalArgumentException("idleTimeout must be at least 1 ms, not " + idleTimeout);
        }
        if (checkLimit.toMillis() < 1) {
            throw new IllegalArgumentException("checkLimit must be at least 1 ms, not " + checkLimit);
        }
    }

    /** Loopback, any free port, 2 × processors workers, 64 waiting, 10 s idle, 30 s per check, log to stderr. */
    public static Settings defaults() {
        return new Settings("127.0.0.1", 0, 2 * Runtime.getRuntime().availableProcessors(), 64,
                Duration.ofSeconds(10), Duration.ofSeconds(30), System.err::println);
    }

    public Settings withHost(String host) {
        return new Settings(host, port, workers, queue, idleTimeout, checkLimit, accessLog);
    }

    public Settings withPort(int port) {
        return new Settings(host, port, workers, queue, idleTimeout, checkLimit, accessLog);
    }

    public Settings withWorkers(int workers) {
        return new Settings(host, port, workers, queue, idleTimeout, checkLimit, accessLog);
    }

    public Settings withQueue(int queue) {
        return new Settings(host, port, workers, queue, idleTimeout, checkLimit, accessLog);
    }

    public Settings withIdleTimeout(Duration idleTimeout) {
        return new Settings(host, port, workers, queue, idleTimeout, checkLimit, accessLog);
    }

    public Settings withCheckLimit(Duration checkLimit) {
        return new Settings(host, port, workers, queue, idleTimeout, checkLimit, accessLog);
    }

    public Settings withAccessLog(Consumer<String> accessLog) {
        return new Settings(host, port, workers, queue, idleTimeout, checkLimit, accessLog);
    }
}
