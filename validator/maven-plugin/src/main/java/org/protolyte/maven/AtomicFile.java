package org.protolyte.maven;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.UUID;

/**
 * A file written whole or not at all: the content goes to a temporary file in the target's folder, which is then
 * renamed over the target. A reader sees the old file or the new one, never a part; on any failure the old file
 * stays and the temporary file is removed.
 */
final class AtomicFile {

    /** Writes the content; may throw, and then nothing is replaced. */
    interface Content {
        void writeTo(Writer out) throws IOException;
    }

    private AtomicFile() {
    }

    /** Writes {@code target} as UTF-8, making its folder if need be. */
    static void write(Path target, Content content) throws IOException {
        Path file = target.toAbsolutePath();
        if (Files.isDirectory(file) || Files.exists(file) && !Files.isRegularFile(file)) {
            throw new IOException(target + " exists and is not a regular file; it is left as it is");
        }
        Path folder = Files.createDirectories(file.getParent());
        Path tmp = folder.resolve("." + file.getFileName() + "." + UUID.randomUUID() + ".tmp");
        try {
            try (Writer out = new BufferedWriter(new OutputStreamWriter(Files.newOutputStream(tmp,
                    StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE), StandardCharsets.UTF_8))) {
                content.writeTo(out);
            }
            // no fallback to a plain move: a report that could be seen half-written is not written
            Files.move(tmp, file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
