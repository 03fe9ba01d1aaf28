package org.protolyte.analysis;

import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.DissociationStep;

/** dpKa/dT (per kelvin) of the step of a system whose pKa at {@code atKelvin} is {@code pKa}, by central difference. */
record DissociationStepSlope(DissociationStep step, double slope) {

    static DissociationStepSlope of(AcidBaseSystem system, double pKa, double atKelvin, double meanKelvin) {
        DissociationStep best = system.steps().get(0);
        for (DissociationStep s : system.steps()) {
            if (Math.abs(s.pKa(atKelvin) - pKa) < Math.abs(best.pKa(atKelvin) - pKa)) {
                best = s;
            }
        }
        double slope = (best.pKa(meanKelvin + 0.5) - best.pKa(meanKelvin - 0.5));
        return new DissociationStepSlope(best, slope);
    }
}
