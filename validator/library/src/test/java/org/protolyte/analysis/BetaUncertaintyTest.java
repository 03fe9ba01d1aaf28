package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.substance.LibraryLoader;

/**
 * The buffer capacity's uncertainty from the constants, combined as the GUM's law of propagation for correlated
 * inputs (JCGM 100:2008, eq. 16): u² = c_pKa² + c_ΔH² + 2ρ c_pKa c_ΔH, each sensitivity c found here by moving that
 * one constant by plus and minus its standard uncertainty and analysing again (a central difference, against the
 * analysis's derivatives), pKw's added in quadrature.
 */
class BetaUncertaintyTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Equilibrium EQUILIBRIUM = new Equilibrium(Davies.INSTANCE);

    /**
     * A test system XB (pKa 7.0 ± 0.01, ΔH° 40 ± 8 kJ/mol, correlation ρ) taken with sodium hydroxide to pH 7.3 at
     * 45 °C, where its pKa is about 6.56: the pH is held by the adjustment, so a moved pKa moves α and β.
     */
    @ParameterizedTest(name = "correlation {0}")
    @ValueSource(doubles = {0.9, -0.9})
    void betasUncertaintyCombinesTheCorrelatedPairAsTheGumSays(double rho) throws Exception {
        String library = "{\"document\": \"substance-library\", \"formatVersion\": 1,"
                + " \"systems\": [{\"name\": \"XB\", \"forms\": [{\"name\": \"HXB\", \"charge\": 0}, {\"name\": \"XB-\", \"charge\": -1}],"
                + " \"steps\": [{\"pKa\": 7.0, \"uncertainty\": 0.01, \"deltaH\": 40, \"deltaHUncertainty\": 8, \"deltaCpUncertainty\": 0,"
                + " \"pKaDeltaHCorrelation\": " + rho + ", \"deltaCp\": 0, \"validFrom\": 0, \"validTo\": 60, \"source\": \"test\"}]}],"
                + " \"substances\": [{\"name\": \"HXB acid\", \"molarMass\": 200, \"composition\": {\"systems\": [{\"system\": \"XB\", \"form\": \"HXB\", \"count\": 1}]}}]}";
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-UB\", \"revision\": \"A\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": ["
                + "{\"substance\": \"HXB acid\", \"amount\": \"20 mmol/L\"},"
                + " {\"substance\": \"sodium hydroxide\", \"stock\": {\"concentration\": \"1 mol/L\"},"
                + " \"adjustTo\": {\"pH\": 7.3, \"temperature\": \"45 Cel\"}}],"
                + " \"conditions\": [{\"name\": \"warm\", \"temperature\": \"45 Cel\"}]}";
        var lib = new LibraryLoader(SCHEMAS).addShipped().add("xb.json", library.getBytes(StandardCharsets.UTF_8), true).build();
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read("t", json.getBytes(StandardCharsets.UTF_8)));
        Recipe r = new RecipeResolver(lib).resolve(f);
        AcidBaseSystem xb = lib.system("XB").orElseThrow();
        ConditionResult nominal = new Analyzer(EQUILIBRIUM).analyze(r).conditions().get(0);
        double cPKa = (beta(r, EQUILIBRIUM.withPKaShift(xb, 0, 0.01)) - beta(r, EQUILIBRIUM.withPKaShift(xb, 0, -0.01))) / 2;
        double cDH = (beta(r, EQUILIBRIUM.withDeltaHShift(xb, 0, 8000))
                - beta(r, EQUILIBRIUM.withDeltaHShift(xb, 0, -8000))) / 2;
        double cW = (beta(r, EQUILIBRIUM.withPKwShift(Equilibrium.PKW_UNCERTAINTY))
                - beta(r, EQUILIBRIUM.withPKwShift(-Equilibrium.PKW_UNCERTAINTY))) / 2;
        assertTrue(Math.abs(cPKa) > 1e-5 && Math.abs(cDH) > 1e-5, () -> "the case needs β to move: " + cPKa + " " + cDH);
        double expected = Math.sqrt(cPKa * cPKa + cDH * cDH + 2 * rho * cPKa * cDH + cW * cW);
        assertEquals(expected, nominal.uncertainty().orElseThrow().bufferCapacityPerLitre(), 0.01 * expected);
    }

    private static double beta(Recipe r, Equilibrium moved) {
        return new Analyzer(moved).analyze(r).conditions().get(0).bufferCapacityPerLitre();
    }
}
