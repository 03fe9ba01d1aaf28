package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertEquals;
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
 * The hand-over from Davies' equation to Pitzer's ({@link IonInteraction}): identical to Davies below 0.1 mol/kg,
 * continuous in pH and in its slope through 0.1–0.3 mol/kg, Pitzer's own above. Properties of the construction, so no
 * published value is checked here: the compositions are invented for the test and each tolerance is derived beside it;
 * the concentrated model's check values against published tables are in {@code reference.ElectrolyteActivityTest}.
 */
class IonInteractionTest {

    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(new SchemaCatalog());
    private static final Equilibrium DAVIES = new Equilibrium(Davies.INSTANCE);
    private static final Equilibrium HANDED_OVER = new Equilibrium(IonInteraction.INSTANCE);
    private static final Component NA = LIBRARY.ion("Na+").orElseThrow();
    private static final Component CL = LIBRARY.ion("Cl-").orElseThrow();
    private static final AcidBaseSystem PHOSPHATE = LIBRARY.system("phosphate").orElseThrow();

    /** A sodium phosphate buffer, 20 mmol/kg at about pH 7, in sodium chloride of this molality. */
    private static EquilibriumState phosphateIn(Equilibrium e, double chloride) {
        List<Species> species = new ArrayList<>(PHOSPHATE.species());
        species.add(Species.free(NA));
        species.add(Species.free(CL));
        Map<Component, Double> totals = new LinkedHashMap<>();
        totals.put(PHOSPHATE.basis(), 0.020);
        totals.put(NA, 0.030 + chloride);
        totals.put(CL, chloride);
        // Na+ exceeds Cl- by 0.030: 1.5 bound protons per PO4-3, H2PO4-/HPO4-2 about 1:1
        return e.solve(species, totals, 298.15);
    }

    @Test
    void belowTheHandOverItIsDavies() {
        for (double cl : new double[] {0, 0.01, 0.03}) {
            EquilibriumState d = phosphateIn(DAVIES, cl);
            EquilibriumState x = phosphateIn(HANDED_OVER, cl);
            assertTrue(d.ionicStrength() < IonInteraction.FROM);
            assertEquals(d.pH(), x.pH(), 1e-12);
            assertEquals(d.osmolality(), x.osmolality(), 1e-12);
        }
    }

    /**
     * A sweep of sodium chloride through the hand-over in steps of 2 mmol/kg: no step of the pH departs from the line
     * through its neighbours by more than the curvature of a smooth curve allows (a jump of 0.001 pH would give 5e-4).
     */
    @Test
    void thePhIsContinuousThroughTheHandOver() {
        double step = 0.002;
        List<Double> pH = new ArrayList<>();
        List<Double> ionic = new ArrayList<>();
        for (double cl = 0.02; cl <= 0.42; cl += step) {
            EquilibriumState s = phosphateIn(HANDED_OVER, cl);
            pH.add(s.pH());
            ionic.add(s.ionicStrength());
        }
        assertTrue(ionic.get(0) < IonInteraction.FROM && ionic.get(ionic.size() - 1) > IonInteraction.TO);
        for (int k = 1; k + 1 < pH.size(); k++) {
            double bend = pH.get(k) - 0.5 * (pH.get(k - 1) + pH.get(k + 1));
            assertTrue(Math.abs(bend) < 1e-4, "at I " + ionic.get(k) + ": " + bend);
        }
        // and the two models do differ beyond it, so the sweep crossed a real hand-over
        double beyond = phosphateIn(HANDED_OVER, 0.42).pH() - phosphateIn(DAVIES, 0.42).pH();
        assertTrue(Math.abs(beyond) > 0.005, "Pitzer and Davies at I 0.5: " + beyond);
    }

    @Test
    void theWeightIsSmooth() {
        assertEquals(0, IonInteraction.weight(0.1));
        assertEquals(1, IonInteraction.weight(0.3));
        assertEquals(0.5, IonInteraction.weight(0.2), 1e-15);
        assertEquals(0, IonInteraction.weightSlope(0.1));
        assertEquals(0, IonInteraction.weightSlope(0.3));
        double h = 1e-6;
        assertEquals((IonInteraction.weight(0.15 + h) - IonInteraction.weight(0.15 - h)) / (2 * h),
                IonInteraction.weightSlope(0.15), 1e-6);
    }
}
