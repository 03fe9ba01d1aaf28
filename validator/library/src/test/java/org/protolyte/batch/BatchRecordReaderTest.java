package org.protolyte.batch;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.protolyte.document.DocumentException;
import org.protolyte.document.JsonReader;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.document.SourceDocument;
import org.protolyte.units.Quantity;

/**
 * The reader on its own: each field of a record as read, each bound at its edge (a value just inside is read, one just
 * outside is refused at its place), and each way a master reference is refused. No chemistry is involved.
 */
class BatchRecordReaderTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final BatchRecordReader READER = new BatchRecordReader(SCHEMAS);

    private static final String MASTER = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-ACE\","
            + " \"revision\": \"A\", \"basis\": {\"finalVolume\": \"1 L\"},"
            + " \"components\": [{\"substance\": \"sodium acetate anhydrous\", \"amount\": \"0.82 g\"}]}";
    private static final String WATER_MASS_MASTER = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\":"
            + " \"TST-WM\", \"revision\": \"A\", \"basis\": {\"waterMass\": \"1 kg\"},"
            + " \"components\": [{\"substance\": \"sodium chloride\", \"amount\": \"9 g\"}]}";
    private static final String ADDITION = "{\"step\": 1, \"substance\": \"sodium acetate anhydrous\", \"amount\": "
            + "\"1.64 g\"}";

    /** A record of the acetate master with the given master object, batch size, additions and measurements. */
    private static String record(String master, String batchSize, String additions, String measurements) {
        return "{\"document\": \"batch-record\", \"formatVersion\": 1, \"id\": \"TST-BR\", \"batch\": \"T1\","
                + " \"master\": " + master + ", \"batchSize\": " + batchSize + ", \"additions\": [" + additions + "]"
                + (measurements.isEmpty() ? "" : ", \"measurements\": [" + measurements + "]") + "}";
    }

    private static String embedded(String formulation) {
        return "{\"formulation\": " + formulation + "}";
    }

    private static String addition(String fields) {
        return "{\"step\": 1, \"substance\": \"sodium acetate anhydrous\", \"amount\": \"1.64 g\"" + fields + "}";
    }

    private static String measurement(String fields) {
        return "{\"step\": 1" + fields + "}";
    }

    private static SourceDocument doc(String json) {
        return new JsonReader().read("record.json", json.getBytes(StandardCharsets.UTF_8));
    }

    private static BatchRecord read(String json) {
        return READER.read(doc(json), Optional.empty(), Optional.empty());
    }

    private static BatchRecord.Addition readAddition(String fields) {
        return read(record(embedded(MASTER), "\"2 L\"", addition(fields), "")).additions().get(0);
    }

    private static BatchRecord.Measurement readMeasurement(String fields) {
        return read(record(embedded(MASTER), "\"2 L\"", ADDITION, measurement(fields))).measurements().get(0);
    }

    /** The one problem of a refused record. */
    private static Problem refused(String json) {
        DocumentException e = assertThrows(DocumentException.class, () -> read(json));
        assertEquals(1, e.problems().size(), e.problems()::toString);
        return e.problems().get(0);
    }

    private static Problem refusedAddition(String fields) {
        return refused(record(embedded(MASTER), "\"2 L\"", addition(fields), ""));
    }

    private static Problem refusedMeasurement(String fields) {
        return refused(record(embedded(MASTER), "\"2 L\"", ADDITION, measurement(fields)));
    }

    @Test
    void theRecordsOwnFieldsAreRead() {
        BatchRecord r = read(record("{\"revision\": \"A\", \"formulation\": " + MASTER + "}", "\"2 L\"", ADDITION, ""));
        assertEquals("TST-BR", r.id());
        assertEquals("T1", r.batch());
        assertEquals("TST-ACE", r.master().id());
        assertEquals(Optional.of("A"), r.masterRevision());
        assertEquals("/batchSize", r.batchSizePointer());
        assertEquals(List.of(), r.measurements());
        assertEquals(Optional.empty(), read(record(embedded(MASTER), "\"2 L\"", ADDITION, "")).masterRevision());
    }

    /** The batch size in litres for a finalVolume master, in kilograms of water for a waterMass one. */
    @ParameterizedTest
    @CsvSource({"\"2 L\", 2", "\"500 mL\", 0.5", "'{\"value\": 250, \"unit\": \"mL\"}', 0.25"})
    void theBatchSizeOfAFinalVolumeMasterIsInLitres(String size, double litres) {
        assertEquals(litres, read(record(embedded(MASTER), size, ADDITION, "")).batchSize(), 1e-12);
    }

    @Test
    void theBatchSizeOfAWaterMassMasterIsInKilograms() {
        String salt = "{\"step\": 1, \"substance\": \"sodium chloride\", \"amount\": \"18 g\"}";
        assertEquals(2, read(record(embedded(WATER_MASS_MASTER), "\"2 kg\"", salt, "")).batchSize(), 1e-12);
        assertEquals(0.5, read(record(embedded(WATER_MASS_MASTER), "\"500 g\"", salt, "")).batchSize(), 1e-12);
        Problem p = refused(record(embedded(WATER_MASS_MASTER), "\"2 L\"", salt, ""));
        assertEquals("/batchSize", p.pointer());
        assertTrue(p.message().contains("waterMass basis") && p.message().contains("must be a water mass"), p::message);
    }

    @Test
    void aMassForAFinalVolumeMasterIsRefused() {
        Problem p = refused(record(embedded(MASTER), "\"2 kg\"", ADDITION, ""));
        assertEquals("/batchSize", p.pointer());
        assertTrue(p.message().contains("finalVolume basis") && p.message().contains("must be a volume"), p::message);
    }

    @ParameterizedTest
    @ValueSource(strings = {"0 L", "-1 L"})
    void aBatchSizeOfNothingIsRefused(String size) {
        Problem p = refused(record(embedded(MASTER), "\"" + size + "\"", ADDITION, ""));
        assertEquals("/batchSize", p.pointer());
        assertTrue(p.message().contains("must be greater than zero"), p::message);
    }

    @Test
    void anAdditionWithoutCertificateValuesIsReadAsIs() {
        BatchRecord.Addition a = readAddition("");
        assertEquals(1, a.step());
        assertEquals("sodium acetate anhydrous", a.substance());
        assertEquals(Quantity.parse("1.64 g").base(), a.amount().base(), 1e-15);
        assertEquals(OptionalDouble.empty(), a.stockMolarity());
        assertEquals(Optional.empty(), a.lot());
        assertEquals(OptionalDouble.empty(), a.assay());
        assertEquals(OptionalDouble.empty(), a.water());
        assertFalse(a.assayAsIs());
        assertEquals(BatchRecord.Weighed.AS_IS, a.weighed());
        assertEquals("/additions/0", a.pointer());
    }

    @Test
    void theCertificateValuesOfAnAdditionAreFractions() {
        BatchRecord.Addition a = readAddition(", \"lot\": \"L-7\", \"assay\": \"99.5 %\", \"assayBasis\": \"as-is\","
                + " \"waterContent\": \"0.4 %\", \"weighed\": \"100 %\"");
        assertEquals(Optional.of("L-7"), a.lot());
        assertEquals(0.995, a.assay().getAsDouble(), 1e-12);
        assertTrue(a.assayAsIs());
        assertEquals(0.004, a.water().getAsDouble(), 1e-12);
        assertEquals(BatchRecord.Weighed.PURE, a.weighed());
        BatchRecord.Addition b = readAddition(", \"assayBasis\": \"dried\", \"lossOnDrying\": \"1.5 %\","
                + " \"weighed\": \"anhydrous\"");
        assertFalse(b.assayAsIs());
        assertEquals(0.015, b.water().getAsDouble(), 1e-12);
        assertEquals(BatchRecord.Weighed.ANHYDROUS, b.weighed());
        assertEquals(BatchRecord.Weighed.AS_IS, readAddition(", \"weighed\": \"as-is\"").weighed());
    }

    @Test
    void aVolumeIsReadWithItsStock() {
        String naoh = "{\"step\": 3, \"substance\": \"sodium hydroxide\", \"amount\": \"12.5 mL\","
                + " \"stock\": {\"concentration\": \"0.5 mol/L\"}}";
        BatchRecord.Addition a = read(record(embedded(MASTER), "\"2 L\"", ADDITION + ", " + naoh, "")).additions().get(1);
        assertEquals(3, a.step());
        assertEquals(0.5 * Quantity.parse("1 mol/L").base(), a.stockMolarity().getAsDouble(), 1e-12);
        assertEquals("/additions/1", a.pointer());
        Problem p = refused(record(embedded(MASTER), "\"2 L\"", "{\"step\": 3, \"substance\": \"sodium hydroxide\","
                + " \"amount\": \"12.5 mL\"}", ""));
        assertEquals("/additions/0/amount", p.pointer());
        assertTrue(p.message().contains("needs the stock"), p::message);
    }

    @ParameterizedTest
    @ValueSource(strings = {"0 g", "-1.64 g"})
    void anAdditionOfNothingIsRefused(String amount) {
        Problem p = refused(record(embedded(MASTER), "\"2 L\"", "{\"step\": 1, \"substance\": \"sodium acetate "
                + "anhydrous\", \"amount\": \"" + amount + "\"}", ""));
        assertEquals("/additions/0/amount", p.pointer());
        assertTrue(p.message().contains("greater than zero"), p::message);
    }

    /**
     * An assay is plausible above 50 % and up to 102 %: pharmacopoeial assays on the dried substance are specified as
     * 98.0–102.0 % or 99.0–100.5 % (common practice), so a certificate may well read 100.4 %. (102 % used to be refused
     * by the 0–100 % range of every fraction, before the reader's own range was reached.)
     */
    @ParameterizedTest
    @CsvSource({"50.1 %, true", "100.4 %, true", "102 %, true", "50 %, false", "102.1 %, false"})
    void anAssayIsReadInsideItsPlausibleRangeOnly(String assay, boolean read) {
        String fields = ", \"assay\": \"" + assay + "\"";
        if (read) {
            assertEquals(Quantity.parse(assay).base(), readAddition(fields).assay().getAsDouble(), 1e-12);
        } else {
            Problem p = refusedAddition(fields);
            assertEquals("/additions/0/assay", p.pointer());
            assertTrue(p.message().contains("outside the plausible range (50, 102] %"), p::message);
        }
    }

    @ParameterizedTest
    @CsvSource({"waterContent, 0 %, true", "waterContent, 89.9 %, true", "waterContent, 90 %, false",
                "lossOnDrying, 0 %, true", "lossOnDrying, 90 %, false"})
    void aWaterContentIsReadBelowNinetyPerCentOnly(String field, String water, boolean read) {
        String fields = ", \"" + field + "\": \"" + water + "\"";
        if (read) {
            assertEquals(Quantity.parse(water).base(), readAddition(fields).water().getAsDouble(), 1e-12);
        } else {
            Problem p = refusedAddition(fields);
            assertEquals("/additions/0/" + field, p.pointer());
            assertTrue(p.message().contains("outside the plausible range [0, 90) %"), p::message);
        }
    }

    @Test
    void aControlCharacterInASubstanceNameIsRefusedAtItsPlace() {
        Problem p = refused(record(embedded(MASTER), "\"2 L\"", "{\"step\": 1, \"substance\": \"sodium\\u0007 acetate"
                + "\", \"amount\": \"1 g\"}", ""));
        assertEquals("/additions/0/substance", p.pointer());
    }

    @Test
    void aBadUnitIsRefusedAtItsPlaceAndEveryBadPlaceIsNamed() {
        String bad = "{\"step\": 1, \"substance\": \"sodium acetate anhydrous\", \"amount\": \"1.64 furlongs\"}, "
                + "{\"step\": 2, \"substance\": \"sodium acetate anhydrous\", \"amount\": \"1.64 mol/L\"}";
        DocumentException e = assertThrows(DocumentException.class, () -> read(record(embedded(MASTER), "\"2 L\"", bad,
                "")));
        assertEquals(List.of("/additions/0/amount", "/additions/1/amount"), e.problems().stream().map(Problem::pointer)
                .toList());
    }

    @Test
    void aMeasurementIsReadWithItsTemperatureAndVolume() {
        BatchRecord.Measurement ph = readMeasurement(", \"quantity\": \"pH\", \"value\": 4.7, \"temperature\": "
                + "\"20 Cel\", \"atVolume\": 0.9");
        assertEquals(BatchRecord.Measurement.Kind.PH, ph.kind());
        assertEquals(4.7, ph.value());
        assertEquals(293.15, ph.kelvin().getAsDouble(), 1e-9);
        assertEquals(0.9, ph.atVolume());
        assertEquals(1, ph.step());
        assertEquals("/measurements/0", ph.pointer());
        BatchRecord.Measurement osm = readMeasurement(", \"quantity\": \"osmolality\", \"value\": 290");
        assertEquals(BatchRecord.Measurement.Kind.OSMOLALITY, osm.kind());
        assertEquals(OptionalDouble.empty(), osm.kelvin());
        assertEquals(1, osm.atVolume());
    }

    /** An osmolality above zero and up to 10,000 mOsm/kg is read (saturated salt solutions stay below it). */
    @ParameterizedTest
    @CsvSource({"10000, true", "0.5, true", "0, false", "10000.5, false", "-290, false"})
    void anOsmolalityIsReadInsideItsPlausibleRangeOnly(double value, boolean read) {
        String fields = ", \"quantity\": \"osmolality\", \"value\": " + value;
        if (read) {
            assertEquals(value, readMeasurement(fields).value());
        } else {
            Problem p = refusedMeasurement(fields);
            assertEquals("/measurements/0/value", p.pointer());
            assertTrue(p.message().contains("(0, 10000]"), p::message);
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"-2", "16"})
    void aPhAtTheEdgeOfWhatAMeterDisplaysIsRead(String value) {
        assertEquals(Double.parseDouble(value), readMeasurement(", \"quantity\": \"pH\", \"value\": " + value
                + ", \"temperature\": \"25 Cel\"").value());
    }

    @Test
    void aTemperatureThatIsNoTemperatureIsRefusedAtItsPlace() {
        Problem p = refusedMeasurement(", \"quantity\": \"pH\", \"value\": 7, \"temperature\": \"20 g\"");
        assertEquals("/measurements/0/temperature", p.pointer());
    }

    @Test
    void anEmbeddedMasterThatIsNoFormulationIsRefusedAtItsOwnPlace() {
        String broken = MASTER.replace("\"0.82 g\"", "\"0.82 furlongs\"");
        DocumentException e = assertThrows(DocumentException.class, () -> read(record(embedded(broken), "\"2 L\"",
                ADDITION, "")));
        Problem p = e.problems().get(0);
        assertEquals("/master/formulation/components/0/amount", p.pointer());
        assertTrue(p.message().startsWith("embedded master: "), p::message);
        assertTrue(p.location().isPresent(), "the place in the record's own text");
    }

    /** An embedded master keeps the places of its text in the record, so its own findings point into the record. */
    @Test
    void anEmbeddedMasterKeepsItsPlacesInTheRecord() {
        String json = record(embedded(MASTER), "\"2 L\"", ADDITION, "");
        BatchRecord r = read(json);
        assertEquals(doc(json).locate("/master/formulation/components/0/amount"),
                r.master().document().locate("/components/0/amount"));
        assertTrue(r.master().document().locate("/components/0/amount").isPresent());
    }

    @Test
    void aRecordGivenAsBytesCannotNameAMasterByPath() {
        Problem p = refused(record("{\"path\": \"master.json\"}", "\"2 L\"", ADDITION, ""));
        assertEquals("/master/path", p.pointer());
        assertTrue(p.message().contains("needs the record's folder"), p::message);
    }

    private static Problem refusedPath(Path dir, String path) {
        String json = record("{\"path\": " + quote(path) + "}", "\"2 L\"", ADDITION, "");
        DocumentException e = assertThrows(DocumentException.class, () -> READER.read(doc(json), Optional.of(
                dir.resolve("record.json")), Optional.of(dir)));
        assertEquals(1, e.problems().size(), e.problems()::toString);
        assertEquals("/master/path", e.problems().get(0).pointer());
        return e.problems().get(0);
    }

    private static String quote(String s) {
        return "\"" + s.replace("\\", "\\\\").replace("\u0000", "\\u0000") + "\"";
    }

    @ParameterizedTest
    @ValueSource(strings = {"//host/master.json", "\\\\host\\master.json", "C:master.json", "file:master.json"})
    void aUrlOrADriveIsRefused(String path, @TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("record.json"), "{}");
        assertTrue(refusedPath(dir, path).message().contains("is a URL or a drive"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"/master.json", "\\master.json"})
    void anAbsolutePathIsRefused(String path, @TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("record.json"), "{}");
        assertTrue(refusedPath(dir, path).message().contains("is absolute"));
    }

    @Test
    void aPathTheSystemCannotNameIsRefused(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("record.json"), "{}");
        assertTrue(refusedPath(dir, "mas\u0000ter.json").message().contains("is not a path"));
    }

    @Test
    void aFolderIsNoMaster(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("record.json"), "{}");
        Files.createDirectories(dir.resolve("masters"));
        assertTrue(refusedPath(dir, "masters").message().contains("is not a file"));
    }

    @Test
    void aMasterFileThatIsNoFormulationIsRefusedWithItsFirstProblem(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("record.json"), "{}");
        Files.writeString(dir.resolve("master.json"), MASTER.replace("\"0.82 g\"", "\"0.82 furlongs\""));
        String m = refusedPath(dir, "master.json").message();
        assertTrue(m.contains("is not a valid formulation") && m.contains("/components/0/amount"), m);
    }

    @Test
    void aMasterFileBesideTheRecordIsRead(@TempDir Path dir) throws IOException {
        Files.writeString(dir.resolve("record.json"), "{}");
        Files.writeString(dir.resolve("master.json"), MASTER);
        BatchRecord r = READER.read(doc(record("{\"path\": \"master.json\"}", "\"2 L\"", ADDITION, "")), Optional.of(dir.resolve("record.json")), Optional.of(dir));
        assertEquals("TST-ACE", r.master().id());
    }

    /**
     * The report names the master as the user reaches it, beside the record as the record was named, not by the real
     * path the sandbox resolved it to (which is absolute, and through a link another place).
     */
    @Test
    void theMasterIsNamedBesideTheRecordAsTheRecordWasNamed(@TempDir Path dir) throws IOException {
        Path real = Files.createDirectory(dir.resolve("real"));
        Files.writeString(real.resolve("record.json"), "{}");
        Files.writeString(real.resolve("master.json"), MASTER);
        Path link = Files.createSymbolicLink(dir.resolve("link"), real);
        BatchRecord r = READER.read(doc(record("{\"path\": \"./master.json\"}", "\"2 L\"", ADDITION, "")),
                Optional.of(link.resolve("record.json")), Optional.of(link));
        assertEquals(link.resolve("master.json").toString(), r.master().document().source());
    }

    /** The specification applies from the last addition on, at full volume. */
    @Test
    void aMeasurementIsOfTheFinishedBatchFromTheLastAdditionOnAtFullVolume() {
        BatchRecord r = read(record(embedded(MASTER), "\"2 L\"", ADDITION + ", " + ADDITION.replace("\"step\": 1",
                "\"step\": 3"), ""));
        assertTrue(r.ofFinishedBatch(at(3, 1)));
        assertTrue(r.ofFinishedBatch(at(4, 1)));
        assertFalse(r.ofFinishedBatch(at(2, 1)));
        assertFalse(r.ofFinishedBatch(at(3, 0.9)));
    }

    private static BatchRecord.Measurement at(int step, double atVolume) {
        return new BatchRecord.Measurement(step, BatchRecord.Measurement.Kind.PH, 7, OptionalDouble.of(298.15), atVolume,
                "/measurements/0");
    }
}
