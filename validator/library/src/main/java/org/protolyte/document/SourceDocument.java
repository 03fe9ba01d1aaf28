package org.protolyte.document;

import java.util.Map;
import java.util.Optional;

import tools.jackson.databind.JsonNode;

/** A parsed JSON file: its tree, and where in the text each JSON pointer begins. */
public record SourceDocument(String source, JsonNode root, Map<String, Location> locations) {

    public SourceDocument {
        locations = Map.copyOf(locations);
    }

    /** Equal documents share their source; hashing the whole tree and its locations is not needed. */
    @Override
    public int hashCode() {
        return source.hashCode();
    }

    /** The location of the pointer, or of its nearest parent that has one. */
    public Optional<Location> locate(String pointer) {
        String p = pointer;
        while (true) {
            Location l = locations.get(p);
            if (l != null) {
                return Optional.of(l);
            }
            if (p.isEmpty()) {
                return Optional.empty();
            }
            p = p.substring(0, Math.max(0, p.lastIndexOf('/')));
        }
    }

    public Problem problem(String pointer, String message) {
        return new Problem(pointer, locate(pointer), message);
    }
}
