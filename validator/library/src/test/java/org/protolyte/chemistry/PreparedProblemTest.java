package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * A problem prepared once and solved many times answers what a fresh solve answers: the fast path, the warm start
 * from a neighbour and a search's trial step are the same equations solved another way. The constants are invented
 * test values, not data.
 */
class PreparedProblemTest {

    private static final Equilibrium DAVIES = new Equilibrium(Davies.INSTANCE);
    private static final Component NA = new Component("Na+", 1);
    private static final Component CL = new Component("Cl-", -1);
    private static final Component M = new Component("M+2", 2);
    private static final TemperatureRange ANY = TemperatureRange.UNBOUNDED;
    private static final AcidBaseSystem ACID = new AcidBaseSystem("A",
            List.of(new AcidBaseSystem.Form("H3A", 0), new AcidBaseSystem.Form("H2A-", -1),
                    new AcidBaseSystem.Form("HA-2", -2), new AcidBaseSystem.Form("A-3", -3)),
            List.of(new DissociationStep(3.1, 4_000, 0, 0, ANY), new DissociationStep(4.8, 2_000, 0, 0, ANY),
                    new DissociationStep(6.4, -3_000, 0, 0, ANY)));
    private static final AcidBaseSystem BASE = new AcidBaseSystem("B",
            List.of(new AcidBaseSystem.Form("BH+", 1), new AcidBaseSystem.Form("B", 0)),
            List.of(new DissociationStep(8.1, 47_000, 0, 0, TemperatureRange.celsius(0, 30))));

    private static List<Species> species(boolean withComplexes) {
        List<Species> s = new ArrayList<>(ACID.species());
        s.addAll(BASE.species());
        s.add(Species.free(NA));
        s.add(Species.free(CL));
        s.add(Species.free(M));
        if (withComplexes) {
            s.add(new Species("MA-", -1, Map.of(M, 1, ACID.basis(), 1), 0, new FormationConstant(4.5, 0, 0, 0, ANY)));
            s.add(new Species("MHA", 0, Map.of(M, 1, ACID.basis(), 1), 1, new FormationConstant(8.9, 0, 0, 0, ANY)));
            s.add(new Species("MB2+2", 2, Map.of(M, 1, BASE.basis(), 2), 0, new FormationConstant(2.5, 0, 0, 0, ANY)));
        }
        return s;
    }

    private static Map<Component, Double> totals(double sodium) {
        Map<Component, Double> t = new LinkedHashMap<>();
        t.put(ACID.basis(), 0.02);
        t.put(BASE.basis(), 0.015);
        t.put(NA, sodium);
        t.put(CL, 0.03);
        t.put(M, 0.004);
        return t;
    }

    private static void assertSame(EquilibriumState expected, Equilibrium.Point p) {
        assertEquals(expected.pH(), p.pH(), 1e-8);
        assertEquals(expected.ionicStrength(), p.ionicStrength(), 1e-9 * expected.ionicStrength());
        assertEquals(expected.bufferCapacity(), p.bufferCapacity(), 1e-7 * expected.bufferCapacity());
        assertEquals(expected.osmolality(), p.osmolality(), 1e-9 * expected.osmolality());
    }

    @ParameterizedTest(name = "complexes: {0}")
    @ValueSource(booleans = {false, true})
    void theFastPathAnswersWhatASolveAnswers(boolean complexes) {
        Equilibrium.Prepared p = DAVIES.prepare(species(complexes), totals(0).keySet(), 298.15, Map.of());
        for (double na = 0.0; na <= 0.09; na += 0.015) {
            assertSame(DAVIES.solve(species(complexes), totals(na), 298.15), p.point(totals(na), null));
        }
    }

    @ParameterizedTest(name = "complexes: {0}")
    @ValueSource(booleans = {false, true})
    void aWarmStartFromANeighbourAnswersWhatAColdStartAnswers(boolean complexes) {
        Equilibrium.Prepared p = DAVIES.prepare(species(complexes), totals(0).keySet(), 298.15, Map.of());
        Equilibrium.Point warm = p.point(totals(0.03), null);
        for (double na : new double[] {0.031, 0.036, 0.05, 0.08}) {
            EquilibriumState cold = DAVIES.solve(species(complexes), totals(na), 298.15);
            assertSame(cold, p.point(totals(na), warm));
            assertSame(cold, p.trial(totals(na), warm));
            assertSame(cold, p.trial(totals(na), null));
            warm = p.point(totals(na), warm);
        }
    }

