package org.protolyte.recipe;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.protolyte.chemistry.Component;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;

/**
 * The affine batch map against the recipe itself, at batches it was not built from. Every expected value is derived:
 * it is what {@link Recipe#solution} gives for the same amounts, and the map must match it up to the rounding of its
 * finite-difference coefficients (relative 1e-10; a non-linear term would show at 1e-4). The amounts are invented.
 */
class BatchTotalsTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();

    private static Recipe recipe(String basis, String amount) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-BT\", \"basis\": " + basis + ","
                + " \"components\": [{\"substance\": \"sodium chloride\", \"amount\": \"" + amount + "\"},"
                + " {\"substance\": \"disodium hydrogen phosphate heptahydrate\", \"amount\": \"2.68 g\"},"
                + " {\"substance\": \"glucose monohydrate\", \"amount\": \"20 g\"},"
                + " {\"substance\": \"hydrochloric acid\", \"stock\": {\"concentration\": \"1 mol/L\"}, \"adjustTo\": {\"pH\": 7.0, \"temperature\": \"25 Cel\"}}],"
                + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}]}";
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read("t", json.getBytes(StandardCharsets.UTF_8)));
        return new RecipeResolver(LibraryLoader.shipped(SCHEMAS)).resolve(f);
    }

    @Test
    void theMapReproducesTheRecipeAtRandomBatches() {
        Recipe r = recipe("{\"finalVolume\": \"1 L\"}", "8.5 g");
        List<Component> order = new ArrayList<>(r.solution(java.util.Map.of()).totals().keySet());
        BatchTotals map = BatchTotals.of(r, order, 0.9).orElseThrow();
        Random random = new Random(3);
        for (int trial = 0; trial < 20; trial++) {
            double[] x = map.nominal();
            for (int k = 0; k < x.length; k++) {
                x[k] = x[k] == 0 ? 0.01 * random.nextDouble() : x[k] * (0.95 + 0.1 * random.nextDouble());
            }
            double[] got = new double[order.size()];
            double water = map.totals(x, got);
            Solution exact = BatchTotals.solution(r, x, 0.9);
            assertEquals(exact.waterKg(), water, 1e-10 * water);
            for (int j = 0; j < got.length; j++) {
                assertEquals(exact.totals().get(order.get(j)), got[j], 1e-10 * got[j] + 1e-18);
            }
            assertEquals(exact.volumeLitres(310.15), map.volumeLitres(x, water, 310.15), 1e-10);
        }
    }

    @Test
    void aRecipeWithMolalityAmountsHasNoMap() {
        Recipe r = recipe("{\"waterMass\": \"1 kg\"}", "0.15 mol/kg");
        List<Component> order = new ArrayList<>(r.solution(java.util.Map.of()).totals().keySet());
        assertTrue(BatchTotals.of(r, order, 1).isEmpty());
    }
}
