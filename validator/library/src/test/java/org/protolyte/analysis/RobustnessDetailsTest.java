package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.substance.LibraryLoader;

/**
 * The robustness study's bookkeeping: what it varies, what it reports with no batch, the sign of its sensitivities,
 * its figures per litre, and recipes weighed per kg of water (which take the general path, not the affine batch map).
 * Expected values are definitions, Henderson–Hasselbalch, or the analysis of the same recipe (two paths that must agree).
 */
class RobustnessDetailsTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Equilibrium EQUILIBRIUM = new Equilibrium(Davies.INSTANCE);

    private static Recipe recipe(String basis, String components, String conditions) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-RD\", \"revision\": \"A\","
                + " \"basis\": " + basis + ", \"components\": [" + components + "],"
                + " \"targets\": {\"pH\": {\"value\": 6.9, \"tolerance\": 0.3, \"temperature\": \"25 Cel\"}},"
                + " \"conditions\": " + conditions + "}";
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read("t", json.getBytes(StandardCharsets.UTF_8)));
        return new RecipeResolver(LibraryLoader.shipped(SCHEMAS)).resolve(f);
    }

    private static final String AT_25 = "[{\"name\": \"use\", \"temperature\": \"25 Cel\"}]";

    /** The defaults the README gives: ±1 % per weighing, σ 0.01 pH for the meter. */
    @Test
    void theDefaultsAreTheDocumentedOnes() {
        Robustness.Settings d = Robustness.Settings.defaults();
        assertEquals(0.01, d.defaultTolerance());
        assertEquals(0.01, d.meterStandardUncertainty());
        assertTrue(d.samples() > 0);
    }

    /**
     * Only what is weighed varies, each by its own tolerance or the default: not the water, not the q.s. titrant
     * (its dose is found again per batch).
     */
    @Test
    void onlyTheWeighedComponentsVary() {
        Recipe r = recipe("{\"waterMass\": \"1 kg\"}", "{\"substance\": \"water\", \"amount\": \"100 g\"},"
                + " {\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"20 mmol/kg\", \"tolerance\": \"2 %\"},"
                + " {\"substance\": \"sodium chloride\", \"amount\": \"100 mmol/kg\"},"
                + " {\"substance\": \"sodium hydroxide\", \"stock\": {\"concentration\": \"1 mol/L\"},"
                + " \"adjustTo\": {\"temperature\": \"25 Cel\"}}", AT_25);
        Robustness.Result res = new Robustness(EQUILIBRIUM).run(r, new Robustness.Settings(20, 1, 0.005, 0.01), x -> { });
        assertEquals(Map.of("potassium dihydrogen phosphate", 0.02, "sodium chloride", 0.005), res.tolerances());
    }

    /** No batch asked for: nothing to describe (NaN, not zero) and no probability, though corners are still found. */
    @Test
    void noSamplesGiveNoDistributionAndNoProbability() {
        Recipe r = recipe("{\"finalVolume\": \"1 L\"}", PHOSPHATE_PER_LITRE, AT_25);
        Robustness.Result res = new Robustness(EQUILIBRIUM).run(r, new Robustness.Settings(0, 1, 0.01, 0.01), x -> { });
        Robustness.ConditionRobustness c = res.conditions().get(0);
        assertEquals(0, res.samplesSolved());
        assertTrue(Double.isNaN(c.pH().mean()) && Double.isNaN(c.pH().p975()), c::toString);
        assertTrue(c.probabilityOutsideTarget().isEmpty(), c::toString);
        assertTrue(c.lowestCornerPH() < c.highestCornerPH(), c::toString);
    }

    private static final String PHOSPHATE_PER_LITRE = "{\"substance\": \"potassium dihydrogen phosphate\", \"amount\": "
            + "\"25 mmol/L\"}, {\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": \"25 mmol/L\"}";

    /**
     * Weighed per kg of water (no affine batch map): by Henderson–Hasselbalch +1 % of the base form raises the pH by
     * log10(1.01) = 0.0043 and +1 % of the acid lowers it by as much, within 20 % for the ionic strength (as in
     * SensitivityTest); the batches centre on the analysed pH.
     */
    @Test
    void aRecipePerKgOfWaterHasHendersonHasselbalchSensitivities() {
        Recipe r = recipe("{\"waterMass\": \"1 kg\"}", "{\"substance\": \"potassium dihydrogen phosphate\", \"amount\": "
                + "\"25 mmol/kg\"}, {\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": \"25 mmol/kg\"}",
                AT_25);
        Robustness.Result res = new Robustness(EQUILIBRIUM).run(r, new Robustness.Settings(200, 3, 0.01, 0.01), x -> { });
        Robustness.ConditionRobustness c = res.conditions().get(0);
        double hh = Math.log10(1.01);
        assertEquals(hh, c.sensitivities().get("disodium hydrogen phosphate anhydrous"), 0.2 * hh);
        assertEquals(-hh, c.sensitivities().get("potassium dihydrogen phosphate"), 0.2 * hh);
        assertEquals(200, res.samplesSolved());
        double analysed = new Analyzer(EQUILIBRIUM).analyze(r).conditions().get(0).state().orElseThrow().pH();
        assertEquals(analysed, c.pH().mean(), 0.002);
    }

    /**
     * β per litre of solution at the condition's temperature, as the analysis gives it: with tolerances of a
     * millionth and no meter error, every batch is the nominal one, at 37 °C where the litre made up at 20 °C has
     * expanded (so per kg of water, or per litre at another temperature, would differ by some 0.5 %).
     */
    @Test
    void batchBufferCapacityIsPerLitreAtTheConditionsTemperature() {
        Recipe r = recipe("{\"finalVolume\": \"1 L\"}", PHOSPHATE_PER_LITRE,
                "[{\"name\": \"use\", \"temperature\": \"25 Cel\"}, {\"name\": \"warm\", \"temperature\": \"60 Cel\"}]");
        ConditionResult analysed = new Analyzer(EQUILIBRIUM).analyze(r).conditions().get(1);
        Robustness.Result res = new Robustness(EQUILIBRIUM).run(r, new Robustness.Settings(20, 3, 1e-6, 0), x -> { });
        double mc = res.conditions().get(1).bufferCapacity().mean() / 1000;
        assertEquals(analysed.bufferCapacityPerLitre(), mc, 1e-4 * analysed.bufferCapacityPerLitre());
    }

    /** An analysis with a study holds that study. */
    @Test
    void anAnalysisWithRobustnessHoldsIt() {
        Recipe r = recipe("{\"finalVolume\": \"1 L\"}", PHOSPHATE_PER_LITRE, AT_25);
        FormulationAnalysis a = new Analyzer(EQUILIBRIUM).analyze(r);
        Robustness.Result res = new Robustness(EQUILIBRIUM).run(r, new Robustness.Settings(10, 3, 0.01, 0.01), x -> { });
        FormulationAnalysis with = a.withRobustness(res);
        assertSame(res, with.robustness().orElseThrow());
        assertEquals(a.conditions(), with.conditions());
        assertTrue(a.robustness().isEmpty());
    }

    /**
     * 10 mmol/L sodium hydroxide: the pH is pKw less pOH, so the systematic spread of the prediction is pKw's own
     * standard uncertainty, 0.01 (IAPWS R11-07 near ambient, from memory); 100 worlds give it within about 7 %.
     */
    @Test
    void anAlkaliSolutionsSystematicSpreadIsPKwsUncertainty() {
        Recipe r = recipe("{\"finalVolume\": \"1 L\"}", "{\"substance\": \"sodium hydroxide\", \"amount\": "
                + "\"10 mmol/L\"}", AT_25);
        Robustness.Result res = new Robustness(EQUILIBRIUM).run(r, new Robustness.Settings(2000, 11, 0.01, 0.01), x -> { });
        assertEquals(Equilibrium.PKW_UNCERTAINTY, res.conditions().get(0).systematicPH().standardDeviation(),
                0.25 * Equilibrium.PKW_UNCERTAINTY);
    }
}