    @Test
    void totalsInComponentOrderAnswerWhatTheMapAnswers() {
        Equilibrium.Prepared p = DAVIES.prepare(species(true), totals(0).keySet(), 298.15, Map.of());
        List<Component> order = p.components();
        assertEquals(List.copyOf(totals(0).keySet()), order);
        double[] t = new double[order.size()];
        for (int j = 0; j < t.length; j++) {
            t[j] = totals(0.045).get(order.get(j));
        }
        assertSame(DAVIES.solve(species(true), totals(0.045), 298.15), p.point(t, null));
    }

    @Test
    void totalsOfTheWrongNumberOrSignAreRefused() {
        Equilibrium.Prepared p = DAVIES.prepare(species(false), totals(0).keySet(), 298.15, Map.of());
        assertThrows(IllegalArgumentException.class, () -> p.point(new double[] {0.01, 0.01}, null));
        double[] negative = {0.02, 0.015, -0.001, 0.03, 0.004};
        assertTrue(assertThrows(IllegalArgumentException.class, () -> p.point(negative, null)).getMessage()
                .contains("Na+"));
        double[] notFinite = {0.02, 0.015, Double.POSITIVE_INFINITY, 0.03, 0.004};
        assertThrows(IllegalArgumentException.class, () -> p.point(notFinite, null));
        Map<Component, Double> nan = totals(0.01);
        nan.put(CL, Double.NaN);
        assertThrows(IllegalArgumentException.class, () -> p.point(nan, null));
        Map<Component, Double> infinite = totals(0.01);
        infinite.put(CL, Double.POSITIVE_INFINITY);
        assertThrows(IllegalArgumentException.class, () -> p.point(infinite, null));
        Map<Component, Double> stranger = totals(0.01);
        stranger.put(new Component("K+", 1), 0.001);
        assertTrue(assertThrows(IllegalArgumentException.class, () -> p.point(stranger, null)).getMessage()
                .contains("K+"));
    }

    /** At 40 °C the base's constants (0–30 °C) carry most of the buffering: no number from the fast path. */
    @Test
    void theFastPathRefusesWhatASolveReportsIndeterminate() {
        Equilibrium.Prepared p = DAVIES.prepare(species(false), totals(0).keySet(), 313.15, Map.of());
        Map<Component, Double> t = new LinkedHashMap<>();
        t.put(BASE.basis(), 0.05);
        t.put(CL, 0.025);
        EquilibriumState s = DAVIES.solve(species(false), t, 313.15);
        assertTrue(!s.determinate());
        IndeterminateException e = assertThrows(IndeterminateException.class, () -> p.point(t, null));
        assertEquals("temperature-out-of-range", e.caveat().code());
        assertSame(s, p.trial(t, null));     // a search's step still gets its number
    }

    /** After a solve with complexes, a recipe without any of their components forms none: plain saline, neutral. */
    @Test
    void complexesOfComponentsNowAbsentFormNothing() {
        Equilibrium.Prepared p = DAVIES.prepare(species(true), totals(0).keySet(), 298.15, Map.of());
        p.point(totals(0.05), null);
        Map<Component, Double> saline = new LinkedHashMap<>();
        saline.put(NA, 0.03);
        saline.put(CL, 0.03);
        EquilibriumState fresh = DAVIES.solve(List.of(Species.free(NA), Species.free(CL)), saline, 298.15);
        assertSame(fresh, p.point(saline, null));
        assertEquals(Water.pKw(298.15) / 2, p.point(saline, null).pH(), 0.01);
    }

    /** A search's trial takes the totals it is given, not those of the solve before it; a zero total is allowed. */
    @Test
    void eachTrialTakesItsOwnTotals() {
        Equilibrium.Prepared p = DAVIES.prepare(species(false), totals(0).keySet(), 298.15, Map.of());
        p.point(totals(0.02), null);
        assertSame(DAVIES.solve(species(false), totals(0.07), 298.15), p.trial(totals(0.07), null));
        double[] t = {0.02, 0.015, 0.0, 0.03, 0.004};
        assertSame(DAVIES.solve(species(false), totals(0), 298.15), p.point(t, null));
    }

    @Test
    void aComponentTheMapLeavesOutIsAbsent() {
        Equilibrium.Prepared p = DAVIES.prepare(species(false), totals(0).keySet(), 298.15, Map.of());
        p.point(totals(0.05), null);
        Map<Component, Double> fewer = new LinkedHashMap<>(totals(0.05));
        fewer.remove(M);
        Map<Component, Double> zero = new LinkedHashMap<>(totals(0.05));
        zero.put(M, 0.0);
        assertSame(DAVIES.solve(species(false), zero, 298.15), p.point(fewer, null));
    }
}
