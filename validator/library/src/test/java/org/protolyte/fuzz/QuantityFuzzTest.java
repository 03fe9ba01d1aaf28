package org.protolyte.fuzz;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Timeout;
import org.protolyte.units.Quantity;
import org.protolyte.units.Unit;
import org.protolyte.units.UnitException;

import com.code_intelligence.jazzer.api.FuzzedDataProvider;
import com.code_intelligence.jazzer.junit.FuzzTest;

/** The quantity parser on arbitrary text: a finite number in an accepted unit, or a UnitException that says why. */
class QuantityFuzzTest {

    @FuzzTest
    @Timeout(60)
    void parsesAQuantityOrRefusesIt(FuzzedDataProvider data) {
        String text = data.consumeRemainingAsString();
        Quantity q;
        try {
            q = Quantity.parse(text);
        } catch (UnitException refused) {
            assertFalse(refused.getMessage().isBlank(), "a refusal says why");
            return;
        }
        assertTrue(Double.isFinite(q.value()), () -> "'" + text + "' gave " + q.value());
        assertEquals(q.unit(), Unit.ofCode(q.unit().code()).orElseThrow(), "the unit is one of the accepted codes");
        // what is written back reads as the same quantity (== so that -0 and 0 are one number)
        Quantity again = Quantity.parse(q.toString());
        assertEquals(q.unit(), again.unit(), () -> "'" + text + "' → '" + q + "'");
        assertTrue(q.value() == again.value(), () -> "'" + text + "' → '" + q + "' → " + again.value());
    }
}
