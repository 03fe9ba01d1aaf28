package org.protolyte.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.HexFormat;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.substance.LibraryLoader;

/** The library's API: built once, immutable, thread-safe; plain records out; every configuration problem at once. */
class ValidatorTest {

    private static final Path SAMPLES = Path.of(System.getProperty("protolyte.projectRoot", "../.."),
            "sample-formulations");

    /** The README's example, word for word (ReadmeExampleTest holds the README to it). */
    static Status readmeExample(Path file) throws ConfigurationException {
        // README example begins
        Validator validator = Validator.builder().failOn(Severity.ERROR).build();
        Result result = validator.check(Source.of(file));
        if (result.status() != Status.PASS) {
            System.out.print(result.render(Format.TEXT));
        }
        // README example ends
        return result.status();
    }

    @Test
    void theReadmeExampleRuns() throws ConfigurationException {
        java.io.PrintStream out = System.out;
        java.io.ByteArrayOutputStream printed = new java.io.ByteArrayOutputStream();
        try {
            System.setOut(new java.io.PrintStream(printed, true, StandardCharsets.UTF_8));
            assertEquals(Status.PASS, readmeExample(SAMPLES.resolve("cell-culture-hepes-basal-medium.json")));
            assertEquals("", printed.toString(StandardCharsets.UTF_8), "a pass prints nothing");
            assertEquals(Status.FAIL, readmeExample(SAMPLES.resolve("parenteral-citrate-buffer-off-target.json")));
        } finally {
            System.setOut(out);
        }
        assertTrue(printed.toString(StandardCharsets.UTF_8).contains("[LB-DP-0225]  FAIL"), "a fail prints its report");
    }

    @Test
    void theReadmeShowsTheExampleAsTheTestRunsIt() throws Exception {
        String test = Files.readString(Path.of("src/test/java/org/protolyte/api/ValidatorTest.java"));
        String snippet = test.substring(test.indexOf("// README example begins") + 25, test.indexOf("        // README example ends"));
        String readme = Files.readString(SAMPLES.getParent().resolve("README.md"));
        for (String line : snippet.lines().map(String::strip).filter(l -> !l.isEmpty()).toList()) {
            assertTrue(readme.contains(line), "README lacks the example's line: " + line);
        }
    }

    @Test
    void aResultCarriesWhatTheEngineComputedAsPlainRecords() throws Exception {
        Path file = SAMPLES.resolve("cell-culture-hepes-basal-medium.json");
        Result r = Validator.builder().build().check(Source.of(file));
        DocumentReport direct = new Protolyte(new SchemaCatalog(), LibraryLoader.shipped(new SchemaCatalog())).check(file);
        assertEquals(Status.PASS, r.status());
        assertEquals(0, r.exitCode());
        assertEquals(direct.id(), r.id());
        String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
        assertEquals(sha, r.sha256().orElseThrow(), "the SHA-256 of the bytes, by the JDK's own digest");
        List<ConditionSummary> c = r.conditions();
        assertEquals(direct.analysis().orElseThrow().conditions().size(), c.size());
        for (int i = 0; i < c.size(); i++) {
            var d = direct.analysis().orElseThrow().conditions().get(i);
            assertEquals(d.condition().name(), c.get(i).name());
            assertEquals(d.state().orElseThrow().pH(), c.get(i).pH().orElseThrow(), 1e-12);
            assertEquals(d.bufferCapacityPerLitre() * 1000, c.get(i).bufferCapacity().orElseThrow(), 1e-12);
        }
        assertEquals(direct.findings().size(), r.findings().size());
        assertTrue(r.rulePacks().keySet().stream().anyMatch(p -> p.startsWith("cell-culture")), r.rulePacks().toString());
    }

    @Test
    void everyConfigurationProblemComesBackInOneException() {
        ConfigurationException e = assertThrows(ConfigurationException.class, () -> Validator.builder()
                .substanceLibrary(Path.of("no-such-library.json"))
                .rulePack("site-pack.json", "{\"not\": \"a pack\"}".getBytes(StandardCharsets.UTF_8))
                .onlyRulePacks("no-such-pack")
                .waivers("qa-waivers.json", "[]".getBytes(StandardCharsets.UTF_8))
                .build());
        List<String> p = e.problems();
        assertTrue(p.stream().anyMatch(x -> x.startsWith("substance library no-such-library.json: file not found")), p::toString);
        assertTrue(p.stream().anyMatch(x -> x.startsWith("rule pack site-pack.json")), p::toString);
        assertTrue(p.stream().anyMatch(x -> x.startsWith("unknown rule pack 'no-such-pack'")), p::toString);
        assertTrue(p.stream().anyMatch(x -> x.startsWith("waiver file qa-waivers.json")), p::toString);
    }

