package org.protolyte.chemistry;

import java.util.Map;

/**
 * Derivatives of a solved, self-consistent state by implicit differentiation (the implicit function theorem), not by
 * solving again. The state is the root of two equations in pH and I, the species following from the mass balances at
 * the activity coefficients of I:
 * <pre>
 *   F = Σ z_s m_s + mH − mOH = 0,     G = I − ½ (Σ z_s² m_s + mH + mOH) = 0
 * </pre>
 * A change of a constant or an amount, θ, moves the species at fixed pH and I by dm/dθ (one linear solve of the mass
 * balances, {@link #tangent}); then [F_pH F_I; G_pH G_I]·(dpH, dI) = −(F_θ, G_θ), and every figure that is a function
 * of the molalities follows: dm = dm/dθ + dm/dpH·dpH + dm/dI·dI, and the buffer capacity by differentiating its own
 * formula along dm ({@link CoupledSpeciation#bufferSum}, whose sums are linear in m).
 *
 * <p>At fixed b (the free basis of each component), ln m_s = ln β_s − p_s ln10·pH + Σ_j ν_sj (ln γ_j + ln b_j) − ln γ_s.
 * A closed component's balance T_j = Σ_s ν_sj m_s gives Σ_k J_jk d ln b_k = dT_j − Σ_s ν_sj m_s g_s with
 * J_jk = Σ_s ν_sj ν_sk m_s, g_s the change of ln m_s at fixed b; an open component's b follows its fixed species.
 * Immutable: a snapshot of the state.
 */
public final class Derivatives {

    /** The response of a state to a change: pH, ionic strength (mol/kg) and buffer capacity (mol/kg per pH). */
    public record Response(double pH, double ionicStrength, double bufferCapacity) {
    }

    private final PreparedProblem p;
    private final double[] m;
    private final double[] total;
    private final double mH;
    private final double mOH;
    private final double ionicStrength;
    private final double[] speciesSlope;     // ln10 · d log10 γ_s / dI
    private final double[] componentSlope;   // ln10 · d log10 γ_j / dI of each component's free basis
    private final double hydrogenSlope;
    private final double hydroxideSlope;
    /**
     * Pitzer's composition terms: at most this many refinements, relaxed after the first ones, settled where a step
     * moves them by less than this fraction (the central difference leaves noise below that).
     */
    private static final int MAX_REFINEMENTS = 200;
    private static final int UNRELAXED_REFINEMENTS = 20;
    private static final double REFINED = 1e-7;
    /** The central difference moves no molality by more than this fraction of itself. */
    private static final double DIFFERENCE = 1e-4;
    private final double[] ionM;
    private final double[] ionLn;
    private final Tangent byPH;
    private final Tangent byI;
    private final double determinant;
    // the buffer capacity's sums at the state (see bufferSumAtState)
    private final int[] position;
    private final int blockSize;
    private final double[] charge;
    private final double[] diagonal;
    private final double[][] block;
    private final double[] basisSlope;

    /** The species' changes at fixed pH and I, and what they do to F and Q = ½ Σ z² m. */
    private record Tangent(double[] dm, double dmH, double dmOH, double f, double q) {
    }

    Derivatives(Workspace ws, double pH, double ionicStrength) {
        p = ws.p;
        m = p.speciation.molalities(ws, pH).clone();
        total = ws.total.clone();
        mH = ws.hydrogen(pH);
        mOH = ws.hydroxide(pH);
        this.ionicStrength = ionicStrength;
        ionM = new double[p.interactions == null ? 0 : p.interactions.ions];
        ionLn = new double[ionM.length];
        speciesSlope = new double[p.n];
        for (int i = 0; i < p.n; i++) {
            speciesSlope[i] = Thermo.LN10 * p.activity.log10GammaSlope(p.ionCharge[i], ionicStrength, p.debyeHuckelA);
        }
        componentSlope = new double[p.components.length];
        for (int j = 0; j < componentSlope.length; j++) {
            componentSlope[j] = Thermo.LN10 * p.activity.log10GammaSlope(p.componentIonCharge[j], ionicStrength,
                    p.debyeHuckelA);
        }
        int nc = total.length;
        position = new int[nc];
        blockSize = CoupledSpeciation.positions(p, total, position);
        charge = new double[nc];
        diagonal = new double[nc];
        block = new double[blockSize][blockSize];
        basisSlope = new double[nc];
        bufferSumAtState();
        hydrogenSlope = Thermo.LN10 * p.activity.log10GammaSlope(1, ionicStrength, p.debyeHuckelA);
        hydroxideSlope = Thermo.LN10 * p.activity.log10GammaSlope(-1, ionicStrength, p.debyeHuckelA);
        double[] g = new double[p.n];
        for (int i = 0; i < p.n; i++) {
            g[i] = -Thermo.LN10 * p.protons[i];
        }
        byPH = tangent(g, new double[total.length], -Thermo.LN10, Thermo.LN10, 0);
        for (int i = 0; i < p.n; i++) {
            g[i] = p.overParts(i, componentSlope) - speciesSlope[i];
        }
        byI = tangent(g, new double[total.length], -hydrogenSlope, -hydroxideSlope, 0);
        // [F_pH F_I; G_pH G_I] with G = I − Q
        determinant = byPH.f() * (1 - byI.q()) + byI.f() * byPH.q();
        if (!(Math.abs(determinant) > 0) || !Double.isFinite(determinant)) {
            throw new IndeterminateException(Caveat.indeterminate("derivatives-singular",
                    "the derivatives of this state cannot be computed: its balances are singular"));
        }
    }

