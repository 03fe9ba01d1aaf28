package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.protolyte.TestDocs;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

class MainCommandLineTest {

    private static final Pattern STACK_FRAME = Pattern.compile("(?m)^\\s+at [\\w.$]+\\(.*\\)\\s*$");

    record Result(int exitCode, String out, String err) {
        String all() {
            return out + err;
        }
    }

    /** Runs the command in-process with standard output and error captured. */
    static Result run(String... args) {
        InProcess.Result r = InProcess.run(args);
        return new Result(r.exitCode(), r.out(), r.err());
    }

    private static String doc(String name) {
        return TestDocs.resource(name).toString();
    }

    private static JsonNode json(String text) {
        return JsonMapper.builder().build().readTree(text);
    }

    private static void assertNoStackTrace(Result r) {
        assertFalse(STACK_FRAME.matcher(r.all()).find(), () -> "stack trace in output:\n" + r.all());
        assertFalse(r.all().contains("Exception in thread"), r::all);
    }

    @Test
    void helpExitsZeroAndPrintsUsage() {
        Result r = run("--help");
        assertEquals(0, r.exitCode(), r::all);
        assertTrue(r.out().contains("Usage: protolyte"), r.out());
        assertTrue(r.out().contains("check"), r.out());
    }

    @Test
    void checkHelpExitsZeroAndDescribesExitCodes() {
        Result r = run("check", "--help");
        assertEquals(0, r.exitCode(), r::all);
        assertTrue(r.out().contains("Usage: protolyte check"), r.out());
        assertTrue(r.out().contains("--format"), r.out());
    }

    @Test
    void versionPrintsTheToolName() {
        Result r = run("--version");
        assertEquals(0, r.exitCode(), r::all);
        assertTrue(r.out().strip().startsWith("Protolyte "), r.out());
    }

