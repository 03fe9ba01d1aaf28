package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.recipe.Solution;
import org.protolyte.substance.Fluid;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;

/** The receiving fluids the library ships, against published compositions and the clinical bicarbonate equation. */
class ReceivingFluidsTest {

    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(new SchemaCatalog());

    private static Fluid fluid(String name) {
        return LIBRARY.fluid(name).orElseThrow(() -> new AssertionError(name));
    }

    private static double millimolarOf(Solution s, String ion) {
        double perLitre = s.waterKg() / s.volumeLitres(298.15);
        return 1000 * perLitre * s.totals().entrySet().stream().filter(e -> e.getKey().name().equals(ion))
                .mapToDouble(java.util.Map.Entry::getValue).sum();
    }

    /**
     * USP 32, Lactated Ringer's Injection, note: "calcium, potassium, and sodium contents … approximately 2.7, 4, and
     * 130 milliequivalents per liter" (read); the entry is the labelled composition, so it must give them.
     */
    @Test
    void lactatedRingersHoldsThePharmacopoeiasElectrolytes() {
        Solution s = new RecipeResolver(LIBRARY).fluid(fluid("Ringer's lactate")).solution(java.util.Map.of());
        assertEquals(130, millimolarOf(s, "Na+"), 0.5);
        assertEquals(4, millimolarOf(s, "K+"), 0.05);
        assertEquals(2.7 / 2, millimolarOf(s, "Ca+2"), 0.025);   // "approximately": 2.72 mEq from 0.20 g/L
    }

    /**
     * The plasma model at 37 °C under 5.3 kPa (39.8 mmHg) of CO2 against the clinical Henderson–Hasselbalch equation,
     * pH = 6.1 + log10([HCO3-] / (0.0301 mmol L-1 mmHg-1 × pCO2)) (common practice; pK' 6.1 and α 0.0301 as in
     * textbooks of physiology, from memory): 7.45 at 27 mmol/L. The equation's pK' is an apparent constant of real
     * plasma, so 0.1 is allowed for the model's ionic strength and activity coefficients.
     */
    @Test
    void thePlasmaModelReadsThePhOfTheClinicalBicarbonateEquation() {
        Fluid plasma = fluid("injection site");
        assertEquals(310.15, plasma.kelvin(), 1e-9);
        double mmHg = plasma.co2Pascal().orElseThrow() / 133.322;
        double clinical = 6.1 + Math.log10(27 / (0.0301 * mmHg));
        ConditionResult r = new Analyzer(new Equilibrium(Davies.INSTANCE))
                .analyze(new RecipeResolver(LIBRARY).fluid(plasma)).conditions().get(0);
        double pH = r.state().orElseThrow().pH();
        assertEquals(clinical, pH, 0.1);
        assertTrue(r.uncertainty().orElseThrow().pH() > 0.005, "the constants' ± is carried: " + r.uncertainty());
    }
}
