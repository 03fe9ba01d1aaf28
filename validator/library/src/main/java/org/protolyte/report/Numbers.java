package org.protolyte.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

import org.protolyte.chemistry.Thermo;

/** Rounding for presentation: the engine's doubles carry more digits than the constants justify. */
final class Numbers {
    /** From here up, a number keeps its exponent: a plain 1e300 would print 301 digits. */
    private static final double PLAIN_LIMIT = 1e15;

    private Numbers() {
    }

    static BigDecimal decimals(double x, int places) {
        if (Math.abs(x) >= PLAIN_LIMIT) {
            return significant(x, 6);
        }
        BigDecimal b = BigDecimal.valueOf(x).setScale(places, RoundingMode.HALF_EVEN).stripTrailingZeros();
        return b.scale() < 0 ? b.setScale(0) : b;
    }

    static BigDecimal significant(double x, int digits) {
        if (x == 0) {
            return BigDecimal.ZERO;
        }
        BigDecimal b = new BigDecimal(x).round(new MathContext(digits, RoundingMode.HALF_EVEN)).stripTrailingZeros();
        return b.scale() < 0 && Math.abs(x) < PLAIN_LIMIT ? b.setScale(0) : b;   // 10, not 1E+1; but 1E+300, not 301 digits
    }

    static double celsius(double kelvin) {
        return kelvin - Thermo.KELVIN_OFFSET;
    }
}
