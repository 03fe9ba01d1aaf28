package org.protolyte.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/** Each accepted unit converts to its base by the definition of the unit (UCUM, and the lab spellings listed in README). */
class QuantityTest {

    @ParameterizedTest(name = "\"{0}\" = {1} {2}")
    @CsvSource({
        "'1 g', 1, MASS", "'250 mg', 0.25, MASS", "'2 kg', 2000, MASS", "'5 ug', 5e-6, MASS",
        "'1 L', 1, VOLUME", "'500 mL', 0.5, VOLUME", "'10 uL', 1e-5, VOLUME",
        "'3 mmol', 0.003, AMOUNT", "'20 mmol/L', 0.02, AMOUNT_CONCENTRATION", "'0.1 M', 0.1, AMOUNT_CONCENTRATION",
        "'25 mM', 0.025, AMOUNT_CONCENTRATION", "'50 µM', 5e-5, AMOUNT_CONCENTRATION",
        "'50 uM', 5e-5, AMOUNT_CONCENTRATION",
        "'0.9 % w/v', 9, MASS_CONCENTRATION", "'2 mg/mL', 2, MASS_CONCENTRATION", "'80 g/L', 80, MASS_CONCENTRATION",
        "'10 % v/v', 0.1, VOLUME_FRACTION", "'37 % w/w', 0.37, MASS_FRACTION", "'5 %', 0.05, FRACTION",
        "'150 mmol/kg', 0.15, MOLALITY", "'25 Cel', 298.15, TEMPERATURE", "'37 °C', 310.15, TEMPERATURE",
        "'277.15 K', 277.15, TEMPERATURE", "'101.325 kPa', 101325, PRESSURE", "'1.18 g/mL', 1.18, DENSITY"})
    void textConvertsToBase(String text, double base, Dimension dimension) {
        Quantity q = Quantity.parse(text);
        assertEquals(dimension, q.dimension());
        assertEquals(base, q.base(), 1e-12 * Math.max(1, Math.abs(base)));
    }

    @Test
    void objectFormEqualsTextForm() {
        assertEquals(Quantity.parse("1.55 g"), Quantity.of(1.55, "g"));
    }

    @Test
    void unitsAreCaseSensitive() {
        UnitException e = assertThrows(UnitException.class, () -> Quantity.parse("5 ml"));
        assertTrue(e.getMessage().contains("'mL'"));
    }

    @Test
    void bareNumberIsRefused() {
        assertThrows(UnitException.class, () -> Quantity.parse("5"));
    }

    @Test
    void wrongDimensionNamesWhatIsAccepted() {
        UnitException e = assertThrows(UnitException.class,
                () -> Quantity.parse("25 Cel").require("an amount", Dimension.MASS));
        assertTrue(e.getMessage().contains("'mg'"));
    }
}
