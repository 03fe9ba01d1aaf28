package org.protolyte.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.Status;
import org.protolyte.rules.Finding;
import org.protolyte.substance.LibraryLoader;

/** Schema problems read as sentences, and one pass reports structure, unit and name problems together. */
class ProblemMessagesTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    private static final String DOC = "{\"document\": \"formulation\", \"formatVersion\": 2, \"id\": \"TST-MSG\",\n"
            + " \"basis\": {\"finalVolume\": \"1 L\"},\n"
            + " \"components\": [{\"substance\": \"sodium chloryde\", \"amount\": \"9 g\"},\n"
            + "   {\"substance\": \"Tris\", \"amount\": \"five g\"}],\n"
            + " \"targets\": {\"pH\": {\"value\": 7}}, \"intendedUse\": \"veterinary\"}";

    private static List<Finding> findings() {
        DocumentReport r = PROTOLYTE.check("t.json", DOC.getBytes(StandardCharsets.UTF_8));
        assertEquals(Status.INVALID, r.status());
        return r.findings();
    }

    private static String at(String pointer) {
        return findings().stream().filter(f -> f.pointer().orElse("").equals(pointer)).map(Finding::message)
                .findFirst().orElseThrow(() -> new AssertionError("no finding at " + pointer + ": " + findings()));
    }

    @Test
    void constantNamesTheExpectedValue() {
        assertEquals("must be 1", at("/formatVersion"));
    }

    @Test
    void dependentPropertySaysWhatItDependsOn() {
        assertEquals("'tolerance' is required when 'value' is given", at("/targets/pH"));
    }

    @Test
    void enumerationListsTheAllowedValues() {
        assertTrue(at("/intendedUse").contains("\"cell-culture\""));
    }

    @Test
    void quantityTextShowsTheExpectedForm() {
        assertTrue(at("/components/1/amount").contains("<number> <unit>"));
    }

    @Test
    void unknownSubstanceIsReportedAlongsideSchemaProblems() {
        assertTrue(at("/components/0/substance").contains("nearest library names: sodium chloride"));
    }

    @Test
    void problemsComeInDocumentOrder() {
        List<Integer> lines = findings().stream().map(f -> f.location().orElseThrow().line()).toList();
        assertEquals(lines.stream().sorted().toList(), lines);
    }

    /** 200,000 unknown keys hung the check: a message each, and a search for duplicates quadratic in their number. */
    @Test
    void manyUnknownKeysListTheFirstHundredAndCountTheRest() {
        StringBuilder keys = new StringBuilder();
        for (int i = 0; i < 200_000; i++) {
            keys.append(", \"k").append(i).append("\": 0");
        }
        String doc = DOC.substring(0, DOC.length() - 1) + keys + "}";
        List<Finding> found = org.junit.jupiter.api.Assertions.assertTimeoutPreemptively(java.time.Duration.ofSeconds(60),
                () -> PROTOLYTE.check("t.json", doc.getBytes(StandardCharsets.UTF_8)).findings());
        assertTrue(found.size() <= SchemaCatalog.MOST_PROBLEMS_LISTED + 3, found.size() + " findings");
        assertEquals("unknown property 'k0'; did you mean 'id'?", found.stream()
                .filter(f -> f.pointer().orElse("").equals("/k0")).findFirst().orElseThrow().message());
        Finding rest = found.stream().filter(f -> f.message().startsWith("… and problems at ")).findFirst()
                .orElseThrow(() -> new AssertionError("no count of the unlisted problems"));
        // the document's own problems (formatVersion, targets, intendedUse, amount) come first: 96 keys are listed
        assertEquals("… and problems at 199904 more places from here on, not listed (a report lists the first 100"
                + " problems of a document)", rest.message());
    }
}
