package org.protolyte.service;

import java.nio.ByteBuffer;
import java.time.Instant;
import java.util.concurrent.atomic.AtomicBoolean;

import org.eclipse.jetty.http.HttpHeader;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.util.Callback;

/**
 * One request and its answer: the first {@link Reply} sent wins (a check's result racing its time limit), and the
 * access log gets its line when the answer has been written or has failed.
 */
final class Exchange {

    static final String REQUEST_ID = "Protolyte-Request-Id";

    private final Request request;
    private final Response response;
    private final Callback callback;
    private final AccessLog log;
    private final String id;
    private final Instant started = Instant.now();
    private final long startNanos = System.nanoTime();
    private final AtomicBoolean answered = new AtomicBoolean();
    private volatile long bytesIn;

    Exchange(Request request, Response response, Callback callback, AccessLog log, String id) {
        this.request = request;
        this.response = response;
        this.callback = callback;
        this.log = log;
        this.id = id;
    }

    Request request() {
        return request;
    }

    void bytesIn(long n) {
        bytesIn = n;
    }

    /** Writes the reply unless one was sent already; returns whether this one was. */
    boolean send(Reply reply) {
        if (!answered.compareAndSet(false, true)) {
            return false;
        }
        response.setStatus(reply.status());
        var h = response.getHeaders();
        h.put(HttpHeader.CONTENT_TYPE, reply.contentType());
        h.put(REQUEST_ID, id);
        reply.headers().forEach(h::put);
        response.write(true, ByteBuffer.wrap(reply.body()), Callback.from(() -> {
            logged(reply, reply.body().length);
            callback.succeeded();
        }, failure -> {
            logged(reply, 0);
            callback.failed(failure);
        }));
        return true;
    }

    private void logged(Reply reply, long bytesOut) {
        log.write(new AccessLog.Entry(started, id, request.getMethod(), request.getHttpURI().getPath(), reply.status(),
                bytesIn, bytesOut, (System.nanoTime() - startNanos) / 1_000_000, reply.verdict()));
    }
}