    @Test
    void theClockStampsTheReport() throws Exception {
        Instant at = Instant.parse("2026-06-01T08:30:00Z");
        Validator v = Validator.builder().clock(Clock.fixed(at, ZoneOffset.UTC)).build();
        Result r = v.check(Source.of(SAMPLES.resolve("laboratory-tris-buffer-37c.json")));
        assertEquals(at, r.checkedAt());
        assertTrue(r.render(Format.JSON).contains("\"generatedAt\":\"2026-06-01T08:30:00Z\"")
                || r.render(Format.JSON).contains("\"generatedAt\" : \"2026-06-01T08:30:00Z\""), "the JSON's time stamp");
        assertTrue(r.render(Format.HTML).contains("datetime=\"2026-06-01T08:30:00Z\""), "the HTML's time stamp");
    }

    /** One validator from many threads gives what it gives from one, for every sample. */
    @Test
    void oneValidatorServesManyThreads() throws Exception {
        List<Source> sources;
        try (Stream<Path> s = Files.list(SAMPLES)) {
            sources = s.filter(p -> p.toString().endsWith(".json")).sorted().map(Source::of).toList();
        }
        Validator alone = Validator.builder().build();
        List<String> expected = sources.stream().map(x -> alone.check(x).render(Format.JSON)).toList();
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            Instant at = Instant.EPOCH;
            Validator shared = Validator.builder().executor(pool).clock(Clock.fixed(at, ZoneOffset.UTC)).build();
            Validator fixed = Validator.builder().clock(Clock.fixed(at, ZoneOffset.UTC)).build();
            List<String> inOrder = sources.stream().map(x -> fixed.check(x).render(Format.JSON)).toList();
            for (int round = 0; round < 3; round++) {
                List<String> parallel = shared.checkAll(sources).stream().map(x -> x.render(Format.JSON)).toList();
                assertEquals(inOrder, parallel, "round " + round);
            }
        } finally {
            pool.shutdownNow();
        }
        assertEquals(sources.size(), expected.size());
    }

    @Test
    void aBatchRecordReadsItsMasterFromTheSourcesFolderOnly() throws Exception {
        Path record = SAMPLES.resolve("batch-records/br-clean.json");
        Validator v = Validator.builder().build();
        Result inFolder = v.check(Source.of(record));
        assertEquals(Status.PASS, inFolder.status(), () -> inFolder.render(Format.TEXT));
        Result bare = v.check(Source.of("br-clean.json", Files.readAllBytes(record)));
        assertEquals(Status.INVALID, bare.status(), "without a folder the master cannot be read");
        Result named = v.check(Source.of("br-clean.json", Files.readAllBytes(record), record.getParent()));
        assertEquals(Status.PASS, named.status());
    }

    @Test
    void aSourceNeverChanges() {
        byte[] bytes = "{}".getBytes(StandardCharsets.UTF_8);
        Source s = Source.of("x.json", bytes);
        bytes[0] = 'x';
        s.content()[1] = 'y';
        assertEquals("{}", new String(s.content(), StandardCharsets.UTF_8));
    }

    private static final String SITE_PACK = "{\"document\": \"rule-pack\", \"formatVersion\": 1, \"name\": \"site-strict\", "
            + "\"version\": \"1.0.0\", \"extends\": \"general\", \"rules\": [{\"id\": \"pka-near-target\", "
            + "\"severity\": \"error\", \"parameters\": {\"maxDistance\": 0.3}}]}";

    @Test
    void aPackFileReplacesTheChoiceByTheNameItWasAddedUnder(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
        Path pack = Files.writeString(dir.resolve("site-strict.json"), SITE_PACK);
        Result r = Validator.builder().rulePack(pack).onlyRulePacks(pack.toString()).build()
                .check(Source.of(SAMPLES.resolve("cell-culture-hepes-basal-medium.json")));
        assertEquals(List.of("general", "site-strict"), List.copyOf(r.rulePacks().keySet()));
    }

    @Test
    void aShippedPackJoinsTheIntendedUsesChoice() throws Exception {
        Result r = Validator.builder().alsoRulePacks("ophthalmic").build()
                .check(Source.of(SAMPLES.resolve("cell-culture-hepes-basal-medium.json")));
        assertTrue(r.rulePacks().containsKey("cell-culture"), r.rulePacks().toString());
        assertTrue(r.rulePacks().containsKey("ophthalmic"), r.rulePacks().toString());
    }

    @Test
    void aPackJoiningAReplacedChoiceJoinsIt(@org.junit.jupiter.api.io.TempDir Path dir) throws Exception {
        Path pack = Files.writeString(dir.resolve("site-strict.json"), SITE_PACK);
        Result r = Validator.builder().rulePack(pack).onlyRulePacks("parenteral").alsoRulePacks(pack.toString()).build()
                .check(Source.of(SAMPLES.resolve("cell-culture-hepes-basal-medium.json")));
        assertTrue(r.rulePacks().containsKey("parenteral"), r.rulePacks().toString());
        assertTrue(r.rulePacks().containsKey("site-strict"), r.rulePacks().toString());
        assertTrue(!r.rulePacks().containsKey("cell-culture"), r.rulePacks().toString());
    }

    @Test
    void anUnknownJoiningPackIsAConfigurationProblem() {
        ConfigurationException e = assertThrows(ConfigurationException.class,
                () -> Validator.builder().alsoRulePacks("no-such-pack").build());
        assertEquals(1, e.problems().size(), e.problems()::toString);
        assertTrue(e.problems().get(0).startsWith("unknown rule pack 'no-such-pack': not shipped ("), e::getMessage);
    }

    @Test
    void aResultsConditionsAreInTheUnitsTheirRecordStates() throws Exception {
        Path file = SAMPLES.resolve("cell-culture-hepes-basal-medium.json");
        Result r = Validator.builder().build().check(Source.of(file));
        DocumentReport direct = new Protolyte(new SchemaCatalog(), LibraryLoader.shipped(new SchemaCatalog())).check(file);
        assertEquals(file.toString(), r.source());
        for (int i = 0; i < r.conditions().size(); i++) {
            var d = direct.analysis().orElseThrow().conditions().get(i);
            ConditionSummary c = r.conditions().get(i);
            assertTrue(c.determinate());
            assertEquals(d.condition().kelvin() - 273.15, c.temperature(), 1e-9, "°C");
            assertEquals(d.state().orElseThrow().osmolality() * 1000, c.osmolality().orElseThrow(), 1e-9, "mOsm/kg");
            assertEquals(d.state().orElseThrow().ionicStrength(), c.ionicStrength().orElseThrow(), 0);
            assertEquals(d.uncertainty().orElseThrow().pH(), c.pHUncertainty().orElseThrow(), 0);
        }
        // the sample states its conditions at 22, 4 and 37 °C (the document)
        assertEquals(List.of(22.0, 4.0, 37.0), r.conditions().stream().map(c -> Math.rint(c.temperature() * 10) / 10)
                .toList());
    }

    @Test
    void anIndeterminateConditionKeepsItsTemperatureAndNothingElse() throws Exception {
        byte[] doc = ("{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"FRZ-1\", \"basis\": "
                + "{\"finalVolume\": \"1 L\"}, \"components\": [{\"substance\": \"sodium chloride\", \"amount\": "
                + "\"10 mmol/L\"}], \"conditions\": [{\"name\": \"frozen\", \"temperature\": \"-20 Cel\"}]}")
                .getBytes(StandardCharsets.UTF_8);
        Result r = Validator.builder().build().check(Source.of("frozen.json", doc));
        assertEquals(Status.INDETERMINATE, r.status());
        assertEquals(3, r.exitCode());
        ConditionSummary c = r.conditions().get(0);
        assertEquals(-20.0, c.temperature(), 1e-9);
        assertTrue(!c.determinate() && c.pH().isEmpty() && c.osmolality().isEmpty() && c.bufferCapacity().isEmpty());
    }

    @Test
    void theExitCodesAreTheCommandLines() {
        assertEquals(List.of(0, 1, 2, 3, 4), List.of(Status.PASS.exitCode(), Status.FAIL.exitCode(),
                Status.INVALID.exitCode(), Status.INDETERMINATE.exitCode(), Status.FAULT.exitCode()));
    }

    @Test
    void aConfigurationExceptionsMessageNamesEveryProblem() {
        assertEquals("one", new ConfigurationException(List.of("one")).getMessage());
        assertEquals("2 problems: one; two", new ConfigurationException(List.of("one", "two")).getMessage());
    }
}
