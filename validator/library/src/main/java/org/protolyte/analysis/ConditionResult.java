package org.protolyte.analysis;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.protolyte.chemistry.Caveat;
import org.protolyte.chemistry.EquilibriumState;
import org.protolyte.chemistry.SolidPhase;
import org.protolyte.document.Formulation;

/**
 * The equilibrium at one condition. {@code state} is empty when no equilibrium could be solved; when it
 * is present but a caveat is indeterminate, its numbers must not be shown as results.
 *
 * @param bufferCapacityPerLitre mol per litre of solution per pH unit, at the condition's temperature
 * @param osmolarity             osmol per litre of solution at the condition's temperature (the state's osmolality
 *                               times kg of water per litre); NaN without a state
 * @param buffers                each acid–base system's part of it, largest first
 * @param pHInAir                for a closed condition: the pH after equilibrating with room air
 * @param loads                  strong acid and base it takes before leaving the pH target
 * @param co2ForTarget           for a CO2 condition at the target temperature: the CO2 partial pressure (Pa)
 *                               at which the pH would be the target's midpoint
 * @param uncertainty            from the constants' uncertainties (see {@link Uncertainty})
 * @param saturation             the saturation index of every library solid whose ions are present
 */
public record ConditionResult(Formulation.Condition condition, Optional<EquilibriumState> state,
                              List<Caveat> caveats, double bufferCapacityPerLitre, double osmolarity,
                              double volumeLitres,
                              List<BufferContribution> buffers, OptionalDouble pHInAir, Optional<Loads> loads,
                              OptionalDouble co2ForTarget, Optional<Uncertainty> uncertainty,
                              List<SolidPhase.Saturation> saturation) {

    public ConditionResult {
        saturation = List.copyOf(saturation);
        caveats = List.copyOf(caveats);
        buffers = List.copyOf(buffers);
    }

    public ConditionResult withUncertainty(Uncertainty u) {
        return new ConditionResult(condition, state, caveats, bufferCapacityPerLitre, osmolarity, volumeLitres, buffers,
                pHInAir,
                loads, co2ForTarget, Optional.of(u), saturation);
    }

    /** The same result with one more caveat (a figure beside the pH that could not be computed). */
    public ConditionResult withCaveat(Caveat c) {
        List<Caveat> more = new java.util.ArrayList<>(caveats);
        more.add(c);
        return new ConditionResult(condition, state, more, bufferCapacityPerLitre, osmolarity, volumeLitres, buffers,
                pHInAir, loads, co2ForTarget, uncertainty, saturation);
    }

    /**
     * The same result, INDETERMINATE where a figure to be reported is infinite or NaN (an extreme recipe can
     * overflow a double): no renderer is handed a number that is not one.
     */
    ConditionResult finite() {
        if (state.isEmpty()) {
            return this;
        }
        EquilibriumState s = state.get();
        java.util.stream.DoubleStream figures = java.util.stream.DoubleStream.concat(
                java.util.stream.DoubleStream.of(s.pH(), s.ionicStrength(), s.bufferCapacity(), s.osmolality(),
                        s.particleMolality(), bufferCapacityPerLitre, osmolarity, volumeLitres),
                s.species().stream().flatMapToDouble(a -> java.util.stream.DoubleStream.of(a.molality(),
                        a.activityCoefficient(), a.fractionOfComponent())));
        return figures.allMatch(Double::isFinite) ? this : withCaveat(Caveat.indeterminate("non-finite",
                "a computed figure at this condition is not a finite number (the amounts overflow the arithmetic)"));
    }

    /** The system that carries most of the buffer capacity, if any system buffers at all. */
    public Optional<BufferContribution> mainBuffer() {
        return buffers.stream().max(java.util.Comparator.comparingDouble(BufferContribution::bufferCapacityPerLitre));
    }

    public boolean determinate() {
        return state.isPresent() && caveats.stream().noneMatch(c -> c.severity() == Caveat.Severity.INDETERMINATE);
    }
}
