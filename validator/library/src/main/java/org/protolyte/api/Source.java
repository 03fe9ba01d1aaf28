package org.protolyte.api;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Objects;
import java.util.Optional;

/**
 * A document to check: its name (as the report shows it), its bytes, and the folder a batch record's master is read
 * from and must stay inside. Without a folder, a batch record must embed its master. The bytes are copied in and out,
 * so a source never changes.
 */
public final class Source {

    private final String name;
    private final byte[] content;
    private final Optional<Path> folder;

    private Source(String name, byte[] content, Optional<Path> folder) {
        this.name = Objects.requireNonNull(name, "name");
        this.content = content.clone();
        this.folder = folder.map(p -> p.toAbsolutePath().normalize());
    }

    /** Bytes with no folder. */
    public static Source of(String name, byte[] content) {
        return new Source(name, content, Optional.empty());
    }

    /** Bytes whose batch-record master, if any, is read from {@code folder}. */
    public static Source of(String name, byte[] content, Path folder) {
        return new Source(name, content, Optional.of(folder));
    }

    /**
     * A file, read now (at most {@link org.protolyte.Protolyte#MAX_DOCUMENT_BYTES}); a batch record's master is read
     * from the file's folder.
     *
     * @throws UncheckedIOException where it cannot be read, or is too large
     */
    public static Source of(Path file) {
        try (var in = Files.newInputStream(file)) {
            Path parent = file.toAbsolutePath().getParent();
            return new Source(file.toString(), org.protolyte.Protolyte.readBounded(in),
                    Optional.of(parent == null ? file.toAbsolutePath() : parent));
        } catch (IOException e) {
            throw new UncheckedIOException(file + ": " + e.getMessage(), e);
        }
    }

    public String name() {
        return name;
    }

    /** A copy of the bytes. */
    public byte[] content() {
        return content.clone();
    }

    public Optional<Path> folder() {
        return folder;
    }

    /** The bytes themselves, for the validator in this package only. */
    byte[] bytes() {
        return content;
    }
}
