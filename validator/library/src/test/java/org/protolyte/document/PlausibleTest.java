package org.protolyte.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.protolyte.units.Dimension;
import org.protolyte.units.Quantity;

class PlausibleTest {

    private static Optional<String> check(Plausible range, String text) {
        return range.check("it", Quantity.parse(text));
    }

    @Test
    void everyDimensionRefusesAnExponentSlip() {
        for (String q : new String[] {"1e308 L", "1e-300 L", "1e308 g", "1e308 mol/L", "1e-308 mol/L", "1e308 mmol/kg",
                "1e308 g/mL", "1e308 kPa", "1e308 Cel"}) {
            assertTrue(check(Plausible.of(Quantity.parse(q).dimension()), q).isPresent(), q);
        }
    }

    @Test
    void ordinaryValuesPass() {
        for (String q : new String[] {"1 L", "500 mL", "80 g", "0.15 mol/L", "1.18 g/mL", "5.3 kPa", "-20 Cel", "37 Cel"}) {
            assertEquals(Optional.empty(), check(Plausible.of(Quantity.parse(q).dimension()), q), q);
        }
    }

    @Test
    void toleranceLiesStrictlyBetweenNothingAndAll() {
        assertTrue(check(Plausible.TOLERANCE, "0 %").isPresent());
        assertTrue(check(Plausible.TOLERANCE, "100 %").isPresent());
        assertEquals(Optional.empty(), check(Plausible.TOLERANCE, "2 %"));
    }

    @Test
    void pHIsReadInLiquidWaterButConditionsMayBeFrozen() {
        assertTrue(check(Plausible.LIQUID_TEMPERATURE, "-20 Cel").isPresent());
        assertTrue(check(Plausible.LIQUID_TEMPERATURE, "5000 K").isPresent());
        assertEquals(Optional.empty(), check(Plausible.CONDITION_TEMPERATURE, "-20 Cel"));
        assertTrue(check(Plausible.CONDITION_TEMPERATURE, "300 Cel").orElseThrow().contains("[-200, 100] Cel"));
        assertEquals(Dimension.TEMPERATURE, Quantity.parse("1 K").dimension());
    }
}
