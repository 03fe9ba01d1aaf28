package org.protolyte.service;

import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;

/**
 * One HTTP answer, whole: its status, media type, extra headers and body, and the verdict where it carries a report.
 */
record Reply(int status, String contentType, Map<String, String> headers, byte[] body, Optional<String> verdict) {

    static final String JSON = "application/json";

    Reply {
        headers = Map.copyOf(headers);
    }

    static Reply json(int status, String body) {
        return new Reply(status, JSON, Map.of(), body.getBytes(StandardCharsets.UTF_8), Optional.empty());
    }

    /** A refused or failed request: {@code {"error": code, "message": message}}; never a report. */
    static Reply error(int status, String code, String message) {
        return json(status, "{\"error\":" + Json.quote(code) + ",\"message\":" + Json.quote(message) + "}\n");
    }

    Reply withHeader(String name, String value) {
        Map<String, String> h = new LinkedHashMap<>(headers);
        h.put(name, value);
        return new Reply(status, contentType, h, body, verdict);
    }
}
