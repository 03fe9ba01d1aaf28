package org.protolyte.chemistry;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A solid that can form in a recipe, with the solubility product of its dissolution into free species
 * (Π a_i^ν_i at saturation, water activity 1). Its saturation index at an equilibrium is
 * <pre>
 *   SI = log10 IAP − log10 Ksp(T),   IAP = Π (γ_i m_i)^ν_i
 * </pre>
 * SI &gt; 0: supersaturated, the solid can precipitate; SI &lt; 0: it dissolves. The free activities come from the
 * solved equilibrium, complexes included, so a chelated calcium no longer counts.
 *
 * <p>log10 Ksp(T) follows {@link FormationConstant}: van 't Hoff, or the source's own equation.
 * "H+" stands for the hydrogen ion (activity 10^−pH), so an apparent product such as {Ca}{H}^0.22{PO4}^0.74 is one too.
 *
 * @param ions free species (by name) the solid dissolves into, with their counts (fractional for a non-stoichiometric
 *             solid)
 */
public record SolidPhase(String name, String formula, Map<String, Double> ions, FormationConstant solubility) {

    public static final String HYDROGEN = "H+";

    public SolidPhase {
        ions = Map.copyOf(ions);
        if (ions.isEmpty()) {
            throw new IllegalArgumentException("solid phase " + name + " dissolves into no ions");
        }
    }

    /** log10 Ksp at {@code kelvin}. */
    public double log10Ksp(double kelvin) {
        return solubility.log10K(kelvin);
    }

    /** The saturation index at a solved equilibrium; empty where one of its ions is absent. */
    public Optional<Saturation> saturation(EquilibriumState s) {
        double logIap = 0;
        for (Map.Entry<String, Double> e : ions.entrySet()) {
            if (e.getKey().equals(HYDROGEN)) {
                logIap -= e.getValue() * s.pH();
                continue;
            }
            SpeciesAmount a = find(s.species(), e.getKey());
            if (a == null || !(a.molality() > 0)) {
                return Optional.empty();
            }
            logIap += e.getValue() * Math.log10(a.activityCoefficient() * a.molality());
        }
        double logK = log10Ksp(s.kelvin());
        return Optional.of(new Saturation(this, logIap - logK, logIap, logK,
                solubility.validity().contains(s.kelvin())));
    }

    private static SpeciesAmount find(List<SpeciesAmount> species, String name) {
        for (SpeciesAmount a : species) {
            if (a.species().name().equals(name)) {
                return a;
            }
        }
        return null;
    }

    /**
     * A phase's saturation index at one equilibrium, with its terms; {@code inRange} is false where the temperature
     * lies outside the data behind Ksp.
     */
    public record Saturation(SolidPhase phase, double index, double log10Iap, double log10Ksp, boolean inRange) {
    }
}
