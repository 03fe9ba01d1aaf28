package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.protolyte.TestDocs;

/** {@code -o} never destroys: not a device, a pipe, a folder or an input; the mode of what it replaces is kept. */
class OutputSafetyTest {

    private static final String DOC = TestDocs.resource("pass-acetate.json").toString();

    private static MainCommandLineTest.Result run(String... args) {
        return MainCommandLineTest.run(args);
    }

    private static void assertUsageError(MainCommandLineTest.Result r, String phrase) {
        assertEquals(2, r.exitCode(), r::all);
        assertTrue(r.err().contains(phrase), r::err);
        assertFalse(r.all().contains("Exception") || r.all().contains("internal fault"), r::all);
    }

    @ParameterizedTest
    @ValueSource(strings = {"text", "json", "sarif"})
    void aDeviceIsRefusedAndLeftAsItIs(String format) {
        Assumptions.assumeTrue(Files.exists(Path.of("/dev/null")));
        MainCommandLineTest.Result r = run("check", "--format", format, "-o", "/dev/null", DOC);
        assertUsageError(r, "is not a regular file");
        assertFalse(Files.isRegularFile(Path.of("/dev/null")), "/dev/null must stay a device");
    }

    @ParameterizedTest
    @ValueSource(strings = {"text", "json", "sarif"})
    void aFolderIsRefused(String format, @TempDir Path dir) {
        assertUsageError(run("check", "--format", format, "-o", dir.toString(), DOC), "a folder");
        assertUsageError(run("check", "--format", format, "-o", "/", DOC), "a folder");
    }

    @Test
    void aPipeIsRefusedAndStaysAPipe(@TempDir Path dir) throws IOException, InterruptedException {
        Path fifo = dir.resolve("fifo");
        Process p;
        try {
            p = new ProcessBuilder("mkfifo", fifo.toString()).start();
        } catch (IOException e) {
            Assumptions.abort("no mkfifo: " + e.getMessage());
            return;
        }
        Assumptions.assumeTrue(p.waitFor(10, TimeUnit.SECONDS) && p.exitValue() == 0, "mkfifo failed");
        assertUsageError(run("check", "-o", fifo.toString(), DOC), "is not a regular file");
        assertTrue(Files.exists(fifo) && !Files.isRegularFile(fifo));
    }

    @Test
    void anInputNamedAsTheTargetIsRefusedAndUnchanged(@TempDir Path dir) throws IOException {
        Path recipe = Files.copy(TestDocs.resource("pass-acetate.json"), dir.resolve("recipe.json"));
        byte[] before = Files.readAllBytes(recipe);
        assertUsageError(run("check", "-o", recipe.toString(), recipe.toString()), "one of the inputs");
        assertArrayEquals(before, Files.readAllBytes(recipe));
    }

    @Test
    void anInputFoundInAFolderIsRefusedThroughAnotherPath(@TempDir Path dir) throws IOException {
        Path folder = Files.createDirectory(dir.resolve("docs"));
        Path recipe = Files.copy(TestDocs.resource("pass-acetate.json"), folder.resolve("recipe.json"));
        byte[] before = Files.readAllBytes(recipe);
        Path link = Files.createSymbolicLink(dir.resolve("link.json"), recipe);
        assertUsageError(run("check", "-o", link.toString(), folder.toString()), "one of the inputs");
        assertArrayEquals(before, Files.readAllBytes(recipe));
    }

    @Test
    void aFileReadThroughAnOptionIsNotReplaced(@TempDir Path dir) throws IOException {
        Path library = Files.copy(TestDocs.resource("user-substances.json"), dir.resolve("lib.json"));
        assertUsageError(run("check", "--substances", library.toString(), "-o", library.toString(), DOC),
                "one of the inputs");
    }

    @Test
    void aReplacedFileKeepsItsMode(@TempDir Path dir) throws IOException {
        Path report = dir.resolve("report.txt");
        Files.writeString(report, "old");
        Set<PosixFilePermission> mode = PosixFilePermissions.fromString("rw-r--r--");
        Files.setPosixFilePermissions(report, mode);
        assertEquals(0, run("check", "-o", report.toString(), DOC).exitCode());
        assertEquals(mode, Files.getPosixFilePermissions(report));
        assertTrue(Files.readString(report).contains("PASS"));
    }

    @Test
    void aNewFileGetsTheModeOfAnyNewFileOfThisProcess(@TempDir Path dir) throws IOException {
        Path plain = dir.resolve("plain");
        // the reference: a file made with no permissions asked for, so the process umask alone decides its mode
        try (OutputStream o = Files.newOutputStream(plain)) {
            o.write(1);
        }
        Path report = dir.resolve("report.json");
        assertEquals(0, run("check", "--format", "json", "-o", report.toString(), DOC).exitCode());
        assertEquals(Files.getPosixFilePermissions(plain), Files.getPosixFilePermissions(report));
    }

    @Test
    void anEmptyNameIsAUsageError() {
        assertUsageError(run("check", "-o", "", DOC), "-o needs a file name");
    }

    @Test
    void aTargetBelowARegularFileIsAUsageError(@TempDir Path dir) throws IOException {
        Path file = Files.writeString(dir.resolve("plain.txt"), "x");
        assertUsageError(run("check", "-o", file.resolve("r.txt").toString(), DOC), "is not a folder");
    }

    @Test
    void aFolderThatCannotBeWrittenIsAUsageError(@TempDir Path dir) throws IOException {
        Assumptions.assumeFalse("root".equals(System.getProperty("user.name")), "root writes any folder");
        Path closed = Files.createDirectory(dir.resolve("closed"));
        Files.setPosixFilePermissions(closed, PosixFilePermissions.fromString("r-x------"));
        try {
            assertUsageError(run("check", "-o", closed.resolve("r.txt").toString(), DOC), "cannot be written");
        } finally {
            Files.setPosixFilePermissions(closed, PosixFilePermissions.fromString("rwx------"));
        }
    }

    @Test
    void robustnessOutputIsCheckedTheSameWay() {
        assertUsageError(run("robustness", "--samples", "10", "-o", "/dev/null", DOC), "is not a regular file");
    }

    @Test
    void aFailedWriteLeavesTheOldFileAndNoTemporaryFile(@TempDir Path dir) throws IOException,
            Setup.UsageException {
        Path report = Files.writeString(dir.resolve("report.txt"), "old");
        ReportFile target = ReportFile.of(report, List.of());
        assertThrows(IOException.class, () -> target.write(out -> {
            out.write("half a report");
            throw new IOException("disk full");
        }));
        assertEquals("old", Files.readString(report));
        try (Stream<Path> left = Files.list(dir)) {
            assertEquals(List.of(report), left.toList());
        }
    }
}
