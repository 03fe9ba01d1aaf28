package org.protolyte.chemistry;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The composition part of {@link IonInteraction} for one prepared problem: Pitzer's ln γ of every charged species,
 * of each component's free basis and of H+ and OH-, times the hand-over weight w(I), in log10 units. An ion without
 * Pitzer parameters against any ion of the problem keeps Davies' γ at every ionic strength (its share of the osmotic
 * coefficient is then Pitzer's Debye–Hückel term alone), and {@link ValidityJudge} holds its solution to Davies'
 * limits where it carries buffering. Immutable; the scratch arrays belong to the caller's {@link Workspace}.
 */
final class Interactions {

    /**
     * The standard uncertainty of log10 γ per unit z² that Pitzer's equations leave with the parameters here, derived
     * from the 2.5 % in γ± within which the buffer salts' values agree with the CRC Handbook's
     * (ElectrolyteActivityTest): for a 2-1 salt log10 γ± = (2 log10 γ+ + log10 γ2-)/3 moves by (2·1 + 4)/3 = 2 units
     * of z², so u = log10(1.025)/2.
     */
    static final double PITZER_UNCERTAINTY = 0.0054;
    /** The share of its sign's charge from which an ion's pairs are held to their range (chosen). */
    static final double SIGNIFICANT = 0.05;

    /** Built on first use: below the hand-over a solve never needs it. */
    private volatile Pitzer.Mixture mixture;
    private final List<Pitzer.Ion> ionList;
    private final double kelvin;
    private final double debyeHuckelA;
    final int ions;
    final int[] speciesIon;      // −1 for a neutral species
    final int[] componentIon;    // −1 for a neutral component
    final int hydrogenIon;
    final int hydroxideIon;
    private final int[] charge;

    Interactions(PreparedProblem p) {
        Map<String, Integer> at = new LinkedHashMap<>();
        List<Pitzer.Ion> list = new ArrayList<>();
        speciesIon = new int[p.n];
        for (int i = 0; i < p.n; i++) {
            speciesIon[i] = p.ionCharge[i] == 0 ? -1 : index(p.sp[i].name(), p.charge[i], at, list);
        }
        componentIon = new int[p.components.length];
        for (int j = 0; j < componentIon.length; j++) {
            Component c = p.components[j];
            componentIon[j] = c.ionicCharge() == 0 ? -1 : index(c.name(), c.charge(), at, list);
        }
        hydrogenIon = index("H+", 1, at, list);
        hydroxideIon = index("OH-", -1, at, list);
        ions = list.size();
        charge = list.stream().mapToInt(Pitzer.Ion::charge).toArray();
        ionList = List.copyOf(list);
        kelvin = p.kelvin;
        debyeHuckelA = p.debyeHuckelA;
    }

    /**
     * The share of the charge of opposite sign around an ion (Σ |z| m of the other sign) carried by ions it has
     * parameters with, at these ion molalities; 1 where there is none.
     */
    double coveredShare(int ion, double[] ionM) {
        double all = chargeOfSign(-Integer.signum(charge[ion]), ionM);
        double with = 0;
        Pitzer.Mixture x = mixture();
        for (int q = 0; q < x.pairs; q++) {
            int other = x.cation[q] == ion ? x.anion[q] : x.anion[q] == ion ? x.cation[q] : -1;
            if (other >= 0) {
                with += Math.abs(charge[other]) * ionM[other];
            }
        }
        return all > 0 ? with / all : 1;
    }

    /** Whether an ion carries at least {@link #SIGNIFICANT} of the charge of its sign. */
    boolean significant(int ion, double[] ionM) {
        return Math.abs(charge[ion]) * ionM[ion] >= SIGNIFICANT * chargeOfSign(Integer.signum(charge[ion]), ionM);
    }

    /** Σ |z| m of the ions of this sign (+1 or −1). */
    private double chargeOfSign(int sign, double[] ionM) {
        double sum = 0;
        for (int q = 0; q < ions; q++) {
            if (Integer.signum(charge[q]) == sign) {
                sum += Math.abs(charge[q]) * ionM[q];
            }
        }
        return sum;
    }

    /** Pitzer's equations for these ions at this temperature (a benign race at most builds it twice). */
    Pitzer.Mixture mixture() {
        Pitzer.Mixture m = mixture;
        if (m == null) {
            m = new Pitzer.Mixture(ionList, kelvin);
            mixture = m;
        }
        return m;
    }

    /** Whether the ion at this index has Pitzer parameters here; if not, it keeps Davies' γ. */
    boolean covered(int ion) {
        return mixture().parameterised(ion);
    }

    private static int index(String name, int charge, Map<String, Integer> at, List<Pitzer.Ion> list) {
        return at.computeIfAbsent(name + "|" + charge, k -> {
            list.add(new Pitzer.Ion(name, charge));
            return list.size() - 1;
        });
    }