    @Test
    void noCommandIsAUsageError() {
        Result r = run();
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains("a command is needed"), r.err());
    }

    @Test
    void unknownOptionIsAUsageError() {
        Result r = run("check", "--tolerance-of-errors", doc("pass-acetate.json"));
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains("--tolerance-of-errors"), r.err());
        assertTrue(r.err().contains("--help"), r.err());
    }

    @Test
    void unknownFormatIsAUsageError() {
        Result r = run("check", "--format", "xml", doc("pass-acetate.json"));
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains("xml"), r.err());
    }

    @Test
    void checkWithoutFilesIsAUsageError() {
        Result r = run("check");
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains("FILE"), r.err());
    }

    /** '' is the working folder to a Path: an unset shell variable must not check every file below it. */
    @Test
    void anEmptyFileArgumentIsAUsageError() {
        Result r = run("check", "");
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains("empty file argument"), r::all);
    }

    @Test
    void rulesForAnUnknownIntendedUseIsAUsageErrorListingTheKnownOnes() {
        Result r = run("rules", "--intended-use", "martian");
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains("'martian'") && r.err().contains("parenteral") && r.err().contains("laboratory"),
                r::all);
    }

    @Test
    void validDocumentExitsZero() {
        Result r = run("check", doc("pass-acetate.json"));
        assertEquals(0, r.exitCode(), r::all);
        assertTrue(r.out().contains("[TST-001]  PASS"), r.out());
        assertEquals("", r.err());
    }

    @Test
    void documentMissingItsPhTargetExitsOne() {
        Result r = run("check", doc("fail-ph-target.json"));
        assertEquals(1, r.exitCode(), r::all);
        assertTrue(r.out().contains("[TST-002]  FAIL"), r.out());
        assertTrue(r.out().contains("ph-within-target"), r.out());
    }

    @Test
    void invalidDocumentExitsTwo() {
        Result r = run("check", doc("invalid-unit.json"));
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.out().contains("[TST-003]  INVALID"), r.out());
        assertTrue(r.out().contains("unknown unit 'grams'"), r.out());
        assertTrue(r.out().contains("/components/0/amount"), r.out());
    }

    @Test
    void malformedJsonExitsTwoWithItsLine() {
        Result r = run("check", doc("malformed.json"));
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.out().contains("not valid JSON"), r.out());
        assertTrue(r.out().contains("(line 4, column"), r.out());
    }

    @Test
    void severalFilesExitWithTheHighestCodeAndAllAreReported() {
        Result r = run("check", doc("pass-acetate.json"), doc("invalid-unit.json"), doc("fail-ph-target.json"));
        assertEquals(2, r.exitCode(), r::all);
        for (String id : List.of("[TST-001]  PASS", "[TST-003]  INVALID", "[TST-002]  FAIL")) {
            assertTrue(r.out().contains(id), () -> id + " missing from:\n" + r.out());
        }
        assertTrue(r.out().contains("3 document(s): 1 pass, 1 fail, 1 invalid"), r.out());
    }

    @Test
    void passAndFailTogetherExitOne() {
        Result r = run("check", doc("fail-ph-target.json"), doc("pass-acetate.json"));
        assertEquals(1, r.exitCode(), r::all);
    }

    @Test
    void jsonFormatParsesWithToolReportsAndSummary() {
        Result r = run("check", "--format", "json", doc("pass-acetate.json"), doc("fail-ph-target.json"),
                doc("malformed.json"));
        assertEquals(2, r.exitCode(), r::all);
        JsonNode root = json(r.out());
        assertEquals("Protolyte", root.get("tool").get("name").asString());
        JsonNode reports = root.get("reports");
        assertEquals(3, reports.size());
        assertEquals("pass", reports.get(0).get("status").asString());
        assertEquals("TST-001", reports.get(0).get("id").asString());
        assertEquals("fail", reports.get(1).get("status").asString());
        assertEquals("invalid", reports.get(2).get("status").asString());
        assertEquals(doc("malformed.json"), reports.get(2).get("source").asString());
        JsonNode summary = root.get("summary");
        assertEquals(3, summary.get("documents").asInt());
        assertEquals(1, summary.get("pass").asInt());
        assertEquals(1, summary.get("fail").asInt());
        assertEquals(1, summary.get("invalid").asInt());
        assertEquals(r.exitCode(), summary.get("exitCode").asInt());
    }

    @Test
    void jsonFormatPlacesInvalidFindingsByPointerAndLine() {
        Result r = run("check", "--format", "json", doc("invalid-unit.json"));
        JsonNode finding = json(r.out()).get("reports").get(0).get("findings").get(0);
        assertEquals("invalid-document", finding.get("rule").asString());
        assertEquals("/components/0/amount", finding.get("pointer").asString());
        assertEquals(7, finding.get("line").asInt());
    }

    @Test
    void outputOptionWritesTheReportAndLeavesNoTemporaryFile(@TempDir Path dir) throws IOException {
        Path report = dir.resolve("report.json");
        Result r = run("check", "--format", "json", "--output", report.toString(), doc("pass-acetate.json"));
        assertEquals(0, r.exitCode(), r::all);
        assertEquals("", r.out(), "the report goes to the file, not to standard output");
        assertEquals("TST-001", json(Files.readString(report)).get("reports").get(0).get("id").asString());
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(report), files.toList());
        }
    }

    @Test
    void outputOptionReplacesAnExistingFile(@TempDir Path dir) throws IOException {
        Path report = dir.resolve("report.txt");
        Files.writeString(report, "stale report from an earlier run");
        Result r = run("check", "-o", report.toString(), doc("fail-ph-target.json"));
        assertEquals(1, r.exitCode(), r::all);
        String text = Files.readString(report);
        assertFalse(text.contains("stale report"), text);
        assertTrue(text.contains("[TST-002]  FAIL"), text);
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(report), files.toList());
        }
    }

    @Test
    void missingFileIsReportedInvalidAlongsideTheOthers(@TempDir Path dir) {
        String missing = dir.resolve("no-such-recipe.json").toString();
        Result r = run("check", missing, doc("pass-acetate.json"));
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.out().contains("== " + missing + "  INVALID"), r.out());
        assertTrue(r.out().contains("file not found"), r.out());
        assertTrue(r.out().contains("[TST-001]  PASS"), r.out());
        assertNoStackTrace(r);
    }

    @Test
    void trailingContentAfterTheDocumentIsInvalid(@TempDir Path dir) throws IOException {
        Path p = dir.resolve("trailing.json");
        Files.writeString(p, TestDocs.formulation(TestDocs.ACETATE, "") + "\n{}\n");
        Result r = run("check", p.toString());
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.out().contains("INVALID"), r.out());
    }

    @Test
    void outputIntoAMissingFolderIsAUsageError(@TempDir Path dir) {
        Path report = dir.resolve("no-such-folder").resolve("report.txt");
        Result r = run("check", "-o", report.toString(), doc("pass-acetate.json"));
        assertEquals(2, r.exitCode(), r::all);
        assertFalse(r.err().contains("internal fault"), r.err());
        assertTrue(r.err().contains(report.getParent().toString()), r.err());
    }

    @Test
    void folderWithoutDocumentsIsAUsageError(@TempDir Path dir) {
        Result r = run("check", dir.toString());
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains("no *.json files"), r.err());
    }

    @Test
    void userSubstanceLibraryOptionExtendsTheShippedOne() {
        Result r = run("check", "--substances", doc("user-substances.json"), doc("uses-user-substance.json"));
        assertEquals(0, r.exitCode(), r::all);
        assertTrue(r.out().contains("[TST-005]  PASS"), r.out());
    }

    @Test
    void recipeNeedingAUserSubstanceIsInvalidWithoutIt() {
        Result r = run("check", doc("uses-user-substance.json"));
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.out().contains("unknown substance 'TST-TS'"), r.out());
    }

    @Test
    void clashingUserSubstanceLibraryExitsTwoNamingThePlace() {
        Result r = run("check", "--substances", doc("bad-user-substances.json"), doc("pass-acetate.json"));
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains("/substances/0/name"), r.err());
        assertTrue(r.err().contains("already defined"), r.err());
    }

    @Test
    void missingUserSubstanceLibraryExitsTwo(@TempDir Path dir) {
        Result r = run("check", "--substances", dir.resolve("none.json").toString(), doc("pass-acetate.json"));
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains("file not found"), r.err());
    }

    static Stream<Arguments> badInputs() throws IOException {
        Path dir = Files.createTempDirectory("protolyte-cli-test");
        dir.toFile().deleteOnExit();
        List<Arguments> out = new ArrayList<>();
        String[][] files = {
                {"empty.json", ""},
                {"binary.json", "\u0000\u0001\u0002"},
                {"array.json", "[1, 2, 3]"},
                {"wrong-kind.json", "{\"document\": \"substance-library\", \"formatVersion\": 1}"},
                {"deep.json", "[".repeat(200) + "]".repeat(200)},
                {"huge-number.json", TestDocs.formulation(
                        "{\"substance\": \"sodium chloride\", \"amount\": {\"value\": 1e999, \"unit\": \"g\"}}", "")},
                {"huge-integer.json", TestDocs.formulation(
                        "{\"substance\": \"sodium chloride\", \"amount\": {\"value\": 1" + "0".repeat(400)
                                + ", \"unit\": \"g\"}}", "")},
                {"trailing.json", TestDocs.formulation(TestDocs.ACETATE, "") + " {}"},
                {"too-much-salt.json", TestDocs.formulation(
                        "{\"substance\": \"sodium chloride\", \"amount\": \"5 kg\"}", "")},
                {"unknown-substance.json", TestDocs.formulation(
                        "{\"substance\": \"TST-unobtainium\", \"amount\": \"1 g\"}", "")},
        };
        for (String[] f : files) {
            Path p = dir.resolve(f[0]);
            Files.write(p, f[1].getBytes(StandardCharsets.UTF_8));
            p.toFile().deleteOnExit();
            out.add(Arguments.of(f[0], new String[] {"check", p.toString()}));
            out.add(Arguments.of(f[0] + " (json)", new String[] {"check", "--format", "json", p.toString()}));
        }
        out.add(Arguments.of("bad option", new String[] {"check", "--frmat", "json", "x.json"}));
        out.add(Arguments.of("output into a missing folder",
                new String[] {"check", "-o", dir.resolve("no/such/dir/r.txt").toString(), doc("pass-acetate.json")}));
        out.add(Arguments.of("malformed substance library",
                new String[] {"check", "--substances", doc("malformed.json"), doc("pass-acetate.json")}));
        return out.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("badInputs")
    void badInputNeverPrintsAStackTrace(String label, String[] args) {
        Result r = run(args);
        assertTrue(r.exitCode() >= 1 && r.exitCode() <= 4, () -> label + ": exit " + r.exitCode());
        assertNoStackTrace(r);
    }
}
