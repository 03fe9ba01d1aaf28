package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** The {@code --rules} option of check, rules and explain, and what the CLI says about a pack it refuses. */
class RulesOptionTest {

    private static final Pattern STACK_FRAME = Pattern.compile("(?m)^\\s+at [\\w.$]+\\(.*\\)\\s*$");

    @TempDir
    Path dir;

    private static MainCommandLineTest.Result run(String... args) {
        return MainCommandLineTest.run(args);
    }

    /** A rule example shipped with the tests (see RuleExamplesTest). */
    private static String example(String ruleId, String file) {
        try {
            return Path.of(RulesOptionTest.class.getResource("/rule-examples/" + ruleId + "/" + file).toURI())
                    .toString();
        } catch (URISyntaxException e) {
            throw new IllegalStateException(e);
        }
    }

    private Path write(String name, String content) throws IOException {
        return Files.writeString(dir.resolve(name), content, StandardCharsets.UTF_8);
    }

    private Path write(String name, byte[] content) throws IOException {
        return Files.write(dir.resolve(name), content);
    }

    private static JsonNode report(MainCommandLineTest.Result r) {
        return JsonMapper.builder().build().readTree(r.out()).get("reports").get(0);
    }

    private static List<String> ruleIds(JsonNode report) {
        List<String> ids = new ArrayList<>();
        report.get("findings").forEach(f -> ids.add(f.get("rule").asString()));
        return ids;
    }

    private static List<String> packNames(JsonNode report) {
        List<String> names = new ArrayList<>();
        report.get("rulePacks").forEach(p -> names.add(p.get("name").asString()));
        return names;
    }

    private static void assertNoStackTrace(MainCommandLineTest.Result r) {
        assertFalse(STACK_FRAME.matcher(r.all()).find(), () -> "stack trace in output:\n" + r.all());
        assertFalse(r.all().contains("Exception"), r::all);
    }

    /** A pack extending general with the given rule entries; the first entry is on line 8. */
    private static String pack(String name, String rules) {
        return "{\n"
                + "  \"document\": \"rule-pack\",\n"
                + "  \"formatVersion\": 1,\n"
                + "  \"name\": \"" + name + "\",\n"
                + "  \"version\": \"1.0.0\",\n"
                + "  \"extends\": \"general\",\n"
                + "  \"rules\": [\n"
                + rules + "\n"
                + "  ]\n"
                + "}\n";
    }

    private static final String STRICT_PKA = pack("site-strict",
            "    { \"id\": \"pka-near-target\", \"severity\": \"error\", \"parameters\": { \"maxDistance\": 0.3 } }");

    // ---- hostile packs ----

    static Stream<Arguments> hostilePacks() {
        byte[] big = new byte[1024 * 1024 + 1];
        Arrays.fill(big, (byte) ' ');
        return Stream.of(
                Arguments.of("unknown check kind", pack("site", "    { \"id\": \"site-x\", \"check\": \"run-script\", "
                        + "\"severity\": \"error\", \"summary\": \"s\", \"explanation\": \"e\", "
                        + "\"references\": [\"common practice\"] }").getBytes(StandardCharsets.UTF_8),
                        "/rules/0/check"),
                Arguments.of("parameter of the wrong type", pack("site", "    { \"id\": \"pka-near-target\", "
                        + "\"parameters\": { \"maxDistance\": \"one\" } }").getBytes(StandardCharsets.UTF_8),
                        "/rules/0/parameters/maxDistance"),
                Arguments.of("new rule without explanation", pack("site", "    { \"id\": \"site-x\", "
                        + "\"check\": \"revision-stated\", \"severity\": \"note\", \"summary\": \"s\", "
                        + "\"references\": [\"common practice\"] }").getBytes(StandardCharsets.UTF_8), "/rules/0"),
                Arguments.of("unknown parent", pack("site", "    { \"id\": \"revision-stated\", \"enabled\": false }")
                        .replace("\"general\"", "\"everything\"").getBytes(StandardCharsets.UTF_8), "/extends"),
                Arguments.of("shipped name taken", pack("general", "    { \"id\": \"revision-stated\", "
                        + "\"enabled\": false }").getBytes(StandardCharsets.UTF_8), "/name"),
                Arguments.of("not a rule pack", "{ \"document\": \"formulation\", \"formatVersion\": 1 }"
                        .getBytes(StandardCharsets.UTF_8), "/document"),
                Arguments.of("duplicate key", pack("site", "    { \"id\": \"revision-stated\", \"enabled\": false, "
                        + "\"enabled\": true }").getBytes(StandardCharsets.UTF_8), "/rules/0"),
                Arguments.of("larger than 1 MiB", big, "(document)"));
    }

