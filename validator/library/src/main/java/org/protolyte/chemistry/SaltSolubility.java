package org.protolyte.chemistry;

import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

/**
 * A salt's published solubility in water against temperature, as the handbooks tabulate it (g of anhydrous salt per
 * 100 g of water, the stable hydrate at each temperature), and what it says about a recipe holding other salts too.
 *
 * <p>The saturated pure solution fixes a stoichiometric solubility product on the molality basis,
 * K'(T) = Π (ν_i s)^ν_i with s the saturated molality; a recipe is oversaturated where Q = Π m_i^ν_i of the free ions
 * exceeds it. That counts the common-ion effect (sodium chloride in a phosphate concentrate lowers the phosphate that
 * stays dissolved) and takes the activity coefficients as equal to those of the saturated pure solution: a
 * first-order estimate, good where the ionic strengths are alike (concentrates), not a thermodynamic Ksp.
 * Between tabulated temperatures s is interpolated linearly; outside them nothing is said.
 *
 * @param ions    the free species the salt dissolves into, by name, with their counts
 * @param forms   the library substances that are this salt (its hydrates)
 * @param celsius tabulated temperatures, ascending
 * @param gramsPer100g solubility at each, g anhydrous salt per 100 g water
 */
public record SaltSolubility(String name, String formula, double molarMass, Map<String, Integer> ions,
                             List<String> forms, double[] celsius, double[] gramsPer100g, String source) {

    public SaltSolubility {
        ions = Map.copyOf(ions);
        forms = List.copyOf(forms);
        celsius = celsius.clone();
        gramsPer100g = gramsPer100g.clone();
        if (celsius.length < 2 || celsius.length != gramsPer100g.length) {
            throw new IllegalArgumentException("solubility of " + name + " needs at least two temperatures, each with "
                    + "its value");
        }
        for (int i = 1; i < celsius.length; i++) {
            if (!(celsius[i] > celsius[i - 1])) {
                throw new IllegalArgumentException("solubility of " + name + ": temperatures must rise");
            }
        }
    }

    /** Saturated molality (mol of salt per kg water) at a temperature within the table; empty outside it. */
    public OptionalDouble saturatedMolality(double kelvin) {
        double t = kelvin - Thermo.KELVIN_OFFSET;
        if (t < celsius[0] - 1e-9 || t > celsius[celsius.length - 1] + 1e-9) {
            return OptionalDouble.empty();
        }
        int i = 1;
        while (i < celsius.length - 1 && celsius[i] < t) {
            i++;
        }
        double f = (t - celsius[i - 1]) / (celsius[i] - celsius[i - 1]);
        double g = gramsPer100g[i - 1] + f * (gramsPer100g[i] - gramsPer100g[i - 1]);
        return OptionalDouble.of(g * 10 / molarMass);
    }

    /** log10 K' at a temperature within the table. */
    public OptionalDouble log10Product(double kelvin) {
        OptionalDouble s = saturatedMolality(kelvin);
        if (s.isEmpty()) {
            return s;
        }
        double log = 0;
        for (int nu : ions.values()) {
            log += nu * Math.log10(nu * s.getAsDouble());
        }
        return OptionalDouble.of(log);
    }

    /** log10 (Q/K') for free-ion molalities by species name; empty outside the table or where an ion is absent. */
    public OptionalDouble index(Map<String, Double> molalities, double kelvin) {
        OptionalDouble k = log10Product(kelvin);
        if (k.isEmpty()) {
            return k;
        }
        double q = 0;
        for (Map.Entry<String, Integer> e : ions.entrySet()) {
            Double m = molalities.get(e.getKey());
            if (m == null || !(m > 0)) {
                return OptionalDouble.empty();
            }
            q += e.getValue() * Math.log10(m);
        }
        return OptionalDouble.of(q - k.getAsDouble());
    }
}
