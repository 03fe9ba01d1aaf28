package org.protolyte.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ConcurrentLinkedQueue;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.protolyte.Protolyte;
import org.protolyte.api.Format;
import org.protolyte.api.Result;
import org.protolyte.api.Source;
import org.protolyte.api.Validator;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** Each endpoint and each status the service answers, provoked over loopback. */
@Timeout(60)
class ValidationServiceTest {

    static final Path ROOT = Path.of(System.getProperty("protolyte.projectRoot", "../.."));
    static final Path HEPES = ROOT.resolve("sample-formulations/cell-culture-hepes-basal-medium.json");
    private static final JsonMapper JSON = JsonMapper.builder().build();

    private final GateClock clock = new GateClock();
    private final ConcurrentLinkedQueue<String> log = new ConcurrentLinkedQueue<>();
    private final HttpClient client = HttpClient.newHttpClient();
    private Validator validator;
    private ValidationService service;

    @BeforeEach
    void start() throws Exception {
        validator = Validator.builder().clock(clock).build();
        service = ValidationService.start(validator, Settings.defaults().withWorkers(1).withQueue(0)
                .withIdleTimeout(Duration.ofMillis(500)).withCheckLimit(Duration.ofSeconds(2)).withAccessLog(log::add));
    }

    @AfterEach
    void stop() {
        clock.open();
        service.close();
    }

    private HttpResponse<String> get(String path) throws IOException, InterruptedException {
        return client.send(HttpRequest.newBuilder(service.uri().resolve(path)).build(),
                HttpResponse.BodyHandlers.ofString());
    }

    private HttpResponse<String> post(String path, byte[] body) throws IOException, InterruptedException {
        return client.send(HttpRequest.newBuilder(service.uri().resolve(path)).header("Content-Type", "application/json")
                .POST(HttpRequest.BodyPublishers.ofByteArray(body)).build(), HttpResponse.BodyHandlers.ofString());
    }

    @Test
    void healthIsUp() throws Exception {
        HttpResponse<String> r = get("v1/health");
        assertEquals(200, r.statusCode());
        assertEquals("up", JSON.readTree(r.body()).path("status").asString());
    }

    @Test
    void versionIsTheToolsVersion() throws Exception {
        HttpResponse<String> r = get("v1/version");
        assertEquals(200, r.statusCode());
        assertEquals(Validator.version(), JSON.readTree(r.body()).path("version").asString());
    }

    @Test
    void rulesAreTheValidatorsRulesInOrder() throws Exception {
        HttpResponse<String> r = get("v1/rules");
        assertEquals(200, r.statusCode());
        JsonNode rules = JSON.readTree(r.body());
        List<String> ids = new ArrayList<>();
        rules.forEach(n -> ids.add(n.path("pack").asString() + "/" + n.path("id").asString() + "/"
                + n.path("severity").asString() + "/" + n.path("summary").asString()));
        List<String> expected = validator.rules().stream().map(x -> x.pack() + "/" + x.id() + "/"
                + x.severity().name().toLowerCase(java.util.Locale.ROOT) + "/" + x.summary()).toList();
        assertFalse(expected.isEmpty());
        assertEquals(expected, ids);
    }

    @Test
    void openApiDescribesEveryPath() throws Exception {
        HttpResponse<String> r = get("v1/openapi.json");
        assertEquals(200, r.statusCode());
        JsonNode api = JSON.readTree(r.body());
        assertTrue(api.path("openapi").asString().startsWith("3.1"), api.path("openapi").toString());
        List<String> paths = new ArrayList<>(api.path("paths").propertyNames());
        assertEquals(List.of("/v1/check", "/v1/rules", "/v1/version", "/v1/health", "/v1/openapi.json"), paths);
        assertEquals(Files.readString(ROOT.resolve("schemas/openapi.json")), r.body());
    }

    @ParameterizedTest
    @CsvSource({"json,JSON,application/json", "sarif,SARIF,application/sarif+json",
            "text,TEXT,text/plain; charset=utf-8", "html,HTML,text/html; charset=utf-8"})
    void aReportHasTheApisBytes(String query, Format format, String mediaType) throws Exception {
        byte[] doc = Files.readAllBytes(HEPES);
        HttpResponse<String> r = post("v1/check?format=" + query, doc);
        Result expected = validator.check(Source.of(CheckEndpoint.SOURCE_NAME, doc));
        assertEquals(200, r.statusCode());
        assertEquals(mediaType, r.headers().firstValue("Content-Type").orElse(""));
        assertEquals(expected.render(format), r.body());
        assertEquals(expected.status().name().toLowerCase(java.util.Locale.ROOT),
                r.headers().firstValue("Protolyte-Status").orElse(""));
        assertEquals(Integer.toString(expected.exitCode()), r.headers().firstValue("Protolyte-Exit-Code").orElse(""));
    }

