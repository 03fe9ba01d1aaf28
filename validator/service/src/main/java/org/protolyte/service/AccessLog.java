package org.protolyte.service;

import java.time.Instant;
import java.util.Optional;
import java.util.function.Consumer;

/** The access log: one JSON line per request, with what was asked and answered and never a document's content. */
final class AccessLog {

    private final Consumer<String> out;

    AccessLog(Consumer<String> out) {
        this.out = out;
    }

    record Entry(Instant time, String requestId, String method, String path, int status, long bytesIn, long bytesOut,
                 long durationMillis, Optional<String> verdict) {
    }

    void write(Entry e) {
        StringBuilder b = new StringBuilder(256)
                .append("{\"time\":").append(Json.quote(e.time().toString()))
                .append(",\"requestId\":").append(Json.quote(e.requestId()))
                .append(",\"method\":").append(Json.quote(e.method()))
                .append(",\"path\":").append(Json.quote(e.path()))
                .append(",\"status\":").append(e.status())
                .append(",\"bytesIn\":").append(e.bytesIn())
                .append(",\"bytesOut\":").append(e.bytesOut())
                .append(",\"durationMs\":").append(e.durationMillis());
        e.verdict().ifPresent(v -> b.append(",\"protolyteStatus\":").append(Json.quote(v)));
        out.accept(b.append('}').toString());
    }
}