    /** The ions' molalities from the species' and the free H+ and OH-, into {@code ionM}; returns I. */
    double ionMolalities(double[] m, double mH, double mOH, double[] ionM) {
        java.util.Arrays.fill(ionM, 0);
        for (int i = 0; i < m.length; i++) {
            if (speciesIon[i] >= 0) {
                ionM[speciesIon[i]] += m[i];
            }
        }
        ionM[hydrogenIon] += mH;
        ionM[hydroxideIon] += mOH;
        double s = 0;
        for (int k = 0; k < ions; k++) {
            s += charge[k] * charge[k] * ionM[k];
        }
        return 0.5 * s;
    }

    /**
     * w(I)·ln γ/ln10 of the species (0 for neutrals), of each component's free basis and of {H+, OH-} at these
     * molalities; returns w.
     */
    double specific(double[] m, double mH, double mOH, double[] ionM, double[] ionLn, double[] species,
                    double[] component, double[] water) {
        double ionic = ionMolalities(m, mH, mOH, ionM);
        double w = IonInteraction.weight(ionic);
        if (w > 0) {
            mixture().lnGamma(ionM, ionLn);
            for (int q = 0; q < ions; q++) {
                if (!covered(q)) {
                    ionLn[q] = Thermo.LN10 * Davies.INSTANCE.log10Gamma(charge[q], ionic, debyeHuckelA);
                }
            }
        } else {
            java.util.Arrays.fill(ionLn, 0);
        }
        spread(ionLn, w / Thermo.LN10, species, component, water);
        return w;
    }

    /** k times a value per ion, onto the species (0 for neutrals), each component's free basis and {H+, OH-}. */
    private void spread(double[] perIon, double k, double[] species, double[] component, double[] water) {
        for (int i = 0; i < species.length; i++) {
            species[i] = speciesIon[i] < 0 ? 0 : k * perIon[speciesIon[i]];
        }
        for (int j = 0; j < component.length; j++) {
            component[j] = componentIon[j] < 0 ? 0 : k * perIon[componentIon[j]];
        }
        water[0] = k * perIon[hydrogenIon];
        water[1] = k * perIon[hydroxideIon];
    }

    /**
     * The standard uncertainty of log10 γ of every species, component basis and {H+, OH-} at these molalities, into
     * the last three arrays: for an ion with parameters z²[(1 − w)·Davies' disagreement + w·{@link #PITZER_UNCERTAINTY}];
     * for one without, z² times Davies' disagreement. All move together: one systematic error of the model (the
     * missing temperature terms of a pair are constants of their own, {@link #pairShift}). Returns the one per unit
     * z² of the ions with parameters.
     */
    double uncertainty(double[] m, double mH, double mOH, double[] ionM, double[] ionLn, double[] species,
                       double[] component, double[] water) {
        double ionic = ionMolalities(m, mH, mOH, ionM);
        double[] u = new double[ions];
        double perZ2 = 0;
        if (ionic > 0) {
            double w = IonInteraction.weight(ionic);
            double d = IonInteraction.daviesDisagreement(ionic);
            perZ2 = (1 - w) * d + w * PITZER_UNCERTAINTY;
            for (int q = 0; q < ions; q++) {
                double zz = charge[q] * charge[q];
                u[q] = zz * (w > 0 && covered(q) ? perZ2 : d);
            }
        }
        spread(u, 1, species, component, water);
        return perZ2;
    }

    /**
     * The change of w·log10 γ of every species, component basis and {H+, OH-} at these molalities when the pair of
     * these ions, which has no published temperature terms, is moved to the edge of what {@link
     * PitzerParameters#SLOPE_BOUND} allows here, into the last three arrays; false (and zeros) where the pair is not
     * used here or this is 25 °C.
     */
    boolean pairShift(String cation, String anion, double[] m, double mH, double mOH, double[] ionM, double[] ionLn,
                      double[] species, double[] component, double[] water) {
        double w = IonInteraction.weight(ionMolalities(m, mH, mOH, ionM));
        int pair = w == 0 ? -1 : mixture().pair(cation, anion);
        if (pair < 0 || !mixture().extrapolated[pair]) {
            spread(new double[ions], 0, species, component, water);
            return false;
        }
        double[] moved = new double[ions];
        mixture().lnGamma(ionM, ionLn);
        mixture().bounded(pair).lnGamma(ionM, moved);
        for (int q = 0; q < ions; q++) {
            moved[q] = covered(q) ? moved[q] - ionLn[q] : 0;
        }
        spread(moved, w / Thermo.LN10, species, component, water);
        return true;
    }

    /** w(I)·Σ m (φ − 1) of Pitzer's equations, mol/kg: its share of the osmolality. */
    double osmoticExcess(double[] m, double mH, double mOH, double[] ionM) {
        double w = IonInteraction.weight(ionMolalities(m, mH, mOH, ionM));
        return w > 0 ? w * mixture().osmoticExcess(ionM) : 0;
    }
}
