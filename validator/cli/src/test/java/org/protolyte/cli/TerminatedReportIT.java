package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.DisabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

/**
 * A run writing {@code -o report.json} terminated (SIGTERM) while the report is being written (#14): the temporary
 * file beside the target is removed and the target is what it was before, absent or byte for byte the old file.
 */
@DisabledOnOs(value = OS.WINDOWS, disabledReason = "Process.destroy() sends SIGTERM on Linux and macOS only")
class TerminatedReportIT {

    private static final int DOCUMENTS = 5_000;   // enough that writing the report takes seconds
    private static final String SAMPLE = "laboratory-acetate-buffer-molal.json";
    private static final String SAMPLE_ID = "LB-LAB-0114";
    private static final long GUARD_MILLIS = 120_000;

    @TempDir
    static Path folders;
    private static Path many;
    private static PackagedJar jar;

    @BeforeAll
    static void aFolderThatTakesSecondsToCheck() throws IOException {
        jar = PackagedJar.find();
        String sample = Files.readString(PackagedJar.ROOT.resolve("sample-formulations").resolve(SAMPLE));
        many = Files.createDirectory(folders.resolve("many"));
        for (int i = 0; i < DOCUMENTS; i++) {
            String id = String.format("LB-LAB-T%05d", i);
            Files.writeString(many.resolve(id + ".json"), sample.replace(SAMPLE_ID, id), StandardCharsets.UTF_8);
        }
    }

    private static List<Path> temporaryFiles(Path dir) throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.filter(p -> p.getFileName().toString().startsWith(".report.json.")
                    && p.getFileName().toString().endsWith(".tmp")).toList();
        }
    }

    /** Starts the run, waits for its temporary file, terminates it and gives the exit code. */
    private static int terminateWhileWriting(Path out) throws IOException, InterruptedException {
        Process p = jar.command(out, List.of(), "check", "--format", "json", "-o", "report.json",
                many.toAbsolutePath().toString())
                .redirectOutput(out.resolve("stdout.txt").toFile()).redirectError(out.resolve("stderr.txt").toFile())
                .start();
        long deadline = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(GUARD_MILLIS);
        try {
            while (temporaryFiles(out).isEmpty()) {
                assertTrue(p.isAlive(), () -> "the run ended before its temporary file was seen: exit " + p.exitValue());
                assertTrue(System.nanoTime() < deadline, "no temporary file after " + GUARD_MILLIS + " ms");
                Thread.sleep(10);
            }
            p.destroy();   // SIGTERM: shutdown hooks run
            assertTrue(p.waitFor(30, TimeUnit.SECONDS), "the run did not end after SIGTERM");
            return p.exitValue();
        } finally {
            p.destroyForcibly();
        }
    }

    @Test
    void noTemporaryFileAndNoTargetWhenThereWasNone() throws IOException, InterruptedException {
        Path out = Files.createDirectory(folders.resolve("fresh"));
        int exit = terminateWhileWriting(out);
        assertEquals(143, exit, "not ended by SIGTERM (128 + 15)");
        assertEquals(List.of(), temporaryFiles(out));
        assertFalse(Files.exists(out.resolve("report.json")), "a partial report was left as the target");
    }

    @Test
    void noTemporaryFileAndTheOldReportByteForByte() throws IOException, InterruptedException {
        Path out = Files.createDirectory(folders.resolve("replacing"));
        byte[] old = "{\"an\": \"earlier report\"}\n".getBytes(StandardCharsets.UTF_8);
        Files.write(out.resolve("report.json"), old);
        int exit = terminateWhileWriting(out);
        assertEquals(143, exit, "not ended by SIGTERM (128 + 15)");
        assertEquals(List.of(), temporaryFiles(out));
        assertArrayEquals(old, Files.readAllBytes(out.resolve("report.json")));
    }
}
