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

    /** d/dI of the above: −A z² (1/(2√I (1+√I)²) − 0.3), derived. */
    @Override
    public double log10GammaSlope(int charge, double ionicStrength, double a) {
        if (charge == 0) {
            return 0;
        }
        double s = Math.sqrt(ionicStrength);
        return -a * charge * charge * (1 / (2 * s * (1 + s) * (1 + s)) - 0.3);
    }

    /**
     * With ln γ_i = z_i² f(I), f = −A ln10 (√I/(1+√I) − 0.3 I), the excess Gibbs energy is 2 F(I), F = ∫₀^I f, and
     * Gibbs–Duhem gives Σ m_i (φ − 1) = 2 (I f − F), where ∫₀^I √x/(1+√x) dx = I − 2√I + 2 ln(1+√I) (derived here; the
     * single-salt case is Bjerrum's relation φ − 1 = ln γ± − (1/m) ∫ ln γ± dm).
     */
    @Override
    public double osmoticExcess(double ionicStrength, double a) {
        double i = ionicStrength;
        double s = Math.sqrt(i);
        double k = a * Thermo.LN10;
        double f = -k * (s / (1 + s) - 0.3 * i);
        double integral = -k * (i - 2 * s + 2 * Math.log1p(s) - 0.15 * i * i);
        return 2 * (i * f - integral);
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
