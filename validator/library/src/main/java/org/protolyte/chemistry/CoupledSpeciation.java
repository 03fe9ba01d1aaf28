package org.protolyte.chemistry;

import java.util.Arrays;

/**
 * With complexes the components are coupled. Each component's own species follow its free basis b_j,
 * m_s = b_j·w_s with w_s = β_s aH^p γ_j/γ_s, and a complex of several follows all of theirs,
 * m_c = β_c aH^p Π_j (γ_j b_j)^ν_cj / γ_c. The mass balances T_j = b_j Σ_s w_s + Σ_c ν_cj m_c are solved for ln b by
 * Newton's method: the Jacobian ∂T_j/∂ln b_k = δ_jk b_j Σ w + Σ_c ν_cj ν_ck m_c is symmetric and positive definite, the
 * steps are limited, and each solve starts from the last one's b.
 */
final class CoupledSpeciation implements Speciation {

    static final CoupledSpeciation INSTANCE = new CoupledSpeciation();

    /** Each mass balance met to this fraction of its total. */
    private static final double BALANCE_TOLERANCE = 1e-13;
    private static final int MAX_NEWTON_STEPS = 200;
    /** The largest step in ln b: at most a factor e² per step. */
    private static final double MAX_LOG_STEP = 2;

    private CoupledSpeciation() {
    }

    @Override
    public double[] molalities(Workspace ws, double pH) {
        PreparedProblem p = ws.p;
        int nc = p.components.length;
        double[] w = ws.w;
        double[] own = ws.perComponent;           // Σ w over each component's own species
        Arrays.fill(own, 0);
        boolean products = p.powered;
        if (products) {                           // powers of aH, not one exponential per species
            ws.fillPowers(pH);
            for (int i = 0; i < p.n; i++) {
                if (p.complexParts[i] == null) {
                    w[i] = ws.complexWeight[i] * ws.powers[p.protons[i]];
                    own[p.comp[i]] += w[i];
                }
            }
            for (int j = 0; j < nc && products; j++) {
                products = own[j] == 0 && ws.total[j] <= 0 && !p.open(j)
                        || own[j] > Double.MIN_NORMAL && own[j] < Double.MAX_VALUE;
            }
            if (!products) {
                Arrays.fill(own, 0);
            }
        }
        if (!products) {
            for (int i = 0; i < p.n; i++) {
                if (p.complexParts[i] == null) {
                    int j = p.comp[i];
                    w[i] = Math.exp(Thermo.LN10 * (p.log10Beta[i] - p.protons[i] * pH + ws.log10GammaComponent[j]
                            - ws.log10Gamma[i]));
                    own[j] += w[i];
                }
            }
        }
        double[] b = ws.freeBasis;
        int[] unknown = ws.unknown;               // the coupled components solved for, as indices into b
        int u = 0;
        for (int j = 0; j < nc; j++) {
            if (p.open(j)) {
                b[j] = p.fixedMolality[j] / w[p.fixedIndex[j]];
            } else if (ws.total[j] <= 0) {
                b[j] = 0;
            } else if (!p.coupledComponent[j]) {
                b[j] = ws.total[j] / own[j];      // in no complex: its own species share its total
            } else {
                unknown[u++] = j;
                if (!(b[j] > 0) || !Double.isFinite(b[j])) {
                    b[j] = ws.total[j] / own[j];
                }
            }
        }
        int[] position = ws.position;
        Arrays.fill(position, -1);
        for (int q = 0; q < u; q++) {
            position[unknown[q]] = q;
        }
        double[] m = ws.m;
        double[] residual = ws.residual;
        double[][] jacobian = ws.jacobian;
        for (int iteration = 0; u > 0; iteration++) {
            complexesFromBasis(ws, pH, products);
            for (int q = 0; q < u; q++) {
                int j = unknown[q];
                residual[q] = b[j] * own[j] - ws.total[j];
            }
            for (int c : p.complexIndex) {
                for (int x = 0; x < p.complexParts[c].length; x++) {
                    int row = position[p.complexParts[c][x]];
                    if (row >= 0) {
                        residual[row] += p.complexCounts[c][x] * m[c];
                    }
                }
            }
            double worst = 0;
            for (int q = 0; q < u; q++) {
                // each balance relative to its total: rows of order one, whatever the concentrations
                residual[q] /= ws.total[unknown[q]];
                worst = Math.max(worst, Math.abs(residual[q]));
            }
            if (worst < BALANCE_TOLERANCE) {
                break;
            }
            if (iteration == MAX_NEWTON_STEPS) {
                throw new IndeterminateException(Caveat.indeterminate("complexation-not-converged",
                        "the mass balances of the complexes did not converge"));
            }
            for (int q = 0; q < u; q++) {
                Arrays.fill(jacobian[q], 0, u, 0);
                int j = unknown[q];
                jacobian[q][q] = b[j] * own[j];
            }
            for (int c : p.complexIndex) {
                for (int x = 0; x < p.complexParts[c].length; x++) {
                    int row = position[p.complexParts[c][x]];
                    if (row < 0) {
                        continue;
                    }
                    for (int y = 0; y < p.complexParts[c].length; y++) {
                        int col = position[p.complexParts[c][y]];
                        if (col >= 0) {
                            jacobian[row][col] += p.complexCounts[c][x] * p.complexCounts[c][y] * m[c];
                        }
                    }
                }
            }
            for (int q = 0; q < u; q++) {
                double t = ws.total[unknown[q]];
                for (int k = 0; k < u; k++) {
                    jacobian[q][k] /= t;
                }
            }
            double[] step = LinearSolve.inPlace(jacobian, residual, u);
            double largest = 0;
            for (int q = 0; q < u; q++) {
                largest = Math.max(largest, Math.abs(step[q]));
            }
            double scale = largest > MAX_LOG_STEP ? MAX_LOG_STEP / largest : 1;
            for (int q = 0; q < u; q++) {
                b[unknown[q]] *= Math.exp(-scale * step[q]);
            }
        }
        if (u == 0) {
            complexesFromBasis(ws, pH, products);
        }
        for (int i = 0; i < p.n; i++) {
            if (p.complexParts[i] == null) {
                m[i] = b[p.comp[i]] * w[i];
            }
        }
        return m;
    }

