package org.protolyte.chemistry;

/** γ = 1 for every species: the infinite-dilution limit in which Henderson–Hasselbalch holds. */
public final class IdealActivity implements ActivityModel {
    public static final IdealActivity INSTANCE = new IdealActivity();

    @Override
    public double osmoticExcess(double ionicStrength, double debyeHuckelA) {
        return 0;
    }

    @Override
    public double log10Gamma(int charge, double ionicStrength, double debyeHuckelA) {
        return 0;
    }

    @Override
    public double log10GammaSlope(int charge, double ionicStrength, double debyeHuckelA) {
        return 0;
    }

    @Override
    public double warnAbove() {
        return Double.POSITIVE_INFINITY;
    }

    @Override
    public double indeterminateAbove() {
        return Double.POSITIVE_INFINITY;
    }

    @Override
    public String name() {
        return "ideal";
    }
}
