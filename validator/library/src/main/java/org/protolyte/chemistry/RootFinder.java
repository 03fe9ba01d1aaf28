package org.protolyte.chemistry;

/**
 * The one root finder of the searches on a prepared problem (a q.s. dose, a load of strong acid or base, a CO2 level,
 * a batch's dose to its meter reading): Newton steps with the analytic slope, each kept inside the bracket that the
 * signs so far prove, bisection wherever a step would leave it or no slope is known.
 *
 * <p>Tolerance policy, the same for every search: settled when |f| is below {@link #PH_TOLERANCE} (every function
 * searched is a pH minus its goal; 1e-10 is a millionth of the smallest pH step any report prints), or when a step
 * or the bracket is below {@link #RELATIVE_X_TOLERANCE} of the initial bracket's width (then the root is located to
 * the resolution of a double, whatever f's units). The caller gives f at both ends; where they have the same sign the
 * bracket holds no root and the search fails at once: it never returns the end of a bracket as if it were the answer.
 */
public final class RootFinder {

    /** |f| that settles a search, pH units. */
    public static final double PH_TOLERANCE = 1e-10;
    /** A step or bracket smaller than this part of the initial bracket settles a search. */
    public static final double RELATIVE_X_TOLERANCE = 1e-15;

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
     * The root between lo and hi, where f is {@code fLo} and {@code fHi} and changes sign once, starting from
     * {@code start} (between them, or one of them).
     *
     * @throws IndeterminateException where f has the same sign at both ends, or the search does not settle
     */
    public static double solve(Function f, double lo, double fLo, double hi, double fHi, double start) {
        if (Math.abs(fLo) < PH_TOLERANCE) {
            return lo;
        }
        if (Math.abs(fHi) < PH_TOLERANCE) {
            return hi;
        }
        if (!(Math.signum(fLo) * Math.signum(fHi) < 0)) {
            throw new IndeterminateException(Caveat.indeterminate("search-no-root",
                    "the goal lies outside the range searched"));
        }
        double xTolerance = RELATIVE_X_TOLERANCE * Math.abs(hi - lo);
        double x = start;
        for (int i = 0; i < MAX_STEPS; i++) {
            double fx = f.value(x);
            if (Double.isNaN(fx)) {
                throw new IndeterminateException(Caveat.indeterminate("search-not-a-number",
                        "the search met a state with no pH at " + x));
            }
            if (Math.abs(fx) < PH_TOLERANCE) {
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
