package org.protolyte.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.Uncertainty;
import org.protolyte.chemistry.Caveat;

/**
 * Where Pitzer's equations carry a concentrated solution and where they stop: buffers whose ions all have parameters
 * get a pH to the range of their salts' fits, a buffer ion without parameters keeps Davies' limits, and the activity
 * model's own uncertainty is in the ±.
 */
class ConcentratedSolutionsTest {

    /** An equimolal sodium–potassium phosphate buffer, 20 mmol/kg each, in sodium chloride of this molality. */
    private static ConditionResult phosphateIn(double sodiumChloride, double celsius) {
        return ReferenceDocuments.solution().with("sodium chloride", sodiumChloride)
                .with("potassium dihydrogen phosphate", 0.02).with("disodium hydrogen phosphate anhydrous", 0.02)
                .condition(celsius);
    }

    private static boolean has(ConditionResult c, String code) {
        return c.caveats().stream().anyMatch(x -> x.code().equals(code));
    }

    private static Uncertainty.Contribution activityModel(ConditionResult c) {
        return c.uncertainty().orElseThrow().contributions().stream()
                .filter(x -> x.constant().startsWith("activity model")).findFirst().orElseThrow();
    }

    /**
     * Every ion of a phosphate buffer in sodium chloride has Pitzer parameters (PM73 Tables I and VI), so its pH is
     * given up to the goal of 3 mol/kg, and falls as the salt rises (the apparent pKa2 of phosphate falls with
     * ionic strength: its forms differ by 3 in squared charge, common practice).
     */
    @Test
    void aPhosphateBufferHasAPhToThreeMolesPerKilogramOfSodiumChloride() {
        double last = Double.POSITIVE_INFINITY;
        for (double salt : new double[] {0.25, 0.5, 1, 2, 3}) {
            ConditionResult c = phosphateIn(salt, 25);
            assertTrue(c.determinate(), () -> salt + " mol/kg: " + c.caveats());
            assertFalse(has(c, "ionic-strength-high"), () -> c.caveats().toString());
            double pH = c.state().orElseThrow().pH();
            assertTrue(pH < last, salt + " mol/kg: pH " + pH + " after " + last);
            last = pH;
        }
    }

    /**
     * Above the range of a fit no pH: 20 mmol/kg Tris half neutralised in sodium chloride, whose TrisH+–Cl- parameters
     * (Gallego-Urrea and Turner 2017) have no stated range and are held to 1 mol/kg (PitzerParameters.NO_RANGE).
     */
    @Test
    void trisBeyondItsParametersRangeIsIndeterminateWithTheReason() {
        ConditionResult inside = ReferenceDocuments.solution().with("sodium chloride", 0.8).with("Tris", 0.02)
                .with("hydrochloric acid", 0.01).condition(25);
        assertTrue(inside.determinate(), () -> inside.caveats().toString());
        ConditionResult beyond = ReferenceDocuments.solution().with("sodium chloride", 1.2).with("Tris", 0.02)
                .with("hydrochloric acid", 0.01).condition(25);
        assertFalse(beyond.determinate());
        Caveat c = beyond.caveats().stream().filter(x -> x.code().equals("ionic-strength-out-of-range")).findFirst()
                .orElseThrow(() -> new AssertionError(beyond.caveats().toString()));
        assertTrue(c.message().contains("TrisH+–Cl-"), c.message());
    }

    /**
     * HEPES has no Pitzer parameters: it keeps Davies' equation and its limits, a warning above 0.2 mol/kg and no pH
     * above 0.5, with the ion named.
     */
    @Test
    void aBufferIonWithoutParametersKeepsDaviesLimitsAndIsNamed() {
        ConditionResult warned = ReferenceDocuments.solution().with("sodium chloride", 0.3).with("HEPES", 0.02)
                .with("HEPES sodium salt", 0.02).condition(25);
        assertTrue(warned.determinate(), () -> warned.caveats().toString());
        Caveat w = warned.caveats().stream().filter(x -> x.code().equals("ionic-strength-high")).findFirst()
                .orElseThrow(() -> new AssertionError(warned.caveats().toString()));
        assertTrue(w.message().contains("HEPES-"), w.message());
        ConditionResult refused = ReferenceDocuments.solution().with("sodium chloride", 1.0).with("HEPES", 0.02)
                .with("HEPES sodium salt", 0.02).condition(25);
        assertFalse(refused.determinate());
        assertTrue(refused.caveats().stream().anyMatch(x -> x.code().equals("ionic-strength-out-of-range")
                && x.message().contains("HEPES-")), () -> refused.caveats().toString());
    }

