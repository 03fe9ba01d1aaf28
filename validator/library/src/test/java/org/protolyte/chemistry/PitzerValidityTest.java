package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;

/**
 * Where {@link ValidityJudge} stops Pitzer's equations: each pair at the range of its fit, a diagnostic for 25 °C values
 * used more than 10 K away, and Davies' limits, with the ions named, where ions without parameters carry the
 * buffering. The compositions are invented; each limit is the one PitzerParameters and ValidityJudge state.
 */
class PitzerValidityTest {

    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(new SchemaCatalog());
    private static final Equilibrium PITZER = new Equilibrium(IonInteraction.INSTANCE);
    private static final Component NA = LIBRARY.ion("Na+").orElseThrow();
    private static final Component CL = LIBRARY.ion("Cl-").orElseThrow();

    private static EquilibriumState solve(Map<AcidBaseSystem, Double> buffers, double na, double cl, double kelvin) {
        List<Species> species = new ArrayList<>();
        Map<Component, Double> totals = new LinkedHashMap<>();
        buffers.forEach((s, t) -> {
            species.addAll(s.species());
            totals.put(s.basis(), t);
        });
        species.add(Species.free(NA));
        species.add(Species.free(CL));
        totals.put(NA, na);
        totals.put(CL, cl);
        return PITZER.solve(species, totals, kelvin);
    }

    private static boolean has(EquilibriumState s, String code, String text) {
        return s.caveats().stream().anyMatch(c -> c.code().equals(code) && c.message().contains(text));
    }

    /** NaCl's fit runs to 6.0 mol/kg (Pitzer 1991, Table 12): a pH just below, none just above, the pair named. */
    @Test
    void sodiumChlorideIsHeldToItsFitsRange() {
        EquilibriumState inside = solve(Map.of(), 5.98, 5.98, 298.15);
        assertFalse(has(inside, "ionic-strength-out-of-range", ""), inside.caveats()::toString);
        EquilibriumState beyond = solve(Map.of(), 6.02, 6.02, 298.15);
        assertTrue(has(beyond, "ionic-strength-out-of-range", "Na+–Cl-"), beyond.caveats()::toString);
    }

    /** Phosphate in 1 mol/kg NaCl: its sodium pairs have no temperature terms, named from more than 10 K off 25 °C. */
    @Test
    void twentyFiveDegreeValuesFarFromTwentyFiveDegreesAreNamed() {
        AcidBaseSystem phosphate = LIBRARY.system("phosphate").orElseThrow();
        Map<AcidBaseSystem, Double> buffer = Map.of(phosphate, 0.04);
        double na = 1.0 + 0.06;         // 1.5 protons bound per phosphate: about pH 7
        EquilibriumState near = solve(buffer, na, 1.0, 288.35);
        EquilibriumState far = solve(buffer, na, 1.0, 287.95);
        assertFalse(has(near, "pitzer-parameters-extrapolated", ""), near.caveats()::toString);
        assertTrue(has(far, "pitzer-parameters-extrapolated", "Na+–HPO4-2"), far.caveats()::toString);
        assertTrue(has(far, "pitzer-parameters-extrapolated", "Na+–H2PO4-"), far.caveats()::toString);
    }

    /** Two buffers without parameters in 0.3 mol/kg NaCl: a warning naming both; in 1 mol/kg, no pH. */
    @Test
    void buffersWithoutParametersKeepDaviesLimitsAndAreNamed() {
        AcidBaseSystem hepes = LIBRARY.system("HEPES").orElseThrow();
        AcidBaseSystem mops = LIBRARY.system("MOPS").orElseThrow();
        Map<AcidBaseSystem, Double> both = Map.of(hepes, 0.04, mops, 0.04);
        EquilibriumState warned = solve(both, 0.34, 0.3, 298.15);
        assertTrue(has(warned, "ionic-strength-high", "HEPES-, MOPS- carry the buffering"), warned.caveats()::toString);
        EquilibriumState one = solve(Map.of(hepes, 0.04), 0.32, 0.3, 298.15);
        assertTrue(has(one, "ionic-strength-high", "HEPES- carries the buffering"), one.caveats()::toString);
        EquilibriumState refused = solve(both, 1.04, 1.0, 298.15);
        assertTrue(has(refused, "ionic-strength-out-of-range", "HEPES-, MOPS-"), refused.caveats()::toString);
        // with Davies' γ their pH is Davies' at any ionic strength below the hand-over
        EquilibriumState dilute = solve(both, 0.08, 0.04, 298.15);
        assertTrue(dilute.caveats().isEmpty(), dilute.caveats()::toString);
    }

    /**
     * Davies' equation with every log10 γ raised by δ·z²·d(I), d its disagreement with Pitzer: solved at ±δ, the pH
     * moves as {@link Derivatives#activityModel} says (first order, central difference; derived). A phosphate buffer in
     * 0.15 mol/kg NaCl, where d ≈ 0.003.
     */
    @Test
    void daviesAloneMovesEveryIonByItsChargeSquaredTimesItsDisagreement() {
        AcidBaseSystem phosphate = LIBRARY.system("phosphate").orElseThrow();
        List<Species> species = new ArrayList<>(phosphate.species());
        species.add(Species.free(NA));
        species.add(Species.free(CL));
        Map<Component, Double> totals = Map.of(phosphate.basis(), 0.02, NA, 0.18, CL, 0.15);
        Equilibrium.Prepared p = new Equilibrium(Davies.INSTANCE).prepare(species, totals.keySet(), 298.15, Map.of());
        p.point(totals, null);
        Derivatives.Response r = p.derivatives().activityModel();
        double delta = 1e-3;
        double up = new Equilibrium(new ShiftedDavies(delta)).solve(species, totals, 298.15).pH();
        double down = new Equilibrium(new ShiftedDavies(-delta)).solve(species, totals, 298.15).pH();
        double expected = (up - down) / (2 * delta);
        assertTrue(expected > 0.005, "the pH rises with the γ of the more charged base form: " + expected);
        org.junit.jupiter.api.Assertions.assertEquals(expected, r.pH(), 1e-3 * expected);
        org.junit.jupiter.api.Assertions.assertEquals(IonInteraction.daviesDisagreement(
                p.point(totals, null).ionicStrength()), p.derivatives().activityModelUncertainty(), 1e-15);
    }
}
