package org.protolyte.fuzz;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Timeout;
import org.protolyte.document.DocumentException;
import org.protolyte.document.JsonReader;
import org.protolyte.document.Location;
import org.protolyte.document.Problem;
import org.protolyte.document.SourceDocument;

import com.code_intelligence.jazzer.junit.FuzzTest;

/** The strict JSON reader on arbitrary bytes: a tree, or problems that each say what and where; nothing else. */
class JsonReaderFuzzTest {

    private final JsonReader reader = new JsonReader();

    @FuzzTest
    @Timeout(60)
    void readsATreeOrRefusesByPlace(byte[] input) {
        SourceDocument doc;
        try {
            doc = reader.read("fuzzed.json", input);
        } catch (DocumentException refused) {
            assertFalse(refused.problems().isEmpty(), "a refusal names at least one problem");
            for (Problem p : refused.problems()) {
                assertFalse(p.message().isBlank(), () -> "a problem without words: " + p);
                p.location().ifPresent(l -> assertTrue(l.line() >= 1 && l.column() >= 1, () -> "no such place: " + l));
            }
            return;
        }
        // every recorded place is a real line and column, and a root value is always located (input with no value
        // at all, such as empty bytes, reads as a missing root that the schema then refuses)
        for (Location l : doc.locations().values()) {
            assertTrue(l.line() >= 1 && l.column() >= 1, () -> "no such place: " + l);
        }
        assertEquals("fuzzed.json", doc.source());
        assertTrue(doc.root().isMissingNode() || doc.locate("").isPresent(), "the root value has a place");
    }
}
