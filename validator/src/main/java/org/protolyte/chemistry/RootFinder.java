package org.protolyte.chemistry;

/**
 * The one root finder of the searches on a prepared problem (a q.s. dose, a load of strong acid or base, a CO2 level):
 * Newton steps with the analytic slope, each kept inside the bracket that the signs so far prove, bisection wherever a
 * step would leave it or no slope is known. The function must change sign once in [lo, hi]; the caller proves that.
 *
 * <p>Tolerance policy: settled when |f| is below {@code fTolerance} (for a pH goal 1e-10, a thousandth of what any
 * report prints), or when a step or the bracket is below {@code xTolerance}.
 */
public final class RootFinder {

    /** A function of one variable that also knows its slope at the point it last evaluated. */
    public interface Function {
        double value(double x);

        /** df/dx at the last x given to {@link #value}; NaN where none is known (a bisection step follows). */
        double slope();
    }

    private static final int MAX_STEPS = 100;

    private RootFinder() {
    }

    /**
     * The root between lo and hi, where f(lo) has the sign of {@code fLo} and f(hi) the other, starting from
     * {@code start} (between them, or one of them).
     *
     * @throws IndeterminateException where it does not settle
     */
    public static double solve(Function f, double lo, double fLo, double hi, double start, double xTolerance,
                               double fTolerance) {
        double x = start;
        for (int i = 0; i < MAX_STEPS; i++) {
            double fx = f.value(x);
            if (Math.abs(fx) < fTolerance) {
                return x;
            }
            if (Math.signum(fx) == Math.signum(fLo)) {
                lo = x;
            } else {
                hi = x;
            }
            double next = x - fx / f.slope();
            if (!(next > Math.min(lo, hi) && next < Math.max(lo, hi))) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - x) < xTolerance || Math.abs(hi - lo) < xTolerance) {
                return next;
            }
            x = next;
        }
        throw new IndeterminateException(Caveat.indeterminate("search-not-converged",
                "the search did not settle in " + MAX_STEPS + " steps"));
    }
}
