package org.protolyte.fuzz;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.protolyte.Protolyte;
import org.protolyte.document.DocumentException;
import org.protolyte.document.JsonReader;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.document.SourceDocument;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.Status;
import org.protolyte.rules.Finding;
import org.protolyte.substance.LibraryLoader;

/**
 * The properties every whole-check fuzz target holds a report to, judged independently of the check itself: the
 * document is read and schema-validated again here, so a check that passes what its own schema refuses is caught.
 */
final class FuzzChecks {

    /** Loaded once per JVM: immutable after construction, and a fuzz run calls it thousands of times. */
    static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    /** The name a fuzzed input is checked under; bytes have no folder, so a batch record must embed its master. */
    static final String SOURCE = "fuzzed.json";

    private FuzzChecks() {
    }

    /**
     * A report exists for every input; it is never an internal fault; a document that is not JSON is invalid; one
     * that its schema refuses never passes; an invalid report says why, and where.
     */
    static void assertHonestReport(byte[] input, DocumentReport r) {
        assertEquals(SOURCE, r.source());
        assertNotEquals(Status.FAULT, r.status(), () -> "internal fault: " + r.diagnostics());
        List<Problem> schemaProblems;
        try {
            SourceDocument doc = new JsonReader().read(SOURCE, input);
            String schema = Protolyte.BATCH_RECORD.equals(doc.root().path("document").asString(""))
                    ? "batch-record.schema.json" : "formulation.schema.json";
            schemaProblems = SCHEMAS.validate(doc, schema);
        } catch (DocumentException notJson) {
            assertEquals(Status.INVALID, r.status(), () -> "not JSON (" + notJson.problems() + ") yet " + r.status());
            schemaProblems = notJson.problems();
        }
        if (!schemaProblems.isEmpty()) {
            List<Problem> why = schemaProblems;
            assertNotEquals(Status.PASS, r.status(), () -> "passed although its schema refuses it: " + why);
        }
        if (r.status() == Status.INVALID) {
            assertFalse(r.findings().isEmpty(), "an invalid report gives its reasons");
            for (Finding f : r.findings()) {
                assertFalse(f.message().isBlank(), () -> "a reason without words: " + f);
                assertTrue(f.pointer().isPresent() || f.location().isPresent(), () -> "a reason with no place: " + f);
            }
        }
    }
}
