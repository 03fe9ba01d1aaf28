package org.protolyte.substance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.time.Duration;

import org.junit.jupiter.api.Test;
import org.protolyte.document.DocumentException;
import org.protolyte.document.SchemaCatalog;

/** Formulas and ranges a careless or hostile library may hold are refused with a message, never a crash. */
class HostileFormulaTest {

    @Test
    void deeplyNestedParenthesesAreRefusedNotAStackOverflow() {
        String formula = "(".repeat(200_000) + "H" + ")".repeat(200_000);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Formula.parse(formula));
        assertTrue(e.getMessage().contains("longer than") || e.getMessage().contains("nested deeper"), e.getMessage());
        assertTrue(e.getMessage().length() < 300, "the message quotes the formula cut short");
    }

    @Test
    void nestingBeyondTheDepthLimitIsRefusedEvenWhenShort() {
        String formula = "(".repeat(Formula.MAX_DEPTH + 1) + "H" + ")".repeat(Formula.MAX_DEPTH + 1);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Formula.parse(formula));
        assertTrue(e.getMessage().contains("nested deeper than " + Formula.MAX_DEPTH), e.getMessage());
    }

    @Test
    void countsThatWouldOverflowAreRefusedNotWrappedToZero() {
        // 65536 × 65536 = 2^32, which wraps an int to 0
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Formula.parse("((C4H10N2O4S)65536)65536"));
        assertTrue(e.getMessage().contains("atoms of one element"), e.getMessage());
    }

    @Test
    void aLeadingCountBeyondTheLimitIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> Formula.parse("9".repeat(400) + "H2O"));
    }

    @Test
    void nestedGroupsWithinTheLimitsStillCount() {
        // Ca3(PO4)2: 3 Ca, 2 P, 8 O (common practice)
        Formula f = Formula.parse("Ca3(PO4)2");
        assertEquals(3.0, f.elements().get("Ca"));
        assertEquals(2.0, f.elements().get("P"));
        assertEquals(8.0, f.elements().get("O"));
    }

    @Test
    void longRunsOfSpacesInAFormulaAreRefusedQuickly() {
        String formula = "NaCl" + " ".repeat(200_000) + "x";
        assertTimeoutPreemptively(Duration.ofSeconds(10),
                () -> assertThrows(IllegalArgumentException.class, () -> Formula.parse(formula)));
    }

    @Test
    void aComplexWhoseRangeIsReversedIsRefusedAtLoading() {
        String json = "{\"document\": \"substance-library\", \"formatVersion\": 1, \"complexes\": ["
                + "{\"name\": \"ZnCit-\", \"charge\": -1, \"components\": {\"Zn+2\": 1, \"Cit-3\": 1},"
                + " \"log10K\": 4.5, \"uncertainty\": 0.1, \"validFrom\": 50, \"validTo\": 10, \"source\": \"test value\"}]}";
        DocumentException e = assertThrows(DocumentException.class, () -> new LibraryLoader(new SchemaCatalog())
                .addShipped().add("site.json", json.getBytes(StandardCharsets.UTF_8), true).build());
        assertTrue(e.problems().stream().anyMatch(p -> p.pointer().equals("/complexes/0/validTo")
                && p.message().contains("below validFrom")), e.problems().toString());
    }
}
