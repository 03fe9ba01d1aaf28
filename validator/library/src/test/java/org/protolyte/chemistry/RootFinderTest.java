package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.DoubleUnaryOperator;

import org.junit.jupiter.api.Test;

/** The one root finder: Newton inside a proven bracket, bisection without a slope, and no root where none is proven. */
class RootFinderTest {

    /** f and its slope from closed forms; counts the evaluations. */
    private static final class Counted implements RootFinder.Function {
        private final DoubleUnaryOperator f;
        private final DoubleUnaryOperator df;
        private double slope;
        int calls;

        Counted(DoubleUnaryOperator f, DoubleUnaryOperator df) {
            this.f = f;
            this.df = df;
        }

        @Override
        public double value(double x) {
            calls++;
            slope = df == null ? Double.NaN : df.applyAsDouble(x);
            return f.applyAsDouble(x);
        }

        @Override
        public double slope() {
            return slope;
        }
    }

    /** A titration-like curve: pH of a strong base dosed into water at 25 °C, goal 10; exact root x = 1e-4 − 1e-10. */
    @Test
    void newtonFindsTheRootOfAStrongBaseCurve() {
        // pH = 14 + log10(x/2 + sqrt(x²/4 + 1e-14)) (charge balance of NaOH in water, Kw = 1e-14, ideal)
        DoubleUnaryOperator pH = x -> 14 + Math.log10(x / 2 + Math.sqrt(x * x / 4 + 1e-14));
        DoubleUnaryOperator slope = x -> 1 / Math.log(10) * 0.5 * (1 + x / 2 / Math.sqrt(x * x / 4 + 1e-14))
                / (x / 2 + Math.sqrt(x * x / 4 + 1e-14));
        Counted f = new Counted(x -> pH.applyAsDouble(x) - 10, slope);
        double root = RootFinder.solve(f, 0, pH.applyAsDouble(0) - 10, 1, pH.applyAsDouble(1) - 10, 0);
        // [OH-] − [H+] = x at pH 10: 1e-4 − 1e-10 (derived); |pH − 10| < 1e-10 places x within 1e-10 / (dpH/dx)
        assertEquals(1e-4 - 1e-10, root, RootFinder.PH_TOLERANCE / slope.applyAsDouble(1e-4));
        assertTrue(f.calls < 60, "bracketed Newton settles in far fewer steps than the limit: " + f.calls);
    }

    @Test
    void withoutASlopeItBisects() {
        Counted f = new Counted(x -> x * x * x - 2, null);
        double root = RootFinder.solve(f, 0, -2, 2, 6, 1);
        assertEquals(Math.cbrt(2), root, 1e-9);
    }

    @Test
    void aBracketWithoutASignChangeHasNoRoot() {
        Counted f = new Counted(x -> x * x + 1, x -> 2 * x);
        IndeterminateException e = assertThrows(IndeterminateException.class,
                () -> RootFinder.solve(f, -1, 2, 1, 2, 0));
        assertEquals("search-no-root", e.caveat().code());
        assertEquals(0, f.calls, "nothing evaluated for a bracket that holds no root");
    }

    @Test
    void anEndThatMeetsTheGoalIsTheRoot() {
        Counted f = new Counted(x -> x - 3, x -> 1);
        assertEquals(3, RootFinder.solve(f, 3, 0, 5, 2, 4));
        assertEquals(5, RootFinder.solve(f, 1, -2, 5, 1e-11, 4));
    }

    @Test
    void aStepSettlesByItsPlaceAndANaNFails() {
        // a step at x = 1 that the bracket closes on without |f| ever falling below the tolerance: settles by x
        Counted step = new Counted(x -> x < 1 ? -1 : 1, x -> 0);
        assertEquals(1, RootFinder.solve(step, 0, -1, 2, 1, 0.5), 1e-14);
        // a value that is not a number fails the search at once, rather than bisect to an end
        Counted nan = new Counted(x -> Double.NaN, x -> Double.NaN);
        IndeterminateException e = assertThrows(IndeterminateException.class,
                () -> RootFinder.solve(nan, 0, -1, 2, 1, 0.5));
        assertEquals("search-not-a-number", e.caveat().code());
        assertEquals(1, nan.calls);
    }
}
