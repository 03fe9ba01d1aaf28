package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.document.DocumentException;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.substance.LibraryLoader;

/**
 * A concentrate and its working solution. Under the additive apparent-volume model, diluting 1 L of a 5x stock to
 * 5 L is the same solution as making the recipe at a fifth of every amount (derived), so the two must agree exactly;
 * the concentrate's own pH differs from it by the ionic-strength effect a technician sees on the meter.
 */
class DilutionTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();

    private static FormulationAnalysis analyse(String phosphate, String saline, String dilution) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-DIL\", \"revision\": \"A\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}," + dilution + " \"components\": ["
                + "{\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"" + phosphate + "\"},"
                + "{\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": \"" + phosphate + "\"},"
                + "{\"substance\": \"sodium chloride\", \"amount\": \"" + saline + "\"}],"
                + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}]}";
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read("t", json.getBytes(StandardCharsets.UTF_8)));
        return new Analyzer(new Equilibrium(Davies.INSTANCE)).analyze(new RecipeResolver(LibraryLoader.shipped(SCHEMAS)).resolve(f));
    }

    @Test
    void theWorkingSolutionIsTheRecipeAtOneFifthOfEveryAmount() {
        FormulationAnalysis stock = analyse("50 mmol/L", "250 mmol/L", "\"dilution\": {\"factor\": 5},");
        FormulationAnalysis direct = analyse("10 mmol/L", "50 mmol/L", "");
        var working = stock.working().orElseThrow().conditions().get(0);
        var once = direct.conditions().get(0);
        assertEquals(once.state().orElseThrow().pH(), working.state().orElseThrow().pH(), 1e-9);
        assertEquals(once.state().orElseThrow().osmolality(), working.state().orElseThrow().osmolality(), 1e-9);
        assertTrue(working.uncertainty().isPresent(), "the working solution's pH carries its uncertainty too");
        assertEquals(once.uncertainty().orElseThrow().pH(), working.uncertainty().orElseThrow().pH(), 1e-7);
        // equimolal phosphate: the concentrate reads lower, by the activity effect of its higher ionic strength
        assertTrue(stock.conditions().get(0).state().orElseThrow().pH() < working.state().orElseThrow().pH() - 0.05);
    }

    @Test
    void partsGiveTheSameFactor() {
        FormulationAnalysis parts = analyse("50 mmol/L", "250 mmol/L",
                "\"dilution\": {\"parts\": {\"concentrate\": 1, \"diluent\": 4}},");
        assertEquals(5, parts.working().orElseThrow().dilution().factor(), 1e-12);
    }

    @Test
    void aDiluentOtherThanWaterIsRefusedAtItsPlace() {
        DocumentException e = assertThrows(DocumentException.class, () -> analyse("50 mmol/L", "250 mmol/L",
                "\"dilution\": {\"factor\": 5, \"diluent\": \"sodium chloride\"},"));
        assertTrue(e.getMessage().contains("/dilution/diluent"), e.getMessage());
    }
}
