package org.protolyte.chemistry;

import java.util.Arrays;

/**
 * The buffer capacity's parts from the working molalities (see {@link Equilibrium} for β itself, which each
 * {@link Speciation} path sums): each component's own term, and the slope of the ionic strength with the pH that the
 * coupled pH–I Newton steps use.
 */
final class BufferCapacity {

    private BufferCapacity() {
    }

    /**
     * Each component's term of β/ln10 into {@link Workspace#term}, a complex counted with the component it is shown
     * under (its ligand, as many times as it holds it): closed, Σ m_s (p_s − p̄)²; open (fixed species f),
     * Σ z_s (p_s − p_f) m_s, as CO2 enters or leaves. Without complexes these terms are the buffer capacity; with them,
     * each component's part of it for the report (a borate–polyol ester's proton exchange is borate's). Leaves p̄ in
     * {@link Workspace#perComponent}.
     */
    static void componentTerms(Workspace ws) {
        PreparedProblem p = ws.p;
        double[] m = ws.m;
        double[] meanP = ws.perComponent;
        Arrays.fill(meanP, 0);
        double[] own = ws.perComponentMax;
        Arrays.fill(own, 0);
        for (int i = 0; i < p.n; i++) {
            own[p.comp[i]] += p.homeCount(i) * m[i];
        }
        for (int i = 0; i < p.n; i++) {
            int j = p.comp[i];
            if (own[j] > 0) {
                meanP[j] += p.protons[i] * p.homeCount(i) * m[i] / own[j];
            }
        }
        double[] term = ws.term;
        Arrays.fill(term, 0);
        for (int i = 0; i < p.n; i++) {
            int j = p.comp[i];
            if (p.open(j)) {
                if (p.complexParts[i] == null) {
                    term[j] += p.charge[i] * (p.protons[i] - p.protons[p.fixedIndex[j]]) * m[i];
                }
            } else {
                double d = p.protons[i] - meanP[j];
                term[j] += p.homeCount(i) * m[i] * d * d;
            }
        }
    }

    /**
     * dI/dpH at fixed activity coefficients, from the state the last {@link Speciation#bufferSum} left: each species
     * moves as d ln m_s/dpH = ln10 (Σ_j ν_sj d_j − p_s), d_j the slope of its component's free basis (log10 per pH;
     * without complexes the mean bound protons p̄_j of a closed component, p_f of an open one), so
     * dI/dpH = ½ ln10 (mOH − mH + Σ_s z_s² m_s (Σ_j ν_sj d_j − p_s)).
     */
    static double ionicStrengthSlope(Workspace ws, double pH) {
        PreparedProblem p = ws.p;
        double[] m = ws.m;
        double sum = ws.hydroxide(pH) - ws.hydrogen(pH);
        for (int i = 0; i < p.n; i++) {
            double d;
            if (p.complexParts[i] != null) {
                d = 0;
                for (int q = 0; q < p.complexParts[i].length; q++) {
                    d += p.complexCounts[i][q] * ws.basisSlope[p.complexParts[i][q]];
                }
            } else if (p.complexes) {
                d = ws.basisSlope[p.comp[i]];
            } else {
                int j = p.comp[i];
                d = p.open(j) ? p.protons[p.fixedIndex[j]] : ws.perComponent[j];    // componentTerms leaves p̄ there
            }
            sum += (double) p.ionCharge[i] * p.ionCharge[i] * m[i] * (d - p.protons[i]);
        }
        return 0.5 * Thermo.LN10 * sum;
    }
}