    @Test
    void jsonIsTheDefaultFormat() throws Exception {
        byte[] doc = Files.readAllBytes(HEPES);
        assertEquals(validator.check(Source.of(CheckEndpoint.SOURCE_NAME, doc)).render(Format.JSON),
                post("v1/check", doc).body());
    }

    @Test
    void malformedJsonIsAReportOfStatusInvalid() throws Exception {
        HttpResponse<String> r = post("v1/check", "{\"document\": \"formulation\",".getBytes(StandardCharsets.UTF_8));
        assertEquals(200, r.statusCode());
        assertEquals("invalid", r.headers().firstValue("Protolyte-Status").orElse(""));
        assertEquals("2", r.headers().firstValue("Protolyte-Exit-Code").orElse(""));
        assertEquals("invalid", JSON.readTree(r.body()).path("reports").path(0).path("status").asString(), r.body());
    }

    @Test
    void anEmptyBodyIsAReportOfStatusInvalid() throws Exception {
        HttpResponse<String> r = post("v1/check", new byte[0]);
        assertEquals(200, r.statusCode());
        assertEquals("invalid", r.headers().firstValue("Protolyte-Status").orElse(""));
    }

    @Test
    void anUnknownFormatIsABadQuery() throws Exception {
        HttpResponse<String> r = post("v1/check?format=pdf", Files.readAllBytes(HEPES));
        assertEquals(400, r.statusCode());
        assertTrue(r.body().contains("unknown format 'pdf'"), r.body());
        assertTrue(r.headers().firstValue("Protolyte-Status").isEmpty(), "a refused request carries no verdict");
    }

    @Test
    void anUnknownParameterIsABadQuery() throws Exception {
        HttpResponse<String> r = post("v1/check?fromat=json", Files.readAllBytes(HEPES));
        assertEquals(400, r.statusCode());
        assertTrue(r.body().contains("unknown query parameter 'fromat'"), r.body());
    }

    @Test
    void theWrongMethodIsNotAllowed() throws Exception {
        HttpResponse<String> r = get("v1/check");
        assertEquals(405, r.statusCode());
        assertEquals("POST", r.headers().firstValue("Allow").orElse(""));
        HttpResponse<String> h = post("v1/health", new byte[0]);
        assertEquals(405, h.statusCode());
        assertEquals("GET", h.headers().firstValue("Allow").orElse(""));
    }

    @Test
    void anUnknownPathIsNotFound() throws Exception {
        assertEquals(404, get("v1/chek").statusCode());
        assertEquals(404, get("check").statusCode());
    }

    @Test
    void aContentTypeOtherThanJsonIsRefused() throws Exception {
        HttpResponse<String> r = client.send(HttpRequest.newBuilder(service.uri().resolve("v1/check"))
                .header("Content-Type", "text/plain").POST(HttpRequest.BodyPublishers.ofByteArray(
                        Files.readAllBytes(HEPES))).build(), HttpResponse.BodyHandlers.ofString());
        assertEquals(415, r.statusCode());
        assertTrue(r.body().contains("text/plain"), r.body());
    }

    @Test
    void noContentTypeIsTakenAsJson() throws Exception {
        HttpResponse<String> r = client.send(HttpRequest.newBuilder(service.uri().resolve("v1/check"))
                .POST(HttpRequest.BodyPublishers.ofByteArray(Files.readAllBytes(HEPES))).build(),
                HttpResponse.BodyHandlers.ofString());
        assertEquals(200, r.statusCode());
        assertEquals("pass", r.headers().firstValue("Protolyte-Status").orElse(""));
    }

    @Test
    void anOversizedBodyIsRefusedByItsLengthBeforeItIsSent() throws Exception {
        try (RawHttp raw = new RawHttp(service.port(), 10_000)) {
            raw.send("POST /v1/check HTTP/1.1\r\nHost: x\r\nContent-Type: application/json\r\nContent-Length: "
                    + (Protolyte.MAX_DOCUMENT_BYTES + 1) + "\r\n\r\n{");
            String response = raw.readAll();
            assertEquals(413, RawHttp.status(response), response);
            assertTrue(response.contains("at most 16777216 bytes"), response);
        }
    }

    @Test
    void anOversizedChunkedBodyIsRefusedWhenItPassesTheLimit() throws Exception {
        try (RawHttp raw = new RawHttp(service.port(), 10_000)) {
            raw.send("POST /v1/check HTTP/1.1\r\nHost: x\r\nTransfer-Encoding: chunked\r\n\r\n");
            byte[] chunk = new byte[1 << 20];
            java.util.Arrays.fill(chunk, (byte) ' ');
            String size = Integer.toHexString(chunk.length) + "\r\n";
            try {
                for (int i = 0; i < 20; i++) {
                    raw.send(size);
                    raw.send(chunk);
                    raw.send("\r\n");
                }
            } catch (IOException e) {
                // the server may close before all is sent; its answer is read below
                log.add("client stopped sending: " + e.getMessage());
            }
            String response = raw.readAll();
            assertEquals(413, RawHttp.status(response), response);
        }
    }