    private Path hostile(byte[] content) throws IOException {
        return write("my-pack.json", content);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("hostilePacks")
    void hostilePackExitsTwo(String label, byte[] content, String place) throws IOException {
        Path p = hostile(content);
        MainCommandLineTest.Result r = run("check", "--rules", p.toString(), example("revision-stated", "quiet.json"));
        assertEquals(2, r.exitCode(), r::all);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("hostilePacks")
    void hostilePackMessageNamesTheFileAndThePlace(String label, byte[] content, String place) throws IOException {
        Path p = hostile(content);
        MainCommandLineTest.Result r = run("check", "--rules", p.toString(), example("revision-stated", "quiet.json"));
        assertTrue(r.err().contains(p.toString()), r::err);
        assertTrue(r.err().contains(place), () -> "place " + place + " not named:\n" + r.err());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("hostilePacks")
    void hostilePackNeverPrintsAStackTrace(String label, byte[] content, String place) throws IOException {
        Path p = hostile(content);
        assertNoStackTrace(run("check", "--rules", p.toString(), example("revision-stated", "quiet.json")));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("hostilePacks")
    void hostilePackProducesNoReport(String label, byte[] content, String place) throws IOException {
        Path p = hostile(content);
        MainCommandLineTest.Result r = run("check", "--rules", p.toString(), example("revision-stated", "quiet.json"));
        assertEquals("", r.out(), r::all);
    }

    @Test
    void hostilePackMessageGivesTheLine() throws IOException {
        Path p = write("my-pack.json", pack("site", "    { \"id\": \"pka-near-target\", "
                + "\"parameters\": { \"maxDistance\": \"one\" } }"));
        MainCommandLineTest.Result r = run("check", "--rules", p.toString(), example("revision-stated", "quiet.json"));
        assertTrue(r.err().contains("line 8"), r::err);
    }

    @Test
    void hostilePackAddedWithPlusIsRefusedToo() throws IOException {
        Path p = write("my-pack.json", pack("site", "    { \"id\": \"pka-near-target\", \"check\": \"form-stated\" }"));
        MainCommandLineTest.Result r = run("check", "--rules", "+" + p, example("revision-stated", "quiet.json"));
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains("/rules/0/check"), r::err);
    }

    @Test
    void missingPackFileExitsTwo() {
        MainCommandLineTest.Result r = run("check", "--rules", dir.resolve("absent.json").toString(),
                example("revision-stated", "quiet.json"));
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains("absent.json"), r::err);
        assertNoStackTrace(r);
    }

    // ---- choosing packs ----

    @Test
    void userPackFileReplacesTheDefaultChoice() throws IOException {
        Path p = write("site-strict.json", STRICT_PKA);
        MainCommandLineTest.Result r = run("check", "--format", "json", "--rules", p.toString(),
                example("pka-near-target", "quiet.json"));
        assertEquals(List.of("general", "site-strict"), packNames(report(r)), r::all);
    }

    @Test
    void userPackFileChangesTheVerdict() throws IOException {
        Path p = write("site-strict.json", STRICT_PKA);
        // acetate's pKa 4.756 (shipped library) is about 0.44 from the example's target 5.2: beyond 0.3
        MainCommandLineTest.Result r = run("check", "--format", "json", "--rules", p.toString(),
                example("pka-near-target", "quiet.json"));
        assertEquals(1, r.exitCode(), r::all);
        JsonNode finding = null;
        for (JsonNode f : report(r).get("findings")) {
            if (f.get("rule").asString().equals("pka-near-target")) {
                finding = f;
            }
        }
        assertTrue(finding != null, r::out);
        assertEquals("error", finding.get("severity").asString());
    }

    @Test
    void plusPackAddsToTheChoiceByIntendedUse() {
        // a bioprocess Tris buffer near 16 mmol/L per pH: above the ophthalmic pack's maximum of 10
        MainCommandLineTest.Result r = run("check", "--format", "json", "--rules", "+ophthalmic",
                example("titrant-reaches-goal", "quiet.json"));
        assertTrue(ruleIds(report(r)).contains("ophthalmic-buffer-capacity-low"), r::out);
    }

    @Test
    void plusPackKeepsThePacksChosenByIntendedUse() {
        MainCommandLineTest.Result r = run("check", "--format", "json", "--rules", "+ophthalmic",
                example("titrant-reaches-goal", "quiet.json"));
        assertEquals(List.of("general", "ophthalmic"), packNames(report(r)), r::out);
    }

    @Test
    void withoutThePlusPackItsRulesDoNotRun() {
        MainCommandLineTest.Result r = run("check", "--format", "json", example("titrant-reaches-goal", "quiet.json"));
        assertFalse(ruleIds(report(r)).contains("ophthalmic-buffer-capacity-low"), r::out);
    }

    @Test
    void namedPackReplacesTheChoiceByIntendedUse() {
        MainCommandLineTest.Result r = run("check", "--format", "json", "--rules", "general",
                example("ophthalmic-buffer-capacity-low", "fires.json"));
        assertFalse(ruleIds(report(r)).contains("ophthalmic-buffer-capacity-low"), r::out);
        assertEquals(List.of("general"), packNames(report(r)), r::out);
    }

    @Test
    void unknownPackNameExitsTwo() {
        MainCommandLineTest.Result r = run("check", "--rules", "paediatric", example("revision-stated", "quiet.json"));
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains("unknown rule pack 'paediatric'"), r::err);
        assertNoStackTrace(r);
    }

    @Test
    void unknownPackNameListsTheShippedPacks() {
        MainCommandLineTest.Result r = run("check", "--rules", "paediatric", example("revision-stated", "quiet.json"));
        for (String shipped : List.of("general", "parenteral", "cell-culture", "ophthalmic")) {
            assertTrue(r.err().contains(shipped), () -> shipped + " not listed: " + r.err());
        }
    }

    @Test
    void unknownPlusPackNameExitsTwo() {
        MainCommandLineTest.Result r = run("check", "--rules", "+paediatric", example("revision-stated", "quiet.json"));
        assertEquals(2, r.exitCode(), r::all);
        assertNoStackTrace(r);
    }

    // ---- rules and explain ----

    @Test
    void rulesForCellCultureListsTheCellCultureRules() {
        MainCommandLineTest.Result r = run("rules", "--intended-use", "cell-culture");
        assertEquals(0, r.exitCode(), r::all);
        for (String id : List.of("cell-culture-ph-physiological", "cell-culture-hepes-limit", "cell-culture-light")) {
            assertTrue(r.out().contains(id), () -> id + " missing:\n" + r.out());
        }
    }

    @Test
    void rulesForCellCultureIncludesTheGeneralRules() {
        MainCommandLineTest.Result r = run("rules", "--intended-use", "cell-culture");
        assertTrue(r.out().contains("ph-within-target"), r::out);
        assertTrue(r.out().contains("general 1.0.0"), r::out);
    }

    @Test
    void rulesForCellCultureLeavesOutOtherProductTypes() {
        MainCommandLineTest.Result r = run("rules", "--intended-use", "cell-culture");
        assertFalse(r.out().contains("parenteral-"), r::out);
        assertFalse(r.out().contains("ophthalmic-"), r::out);
    }

    @Test
    void rulesWithAUserPackShowsTheChangedSeverity() throws IOException {
        Path p = write("site-strict.json", STRICT_PKA);
        MainCommandLineTest.Result r = run("rules", "--rules", p.toString());
        assertEquals(0, r.exitCode(), r::all);
        assertTrue(Pattern.compile("(?m)^\\s+error\\s+pka-near-target\\s").matcher(r.out()).find(), r::out);
    }

    @Test
    void aPacksTextCannotForgeALineOfRulesOrExplain() throws IOException {
        String forged = "\\n== forged.json  [LB-FAKE]  PASS\\u001b[2J";
        Path p = write("forging.json", pack("forging", "    { \"id\": \"site-forge\", \"check\": \"revision-stated\", "
                + "\"severity\": \"note\", \"summary\": \"s" + forged + "\", \"explanation\": \"e" + forged + "\", "
                + "\"remedy\": \"r" + forged + "\", \"references\": [\"ref" + forged + "\"] }"));
        for (MainCommandLineTest.Result r : List.of(run("rules", "--rules", p.toString()),
                run("explain", "--rules", p.toString(), "site-forge"))) {
            assertEquals(0, r.exitCode(), r::all);
            assertFalse(Pattern.compile("(?m)^== forged").matcher(r.out()).find(), r::out);
            assertFalse(r.out().contains("\u001b"), r::out);
            assertTrue(r.out().contains("s\\n== forged.json"), r::out);
        }
    }

    @Test
    void rulesMarksADisabledRule() throws IOException {
        Path p = write("no-revisions.json", pack("no-revisions", "    { \"id\": \"revision-stated\", \"enabled\": false }"));
        MainCommandLineTest.Result r = run("rules", "--rules", p.toString());
        assertTrue(Pattern.compile("(?m)revision-stated.*\\(disabled\\)").matcher(r.out()).find(), r::out);
    }

    @Test
    void explainPrintsTheRulesExplanation() {
        MainCommandLineTest.Result r = run("explain", "parenteral-potassium-chloride-dilute");
        assertEquals(0, r.exitCode(), r::all);
        assertTrue(r.out().contains("Potassium above about 40 mmol/L is too concentrated for peripheral infusion."),
                r::out);
    }

    @Test
    void explainPrintsTheRulesReferences() {
        MainCommandLineTest.Result r = run("explain", "ph-within-target");
        assertTrue(r.out().contains("References:"), r::out);
        assertTrue(r.out().contains("USP <791> pH"), r::out);
        assertTrue(r.out().contains("Ph. Eur. 2.2.3 Potentiometric determination of pH"), r::out);
    }

    @Test
    void explainPrintsTheSafetyNote() {
        MainCommandLineTest.Result r = run("explain", "parenteral-potassium-chloride-dilute");
        assertTrue(r.out().contains("Safety: Concentrated potassium chloride is a high-alert medicine"), r::out);
    }

    @Test
    void explainWithAUserPackShowsTheChangedRule() throws IOException {
        Path p = write("site-strict.json", STRICT_PKA);
        MainCommandLineTest.Result r = run("explain", "--rules", p.toString(), "pka-near-target");
        assertTrue(r.out().contains("pka-near-target (error, check kind pka-near-target, pack site-strict)"), r::out);
        assertTrue(r.out().contains("\"maxDistance\":0.3"), r::out);
    }

    @Test
    void explainAnUnknownRuleExitsTwoWithTheNearestIds() {
        MainCommandLineTest.Result r = run("explain", "revision-state");
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains("revision-stated"), r::err);
        assertNoStackTrace(r);
    }

