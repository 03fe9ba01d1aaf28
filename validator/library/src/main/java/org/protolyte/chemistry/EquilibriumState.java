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
 * Above the activity model's warning limit, where sodium, potassium and chloride carry at least three quarters of the
 * ionic strength, the osmotic coefficient of those ions is Pitzer's ({@link Pitzer}) and the other solutes count as
 * ideal particles (which overstates the osmolality by a few per cent where divalent ions carry the rest);
 * {@code osmolalityModel} says which.
 */
public record EquilibriumState(double kelvin, double pH, double ionicStrength, double bufferCapacity,
                               double pKw, double hydrogenMolality, double hydroxideMolality,
                               double particleMolality, double osmolality, String osmolalityModel,
                               List<SpeciesAmount> species, List<Caveat> caveats,
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
