package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Assumptions;
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

    private static final Path ROOT = Path.of(System.getProperty("protolyte.projectRoot", ".."));
    private static final Path SAMPLES = ROOT.resolve("sample-formulations");
    private static final String FAILING = "parenteral-citrate-buffer-off-target.json";
    private static final List<String> FORMULATIONS = List.of("broken.json", "laboratory-acetate-buffer-molal.json",
            FAILING);
    private static final String NOT_A_DOCUMENT = "site-substances.json";

    record Run(int exitCode, String out, String err) {
    }

    @TempDir
    static Path work;
    private static Run sarifRun;
    private static Run jsonRun;

    @BeforeAll
    static void runTheJarOverAMixedFolder() throws IOException, InterruptedException {
        Path jar = Path.of(System.getProperty("protolyte.jar", ROOT.resolve("validator/target/protolyte.jar").toString()));
        Assumptions.assumeTrue(Files.isRegularFile(jar), "no packaged jar at " + jar + "; run mvn verify");
        Path mixed = Files.createDirectory(work.resolve("mixed"));
        Files.copy(SAMPLES.resolve("laboratory-acetate-buffer-molal.json"), mixed.resolve(FORMULATIONS.get(1)));
        Files.copy(SAMPLES.resolve(FAILING), mixed.resolve(FAILING));
        Files.copy(TestDocs.resource("malformed.json"), mixed.resolve("broken.json"));
        Files.copy(SAMPLES.resolve("site-library").resolve(NOT_A_DOCUMENT), mixed.resolve(NOT_A_DOCUMENT));
        sarifRun = protolyte(jar, "check", "--format", "sarif", "-o", "out.sarif", "mixed");
        jsonRun = protolyte(jar, "check", "--format", "json", "-o", "out.json", "mixed");
    }

    /** {@code java -jar protolyte.jar ARGS} with the running JVM's java, in the work folder. */
    private static Run protolyte(Path jar, String... args) throws IOException, InterruptedException {
        boolean windows = System.getProperty("os.name", "").toLowerCase(Locale.ROOT).startsWith("windows");
        Path java = Path.of(System.getProperty("java.home"), "bin", windows ? "java.exe" : "java");
        List<String> command = new ArrayList<>(List.of(java.toString(), "-jar", jar.toAbsolutePath().toString()));
        command.addAll(List.of(args));
        Path out = Files.createTempFile(work, "stdout", ".txt");
        Path err = Files.createTempFile(work, "stderr", ".txt");
        Process p = new ProcessBuilder(command).directory(work.toFile())
                .redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        if (!p.waitFor(120, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("protolyte did not finish: " + command);
        }
        return new Run(p.exitValue(), Files.readString(out), Files.readString(err));
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
