package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.protolyte.chemistry.Component;
import org.protolyte.chemistry.EquilibriumState;
import org.protolyte.chemistry.Species;
import org.protolyte.chemistry.SpeciesAmount;
import org.protolyte.document.Formulation;

class FiniteResultTest {

    private static ConditionResult result(double pH, double osmolarity) {
        EquilibriumState s = new EquilibriumState(298.15, pH, 0.1, 0.01, 14, 1e-7, 1e-7, 0.3, 0.29, "ideal",
                List.of(), List.of(), Map.of(), Set.of());
        return new ConditionResult(new Formulation.Condition("use", 298.15, false, "/conditions/0"), Optional.of(s),
                List.of(), 0.01, osmolarity, 1, List.of(), OptionalDouble.empty(), Optional.empty(),
                OptionalDouble.empty(), Optional.empty(), List.of());
    }

    @Test
    void aNonFiniteFigureMakesTheConditionIndeterminate() {
        assertFalse(result(7, Double.POSITIVE_INFINITY).finite().determinate());
        assertFalse(result(Double.NaN, 0.3).finite().determinate());
    }

    @Test
    void finiteFiguresStayDeterminate() {
        assertTrue(result(7, 0.3).finite().determinate());
    }

    /** A result without an equilibrium has no figure to check: it stays as it is. */
    @Test
    void aResultWithoutAStateIsLeftAsItIs() {
        ConditionResult none = new ConditionResult(new Formulation.Condition("use", 298.15, false, "/conditions/0"),
                Optional.empty(), List.of(), Double.NaN, Double.NaN, 1, List.of(), OptionalDouble.empty(),
                Optional.empty(), OptionalDouble.empty(), Optional.empty(), List.of());
        assertSame(none, none.finite());
    }

    /** A species' figure counts too: an activity coefficient that is not a number makes the condition indeterminate. */
    @Test
    void aNonFiniteSpeciesFigureMakesTheConditionIndeterminate() {
        Component na = new Component("Na+", 1);
        SpeciesAmount sodium = new SpeciesAmount(Species.free(na), na, 0.1, Double.NaN, 1);
        EquilibriumState s = new EquilibriumState(298.15, 7, 0.1, 0.01, 14, 1e-7, 1e-7, 0.3, 0.29, "ideal",
                List.of(sodium), List.of(), Map.of(), Set.of());
        ConditionResult r = new ConditionResult(new Formulation.Condition("use", 298.15, false, "/conditions/0"),
                Optional.of(s), List.of(), 0.01, 0.3, 1, List.of(), OptionalDouble.empty(), Optional.empty(),
                OptionalDouble.empty(), Optional.empty(), List.of());
        assertFalse(r.finite().determinate());
    }
}
