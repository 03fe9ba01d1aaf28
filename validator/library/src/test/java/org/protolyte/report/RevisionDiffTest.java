package org.protolyte.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.rules.Severity;
import org.protolyte.substance.LibraryLoader;

/** Comparing two revisions: what changed in the recipe, in the predictions and in the findings. */
class RevisionDiffTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    private static DocumentReport doc(String revision, String components) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-DIFF\", \"revision\": \""
                + revision + "\", \"intendedUse\": \"parenteral\", \"basis\": {\"finalVolume\": \"1 L\"},"
                + " \"components\": [" + components + "],"
                + " \"targets\": {\"pH\": {\"value\": 6.9, \"tolerance\": 0.2, \"temperature\": \"25 Cel\"}},"
                + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}]}";
        return PROTOLYTE.check("r" + revision + ".json", json.getBytes(StandardCharsets.UTF_8));
    }

    private static final String PHOSPHATE = "{\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"10 mmol/L\"},"
            + "{\"substance\": \"disodium hydrogen phosphate dihydrate\", \"amount\": \"10 mmol/L\"}";

    @Test
    void identicalRevisionsShowNoChange() {
        RevisionDiff d = RevisionDiff.compare(doc("A", PHOSPHATE), doc("A", PHOSPHATE));
        assertEquals(0, d.components().size());
        assertEquals(0, d.values().size());
        assertEquals(0, d.species().size());
        assertEquals(0, d.findings().size());
        assertFalse(d.newFailure(Severity.ERROR));
    }

    /**
     * 10 + 10 mmol/L of the two phosphate salts against 10 + 30: between pKa1 (2.1) and pKa3 (12.3) each salt
     * gives its own form, so HPO4-2 is about 10/20 of the phosphate before and 30/40 after (mass and proton balance,
     * arithmetic); H2PO4- moves the other way. Both are named; a change of half a percentage point is not.
     */
    @Test
    void theSpeciesThatMovedAreNamedPerCondition() {
        String more = PHOSPHATE.replace("\"disodium hydrogen phosphate dihydrate\", \"amount\": \"10 mmol/L\"",
                "\"disodium hydrogen phosphate dihydrate\", \"amount\": \"30 mmol/L\"");
        assertFalse(more.equals(PHOSPHATE), "the change did not apply");
        RevisionDiff d = RevisionDiff.compare(doc("A", PHOSPHATE), doc("B", more));
        RevisionDiff.SpeciesChange hpo4 = d.species().stream().filter(x -> x.species().equals("HPO4-2")).findFirst()
                .orElseThrow(() -> new AssertionError(d.species().toString()));
        assertEquals("use", hpo4.where());
        assertEquals(0.50, hpo4.before(), 0.02);
        assertEquals(0.75, hpo4.after(), 0.02);
        assertTrue(d.species().stream().anyMatch(x -> x.species().equals("H2PO4-") && x.after() < x.before() - 0.2),
                d.species()::toString);
        String text = new DiffRenderer().text(d);
        assertTrue(text.contains("species that moved") && text.contains("HPO4-2"), text);
        assertTrue(new DiffRenderer().json(d, 0).contains("\"species\" : \"HPO4-2\""), () -> new DiffRenderer().json(d, 0));

        String little = PHOSPHATE.replace("\"disodium hydrogen phosphate dihydrate\", \"amount\": \"10 mmol/L\"",
                "\"disodium hydrogen phosphate dihydrate\", \"amount\": \"10.2 mmol/L\"");
        assertEquals(java.util.List.of(), RevisionDiff.compare(doc("A", PHOSPHATE), doc("B", little)).species());
    }

    @Test
    void anAmountGivenInOtherUnitsComparesByMoles() {
        // 10 mmol of KH2PO4 is 1.3609 g (molar mass 136.09 g/mol, Ph. Eur.): the same amount, written differently
        String grams = PHOSPHATE.replace("\"10 mmol/L\"}," , "\"1.3609 g\"},");
        RevisionDiff d = RevisionDiff.compare(doc("A", PHOSPHATE), doc("B", grams));
        assertTrue(d.components().stream().allMatch(c -> Math.abs(c.mmolBefore() - c.mmolAfter()) < 0.001),
                d.components()::toString);
        assertTrue(d.values().stream().allMatch(v -> Math.abs(v.delta()) < 1e-3));
    }

    private static DocumentReport sized(String revision, String volume, String grams) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-DIFF\", \"revision\": \""
                + revision + "\", \"intendedUse\": \"parenteral\", \"basis\": {\"finalVolume\": \"" + volume + "\"},"
                + " \"components\": [{\"substance\": \"sodium chloride\", \"amount\": \"" + grams + "\"}],"
                + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}]}";
        return PROTOLYTE.check("r" + revision + ".json", json.getBytes(StandardCharsets.UTF_8));
    }

    /** 8 g in 1 L and 4 g in 500 mL are one concentration (arithmetic): a batch size, not a change of amount. */
    @Test
    void aBatchSizeChangeIsNotAChangeOfEveryAmount() {
        RevisionDiff d = RevisionDiff.compare(sized("A", "1 L", "8 g"), sized("B", "500 mL", "4 g"));
        assertEquals(java.util.List.of(), d.components());
        assertTrue(d.basis().orElseThrow().contains("batch size 1 L final volume → 0.5 L final volume"),
                d.basis()::toString);
    }

    @Test
    void aChangedConcentrationIsReportedPerLitre() {
        RevisionDiff d = RevisionDiff.compare(sized("A", "1 L", "8 g"), sized("B", "500 mL", "5 g"));
        RevisionDiff.ComponentChange c = d.components().get(0);
        assertEquals(RevisionDiff.Kind.CHANGED, c.kind());
        assertEquals(1.25, c.mmolAfter() / c.mmolBefore(), 1e-9);    // 10 g/L against 8 g/L
        assertTrue(d.values().stream().anyMatch(v -> v.quantity().equals("osmolality") && v.delta() > 0),
                d.values()::toString);
    }

    @Test
    void addedComponentMovedValuesAndANewFailureAreReported() {
        String withKcl = PHOSPHATE + ",{\"substance\": \"potassium chloride\", \"amount\": \"60 mmol/L\"}";
        RevisionDiff d = RevisionDiff.compare(doc("A", PHOSPHATE), doc("B", withKcl));
        assertTrue(d.components().stream().anyMatch(c -> c.kind() == RevisionDiff.Kind.ADDED
                && c.substance().equals("potassium chloride")));
        assertTrue(d.values().stream().anyMatch(v -> v.quantity().equals("ionic strength") && v.delta() > 0.05));
        assertTrue(d.findings().stream().anyMatch(f -> f.rule().equals("parenteral-potassium-chloride-dilute")
                && f.kind() == RevisionDiff.Kind.ADDED));
        assertTrue(d.newFailure(Severity.ERROR));
    }

    @Test
    void aClearedFindingIsNotANewFailure() {
        String withKcl = PHOSPHATE + ",{\"substance\": \"potassium chloride\", \"amount\": \"60 mmol/L\"}";
        RevisionDiff d = RevisionDiff.compare(doc("A", withKcl), doc("B", PHOSPHATE));
        assertTrue(d.findings().stream().anyMatch(f -> f.kind() == RevisionDiff.Kind.REMOVED));
        assertFalse(d.newFailure(Severity.ERROR));
    }
}
