package org.protolyte.api;

import java.util.OptionalDouble;

/**
 * The equilibrium at one condition of a formulation (or of a batch as made). Every value is empty where the condition
 * is indeterminate.
 *
 * @param temperature     °C
 * @param pH              on the conventional scale (Bates–Guggenheim convention) to ionic strength 0.1 mol/kg
 * @param pHUncertainty   the standard uncertainty from the published constants and the activity model
 * @param bufferCapacity  β, mmol per litre of solution per pH unit
 * @param ionicStrength   mol/kg of water
 * @param osmolality      mOsm/kg of water
 */
public record ConditionSummary(String name, double temperature, OptionalDouble pH, OptionalDouble pHUncertainty,
                               OptionalDouble bufferCapacity, OptionalDouble ionicStrength, OptionalDouble osmolality) {

    /** The engine gave this condition a pH. */
    public boolean determinate() {
        return pH.isPresent();
    }
}
