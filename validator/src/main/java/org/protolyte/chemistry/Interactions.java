package org.protolyte.chemistry;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The composition part of {@link IonInteraction} for one prepared problem: Pitzer's ln γ of every charged species,
 * of each component's free basis and of H+ and OH-, times the hand-over weight w(I), in log10 units. Immutable;
 * the scratch arrays belong to the caller's {@link Workspace}.
 */
final class Interactions {

    final Pitzer.Mixture mixture;
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
            speciesIon[i] = p.charge[i] == 0 ? -1 : index(p.sp[i].name(), p.charge[i], at, list);
        }
        componentIon = new int[p.components.length];
        for (int j = 0; j < componentIon.length; j++) {
            Component c = p.components[j];
            componentIon[j] = c.charge() == 0 ? -1 : index(c.name(), c.charge(), at, list);
        }
        hydrogenIon = index("H+", 1, at, list);
        hydroxideIon = index("OH-", -1, at, list);
        ions = list.size();
        charge = list.stream().mapToInt(Pitzer.Ion::charge).toArray();
        mixture = new Pitzer.Mixture(list, p.kelvin);
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
        double w = IonInteraction.weight(ionMolalities(m, mH, mOH, ionM));
        if (w > 0) {
            mixture.lnGamma(ionM, ionLn);
        } else {
            java.util.Arrays.fill(ionLn, 0);
        }
        double k = w / Thermo.LN10;
        for (int i = 0; i < species.length; i++) {
            species[i] = speciesIon[i] < 0 ? 0 : k * ionLn[speciesIon[i]];
        }
        for (int j = 0; j < component.length; j++) {
            component[j] = componentIon[j] < 0 ? 0 : k * ionLn[componentIon[j]];
        }
        water[0] = k * ionLn[hydrogenIon];
        water[1] = k * ionLn[hydroxideIon];
        return w;
    }

    /** w(I)·Σ m (φ − 1) of Pitzer's equations, mol/kg: its share of the osmolality. */
    double osmoticExcess(double[] m, double mH, double mOH, double[] ionM) {
        double w = IonInteraction.weight(ionMolalities(m, mH, mOH, ionM));
        return w > 0 ? w * mixture.osmoticExcess(ionM) : 0;
    }
}
