package org.protolyte.recipe;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;

/** The water mass of a solution made up to volume, from apparent molar volumes. */
class DensityModelTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    private static FormulationAnalysis analyse(String components) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-RHO\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": [" + components + "],"
                + " \"conditions\": [{\"name\": \"preparation\", \"temperature\": \"20 Cel\"}]}";
        return PROTOLYTE.check("test", json.getBytes(StandardCharsets.UTF_8)).analysis().orElseThrow();
    }

    /**
     * Sucrose 10 % w/w has a density of 1.0381 g/cm³ at 20 °C (CRC Handbook, "Concentrative properties of aqueous
     * solutions", from memory). 1 L of it holds 1038.1 g, of which 103.81 g sucrose and 934.3 g water.
     */
    @Test
    void sucroseSolutionWaterMassMatchesHandbookDensity() {
        FormulationAnalysis a = analyse("{\"substance\": \"sucrose\", \"amount\": \"103.81 g\"}");
        assertEquals(0.9343, a.solution().waterKg(), 0.001);
    }

    /** 80 g/L sucrose takes about 5 % of the volume: the water mass is near 0.95 kg, not 1 kg. */
    @Test
    void eightyGramsOfSucroseDisplaceAboutFivePercentOfTheWater() {
        FormulationAnalysis a = analyse("{\"substance\": \"sucrose\", \"amount\": \"80 g\"}");
        double displaced = 1 - a.solution().waterKg() / (0.998207);
        assertEquals(0.049, displaced, 0.004);
    }

    /**
     * 0.9 % w/v sodium chloride: density 1.0046 g/cm³ at 20 °C (CRC Handbook, same table, for 0.9 % w/w; from memory),
     * so about 995.6 g of water per litre.
     */
    @Test
    void isotonicSalineWaterMassMatchesHandbookDensity() {
        FormulationAnalysis a = analyse("{\"substance\": \"sodium chloride\", \"amount\": \"0.9 % w/v\"}");
        assertEquals(0.9956, a.solution().waterKg(), 0.0015);
    }
}
