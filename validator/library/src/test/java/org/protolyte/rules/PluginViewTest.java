package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.spi.Analysis;
import org.protolyte.spi.Condition;

/** What a site's check reads ({@link org.protolyte.spi.Analysis}) is the engine's result, copied value for value. */
class PluginViewTest {

    private static final String ACETATE = Analyses.formulation(", \"title\": \"Acetate\", \"intendedUse\": \"laboratory\","
                    + " \"targets\": {\"pH\": {\"value\": 4.7, \"tolerance\": 0.5, \"temperature\": \"30 Cel\"}},"
                    + " \"conditions\": [{\"name\": \"prep\", \"temperature\": \"20 Cel\"}, {\"name\": \"use\","
                    + " \"temperature\": \"30 Cel\"}]",
            Analyses.component("acetic acid", "50 mmol/L"), Analyses.component("sodium acetate anhydrous", "25 mmol/L"));

    @Test
    void theDocumentsIdentityAndTargetAreCopied() {
        Analysis v = PluginCheck.view(Analyses.analyse(ACETATE));
        assertEquals("TST-FIX", v.id());
        assertEquals(Optional.of("Acetate"), v.title());
        assertEquals(Optional.of("A"), v.revision());
        assertEquals(Optional.of("laboratory"), v.intendedUse());
        var t = v.pHTarget().orElseThrow();
        assertEquals(4.2, t.min(), 1e-12);
        assertEquals(5.2, t.max(), 1e-12);
        assertEquals(30.0, t.temperature(), 1e-9, "°C, as the document states it");
        assertEquals("/targets/pH", t.pointer());
    }

    @Test
    void eachComponentCarriesItsConcentrationPerLitreOfSolution() {
        Analysis v = PluginCheck.view(Analyses.analyse(ACETATE));
        assertEquals(2, v.components().size());
        assertEquals("acetic acid", v.components().get(0).substance());
        assertEquals("/components/0", v.components().get(0).pointer());
        // 50 and 25 mmol/L as written, per litre of the 1 L made up (hand arithmetic)
        assertEquals(50.0, v.components().get(0).concentration().orElseThrow(), 1e-6);
        assertEquals(25.0, v.components().get(1).concentration().orElseThrow(), 1e-6);
    }

    @Test
    void eachConditionCarriesTheEnginesNumbersInTheSpisUnits() {
        FormulationAnalysis a = Analyses.analyse(ACETATE);
        Analysis v = PluginCheck.view(a);
        assertEquals(a.conditions().size(), v.conditions().size());
        for (int i = 0; i < v.conditions().size(); i++) {
            ConditionResult r = a.conditions().get(i);
            Condition c = v.conditions().get(i);
            assertTrue(c.determinate());
            assertEquals(r.condition().name(), c.name());
            assertEquals(r.condition().pointer(), c.pointer());
            assertEquals(r.condition().kelvin() - 273.15, c.temperature(), 1e-9);
            var s = r.state().orElseThrow();
            assertEquals(s.pH(), c.pH().orElseThrow(), 0);
            assertEquals(r.uncertainty().orElseThrow().pH(), c.pHUncertainty().orElseThrow(), 0);
            assertEquals(r.bufferCapacityPerLitre() * 1000, c.bufferCapacity().orElseThrow(), 1e-12, "mmol/L/pH");
            assertEquals(s.ionicStrength(), c.ionicStrength().orElseThrow(), 0);
            assertEquals(s.osmolality() * 1000, c.osmolality().orElseThrow(), 1e-9, "mOsm/kg");
        }
        assertEquals("prep", v.conditions().get(0).name());
        assertEquals(20.0, v.conditions().get(0).temperature(), 1e-9);
    }

    @Test
    void anIndeterminateConditionHasNoNumbers() {
        // below the estimated freezing point the engine gives no pH
        FormulationAnalysis a = Analyses.analyse(Analyses.formulation(", \"conditions\": [{\"name\": \"frozen\","
                + " \"temperature\": \"-20 Cel\"}]", Analyses.component("sodium chloride", "10 mmol/L")));
        Condition c = PluginCheck.view(a).conditions().get(0);
        assertFalse(c.determinate());
        assertTrue(c.pHUncertainty().isEmpty() && c.bufferCapacity().isEmpty() && c.ionicStrength().isEmpty()
                && c.osmolality().isEmpty());
        assertEquals(-20.0, c.temperature(), 1e-9);
    }
}
