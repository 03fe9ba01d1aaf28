package org.protolyte.analysis;

import java.util.List;

/**
 * Standard uncertainty of a condition's pH and buffer capacity from the uncertainties of the constants
 * (each pKa used, each ΔH° that has one, each complex's log K, pKw) and of the activity model (every ion's log γ
 * moved together by its own standard uncertainty: Davies' disagreement with Pitzer's equations, small below
 * I = 0.1 mol/kg, and Pitzer's own where it takes over), by linear propagation: each sensitivity (by
 * implicit differentiation, the q.s. held to its goal, see {@link ConstantsPropagation}) times its standard
 * uncertainty, added in quadrature with the covariance of a step's pKa and ΔH°. It does not cover the batch
 * (weighing).
 *
 * @param contributions each constant's change of the pH, largest first
 */
public record Uncertainty(double pH, double bufferCapacityPerLitre, List<Contribution> contributions) {

    /** One constant, e.g. "phosphate pKa2", and the pH change (to first order) when it moves by its standard uncertainty. */
    public record Contribution(String constant, double standardUncertainty, double pHChange) {
    }

    public Uncertainty {
        contributions = List.copyOf(contributions);
    }
}
