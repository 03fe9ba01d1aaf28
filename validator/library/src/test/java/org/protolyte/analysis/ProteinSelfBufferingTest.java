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
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.Protein;
import org.protolyte.substance.SubstanceLibrary;

/**
 * The pH shift a protein causes against the buffer alone: the same solution without the protein, every other amount
 * (a q.s. dose included) as it is.
 */
class ProteinSelfBufferingTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(SCHEMAS);
    private static final double T25 = 298.15;

    private static FormulationAnalysis analyse(String components, String targets) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-PRO\", \"revision\": \"A\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": [" + components + "]," + targets
                + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"},"
                + " {\"name\": \"storage\", \"temperature\": \"5 Cel\"}]}";
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read("t", json.getBytes(StandardCharsets.UTF_8)));
        return new Analyzer(new Equilibrium(Davies.INSTANCE)).analyze(new RecipeResolver(LIBRARY).resolve(f));
    }

    private static final String PEPTIDE = "{\"substance\": \"test peptide\", \"protein\": {\"groups\": {\"N-terminus\": 1,"
            + " \"C-terminus\": 1, \"His\": 1}, \"molarMass\": \"1000 g/mol\"}, \"amount\": \"5 mmol/L\"}";

    /**
     * A peptide alone in water, weighed as its uncharged molecule: its pH solves c·z(pH) + [H+] − Kw/[H+] = 0 (hand
     * calculation, γ = 1: the ionic strength is below 1e-5), and the buffer alone is water, pH ½ pKw.
     */
    @Test
    void aPeptideInWaterShiftsThePhFromNeutralToItsIsoionicPoint() {
        FormulationAnalysis a = analyse(PEPTIDE, "");
        Protein p = a.recipe().library().proteins().get(0);
        double pKw = 13.995;   // 25 °C (Harned and Owen's value, from memory; its part in this pH is below 1e-4)
        double lo = 4;
        double hi = 10;
        for (int i = 0; i < 60; i++) {
            double pH = (lo + hi) / 2;
            double f = 5e-3 * charge(p, pH) + Math.pow(10, -pH) - Math.pow(10, pH - pKw);
            if (f > 0) {
                lo = pH;
            } else {
                hi = pH;
            }
        }
        double byHand = (lo + hi) / 2;
        double pH = a.conditions().get(0).state().orElseThrow().pH();
        assertEquals(byHand, pH, 0.003);
        assertEquals(byHand - pKw / 2, a.proteins().get(0).conditions().get(0).pHShift().getAsDouble(), 0.003);
    }

    /** Σ n (z_protonated − α), with each group's pKa at 25 °C as the library has it. */
    private static double charge(Protein p, double pH) {
        double z = 0;
        for (var e : p.systems().entrySet()) {
            double alpha = 1 / (1 + Math.pow(10, e.getValue().steps().get(0).pKa(T25) - pH));
            z += p.groups().get(e.getKey()) * (e.getKey().protonatedCharge() - alpha);
        }
        return z;
    }

    /** With a q.s. of acid, the buffer alone is the same recipe with the acid's found dose written as an amount. */
    @Test
    void theBufferAloneHoldsTheQsDoseThatTheProteinNeeded() {
        String histidine = "{\"substance\": \"L-histidine\", \"amount\": \"20 mmol/L\"}";
        FormulationAnalysis with = analyse(histidine + "," + PEPTIDE.replace("5 mmol/L", "10 mmol/L")
                + ", {\"substance\": \"hydrochloric acid\", \"adjustTo\": {\"temperature\": \"25 Cel\"}}",
                " \"targets\": {\"pH\": {\"value\": 6.0, \"tolerance\": 0.2, \"temperature\": \"25 Cel\"}},");
        double mmol = with.titrants().get(0).moles() * 1000;
        FormulationAnalysis alone = analyse(histidine + ", {\"substance\": \"hydrochloric acid\", \"amount\": \""
                + mmol + " mmol/L\"}", "");
        for (int i = 0; i < 2; i++) {
            double shift = with.proteins().get(0).conditions().get(i).pHShift().getAsDouble();
            assertEquals(with.conditions().get(i).state().orElseThrow().pH() - shift,
                    alone.conditions().get(i).state().orElseThrow().pH(), 1e-6, "condition " + i);
        }
        // the peptide takes up protons at pH 6: without it the same acid leaves the histidine lower
        assertTrue(with.proteins().get(0).conditions().get(0).pHShift().getAsDouble() > 0.05);
    }
}
