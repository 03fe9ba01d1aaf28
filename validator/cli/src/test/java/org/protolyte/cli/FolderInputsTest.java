package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.RandomAccessFile;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.protolyte.TestDocs;

/** What a folder, standard input and the companion options are read as: nothing is passed over in silence. */
class FolderInputsTest {

    private static final Path SAMPLES = Path.of(System.getProperty("protolyte.projectRoot", "../..")).resolve(
            "sample-formulations");
    /** Misses its pH target: exit 1 when it is checked. */
    private static final Path FAILING = SAMPLES.resolve("parenteral-citrate-buffer-off-target.json");

    private static MainCommandLineTest.Result run(String... args) {
        return MainCommandLineTest.run(args);
    }

    private static Path folderWith(Path dir, String name, String content) throws IOException {
        Path folder = Files.createDirectories(dir.resolve("docs"));
        Files.copy(TestDocs.resource("pass-acetate.json"), folder.resolve("good.json"));
        Path f = folder.resolve(name);
        Files.createDirectories(f.getParent());
        Files.writeString(f, content);
        return folder;
    }

    private static String failing() throws IOException {
        return Files.readString(FAILING, StandardCharsets.UTF_8);
    }

    @Test
    void aTypoInTheDocumentFieldIsInvalidWithASuggestionNotSkipped(@TempDir Path dir) throws IOException {
        Path folder = folderWith(dir, "copy.json", failing().replace("\"formulation\"", "\"formulaton\""));
        MainCommandLineTest.Result r = run("check", folder.toString());
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.out().contains("copy.json") && r.out().contains("INVALID"), r::out);
        assertTrue(r.out().contains("\"formulaton\"") && r.out().contains("did you mean \"formulation\""), r::out);
        assertFalse(r.out().contains("skipped"), r::out);
    }

    @Test
    void aFileWithoutADocumentFieldIsInvalidInAFolder(@TempDir Path dir) throws IOException {
        Path folder = folderWith(dir, "copy.json", failing().replaceFirst("\"document\": \"formulation\",", ""));
        MainCommandLineTest.Result r = run("check", folder.toString());
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.out().contains("no \"document\" field"), r::out);
    }

    @Test
    void aCompanionIsSkippedAndListedWithWhatItIs(@TempDir Path dir) throws IOException {
        Path folder = folderWith(dir, "site.json",
                Files.readString(SAMPLES.resolve("site-library/site-substances.json")));
        MainCommandLineTest.Result r = run("check", folder.toString());
        assertEquals(0, r.exitCode(), r::all);
        assertTrue(r.out().contains("skipped " + folder.resolve("site.json") + ": a substance library"), r::out);
    }

    @Test
    void aCompanionNamedOnItsOwnIsInvalidAndNamesItsOption() {
        MainCommandLineTest.Result r = run("check", SAMPLES.resolve("site-library/site-substances.json").toString());
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.out().contains("--substances"), r::out);
    }

    @Test
    void theIgnoreFileExcludesByGlobAndTheFooterNamesItsLine(@TempDir Path dir) throws IOException {
        Path folder = folderWith(dir, "drafts/copy.json", failing());
        Files.writeString(folder.resolve("old-copy.json"), failing());
        Files.writeString(folder.resolve(".protolyte-ignore"), "# drafts are not released\ndrafts/\n\nold-*.json\n");
        MainCommandLineTest.Result r = run("check", folder.toString());
        assertEquals(0, r.exitCode(), r::all);
        String unwrapped = r.out().replaceAll("\\R +", " ");      // the text report wraps at 100 columns
        assertTrue(unwrapped.contains("skipped " + folder.resolve("drafts/copy.json") + ": excluded by "
                + folder.resolve(".protolyte-ignore") + " line 2 ('drafts/')"), r::out);
        assertTrue(unwrapped.contains("line 4 ('old-*.json')"), r::out);
        assertTrue(r.out().contains("1 document(s)"), r::out);
    }

    @Test
    void excludeOptionLeavesOutMatchingFilesOnly(@TempDir Path dir) throws IOException {
        Path folder = folderWith(dir, "drafts/copy.json", failing());
        MainCommandLineTest.Result r = run("check", "--exclude", "drafts/**", folder.toString());
        assertEquals(0, r.exitCode(), r::all);
        assertTrue(r.out().contains("excluded by --exclude ('drafts/**')"), r::out);
        MainCommandLineTest.Result without = run("check", "--exclude", "other/**", folder.toString());
        assertEquals(1, without.exitCode(), without::all);
    }

    @Test
    void aNegatedIgnoreLineIsAUsageErrorNotIgnored(@TempDir Path dir) throws IOException {
        Path folder = folderWith(dir, "copy.json", failing());
        Files.writeString(folder.resolve(".protolyte-ignore"), "!copy.json\n");
        MainCommandLineTest.Result r = run("check", folder.toString());
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains("line 1"), r::err);
    }

    /** As root a permission cannot deny a read, so the walk's failure is made with a link that loops. */
    @Test
    void aLinkLoopIsAnInvalidReportAndTheOtherFilesAreStillChecked(@TempDir Path dir) throws IOException {
        Path folder = folderWith(dir, "sub/copy.json", failing());
        Files.createSymbolicLink(folder.resolve("sub/loop"), folder);
        MainCommandLineTest.Result r = run("check", folder.toString());
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.out().contains("== " + folder.resolve("sub/loop") + "  INVALID"), r::out);
        assertTrue(r.out().contains("loop"), r::out);
        assertTrue(r.out().contains("good.json") && r.out().contains("copy.json  [LB-DP-0225]  FAIL"), r::out);
    }

    @Test
    void aDanglingLinkNamedJsonIsInvalidNotPassedOver(@TempDir Path dir) throws IOException {
        Path folder = folderWith(dir, "copy.json", failing());
        Files.createSymbolicLink(folder.resolve("gone.json"), folder.resolve("no-such.json"));
        MainCommandLineTest.Result r = run("check", folder.toString());
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.out().contains("gone.json  INVALID"), r::out);
        assertTrue(r.out().contains("does not exist"), r::out);
    }

    @Test
    void anUnreadableSubfolderIsInvalidAndTheOthersAreChecked(@TempDir Path dir) throws IOException {
        Assumptions.assumeFalse("root".equals(System.getProperty("user.name")), "root reads any folder");
        Path folder = folderWith(dir, "closed/copy.json", failing());
        Files.setPosixFilePermissions(folder.resolve("closed"), PosixFilePermissions.fromString("---------"));
        try {
            MainCommandLineTest.Result r = run("check", folder.toString());
            assertEquals(2, r.exitCode(), r::all);
            assertTrue(r.out().contains("closed  INVALID") && r.out().contains("permission denied"), r::out);
            assertTrue(r.out().contains("good.json"), r::out);
        } finally {
            Files.setPosixFilePermissions(folder.resolve("closed"), PosixFilePermissions.fromString("rwx------"));
        }
    }

    @Test
    void aFileLargerThanTheLimitIsRefusedUnreadAndTheGoodOneIsKept(@TempDir Path dir) throws IOException {
        Path folder = folderWith(dir, "copy.json", failing());
        try (RandomAccessFile big = new RandomAccessFile(folder.resolve("huge.json").toFile(), "rw")) {
            big.setLength(17L * 1024 * 1024);   // sparse: no 17 MiB written to the disk
        }
        MainCommandLineTest.Result r = run("check", folder.toString());
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.out().contains("huge.json  INVALID") && r.out().contains("larger than 16 MiB"), r::out);
        assertTrue(r.out().contains("good.json") && r.out().contains("copy.json  [LB-DP-0225]  FAIL"), r::out);
    }

    private static MainCommandLineTest.Result withStandardInput(byte[] in, String... args) {
        InputStream old = System.in;
        try {
            System.setIn(new ByteArrayInputStream(in));
            return run(args);
        } finally {
            System.setIn(old);
        }
    }

    @Test
    void aDashReadsTheDocumentFromStandardInput() throws IOException {
        MainCommandLineTest.Result r = withStandardInput(Files.readAllBytes(FAILING), "check", "-");
        assertEquals(1, r.exitCode(), r::all);
        assertTrue(r.out().contains("== <stdin>  [LB-DP-0225]  FAIL"), r::out);
    }

    @Test
    void aBatchRecordFromStandardInputMustEmbedItsMaster() throws IOException {
        byte[] record = Files.readAllBytes(SAMPLES.resolve("batch-records/br-clean.json"));
        MainCommandLineTest.Result r = withStandardInput(record, "check", "-");
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.out().contains("embed the master"), r::out);
    }

    @Test
    void aDashNamedTwiceIsAUsageError() {
        MainCommandLineTest.Result r = withStandardInput(new byte[0], "check", "-", "-");
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains("more than once"), r::err);
    }

    @Test
    void companionOptionsAndRobustnessGivenAFolderSaySo(@TempDir Path dir) {
        String doc = TestDocs.resource("pass-acetate.json").toString();
        for (String[] args : new String[][] {{"check", "--waivers", dir.toString(), doc},
                {"check", "--rules", dir.toString(), doc}, {"check", "--substances", dir.toString(), doc},
                {"robustness", dir.toString()}}) {
            MainCommandLineTest.Result r = run(args);
            assertEquals(2, r.exitCode(), r::all);
            assertTrue(r.err().contains(dir + ": is a folder, not a file"), r::err);
        }
    }

    @Test
    void asOfSetsTheRunDateForWaiverApproval(@TempDir Path dir) throws IOException {
        Path waivers = dir.resolve("waivers.json");
        Files.writeString(waivers, "{\"document\": \"waivers\", \"formatVersion\": 1, \"waivers\": [{\"rule\": "
                + "\"ph-within-target\", \"documentId\": \"LB-DP-0225\", \"revision\": \"0.3\", \"reason\": \"Accepted "
                + "for a stability study only.\", \"approver\": \"QA (test)\", \"approved\": \"2026-11-01\", "
                + "\"expires\": \"2027-06-01\"}]}");
        MainCommandLineTest.Result before = run("check", "--as-of", "2026-10-01", "--waivers", waivers.toString(),
                FAILING.toString());
        assertTrue(before.out().contains("waiver-future-approval"), before::out);
        MainCommandLineTest.Result after = run("check", "--as-of", "2026-11-15", "--waivers", waivers.toString(),
                FAILING.toString());
        assertFalse(after.out().contains("waiver-future-approval"), after::out);
        MainCommandLineTest.Result bad = run("check", "--as-of", "01/10/2026", FAILING.toString());
        assertEquals(2, bad.exitCode(), bad::all);
    }

    /** A re-run as of another date is a different judgement of the waivers: the report must say which date. */
    @Test
    void asOfIsPartOfTheProvenanceInTextAndJson() {
        MainCommandLineTest.Result text = run("check", "--as-of", "2026-10-01", FAILING.toString());
        assertTrue(text.out().contains("as of 2026-10-01"), text::out);
        MainCommandLineTest.Result json = run("check", "--format", "json", "--as-of", "2026-10-01", FAILING.toString());
        assertEquals("2026-10-01", tools.jackson.databind.json.JsonMapper.builder().build().readTree(json.out())
                .path("tool").path("asOf").asString(""), json::out);
        MainCommandLineTest.Result today = run("check", "--format", "json", FAILING.toString());
        assertTrue(tools.jackson.databind.json.JsonMapper.builder().build().readTree(today.out()).path("tool")
                .path("asOf").isMissingNode(), today::out);
    }
}
