package org.protolyte.spi;

import java.io.IOException;
import java.io.InputStream;

/**
 * A substance library that a plugin jar carries, found with {@link java.util.ServiceLoader} as check kinds are. Its
 * content is a substance library document (the schema {@code substance-library.schema.json}); it extends the shipped
 * library as a {@code --substances FILE} does, and reports name it with the SHA-256 of its bytes.
 */
public interface SubstanceLibrarySource {

    /** The name reports give the library: a file name inside the jar, say. */
    String name();

    /** The library's bytes; the caller closes the stream. */
    InputStream open() throws IOException;
}
