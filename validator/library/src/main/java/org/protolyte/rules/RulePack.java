package org.protolyte.rules;

import java.util.List;
import java.util.Optional;

import org.protolyte.document.SourceDocument;

/**
 * A rule pack as read from its file: its identity, what it applies to, the pack it extends and its
 * rule entries (complete rules, or changes to inherited ones). {@code sha256} is of the raw bytes.
 */
public record RulePack(String name, String version, Optional<String> title, List<String> appliesTo,
                       Optional<String> extendsPack, boolean documentWaivers, SourceDocument document,
                       String sha256, boolean shipped) {

    /** Equal packs share name and digest; hashing every rule and the source document is not needed. */
    @Override
    public int hashCode() {
        return 31 * name.hashCode() + sha256.hashCode();
    }

    public RulePack {
        appliesTo = List.copyOf(appliesTo);
    }

    public boolean appliesTo(String intendedUse) {
        return appliesTo.contains("all") || appliesTo.contains(intendedUse);
    }
}
