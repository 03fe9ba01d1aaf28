package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.DissociationStep;
import org.protolyte.chemistry.TemperatureRange;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;

/**
 * Every step's ΔH° and ΔCp° carries an uncertainty (the source's or the library's stated default), and a pH away from
 * the temperature where the q.s. is set shows the share of it (issue 15).
 */
class NoSilentZeroUncertaintyTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(SCHEMAS);
    private static final Path SAMPLES = Path.of(System.getProperty("protolyte.projectRoot", "../.."),
            "sample-formulations");

    @Test
    void everyStepOfTheShippedLibraryHasANonZeroUncertaintyOfItsTemperatureTerms() {
        int steps = 0;
        for (AcidBaseSystem sys : LIBRARY.systems()) {
            for (DissociationStep s : sys.steps()) {
                steps++;
                assertTrue(s.deltaHUncertainty() > 0, sys.name() + ": u(ΔH°) is zero");
                assertTrue(s.deltaCpUncertainty() > 0, sys.name() + ": u(ΔCp°) is zero");
                if (s.deltaH() == 0) {
                    assertEquals(26_000, s.deltaHUncertainty(), 0, sys.name() + ": an unpublished ΔH° is wide");
                }
                if (s.deltaCp() == 0) {
                    assertEquals(190, s.deltaCpUncertainty(), 0, sys.name() + ": an unpublished ΔCp° is wide");
                }
            }
        }
        assertTrue(steps > 100, "the library's steps were read: " + steps);
    }

    @Test
    void theHeatCapacityTermMovesPKaAsTheIntegratedVanTHoffEquationDoes() {
        DissociationStep a = new DissociationStep(7.0, 20_000, -100, 0.01, TemperatureRange.celsius(0, 60));
        DissociationStep b = new DissociationStep(7.0, 20_000, -100 + 50, 0.01, TemperatureRange.celsius(0, 60));
        for (double kelvin : new double[] {278.15, 298.15, 310.15}) {
            assertEquals(b.pKa(kelvin) - a.pKa(kelvin), DissociationStep.pKaChangeFromDeltaCp(50, kelvin), 1e-12);
        }
        // by hand at 5 °C: −50/(8.314462618 · ln 10) · (298.15/278.15 − 1 + ln(278.15/298.15)) = −0.0064442
        assertEquals(-0.0064442, DissociationStep.pKaChangeFromDeltaCp(50, 278.15), 1e-7);
    }

    @Test
    void theHistidineSamplesStoragePhCarriesTheShareOfItsDeltaHUncertainty() {
        DocumentReport r = new Protolyte(SCHEMAS, LIBRARY).check(SAMPLES.resolve(
                "parenteral-histidine-sucrose-buffer.json"));
        FormulationAnalysis a = r.analysis().orElseThrow();
        ConditionResult storage = a.conditions().stream().filter(c -> c.condition().name().equals("storage"))
                .findFirst().orElseThrow();
        // histidine pKa2 ΔH° 29.7 kJ/mol with the default u = 2 kJ/mol; the q.s. is set at 21 °C, so at 5 °C pKa2
        // moves by 2000/(8.314462618 · ln 10) · (1/278.15 − 1/294.15) = 0.02043 against it, and histidine carries
        // the buffering: the pH moves by nearly as much
        double share = 2000 / (8.314462618 * Math.log(10)) * (1 / 278.15 - 1 / 294.15);
        assertEquals(0.02043, share, 1e-5);
        double u = storage.uncertainty().orElseThrow().pH();
        assertTrue(u >= 0.8 * share, "storage pH ± " + u + " is below 0.8 × " + share);
        assertTrue(a.assumptions().stream().anyMatch(s -> s.contains("histidine pKa2 (") && s.contains("u(ΔH°)")),
                a.assumptions()::toString);
        ConditionResult prep = a.conditions().get(0);
        assertTrue(u > prep.uncertainty().orElseThrow().pH(), "the temperature share shows away from the setpoint");
        List<String> words = a.assumptions();
        assertTrue(words.stream().anyMatch(s -> s.startsWith(org.protolyte.substance.UncertaintyDefaults.STATED)));
    }

    @Test
    void theBudgetHasOneDescriptionInTheReadmeTheJsonAndTheText() throws Exception {
        String words = org.protolyte.report.RunReport.UNCERTAINTY;
        String readme = java.nio.file.Files.readString(SAMPLES.getParent().resolve("README.md"));
        assertTrue(readme.contains("> " + words + "\n"), "README quotes the reports' description of ±");
        DocumentReport r = new Protolyte(SCHEMAS, LIBRARY).check(SAMPLES.resolve(
                "parenteral-histidine-sucrose-buffer.json"));
        org.protolyte.report.RunReport run = new org.protolyte.report.RunReport("test", java.time.Instant.EPOCH,
                java.util.Map.of(), List.of(r), List.of());
        var json = tools.jackson.databind.json.JsonMapper.builder().build()
                .readTree(new org.protolyte.report.JsonRenderer().render(run));
        assertEquals(words, json.at("/tool/uncertainty").asString());
        String text = new org.protolyte.report.TextRenderer(false, java.util.Optional.empty()).document(r)
                .replaceAll("\\s+", " ");
        assertTrue(text.contains(words), "the text report gives the same words");
    }
}
