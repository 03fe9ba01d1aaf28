package org.protolyte.api;

import java.util.List;
import java.util.Optional;

/**
 * A place a site's check kinds or substance libraries were loaded from, as every report names it.
 *
 * @param location           the jar's path (a plugin folder's jar, or one on the class path or module path), or the
 *                           folder of classes
 * @param sha256             the SHA-256 of the jar's bytes as loaded; empty for a folder of classes
 * @param checkKinds         the ids of the check kinds it gave
 * @param substanceLibraries the names of the substance libraries it gave
 */
public record Plugin(String location, Optional<String> sha256, List<String> checkKinds,
                     List<String> substanceLibraries) {
    public Plugin {
        checkKinds = List.copyOf(checkKinds);
        substanceLibraries = List.copyOf(substanceLibraries);
    }
}
