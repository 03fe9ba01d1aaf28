package org.protolyte.batch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.JsonRenderer;
import org.protolyte.report.RunReport;
import org.protolyte.report.Status;
import org.protolyte.rules.Finding;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.Substance;
import org.protolyte.substance.SubstanceLibrary;
import org.protolyte.units.Quantity;

/**
 * Batch records on constructed cases whose cause is known: the "measured" values are the engine's own predictions
 * for the batch as it was really made (derived), written into a record that says what the master says. Certificate
 * corrections are checked against their definitions (derived), and master references that leave the folder tree are
 * refused.
 */
class BatchRecordTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(SCHEMAS);
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LIBRARY);

    /** An acetate buffer of fixed amounts (no q.s.), 1 L, stored at 20 °C: sodium acetate 0.82 g, acetic acid 0.60 g. */
    private static final String MASTER = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-ACE\","
            + " \"revision\": \"A\", \"intendedUse\": \"laboratory\", \"basis\": {\"finalVolume\": \"1 L\"},"
            + " \"components\": [{\"substance\": \"sodium acetate anhydrous\", \"amount\": \"0.82 g\"},"
            + " {\"substance\": \"acetic acid\", \"amount\": \"0.60 g\"}],"
            + " \"conditions\": [{\"name\": \"storage\", \"temperature\": \"20 Cel\"}]}";

    private static String record(String acetate, String acid, String measurements) {
        return "{\"document\": \"batch-record\", \"formatVersion\": 1, \"id\": \"TST-BR\", \"batch\": \"T1\","
                + " \"master\": {\"formulation\": " + MASTER + "}, \"batchSize\": \"2 L\", \"additions\": ["
                + "{\"step\": 1, \"substance\": \"sodium acetate anhydrous\", \"amount\": \"" + acetate + "\"},"
                + "{\"step\": 2, \"substance\": \"acetic acid\", \"amount\": \"" + acid + "\"}],"
                + " \"measurements\": [" + measurements + "]}";
    }

    private static DocumentReport check(String json) {
        return PROTOLYTE.check("record.json", json.getBytes(StandardCharsets.UTF_8));
    }

    private static double predicted(DocumentReport r, BatchAnalysis.Observation.Kind kind) {
        return r.batch().orElseThrow().observations().stream().filter(o -> o.kind() == kind).findFirst().orElseThrow()
                .predicted();
    }

    private static List<Finding> findings(DocumentReport r, String rule) {
        return r.findings().stream().filter(f -> f.rule().equals(rule)).toList();
    }

    private static String ph(double v) {
        return String.format(Locale.ROOT, "{\"step\": 2, \"quantity\": \"pH\", \"value\": %.3f, \"temperature\": "
                + "\"20 Cel\"}", v);
    }

    private static String osmolality(double v) {
        return String.format(Locale.ROOT, "{\"step\": 2, \"quantity\": \"osmolality\", \"value\": %.1f}", v);
    }

    @Test
    void aBatchMadeAsWrittenPassesWithItsPredictionsBesideTheMeasurements() {
        double pH = predicted(check(record("1.64 g", "1.20 g", ph(7))), BatchAnalysis.Observation.Kind.PH);
        DocumentReport r = check(record("1.64 g", "1.20 g", ph(pH + 0.02)));
        assertEquals(Status.PASS, r.status(), () -> r.findings().toString());
        assertEquals(2, r.batch().orElseThrow().scale(), 1e-12);
    }

    @Test
    void twoCausesFitOnePhReadingAndTheFindingNamesTheMeasurementThatWouldTellThemApart() {
        // really made: ten times the sodium acetate; the record says what the master says
        double truePH = predicted(check(record("16.4 g", "1.20 g", ph(7))), BatchAnalysis.Observation.Kind.PH);
        DocumentReport r = check(record("1.64 g", "1.20 g", ph(truePH)));
        assertEquals(Status.FAIL, r.status());
        assertEquals(1, findings(r, "batch-ph-agrees").size());
        String diagnosis = findings(r, "batch-diagnosis").get(0).message();
        assertTrue(diagnosis.contains("sodium acetate anhydrous weighed ten times too much"), diagnosis);
        assertTrue(diagnosis.contains("acetic acid weighed a tenth of what was recorded"), diagnosis);   // the same ratio
        assertTrue(diagnosis.contains("one observation cannot rank"), diagnosis);
        assertTrue(diagnosis.contains("osmolality of the batch would tell them apart"), diagnosis);
    }

    @Test
    void aSecondObservationRanksTheCandidatesAndRulesOutTheOneItContradicts() {
        String really = record("16.4 g", "1.20 g", ph(7) + "," + osmolality(300));
        DocumentReport made = check(really);
        double truePH = predicted(made, BatchAnalysis.Observation.Kind.PH);
        double trueOsmolality = predicted(made, BatchAnalysis.Observation.Kind.OSMOLALITY);
        DocumentReport r = check(record("1.64 g", "1.20 g", ph(truePH) + "," + osmolality(trueOsmolality)));
        String diagnosis = findings(r, "batch-diagnosis").get(0).message();
        assertTrue(diagnosis.contains("best fit first: 1. sodium acetate anhydrous weighed ten times too much"),
                diagnosis);
        assertFalse(diagnosis.contains("acetic acid weighed a tenth"), diagnosis);
    }

    @Test
    void theHydrateMixUpOfTheSampleIsTheBestFitOfItsTwoObservations() {
        Path sample = Path.of(System.getProperty("protolyte.projectRoot", "../.."),
                "sample-formulations/batch-records/br-hydrate-mixup.json");
        DocumentReport r = PROTOLYTE.check(sample);
        String diagnosis = findings(r, "batch-diagnosis").get(0).message();
        assertTrue(diagnosis.contains("1. disodium hydrogen phosphate anhydrous weighed in place of disodium hydrogen "
                + "phosphate heptahydrate"), diagnosis);
    }

    @Test
    void certificateCorrectionsFollowTheirDefinitions() {
        Substance hepta = LIBRARY.lookup("disodium hydrogen phosphate heptahydrate");
        double m = hepta.molarMass().getAsDouble();
        double anhydrous = m - 7 * 18.015;
        Quantity mass = Quantity.parse("10 g");
        // assay 99.5 % on the dried substance, water 47.0 %: n = m (1 − w) A / M_anhydrous (derived)
        assertEquals(10 * 0.53 * 0.995 / anhydrous, BatchAnalyzer.corrected(addition(mass, 0.995, false, 0.47,
                BatchRecord.Weighed.AS_IS), hepta), 1e-12);
        // no water recorded: the hydrate's own water, so n = m A / M
        assertEquals(10 * 0.995 / m, BatchAnalyzer.corrected(addition(mass, 0.995, false, Double.NaN,
                BatchRecord.Weighed.AS_IS), hepta), 1e-9);
        assertEquals(10 * 0.98 / m, BatchAnalyzer.corrected(addition(mass, 0.98, true, Double.NaN,
                BatchRecord.Weighed.AS_IS), hepta), 1e-12);
        assertEquals(10 / m, BatchAnalyzer.corrected(addition(mass, 0.9, false, 0.4, BatchRecord.Weighed.PURE), hepta),
                1e-12);
        assertEquals(10 / anhydrous, BatchAnalyzer.corrected(addition(mass, 0.9, false, 0.4,
                BatchRecord.Weighed.ANHYDROUS), hepta), 1e-12);
    }

    private static BatchRecord.Addition addition(Quantity q, double assay, boolean asIs, double water,
                                                 BatchRecord.Weighed weighed) {
        return new BatchRecord.Addition(1, "x", q, OptionalDouble.empty(), Optional.empty(), OptionalDouble.of(assay),
                asIs, Double.isNaN(water) ? OptionalDouble.empty() : OptionalDouble.of(water), weighed, "/additions/0");
    }

    private static String withPath(String path) {
        return "{\"document\": \"batch-record\", \"formatVersion\": 1, \"id\": \"TST-BR\", \"batch\": \"T1\","
                + " \"master\": {\"path\": \"" + path + "\"}, \"batchSize\": \"1 L\", \"additions\": ["
                + "{\"step\": 1, \"substance\": \"sodium acetate anhydrous\", \"amount\": \"0.82 g\"},"
                + "{\"step\": 2, \"substance\": \"acetic acid\", \"amount\": \"0.60 g\"}]}";
    }

    private static DocumentReport checkIn(Path tree, Path record, String json) throws IOException {
        Files.createDirectories(record.getParent());
        Files.writeString(record, json);
        return PROTOLYTE.check(record, tree);
    }

    private static String refusal(DocumentReport r) {
        assertEquals(Status.INVALID, r.status(), () -> r.findings().toString());
        assertEquals(Optional.of("/master/path"), r.findings().get(0).pointer());
        return r.findings().get(0).message();
    }

    @Test
    void aMasterPathThatLeavesTheFolderTreeIsRefused(@TempDir Path dir) throws IOException {
        Path tree = Files.createDirectories(dir.resolve("tree"));
        Files.writeString(dir.resolve("outside.json"), MASTER);
        Files.writeString(tree.resolve("master.json"), MASTER);
        Path record = tree.resolve("records/br.json");
        assertEquals(Status.PASS, checkIn(tree, record, withPath("../master.json")).status());
        assertTrue(refusal(checkIn(tree, record, withPath("../../outside.json"))).contains("leads outside the folder tree"));
        assertTrue(refusal(checkIn(tree, record, withPath("https://example.org/master.json"))).contains("URL"));
        assertTrue(refusal(checkIn(tree, record, withPath(dir.resolve("outside.json").toString()))).contains("absolute"));
        assertTrue(refusal(checkIn(tree, record, withPath("missing.json"))).contains("was not found"));
        try {
            Files.createSymbolicLink(tree.resolve("link.json"), dir.resolve("outside.json"));
        } catch (UnsupportedOperationException | IOException e) {
            return;     // a file system without links has no link to escape by
        }
        assertTrue(refusal(checkIn(tree, record, withPath("../link.json"))).contains("leads outside the folder tree"));
    }

    @Test
    void aRecordOfAnotherRevisionThanItsMasterIsRefusedAtItsPlace() {
        String json = record("1.64 g", "1.20 g", ph(4.9)).replace("\"master\": {\"formulation\":",
                "\"master\": {\"revision\": \"B\", \"formulation\":");
        DocumentReport r = check(json);
        assertEquals(Status.INVALID, r.status());
        assertEquals(Optional.of("/master/revision"), r.findings().get(0).pointer());
    }

    @Test
    void everyBatchSampleHasAJsonReportThatMatchesTheSchema() throws IOException {
        Path dir = Path.of(System.getProperty("protolyte.projectRoot", "../.."), "sample-formulations/batch-records");
        List<Path> files;
        try (var s = Files.list(dir)) {
            files = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
        RunReport run = PROTOLYTE.checkInputs(files.stream().map(p -> new Protolyte.Input(p, true, dir)).toList());
        assertEquals(files.size(), run.reports().size());
        String json = new JsonRenderer().render(run);
        assertEquals(List.of(), SCHEMAS.validate(new org.protolyte.document.JsonReader().read("report",
                json.getBytes(StandardCharsets.UTF_8)), "report.schema.json"));
    }
}
