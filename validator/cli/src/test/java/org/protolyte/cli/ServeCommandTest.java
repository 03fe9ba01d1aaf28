package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;

/** {@code protolyte serve} starts the service, says where, answers, and stops when interrupted. */
@Timeout(60)
class ServeCommandTest {

    private static final Pattern LISTENING = Pattern.compile("listening on (http://127\\.0\\.0\\.1:\\d+/)");

    @Test
    void serveAnswersHealthOnThePortItPrints() throws Exception {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        AtomicInteger exit = new AtomicInteger(-1);
        Thread serving = new Thread(() -> exit.set(Main.run(new PrintWriter(out, true), new PrintWriter(err, true),
                "serve", "--port", "0", "--threads", "2")), "serve-under-test");
        serving.start();
        Matcher m = LISTENING.matcher("");
        for (int i = 0; i < 300 && !m.find(); i++) {
            Thread.sleep(100);
            m = LISTENING.matcher(out.toString());
        }
        assertTrue(m.find(0), "no address printed; out: " + out + " err: " + err);
        HttpResponse<String> r = HttpClient.newHttpClient().send(HttpRequest.newBuilder(
                URI.create(m.group(1)).resolve("v1/health")).build(), HttpResponse.BodyHandlers.ofString());
        assertEquals(200, r.statusCode());
        assertEquals("{\"status\":\"up\"}\n", r.body());
        serving.interrupt();
        serving.join(30_000);
        assertFalse(serving.isAlive(), "serve did not stop when interrupted");
        assertEquals(0, exit.get(), err.toString());
        assertTrue(err.toString().contains("\"path\":\"/v1/health\""), "the access log line: " + err);
    }

    @Test
    void aBadThreadCountIsAUsageError() {
        InProcess.Result r = InProcess.run("serve", "--port", "0", "--threads", "0");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("--threads takes 1 to 1024, not 0"), r.err());
    }

    /** '+PACK' joins a shipped pack to the intended use's choice, as check takes it: a laboratory recipe meets it. */
    @Test
    void aShippedPackJoinsTheChoice() throws Exception {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        Thread serving = new Thread(() -> Main.run(new PrintWriter(out, true), new PrintWriter(err, true),
                "serve", "--port", "0", "--threads", "2", "--rules", "+parenteral"), "serve-with-a-pack");
        serving.start();
        try {
            Matcher m = LISTENING.matcher("");
            for (int i = 0; i < 300 && !m.find(); i++) {
                Thread.sleep(100);
                m = LISTENING.matcher(out.toString());
            }
            assertTrue(m.find(0), "no address printed; out: " + out + " err: " + err);
            byte[] recipe = java.nio.file.Files.readAllBytes(java.nio.file.Path.of(System.getProperty(
                    "protolyte.projectRoot", "../.."), "sample-formulations", "laboratory-tris-buffer-37c.json"));
            HttpResponse<String> r = HttpClient.newHttpClient().send(HttpRequest.newBuilder(
                    URI.create(m.group(1)).resolve("v1/check")).header("Content-Type", "application/json")
                    .POST(HttpRequest.BodyPublishers.ofByteArray(recipe)).build(), HttpResponse.BodyHandlers.ofString());
            assertEquals(200, r.statusCode(), r.body());
            assertTrue(r.body().contains("\"name\" : \"parenteral\""), "the parenteral pack judged it: " + r.body());
            assertTrue(r.body().contains("\"name\" : \"general\""), "and its own use's pack: " + r.body());
        } finally {
            serving.interrupt();
            serving.join(30_000);
        }
    }

    @Test
    void anUnknownPackIsAUsageError() {
        InProcess.Result r = InProcess.run("serve", "--port", "0", "--rules", "no-such-pack");
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("unknown rule pack 'no-such-pack'"), r.err());
    }
}
