package org.protolyte.chemistry;

/**
 * Davies' equation at low ionic strength handed over to Pitzer's equations ({@link Pitzer}) for concentrated
 * solutions. log10 γ_i = (1 − w) · Davies(z_i, I) + w · ln γ_i(Pitzer)/ln 10, with a weight w(I) that is 0 up to
 * {@link #FROM}, 1 from {@link #TO}, and 3t² − 2t³ between (t = (I − FROM)/(TO − FROM)): γ and its slope are
 * continuous, so no pH jumps where one model hands over to the other. This class is the charge-and-I part; the
 * composition part (Pitzer's terms, which depend on the ions present) is {@link Interactions}, prepared per problem.
 * Below {@link #FROM} every result is Davies' own.
 */
public final class IonInteraction implements ActivityModel {

    public static final IonInteraction INSTANCE = new IonInteraction();

    /** Where the hand-over begins and ends, mol/kg: Davies agrees with Bates–Guggenheim to 0.1 (see {@link Davies}). */
    static final double FROM = 0.1;
    static final double TO = 0.3;

    private IonInteraction() {
    }

    /** Pitzer's share of log γ at this ionic strength. */
    static double weight(double ionicStrength) {
        double t = Math.min(1, Math.max(0, (ionicStrength - FROM) / (TO - FROM)));
        return t * t * (3 - 2 * t);
    }

    static double weightSlope(double ionicStrength) {
        double t = (ionicStrength - FROM) / (TO - FROM);
        return t <= 0 || t >= 1 ? 0 : 6 * t * (1 - t) / (TO - FROM);
    }

    /**
     * How far Davies' equation is from Pitzer's at ionic strength I, at 25 °C: |log10 γ±(Davies, z = 1) −
     * log10 γ±(NaCl)|, the error per unit z² of a single-ion log γ that Davies leaves for an ion without parameters.
     */
    public static double daviesDisagreement(double ionicStrength) {
        return Math.abs(Davies.INSTANCE.log10Gamma(1, ionicStrength, Water.debyeHuckelA(Thermo.T_REF))
                - Math.log10(Pitzer.sodiumChlorideMeanActivityCoefficient(ionicStrength)));
    }

    @Override
    public double log10Gamma(int charge, double ionicStrength, double a) {
        return (1 - weight(ionicStrength)) * Davies.INSTANCE.log10Gamma(charge, ionicStrength, a);
    }

    @Override
    public double log10GammaSlope(int charge, double ionicStrength, double a) {
        double w = weight(ionicStrength);
        return (1 - w) * Davies.INSTANCE.log10GammaSlope(charge, ionicStrength, a)
                - weightSlope(ionicStrength) * Davies.INSTANCE.log10Gamma(charge, ionicStrength, a);
    }

    /** Davies' share; Pitzer's share needs the composition and is added by {@link Interactions#osmoticExcess}. */
    @Override
    public double osmoticExcess(double ionicStrength, double a) {
        return (1 - weight(ionicStrength)) * Davies.INSTANCE.osmoticExcess(ionicStrength, a);
    }

    /** Until the ions without parameters are judged one by one, the limits stay Davies' own. */
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
        return "Davies to 0.1 mol/kg, Pitzer from 0.3 mol/kg";
    }
}