    /** The complexes' molalities from the free bases b: products of powers where they hold for this pH, else logs. */
    private static void complexesFromBasis(Workspace ws, double pH, boolean products) {
        PreparedProblem p = ws.p;
        double[] m = ws.m;
        for (int c : p.complexIndex) {
            if (products) {
                double x = ws.complexWeight[c] * ws.powers[p.protons[c]];
                for (int q = 0; q < p.complexParts[c].length; q++) {
                    double bj = ws.freeBasis[p.complexParts[c][q]];
                    for (int r = 0; r < p.complexCounts[c][q]; r++) {
                        x *= bj;
                    }
                }
                m[c] = x;
                continue;
            }
            double log = p.log10Beta[c] - p.protons[c] * pH - ws.log10Gamma[c];
            boolean absent = false;
            for (int q = 0; q < p.complexParts[c].length; q++) {
                int j = p.complexParts[c][q];
                absent |= !(ws.freeBasis[j] > 0);
                log += p.complexCounts[c][q] * (ws.log10GammaComponent[j] + Math.log10(ws.freeBasis[j]));
            }
            m[c] = absent ? 0 : Math.exp(Thermo.LN10 * log);
        }
    }

    /**
     * β/ln10 = −(df/dpH)/ln10 with every mass balance held, by implicit differentiation at fixed γ. At fixed free bases
     * ∂m_s/∂pH = −ln10·p_s·m_s; the bases follow from J·(d ln b/dpH) = ln10·(Σ_s ν_sj p_s m_s)_j with
     * J_jk = Σ_s ν_sj ν_sk m_s (a component in no complex on its own: J = T_j; an open one: d ln b/dpH = ln10·p of its
     * fixed species). Then df/dpH = −ln10 (mH + mOH + Σ z_s p_s m_s) + Σ_k (Σ_s z_s ν_sk m_s) d ln b_k/dpH.
     */
    @Override
    public double bufferSum(Workspace ws, double pH) {
        PreparedProblem p = ws.p;
        int nc = p.components.length;
        int[] position = ws.sumPosition;          // index in the coupled block, or −1
        int u = positions(p, ws.total, position);
        double[] rhs = ws.sumRhs;
        double[] chargeWeight = ws.sumCharge;
        double[] diagonal = ws.sumDiagonal;
        double[][] block = ws.sumBlock;
        double direct = accumulate(p, ws.m, ws.hydrogen(pH) + ws.hydroxide(pH), position, u, rhs, chargeWeight,
                diagonal, block);
        double[] d = ws.basisSlope;               // d ln b_j/dpH, divided by ln10
        Arrays.fill(d, 0);
        double[] y = ws.sumY;
        for (int j = 0; j < nc; j++) {
            if (p.open(j)) {
                d[j] = p.protons[p.fixedIndex[j]];
            } else if (position[j] >= 0) {
                block[position[j]][position[j]] = diagonal[j];
                y[position[j]] = rhs[j];
            } else if (diagonal[j] > 0) {
                d[j] = rhs[j] / diagonal[j];      // in no complex: its own balance alone
            }
        }
        if (u > 0) {
            LinearSolve.inPlace(block, y, u);
            for (int j = 0; j < nc; j++) {
                if (position[j] >= 0) {
                    d[j] = y[position[j]];
                }
            }
        }
        double sum = direct;
        for (int k = 0; k < nc; k++) {
            sum -= chargeWeight[k] * d[k];
        }
        return sum;
    }