    /**
     * In 1 mol/kg sodium chloride Pitzer carries every ion (weight 1), so the activity model moves the pH by the
     * difference of squared charges across the buffering step times its uncertainty per unit z²: 3 × 0.0054 = 0.016
     * (derived: log10 1.025 / 2, see Interactions.PITZER_UNCERTAINTY; pH = pKa2 + log(m_B γ_B / m_A γ_A)). The
     * constants' share is much smaller.
     */
    @Test
    void theActivityModelsUncertaintyIsInThePlusMinus() {
        ConditionResult c = phosphateIn(1.0, 25);
        Uncertainty.Contribution a = activityModel(c);
        // raising log γ by z²u: a_H = Ka·m_A γ_A/(m_B γ_B) falls by (4 − 1)u, so the pH rises
        assertEquals(3 * 0.0054, a.pHChange(), 0.1 * 3 * 0.0054);
        assertTrue(c.uncertainty().orElseThrow().pH() >= Math.abs(a.pHChange()));
    }

    /**
     * Away from 25 °C the phosphate pairs' parameters, which have no published temperature terms, are each a constant
     * of the budget, moved to the bound of the largest published slopes (PitzerParameters.SLOPE_BOUND), and a
     * diagnostic says so; at 25 °C they count nothing. Moved one at a time their effects do not cancel: each pair's
     * β enters only its own ions' γ, and at 1 mol/kg Na+ a β¹ off by 0.057 (20 K × 28.6e-4) moves log γ of HPO4-2
     * by about 2 × 1.04 × 0.057 × g(2√I)/ln10 ≈ 0.015 (derived from the equations in Pitzer's class comment, g ≈ 0.3),
     * so the pH by a hundredth.
     */
    @ParameterizedTest
    @ValueSource(doubles = {5, 45})
    void parametersWithoutTemperatureTermsWidenThePlusMinusAwayFromTwentyFiveDegrees(double celsius) {
        ConditionResult at25 = phosphateIn(1.0, 25);
        ConditionResult away = phosphateIn(1.0, celsius);
        assertFalse(has(at25, "pitzer-parameters-extrapolated"), () -> at25.caveats().toString());
        assertTrue(has(away, "pitzer-parameters-extrapolated"), () -> away.caveats().toString());
        assertTrue(away.determinate(), () -> away.caveats().toString());
        assertTrue(at25.uncertainty().orElseThrow().contributions().stream()
                .noneMatch(x -> x.constant().startsWith("Pitzer ")), () -> at25.uncertainty().toString());
        Uncertainty.Contribution hydrogenPhosphate = away.uncertainty().orElseThrow().contributions().stream()
                .filter(x -> x.constant().startsWith("Pitzer Na+–HPO4-2")).findFirst()
                .orElseThrow(() -> new AssertionError(away.uncertainty().toString()));
        assertEquals(0.057, hydrogenPhosphate.standardUncertainty(), 0.001);
        // a larger β of Na+–HPO4-2 raises ln γ of the base form (2 m_Na ΔB > 0), so the pH rises; the same move of
        // Na+–H2PO4- raises ln γ of the acid form, so it falls
        assertTrue(hydrogenPhosphate.pHChange() > 0.005 && hydrogenPhosphate.pHChange() < 0.03,
                hydrogenPhosphate::toString);
        Uncertainty.Contribution dihydrogenPhosphate = away.uncertainty().orElseThrow().contributions().stream()
                .filter(x -> x.constant().startsWith("Pitzer Na+–H2PO4-")).findFirst().orElseThrow();
        assertTrue(dihydrogenPhosphate.pHChange() < -0.005, dihydrogenPhosphate::toString);
        assertTrue(away.uncertainty().orElseThrow().pH() > at25.uncertainty().orElseThrow().pH(),
                () -> away.uncertainty() + " against " + at25.uncertainty());
    }
}
