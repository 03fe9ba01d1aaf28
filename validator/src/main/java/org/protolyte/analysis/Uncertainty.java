package org.protolyte.analysis;

import java.util.List;

/**
 * Standard uncertainty of a condition's pH and buffer capacity from the uncertainties of the constants
 * (pKa of each step used, pKw), by linear propagation: each constant is moved by its standard uncertainty,
 * the whole analysis (q.s. included) is repeated, and the changes are added in quadrature, the constants
 * taken as independent. It covers the constants, not the batch (weighing) nor the activity model.
 *
 * @param contributions each constant's change of the pH, largest first
 */
public record Uncertainty(double pH, double bufferCapacityPerLitre, List<Contribution> contributions) {

    /** One constant, e.g. "phosphate pKa2", and the pH change when it moves by its standard uncertainty. */
    public record Contribution(String constant, double standardUncertainty, double pHChange) {
    }

    public Uncertainty {
        contributions = List.copyOf(contributions);
    }
}
