package org.protolyte.chemistry;

/**
 * For tests: Davies' equation with every log10 γ raised by {@code delta} times its standard uncertainty, z² times
 * Davies' disagreement with Pitzer ({@link IonInteraction#daviesDisagreement}): the activity model moved as the
 * uncertainty budget moves it ({@link Derivatives#activityModel}), to be solved again.
 */
public record ShiftedDavies(double delta) implements ActivityModel {

    private static double u(double i) {
        return IonInteraction.daviesDisagreement(i);
    }

    @Override
    public double log10Gamma(int charge, double i, double a) {
        return Davies.INSTANCE.log10Gamma(charge, i, a) + delta * charge * charge * u(i);
    }

    @Override
    public double log10GammaSlope(int charge, double i, double a) {
        double h = 1e-6 * Math.max(i, 1e-3);
        return Davies.INSTANCE.log10GammaSlope(charge, i, a) + delta * charge * charge * (u(i + h) - u(i - h)) / (2 * h);
    }

    @Override
    public double osmoticExcess(double i, double a) {
        return Davies.INSTANCE.osmoticExcess(i, a);
    }

    @Override
    public double warnAbove() {
        return Davies.INSTANCE.warnAbove();
    }

    @Override
    public double indeterminateAbove() {
        return Davies.INSTANCE.indeterminateAbove();
    }

    @Override
    public String name() {
        return "Davies, shifted";
    }
}
