package org.protolyte.recipe;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.Status;
import org.protolyte.substance.LibraryLoader;

/**
 * A name shared by forms that differ only in their water of hydration is accepted for a molar amount (the form does
 * not change the chemistry), with a note of the form assumed; a mass of it stays refused, and a name shared by
 * different species is refused always (issue 15, item 4).
 */
class HydrateOnlyNamesTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    private static DocumentReport check(String name, String amount) {
        String doc = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"HYD-1\", \"revision\": \"A\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": ["
                + "{\"substance\": \"acetic acid\", \"amount\": \"50 mmol/L\"},"
                + "{\"substance\": \"" + name + "\", \"amount\": \"" + amount + "\"}],"
                + " \"targets\": {\"pH\": {\"value\": 5.0, \"tolerance\": 1.0, \"temperature\": \"25 Cel\"}}}";
        return PROTOLYTE.check("hydrate.json", doc.getBytes(StandardCharsets.UTF_8));
    }

    @Test
    void aMolarAmountOfAHydrateOnlyNameIsAcceptedWithTheFormAssumed() {
        DocumentReport r = check("sodium acetate", "50 mmol/L");
        assertTrue(r.status() != Status.INVALID, r.findings().toString());
        var a = r.analysis().orElseThrow();
        assertEquals("sodium acetate anhydrous", a.recipe().ingredients().get(1).substance().name());
        assertTrue(a.assumptions().stream().anyMatch(s -> s.startsWith("'sodium acetate' names forms that differ only "
                + "in their water of hydration") && s.contains("sodium acetate anhydrous was assumed for the water it "
                + "brings (0 mol per mol)")), a.assumptions()::toString);
        // the same chemistry as naming the anhydrous form: equal pH at every condition
        DocumentReport named = check("sodium acetate anhydrous", "50 mmol/L");
        for (int i = 0; i < a.conditions().size(); i++) {
            assertEquals(named.analysis().orElseThrow().conditions().get(i).state().orElseThrow().pH(),
                    a.conditions().get(i).state().orElseThrow().pH(), 0);
        }
    }

    @Test
    void aMassOfAHydrateOnlyNameStaysRefusedWithTheFormsToChooseFrom() {
        DocumentReport r = check("sodium acetate", "4.1 g");
        assertEquals(Status.INVALID, r.status());
        assertTrue(r.findings().get(0).message().contains("'sodium acetate' names several forms; name the one that is "
                + "weighed"), r.findings().toString());
    }

    @Test
    void aNameSharedByDifferentSpeciesIsRefusedEvenForAMolarAmount() {
        DocumentReport r = check("sodium phosphate", "10 mmol/L");
        assertEquals(Status.INVALID, r.status());
        assertTrue(r.findings().get(0).message().contains("'sodium phosphate' names several forms"),
                r.findings().toString());
    }

    @Test
    void aMolalityCountsAsMolarToo() {
        DocumentReport r = check("disodium hydrogen phosphate", "0.01 mol/kg");
        assertTrue(r.status() != Status.INVALID, r.findings().toString());
        assertEquals("disodium hydrogen phosphate anhydrous",
                r.analysis().orElseThrow().recipe().ingredients().get(1).substance().name());
    }
}