    /** The components, in the order {@link #totals} takes their changes. */
    public java.util.List<Component> components() {
        return java.util.List.of(p.components);
    }

    /** The response to raising the log β of some species by the amounts given (per unit of the change). */
    public Response logBeta(Map<Species, Double> shifts) {
        double[] g = new double[p.n];
        for (Map.Entry<Species, Double> e : shifts.entrySet()) {
            Integer i = p.speciesIndex.get(e.getKey());
            if (i != null) {
                g[i] += Thermo.LN10 * e.getValue();
            }
        }
        return respond(g, new double[total.length], 0, 0, 0);
    }

    /**
     * The activity model's systematic error: the response to raising log10 γ of every ion by its standard uncertainty
     * ({@link Interactions#uncertainty}; with Davies alone, z² times its disagreement with Pitzer,
     * {@link IonInteraction#daviesDisagreement}).
     */
    public Response activityModel() {
        int nc = total.length;
        double[] us = new double[p.n];
        double[] uc = new double[nc];
        double[] uw = new double[2];
        activityUncertainty(us, uc, uw);
        return gammaRaised(us, uc, uw);
    }

    /**
     * The response to raising log10 γ of the species, the components' free bases and {H+, OH-} by these amounts:
     * d ln m_s = ln10 (Σ_j ν_sj u_j − u_s), d ln mH = −ln10 u_H (pH is −log a_H), d ln mOH = −ln10 u_OH.
     */
    private Response gammaRaised(double[] us, double[] uc, double[] uw) {
        double[] g = new double[p.n];
        for (int i = 0; i < p.n; i++) {
            g[i] = Thermo.LN10 * (p.overParts(i, uc) - us[i]);
        }
        return respond(g, new double[total.length], -Thermo.LN10 * uw[0], -Thermo.LN10 * uw[1], 0);
    }

    /**
     * The response to one Pitzer pair without published temperature terms moved to the edge of what their bound allows
     * at this temperature ({@link Interactions#pairShift}); none where the pair is not used here.
     */
    public Response pitzerPair(String cation, String anion) {
        int nc = total.length;
        double[] us = new double[p.n];
        double[] uc = new double[nc];
        double[] uw = new double[2];
        if (p.interactions == null
                || !p.interactions.pairShift(cation, anion, m, mH, mOH, ionM, ionLn, us, uc, uw)) {
            return new Response(0, 0, 0);
        }
        return gammaRaised(us, uc, uw);
    }

    /** The standard uncertainty of log10 γ per unit z² behind {@link #activityModel}, of the ions with parameters. */
    public double activityModelUncertainty() {
        return activityUncertainty(new double[p.n], new double[total.length], new double[2]);
    }

    private double activityUncertainty(double[] us, double[] uc, double[] uw) {
        if (p.interactions != null) {
            return p.interactions.uncertainty(m, mH, mOH, ionM, ionLn, us, uc, uw);
        }
        double d = IonInteraction.daviesDisagreement(ionicStrength);
        for (int i = 0; i < p.n; i++) {
            us[i] = p.ionCharge[i] * p.ionCharge[i] * d;
        }
        for (int j = 0; j < uc.length; j++) {
            uc[j] = p.componentIonCharge[j] * p.componentIonCharge[j] * d;
        }
        uw[0] = d;
        uw[1] = d;
        return d;
    }

    /** The response to raising ln of every molality held by a gas phase by one (ln of the partial pressure). */
    public Response fixedScaled() {
        return respond(new double[p.n], new double[total.length], 0, 0, 1);
    }

