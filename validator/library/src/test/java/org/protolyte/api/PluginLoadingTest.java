package org.protolyte.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.protolyte.plugin.PluginJars;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * A site's plugin jar, built while the tests run from the README's example, loaded through the API: its check kind
 * judges documents with parameters bound at pack load, its substance library resolves names, and every report names
 * the jar with its SHA-256. Every way a plugin or its pack can be unusable is refused at build time, naming the place.
 */
class PluginLoadingTest {

    private static final Path SAMPLES = Path.of(System.getProperty("protolyte.projectRoot", "../.."),
            "sample-formulations");
    private static final Path HEPES = SAMPLES.resolve("cell-culture-hepes-basal-medium.json");

    @TempDir
    static Path tmp;
    static Path folder;
    static Path jar;
    static byte[] pack;

    @BeforeAll
    static void buildTheExamplePlugin() throws Exception {
        folder = tmp.resolve("plugins");
        jar = PluginJars.build(folder.resolve("site-checks.jar"), PluginJars.example(), "");
        pack = PluginJars.resource("plugin/site-pack.json").getBytes(StandardCharsets.UTF_8);
    }

    private static byte[] pack(String parameters) {
        return new String(pack, StandardCharsets.UTF_8).replace("\"parameters\": { \"max\": 0.0001 }",
                "\"parameters\": " + parameters).getBytes(StandardCharsets.UTF_8);
    }

