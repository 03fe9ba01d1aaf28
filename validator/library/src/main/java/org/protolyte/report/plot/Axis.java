package org.protolyte.report.plot;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * One axis: the quantity, its unit ("" for none, as for pH) and the range shown, {@code lo < hi}.
 * Ticks fall on multiples of 1, 2 or 5 × 10^n.
 */
public record Axis(String quantity, String unit, double lo, double hi) {

    /** At most this many ticks; the finest step within it is taken (4 or more unless the range is awkward). */
    static final int MAX_TICKS = 8;
    private static final int[] MULTIPLES = {1, 2, 5};

    public Axis {
        Objects.requireNonNull(quantity, "quantity");
        Objects.requireNonNull(unit, "unit");
        if (!(lo < hi) || !Double.isFinite(hi - lo)) {
            throw new IllegalArgumentException("axis range must be finite with lo < hi: " + lo + " to " + hi);
        }
    }

    /** An axis whose range encloses every finite value and starts and ends on a tick; 0 to 1 when there is none. */
    public static Axis around(String quantity, String unit, double... values) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            if (Double.isFinite(v)) {
                min = Math.min(min, v);
                max = Math.max(max, v);
            }
        }
        if (min > max) {
            return new Axis(quantity, unit, 0, 1);
        }
        if (!Double.isFinite(max - min)) {
            throw new IllegalArgumentException("values too far apart for one axis: " + min + " to " + max);
        }
        if (min == max) {
            double pad = min == 0 ? 1 : Math.abs(min) / 10;
            min -= pad;
            max += pad;
        }
        BigDecimal step = step(min, max, true);
        BigDecimal lo = BigDecimal.valueOf(min).divide(step, 0, RoundingMode.FLOOR).multiply(step);
        BigDecimal hi = BigDecimal.valueOf(max).divide(step, 0, RoundingMode.CEILING).multiply(step);
        return new Axis(quantity, unit, lo.doubleValue(), hi.doubleValue());
    }

    /** The label: quantity, and the unit in parentheses where there is one. */
    public String title() {
        return unit.isBlank() ? quantity : quantity + " (" + unit + ")";
    }

    /** The tick values from lo to hi, exact decimals. */
    public List<BigDecimal> ticks() {
        BigDecimal step = step(lo, hi, false);
        BigDecimal k = BigDecimal.valueOf(lo).divide(step, 0, RoundingMode.CEILING);
        BigDecimal last = BigDecimal.valueOf(hi).divide(step, 0, RoundingMode.FLOOR);
        List<BigDecimal> ticks = new ArrayList<>();
        for (; k.compareTo(last) <= 0; k = k.add(BigDecimal.ONE)) {
            ticks.add(k.multiply(step).stripTrailingZeros());
        }
        return List.copyOf(ticks);
    }

    /** Where {@code v} falls between lo (0) and hi (1). */
    double fraction(double v) {
        return (v - lo) / (hi - lo);
    }

    /**
     * The finest 1-2-5 step that gives at most {@link #MAX_TICKS} ticks inside [lo, hi], or, when {@code widen},
     * on the range widened outward to whole steps.
     */
    private static BigDecimal step(double lo, double hi, boolean widen) {
        BigDecimal from = BigDecimal.valueOf(lo);
        BigDecimal to = BigDecimal.valueOf(hi);
        RoundingMode down = widen ? RoundingMode.FLOOR : RoundingMode.CEILING;
        RoundingMode up = widen ? RoundingMode.CEILING : RoundingMode.FLOOR;
        for (int e = (int) Math.floor(Math.log10(hi - lo)) - 1; ; e++) {
            for (int m : MULTIPLES) {
                BigDecimal step = BigDecimal.valueOf(m).scaleByPowerOfTen(e);
                BigDecimal intervals = to.divide(step, 0, up).subtract(from.divide(step, 0, down));
                if (intervals.compareTo(BigDecimal.valueOf(MAX_TICKS - 1)) <= 0) {
                    return step;
                }
            }
        }
    }
}
