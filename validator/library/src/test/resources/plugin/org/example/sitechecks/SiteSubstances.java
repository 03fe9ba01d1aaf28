package org.example.sitechecks;

import java.io.IOException;
import java.io.InputStream;

import org.protolyte.spi.SubstanceLibrarySource;

/** The site's own substance names, shipped in the same jar as its checks. */
public final class SiteSubstances implements SubstanceLibrarySource {

    @Override
    public String name() {
        return "site-substances.json";
    }

    @Override
    public InputStream open() throws IOException {
        InputStream in = SiteSubstances.class.getResourceAsStream("site-substances.json");
        if (in == null) {
            throw new IOException("site-substances.json is missing from the jar");
        }
        return in;
    }
}