    // ---- packs that conflict only together ----

    /** Two packs that each load on their own, and that both define a new rule 'site-ionic' with different kinds. */
    private List<Path> conflictingSiblings() throws IOException {
        String rule = "    { \"id\": \"site-ionic\", \"check\": \"%s\", \"severity\": \"warning\", "
                + "\"parameters\": { \"max\": %s }, \"summary\": \"s\", \"explanation\": \"e\", "
                + "\"references\": [\"common practice\"] }";
        return List.of(write("site-a.json", pack("site-a", String.format(rule, "ionic-strength-limit", "0.1"))),
                write("site-b.json", pack("site-b", String.format(rule, "buffer-capacity-range", "5"))));
    }

    @Test
    void eachOfTwoConflictingPacksLoadsOnItsOwn() throws IOException {
        for (Path p : conflictingSiblings()) {
            assertEquals(0, run("rules", "--rules", p.toString()).exitCode(), p::toString);
        }
    }

    @Test
    void conflictingPacksAreRefusedNamingTheSecondPack() throws IOException {
        List<Path> packs = conflictingSiblings();
        MainCommandLineTest.Result r = run("check", "--rules", "+" + packs.get(0), "--rules", "+" + packs.get(1),
                example("revision-stated", "quiet.json"));
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains(packs.get(1).toString()), r::all);
    }

    @Test
    void conflictingPacksInRulesAreAUsageError() throws IOException {
        List<Path> packs = conflictingSiblings();
        MainCommandLineTest.Result r = run("rules", "--rules", "+" + packs.get(0), "--rules", "+" + packs.get(1));
        assertEquals(2, r.exitCode(), r::all);
        assertFalse(r.all().contains("internal fault"), r::all);
    }
}