    /** The response to raising pKw by one: Kw tenfold smaller. */
    public Response pKw() {
        return respond(new double[p.n], new double[total.length], 0, -Thermo.LN10, 0);
    }

    /** The response to changing the components' totals by {@code dTotals} (mol/kg, in the prepared order). */
    public Response totals(double[] dTotals) {
        if (dTotals.length != total.length) {
            throw new IllegalArgumentException("expected " + total.length + " totals, got " + dTotals.length);
        }
        return respond(new double[p.n], dTotals, 0, 0, 0);
    }

    /**
     * The response to sources at fixed activity coefficients, with Pitzer's composition terms ({@link Interactions})
     * followed: they move with the molalities, so ds = (∂s/∂m)·dm is found by iteration, each step a tangent with the
     * last ds as a further source (d ln m_s = ln10 (Σ_j ν_sj ds_j − ds_s), d ln mH = −ln10 ds_H), ∂s/∂m·dm a central
     * difference along dm. It converges as the solve's own iteration of the terms does.
     */
    private Response respond(double[] g, double[] dT, double dLnH, double dLnOH, double dLnFixed) {
        Move move = response(tangent(g, dT, dLnH, dLnOH, dLnFixed));
        if (p.interactions == null || ionicStrength <= IonInteraction.FROM) {
            return move.response();     // no composition terms below the hand-over, nor a slope of them
        }
        int nc = total.length;
        double[] ds = new double[p.n];
        double[] dsComponent = new double[nc];
        double[] dsWater = new double[2];
        double[] next = new double[p.n];
        double[] nextComponent = new double[nc];
        double[] nextWater = new double[2];
        for (int k = 0; k < MAX_REFINEMENTS; k++) {
            specificAlong(move, next, nextComponent, nextWater);
            double change = Math.max(Math.abs(nextWater[0] - dsWater[0]), Math.abs(nextWater[1] - dsWater[1]));
            double size = Math.max(Math.abs(nextWater[0]), Math.abs(nextWater[1]));
            double r = k < UNRELAXED_REFINEMENTS ? 1 : 0.5;
            for (int i = 0; i < p.n; i++) {
                change = Math.max(change, Math.abs(next[i] - ds[i]));
                size = Math.max(size, Math.abs(next[i]));
                ds[i] += r * (next[i] - ds[i]);
            }
            for (int j = 0; j < nc; j++) {
                change = Math.max(change, Math.abs(nextComponent[j] - dsComponent[j]));
                dsComponent[j] += r * (nextComponent[j] - dsComponent[j]);
            }
            dsWater[0] += r * (nextWater[0] - dsWater[0]);
            dsWater[1] += r * (nextWater[1] - dsWater[1]);
            double[] g2 = g.clone();
            for (int i = 0; i < p.n; i++) {
                g2[i] += Thermo.LN10 * (p.overParts(i, dsComponent) - ds[i]);
            }
            Response before = move.response();
            move = response(tangent(g2, dT, dLnH - Thermo.LN10 * dsWater[0], dLnOH - Thermo.LN10 * dsWater[1],
                    dLnFixed));
            if (change <= REFINED * (1e-12 + size) || settled(before, move.response())) {
                return move.response();
            }
        }
        throw new IndeterminateException(Caveat.indeterminate("derivatives-not-converged",
                "the derivatives of this state cannot be computed: the activity coefficients' response did not settle"));
    }

    /**
     * A refinement that no longer moves the response, relatively or by more than 1e-12 (pH, or mol/kg, per unit of
     * the change): the central difference's noise can keep a vanishing response flickering in its last digits.
     */
    private static boolean settled(Response a, Response b) {
        return close(a.pH(), b.pH()) && close(a.ionicStrength(), b.ionicStrength())
                && close(a.bufferCapacity(), b.bufferCapacity());
    }

    private static boolean close(double a, double b) {
        return Math.abs(a - b) <= REFINED * Math.abs(b) + 1e-12;
    }

