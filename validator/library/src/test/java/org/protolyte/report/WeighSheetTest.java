package org.protolyte.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.units.Quantity;

/**
 * The weigh sheet: amounts as written, digit for digit; moles and grams by the molar masses of the substances as
 * supplied (IUPAC atomic weights through the formula); mL of stock from its molarity; a batch as a multiple. The
 * recipe is invented, not data.
 */
class WeighSheetTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    private static FormulationAnalysis analysis(String basis, String components, String target) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-WEIGH\","
                + " \"basis\": " + basis + ", \"components\": [" + components + "]" + target + "}";
        return PROTOLYTE.check("test", json.getBytes(StandardCharsets.UTF_8)).analysis().orElseThrow();
    }

    private static final String RECIPE = "{\"substance\": \"sodium acetate trihydrate\", \"amount\": \"13.60 g\"},"
            + " {\"substance\": \"sodium chloride\", \"amount\": {\"value\": 40.0, \"unit\": \"mmol/L\"}},"
            + " {\"substance\": \"hydrochloric acid\", \"stock\": {\"concentration\": \"1.0 mol/L\"},"
            + " \"adjustTo\": {\"temperature\": \"25 Cel\"}}";
    private static final String TARGET = ", \"targets\": {\"pH\": {\"value\": 5.0, \"tolerance\": 0.1, "
            + "\"temperature\": \"25 Cel\"}}";

    @Test
    void amountsAreShownAsWrittenAndResolvedToMolesGramsAndStock() {
        FormulationAnalysis a = analysis("{\"finalVolume\": \"0.500 L\"}", RECIPE, TARGET);
        WeighSheet w = WeighSheet.of(a, Optional.empty());
        assertEquals("0.5 L of solution", w.basis());
        WeighSheet.Line acetate = w.lines().get(0);
        assertEquals("13.60 g", acetate.recorded(), "the trailing zero is the document's");
        assertEquals("/components/0", acetate.pointer());
        // CH3COONa·3H2O: 136.08 g/mol from the formula (CIAAW 2021 standard atomic weights)
        assertEquals(13.60 / 136.08 * 1000, acetate.mmol().orElseThrow().doubleValue(), 0.01);
        assertEquals(0, new BigDecimal("13.600").compareTo(acetate.grams().orElseThrow()), "grams back as weighed");
        WeighSheet.Line salt = w.lines().get(1);
        assertEquals("40.0 mmol/L", salt.recorded(), "a number in the object form keeps its digits too");
        assertEquals(20.0, salt.mmol().orElseThrow().doubleValue(), 1e-9, "40 mmol/L of 0.5 L");
        assertEquals(20.0 * 58.443 / 1000, salt.grams().orElseThrow().doubleValue(), 1e-4, "NaCl 58.443 g/mol");
        WeighSheet.Line hcl = w.lines().get(2);
        assertEquals("q.s.", hcl.recorded());
        assertEquals(Optional.of("1.0 mol/L"), hcl.stock());
        assertTrue(hcl.grams().isEmpty(), "a stock is measured by volume, not weighed");
        double dose = a.titrants().get(0).moles() * 1000;
        assertEquals(dose, hcl.mmol().orElseThrow().doubleValue(), 1e-3 * dose);
        assertEquals(dose / 1.0, hcl.stockMillilitres().orElseThrow().doubleValue(), 1e-3 * dose, "1 mol/L: mL = mmol");
        assertTrue(w.batch().isEmpty() && hcl.batchMmol().isEmpty());
    }

    @Test
    void aBatchIsAMultipleOfTheBasis() {
        FormulationAnalysis a = analysis("{\"finalVolume\": \"0.500 L\"}", RECIPE, TARGET);
        WeighSheet w = WeighSheet.of(a, Optional.of(Quantity.parse("250L")));
        assertEquals(500.0, w.batch().orElseThrow().factor(), 1e-12);
        assertEquals("250 L", w.batch().orElseThrow().size());
        for (WeighSheet.Line l : w.lines()) {
            assertEquals(500 * l.mmol().orElseThrow().doubleValue(), l.batchMmol().orElseThrow().doubleValue(),
                    1e-4 * l.batchMmol().orElseThrow().doubleValue(), l.substance());
        }
        assertEquals(6800.0, w.lines().get(0).batchGrams().orElseThrow().doubleValue(), 1e-9, "13.60 g × 500");
    }

    @Test
    void aBatchSizeOfTheWrongKindIsNamedNotGuessed() {
        FormulationAnalysis a = analysis("{\"waterMass\": \"1 kg\"}",
                "{\"substance\": \"sodium chloride\", \"amount\": \"9.0 g\"}", "");
        WeighSheet w = WeighSheet.of(a, Optional.of(Quantity.parse("250 L")));
        assertTrue(w.batch().isEmpty());
        assertTrue(w.notes().get(0).contains("250 L is not a mass of water"), w.notes().toString());
        WeighSheet.Line salt = WeighSheet.of(a, Optional.of(Quantity.parse("25 kg"))).lines().get(0);
        assertEquals(225.0, salt.batchGrams().orElseThrow().doubleValue(), 1e-9, "9.0 g per kg of water × 25");
    }
}