    /** Each closed coupled component present gets its index in the block; returns how many. */
    static int positions(PreparedProblem p, double[] total, int[] position) {
        int u = 0;
        for (int j = 0; j < p.components.length; j++) {
            position[j] = p.coupledComponent[j] && !p.open(j) && total[j] > 0 ? u++ : -1;
        }
        return u;
    }

    /**
     * The sums of {@link #bufferSum}, all linear in the molalities {@code x} (so the same code gives their slopes from
     * the slopes of x): per component Σ_s ν_sj p_s x_s (rhs), Σ_s z_s ν_sj x_s, Σ_s ν_sj² x_s, the coupled block's
     * off-diagonal Σ_s ν_sj ν_sk x_s; returns {@code start} + Σ_s z_s p_s x_s.
     */
    static double accumulate(PreparedProblem p, double[] x, double start, int[] position, int u, double[] rhs,
                             double[] chargeWeight, double[] diagonal, double[][] block) {
        Arrays.fill(rhs, 0);
        Arrays.fill(chargeWeight, 0);
        Arrays.fill(diagonal, 0);
        for (int q = 0; q < u; q++) {
            Arrays.fill(block[q], 0, u, 0);
        }
        double direct = start;
        for (int i = 0; i < p.n; i++) {
            direct += p.charge[i] * p.protons[i] * x[i];
            if (p.complexParts[i] == null) {
                int j = p.comp[i];
                rhs[j] += p.protons[i] * x[i];
                chargeWeight[j] += p.charge[i] * x[i];
                diagonal[j] += x[i];
                continue;
            }
            int[] parts = p.complexParts[i];
            int[] counts = p.complexCounts[i];
            for (int a = 0; a < parts.length; a++) {
                int j = parts[a];
                rhs[j] += counts[a] * p.protons[i] * x[i];
                chargeWeight[j] += p.charge[i] * counts[a] * x[i];
                diagonal[j] += counts[a] * counts[a] * x[i];
                for (int b = 0; b < parts.length; b++) {
                    int k = parts[b];
                    if (position[j] >= 0 && position[k] >= 0 && k != j) {
                        block[position[j]][position[k]] += counts[a] * counts[b] * x[i];
                    } else if (position[j] >= 0 && p.open(k)) {
                        // an open component's slope is known: its column moves to the right-hand side
                        rhs[j] -= counts[a] * counts[b] * x[i] * p.protons[p.fixedIndex[k]];
                    }
                }
            }
        }
        return direct;
    }
}
