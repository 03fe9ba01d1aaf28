package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.recipe.Ingredient;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.substance.LibraryLoader;

/**
 * Monte Carlo against linear propagation, the corner search against brute force. Every expected value here is
 * derived (propagation of uniform and normal errors, brute-force enumeration), none is read from the code's output.
 */
class RobustnessTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Equilibrium EQUILIBRIUM = new Equilibrium(Davies.INSTANCE);

    private static Recipe recipe(String components) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-MC\", \"revision\": \"A\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": [" + components + "],"
                + " \"targets\": {\"pH\": {\"value\": 6.85, \"tolerance\": 0.01, \"temperature\": \"25 Cel\"}},"
                + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}]}";
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read("t", json.getBytes(StandardCharsets.UTF_8)));
        return new RecipeResolver(LibraryLoader.shipped(SCHEMAS)).resolve(f);
    }

    private static final String PHOSPHATE = "{\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"20 mmol/L\"},"
            + "{\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": \"20 mmol/L\", \"tolerance\": \"2 %\"},"
            + "{\"substance\": \"sodium chloride\", \"amount\": \"100 mmol/L\"}";

    /**
     * Each amount uniform within ±t: variance (100 t)²/3 in per cent. Linear propagation with the engine's local
     * sensitivities gives σ = sqrt(Σ s_i² (100 t_i)²/3); the Monte Carlo must agree within its statistical error
     * (relative standard error of σ ≈ 1/sqrt(2N), 1.1 % at N = 4000; allowed 6 % with the non-linearity).
     */
    @Test
    void monteCarloSpreadAgreesWithLinearPropagation() {
        Recipe r = recipe(PHOSPHATE);
        Robustness.Result result = new Robustness(EQUILIBRIUM).run(r, new Robustness.Settings(4000, 7, 0.01, 0.01), x -> { });
        Robustness.ConditionRobustness use = result.conditions().get(0);
        double variance = 0;
        for (Map.Entry<String, Double> e : use.sensitivities().entrySet()) {
            double t = result.tolerances().get(e.getKey()) * 100;
            variance += e.getValue() * e.getValue() * t * t / 3;
        }
        double linear = Math.sqrt(variance);
        assertEquals(linear, use.pH().standardDeviation(), 0.06 * linear);
        assertEquals(4000, result.samplesSolved());
    }

    /** The constants' spread in the Monte Carlo (systematic part) matches the linear uncertainty of the report. */
    @Test
    void systematicSpreadAgreesWithTheLinearUncertainty() {
        Recipe r = recipe(PHOSPHATE);
        Robustness.Result result = new Robustness(EQUILIBRIUM).run(r, new Robustness.Settings(10_000, 11, 0.01, 0.01), x -> { });
        double mc = result.conditions().get(0).systematicPH().standardDeviation();
        double linear = new Analyzer(EQUILIBRIUM).analyze(r).conditions().get(0).uncertainty().orElseThrow().pH();
        // 500 worlds: relative standard error of σ about 3 %
        assertEquals(linear, mc, 0.12 * linear);
    }

    /** The corners chosen by the sensitivities' signs are the extremes of all 2³ corners of the tolerance box. */
    @Test
    void cornerSearchFindsTheBruteForceExtremes() {
        Recipe r = recipe(PHOSPHATE);
        Robustness robustness = new Robustness(EQUILIBRIUM);
        Robustness.Result result = robustness.run(r, new Robustness.Settings(20, 3, 0.01, 0.01), x -> { });
        List<Ingredient> weighed = new ArrayList<>(r.ingredients());
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int mask = 0; mask < 8; mask++) {
            Map<Ingredient, Double> scale = new LinkedHashMap<>();
            for (int i = 0; i < 3; i++) {
                double t = result.tolerances().get(weighed.get(i).substance().name());
                scale.put(weighed.get(i), (mask >> i & 1) == 1 ? 1 + t : 1 - t);
            }
            double pH = ((BatchSampler.Solved) new BatchSampler(new Analyzer(EQUILIBRIUM), r, BatchSampler.Nominal.none(),
                    new BatchSampler.Batches(r)).sample(scale, 0)).pH()[0];
            lo = Math.min(lo, pH);
            hi = Math.max(hi, pH);
        }
        assertEquals(lo, result.conditions().get(0).lowestCornerPH(), 1e-9);
        assertEquals(hi, result.conditions().get(0).highestCornerPH(), 1e-9);
        assertTrue(hi > lo);
    }

    /**
     * The meter's error sets the q.s. of every batch: whatever the weighings (the q.s. absorbs them), a batch adjusted
     * at the condition's own temperature and volume, closed, is at pH setpoint + e, e normal with the meter's standard uncertainty u, so the pH's
     * spread is u (relative standard error of σ ≈ 1/sqrt(2N), 1.1 % at N = 4000) and the batches outside a ±2.5 u
     * target are 2(1 − Φ(2.5)) = 1.24 % (standard normal table; standard error 0.17 % at N = 4000).
     */
    @Test
    void theMetersStandardUncertaintyIsTheSpreadOfAnAdjustedBatch() {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-METER\", \"revision\": \"A\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": [" + PHOSPHATE + ","
                + " {\"substance\": \"sodium hydroxide\", \"stock\": {\"concentration\": \"1 mol/L\"},"
                + " \"adjustTo\": {\"temperature\": \"25 Cel\"}}],"
                + " \"targets\": {\"pH\": {\"value\": 7.2, \"tolerance\": 0.05, \"temperature\": \"25 Cel\"}},"
                + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}]}";
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read("t", json.getBytes(StandardCharsets.UTF_8)));
        Recipe r = new RecipeResolver(LibraryLoader.shipped(SCHEMAS)).resolve(f);
        double u = 0.02;
        Robustness.Result result = new Robustness(EQUILIBRIUM).run(r, new Robustness.Settings(4000, 13, 0, u), x -> { });
        Robustness.ConditionRobustness use = result.conditions().get(0);
        assertEquals(4000, result.samplesSolved());
        assertEquals(u, use.pH().standardDeviation(), 0.05 * u);
        assertEquals(7.2, use.pH().mean(), 0.002);
        assertEquals(0.0124, use.probabilityOutsideTarget().getAsDouble(), 0.006);
    }

    /**
     * The batches' buffer capacity centres on the analysed one (uniform ±1 % weighings move β by about 1 %), progress
     * is told every 500 samples, and a condition at another temperature than the target's has no risk figure.
     */
    @Test
    void batchBufferCapacityCentresOnTheAnalysedValueAndProgressIsToldEvery500() {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-MC2\", \"revision\": \"A\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": [" + PHOSPHATE + "],"
                + " \"targets\": {\"pH\": {\"value\": 6.85, \"tolerance\": 0.01, \"temperature\": \"25 Cel\"}},"
                + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"},"
                + " {\"name\": \"cold\", \"temperature\": \"4 Cel\"}]}";
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read("t", json.getBytes(StandardCharsets.UTF_8)));
        Recipe r = new RecipeResolver(LibraryLoader.shipped(SCHEMAS)).resolve(f);
        double analysed = new Analyzer(EQUILIBRIUM).analyze(r).conditions().get(0).bufferCapacityPerLitre() * 1000;
        List<Integer> told = new ArrayList<>();
        Robustness.Result result = new Robustness(EQUILIBRIUM).run(r, new Robustness.Settings(1500, 3, 0.01, 0.01),
                told::add);
        assertEquals(List.of(500, 1000, 1500), told);
        assertEquals(analysed, result.conditions().get(0).bufferCapacity().mean(), 0.005 * analysed);
        assertTrue(result.conditions().get(0).probabilityOutsideTarget().isPresent());
        assertTrue(result.conditions().get(1).probabilityOutsideTarget().isEmpty());
    }

    /** A fixed seed reproduces the study exactly. */
    @Test
    void aFixedSeedReproduces() {
        Recipe r = recipe(PHOSPHATE);
        var a = new Robustness(EQUILIBRIUM).run(r, new Robustness.Settings(300, 42, 0.01, 0.01), x -> { });
        var b = new Robustness(EQUILIBRIUM).run(r, new Robustness.Settings(300, 42, 0.01, 0.01), x -> { });
        assertEquals(a.conditions().get(0).pH(), b.conditions().get(0).pH());
    }

    /**
     * A step's pKa and ΔH° drawn as a correlated pair. For a buffer at its pKa (dpH/dpKa ≈ 1) at 45 °C the pKa
     * moves by u_pKa·a and by u_ΔH/(R ln10)·(1/T − 1/298.15)·b: with u_pKa = 0.01, u_ΔH = 8 kJ/mol that is
     * c_H = −0.0881, and σ² = 0.01² + c_H² + 2ρ·0.01·c_H (derived). The sign of ρ must show in both the linear
     * uncertainty and the Monte Carlo's systematic spread.
     */
    @ParameterizedTest(name = "correlation {0}")
    @ValueSource(doubles = {0.9, -0.9})
    void correlatedPKaAndDeltaHSpreadAsTheCovarianceSays(double rho) throws Exception {
        String library = "{\"document\": \"substance-library\", \"formatVersion\": 1,"
                + " \"systems\": [{\"name\": \"XB\", \"forms\": [{\"name\": \"HXB\", \"charge\": 0}, {\"name\": \"XB-\", \"charge\": -1}],"
                + " \"steps\": [{\"pKa\": 7.0, \"uncertainty\": 0.01, \"deltaH\": 40, \"deltaHUncertainty\": 8, \"deltaCpUncertainty\": 0,"
                + " \"pKaDeltaHCorrelation\": " + rho + ", \"deltaCp\": 0, \"validFrom\": 0, \"validTo\": 60, \"source\": \"test\"}]}],"
                + " \"substances\": [{\"name\": \"HXB acid\", \"molarMass\": 200, \"composition\": {\"systems\": [{\"system\": \"XB\", \"form\": \"HXB\", \"count\": 1}]}},"
                + " {\"name\": \"NaXB salt\", \"molarMass\": 222, \"composition\": {\"ions\": {\"Na+\": 1}, \"systems\": [{\"system\": \"XB\", \"form\": \"XB-\", \"count\": 1}]}}]}";
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-RHO\", \"revision\": \"A\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": ["
                + "{\"substance\": \"HXB acid\", \"amount\": \"20 mmol/L\"}, {\"substance\": \"NaXB salt\", \"amount\": \"20 mmol/L\"}],"
                + " \"conditions\": [{\"name\": \"warm\", \"temperature\": \"45 Cel\"}]}";
        var lib = new LibraryLoader(SCHEMAS).addShipped().add("xb.json", library.getBytes(StandardCharsets.UTF_8), true).build();
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read("t", json.getBytes(StandardCharsets.UTF_8)));
        Recipe r = new RecipeResolver(lib).resolve(f);
        double cH = 8000 / (8.314462618 * Math.log(10)) * (1 / 318.15 - 1 / 298.15);
        double expected = Math.sqrt(0.01 * 0.01 + cH * cH + 2 * rho * 0.01 * cH);
        double linear = new Analyzer(EQUILIBRIUM).analyze(r).conditions().get(0).uncertainty().orElseThrow().pH();
        double mc = new Robustness(EQUILIBRIUM).run(r, new Robustness.Settings(10_000, 5, 0.01, 0.01), x -> { })
                .conditions().get(0).systematicPH().standardDeviation();
        // pKw adds 0.01 × (dpH/dpKw ≈ 0 in a buffer); 500 worlds: relative standard error of σ about 3 %
        assertEquals(expected, linear, 0.03 * expected);
        assertEquals(expected, mc, 0.12 * expected);
    }

    /** The batches' osmolality centres on the analysis's own (the affine batch map and the full analysis agree). */
    @Test
    void batchOsmolalityCentresOnTheAnalysedValue() {
        Recipe r = recipe(PHOSPHATE);
        double analysed = new Analyzer(EQUILIBRIUM).analyze(r).conditions().get(0).state().orElseThrow().osmolality() * 1000;
        Robustness.Interval mc = new Robustness(EQUILIBRIUM).run(r, new Robustness.Settings(2000, 3, 0.01, 0.01), x -> { })
                .conditions().get(0).osmolality();
        // uniform ±1 % weighings: the mean is the nominal within a few hundredths of a mOsm/kg
        assertEquals(analysed, mc.mean(), 0.1);
        assertTrue(mc.p975() > mc.p025());
    }
}
