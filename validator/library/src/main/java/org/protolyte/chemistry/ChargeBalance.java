package org.protolyte.chemistry;

import java.util.Locale;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;

/**
 * The charge balance f(pH) = Σ z_s m_s + mH − mOH at the workspace's totals and activity coefficients, and its one
 * root: f falls strictly with pH (df/dpH = −β &lt; 0), so a bracket on pH holds exactly one root if any.
 */
final class ChargeBalance {

    static final double PH_LOW = -2;
    static final double PH_HIGH = 16;
    /** The pH root is settled when a Newton step or the bracket is smaller than this. */
    static final double PH_TOLERANCE = 1e-13;
    private static final int MAX_STEPS = 200;

    private ChargeBalance() {
    }

    /** f at this pH; fills the workspace's molalities. */
    static double value(Workspace ws, double pH) {
        PreparedProblem p = ws.p;
        double[] m = p.speciation.molalities(ws, pH);
        double f = Math.pow(10, -pH - ws.log10GammaH) - p.kw * Math.pow(10, pH - ws.log10GammaOH);
        for (int i = 0; i < p.n; i++) {
            f += p.charge[i] * m[i];
        }
        return f;
    }

    /**
     * The root in [PH_LOW, PH_HIGH]: Newton steps with the analytic slope df/dpH = −ln10·(β/ln10 at fixed γ), each
     * kept inside the bracket that the signs so far prove, and bisection wherever a step would leave it. A warm
     * {@code guess} proves the whole bracket only once a step leaves its neighbourhood. Brent's method is the fallback
     * should that ever fail to settle.
     */
    static double root(Workspace ws, double guess) {
        double lo = PH_LOW;
        double hi = PH_HIGH;
        boolean warm = Double.isFinite(guess) && guess > lo && guess < hi;
        if (!warm) {
            checkBracket(ws);
        }
        double x = warm ? guess : 7;
        for (int i = 0; i < MAX_STEPS; i++) {
            double f = value(ws, x);
            if (f == 0) {
                return x;
            }
            if (f > 0) {
                lo = x;
            } else {
                hi = x;
            }
            double slope = -Thermo.LN10 * ws.p.speciation.bufferSum(ws, x);
            double next = x - f / slope;
            if (Math.abs(next - x) < PH_TOLERANCE) {
                return next;                    // converged (next may sit on the bracket's edge x)
            }
            if (!(next > lo && next < hi)) {
                if (warm && (lo == PH_LOW || hi == PH_HIGH)) {
                    checkBracket(ws);           // leaving the warm start's neighbourhood: prove the bracket once
                    warm = false;
                }
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - x) < PH_TOLERANCE || hi - lo < PH_TOLERANCE) {
                return next;
            }
            x = next;
        }
        checkBracket(ws);
        try {
            return new BrentSolver(1e-14, 1e-12).solve(500, x1 -> value(ws, x1), PH_LOW, PH_HIGH);
        } catch (MathIllegalStateException e) {
            throw new IndeterminateException(Caveat.indeterminate("no-convergence",
                    "the charge balance did not converge: " + e.getMessage()));
        }
    }

    private static void checkBracket(Workspace ws) {
        if (!(value(ws, PH_LOW) > 0 && value(ws, PH_HIGH) < 0)) {
            throw new IndeterminateException(Caveat.indeterminate("no-root", String.format(Locale.ROOT,
                    "the charge balance has no root between pH %.0f and %.0f", PH_LOW, PH_HIGH)));
        }
    }
}
