package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.substance.LibraryLoader;

/**
 * What a temperature drift names as its cause: the system whose share of β times its dpKa/dT is largest, and none
 * where water's own H⁺ and OH⁻ carry more of β than any system (the share-times-slope case is in RealConditionsTest).
 */
class DriftCauseTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    private static FormulationAnalysis analyse(String components) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-DRIFT\", \"revision\": \"A\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": [" + components + "],"
                + " \"conditions\": [{\"name\": \"bench\", \"temperature\": \"25 Cel\"},"
                + " {\"name\": \"use\", \"temperature\": \"37 Cel\"}]}";
        DocumentReport r = PROTOLYTE.check("t.json", json.getBytes(StandardCharsets.UTF_8));
        return r.analysis().orElseThrow(() -> new AssertionError(r.findings().toString()));
    }

    /**
     * 10 mmol/L sodium hydroxide with 1 mmol/L acetate: at pH 12 acetate (pKa 4.76) holds no protons to give, its share
     * of β is of the order of 10⁻⁸, and hydroxide carries it all. The pH follows pKw, 13.995 at 25 °C and 13.62 at
     * 37 °C (IAPWS R11-07, Bandura and Lvov 2006, from memory): a drift of about −0.38, water's, not acetate's.
     */
    @Test
    void anUnbufferedAlkalineSolutionDriftsWithWaterNotWithABufferThatHasNoShare() {
        FormulationAnalysis a = analyse("{\"substance\": \"sodium hydroxide\", \"amount\": \"10 mmol/L\"},"
                + " {\"substance\": \"sodium acetate anhydrous\", \"amount\": \"1 mmol/L\"}");
        BufferContribution acetate = a.conditions().get(0).buffers().get(0);
        assertEquals("acetate", acetate.system());
        assertTrue(acetate.share() < 1e-4, acetate::toString);
        Drift d = a.drifts().get(0);
        assertEquals(13.62 - 13.995, d.change(), 0.03, d::toString);
        assertTrue(d.system().isEmpty(), d::toString);
        assertEquals(0, d.share());
        assertEquals(0, d.dpKadT());
    }

    /**
     * The acid side: 1 mmol/L hydrochloric acid with 0.1 mmol/L acetate is at pH 3, where free H⁺ carries β
     * (2.303·[H⁺], about 2.3 mmol/L per pH) and acetate, 1.7 pH units above it, a few per thousand: no system is the
     * cause, and a strong acid's pH hardly moves with temperature (its H⁺ is fixed by the amount, common practice).
     */
    @Test
    void anUnbufferedAcidSolutionNamesNoSystemEither() {
        FormulationAnalysis a = analyse("{\"substance\": \"hydrochloric acid\", \"amount\": \"1 mmol/L\"},"
                + " {\"substance\": \"sodium acetate anhydrous\", \"amount\": \"0.1 mmol/L\"}");
        BufferContribution acetate = a.conditions().get(0).buffers().get(0);
        assertTrue(acetate.share() > 0 && acetate.share() < 0.05, acetate::toString);
        Drift d = a.drifts().get(0);
        assertTrue(d.system().isEmpty(), d::toString);
        assertEquals(0, d.change(), 0.01, d::toString);
    }

}
