package org.protolyte.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.TestDocs;
import org.protolyte.chemistry.Caveat;
import org.protolyte.document.Location;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.rules.Finding;
import org.protolyte.rules.Rule;
import org.protolyte.rules.Severity;
import org.protolyte.rules.Waiver;
import org.protolyte.substance.LibraryLoader;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** The SARIF 2.1.0 log (OASIS): conforms to the official schema and points each result at its place. */
class SarifRendererTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Path SAMPLES = Path.of(System.getProperty("protolyte.projectRoot", "../.."),
            "sample-formulations");
    private static final Path OFF_TARGET = SAMPLES.resolve("parenteral-citrate-buffer-off-target.json");
    private static final JsonMapper MAPPER = JsonMapper.builder().build();

    private static Protolyte protolyte() throws IOException {
        Path site = SAMPLES.resolve("site-library").resolve("site-substances.json");
        return new Protolyte(SCHEMAS, new LibraryLoader(SCHEMAS).addShipped()
                .add(site.toString(), Files.readAllBytes(site), true).build());
    }

    /** Every sample below the folder, as the command line finds them in a folder (non-documents skipped). */
    private static RunReport allSamples() throws IOException {
        List<Protolyte.Input> inputs;
        try (Stream<Path> s = Files.walk(SAMPLES)) {
            inputs = s.filter(p -> p.toString().endsWith(".json")).sorted()
                    .map(p -> new Protolyte.Input(p, true)).toList();
        }
        return protolyte().checkInputs(inputs);
    }

    private static JsonNode sarif(RunReport run) {
        return MAPPER.readTree(new SarifRenderer().render(run));
    }

    private static RunReport runOf(DocumentReport... reports) {
        return new RunReport("test", Instant.EPOCH, Map.of(), List.of(reports), List.of());
    }

    private static List<JsonNode> results(JsonNode log) {
        List<JsonNode> out = new ArrayList<>();
        log.path("runs").path(0).path("results").forEach(out::add);
        return out;
    }

    private static JsonNode firstResult(JsonNode log, String ruleId) {
        return results(log).stream().filter(r -> r.path("ruleId").asString().equals(ruleId)).findFirst()
                .orElseThrow(() -> new AssertionError("no result for " + ruleId + " in " + log));
    }

    @Test
    void allSamplesRenderAsOneLogThatConformsToTheOfficialSarifSchema() throws IOException {
        RunReport run = allSamples();
        assertTrue(run.reports().size() >= 6, "the samples, including the site-library one");
        JsonNode log = sarif(run);
        assertEquals(List.of(), SarifSchema.problems(log));
        assertEquals("2.1.0", log.path("version").asString());
        int expected = run.reports().stream().mapToInt(r -> r.findings().size() + r.diagnostics().size()).sum();
        assertEquals(expected, results(log).size());
    }

    @Test
    void officialSchemaRejectsALogWithAnUnknownLevel() throws IOException {
        String text = new SarifRenderer().render(protolyte().check(List.of(OFF_TARGET)))
                .replace("\"level\" : \"error\"", "\"level\" : \"fatal\"");
        assertFalse(SarifSchema.problems(MAPPER.readTree(text)).isEmpty(), "the schema must be able to fail");
    }

    @Test
    void findingPointsAtTheLineAndColumnOfThePhTarget() throws IOException {
        List<String> lines = Files.readAllLines(OFF_TARGET, StandardCharsets.UTF_8);
        int targets = 0;
        while (!lines.get(targets).contains("\"targets\"")) {
            targets++;
        }
        int ph = targets;
        while (!lines.get(ph).contains("\"pH\"")) {
            ph++;
        }
        JsonNode region = firstResult(sarif(protolyte().check(List.of(OFF_TARGET))), "ph-within-target")
                .path("locations").path(0).path("physicalLocation").path("region");
        assertEquals(ph + 1, region.path("startLine").asInt());
        assertEquals(lines.get(ph).indexOf("\"pH\"") + 1, region.path("startColumn").asInt());
    }

    @Test
    void findingCarriesItsLevelMessageAndJsonPointer() throws IOException {
        RunReport run = protolyte().check(List.of(OFF_TARGET));
        Finding finding = run.reports().get(0).findings().stream().filter(f -> f.rule().equals("ph-within-target"))
                .findFirst().orElseThrow();
        JsonNode result = firstResult(sarif(run), "ph-within-target");
        assertEquals("error", result.path("level").asString());
        assertEquals(finding.message(), result.path("message").path("text").asString());
        assertEquals(finding.pointer().orElseThrow(),
                result.path("locations").path(0).path("logicalLocations").path(0).path("fullyQualifiedName").asString());
    }

    @Test
    void relativeSourceStaysRelativeWithForwardSlashesUnderSrcRoot() throws IOException {
        Path relative = Path.of("").toAbsolutePath().relativize(OFF_TARGET.toAbsolutePath().normalize());
        JsonNode artifact = firstResult(sarif(protolyte().check(List.of(relative))), "ph-within-target")
                .path("locations").path(0).path("physicalLocation").path("artifactLocation");
        assertEquals(relative.toString().replace('\\', '/'), artifact.path("uri").asString());
        assertEquals("%SRCROOT%", artifact.path("uriBaseId").asString());
    }

    @Test
    void absoluteSourceBecomesAFileUriWithoutBaseId() throws IOException {
        Path absolute = OFF_TARGET.toAbsolutePath().normalize();
        JsonNode artifact = firstResult(sarif(protolyte().check(List.of(absolute))), "ph-within-target")
                .path("locations").path(0).path("physicalLocation").path("artifactLocation");
        assertEquals(absolute.toUri().toString(), artifact.path("uri").asString());
        assertTrue(artifact.path("uriBaseId").isMissingNode());
    }

    @Test
    void sourceWithASpaceIsPercentEncoded() {
        assertEquals("my%20recipes/buffer%23.json", SarifRenderer.relativeUri("my recipes/buffer#.json"));
    }

    @Test
    void ruleDescriptorCarriesTheRuleTextsOfItsPack() throws IOException {
        RunReport run = protolyte().check(List.of(OFF_TARGET));
        Rule rule = run.reports().get(0).findings().stream().filter(f -> f.rule().equals("ph-within-target"))
                .findFirst().orElseThrow().definition().orElseThrow();
        JsonNode d = null;
        for (JsonNode x : sarif(run).path("runs").path(0).path("tool").path("driver").path("rules")) {
            if (x.path("id").asString().equals(rule.id())) {
                d = x;
            }
        }
        assertTrue(d != null, "descriptor for " + rule.id());
        assertEquals(rule.summary(), d.path("shortDescription").path("text").asString());
        assertEquals(rule.explanation(), d.path("fullDescription").path("text").asString());
        assertTrue(d.path("help").path("text").asString().contains(rule.remedy().orElseThrow()));
        assertEquals(rule.severity().code(), d.path("defaultConfiguration").path("level").asString());
        List<String> refs = new ArrayList<>();
        d.path("properties").path("references").forEach(r -> refs.add(r.asString()));
        assertEquals(rule.references(), refs);
    }

    @Test
    void everyResultNamesAnExistingDescriptorOnceEach() throws IOException {
        JsonNode log = sarif(allSamples());
        List<String> ids = new ArrayList<>();
        log.path("runs").path(0).path("tool").path("driver").path("rules").forEach(r -> ids.add(r.path("id").asString()));
        assertEquals(ids.size(), new HashSet<>(ids).size(), "distinct rule ids");
        Set<String> used = new HashSet<>();
        for (JsonNode r : results(log)) {
            assertEquals(r.path("ruleId").asString(), ids.get(r.path("ruleIndex").asInt()));
            used.add(r.path("ruleId").asString());
        }
        assertEquals(new HashSet<>(ids), used, "no descriptor without a result");
    }

    @Test
    void malformedDocumentBecomesAnInvalidDocumentErrorResult() throws IOException {
        RunReport run = protolyte().check(List.of(TestDocs.resource("malformed.json")));
        JsonNode log = sarif(run);
        JsonNode result = firstResult(log, Protolyte.INVALID_DOCUMENT);
        assertEquals("error", result.path("level").asString());
        assertEquals(List.of(), SarifSchema.problems(log));
        assertEquals(2, log.path("runs").path(0).path("properties").path("exitCode").asInt());
    }

    @Test
    void engineDiagnosticsBecomeEngineResultsAtTheirCondition() {
        Diagnostic indeterminate = new Diagnostic("below-freezing-point", Caveat.Severity.INDETERMINATE, "frozen",
                Optional.of("storage"), Optional.of("/conditions/1"), Optional.of(new Location(7, 5)));
        Diagnostic warning = new Diagnostic("ionic-strength-high", Caveat.Severity.WARNING, "high I",
                Optional.empty(), Optional.empty(), Optional.empty());
        JsonNode log = sarif(runOf(new DocumentReport("d.json", Optional.empty(), Optional.of("D-1"),
                Status.INDETERMINATE, Optional.empty(), List.of(), List.of(indeterminate, warning), List.of())));
        JsonNode frozen = firstResult(log, "engine/below-freezing-point");
        assertEquals("error", frozen.path("level").asString());
        JsonNode location = frozen.path("locations").path(0);
        assertEquals(7, location.path("physicalLocation").path("region").path("startLine").asInt());
        assertEquals("/conditions/1", location.path("logicalLocations").path(0).path("fullyQualifiedName").asString());
        JsonNode high = firstResult(log, "engine/ionic-strength-high");
        assertEquals("warning", high.path("level").asString());
        assertEquals("d.json", high.path("locations").path(0).path("physicalLocation").path("artifactLocation")
                .path("uri").asString());
        assertEquals(List.of(), SarifSchema.problems(log));
    }

    @Test
    void waivedFindingIsAnAcceptedExternalSuppression() {
        Waiver w = new Waiver("ph-within-target", Optional.of("D-1"), Optional.empty(), Optional.empty(),
                Optional.empty(), "justified by stability data", "QA reviewer", LocalDate.of(2026, 1, 5),
                LocalDate.of(2027, 1, 5), "waivers.json /waivers/0", false);
        Finding f = new Finding("ph-within-target", Severity.ERROR, "off target", Optional.of("/targets/pH"),
                Optional.of(new Location(3, 3))).waived(w);
        JsonNode log = sarif(runOf(new DocumentReport("d.json", Optional.empty(), Optional.of("D-1"), Status.PASS,
                Optional.empty(), List.of(f), List.of(), List.of())));
        JsonNode suppression = firstResult(log, "ph-within-target").path("suppressions").path(0);
        assertEquals("external", suppression.path("kind").asString());
        assertEquals("accepted", suppression.path("status").asString());
        assertEquals("justified by stability data", suppression.path("justification").asString());
        assertEquals(List.of(), SarifSchema.problems(log));
    }

    @Test
    void artifactRecordsTheInputsSha256() throws IOException {
        RunReport run = protolyte().check(List.of(OFF_TARGET));
        JsonNode artifact = sarif(run).path("runs").path(0).path("artifacts").path(0);
        assertEquals(run.reports().get(0).sha256().orElseThrow(), artifact.path("hashes").path("sha-256").asString());
    }

    @Test
    void internalFaultMarksTheExecutionUnsuccessful() {
        JsonNode log = sarif(runOf(DocumentReport.fault("f.json", Optional.empty(), "boom")));
        assertFalse(log.path("runs").path(0).path("invocations").path(0).path("executionSuccessful").asBoolean(true));
        assertEquals("error", firstResult(log, "engine/internal-fault").path("level").asString());
    }

    @Test
    void runPropertiesCarryTheExitCodeAndTheCaution() throws IOException {
        RunReport run = protolyte().check(List.of(OFF_TARGET));
        JsonNode props = sarif(run).path("runs").path(0).path("properties");
        assertEquals(run.exitCode(), props.path("exitCode").asInt());
        assertEquals(RunReport.CAUTION, props.path("caution").asString());
        assertTrue(sarif(run).path("runs").path(0).path("invocations").path(0).path("executionSuccessful").asBoolean());
    }

    @Test
    void sameReportRendersToTheSameBytesWhateverItsTimestamp() throws IOException {
        RunReport run = protolyte().check(List.of(OFF_TARGET));
        RunReport later = new RunReport(run.toolVersion(), run.generatedAt().plusSeconds(3600), run.libraryFiles(),
                run.reports(), run.skipped());
        assertEquals(new SarifRenderer().render(run), new SarifRenderer().render(later));
    }
}
