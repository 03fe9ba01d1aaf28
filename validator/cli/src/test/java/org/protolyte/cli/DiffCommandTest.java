package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code diff}: what it refuses, and that a new revision that can never pass does not exit 0. */
class DiffCommandTest {

    @TempDir
    Path dir;

    private Path write(String name, String id, String temperature) throws IOException {
        Path p = dir.resolve(name);
        Files.writeString(p, "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"" + id + "\","
                + " \"revision\": \"A\", \"intendedUse\": \"laboratory\", \"basis\": {\"finalVolume\": \"1 L\"},"
                + " \"components\": [{\"substance\": \"Tris\", \"amount\": \"50 mmol/L\"},"
                + " {\"substance\": \"Tris hydrochloride\", \"amount\": \"50 mmol/L\"}],"
                + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"" + temperature + "\"}]}");
        return p;
    }

    @Test
    void documentsWithDifferentIdsAreRefused() throws IOException {
        var r = MainCommandLineTest.run("diff", write("a.json", "TST-A", "25 Cel").toString(),
                write("b.json", "TST-B", "25 Cel").toString());
        assertEquals(2, r.exitCode(), r::toString);
        assertTrue(r.err().contains("TST-A") && r.err().contains("--allow-different-id"), r::toString);
    }

    @Test
    void differentIdsAreComparedWhenAllowed() throws IOException {
        var r = MainCommandLineTest.run("diff", "--allow-different-id", write("a.json", "TST-A", "25 Cel").toString(),
                write("b.json", "TST-B", "25 Cel").toString());
        assertEquals(0, r.exitCode(), r::toString);
    }

    @Test
    void aBatchRecordIsNotANewRevision() throws IOException {
        Path records = Path.of(System.getProperty("protolyte.projectRoot", "../.."), "sample-formulations", "batch-records");
        var r = MainCommandLineTest.run("diff", records.resolve("master-phosphate-buffered-saline.json").toString(),
                records.resolve("br-clean.json").toString());
        assertEquals(2, r.exitCode(), r::toString);
        assertTrue(r.err().contains("batch record") && r.err().contains("BR-0310-041"), r::toString);
    }

    /** Tris's constants hold to about 50 °C (library range): at 95 °C the pH cannot be stood behind. */
    @Test
    void anIndeterminateNewRevisionExitsAsCheckWould() throws IOException {
        var r = MainCommandLineTest.run("diff", write("a.json", "TST-A", "25 Cel").toString(),
                write("b.json", "TST-A", "95 Cel").toString());
        assertEquals(3, r.exitCode(), r::toString);
    }
}
