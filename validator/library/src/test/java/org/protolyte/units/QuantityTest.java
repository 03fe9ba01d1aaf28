package org.protolyte.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

import java.time.Duration;

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

    @ParameterizedTest(name = "\"{0}\" = {1} {2}")
    @CsvSource({"'1. g', 1, g", "'.5 g', 0.5, g", "'-2.5e-3 mol/L', -0.0025, mol/L", "'+4E2 mg', 400, mg",
        "'  5 g\t', 5, g", "'5g', 5, g", "'5e3g', 5000, g"})
    void numberAndUnitSplitWhereThePatternSplitsThem(String text, double value, String unit) {
        Quantity q = Quantity.parse(text);
        assertEquals(value, q.value(), 1e-15);
        assertEquals(unit, q.unit().code());
    }

    @Test
    void anEWithoutDigitsAfterItBelongsToTheUnit() {
        UnitException e = assertThrows(UnitException.class, () -> Quantity.parse("1eg"));
        assertTrue(e.getMessage().contains("unknown unit 'eg'"), e.getMessage());
    }

    @ParameterizedTest
    @CsvSource({"''", "'   '", "'.'", "'. g'", "'-g'", "'e5 g'", "'1e5'", "'g 5'"})
    void textWithoutNumberAndUnitIsRefused(String text) {
        UnitException e = assertThrows(UnitException.class, () -> Quantity.parse(text));
        assertTrue(e.getMessage().contains("is not of the form") || e.getMessage().contains("unknown unit"),
                e.getMessage());
    }

    /** "1 g" + 200,000 spaces + "x" took minutes with a backtracking pattern; a megabyte must take milliseconds. */
    @Test
    void aMegabyteOfSpacesInsideTheTextIsRefusedInLinearTime() {
        String text = "1 g" + " ".repeat(1 << 20) + "x";
        UnitException e = assertTimeoutPreemptively(Duration.ofSeconds(10),
                () -> assertThrows(UnitException.class, () -> Quantity.parse(text)));
        assertTrue(e.getMessage().contains("unknown unit 'g   "), e.getMessage());
        assertTrue(e.getMessage().length() < 1_000, "the message quotes the text cut short");
    }

    @Test
    void aMegabyteOfLeadingSpacesOrDigitsIsAnsweredInLinearTime() {
        String spaces = " ".repeat(1 << 20) + "1 gx";
        String digits = "1" + "0".repeat(1 << 20) + " g";
        assertTimeoutPreemptively(Duration.ofSeconds(10), () -> {
            assertTrue(assertThrows(UnitException.class, () -> Quantity.parse(spaces)).getMessage()
                    .contains("unknown unit 'gx'"));
            assertTrue(assertThrows(UnitException.class, () -> Quantity.parse(digits)).getMessage()
                    .contains("not finite"));
        });
    }
}
