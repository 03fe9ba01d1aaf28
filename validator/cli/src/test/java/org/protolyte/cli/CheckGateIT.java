package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.protolyte.TestDocs;
import org.protolyte.report.SarifSchema;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The packaged jar as a document-control gate would run it: a separate process over a folder that mixes a
 * passing document, a failing one, a malformed file and a JSON file that is not a formulation document.
 * Runs after {@code package} (maven-failsafe-plugin); skipped when the jar has not been built.
 */
class CheckGateIT {

    private static final Path SAMPLES = PackagedJar.ROOT.resolve("sample-formulations");
    private static final String FAILING = "parenteral-citrate-buffer-off-target.json";
    private static final List<String> FORMULATIONS = List.of("broken.json", "laboratory-acetate-buffer-molal.json",
            FAILING);
    private static final String NOT_A_DOCUMENT = "site-substances.json";

    @TempDir
    static Path work;
    private static PackagedJar.Run sarifRun;
    private static PackagedJar.Run jsonRun;

    @BeforeAll
    static void runTheJarOverAMixedFolder() throws IOException, InterruptedException {
        PackagedJar jar = PackagedJar.find();
        Path mixed = Files.createDirectory(work.resolve("mixed"));
        Files.copy(SAMPLES.resolve("laboratory-acetate-buffer-molal.json"), mixed.resolve(FORMULATIONS.get(1)));
        Files.copy(SAMPLES.resolve(FAILING), mixed.resolve(FAILING));
        Files.copy(TestDocs.resource("malformed.json"), mixed.resolve("broken.json"));
        Files.copy(SAMPLES.resolve("site-library").resolve(NOT_A_DOCUMENT), mixed.resolve(NOT_A_DOCUMENT));
        sarifRun = jar.run(work, 120, List.of(), "check", "--format", "sarif", "-o", "out.sarif", "mixed");
        jsonRun = jar.run(work, 120, List.of(), "check", "--format", "json", "-o", "out.json", "mixed");
    }

    private static JsonNode read(String name) throws IOException {
        return JsonMapper.builder().build().readTree(Files.readString(work.resolve(name), StandardCharsets.UTF_8));
    }

    private static List<JsonNode> results() throws IOException {
        List<JsonNode> out = new ArrayList<>();
        read("out.sarif").path("runs").path(0).path("results").forEach(out::add);
        return out;
    }

    private static String uri(JsonNode result) {
        return result.path("locations").path(0).path("physicalLocation").path("artifactLocation").path("uri").asString();
    }

    @Test
    void exitCodeIsTwoTheHighestBecauseOfTheMalformedFile() {
        assertEquals(2, sarifRun.exitCode(), sarifRun::err);
        assertEquals(2, jsonRun.exitCode(), jsonRun::err);
    }

    @Test
    void sarifFileExistsAndConformsToTheOfficialSchema() throws IOException {
        assertTrue(Files.isRegularFile(work.resolve("out.sarif")), sarifRun::err);
        assertEquals(List.of(), SarifSchema.problems(read("out.sarif")));
    }

    @Test
    void failingDocumentsResultIsAtTheLineOfItsPhTarget() throws IOException {
        List<String> lines = Files.readAllLines(work.resolve("mixed").resolve(FAILING), StandardCharsets.UTF_8);
        int ph = 0;
        while (!lines.get(ph).contains("\"targets\"")) {
            ph++;
        }
        while (!lines.get(ph).contains("\"pH\"")) {
            ph++;
        }
        JsonNode result = results().stream().filter(r -> r.path("ruleId").asString().equals("ph-within-target"))
                .findFirst().orElseThrow();
        assertEquals("mixed/" + FAILING, uri(result));
        assertEquals(ph + 1, result.path("locations").path(0).path("physicalLocation").path("region")
                .path("startLine").asInt());
    }

    @Test
    void malformedFileIsAnInvalidDocumentResult() throws IOException {
        assertTrue(results().stream().anyMatch(r -> uri(r).equals("mixed/broken.json")
                && r.path("ruleId").asString().equals("invalid-document")
                && r.path("level").asString().equals("error")));
    }

    @Test
    void nonDocumentFileIsSkippedAndNotAResult() throws IOException {
        assertTrue(results().stream().noneMatch(r -> uri(r).endsWith(NOT_A_DOCUMENT)));
        List<String> skipped = new ArrayList<>();
        read("out.json").path("skipped").forEach(s -> skipped.add(s.path("source").asString()));
        assertEquals(1, skipped.size());
        assertTrue(skipped.get(0).endsWith(NOT_A_DOCUMENT), skipped::toString);
    }

    @Test
    void jsonReportListsEveryFormulation() throws IOException {
        List<String> sources = new ArrayList<>();
        read("out.json").path("reports").forEach(r -> sources.add(Path.of(r.path("source").asString())
                .getFileName().toString()));
        assertEquals(FORMULATIONS, sources.stream().sorted().toList());
    }
}