    @Test
    void aClientThatStallsHalfwayIsAnsweredWithinTheIdleTimeout() throws Exception {
        byte[] doc = Files.readAllBytes(HEPES);
        try (RawHttp raw = new RawHttp(service.port(), 10_000)) {
            raw.send("POST /v1/check HTTP/1.1\r\nHost: x\r\nContent-Type: application/json\r\nContent-Length: "
                    + doc.length + "\r\n\r\n");
            raw.send(java.util.Arrays.copyOf(doc, doc.length / 2));
            String response = raw.readAll();
            assertFalse(response.contains("read timed out"), "the server neither answered nor closed: " + response);
            int status = RawHttp.status(response);
            assertTrue(status == 408 || response.isEmpty(), "408 or the connection closed, not: " + response);
        }
    }

    @Test
    void aFullServiceAnswers503WithRetryAfter() throws Exception {
        byte[] doc = Files.readAllBytes(HEPES);
        try (RawHttp holder = new RawHttp(service.port(), 10_000)) {
            // the one worker's place, taken by a request whose body has not all arrived
            holder.send("POST /v1/check HTTP/1.1\r\nHost: x\r\nContent-Length: " + doc.length + "\r\n\r\n");
            holder.send(java.util.Arrays.copyOf(doc, 10));
            HttpResponse<String> r = awaitBusy(doc);
            assertEquals(503, r.statusCode(), r.body());
            assertEquals("1", r.headers().firstValue("Retry-After").orElse(""));
            assertTrue(r.headers().firstValue("Protolyte-Status").isEmpty(), "a refused request carries no verdict");
        }
    }

    /** The holder's headers may reach the server after our request does: ask until the place is taken. */
    private HttpResponse<String> awaitBusy(byte[] doc) throws Exception {
        HttpResponse<String> r = post("v1/check", doc);
        for (int i = 0; i < 50 && r.statusCode() == 200; i++) {
            Thread.sleep(20);
            r = post("v1/check", doc);
        }
        return r;
    }

    @Test
    void aCheckPastItsLimitIsAnswered504WithoutAVerdictOfPass() throws Exception {
        clock.arm();
        HttpResponse<String> r = post("v1/check", Files.readAllBytes(HEPES));
        assertEquals(504, r.statusCode(), r.body());
        assertEquals("indeterminate", r.headers().firstValue("Protolyte-Status").orElse(""));
        assertTrue(r.body().contains("did not finish within 2000 ms"), r.body());
    }

    @Test
    void aCheckThatFailsIsAFaultNeverAPass() throws Exception {
        clock.fail();
        HttpResponse<String> r = post("v1/check", Files.readAllBytes(HEPES));
        assertEquals(500, r.statusCode(), r.body());
        assertEquals("fault", r.headers().firstValue("Protolyte-Status").orElse(""));
        assertEquals("4", r.headers().firstValue("Protolyte-Exit-Code").orElse(""));
    }

    @Test
    void theAccessLogHasOneLinePerRequestWithoutTheDocument() throws Exception {
        byte[] doc = Files.readAllBytes(HEPES);
        HttpResponse<String> r = post("v1/check", doc);
        get("v1/nowhere");
        // a line is written once its answer has gone out, so it may follow the client's return by a moment
        for (int i = 0; i < 100 && log.size() < 2; i++) {
            Thread.sleep(50);
        }
        List<JsonNode> lines = new ArrayList<>();
        for (String line : log) {
            lines.add(JSON.readTree(line));
            assertFalse(line.contains("LB-CCM-0042") || line.contains("sodium chloride"), line);
        }
        assertEquals(2, lines.size(), log.toString());
        JsonNode check = lines.get(0);
        assertEquals("POST", check.path("method").asString());
        assertEquals("/v1/check", check.path("path").asString());
        assertEquals(200, check.path("status").asInt());
        assertEquals(doc.length, check.path("bytesIn").asLong());
        assertEquals(r.body().getBytes(StandardCharsets.UTF_8).length, check.path("bytesOut").asLong());
        assertEquals("pass", check.path("protolyteStatus").asString());
        assertEquals(r.headers().firstValue(Exchange.REQUEST_ID).orElse(""), check.path("requestId").asString());
        assertTrue(check.path("durationMs").asLong() >= 0);
        assertFalse(check.path("time").asString().isEmpty());
        JsonNode missing = lines.get(1);
        assertEquals(404, missing.path("status").asInt());
        assertTrue(missing.path("protolyteStatus").isMissingNode(), missing.toString());
    }

    @Test
    void theUriIsTheBoundPort() {
        assertTrue(service.port() > 0);
        assertEquals(URI.create("http://127.0.0.1:" + service.port() + "/"), service.uri());
    }
}
