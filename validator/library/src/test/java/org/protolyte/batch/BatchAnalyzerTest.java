package org.protolyte.batch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.protolyte.analysis.Analyzer;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.document.JsonReader;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;

/**
 * The batch analyzer on its own, on records built here. Predictions are held to published values and equations
 * (acetate buffer by Henderson–Hasselbalch with Davies activities, buffer capacity by Van Slyke), and to properties
 * that must hold whatever the chemistry: the q.s. brings the recorded batch to the pH the meter read (conservation), a
 * stock at f times the strength needs 1/f of the volume, a usual mistake predicts what the batch made that way
 * predicts, the master's amounts scale with the batch.
 */
class BatchAnalyzerTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final BatchRecordReader READER = new BatchRecordReader(SCHEMAS);
    private static final BatchAnalyzer BATCH = new BatchAnalyzer(LibraryLoader.shipped(SCHEMAS),
            new Analyzer(new Equilibrium(Davies.INSTANCE)));

    /** Molar masses, g/mol, to the four or five figures of the CRC Handbook of Chemistry and Physics (from memory). */
    private static final double SODIUM_ACETATE = 82.03;
    private static final double ACETIC_ACID = 60.05;
    private static final double SODIUM_ACETATE_TRIHYDRATE = 136.08;
    private static final double SODIUM_CHLORIDE = 58.44;

    /** An acetate buffer of fixed amounts, 1 L at 20 °C: sodium acetate 0.82 g and acetic acid 0.60 g (10 mmol each). */
    private static final String ACETATE = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-ACE\","
            + " \"revision\": \"A\", \"intendedUse\": \"laboratory\", \"basis\": {\"finalVolume\": \"1 L\"},"
            + " \"components\": [{\"substance\": \"sodium acetate anhydrous\", \"amount\": \"0.82 g\"},"
            + " {\"substance\": \"acetic acid\", \"amount\": \"0.60 g\"}],"
            + " \"conditions\": [{\"name\": \"storage\", \"temperature\": \"20 Cel\"}]}";

    /** The shipped master of the batch samples: phosphate-buffered saline, NaOH q.s. to pH 7.2 at 20 °C (7.1–7.3). */
    private static final String PBS = sample("master-phosphate-buffered-saline.json");

    /** The salts of the clean batch sample (10 L), as recorded, steps 1–3. */
    private static final String PBS_SALTS = salts(1);

    /** The three salts of the clean batch sample as recorded, from the given step on. */
    private static String salts(int first) {
        return "{\"step\": " + first + ", \"substance\": \"sodium chloride\", \"amount\": \"70.1 g\","
                + " \"assay\": \"99.8 %\", \"lossOnDrying\": \"0.1 %\"},"
                + " {\"step\": " + (first + 1) + ", \"substance\": \"sodium dihydrogen phosphate dihydrate\","
                + " \"amount\": \"23.4 g\", \"assay\": \"99.6 %\", \"waterContent\": \"23.1 %\"},"
                + " {\"step\": " + (first + 2) + ", \"substance\": \"disodium hydrogen phosphate heptahydrate\","
                + " \"amount\": \"26.8 g\", \"assay\": \"99.5 %\", \"waterContent\": \"47.0 %\"}";
    }

    /**
     * The same batch as an invented master of its own: the titrant line first, no conditions (so the engine's implicit
     * one), 1 L.
     */
    private static final String TITRANT_FIRST = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\":"
            + " \"TST-QS\", \"revision\": \"A\", \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": ["
            + "{\"substance\": \"sodium hydroxide\", \"stock\": {\"concentration\": \"1 mol/L\"},"
            + " \"adjustTo\": {\"pH\": 7.2, \"temperature\": \"20 Cel\"}},"
            + " {\"substance\": \"sodium chloride\", \"amount\": \"7.0 g\"},"
            + " {\"substance\": \"sodium dihydrogen phosphate dihydrate\", \"amount\": \"2.34 g\"},"
            + " {\"substance\": \"disodium hydrogen phosphate heptahydrate\", \"amount\": \"2.68 g\"}]}";

    private static String sample(String name) {
        try {
            return Files.readString(Path.of(System.getProperty("protolyte.projectRoot", "../.."), "sample-formulations",
                    "batch-records", name));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static String record(String master, String batchSize, String additions, String... measurements) {
        return "{\"document\": \"batch-record\", \"formatVersion\": 1, \"id\": \"TST-BR\", \"batch\": \"T1\","
                + " \"master\": {\"formulation\": " + master + "}, \"batchSize\": \"" + batchSize + "\", \"additions\": ["
                + additions + "], \"measurements\": [" + String.join(", ", measurements) + "]}";
    }

    private static BatchAnalysis analyse(String json) {
        return BATCH.analyze(READER.read(new JsonReader().read("record.json", json.getBytes(StandardCharsets.UTF_8)),
                Optional.empty(), Optional.empty()));
    }

    private static String weighed(int step, String substance, String amount) {
        return "{\"step\": " + step + ", \"substance\": \"" + substance + "\", \"amount\": \"" + amount + "\"}";
    }

    private static String naoh(int step, String amount, String stock) {
        return "{\"step\": " + step + ", \"substance\": \"sodium hydroxide\", \"amount\": \"" + amount + "\""
                + (stock.isEmpty() ? "" : ", \"stock\": {\"concentration\": \"" + stock + "\"}") + "}";
    }

    private static String ph(int step, double value, double celsius) {
        return String.format(Locale.ROOT, "{\"step\": %d, \"quantity\": \"pH\", \"value\": %.4f, \"temperature\":"
                + " \"%.1f Cel\"}", step, value, celsius);
    }

    private static String ph(int step, double value, double celsius, double atVolume) {
        return String.format(Locale.ROOT, "{\"step\": %d, \"quantity\": \"pH\", \"value\": %.4f, \"temperature\":"
                + " \"%.1f Cel\", \"atVolume\": %s}", step, value, celsius, atVolume);
    }

    private static String osmolality(int step, double value) {
        return String.format(Locale.ROOT, "{\"step\": %d, \"quantity\": \"osmolality\", \"value\": %.3f}", step, value);
    }

    private static String osmolality(int step, double value, double atVolume) {
        return String.format(Locale.ROOT, "{\"step\": %d, \"quantity\": \"osmolality\", \"value\": %.3f, \"atVolume\":"
                + " %s}", step, value, atVolume);
    }

    /** The 2 L acetate batch with these weighings (steps 1 and 2) and measurements. */
    private static BatchAnalysis acetate(String acetate, String acid, String... measurements) {
        return analyse(record(ACETATE, "2 L", weighed(1, "sodium acetate anhydrous", acetate) + ", "
                + weighed(2, "acetic acid", acid), measurements));
    }

    /** The 10 L PBS batch: the salts as in the clean sample, then the titrant, and these measurements. */
    private static BatchAnalysis pbs(String titrant, String... measurements) {
        return analyse(record(PBS, "10 L", PBS_SALTS + ", " + titrant, measurements));
    }

    private static BatchAnalysis.Observation observation(BatchAnalysis b, String pointer) {
        return b.observations().stream().filter(o -> o.pointer().equals(pointer)).findFirst()
                .orElseThrow(() -> new AssertionError(pointer + " not in " + b.observations()));
    }

    private static BatchAnalysis.Candidate candidate(BatchAnalysis b, String cause) {
        return b.candidates().stream().filter(c -> c.cause().equals(cause)).findFirst()
                .orElseThrow(() -> new AssertionError(cause + " not in " + b.candidates().stream()
                        .map(BatchAnalysis.Candidate::cause).toList()));
    }

    private static double further(BatchAnalysis.Candidate c, String label) {
        return c.further().stream().filter(f -> f.label().equals(label)).findFirst()
                .orElseThrow(() -> new AssertionError(label + " not in " + c.further())).predicted().getAsDouble();
    }

    // --- the additions against the master -----------------------------------------------------------------------

    @Test
    void eachMasterLineIsExpectedInTheBatchsProportion() {
        BatchAnalysis b = acetate("1.80 g", "1.20 g");
        assertEquals(2, b.scale(), 1e-12);
        BatchAnalysis.AdditionCheck salt = b.additions().get(0);
        assertEquals(BatchAnalysis.Match.SAME, salt.match());
        assertEquals("/components/0", salt.line().orElseThrow().pointer());
        assertEquals("/additions/0", salt.addition().orElseThrow().pointer());
        assertEquals("sodium acetate anhydrous", salt.used().orElseThrow().name());
        assertEquals(0.82 / SODIUM_ACETATE * 2, salt.expectedMoles(), 0.82 / SODIUM_ACETATE * 2 * 1e-4);
        assertEquals(1.80 / SODIUM_ACETATE, salt.actualMoles(), 1.80 / SODIUM_ACETATE * 1e-4);
        assertEquals(1.80 / 1.64 - 1, salt.deviation(), 1e-9);
        assertEquals(Optional.empty(), salt.tolerance());
        BatchAnalysis.AdditionCheck acid = b.additions().get(1);
        assertEquals(BatchAnalysis.Match.SAME, acid.match());
        assertEquals(0.60 / ACETIC_ACID * 2, acid.expectedMoles(), 0.60 / ACETIC_ACID * 2 * 1e-4);
        assertEquals(0, acid.deviation(), 1e-12);
        assertEquals(2, b.additions().size());
    }

    /** A half-litre master made as 2 L: four times each amount. */
    @Test
    void theScaleIsTheBatchOverTheMastersBasis() {
        String half = ACETATE.replace("\"1 L\"", "\"500 mL\"").replace("0.82 g", "0.41 g").replace("0.60 g", "0.30 g");
        BatchAnalysis b = analyse(record(half, "2 L", weighed(1, "sodium acetate anhydrous", "1.64 g") + ", "
                + weighed(2, "acetic acid", "1.20 g")));
        assertEquals(4, b.scale(), 1e-12);
        assertEquals(0.41 / SODIUM_ACETATE * 4, b.additions().get(0).expectedMoles(), 0.41 / SODIUM_ACETATE * 4 * 1e-4);
        assertEquals(0, b.additions().get(1).deviation(), 1e-9);
    }

    /** The titrant line takes only the titrant, wherever it stands in the master. */
    @Test
    void aTitrantLineFirstInTheMasterTakesOnlyTheTitrant() {
        BatchAnalysis b = analyse(record(TITRANT_FIRST, "10 L", PBS_SALTS + ", " + naoh(5, "73.5 mL", "1 mol/L"),
                ph(5, 7.20, 20)));
        assertEquals(List.of(BatchAnalysis.Match.TITRANT, BatchAnalysis.Match.SAME, BatchAnalysis.Match.SAME,
                BatchAnalysis.Match.SAME), b.additions().stream().map(BatchAnalysis.AdditionCheck::match).toList());
        assertEquals(0.0735, b.additions().get(0).actualMoles(), 1e-9);
        assertEquals(7.0 / SODIUM_CHLORIDE * 10, b.additions().get(1).expectedMoles(), 7.0 / SODIUM_CHLORIDE * 10 * 1e-4);
        // the batch as made is shown at the conditions the master states, and this one states none (its implicit
        // default is not a condition of the master's to show the batch at)
        assertEquals(List.of(), b.asMade().orElseThrow().conditions());
    }

    @Test
    void twoAdditionsOfOneLineCountTogether() {
        BatchAnalysis b = analyse(record(ACETATE, "2 L", weighed(1, "sodium acetate anhydrous", "1.00 g") + ", "
                + weighed(2, "sodium acetate anhydrous", "0.64 g") + ", " + weighed(3, "acetic acid", "1.20 g")));
        BatchAnalysis.AdditionCheck salt = b.additions().get(0);
        assertEquals(BatchAnalysis.Match.SAME, salt.match());
        assertEquals(1.64 / SODIUM_ACETATE, salt.actualMoles(), 1.64 / SODIUM_ACETATE * 1e-4);
        assertEquals("/additions/0", salt.addition().orElseThrow().pointer());
        assertEquals(2, b.additions().size());
    }

    @Test
    void anotherFormAMissingLineAndAnAdditionTheMasterLacksAreToldApart() {
        BatchAnalysis b = analyse(record(ACETATE, "2 L", weighed(1, "sodium acetate trihydrate", "2.72 g") + ", "
                + weighed(2, "sodium chloride", "0.50 g")));
        assertEquals(List.of(BatchAnalysis.Match.OTHER_FORM, BatchAnalysis.Match.MISSING, BatchAnalysis.Match.EXTRA),
                b.additions().stream().map(BatchAnalysis.AdditionCheck::match).toList());
        BatchAnalysis.AdditionCheck form = b.additions().get(0);
        assertEquals("sodium acetate anhydrous", form.expected().orElseThrow().name());
        assertEquals("sodium acetate trihydrate", form.used().orElseThrow().name());
        assertEquals(2.72 / SODIUM_ACETATE_TRIHYDRATE, form.actualMoles(), 2.72 / SODIUM_ACETATE_TRIHYDRATE * 1e-4);
        assertEquals(0.82 / SODIUM_ACETATE * 2, form.expectedMoles(), 0.82 / SODIUM_ACETATE * 2 * 1e-4);
        BatchAnalysis.AdditionCheck missing = b.additions().get(1);
        assertEquals(0, missing.actualMoles());
        assertEquals(-1, missing.deviation(), 1e-12);
        assertEquals(Optional.empty(), missing.addition());
        assertEquals(Optional.empty(), missing.used());
        BatchAnalysis.AdditionCheck extra = b.additions().get(2);
        assertEquals(Optional.empty(), extra.line());
        assertEquals(Optional.empty(), extra.expected());
        assertEquals("sodium chloride", extra.used().orElseThrow().name());
        assertEquals(0.50 / SODIUM_CHLORIDE, extra.actualMoles(), 0.50 / SODIUM_CHLORIDE * 1e-4);
        assertTrue(Double.isNaN(extra.deviation()));
        // a line that has other forms is missing, not replaced, where only an unrelated substance is left
        BatchAnalysis unrelated = analyse(record(ACETATE, "2 L", weighed(1, "sodium chloride", "0.50 g") + ", "
                + weighed(2, "acetic acid", "1.20 g")));
        assertEquals(List.of(BatchAnalysis.Match.MISSING, BatchAnalysis.Match.SAME, BatchAnalysis.Match.EXTRA),
                unrelated.additions().stream().map(BatchAnalysis.AdditionCheck::match).toList());
    }

    @Test
    void theTitrantIsTheMetersAmountNotAnExpectedOne() {
        BatchAnalysis b = pbs(naoh(5, "73.5 mL", "1 mol/L"), ph(5, 7.2, 20));
        BatchAnalysis.AdditionCheck t = b.additions().stream().filter(a -> a.match() == BatchAnalysis.Match.TITRANT)
                .findFirst().orElseThrow();
        assertEquals(0.0735, t.actualMoles(), 1e-9);
        assertTrue(Double.isNaN(t.expectedMoles()) && Double.isNaN(t.deviation()));
        assertEquals("/additions/3", t.addition().orElseThrow().pointer());
        assertEquals(4, b.additions().size());
    }

    @Test
    void aDeviationIsDefinedOnlyWhereBothSidesAreKnown() {
        assertEquals(0.5, check(2, 3).deviation(), 1e-12);
        assertEquals(-1, check(2, 0).deviation(), 1e-12);
        assertTrue(Double.isNaN(check(0, 3).deviation()));
        assertTrue(Double.isNaN(check(2, -1).deviation()));
        assertTrue(Double.isNaN(check(Double.NaN, 3).deviation()));
    }

    private static BatchAnalysis.AdditionCheck check(double expected, double actual) {
        return new BatchAnalysis.AdditionCheck(BatchAnalysis.Match.SAME, Optional.empty(), Optional.empty(),
                Optional.empty(), Optional.empty(), expected, actual, Optional.empty());
    }

    @Test
    void valuesReadAsAReaderExpects() {
        assertEquals("6.62", BatchAnalysis.Observation.Kind.PH.text(6.624));
        assertEquals("4.10 mL", BatchAnalysis.Observation.Kind.TITRANT.text(4.1));
        assertEquals("292 mOsm/kg", BatchAnalysis.Observation.Kind.OSMOLALITY.text(291.6));
        assertEquals("—", BatchAnalysis.Observation.Kind.PH.text(Double.NaN));
        assertEquals("0.500 mol/L", BatchAnalyzer.molarityText(0.5));
    }

    // --- predictions against published values -------------------------------------------------------------------

    /**
     * 10 mmol/L sodium acetate with 10 mmol/L acetic acid at 20 °C: pKa 4.757 (Harned and Ehlers 1933), Davies
     * log γ± = −0.509 (√I/(1 + √I) − 0.3 I) = −0.045 at I = 0.01, so pH = pKa + log([A⁻]/[HA]) + log γ = 4.71; its
     * buffer capacity by Van Slyke (1922), β = 2.303 [A⁻][HA]/C = 11.5 mmol/L per pH. The salt alone, before the acid:
     * pH = ½ (pKw + pKa + log C) + log γ = ½ (14.17 + 4.76 − 2) − 0.045 = 8.42 (pKw 14.17 at 20 °C, Harned and Owen).
     * The osmolality: 30 mmol/kg of particles, the ions at an osmotic coefficient near 0.96 (Robinson and Stokes).
     */
    @Test
    void eachMeasurementIsPredictedFromTheAdditionsUpToItsStep() {
        BatchAnalysis b = acetate("1.64 g", "1.20 g", ph(1, 8.4, 20), ph(2, 4.7, 20), osmolality(2, 29));
        assertEquals(3, b.observations().size());
        BatchAnalysis.Observation salt = b.observations().get(0);
        assertEquals(BatchAnalysis.Observation.Kind.PH, salt.kind());
        assertEquals("pH at step 1 (20.0 °C)", salt.label());
        assertEquals("/measurements/0", salt.pointer());
        assertEquals(8.4, salt.measured());
        assertEquals(8.42, salt.predicted(), 0.08);
        assertTrue(salt.bufferCapacity() > 0 && salt.bufferCapacity() < 0.1, () -> "β " + salt.bufferCapacity());
        BatchAnalysis.Observation buffer = b.observations().get(1);
        assertEquals("pH at step 2 (20.0 °C)", buffer.label());
        assertEquals(4.71, buffer.predicted(), 0.02);
        assertEquals(11.5, buffer.bufferCapacity(), 11.5 * 0.05);
        assertEquals(Optional.empty(), buffer.unpredicted());
        BatchAnalysis.Observation osm = b.observations().get(2);
        assertEquals(BatchAnalysis.Observation.Kind.OSMOLALITY, osm.kind());
        assertEquals("osmolality at step 2", osm.label());
        assertEquals(29.3, osm.predicted(), 1.0);
        assertTrue(Double.isNaN(osm.bufferCapacity()));
    }

    /** At half the volume every concentration doubles: the osmolality nearly doubles, the buffer's ratio stays. */
    @Test
    void aMeasurementAtPartVolumeSeesTheAdditionsConcentrated() {
        BatchAnalysis b = acetate("1.64 g", "1.20 g", ph(2, 4.7, 20), ph(2, 4.7, 20, 0.5), osmolality(2, 29),
                osmolality(2, 58, 0.5));
        double full = b.observations().get(2).predicted();
        double half = b.observations().get(3).predicted();
        assertTrue(half / full > 1.9 && half / full < 2.02, () -> half + " against " + full);
        assertEquals(b.observations().get(0).predicted(), b.observations().get(1).predicted(), 0.03);
        assertTrue(b.observations().get(1).bufferCapacity() > 1.9 * b.observations().get(0).bufferCapacity());
    }

    @Test
    void aReadingBeforeAnyAdditionCannotBePredictedAndExplainsNothing() {
        BatchAnalysis b = analyse(record(ACETATE, "2 L", weighed(2, "sodium acetate anhydrous", "1.64 g") + ", "
                + weighed(3, "acetic acid", "1.20 g"), ph(1, 3, 20)));
        BatchAnalysis.Observation o = b.observations().get(0);
        assertTrue(Double.isNaN(o.predicted()));
        assertEquals(Optional.of("no addition is recorded by then"), o.unpredicted());
        assertEquals(List.of(), b.candidates());
    }

    @Test
    void theBatchAsMadeIsShownAtTheMastersConditions() {
        BatchAnalysis b = acetate("1.64 g", "1.20 g", ph(2, 4.7, 20));
        var made = b.asMade().orElseThrow();
        assertEquals(List.of("storage"), made.conditions().stream().map(c -> c.condition().name()).toList());
        assertEquals(b.observations().get(0).predicted(), made.conditions().get(0).state().orElseThrow().pH(), 1e-6);
        assertEquals(List.of(), b.caveats());
        assertEquals(List.of(), b.specifiedPh(), "the master states no pH target");
    }

    // --- when the usual mistakes are tried ----------------------------------------------------------------------

    /** Within 0.02 pH or 1 % nothing needs explaining; beyond, the usual mistakes are tried. */
    @Test
    void smallDifferencesNeedNoExplanation() {
        double pH = acetate("1.64 g", "1.20 g", ph(2, 4.7, 20)).observations().get(0).predicted();
        assertEquals(List.of(), acetate("1.64 g", "1.20 g", ph(2, pH + 0.015, 20)).candidates());
        assertEquals(List.of(), acetate("1.64 g", "1.20 g", ph(2, pH - 0.015, 20)).candidates());
        BatchAnalysis off = acetate("1.64 g", "1.20 g", ph(2, pH - 0.03, 20));
        assertFalse(off.candidates().isEmpty());
        assertEquals("as recorded", off.candidates().get(0).cause());
        assertEquals(pH, off.candidates().get(0).predicted()[0], 1e-9);
        assertFalse(acetate("1.64 g", "1.20 g", ph(2, pH + 0.03, 20)).candidates().isEmpty());
        double osm = acetate("1.64 g", "1.20 g", osmolality(2, 29)).observations().get(0).predicted();
        assertEquals(List.of(), acetate("1.64 g", "1.20 g", osmolality(2, osm * 1.008)).candidates());
        assertFalse(acetate("1.64 g", "1.20 g", osmolality(2, osm * 1.015)).candidates().isEmpty());
    }

    /**
     * Each usual mistake predicts what a record of the batch made that way predicts: ten times the salt, a tenth of
     * it, the salt left out, the trihydrate weighed in place of the anhydrous salt. The osmolality each would give is
     * the further measurement, the one of that batch.
     */
    @Test
    void aUsualMistakePredictsWhatTheBatchMadeThatWayGives() {
        BatchAnalysis b = acetate("1.64 g", "1.20 g", ph(2, 5.5, 20));
        assertEquals(List.of("as recorded",
                        "sodium acetate trihydrate weighed in place of sodium acetate anhydrous (step 1)",
                        "sodium acetate anhydrous weighed ten times too much (step 1)",
                        "sodium acetate anhydrous weighed a tenth of what was recorded (step 1)",
                        "sodium acetate anhydrous left out (step 1)",
                        "acetic acid weighed ten times too much (step 2)",
                        "acetic acid weighed a tenth of what was recorded (step 2)",
                        "acetic acid left out (step 2)"),
                b.candidates().stream().map(BatchAnalysis.Candidate::cause).toList());
        String osmolality = "osmolality of the batch";
        BatchAnalysis same = acetate("1.64 g", "1.20 g", ph(2, 5.5, 20), osmolality(2, 29));
        assertEquals(same.observations().get(1).predicted(), further(b.candidates().get(0), osmolality), 1e-9);
        assertMadeThatWay(candidate(b, "sodium acetate anhydrous weighed ten times too much (step 1)"),
                acetate("16.4 g", "1.20 g", ph(2, 5.5, 20), osmolality(2, 29)));
        assertMadeThatWay(candidate(b, "sodium acetate anhydrous weighed a tenth of what was recorded (step 1)"),
                acetate("0.164 g", "1.20 g", ph(2, 5.5, 20), osmolality(2, 29)));
        assertMadeThatWay(candidate(b, "sodium acetate trihydrate weighed in place of sodium acetate anhydrous (step 1)"),
                analyse(record(ACETATE, "2 L", weighed(1, "sodium acetate trihydrate", "1.64 g") + ", "
                        + weighed(2, "acetic acid", "1.20 g"), ph(2, 5.5, 20), osmolality(2, 29))));
        assertMadeThatWay(candidate(b, "acetic acid left out (step 2)"), analyse(record(ACETATE, "2 L",
                weighed(1, "sodium acetate anhydrous", "1.64 g"), ph(2, 5.5, 20), osmolality(2, 29))));
        assertTrue(b.candidates().stream().allMatch(c -> c.unpredicted().isEmpty()));
    }

    private static void assertMadeThatWay(BatchAnalysis.Candidate c, BatchAnalysis made) {
        assertEquals(made.observations().get(0).predicted(), c.predicted()[0], 1e-9, c.cause());
        assertEquals(made.observations().get(1).predicted(), further(c, "osmolality of the batch"), 1e-9, c.cause());
    }

    // --- the q.s. of the titrant ---------------------------------------------------------------------------------

    /**
     * Conservation: the volume the analyzer says the recorded weighings need is the amount of NaOH that, recorded as
     * such (in mmol, so no q.s. is computed), brings the batch to the pH the meter read.
     */
    @Test
    void theQsIsTheTitrantThatBringsTheRecordedBatchToTheReadPh() {
        BatchAnalysis b = pbs(naoh(5, "73.5 mL", "1 mol/L"), ph(4, 6.68, 20), ph(5, 7.20, 20), osmolality(6, 283));
        assertEquals(List.of("/measurements/0", "/measurements/2", "/additions/3/amount"),
                b.observations().stream().map(BatchAnalysis.Observation::pointer).toList());
        BatchAnalysis.Observation t = observation(b, "/additions/3/amount");
        assertEquals(BatchAnalysis.Observation.Kind.TITRANT, t.kind());
        assertEquals("mL of sodium hydroxide 1.00 mol/L", t.label());
        assertEquals(73.5, t.measured(), 1e-9);
        assertTrue(t.predicted() > 0, () -> "q.s. " + t.predicted());
        BatchAnalysis dosed = pbs(naoh(5, String.format(Locale.ROOT, "%.6f mmol", t.predicted()), ""), ph(5, 7.20, 20));
        BatchAnalysis.Observation reading = observation(dosed, "/measurements/0");
        assertEquals(7.20, reading.predicted(), 0.005);
        assertTrue(dosed.observations().stream().noneMatch(o -> o.kind() == BatchAnalysis.Observation.Kind.TITRANT));
    }

    /** The moles are what the chemistry needs; the volume is those moles over the stock's strength. */
    @Test
    void theQsIsTheSameMolesFromAWeakerStockOrInTwoParts() {
        double v = observation(pbs(naoh(5, "73.5 mL", "1 mol/L"), ph(5, 7.20, 20)), "/additions/3/amount").predicted();
        BatchAnalysis.Observation half = observation(pbs(naoh(5, "147 mL", "0.5 mol/L"), ph(5, 7.20, 20)),
                "/additions/3/amount");
        assertEquals(147, half.measured(), 1e-9);
        assertEquals(2 * v, half.predicted(), 2 * v * 1e-6);
        assertEquals("mL of sodium hydroxide 0.500 mol/L", half.label());
        BatchAnalysis split = analyse(record(PBS, "10 L", PBS_SALTS + ", " + naoh(5, "50 mL", "1 mol/L") + ", "
                + naoh(5, "23.5 mL", "1 mol/L"), ph(5, 7.20, 20)));
        BatchAnalysis.Observation both = observation(split, "/additions/3/amount");
        assertEquals(73.5, both.measured(), 1e-9);
        assertEquals(v, both.predicted(), v * 1e-6);
    }

    /** A weighing made at the step of the titrant and its reading is in the solution the q.s. is computed for. */
    @Test
    void aWeighingAtTheStepOfTheReadingCountsForTheQs() {
        double v = observation(pbs(naoh(5, "73.5 mL", "1 mol/L"), ph(5, 7.20, 20)), "/additions/3/amount").predicted();
        BatchAnalysis late = analyse(record(PBS, "10 L", PBS_SALTS.replace("\"step\": 3", "\"step\": 5") + ", "
                + naoh(5, "73.5 mL", "1 mol/L"), ph(5, 7.20, 20)));
        assertEquals(v, observation(late, "/additions/3/amount").predicted(), v * 1e-6);
    }

    /** Without a reading after the titrant, the q.s. aims at the master's own adjustTo: pH 7.2 at 20 °C. */
    @Test
    void withoutAReadingAfterTheTitrantTheQsAimsAtTheMastersPh() {
        double v = observation(pbs(naoh(5, "73.5 mL", "1 mol/L"), ph(5, 7.20, 20)), "/additions/3/amount").predicted();
        BatchAnalysis b = pbs(naoh(5, "73.5 mL", "1 mol/L"), osmolality(6, 283));
        assertEquals(v, observation(b, "/additions/3/amount").predicted(), v * 1e-6);
        // adjustTo without a pH means the target's midpoint, here the same 7.2
        BatchAnalysis toTarget = analyse(record(PBS.replace("\"adjustTo\": { \"pH\": 7.2,", "\"adjustTo\": {"), "10 L",
                PBS_SALTS + ", " + naoh(5, "73.5 mL", "1 mol/L"), osmolality(6, 283)));
        assertEquals(v, observation(toTarget, "/additions/3/amount").predicted(), v * 1e-6);
        // and with neither, there is nothing to aim at: the volume is not predicted, and says why
        String aimless = PBS.replace("\"adjustTo\": { \"pH\": 7.2,", "\"adjustTo\": {")
                .replaceAll("\"targets\":\\s*\\{[^{}]*\\{[^{}]*\\}\\s*\\},", "");
        BatchAnalysis.Observation none = observation(analyse(record(aimless, "10 L", PBS_SALTS + ", "
                + naoh(5, "73.5 mL", "1 mol/L"), osmolality(6, 283))), "/additions/3/amount");
        assertTrue(Double.isNaN(none.predicted()));
        assertEquals(Optional.of("no pH was read after the titrant and the master states no pH to adjust to"),
                none.unpredicted());
    }

    /**
     * A stock at f times the recorded strength needs 1/f of the volume for the same q.s., and changes no reading
     * taken before the titrant.
     */
    @Test
    void aTitrantStockAtAnotherStrengthNeedsTheInverseVolume() {
        BatchAnalysis b = pbs(naoh(5, "49.0 mL", "1 mol/L"), ph(4, 6.68, 20), ph(5, 7.20, 20));
        BatchAnalysis.Candidate recorded = b.candidates().get(0);
        assertEquals("as recorded", recorded.cause());
        assertEquals(List.of("osmolality of the batch"), recorded.further().stream().map(BatchAnalysis.Further::label)
                .toList(), "the pH before the titrant was read");
        double v = recorded.predicted()[1];
        assertEquals(observation(b, "/additions/3/amount").predicted(), v, 1e-9);
        for (double f : new double[] {10, 2, 0.5, 0.1}) {
            String cause = String.format(Locale.ROOT, "the sodium hydroxide stock at %s, not the 1.00 mol/L recorded",
                    BatchAnalyzer.molarityText(f));
            BatchAnalysis.Candidate c = candidate(b, cause);
            assertEquals(v / f, c.predicted()[1], v / f * 1e-6, cause);
            assertEquals(recorded.predicted()[0], c.predicted()[0], 1e-9, cause);
        }
        // the batch as a stock of twice the strength would have made it: its osmolality is the further measurement
        BatchAnalysis.Candidate twice = candidate(b, "the sodium hydroxide stock at 2.00 mol/L, not the 1.00 mol/L "
                + "recorded");
        BatchAnalysis strong = pbs(naoh(5, "49.0 mL", "2 mol/L"), ph(4, 6.68, 20), ph(5, 7.20, 20));
        assertEquals(further(strong.candidates().get(0), "osmolality of the batch"), further(twice,
                "osmolality of the batch"), 1e-9);
        assertTrue(b.candidates().stream().noneMatch(c -> c.cause().startsWith("sodium hydroxide weighed")),
                "a titrant's amount is the meter's");
    }

    /**
     * A stock at a tenth of a 0.01 mol/L strength would need the 73.5 mmol of NaOH in 73.5 L, more than the 10 L batch:
     * that mistake cannot be predicted, and says so.
     */
    @Test
    void aMistakenStrengthWhoseVolumeExceedsTheBatchIsNotPredicted() {
        BatchAnalysis b = pbs(naoh(5, "4900 mL", "0.01 mol/L"), ph(4, 6.68, 20), ph(5, 7.20, 20));
        BatchAnalysis.Candidate weak = candidate(b, "the sodium hydroxide stock at 0.00100 mol/L, not the 0.0100 mol/L "
                + "recorded");
        assertTrue(Double.isNaN(weak.predicted()[1]), () -> Arrays.toString(weak.predicted()));
        assertTrue(weak.unpredicted().orElseThrow().contains("more than the 10000.0 mL"), weak.unpredicted()::get);
        assertFalse(Double.isNaN(candidate(b, "the sodium hydroxide stock at 0.0200 mol/L, not the 0.0100 mol/L "
                + "recorded").predicted()[1]));
    }

    /** Without a reading before the titrant, the pH it would have shown is the further measurement. */
    @Test
    void thePhBeforeTheTitrantIsOfferedWhereItWasNotRead() {
        double before = observation(pbs(naoh(5, "49.0 mL", "1 mol/L"), ph(4, 6.68, 20), ph(5, 7.20, 20)),
                "/measurements/0").predicted();
        BatchAnalysis b = pbs(naoh(5, "49.0 mL", "1 mol/L"), ph(5, 7.20, 20));
        assertEquals(before, further(b.candidates().get(0), "pH before the titrant (20.0 °C)"), 1e-9);
    }

    @Test
    void aQsWithNoAdditionBeforeTheTitrantIsNotComparedAndSaysWhy() {
        BatchAnalysis b = analyse(record(PBS, "10 L", naoh(1, "73.5 mL", "1 mol/L") + ", " + salts(2),
                ph(1, 12.8, 20)));
        var caveat = b.caveats().stream().filter(c -> c.code().equals("batch-titrant-not-compared")).findFirst()
                .orElseThrow(() -> new AssertionError(b.caveats().toString()));
        assertTrue(caveat.message().contains("no addition is recorded before the titrant"), caveat::message);
        assertTrue(caveat.message().contains("the pH read at step 1 (/measurements/0)"), caveat::message);
        assertTrue(b.observations().stream().noneMatch(o -> o.kind() == BatchAnalysis.Observation.Kind.TITRANT));
        assertFalse(Double.isNaN(observation(b, "/measurements/0").predicted()));
    }

    // --- the specification -------------------------------------------------------------------------------------

    /**
     * A reading of the finished batch at the target's temperature is held to the target as written; at another one,
     * to the target moved by the batch's own predicted change between the two temperatures (for phosphate about
     * −0.002 pH/K, ΔH° of the second dissociation 3.6 kJ/mol, Goldberg et al. 2002); an in-process reading or one at
     * part volume is not held to it.
     */
    @Test
    void eachReadingOfTheFinishedBatchIsHeldToTheTargetAtItsTemperature() {
        BatchAnalysis b = pbs(naoh(5, "73.5 mL", "1 mol/L"), ph(4, 6.68, 20), ph(5, 7.20, 20), ph(6, 7.19, 25),
                ph(6, 7.20, 20), ph(6, 7.2, 20, 0.9));
        assertEquals(List.of("/measurements/1", "/measurements/2", "/measurements/3"),
                b.specifiedPh().stream().map(BatchAnalysis.SpecifiedPh::pointer).toList());
        BatchAnalysis.SpecifiedPh same = b.specifiedPh().get(0);
        assertEquals("pH at step 5 (20.0 °C)", same.label());
        assertEquals(7.20, same.measured());
        assertEquals(7.1, same.min(), 1e-9);
        assertEquals(7.3, same.max(), 1e-9);
        assertEquals(293.15, same.targetKelvin(), 1e-9);
        assertEquals(0, same.shift());
        BatchAnalysis.SpecifiedPh warm = b.specifiedPh().get(1);
        assertEquals("pH at step 6 (25.0 °C)", warm.label());
        double shift = observation(b, "/measurements/2").predicted() - observation(b, "/measurements/3").predicted();
        assertEquals(shift, warm.shift(), 1e-9);
        assertTrue(shift < -0.005 && shift > -0.03, () -> "shift " + shift);
        assertEquals(7.1 + shift, warm.min(), 1e-9);
        assertEquals(7.3 + shift, warm.max(), 1e-9);
        assertEquals(Optional.empty(), warm.unjudged());
    }

    /** Beyond the temperatures the constants hold for, the target cannot be moved: the reading is not judged. */
    @Test
    void aReadingWhereTheDriftCannotBePredictedIsNotJudgedAndSaysWhy() {
        BatchAnalysis b = pbs(naoh(5, "73.5 mL", "1 mol/L"), ph(5, 7.20, 20), ph(6, 7.0, 99));
        BatchAnalysis.SpecifiedPh hot = b.specifiedPh().get(1);
        assertEquals("/measurements/1", hot.pointer());
        assertTrue(Double.isNaN(hot.shift()) && Double.isNaN(hot.min()) && Double.isNaN(hot.max()));
        String why = hot.unjudged().orElseThrow();
        assertTrue(why.startsWith("the pH target (at 20.0 °C) cannot be moved to the reading's temperature: "), why);
        assertTrue(why.endsWith(observation(b, "/measurements/1").unpredicted().orElseThrow()), why);
    }

    @Test
    void aCandidateKeepsItsOwnPredictions() {
        double[] p = {1, 2};
        BatchAnalysis.Candidate c = new BatchAnalysis.Candidate("x", p, List.of(), Optional.empty());
        p[0] = 9;
        assertEquals(1, c.predicted()[0]);
        assertTrue(Arrays.equals(new double[] {1, 2}, c.predicted()));
    }
}
