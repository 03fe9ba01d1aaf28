package org.protolyte.chemistry;

import java.util.List;

/**
 * A solved equilibrium at one temperature. pH = −log10(γH·mH) with γH from the activity model
 * (conventional scale, see {@link Equilibrium}). Buffer capacity is in mol/kg water per pH unit.
 */
public record EquilibriumState(double kelvin, double pH, double ionicStrength, double bufferCapacity,
                               double pKw, double hydrogenMolality, double hydroxideMolality,
                               double particleMolality, List<SpeciesAmount> species, List<Caveat> caveats) {

    public EquilibriumState {
        species = List.copyOf(species);
        caveats = List.copyOf(caveats);
    }

    public boolean determinate() {
        return caveats.stream().noneMatch(c -> c.severity() == Caveat.Severity.INDETERMINATE);
    }
}
