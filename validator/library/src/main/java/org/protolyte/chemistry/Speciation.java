package org.protolyte.chemistry;

/**
 * How the species molalities follow from the pH at fixed activity coefficients, through the components' mass
 * balances: one path where every species belongs to one component ({@link FreeSpeciation}), another where complexes
 * couple them ({@link CoupledSpeciation}). A prepared problem picks its path once.
 */
interface Speciation {

    /**
     * Fills and returns {@link Workspace#m}, the species molalities at this pH for the workspace's totals and current
     * activity coefficients; valid until the next call.
     */
    double[] molalities(Workspace w, double pH);

    /**
     * β/ln10 at fixed activity coefficients (mH + mOH + the components' terms, see {@link Equilibrium}), from the
     * molalities the last {@link #molalities} at this pH filled; leaves the slopes {@link BufferCapacity#ionicStrengthSlope}
     * reads.
     */
    double bufferSum(Workspace w, double pH);
}
