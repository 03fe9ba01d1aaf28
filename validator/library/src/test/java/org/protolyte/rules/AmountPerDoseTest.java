package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.protolyte.analysis.FormulationAnalysis;

/**
 * amount-per-dose on 9 g/L sodium chloride with 1.38 g/L sodium dihydrogen phosphate monohydrate (invented amounts),
 * 10 mL per dose, 4 doses a day. By hand, with the IUPAC atomic weights: NaCl 58.44 g/mol, NaH2PO4·H2O 137.99 g/mol,
 * Na 22.990 g/mol; sodium 154.0 + 10.0 = 164.0 mmol/L, so 1.640 mmol (37.7 mg) per dose and 6.56 mmol per day.
 */
class AmountPerDoseTest {

    private static final AmountPerDose KIND = new AmountPerDose();

    private static FormulationAnalysis analyse(String dose) {
        return Analyses.analyse(Analyses.formulation(", \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}]"
                + dose, Analyses.component("sodium chloride", "9 g"),
                Analyses.component("sodium dihydrogen phosphate monohydrate", "1.38 g")));
    }

    private static final String DOSE = ", \"dose\": {\"volume\": \"10 mL\", \"perDay\": 4}";

    @Test
    void anIonIsCountedOverEveryLineThatBringsItPerDoseAndPerDay() {
        FormulationAnalysis a = analyse(DOSE);
        List<Finding> f = Analyses.run(KIND, a, "{\"ion\": \"Na+\", \"maxPerDose\": \"1 mmol\"}");
        assertEquals(1, f.size());
        assertTrue(f.get(0).message().startsWith("Na+ is 1.64 mmol per dose (10 mL); limit 1 mmol"), f.get(0).message());
        assertEquals("/components/0", f.get(0).pointer().orElseThrow());
        assertEquals(List.of(), Analyses.run(KIND, a, "{\"ion\": \"Na+\", \"maxPerDose\": \"1.7 mmol\"}"));
        List<Finding> mg = Analyses.run(KIND, a, "{\"ion\": \"Na+\", \"maxPerDose\": \"23 mg\"}");
        assertTrue(mg.get(0).message().startsWith("Na+ is 37.7 mg per dose"), mg.get(0).message());
        List<Finding> day = Analyses.run(KIND, a, "{\"ion\": \"Na+\", \"maxPerDay\": \"6.5 mmol\"}");
        assertTrue(day.get(0).message().startsWith("Na+ is 6.56 mmol per day (40 mL, 4 doses); limit 6.5 mmol"),
                day.get(0).message());
        assertEquals(List.of(), Analyses.run(KIND, a, "{\"ion\": \"Na+\", \"maxPerDay\": \"6.6 mmol\"}"));
    }

    @Test
    void aSubstanceOrASystemIsCountedAlone() {
        FormulationAnalysis a = analyse(DOSE);
        // sodium chloride alone: 90 mg per dose
        assertEquals(List.of(), Analyses.run(KIND, a, "{\"substance\": \"sodium chloride\", \"maxPerDose\": \"91 mg\"}"));
        List<Finding> nacl = Analyses.run(KIND, a, "{\"substance\": \"sodium chloride\", \"maxPerDose\": \"89 mg\"}");
        assertTrue(nacl.get(0).message().startsWith("sodium chloride is 90.0 mg per dose (10 mL); limit 89 mg"),
                nacl.get(0).message());
        // phosphate: 10.0 mmol/L, so 0.100 mmol per dose, on the phosphate line
        List<Finding> p = Analyses.run(KIND, a, "{\"system\": \"phosphate\", \"maxPerDose\": \"0.099 mmol\"}");
        assertTrue(p.get(0).message().startsWith("total phosphate is 0.100 mmol per dose (10 mL)"), p.get(0).message());
        assertEquals("/components/1", p.get(0).pointer().orElseThrow());
        assertEquals(List.of(), Analyses.run(KIND, a, "{\"system\": \"phosphate\", \"maxPerDose\": \"0.101 mmol\"}"));
        assertEquals(List.of(), Analyses.run(KIND, a, "{\"ion\": \"K+\", \"maxPerDose\": \"0 mmol\"}"), "none present");
    }

    @Test
    void withoutTheDoseItNeedsTheRuleDoesNotJudgeTheDocument() {
        NotJudged e = assertThrows(NotJudged.class, () -> Analyses.run(KIND, analyse(""),
                "{\"ion\": \"Na+\", \"maxPerDose\": \"1 mmol\"}"));
        assertTrue(e.getMessage().contains("limits Na+ per dose, and the document does not state its dose volume "
                + "(dose.volume)"), e.getMessage());
        FormulationAnalysis noPerDay = analyse(", \"dose\": {\"volume\": \"10 mL\"}");
        assertEquals(1, Analyses.run(KIND, noPerDay, "{\"ion\": \"Na+\", \"maxPerDose\": \"1 mmol\"}").size());
        NotJudged d = assertThrows(NotJudged.class, () -> Analyses.run(KIND, noPerDay,
                "{\"ion\": \"Na+\", \"maxPerDay\": \"1 mmol\"}"));
        assertTrue(d.getMessage().contains("limits Na+ per day") && d.getMessage().contains("dose.perDay"),
                d.getMessage());
    }

    /** The same solution written per 250 mL: the amounts per dose are per litre of solution, not per basis. */
    @Test
    void theAmountIsPerLitreOfSolutionWhateverTheBasis() {
        FormulationAnalysis a = Analyses.analyse(("{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": "
                + "\"TST-FIX\", \"revision\": \"A\", \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}]"
                + DOSE + ", \"basis\": {\"finalVolume\": \"250 mL\"}, \"components\": [%s, %s]}").formatted(
                Analyses.component("sodium chloride", "2.25 g"),
                Analyses.component("sodium dihydrogen phosphate monohydrate", "0.345 g")));
        List<Finding> f = Analyses.run(KIND, a, "{\"ion\": \"Na+\", \"maxPerDose\": \"1 mmol\", "
                + "\"maxPerDay\": \"6.5 mmol\"}");
        assertEquals(2, f.size());
        assertTrue(f.get(0).message().startsWith("Na+ is 1.64 mmol per dose (10 mL)"), f.get(0).message());
        assertTrue(f.get(1).message().startsWith("Na+ is 6.56 mmol per day (40 mL, 4 doses)"), f.get(1).message());
    }

    @Test
    void anIonsMassComesFromItsFormula() {
        assertEquals(22.98977, AmountPerDose.ionMolarMass("Na+"), 1e-4);
        assertEquals(95.979, AmountPerDose.ionMolarMass("HPO4-2"), 1e-2);
        assertTrue(Double.isNaN(AmountPerDose.ionMolarMass("lactate-")), "a name that is no formula has no mass");
    }
}
