package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.Status;
import org.protolyte.substance.LibraryLoader;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Every shipped rule ships with two example documents under {@code rule-examples/<rule-id>/}: {@code fires.json},
 * on which the rule reports a finding, and {@code quiet.json}, a close variant on which it does not. The examples
 * are the rule's regression tests and its documentation; a new rule without them fails the build.
 */
class RuleExamplesTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final RuleBook BOOK = RuleBook.shipped(SCHEMAS, CheckKinds.load());
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));
    private static final Protolyte WITH_ROBUSTNESS = PROTOLYTE.withRobustness(
            new org.protolyte.analysis.Robustness.Settings(400, 3, 0.01, 0.01));
    private static final String ROOT = "/rule-examples/";

    /** Every rule id of the shipped packs, each pack with its ancestors. */
    static Stream<String> shippedRuleIds() {
        List<String> shipped = BOOK.packs().values().stream().filter(RulePack::shipped).map(RulePack::name).toList();
        return BOOK.rules(shipped).stream().map(Rule::id).collect(Collectors.toCollection(TreeSet::new)).stream();
    }

    static Stream<String> firingRuleIds() {
        return shippedRuleIds();
    }

    private static Optional<URL> example(String ruleId, String file) {
        return Optional.ofNullable(RuleExamplesTest.class.getResource(ROOT + ruleId + "/" + file));
    }

    private static byte[] bytes(String ruleId, String file) {
        String path = ROOT + ruleId + "/" + file;
        try (InputStream in = RuleExamplesTest.class.getResourceAsStream(path)) {
            assertNotNull(in, () -> "missing example " + path);
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static DocumentReport check(String ruleId, String file) {
        // batch-risk judges the robustness study, which a check runs only when asked (check --robustness N)
        Protolyte p = ruleId.equals("batch-risk") ? WITH_ROBUSTNESS : PROTOLYTE;
        // a rule whose subject only a site library holds (a drug substance) brings that library beside its examples
        if (example(ruleId, "library.json").isPresent()) {
            p = new Protolyte(SCHEMAS, new LibraryLoader(SCHEMAS).addShipped().add("rule-examples/" + ruleId
                    + "/library.json", bytes(ruleId, "library.json"), true).build());
        }
        return p.check("rule-examples/" + ruleId + "/" + file, bytes(ruleId, file));
    }

    private static List<Finding> findingsOf(DocumentReport r, String ruleId) {
        return r.findings().stream().filter(f -> f.rule().equals(ruleId)).toList();
    }

    private static String describe(DocumentReport r) {
        return r.status() + " " + r.findings().stream().map(f -> f.rule() + ": " + f.message()).toList()
                + " " + r.diagnostics();
    }

    private static JsonNode json(String ruleId, String file) {
        return JsonMapper.builder().build().readTree(bytes(ruleId, file));
    }

    @Test
    void theShippedPacksDefineRules() {
        assertTrue(shippedRuleIds().count() > 0);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("shippedRuleIds")
    void everyShippedRuleHasAFiringExample(String ruleId) {
        assertTrue(example(ruleId, "fires.json").isPresent(),
                () -> "rule '" + ruleId + "' has no example " + ROOT + ruleId + "/fires.json");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("shippedRuleIds")
    void everyShippedRuleHasAQuietExample(String ruleId) {
        assertTrue(example(ruleId, "quiet.json").isPresent(),
                () -> "rule '" + ruleId + "' has no example " + ROOT + ruleId + "/quiet.json");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("firingRuleIds")
    void firingExampleGetsAFindingOfItsRuleWithPointerAndLine(String ruleId) {
        DocumentReport r = check(ruleId, "fires.json");
        List<Finding> found = findingsOf(r, ruleId);
        assertFalse(found.isEmpty(), () -> ruleId + " did not fire on its example: " + describe(r));
        for (Finding f : found) {
            assertTrue(f.pointer().isPresent(), () -> ruleId + " finding without a pointer: " + f);
            assertTrue(f.location().isPresent() && f.location().get().line() >= 1,
                    () -> ruleId + " finding without a line: " + f);
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("shippedRuleIds")
    void quietExampleGetsNoFindingOfItsRule(String ruleId) {
        DocumentReport r = check(ruleId, "quiet.json");
        assertEquals(List.of(), findingsOf(r, ruleId), () -> describe(r));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("shippedRuleIds")
    void quietExampleIsJudgedNotInvalidOrIndeterminate(String ruleId) {
        DocumentReport r = check(ruleId, "quiet.json");
        assertTrue(r.status() == Status.PASS || r.status() == Status.FAIL, () -> describe(r));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("shippedRuleIds")
    void examplesIntendedUseSelectsThePackOfTheirRule(String ruleId) {
        for (String file : List.of("fires.json", "quiet.json")) {
            JsonNode doc = json(ruleId, file);
            Optional<String> use = doc.has("intendedUse") ? Optional.of(doc.get("intendedUse").asString())
                    : Optional.empty();
            List<String> selected = Checker.byIntendedUse(BOOK).selection(use);
            assertTrue(BOOK.rules(selected).stream().anyMatch(rule -> rule.id().equals(ruleId)),
                    () -> file + " of " + ruleId + " has intendedUse " + use + ", which selects " + selected);
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("shippedRuleIds")
    void examplesSayWhyTheyFireOrNot(String ruleId) {
        assertTrue(json(ruleId, "fires.json").path("description").asString("").startsWith("Fires: "), ruleId);
        assertTrue(json(ruleId, "quiet.json").path("description").asString("").startsWith("Quiet: "), ruleId);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("shippedRuleIds")
    void exampleIdsAreInventedExampleIds(String ruleId) {
        String prefix = "EX-" + ruleId.toUpperCase(java.util.Locale.ROOT) + "-";
        assertTrue(json(ruleId, "fires.json").path("id").asString("").startsWith(prefix), ruleId);
        assertTrue(json(ruleId, "quiet.json").path("id").asString("").startsWith(prefix), ruleId);
    }

    /** Every example file of every shipped rule: {@code fires*.json} and {@code quiet*.json}, as "rule-id/file". */
    static Stream<String> exampleFiles() throws IOException, URISyntaxException {
        URL root = RuleExamplesTest.class.getResource(ROOT);
        assertNotNull(root, "missing " + ROOT);
        List<String> files = new java.util.ArrayList<>();
        for (String ruleId : shippedRuleIds().toList()) {
            Path dir = Path.of(root.toURI()).resolve(ruleId);
            if (!Files.isDirectory(dir)) {
                continue; // reported by everyShippedRuleHasAFiringExample
            }
            try (Stream<Path> in = Files.list(dir)) {
                in.map(f -> f.getFileName().toString())
                        .filter(n -> n.endsWith(".json") && (n.startsWith("fires") || n.startsWith("quiet")))
                        .sorted().forEach(n -> files.add(ruleId + "/" + n));
            }
        }
        return files.stream();
    }

    /** One line of a {@code .expected} sidecar: {@code <rule-id> <json-pointer> "<phrase>"}, pointer "-" for the document. */
    record Expected(int line, String rule, String pointer, String phrase) {
        private static final java.util.regex.Pattern LINE =
                java.util.regex.Pattern.compile("(\\S+)\\s+(\\S+)\\s+\"(.+)\"");

        static List<Expected> parse(String where, String text) {
            List<Expected> out = new java.util.ArrayList<>();
            String[] lines = text.split("\\R");
            for (int i = 0; i < lines.length; i++) {
                String l = lines[i].strip();
                if (l.isEmpty() || l.startsWith("#")) {
                    continue;
                }
                java.util.regex.Matcher m = LINE.matcher(l);
                int n = i + 1;
                assertTrue(m.matches(), () -> where + ":" + n + ": expected <rule-id> <json-pointer> \"<phrase>\"");
                out.add(new Expected(n, m.group(1), m.group(2).equals("-") ? "" : m.group(2), m.group(3)));
            }
            return out;
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("exampleFiles")
    void exampleGivesTheFindingsItsSidecarStates(String example) {
        String ruleId = example.substring(0, example.indexOf('/'));
        String file = example.substring(example.indexOf('/') + 1);
        DocumentReport r = check(ruleId, file);
        if (file.startsWith("quiet")) {
            assertEquals(List.of(), findingsOf(r, ruleId), () -> example + ": " + describe(r));
            return;
        }
        String sidecar = file.substring(0, file.length() - ".json".length()) + ".expected";
        assertTrue(example(ruleId, sidecar).isPresent(), () -> example + " has no sidecar " + sidecar);
        String where = ROOT + ruleId + "/" + sidecar;
        List<Expected> expected = Expected.parse(where, new String(bytes(ruleId, sidecar),
                java.nio.charset.StandardCharsets.UTF_8));
        assertFalse(expected.isEmpty(), () -> where + " states no finding");
        assertTrue(expected.stream().anyMatch(e -> e.rule().equals(ruleId)),
                () -> where + " states no finding of " + ruleId);
        for (Expected e : expected) {
            String at = e.pointer().isEmpty() ? "the document" : e.pointer();
            List<Finding> there = r.findings().stream()
                    .filter(f -> f.rule().equals(e.rule()) && f.pointer().orElse("").equals(e.pointer())).toList();
            assertFalse(there.isEmpty(), () -> where + ":" + e.line() + ": no " + e.rule() + " finding at " + at
                    + "; got " + describe(r));
            assertTrue(there.stream().anyMatch(f -> f.message().contains(e.phrase())),
                    () -> where + ":" + e.line() + ": the " + e.rule() + " finding at " + at + " lacks \""
                            + e.phrase() + "\": " + there.stream().map(Finding::message).toList());
        }
    }

    @Test
    void everyExampleFolderBelongsToAShippedRule() throws IOException, URISyntaxException {
        URL root = RuleExamplesTest.class.getResource(ROOT);
        assertNotNull(root, "missing " + ROOT);
        Set<String> ids = shippedRuleIds().collect(Collectors.toSet());
        try (Stream<Path> dirs = Files.list(Path.of(root.toURI()))) {
            List<String> stale = dirs.filter(Files::isDirectory).map(p -> p.getFileName().toString())
                    .filter(name -> !ids.contains(name)).sorted().toList();
            assertEquals(List.of(), stale, "example folders for rules no shipped pack defines");
        }
    }
}
