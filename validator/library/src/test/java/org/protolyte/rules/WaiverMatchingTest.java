package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.LocalDate;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.protolyte.document.Formulation;

/** Which findings a held waiver accepts: its document, its rule, its place; and where its own findings point. */
class WaiverMatchingTest {

    private static final LocalDate TODAY = LocalDate.of(2026, 12, 1);
    private static final Formulation DOC = Analyses.analyse(Analyses.saline("")).recipe().formulation();

    private static Waiver held(String documentId, Optional<String> pointer) {
        return new Waiver("r-x", Optional.of(documentId), Optional.of("A"), Optional.empty(), pointer, "accepted",
                "QA (test)", LocalDate.of(2026, 11, 1), LocalDate.of(2027, 1, 1), "waivers.json /waivers/0", false);
    }

    private static Finding at(String pointer) {
        return new Finding("r-x", Severity.ERROR, "m", Optional.of(pointer), Optional.empty());
    }

    private static List<Finding> apply(Waiver w, Finding... f) {
        return new Waivers(List.of(w), TODAY).apply(DOC, "0".repeat(64), false, List.of(f));
    }

    @Test
    void aWaiverForAnotherDocumentAcceptsNothingAndIsNotReported() {
        List<Finding> out = apply(held("TST-OTHER", Optional.empty()), at("/conditions/0"));
        assertEquals(List.of(at("/conditions/0")), out);
    }

    @Test
    void aWaiverAtAPlaceAcceptsOnlyTheFindingThere() {
        List<Finding> out = apply(held("TST-FIX", Optional.of("/conditions/1")), at("/conditions/0"),
                at("/conditions/1"));
        assertEquals(List.of(true, false), out.stream().map(Finding::active).toList());
        List<Finding> all = apply(held("TST-FIX", Optional.empty()), at("/conditions/0"), at("/conditions/1"));
        assertEquals(List.of(false, false), all.stream().map(Finding::active).toList());
    }

    @Test
    void anUnusedWaiverAtAPlaceNamesThePlaceAndPointsAtTheDocument() {
        List<Finding> out = apply(held("TST-FIX", Optional.of("/conditions/5")), at("/conditions/0"));
        Finding unused = out.get(1);
        assertEquals(Waivers.UNUSED, unused.rule());
        assertEquals(Severity.NOTE, unused.severity());
        assertEquals("waiver of r-x (waivers.json /waivers/0) matches no finding: the rule did not fire at "
                + "/conditions/5", unused.message());
        assertEquals(Optional.of(""), unused.pointer(), "a waiver file's waiver belongs to the document as a whole");
        assertTrue(out.get(0).active());
    }
}
