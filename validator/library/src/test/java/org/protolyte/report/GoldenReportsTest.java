package org.protolyte.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeSet;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.SerializationFeature;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * Every shipped sample's JSON report, as {@code check --substances site-library/site-substances.json
 * sample-formulations/} gives it, equals its golden file under {@code validator/library/src/test/resources/golden/}. Numbers
 * are compared as the renderer writes them, so a change in the last figure it prints shows. A golden holds the
 * document's report only (not the run's tool block or summary); the digests of the shipped rule packs are normalised
 * and absolute paths made relative to the project, the rest is compared as written. {@code -Dgolden.update=true}
 * rewrites the goldens instead, for a deliberate change reviewed in their diff.
 */
class GoldenReportsTest {

    private static final Path ROOT = Path.of(System.getProperty("protolyte.projectRoot", "../..")).toAbsolutePath()
            .normalize();
    private static final Path SAMPLES = ROOT.resolve("sample-formulations");
    private static final Path GOLDEN = ROOT.resolve("validator/library/src/test/resources/golden");
    /** The example site library, given to the run with --substances as sample-formulations/README.md says. */
    private static final String SITE_LIBRARY = "site-library/site-substances.json";
    private static final boolean UPDATE = Boolean.getBoolean("golden.update");
    static final String NORMALISED = "(normalised)";

    private static final JsonMapper MAPPER = JsonMapper.builder().enable(SerializationFeature.INDENT_OUTPUT).build();

    static List<String> samples() throws IOException {
        try (Stream<Path> files = Files.walk(SAMPLES)) {
            return files.filter(p -> p.toString().endsWith(".json"))
                    .map(p -> SAMPLES.relativize(p).toString().replace('\\', '/'))
                    .filter(p -> !p.equals(SITE_LIBRARY)).sorted().toList();
        }
    }

    /** The document's report from a folder run, normalised. */
    private static JsonNode report(String sample) throws IOException {
        SchemaCatalog schemas = new SchemaCatalog();
        Path site = SAMPLES.resolve(SITE_LIBRARY);
        var library = new LibraryLoader(schemas).addShipped().add("sample-formulations/" + SITE_LIBRARY,
                Files.readAllBytes(site), true).build();
        Path file = SAMPLES.resolve(sample);
        Protolyte.Input in = new Protolyte.Input("sample-formulations/" + sample, Optional.of(file), true, SAMPLES,
                Optional.empty(), Optional.empty());
        RunReport run = new Protolyte(schemas, library).checkInputs(List.of(in));
        assertEquals(1, run.reports().size(), () -> sample + " gave no report: skipped " + run.skipped());
        JsonNode doc = MAPPER.readTree(new JsonRenderer().render(run)).path("reports").get(0);
        return normalised(doc, "");
    }

    /** The rule packs' digests out; absolute paths inside the project made relative to it. */
    static JsonNode normalised(JsonNode node, String pointer) {
        if (node instanceof ObjectNode o) {
            for (Map.Entry<String, JsonNode> e : new ArrayList<>(o.properties())) {
                String at = pointer + "/" + e.getKey();
                if (at.matches("/rulePacks/\\d+/sha256")) {
                    o.put(e.getKey(), NORMALISED);
                } else {
                    o.set(e.getKey(), normalised(e.getValue(), at));
                }
            }
            return o;
        }
        if (node instanceof ArrayNode a) {
            for (int i = 0; i < a.size(); i++) {
                a.set(i, normalised(a.get(i), pointer + "/" + i));
            }
            return a;
        }
        if (node.isString() && node.asString().contains(ROOT + "/")) {
            return MAPPER.getNodeFactory().stringNode(node.asString().replace(ROOT + "/", ""));
        }
        return node;
    }

