package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;

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
 * A batch the engine cannot solve counts against the recipe, never for it. A syrup of 1550 g sucrose per litre
 * (about 0.62 mL per g, so some 950 mL of the litre) leaves no water for the heavier batches of a ±10 % weighing
 * tolerance; those batches cannot be made up. With a pH target no solvable batch can leave (1–13), the risk must be
 * exactly the share of batches that could not be solved (derived from the definition), not zero.
 */
class UnsolvedBatchesTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();

    @Test
    void unsolvedBatchesCountAsOutsideTheTargetAndAreReportedWithTheirReason() {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-SYRUP\", \"revision\": \"A\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": ["
                + "{\"substance\": \"sucrose\", \"amount\": \"1550 g\", \"tolerance\": \"10 %\"},"
                + "{\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"0.1 mmol/L\"},"
                + "{\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": \"0.1 mmol/L\"}],"
                + " \"targets\": {\"pH\": {\"min\": 1, \"max\": 13, \"temperature\": \"25 Cel\"}},"
                + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}]}";
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read("t", json.getBytes(StandardCharsets.UTF_8)));
        Recipe r = new RecipeResolver(LibraryLoader.shipped(SCHEMAS)).resolve(f);
        Robustness.Result result = new Robustness(new Equilibrium(Davies.INSTANCE))
                .run(r, new Robustness.Settings(400, 5, 0.01, 0.01), x -> { });
        assertTrue(result.samplesUnsolved() > 0 && result.samplesSolved() > 0, () -> "solved " + result.samplesSolved() + " " + result.unsolved());
        assertTrue(result.unsolved().isPresent());
        assertEquals((double) result.samplesUnsolved() / 400,
                result.conditions().get(0).probabilityOutsideTarget().getAsDouble(), 1e-12);
    }
}