    @Test
    void theExamplePluginJudgesAndIsNamedWithItsDigest() throws Exception {
        Validator v = Validator.builder().plugins(folder).rulePack("site-pack.json", pack).build();
        String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(jar)));
        assertEquals(List.of(new Plugin(jar.toString(), java.util.Optional.of(sha), List.of("ph-uncertainty-limit"),
                List.of("site-substances.json"))), v.plugins(), "the JDK's own digest of the jar's bytes");
        assertTrue(v.rules().stream().anyMatch(r -> r.id().equals("site-ph-known") && r.pack().equals("site-release")));

        Result r = v.check(Source.of(HEPES));
        List<Finding> site = r.findings().stream().filter(f -> f.rule().equals("site-ph-known")).toList();
        List<ConditionSummary> above = r.conditions().stream()
                .filter(c -> c.pHUncertainty().orElse(0) > 0.0001).toList();
        assertFalse(above.isEmpty(), "the sample has a condition whose ± is above 0.0001: " + r.conditions());
        assertEquals(above.size(), site.size(), "one finding per condition above the limit: " + site);
        assertEquals(Status.FAIL, r.status(), "an error of a site's rule fails the document");
        for (int i = 0; i < site.size(); i++) {
            ConditionSummary c = above.get(i);
            assertEquals(String.format(java.util.Locale.ROOT, "pH at %s is %.2f ± %.3f; limit ± %.3f", c.name(),
                    c.pH().getAsDouble(), c.pHUncertainty().getAsDouble(), 0.0001), site.get(i).message());
            assertTrue(site.get(i).pointer().orElseThrow().startsWith("/conditions/"), site.get(i).pointer()::toString);
            assertTrue(site.get(i).line().isPresent(), "placed in the file");
        }

        JsonNode json = JsonMapper.builder().build().readTree(r.render(Format.JSON));
        JsonNode listed = json.at("/tool/plugins/0");
        assertEquals(jar.toString(), listed.get("location").asString());
        assertEquals(sha, listed.get("sha256").asString());
        assertEquals("ph-uncertainty-limit", listed.at("/checkKinds/0").asString());
        assertTrue(r.render(Format.TEXT).replaceAll("\\s+", " ").contains("plugin " + jar + " SHA-256 " + sha
                + ": check kinds ph-uncertainty-limit; substance libraries site-substances.json"), r.render(Format.TEXT));
        assertTrue(r.render(Format.SARIF).contains("\"sha256\" : \"" + sha + "\""));
        assertTrue(r.render(Format.HTML).contains(sha));
    }

    @Test
    void theReadmeShowsTheExamplePluginsCheckKindAsTheTestsBuildIt() throws Exception {
        String source = PluginJars.resource("plugin/org/example/sitechecks/PhUncertaintyLimit.java");
        String shown = source.substring(source.indexOf("@Stateless"));
        String readme = Files.readString(SAMPLES.getParent().resolve("README.md"));
        assertTrue(readme.contains("```java\n" + shown + "```"), "README shows the check kind from @Stateless on");
        for (String file : List.of("PluginLoadingTest", "PluginsOptionTest", "PluginJarIT", "ModulePathTest")) {
            assertTrue(readme.contains("`" + file + "`"), "README names the test " + file);
        }
    }

    @Test
    void aWideLimitKeepsTheSameDocumentQuiet() throws Exception {
        Validator v = Validator.builder().plugins(folder).rulePack("site-pack.json", pack("{ \"max\": 0.5 }")).build();
        Result r = v.check(Source.of(HEPES));
        assertTrue(r.findings().stream().noneMatch(f -> f.rule().equals("site-ph-known")), r.findings().toString());
        assertEquals(Status.PASS, r.status());
    }

    @Test
    void theRuleJudgesOnlyTheConditionItNames() throws Exception {
        Result all = Validator.builder().plugins(folder).rulePack("site-pack.json", pack("{ \"max\": 0.00001 }"))
                .build().check(Source.of(HEPES));
        List<Finding> every = all.findings().stream().filter(f -> f.rule().equals("site-ph-known")).toList();
        assertTrue(every.size() > 1, "several conditions above 0.00001: " + every);
        String one = every.get(every.size() - 1).message().split(" ")[2];
        Result named = Validator.builder().plugins(folder).rulePack("site-pack.json",
                pack("{ \"max\": 0.00001, \"condition\": \"" + one + "\" }")).build().check(Source.of(HEPES));
        List<Finding> after = named.findings().stream().filter(f -> f.rule().equals("site-ph-known")).toList();
        assertEquals(List.of(every.get(every.size() - 1)), after, "the named condition's finding alone");
    }

    @Test
    void thePluginsSubstanceLibraryResolvesItsNames() throws Exception {
        byte[] doc = ("{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"PLUG-1\", \"basis\": {"
                + "\"finalVolume\": \"1 L\"}, \"components\": [{\"substance\": \"acetic acid\", \"amount\": \"50 mmol/L\"},"
                + "{\"substance\": \"sodium acetate anhydrous\", \"amount\": \"50 mmol/L\"},"
                + "{\"substance\": \"KC-1\", \"amount\": \"2 g\"}], \"targets\": {\"pH\": {\"value\": 4.7, "
                + "\"tolerance\": 0.5, \"temperature\": \"25 Cel\"}}}").getBytes(StandardCharsets.UTF_8);
        assertEquals(Status.INVALID, Validator.builder().build().check(Source.of("plug.json", doc)).status(),
                "without the plugin the name is unknown");
        Result r = Validator.builder().plugins(folder).build().check(Source.of("plug.json", doc));
        assertTrue(r.status() == Status.PASS || r.status() == Status.FAIL, r.render(Format.TEXT));
        JsonNode json = JsonMapper.builder().build().readTree(r.render(Format.JSON));
        assertTrue(json.at("/tool/substanceLibrary").toString().contains(jar + "!/site-substances.json"),
                json.at("/tool/substanceLibrary").toString());
    }

    @Test
    void parametersThatDoNotFitTheRecordAreRefusedAtPackLoadWithThePlace() {
        Map<String, String> cases = new LinkedHashMap<>();
        cases.put("{ \"max\": -1 }", "/rules/0/parameters (line 15, column 7): check kind 'ph-uncertainty-limit' "
                + "refuses these parameters: max is a positive number of pH units, not -1.0");
        cases.put("{ \"max\": \"small\" }", "/rules/0/parameters/max (line 15, column 23): check kind "
                + "'ph-uncertainty-limit': parameter 'max' is a number, not \"small\"");
        cases.put("{ \"mx\": 0.1 }", "/rules/0/parameters/mx (line 15, column 23): check kind 'ph-uncertainty-limit' "
                + "takes no parameter 'mx'; it takes: max, condition");
        cases.put("{ }", "/rules/0/parameters (line 15, column 7): check kind 'ph-uncertainty-limit': parameter 'max' "
                + "is needed");
        cases.put("{ \"max\": 0.1, \"condition\": 7 }", "/rules/0/parameters/condition (line 15, column 35): "
                + "check kind 'ph-uncertainty-limit': parameter 'condition' is a string, not 7");
        cases.forEach((parameters, expected) -> {
            ConfigurationException e = assertThrows(ConfigurationException.class, () -> Validator.builder()
                    .plugins(folder).rulePack("site-pack.json", pack(parameters)).build(), parameters);
            assertTrue(e.problems().stream().anyMatch(p -> p.contains(expected)), parameters + " → " + e.problems());
        });
    }

    @Test
    void aPackNamingThePluginsKindWithoutThePluginIsRefused() {
        ConfigurationException e = assertThrows(ConfigurationException.class, () -> Validator.builder()
                .rulePack("site-pack.json", pack).build());
        assertTrue(e.problems().toString().contains("unknown check kind 'ph-uncertainty-limit'"), e.problems()::toString);
    }

    /** A one-class plugin whose check kind is written by the test. */
    private static Path variant(String name, String body) throws Exception {
        Map<String, String> files = new LinkedHashMap<>();
        files.put("org/example/bad/Kind.java", "package org.example.bad;\n"
                + "import java.util.*;\nimport org.protolyte.spi.*;\n" + body);
        files.put("META-INF/services/org.protolyte.spi.CheckKind", "org.example.bad.Kind\n");
        Path dir = tmp.resolve(name);
        PluginJars.build(dir.resolve(name + ".jar"), files, "");
        return dir;
    }

    private static final String KIND = "public final class Kind implements CheckKind<Kind.P> {\n"
            + "  public record P(OptionalDouble max) {}\n"
            + "  public String id() { return \"%s\"; }\n"
            + "  public String summary() { return \"test\"; }\n"
            + "  public Class<P> parameters() { return P.class; }\n"
            + "  public List<Violation> check(Analysis a, P p) { %s }\n%s}\n";

    private static List<String> refused(Path dir) {
        return assertThrows(ConfigurationException.class, () -> Validator.builder().plugins(dir).build()).problems();
    }

    @Test
    void aKindThatDoesNotDeclareItselfStatelessIsRefused() throws Exception {
        Path dir = variant("unmarked", String.format(KIND, "site-unmarked", "return List.of();", ""));
        assertTrue(refused(dir).toString().contains("does not declare itself @Stateless"), refused(dir)::toString);
    }

    @Test
    void aStatelessKindWithAFieldThatChangesIsRefused() throws Exception {
        Path dir = variant("counting", "@Stateless " + String.format(KIND, "site-counting", "calls++; return List.of();",
                "  private int calls;\n"));
        assertTrue(refused(dir).toString().contains("its field 'calls' is not final"), refused(dir)::toString);
    }

    @Test
    void aKindNamedAsAShippedOneIsRefused() throws Exception {
        Path dir = variant("twin", "@Stateless " + String.format(KIND, "ionic-strength-limit", "return List.of();", ""));
        assertTrue(refused(dir).toString().contains("two check kinds are named 'ionic-strength-limit': shipped and "),
                refused(dir)::toString);
    }

    @Test
    void aParameterRecordAPackCannotFillIsRefused() throws Exception {
        Path dir = variant("mapped", "@Stateless " + String.format(KIND, "site-mapped", "return List.of();", "")
                .replace("record P(OptionalDouble max)", "record P(Map<String, Double> max)"));
        assertTrue(refused(dir).toString().contains("component 'max' is a java.util.Map<java.lang.String, "
                + "java.lang.Double>, which a rule pack cannot give"), refused(dir)::toString);
    }

    @Test
    void aKindThatThrowsWhenAskedWhatItIsIsAConfigurationProblem() throws Exception {
        Path dir = variant("broken-declaration", "@Stateless " + String.format(KIND, "site-broken", "return List.of();",
                "").replace("public Class<P> parameters() { return P.class; }",
                "public Class<P> parameters() { throw new IllegalStateException(\"no record today\"); }"));
        assertTrue(refused(dir).toString().contains("check kind org.example.bad.Kind (" + dir.resolve(
                "broken-declaration.jar")), refused(dir)::toString);
        assertTrue(refused(dir).toString().contains("cannot be used: java.lang.IllegalStateException: no record today"),
                refused(dir)::toString);
    }

    @Test
    void aKindThatThrowsLeavesTheDocumentIndeterminateNeverPassed() throws Exception {
        Path dir = variant("throwing", "@Stateless " + String.format(KIND, "site-throwing",
                "throw new IllegalStateException(\"broken on purpose\");", ""));
        byte[] throwingPack = new String(pack, StandardCharsets.UTF_8).replace("ph-uncertainty-limit", "site-throwing")
                .replace("{ \"max\": 0.0001 }", "{ }").getBytes(StandardCharsets.UTF_8);
        Result r = Validator.builder().plugins(dir).rulePack("site-pack.json", throwingPack).build()
                .check(Source.of(HEPES));
        assertEquals(Status.INDETERMINATE, r.status());
        assertTrue(r.diagnostics().stream().anyMatch(d -> d.code().equals("rule-not-judged")
                && d.message().contains("check kind 'site-throwing' from " + dir.resolve("throwing.jar"))
                && d.message().contains("broken on purpose")), r.diagnostics()::toString);
    }

    @Test
    void theParametersAreBoundOnceAtPackLoadNotPerDocument() throws Exception {
        Path dir = variant("binding", "@Stateless " + String.format(KIND, "site-binding", "return List.of();", "")
                .replace("record P(OptionalDouble max) {}", "record P(OptionalDouble max) { public P { "
                        + "System.setProperty(\"protolyte.test.bound\", String.valueOf(Integer.getInteger("
                        + "\"protolyte.test.bound\", 0) + 1)); } }"));
        byte[] bindingPack = new String(pack, StandardCharsets.UTF_8).replace("ph-uncertainty-limit", "site-binding")
                .getBytes(StandardCharsets.UTF_8);
        System.clearProperty("protolyte.test.bound");
        Validator v = Validator.builder().plugins(dir).rulePack("site-pack.json", bindingPack).build();
        int atLoad = Integer.getInteger("protolyte.test.bound", 0);
        assertTrue(atLoad >= 1, "bound when the pack was loaded");
        for (int i = 0; i < 3; i++) {
            v.check(Source.of(HEPES));
        }
        assertTrue(Integer.getInteger("protolyte.test.bound") <= atLoad + 1,
                "bound at most once more, for the document's selection, and not per document: "
                        + System.getProperty("protolyte.test.bound"));
        System.clearProperty("protolyte.test.bound");
    }

    @Test
    void aPluginFolderHoldsUsableJarsOnly() throws Exception {
        Path mixed = tmp.resolve("mixed");
        Files.createDirectories(mixed);
        Files.copy(jar, mixed.resolve("site-checks.jar"));
        Files.writeString(mixed.resolve("notes.txt"), "not a jar");
        assertTrue(refused(mixed).toString().contains("holds 'notes.txt', which is not a jar"), refused(mixed)::toString);

        Path idle = tmp.resolve("idle");
        PluginJars.build(idle.resolve("idle.jar"), Map.of("org/example/idle/Nothing.java",
                "package org.example.idle; public final class Nothing {}"), "");
        assertTrue(refused(idle).toString().contains("plugin jar " + idle.resolve("idle.jar")
                + " provides no check kind and no substance library"), refused(idle)::toString);

        Path empty = Files.createDirectories(tmp.resolve("empty"));
        assertTrue(refused(empty).toString().contains("holds no jar"), refused(empty)::toString);
        assertTrue(refused(tmp.resolve("absent")).toString().contains("not found"));
        assertTrue(refused(jar).toString().contains("is a file, not a folder"));
    }
}
