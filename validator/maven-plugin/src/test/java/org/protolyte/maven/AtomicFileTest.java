package org.protolyte.maven;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A report file is the old one or the whole new one, never a part, and leaves nothing beside it. */
class AtomicFileTest {

    @TempDir
    Path dir;

    private List<Path> filesIn(Path folder) throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.sorted().toList();
        }
    }

    @Test
    void writesTheWholeContentAndMakesTheFolder() throws Exception {
        Path target = dir.resolve("protolyte/report.txt");
        AtomicFile.write(target, out -> out.write("1 document(s): 1 pass — 25 °C\n"));
        assertEquals("1 document(s): 1 pass — 25 °C\n", Files.readString(target, StandardCharsets.UTF_8));
        assertEquals(List.of(target), filesIn(target.getParent()));
    }

    @Test
    void replacesAnOldReport() throws Exception {
        Path target = Files.writeString(dir.resolve("report.json"), "{\"old\": true, \"longer\": \"than the new\"}");
        AtomicFile.write(target, out -> out.write("{}"));
        assertEquals("{}", Files.readString(target));
        assertEquals(List.of(target), filesIn(dir));
    }

    @Test
    void aFailureWhileWritingLeavesTheOldReportAndNoTemporaryFile() throws Exception {
        Path target = Files.writeString(dir.resolve("report.json"), "old");
        IOException e = assertThrows(IOException.class, () -> AtomicFile.write(target, out -> {
            out.write("half a rep");
            out.flush();
            throw new IOException("disk full");
        }));
        assertEquals("disk full", e.getMessage());
        assertEquals("old", Files.readString(target));
        assertEquals(List.of(target), filesIn(dir));
    }

    @Test
    void aFolderInThePlaceOfTheReportIsLeftAsItIs() throws Exception {
        Path folder = Files.createDirectories(dir.resolve("report.json"));
        Files.writeString(folder.resolve("keep.txt"), "kept");
        IOException e = assertThrows(IOException.class, () -> AtomicFile.write(folder, out -> out.write("{}")));
        assertTrue(e.getMessage().contains("is not a regular file"), e::getMessage);
        assertEquals("kept", Files.readString(folder.resolve("keep.txt")));
        assertEquals(List.of(folder), filesIn(dir));
    }
}