    /** (∂s/∂m)·dm of Pitzer's composition terms, by a central difference along the move. */
    private void specificAlong(Move move, double[] species, double[] component, double[] water) {
        double most = Math.max(Math.abs(move.dmH()) / mH, Math.abs(move.dmOH()) / mOH);
        for (int i = 0; i < p.n; i++) {
            if (m[i] > 0) {
                most = Math.max(most, Math.abs(move.dm()[i]) / m[i]);
            }
        }
        if (!(most > 0)) {
            java.util.Arrays.fill(species, 0);
            java.util.Arrays.fill(component, 0);
            water[0] = 0;
            water[1] = 0;
            return;
        }
        double h = DIFFERENCE / most;
        double[] up = new double[p.n];
        double[] down = new double[p.n];
        for (int i = 0; i < p.n; i++) {
            up[i] = m[i] + h * move.dm()[i];
            down[i] = m[i] - h * move.dm()[i];
        }
        int nc = total.length;
        double[] sDown = new double[p.n];
        double[] cDown = new double[nc];
        double[] wDown = new double[2];
        p.interactions.specific(up, mH + h * move.dmH(), mOH + h * move.dmOH(), ionM, ionLn, species, component,
                water);
        p.interactions.specific(down, mH - h * move.dmH(), mOH - h * move.dmOH(), ionM, ionLn, sDown, cDown, wDown);
        for (int i = 0; i < p.n; i++) {
            species[i] = (species[i] - sDown[i]) / (2 * h);
        }
        for (int j = 0; j < nc; j++) {
            component[j] = (component[j] - cDown[j]) / (2 * h);
        }
        water[0] = (water[0] - wDown[0]) / (2 * h);
        water[1] = (water[1] - wDown[1]) / (2 * h);
    }

    /** The species' changes along a response and the response itself. */
    private record Move(double[] dm, double dmH, double dmOH, Response response) {
    }

    private Move response(Tangent t) {
        // F_pH dpH + F_I dI = −F_θ;  −Q_pH dpH + (1 − Q_I) dI = Q_θ
        double dpH = (-t.f() * (1 - byI.q()) - byI.f() * t.q()) / determinant;
        double dI = (byPH.f() * t.q() - t.f() * byPH.q()) / determinant;
        double[] dm = new double[p.n];
        for (int i = 0; i < p.n; i++) {
            dm[i] = t.dm()[i] + byPH.dm()[i] * dpH + byI.dm()[i] * dI;
        }
        double dmH = t.dmH() + byPH.dmH() * dpH + byI.dmH() * dI;
        double dmOH = t.dmOH() + byPH.dmOH() * dpH + byI.dmOH() * dI;
        return new Move(dm, dmH, dmOH, new Response(dpH, dI, Thermo.LN10 * bufferSumSlope(dm, dmH + dmOH)));
    }

    /**
     * dm at fixed pH and I for sources g_s (change of ln m_s at fixed b), total changes dT and the changes of ln mH
     * and ln mOH, and of ln of the molalities held by a gas phase; with what they do to F and to
     * Q = ½ (Σ z² m + mH + mOH).
     */
    private Tangent tangent(double[] g, double[] dT, double dLnH, double dLnOH, double dLnFixed) {
        int nc = total.length;
        double[] dLnB = new double[nc];
        int[] position = new int[nc];
        java.util.Arrays.fill(position, -1);
        int u = 0;
        for (int j = 0; j < nc; j++) {
            if (p.open(j)) {
                dLnB[j] = dLnFixed - g[p.fixedIndex[j]];   // its fixed species moves only with the gas
            } else if (total[j] > 0 && p.complexes && p.coupledComponent[j]) {
                position[j] = u++;
            } else if (total[j] > 0) {
                double own = 0;
                for (int i = 0; i < p.n; i++) {
                    if (p.comp[i] == j) {
                        own += m[i] * g[i];
                    }
                }
                dLnB[j] = (dT[j] - own) / total[j];
            } else if (dT[j] != 0) {
                throw new IndeterminateException(Caveat.indeterminate("derivatives-absent-component",
                        "the derivative with respect to " + p.components[j].name() + " is not defined where it is absent"));
            }
        }
        if (u > 0) {
            double[][] jacobian = new double[u][u];
            double[] rhs = new double[u];
            for (int j = 0; j < nc; j++) {
                if (position[j] >= 0) {
                    rhs[position[j]] = dT[j];
                }
            }
            for (int i = 0; i < p.n; i++) {
                int[] parts = p.complexParts[i] == null ? new int[] {p.comp[i]} : p.complexParts[i];
                int[] counts = p.complexParts[i] == null ? new int[] {1} : p.complexCounts[i];
                for (int a = 0; a < parts.length; a++) {
                    int row = position[parts[a]];
                    if (row < 0) {
                        continue;
                    }
                    rhs[row] -= counts[a] * m[i] * g[i];
                    for (int b = 0; b < parts.length; b++) {
                        int col = position[parts[b]];
                        if (col >= 0) {
                            jacobian[row][col] += counts[a] * counts[b] * m[i];
                        } else if (p.open(parts[b])) {
                            rhs[row] -= counts[a] * counts[b] * m[i] * dLnB[parts[b]];
                        }
                    }
                }
            }
            LinearSolve.inPlace(jacobian, rhs, u);
            for (int j = 0; j < nc; j++) {
                if (position[j] >= 0) {
                    dLnB[j] = rhs[position[j]];
                }
            }
        }
        double[] dm = new double[p.n];
        double f = mH * dLnH - mOH * dLnOH;
        double q = 0.5 * (mH * dLnH + mOH * dLnOH);
        for (int i = 0; i < p.n; i++) {
            double d = g[i];
            if (p.complexParts[i] == null) {
                d += dLnB[p.comp[i]];
            } else {
                for (int a = 0; a < p.complexParts[i].length; a++) {
                    d += p.complexCounts[i][a] * dLnB[p.complexParts[i][a]];
                }
            }
            dm[i] = m[i] * d;
            f += p.charge[i] * dm[i];
            q += 0.5 * p.ionCharge[i] * p.ionCharge[i] * dm[i];
        }
        return new Tangent(dm, mH * dLnH, mOH * dLnOH, f, q);
    }

