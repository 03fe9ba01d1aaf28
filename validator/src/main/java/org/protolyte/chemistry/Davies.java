package org.protolyte.chemistry;

/**
 * Davies equation (C. W. Davies, "Ion Association", Butterworths 1962):
 * log10 γ = −A z² (√I/(1+√I) − 0.3 I). Neutral species get γ = 1 (no salting-out term).
 * At I ≤ 0.1 mol/kg its γ(H+) agrees with the Bates–Guggenheim convention to a few thousandths of a pH unit.
 */
public final class Davies implements ActivityModel {

    public static final Davies INSTANCE = new Davies();

    private Davies() {
    }

    @Override
    public double log10Gamma(int charge, double ionicStrength, double a) {
        if (charge == 0) {
            return 0;
        }
        double s = Math.sqrt(ionicStrength);
        return -a * charge * charge * (s / (1 + s) - 0.3 * ionicStrength);
    }

    @Override
    public double warnAbove() {
        return 0.2;
    }

    @Override
    public double indeterminateAbove() {
        return 0.5;
    }

    @Override
    public String name() {
        return "Davies";
    }
}
