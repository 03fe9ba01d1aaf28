package org.protolyte.report;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;

/** Rounding for presentation: the engine's doubles carry more digits than the constants justify. */
final class Numbers {
    private Numbers() {
    }

    static BigDecimal decimals(double x, int places) {
        BigDecimal b = BigDecimal.valueOf(x).setScale(places, RoundingMode.HALF_EVEN).stripTrailingZeros();
        return b.scale() < 0 ? b.setScale(0) : b;
    }

    static BigDecimal significant(double x, int digits) {
        if (x == 0) {
            return BigDecimal.ZERO;
        }
        BigDecimal b = new BigDecimal(x).round(new MathContext(digits, RoundingMode.HALF_EVEN)).stripTrailingZeros();
        return b.scale() < 0 ? b.setScale(0) : b;   // 10, not 1E+1
    }

    static double celsius(double kelvin) {
        return kelvin - 273.15;
    }
}
