package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Bounded memory (#14): the packaged jar in a small heap over a folder of many documents in every format, and over
 * a file far larger than the size limit beside a good one. A run that needs memory in proportion to the folder or
 * to a file's size dies with OutOfMemoryError (exit 1 or a lost report), which these tests catch.
 * Measured on a shared 2-core machine: 5,000 documents take 12 to 19 s a format under -Xmx64m alone and 24 to 32 s
 * under load; the 200 MiB file run takes 2 s under -Xmx32m.
 */
class BoundedMemoryIT {

    private static final int DOCUMENTS = 5_000;
    private static final String SAMPLE = "laboratory-acetate-buffer-molal.json";   // passes; the fastest sample
    private static final String SAMPLE_ID = "LB-LAB-0114";
    private static final List<String> SMALL_HEAP = List.of("-Xmx64m");
    private static final long HANG_GUARD_SECONDS = 300;

    @TempDir
    static Path work;
    private static PackagedJar jar;

    @BeforeAll
    static void aFolderOfManyDocuments() throws IOException {
        jar = PackagedJar.find();
        String sample = Files.readString(PackagedJar.ROOT.resolve("sample-formulations").resolve(SAMPLE));
        assertTrue(sample.contains("\"" + SAMPLE_ID + "\""), "the sample's id has changed");
        Path many = Files.createDirectory(work.resolve("many"));
        for (int i = 0; i < DOCUMENTS; i++) {
            String id = String.format("LB-LAB-M%05d", i);
            Files.writeString(many.resolve(id + ".json"), sample.replace(SAMPLE_ID, id), StandardCharsets.UTF_8);
        }
    }

    private static JsonNode json(Path file) throws IOException {
        return JsonMapper.builder().build().readTree(file.toFile());
    }

    private static List<String> ids(Iterable<JsonNode> nodes, String... path) {
        List<String> ids = new ArrayList<>();
        for (JsonNode n : nodes) {
            JsonNode at = n;
            for (String p : path) {
                at = at.path(p);
            }
            ids.add(at.asString());
        }
        return ids;
    }

    /** Every generated id once, whatever order the report lists them in. */
    private static void everyDocumentOnce(List<String> ids) {
        assertEquals(DOCUMENTS, ids.size());
        assertEquals(DOCUMENTS, ids.stream().distinct().count(), "a document is listed twice");
        assertTrue(ids.stream().allMatch(id -> id.matches("LB-LAB-M\\d{5}")), () -> ids.subList(0, 3).toString());
    }

    @Test
    void textReportHoldsEveryDocument() throws IOException, InterruptedException {
        PackagedJar.Run run = jar.run(work, HANG_GUARD_SECONDS, SMALL_HEAP, "check", "--format", "text", "many");
        assertEquals(0, run.exitCode(), run::err);
        List<String> lines = Files.readAllLines(run.out(), StandardCharsets.UTF_8);
        everyDocumentOnce(lines.stream().filter(l -> l.startsWith("== "))
                .map(l -> l.replaceFirst(".*\\[(.*)\\].*", "$1")).toList());
        assertTrue(lines.contains(DOCUMENTS + " document(s): " + DOCUMENTS + " pass, 0 fail, 0 invalid, 0 indeterminate"),
                run::err);
    }

    @Test
    void jsonReportHoldsEveryDocument() throws IOException, InterruptedException {
        PackagedJar.Run run = jar.run(work, HANG_GUARD_SECONDS, SMALL_HEAP, "check", "--format", "json", "many");
        assertEquals(0, run.exitCode(), run::err);
        JsonNode report = json(run.out());
        everyDocumentOnce(ids(report.path("reports"), "id"));
        assertEquals(DOCUMENTS, report.path("summary").path("documents").asInt());
    }

    @Test
    void sarifReportHoldsEveryDocument() throws IOException, InterruptedException {
        PackagedJar.Run run = jar.run(work, HANG_GUARD_SECONDS, SMALL_HEAP, "check", "--format", "sarif", "many");
        assertEquals(0, run.exitCode(), run::err);
        everyDocumentOnce(ids(json(run.out()).path("runs").path(0).path("artifacts"), "properties", "id"));
    }

    @Test
    void reportFileHoldsEveryDocument() throws IOException, InterruptedException {
        PackagedJar.Run run = jar.run(work, HANG_GUARD_SECONDS, SMALL_HEAP, "check", "--format", "json",
                "-o", "many.json", "many");
        assertEquals(0, run.exitCode(), run::err);
        everyDocumentOnce(ids(json(work.resolve("many.json")).path("reports"), "id"));
        try (Stream<Path> left = Files.list(work)) {
            assertEquals(List.of(), left.filter(p -> p.getFileName().toString().endsWith(".tmp")).toList());
        }
    }

    @Test
    void fileFarAboveTheSizeLimitIsInvalidAndTheGoodOneIsReported() throws IOException, InterruptedException {
        Path folder = Files.createDirectory(work.resolve("big"));
        Files.copy(PackagedJar.ROOT.resolve("sample-formulations").resolve(SAMPLE), folder.resolve("good.json"));
        byte[] spaces = new byte[1 << 20];
        Arrays.fill(spaces, (byte) ' ');
        try (OutputStream out = Files.newOutputStream(folder.resolve("huge.json"))) {
            for (int mib = 0; mib < 200; mib++) {   // 200 MiB of whitespace: legal JSON framing, far above 16 MiB
                out.write(spaces);
            }
        }
        PackagedJar.Run run = jar.run(work, HANG_GUARD_SECONDS, List.of("-Xmx32m"), "check", "--format", "json", "big");
        assertEquals(2, run.exitCode(), run::err);
        JsonNode report = json(run.out());
        assertEquals(2, report.path("reports").size(), run::err);
        for (JsonNode r : report.path("reports")) {
            if (r.path("source").asString().endsWith("good.json")) {
                assertEquals("pass", r.path("status").asString());
                assertEquals(SAMPLE_ID, r.path("id").asString());
            } else {
                assertTrue(r.path("source").asString().endsWith("huge.json"), r::toString);
                assertEquals("invalid", r.path("status").asString());
                assertTrue(r.path("findings").path(0).path("message").asString().contains("larger than"), r::toString);
            }
        }
    }
}