    /** The first place where two trees differ, with both values; empty where they are equal. */
    static Optional<String> firstDifference(String pointer, JsonNode golden, JsonNode actual) {
        String at = pointer.isEmpty() ? "/" : pointer;
        if (golden.isObject() && actual.isObject()) {
            TreeSet<String> keys = new TreeSet<>(golden.propertyNames());
            keys.addAll(actual.propertyNames());
            for (String k : keys) {
                String next = pointer + "/" + k.replace("~", "~0").replace("/", "~1");
                if (!actual.has(k)) {
                    return Optional.of(next + ": golden " + brief(golden.get(k)) + ", report has no such field");
                }
                if (!golden.has(k)) {
                    return Optional.of(next + ": golden has no such field, report " + brief(actual.get(k)));
                }
                Optional<String> d = firstDifference(next, golden.get(k), actual.get(k));
                if (d.isPresent()) {
                    return d;
                }
            }
            return Optional.empty();
        }
        if (golden.isArray() && actual.isArray()) {
            for (int i = 0; i < Math.min(golden.size(), actual.size()); i++) {
                Optional<String> d = firstDifference(pointer + "/" + i, golden.get(i), actual.get(i));
                if (d.isPresent()) {
                    return d;
                }
            }
            return golden.size() == actual.size() ? Optional.empty() : Optional.of(at + ": golden has "
                    + golden.size() + " elements, report " + actual.size());
        }
        // values as written: 7.2 and 7.20 are one double, but 7.201 and 7.2 are not, nor 1 and 1.0
        return golden.toString().equals(actual.toString()) ? Optional.empty()
                : Optional.of(at + ": golden " + brief(golden) + ", report " + brief(actual));
    }

    private static String brief(JsonNode n) {
        String s = n.toString();
        return s.length() <= 200 ? s : s.substring(0, 200) + "…";
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("samples")
    void sampleReportEqualsItsGolden(String sample) throws IOException {
        JsonNode actual = report(sample);
        Path golden = GOLDEN.resolve(sample);
        if (UPDATE) {
            Files.createDirectories(golden.getParent());
            Path tmp = golden.resolveSibling(golden.getFileName() + ".tmp");
            Files.writeString(tmp, MAPPER.writeValueAsString(actual) + "\n", StandardCharsets.UTF_8);
            Files.move(tmp, golden, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            return;
        }
        assertTrue(Files.isRegularFile(golden), () -> sample + " has no golden report " + ROOT.relativize(golden)
                + "; write it with -Dgolden.update=true and review it");
        JsonNode expected = MAPPER.readTree(Files.readString(golden, StandardCharsets.UTF_8));
        firstDifference("", expected, actual).ifPresent(d -> fail(sample + ": the report differs from "
                + ROOT.relativize(golden) + " at " + d + ". If the change is deliberate, rerun with "
                + "-Dgolden.update=true and review the diff of the golden files"));
    }

    @Test
    void everyGoldenBelongsToASample() throws IOException {
        List<String> samples = samples();
        assertTrue(Files.isDirectory(GOLDEN), () -> "no golden reports in " + ROOT.relativize(GOLDEN)
                + "; write them with -Dgolden.update=true");
        try (Stream<Path> files = Files.walk(GOLDEN)) {
            List<String> stale = files.filter(Files::isRegularFile)
                    .map(p -> GOLDEN.relativize(p).toString().replace('\\', '/'))
                    .filter(p -> !samples.contains(p)).sorted().toList();
            assertEquals(List.of(), stale, "golden reports of samples that no longer exist");
        }
    }

    @Test
    void aChangeInTheLastPrintedFigureIsReportedWithItsPointerAndBothValues() {
        JsonNode golden = MAPPER.readTree("{\"conditions\": [{\"name\": \"use\", \"pH\": 7.201}]}");
        JsonNode actual = MAPPER.readTree("{\"conditions\": [{\"name\": \"use\", \"pH\": 7.202}]}");
        assertEquals(Optional.of("/conditions/0/pH: golden 7.201, report 7.202"),
                firstDifference("", golden, actual));
        assertEquals(Optional.empty(), firstDifference("", golden, MAPPER.readTree(golden.toString())));
    }

    @Test
    void aMissingFieldOrElementIsReported() {
        JsonNode golden = MAPPER.readTree("{\"findings\": [{\"rule\": \"a\"}, {\"rule\": \"b\"}], \"status\": \"fail\"}");
        assertEquals(Optional.of("/findings: golden has 2 elements, report 1"), firstDifference("", golden,
                MAPPER.readTree("{\"findings\": [{\"rule\": \"a\"}], \"status\": \"fail\"}")));
        assertEquals(Optional.of("/status: golden \"fail\", report has no such field"), firstDifference("", golden,
                MAPPER.readTree("{\"findings\": [{\"rule\": \"a\"}, {\"rule\": \"b\"}]}")));
    }
}
