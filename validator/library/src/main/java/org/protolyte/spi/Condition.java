package org.protolyte.spi;

import java.util.OptionalDouble;

/**
 * The equilibrium at one condition of a formulation (make-up, storage, use). Every value is empty where the engine
 * could not determine the condition.
 *
 * @param pointer        the JSON pointer of the condition in the document
 * @param temperature    °C
 * @param pH             on the conventional scale (Bates–Guggenheim convention) to ionic strength 0.1 mol/kg
 * @param pHUncertainty  the standard uncertainty from the published constants and the activity model
 * @param bufferCapacity β, mmol per litre of solution per pH unit
 * @param ionicStrength  mol/kg of water
 * @param osmolality     mOsm/kg of water
 */
public record Condition(String name, String pointer, double temperature, OptionalDouble pH,
                        OptionalDouble pHUncertainty, OptionalDouble bufferCapacity, OptionalDouble ionicStrength,
                        OptionalDouble osmolality) {

    /** The engine gave this condition a pH. */
    public boolean determinate() {
        return pH.isPresent();
    }
}
