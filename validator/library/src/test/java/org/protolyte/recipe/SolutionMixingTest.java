package org.protolyte.recipe;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.protolyte.chemistry.Component;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;

/**
 * {@link Solution#mixed} against the recipe itself: with the density model's additive volumes, one volume of A mixed
 * with nine of B is the recipe that holds a tenth of A's amounts and nine tenths of B's per volume, so every expected
 * value is what {@link Recipe#solution} gives for those amounts (relative 1e-12). The amounts are invented.
 */
class SolutionMixingTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    /** The make-up temperature: no condition is the preparation, so 20 °C ({@link Recipe}). */
    private static final double KELVIN = 293.15;

    private static Solution solution(String components) {
        return solution("1 L", components);
    }

    private static Solution solution(String finalVolume, String components) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-MIX\", \"basis\": "
                + "{\"finalVolume\": \"" + finalVolume + "\"}, \"components\": [" + components + "],"
                + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}]}";
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read("t", json.getBytes(StandardCharsets.UTF_8)));
        return new RecipeResolver(LibraryLoader.shipped(SCHEMAS)).resolve(f).solution(Map.of());
    }

    private static void assertSameTotals(Solution expected, Solution actual) {
        assertEquals(expected.totals().keySet(), actual.totals().keySet());
        for (Map.Entry<Component, Double> e : expected.totals().entrySet()) {
            assertEquals(e.getValue(), actual.totals().get(e.getKey()), 1e-12 * e.getValue(), e.getKey().name());
        }
    }

    @Test
    void oneVolumeIntoNineIsTheRecipeAtATenthAndNineTenths() {
        Solution saline = solution("{\"substance\": \"sodium chloride\", \"amount\": \"9 g\"}");
        // the fluid written per 250 mL: nine volumes of it are 36 of its bases
        Solution glucose = solution("250 mL", "{\"substance\": \"glucose monohydrate\", \"amount\": \"13.75 g\"}");
        Solution mixture = saline.mixed(glucose, 9, KELVIN);
        Solution expected = solution("{\"substance\": \"sodium chloride\", \"amount\": \"0.9 g\"},"
                + " {\"substance\": \"glucose monohydrate\", \"amount\": \"49.5 g\"}");
        assertSameTotals(expected, mixture);
        assertEquals(10 * expected.waterKg(), mixture.waterKg(), 1e-12 * mixture.waterKg());
        assertEquals(10 * expected.volumeLitres(KELVIN), mixture.volumeLitres(KELVIN), 1e-12);
        assertEquals(10 * expected.volumeLitres(310.15), mixture.volumeLitres(310.15), 1e-12);
        assertEquals(saline.species().size() + glucose.species().size(), mixture.species().size());
        double moles = mixture.moles().values().stream().mapToDouble(Double::doubleValue).sum();
        double fromBoth = saline.moles().values().stream().mapToDouble(Double::doubleValue).sum()
                + 36 * glucose.moles().values().stream().mapToDouble(Double::doubleValue).sum();
        assertEquals(fromBoth, moles, 1e-12 * moles);
    }

    @Test
    void aSolutionMixedWithItselfKeepsItsMolalities() {
        Solution s = solution("{\"substance\": \"sodium chloride\", \"amount\": \"9 g\"},"
                + " {\"substance\": \"sodium dihydrogen phosphate monohydrate\", \"amount\": \"1.38 g\"}");
        Solution twice = s.mixed(s, 1, KELVIN);
        assertSameTotals(s, twice);
        assertEquals(2 * s.waterKg(), twice.waterKg(), 1e-12);
        assertEquals(s.species().size(), twice.species().size());
        s.moles().forEach((i, n) -> assertEquals(2 * n, twice.moles().get(i), 1e-15));
    }
}
