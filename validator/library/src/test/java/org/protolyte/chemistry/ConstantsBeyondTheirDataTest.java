package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * A component whose constants do not hold at the temperature voids the result by its share of the buffer capacity
 * (dpH/dpKa_C = β_C/β): below 5 %, a 0.1 error in its pKa moves the pH by less than 0.005 and it is named in a
 * warning; above, no pH. A main acid A valid everywhere and an amine B with data for 0–30 °C, solved at 37 °C. The
 * constants are invented test values, not data.
 */
class ConstantsBeyondTheirDataTest {

    private static final Equilibrium DAVIES = new Equilibrium(Davies.INSTANCE);
    private static final Component NA = new Component("Na+", 1);
    private static final Component M = new Component("M+2", 2);
    private static final Component CL = new Component("Cl-", -1);
    private static final TemperatureRange ANY = TemperatureRange.UNBOUNDED;
    private static final AcidBaseSystem ACID = new AcidBaseSystem("A",
            List.of(new AcidBaseSystem.Form("H2A", 0), new AcidBaseSystem.Form("HA-", -1),
                    new AcidBaseSystem.Form("A-2", -2)),
            List.of(new DissociationStep(4.6, 0, 0, 0, ANY), new DissociationStep(7.0, 0, 0, 0, ANY)));
    private static final AcidBaseSystem AMINE = new AcidBaseSystem("B",
            List.of(new AcidBaseSystem.Form("BH+", 1), new AcidBaseSystem.Form("B", 0)),
            List.of(new DissociationStep(7.6, 0, 0, 0, TemperatureRange.celsius(0, 30))));

    private static EquilibriumState solve(double amine, boolean withComplex) {
        List<Species> species = new ArrayList<>(ACID.species());
        species.addAll(AMINE.species());
        species.add(Species.free(NA));
        species.add(Species.free(CL));
        species.add(Species.free(M));
        if (withComplex) {
            species.add(new Species("MA", 0, Map.of(M, 1, ACID.basis(), 1), 0, new FormationConstant(2.0, 0, 0, 0, ANY)));
        }
        Map<Component, Double> totals = new LinkedHashMap<>();
        totals.put(ACID.basis(), 0.02);
        totals.put(AMINE.basis(), amine);
        totals.put(NA, 0.03);
        totals.put(M, withComplex ? 0.002 : 0);
        totals.put(CL, 0.004 + amine / 2);
        return DAVIES.solve(species, totals, 310.15);
    }

    private static double share(EquilibriumState s) {
        return s.componentBufferCapacity().get(AMINE.basis()) / s.bufferCapacity();
    }

    @ParameterizedTest(name = "with a complex: {0}")
    @ValueSource(booleans = {false, true})
    void aTraceBeyondItsDataIsNamedWithItsShare(boolean withComplex) {
        EquilibriumState s = solve(0.0005, withComplex);
        assertTrue(share(s) > 0 && share(s) < 0.05, "share " + share(s));
        assertTrue(s.determinate(), s.caveats().toString());
        Caveat c = s.caveats().stream().filter(x -> x.code().equals("temperature-out-of-range-minor")).findFirst()
                .orElseThrow();
        String named = String.format(Locale.ROOT, "BH+ (0–30 °C, %.2g %% of β)", 100 * share(s));
        assertTrue(c.message().contains(named), c.message() + " lacks " + named);
        assertEquals(c.message().indexOf("BH+ ("), c.message().lastIndexOf("BH+ ("), "named once: " + c.message());
        assertTrue(c.message().startsWith("37.0 °C"), c.message());
    }

    @ParameterizedTest(name = "with a complex: {0}")
    @ValueSource(booleans = {false, true})
    void aComponentCarryingMoreThanAFewPerCentOfTheBufferingVoidsThePH(boolean withComplex) {
        EquilibriumState s = solve(0.004, withComplex);
        assertTrue(share(s) > 0.05, "share " + share(s));
        assertFalse(s.determinate());
        Caveat c = s.caveats().stream().filter(x -> x.code().equals("temperature-out-of-range")).findFirst()
                .orElseThrow();
        assertTrue(c.message().contains("37.0 °C is outside 0–30 °C, where the constants of "), c.message());
    }

    /** An amine the recipe does not hold says nothing, wherever its constants hold. */
    @Test
    void anAbsentComponentBeyondItsDataSaysNothing() {
        EquilibriumState s = solve(0, false);
        assertTrue(s.caveats().isEmpty(), s.caveats().toString());
    }
}
