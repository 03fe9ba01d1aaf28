package org.protolyte.report.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class AxisTest {

    private static List<String> ticks(double lo, double hi) {
        return new Axis("q", "", lo, hi).ticks().stream().map(Format::decimal).toList();
    }

    @Test
    void pHFromZeroToFourteenTicksEveryTwo() {
        assertEquals(List.of("0", "2", "4", "6", "8", "10", "12", "14"), ticks(0, 14));
    }

    @Test
    void fractionsTickEveryTenthInsideTheRange() {
        assertEquals(List.of("0.2", "0.3", "0.4", "0.5", "0.6", "0.7", "0.8"), ticks(0.13, 0.87));
    }

    @Test
    void aRangeAcrossZeroHasATickAtZero() {
        assertEquals(List.of("-2", "0", "2", "4"), ticks(-3, 5));
        assertEquals(List.of("-40", "-20", "0", "20", "40"), ticks(-40, 40));
    }

    @ParameterizedTest
    @CsvSource({"0, 14", "0.13, 0.87", "-3, 5", "-0.5, 0.25", "2, 37", "0.00001, 0.00004", "1000, 100000",
            "-1e-9, 3e-9", "7.2, 7.4", "0, 1", "1e300, 2e300", "273.15, 310.15"})
    void ticksAreWholeMultiplesOfOneTwoOrFiveTimesAPowerOfTen(double lo, double hi) {
        List<BigDecimal> ticks = new Axis("q", "", lo, hi).ticks();
        assertTrue(ticks.size() >= 4 && ticks.size() <= 8, lo + " to " + hi + ": " + ticks);
        BigDecimal step = ticks.get(1).subtract(ticks.get(0));
        assertTrue(List.of("1", "2", "5").contains(step.stripTrailingZeros().unscaledValue().toString()),
                "step " + step);
        for (int i = 0; i < ticks.size(); i++) {
            BigDecimal t = ticks.get(i);
            assertTrue(t.doubleValue() >= lo && t.doubleValue() <= hi, t + " outside " + lo + " to " + hi);
            assertEquals(0, t.remainder(step).signum(), t + " not a multiple of " + step);
            if (i > 0) {
                assertEquals(0, t.subtract(ticks.get(i - 1)).compareTo(step), "uneven at " + t);
            }
        }
    }

    @Test
    void aroundEnclosesTheFiniteValuesAndEndsOnTicks() {
        Axis a = Axis.around("pH", "", 6.83, Double.NaN, 7.61, Double.POSITIVE_INFINITY);
        assertTrue(a.lo() <= 6.83 && a.hi() >= 7.61 && a.lo() > 6 && a.hi() < 8.5, a.toString());
        List<BigDecimal> ticks = a.ticks();
        assertEquals(a.lo(), ticks.get(0).doubleValue());
        assertEquals(a.hi(), ticks.get(ticks.size() - 1).doubleValue());
        assertTrue(ticks.size() >= 4 && ticks.size() <= 8, ticks.toString());
    }

    @Test
    void aroundANegativeToPositiveSpreadKeepsZeroAsATick() {
        Axis a = Axis.around("added strong acid (-) or base (+)", "mmol/L", -12.5, 3, 31);
        assertEquals(-20, a.lo());
        assertEquals(40, a.hi());
        assertTrue(a.ticks().stream().anyMatch(t -> t.signum() == 0));
    }

    @Test
    void aroundNothingOrOneValueStillGivesARange() {
        Axis none = Axis.around("x", "", Double.NaN);
        assertEquals(0, none.lo());
        assertEquals(1, none.hi());
        Axis one = Axis.around("x", "", 5);
        assertTrue(one.lo() < 5 && one.hi() > 5, one.toString());
        Axis zero = Axis.around("x", "");
        assertTrue(zero.lo() < zero.hi());
    }

    @Test
    void titleCarriesTheUnitInParenthesesWhereThereIsOne() {
        assertEquals("added strong base (mmol/L)", new Axis("added strong base", "mmol/L", 0, 1).title());
        assertEquals("pH", new Axis("pH", "", 0, 14).title());
    }

    @Test
    void anEmptyOrNonFiniteRangeIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> new Axis("x", "", 1, 1));
        assertThrows(IllegalArgumentException.class, () -> new Axis("x", "", 2, 1));
        assertThrows(IllegalArgumentException.class, () -> new Axis("x", "", Double.NaN, 1));
        assertThrows(IllegalArgumentException.class, () -> new Axis("x", "", -1e308, 1e308));
        assertThrows(IllegalArgumentException.class, () -> Axis.around("x", "", -1e308, 1e308));
    }
}
