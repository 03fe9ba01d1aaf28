package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;

/** The pH's sensitivity to each component, against Henderson–Hasselbalch. */
class SensitivityTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    /**
     * Equimolal phosphate: by Henderson–Hasselbalch, +1 % of the base form raises the pH by log10(1.01) = 0.0043,
     * +1 % of the acid form lowers it by as much (derived). The added salt also raises the ionic strength, which by
     * the Davies slope at I = 0.1 takes up to 0.0007 off the base's shift and adds 0.0002 to the acid's: within 20 %.
     */
    @Test
    void onePercentMoreOfEachBufferFormMovesThePHByHendersonHasselbalch() {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-SENS\", \"revision\": \"A\","
                + " \"basis\": {\"waterMass\": \"1 kg\"}, \"components\": ["
                + "{\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"25 mmol/kg\"},"
                + "{\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": \"25 mmol/kg\"},"
                + "{\"substance\": \"sucrose\", \"amount\": \"50 g\"}],"
                + " \"targets\": {\"pH\": {\"value\": 6.9, \"tolerance\": 0.1, \"temperature\": \"25 Cel\"}}}";
        List<Sensitivity> s = PROTOLYTE.check("t.json", json.getBytes(StandardCharsets.UTF_8)).analysis().orElseThrow()
                .targetSensitivities();
        double hh = Math.log10(1.01);
        Sensitivity base = s.stream().filter(x -> x.substance().startsWith("disodium")).findFirst().orElseThrow();
        Sensitivity acid = s.stream().filter(x -> x.substance().startsWith("potassium")).findFirst().orElseThrow();
        assertEquals(hh, base.dpHPerPercent(), 0.2 * hh);
        assertEquals(-hh, acid.dpHPerPercent(), 0.2 * hh);
        assertTrue(s.stream().noneMatch(x -> x.substance().equals("sucrose")), "a non-electrolyte is not listed");
    }
}
