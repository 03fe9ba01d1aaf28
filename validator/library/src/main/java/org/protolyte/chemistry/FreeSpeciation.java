package org.protolyte.chemistry;

import java.util.Arrays;

/**
 * Species of one component each: w_s = β_s/γ_s · aH^p_s and m_s = T_C · w_s / Σ_C w (γ of the free component cancels);
 * an open component is scaled from its species held fixed. Products of powers of aH, not one exponential per species;
 * log space where a component's weights leave the range of a double.
 */
final class FreeSpeciation implements Speciation {

    static final FreeSpeciation INSTANCE = new FreeSpeciation();

    private FreeSpeciation() {
    }

    @Override
    public double[] molalities(Workspace ws, double pH) {
        PreparedProblem p = ws.p;
        if (!p.linear) {
            return logMolalities(ws, pH);
        }
        ws.fillPowers(pH);
        double[] w = ws.w;
        double[] sum = ws.perComponent;
        Arrays.fill(sum, 0);
        for (int i = 0; i < p.n; i++) {
            w[i] = ws.betaOverGamma[i] * ws.powers[p.protons[i]];
            sum[p.comp[i]] += w[i];
        }
        for (int j = 0; j < p.components.length; j++) {
            double d = p.open(j) ? w[p.fixedIndex[j]] : sum[j];
            if (!(d > Double.MIN_NORMAL && d < Double.MAX_VALUE)) {
                return logMolalities(ws, pH);
            }
        }
        return share(ws, w, sum);
    }

    /** The same in log space, each component scaled by its largest weight: safe at any pH. */
    private static double[] logMolalities(Workspace ws, double pH) {
        PreparedProblem p = ws.p;
        double[] maxLog = ws.perComponentMax;
        Arrays.fill(maxLog, Double.NEGATIVE_INFINITY);
        double[] w = ws.w;
        for (int i = 0; i < p.n; i++) {
            w[i] = p.log10Beta[i] - p.protons[i] * pH - ws.log10Gamma[i];
            maxLog[p.comp[i]] = Math.max(maxLog[p.comp[i]], w[i]);
        }
        double[] sum = ws.perComponent;
        Arrays.fill(sum, 0);
        for (int i = 0; i < p.n; i++) {
            w[i] = Math.exp(Thermo.LN10 * (w[i] - maxLog[p.comp[i]]));
            sum[p.comp[i]] += w[i];
        }
        return share(ws, w, sum);
    }

    /** Closed: the component's total is shared out by the weights; open: scaled from the species held fixed. */
    private static double[] share(Workspace ws, double[] w, double[] sum) {
        PreparedProblem p = ws.p;
        double[] m = ws.m;
        for (int i = 0; i < p.n; i++) {
            int j = p.comp[i];
            m[i] = p.open(j) ? p.fixedMolality[j] * w[i] / w[p.fixedIndex[j]] : ws.total[j] * w[i] / sum[j];
        }
        return m;
    }

    @Override
    public double bufferSum(Workspace ws, double pH) {
        BufferCapacity.componentTerms(ws);
        double sum = ws.hydrogen(pH) + ws.hydroxide(pH);
        for (double t : ws.term) {
            sum += t;
        }
        return sum;
    }
}