    /**
     * The change of β/ln10 along dm (and d(mH + mOH)), differentiating {@link CoupledSpeciation#bufferSum}: its sums are
     * linear in m, its basis slopes d solve A·d = y, so dd = A⁻¹(dy − dA·d), and β/ln10 = direct − Σ_k c_k d_k. The same
     * formula holds without complexes, where it equals the variance form Σ m (p − p̄)² (z − p is fixed within a system).
     */
    private double bufferSumSlope(double[] dm, double dWater) {
        int nc = total.length;
        int u = blockSize;
        double[] dRhs = new double[nc];
        double[] dCharge = new double[nc];
        double[] dDiagonal = new double[nc];
        double[][] dBlock = new double[u][u];
        double dDirect = CoupledSpeciation.accumulate(p, dm, dWater, position, u, dRhs, dCharge, dDiagonal, dBlock);
        double[] dd = new double[nc];
        for (int j = 0; j < nc; j++) {
            if (!p.open(j) && position[j] < 0 && diagonal[j] > 0) {
                dd[j] = (dRhs[j] - dDiagonal[j] * basisSlope[j]) / diagonal[j];
            } else if (position[j] >= 0) {
                dBlock[position[j]][position[j]] = dDiagonal[j];
            }
        }
        if (u > 0) {
            double[] z = new double[u];
            for (int j = 0; j < nc; j++) {
                int r = position[j];
                if (r < 0) {
                    continue;
                }
                z[r] = dRhs[j];
                for (int k = 0; k < nc; k++) {
                    if (position[k] >= 0) {
                        z[r] -= dBlock[r][position[k]] * basisSlope[k];
                    }
                }
            }
            double[][] a = new double[u][];
            for (int q = 0; q < u; q++) {
                a[q] = block[q].clone();
            }
            LinearSolve.inPlace(a, z, u);
            for (int j = 0; j < nc; j++) {
                if (position[j] >= 0) {
                    dd[j] = z[position[j]];
                }
            }
        }
        double sum = dDirect;
        for (int k = 0; k < nc; k++) {
            sum -= dCharge[k] * basisSlope[k] + charge[k] * dd[k];
        }
        return sum;
    }

    /**
     * The sums of {@link CoupledSpeciation#bufferSum} at the state, and its basis slopes d: A·d = y for the coupled
     * block, rhs/diagonal alone, the fixed species' protons for an open component. Kept for every response.
     */
    private void bufferSumAtState() {
        int nc = total.length;
        double[] rhs = new double[nc];
        CoupledSpeciation.accumulate(p, m, 0, position, blockSize, rhs, charge, diagonal, block);
        double[] y = new double[blockSize];
        for (int j = 0; j < nc; j++) {
            if (p.open(j)) {
                basisSlope[j] = p.protons[p.fixedIndex[j]];
            } else if (position[j] >= 0) {
                block[position[j]][position[j]] = diagonal[j];
                y[position[j]] = rhs[j];
            } else if (diagonal[j] > 0) {
                basisSlope[j] = rhs[j] / diagonal[j];
            }
        }
        if (blockSize > 0) {
            double[][] a = new double[blockSize][];
            for (int q = 0; q < blockSize; q++) {
                a[q] = block[q].clone();
            }
            LinearSolve.inPlace(a, y, blockSize);
            for (int j = 0; j < nc; j++) {
                if (position[j] >= 0) {
                    basisSlope[j] = y[position[j]];
                }
            }
        }
    }

}
