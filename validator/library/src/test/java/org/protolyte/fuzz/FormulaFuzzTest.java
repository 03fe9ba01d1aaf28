package org.protolyte.fuzz;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Timeout;
import org.protolyte.substance.Formula;

import com.code_intelligence.jazzer.api.FuzzedDataProvider;
import com.code_intelligence.jazzer.junit.FuzzTest;

/**
 * The formula parser on arbitrary text: a formula whose every element count and molar mass is a positive finite
 * number, or an IllegalArgumentException (the loader turns it into a library problem with its place).
 */
class FormulaFuzzTest {

    @FuzzTest
    @Timeout(60)
    void parsesAFormulaOrRefusesIt(FuzzedDataProvider data) {
        String text = data.consumeRemainingAsString();
        Formula f;
        try {
            f = Formula.parse(text);
        } catch (IllegalArgumentException refused) {
            assertFalse(refused.getMessage() == null || refused.getMessage().isBlank(), "a refusal says why");
            return;
        }
        assertFalse(f.elements().isEmpty(), () -> "'" + text + "' has no elements");
        f.elements().forEach((element, count) -> assertTrue(count > 0 && Double.isFinite(count),
                () -> "'" + text + "': " + count + " of " + element));
        double m = f.molarMass();
        assertTrue(m > 0 && Double.isFinite(m), () -> "'" + text + "': molar mass " + m);
        assertTrue(f.hydrationWater() >= 0, () -> "'" + text + "': water " + f.hydrationWater());
    }
}
