package org.protolyte.service;

import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletionException;
import java.util.concurrent.TimeoutException;

import org.eclipse.jetty.http.BadMessageException;
import org.eclipse.jetty.http.HttpHeader;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.util.Fields;
import org.protolyte.Protolyte;
import org.protolyte.api.Format;
import org.protolyte.api.Result;
import org.protolyte.api.Source;
import org.protolyte.api.Validator;

/**
 * {@code POST /v1/check?format=...}: the body is the document, the answer its report with the bytes the command line
 * writes. The HTTP status is about the request; the verdict is in the report and its two headers.
 */
final class CheckEndpoint {

    /** The name every request's document has in its report: a request has no file name or folder. */
    static final String SOURCE_NAME = "request.json";
    static final String STATUS_HEADER = "Protolyte-Status";
    static final String EXIT_CODE_HEADER = "Protolyte-Exit-Code";

    private static final Map<Format, String> MEDIA_TYPES = Map.of(
            Format.JSON, "application/json",
            Format.SARIF, "application/sarif+json",
            Format.TEXT, "text/plain; charset=utf-8",
            Format.HTML, "text/html; charset=utf-8");

    private final Validator validator;
    private final Checks checks;

    CheckEndpoint(Validator validator, Checks checks) {
        this.validator = validator;
        this.checks = checks;
    }

    void handle(Exchange x) {
        Request request = x.request();
        Format format;
        try {
            format = format(Request.extractQueryParameters(request, StandardCharsets.UTF_8));
        } catch (BadQuery | BadMessageException | IllegalArgumentException e) {
            x.send(Reply.error(400, "bad-query", e.getMessage()));
            return;
        }
        Optional<String> unsupported = unsupportedMediaType(request.getHeaders().get(HttpHeader.CONTENT_TYPE));
        if (unsupported.isPresent()) {
            x.send(Reply.error(415, "unsupported-media-type", unsupported.get()));
            return;
        }
        long length = request.getLength();
        if (length > Protolyte.MAX_DOCUMENT_BYTES) {
            x.bytesIn(0);
            x.send(tooLarge().withHeader("Connection", "close"));
            return;
        }
        Optional<Checks.Ticket> ticket = checks.admit();
        if (ticket.isEmpty()) {
            x.send(Reply.error(503, "busy", "every worker is busy and the queue is full; try again shortly")
                    .withHeader("Retry-After", "1"));
            return;
        }
        BodyReader.read(request, (int) Protolyte.MAX_DOCUMENT_BYTES).whenComplete((body, failure) -> {
            if (failure != null) {
                ticket.get().release();
                x.send(unread(failure));
                return;
            }
            x.bytesIn(body.length);
            ticket.get().run(() -> answer(body, format)).whenComplete((reply, late) ->
                    x.send(late == null ? reply : failed(late)));
        });
    }

    /** The report of the document, rendered as the API renders it. */
    private Reply answer(byte[] body, Format format) {
        Result result = validator.check(Source.of(SOURCE_NAME, body));
        String verdict = result.status().name().toLowerCase(Locale.ROOT);
        return new Reply(200, MEDIA_TYPES.get(format), Map.of(STATUS_HEADER, verdict,
                EXIT_CODE_HEADER, Integer.toString(result.exitCode())),
                result.render(format).getBytes(StandardCharsets.UTF_8), Optional.of(verdict));
    }

    private Reply failed(Throwable failure) {
        Throwable cause = failure instanceof CompletionException && failure.getCause() != null
                ? failure.getCause() : failure;
        if (cause instanceof TimeoutException) {
            return Reply.error(504, "time-limit", "the check did not finish within " + checks.limit().toMillis()
                    + " ms; no verdict").withHeader(STATUS_HEADER, "indeterminate").withHeader(EXIT_CODE_HEADER, "3");
        }
        if (cause instanceof java.util.concurrent.RejectedExecutionException) {
            return Reply.error(503, "stopping", "the service is stopping; no verdict")
                    .withHeader("Retry-After", "1");
        }
        return Reply.error(500, "fault", "the tool failed on this document; please report it: " + where(cause))
                .withHeader(STATUS_HEADER, "fault").withHeader(EXIT_CODE_HEADER, "4");
    }

    /** The failure with its root cause and the frame that threw it, for the report of a fault. */
    private static String where(Throwable failure) {
        Throwable root = failure;
        while (root.getCause() != null && root.getCause() != root) {
            root = root.getCause();
        }
        StackTraceElement[] frames = root.getStackTrace();
        return failure + (root == failure ? "" : "; caused by " + root)
                + (frames.length == 0 ? "" : " at " + frames[0]);
    }

    /** A body that could not be read whole: too large, sent too slowly, or cut off. */
    private static Reply unread(Throwable failure) {
        for (Throwable t = failure; t != null; t = t.getCause()) {
            if (t instanceof TimeoutException) {
                return Reply.error(408, "request-timeout", "the request body stopped arriving: " + t.getMessage())
                        .withHeader("Connection", "close");
            }
            if (t instanceof BodyReader.TooLarge) {
                return tooLarge().withHeader("Connection", "close");
            }
        }
        return Reply.error(400, "unreadable-body", "the request body could not be read: " + failure)
                .withHeader("Connection", "close");
    }

    private static Reply tooLarge() {
        return Reply.error(413, "too-large", "a document is at most " + Protolyte.MAX_DOCUMENT_BYTES + " bytes ("
                + Protolyte.MAX_DOCUMENT_BYTES / (1024 * 1024) + " MiB); it is not read");
    }

    /** The report format the query asks for: {@code format} alone, json when absent. */
    static Format format(Fields query) throws BadQuery {
        for (String name : query.getNames()) {
            if (!name.equals("format")) {
                throw new BadQuery("unknown query parameter '" + name + "'; the one parameter is format");
            }
        }
        Fields.Field f = query.get("format");
        if (f == null) {
            return Format.JSON;
        }
        if (f.getValues().size() != 1) {
            throw new BadQuery("format is given " + f.getValues().size() + " times; give it once");
        }
        String value = f.getValue();
        return switch (value) {
            case "json" -> Format.JSON;
            case "sarif" -> Format.SARIF;
            case "text" -> Format.TEXT;
            case "html" -> Format.HTML;
            default -> throw new BadQuery("unknown format '" + value + "'; use json, sarif, text or html");
        };
    }

    /** Why a Content-Type is refused, or empty for none or JSON (in UTF-8, the only encoding JSON has). */
    static Optional<String> unsupportedMediaType(String contentType) {
        if (contentType == null) {
            return Optional.empty();
        }
        String[] parts = contentType.split(";");
        String type = parts[0].strip().toLowerCase(Locale.ROOT);
        if (!type.equals("application/json")) {
            return Optional.of("Content-Type '" + contentType + "' is not application/json");
        }
        for (int i = 1; i < parts.length; i++) {
            String p = parts[i].strip().toLowerCase(Locale.ROOT).replace("\"", "");
            if (p.startsWith("charset=") && !p.equals("charset=utf-8")) {
                return Optional.of("Content-Type '" + contentType + "': a document is UTF-8");
            }
        }
        return Optional.empty();
    }

    /** A query the endpoint cannot answer; the message names the parameter. */
    static final class BadQuery extends Exception {
        private static final long serialVersionUID = 1L;

        BadQuery(String message) {
            super(message);
        }
    }
}
