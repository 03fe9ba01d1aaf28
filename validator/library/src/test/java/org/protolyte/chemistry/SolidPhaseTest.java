package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Set;

import org.junit.jupiter.api.Test;

/**
 * The saturation index as its definition writes it, SI = Σ ν_i log10(γ_i m_i) − ν_H pH − log10 Ksp(T), on a state
 * built by hand: M+2 at 2 mmol/kg with γ 0.5, X-2 at 5 mmol/kg with γ 0.4, pH 6.5. An invented solid
 * M(HX)0.5(X)0.5 dissolving into M+2, X-2 and half a proton, log Ksp −6 at 25 °C with ΔH° −10 kJ/mol, data 10–40 °C.
 */
class SolidPhaseTest {

    private static final Component MC = new Component("M+2", 2);
    private static final Component XC = new Component("X-2", -2);
    private static final FormationConstant KSP = new FormationConstant(-6, -10_000, 0, 0, TemperatureRange.celsius(10, 40));
    private static final SolidPhase SOLID = new SolidPhase("MX", "M(HX)0.5(X)0.5",
            Map.of("M+2", 1.0, "X-2", 1.0, SolidPhase.HYDROGEN, 0.5), KSP);

    private static EquilibriumState state(double kelvin, double x) {
        List<SpeciesAmount> species = List.of(
                new SpeciesAmount(Species.free(MC), MC, 0.002, 0.5, 1),
                new SpeciesAmount(Species.free(XC), XC, x, 0.4, 1));
        return new EquilibriumState(kelvin, 6.5, 0.02, 0.001, 14, 3e-7, 3e-8, 0.007, 0.0068, "test", species, List.of(),
                Map.of(), Set.of());
    }

    /** log10(0.5·0.002) + log10(0.4·0.005) − 0.5·6.5 + 6 = −3 − 2.69897 − 3.25 + 6 = −2.94897. */
    @Test
    void theIndexIsTheIonActivityProductOverKsp() {
        SolidPhase.Saturation s = SOLID.saturation(state(298.15, 0.005)).orElseThrow();
        assertEquals(-3 - 2.69897 - 3.25, s.log10Iap(), 1e-5);
        assertEquals(-6, s.log10Ksp(), 1e-12);
        assertEquals(-2.94897, s.index(), 1e-5);
        assertTrue(s.inRange());
        assertEquals(SOLID, s.phase());
    }

    /** Ksp follows its constant's van 't Hoff form, and outside 10–40 °C the index is flagged as beyond the data. */
    @Test
    void kspFollowsTemperatureAndTheRangeIsFlagged() {
        SolidPhase.Saturation s = SOLID.saturation(state(318.15, 0.005)).orElseThrow();
        assertEquals(KSP.log10K(318.15), s.log10Ksp(), 1e-12);
        assertEquals(s.log10Iap() - KSP.log10K(318.15), s.index(), 1e-12);
        assertFalse(s.inRange());
        assertEquals(KSP.log10K(310.15), SOLID.log10Ksp(310.15), 0);
    }

    @Test
    void anAbsentIonGivesNoIndex() {
        assertTrue(SOLID.saturation(state(298.15, 0)).isEmpty());
        SolidPhase other = new SolidPhase("MY", "MY", Map.of("M+2", 1.0, "Y-2", 1.0), KSP);
        assertTrue(other.saturation(state(298.15, 0.005)).isEmpty());
        assertThrows(IllegalArgumentException.class, () -> new SolidPhase("none", "", Map.of(), KSP));
    }
}
