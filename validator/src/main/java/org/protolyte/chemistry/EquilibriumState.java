package org.protolyte.chemistry;

import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * A solved equilibrium at one temperature. pH = −log10(γH·mH) with γH from the activity model
 * (conventional scale, see {@link Equilibrium}). Buffer capacity is in mol/kg water per pH unit, in
 * total and per component (its term of the sum; water's own term is the rest); open components exchange
 * with a gas phase. Osmolality (osmol/kg water) is the particle molality corrected by the activity model's osmotic
 * coefficient; the dissociation state comes from the solution, so a half-neutralised buffer counts its real particles.
 */
public record EquilibriumState(double kelvin, double pH, double ionicStrength, double bufferCapacity,
                               double pKw, double hydrogenMolality, double hydroxideMolality,
                               double particleMolality, double osmolality, List<SpeciesAmount> species, List<Caveat> caveats,
                               Map<Component, Double> componentBufferCapacity, Set<Component> openComponents) {

    public EquilibriumState {
        species = List.copyOf(species);
        caveats = List.copyOf(caveats);
        componentBufferCapacity = Map.copyOf(componentBufferCapacity);
        openComponents = Set.copyOf(openComponents);
    }

    public boolean determinate() {
        return caveats.stream().noneMatch(c -> c.severity() == Caveat.Severity.INDETERMINATE);
    }
}
