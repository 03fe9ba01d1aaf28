package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.protolyte.api.Format;
import org.protolyte.api.Source;
import org.protolyte.api.Validator;
import org.protolyte.plugin.PluginJars;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * {@code --plugins DIR}: the README's example plugin, built while the tests run, loaded by the command line; its kinds
 * and libraries listed by {@code rules} and named with the jar's SHA-256 in the report, which has the API's bytes.
 */
class PluginsOptionTest {

    private static final Path HEPES = Path.of(System.getProperty("protolyte.projectRoot", "../.."),
            "sample-formulations", "cell-culture-hepes-basal-medium.json");

    @TempDir
    static Path tmp;
    static Path folder;
    static Path jar;
    static Path pack;
    static String sha;

    @BeforeAll
    static void buildTheExamplePlugin() throws Exception {
        folder = tmp.resolve("plugins");
        jar = PluginJars.build(folder.resolve("site-checks.jar"), PluginJars.example(), "");
        pack = Files.writeString(tmp.resolve("site-pack.json"), PluginJars.resource("plugin/site-pack.json"));
        sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(jar)));
    }

    @Test
    void rulesListsThePluginsKindAndTheJarWithItsDigest() {
        MainCommandLineTest.Result r = MainCommandLineTest.run("rules", "--plugins", folder.toString(), "--rules",
                "+" + pack);
        assertEquals(0, r.exitCode(), r.err());
        assertTrue(r.out().contains("plugin " + jar + " SHA-256 " + sha + ": check kinds ph-uncertainty-limit; "
                + "substance libraries site-substances.json"), r.out());
        assertTrue(r.out().lines().anyMatch(l -> l.startsWith("check kinds: ") && l.contains("ph-uncertainty-limit")));
        assertTrue(r.out().contains("site-ph-known"), r.out());
    }

    @Test
    void checkRunsThePluginsRuleAndNamesTheJarWithTheApisBytes() throws Exception {
        MainCommandLineTest.Result r = MainCommandLineTest.run("check", "--plugins", folder.toString(), "--rules",
                "+" + pack, "--format", "json", HEPES.toString());
        assertEquals(1, r.exitCode(), r.err());
        JsonNode json = JsonMapper.builder().build().readTree(r.out());
        assertEquals(sha, json.at("/tool/plugins/0/sha256").asString());
        assertTrue(json.at("/reports/0/findings").toString().contains("\"site-ph-known\""));

        String api = Validator.builder().plugins(folder).rulePack(pack).build().check(Source.of(HEPES))
                .render(Format.JSON);
        assertEquals(withoutTime(api), withoutTime(r.out()), "the command line and the API give the same report");
    }

    private static String withoutTime(String report) {
        return report.replaceAll("\"generatedAt\" : \"[^\"]+\"", "");
    }

    @Test
    void anUnusablePluginFolderIsAUsageErrorNamingIt() throws Exception {
        Path notes = Files.createDirectories(tmp.resolve("with-notes"));
        Files.copy(jar, notes.resolve("site-checks.jar"));
        Files.writeString(notes.resolve("README.txt"), "which jar is which", StandardCharsets.UTF_8);
        MainCommandLineTest.Result r = MainCommandLineTest.run("check", "--plugins", notes.toString(), HEPES.toString());
        assertEquals(2, r.exitCode());
        assertTrue(r.err().contains("protolyte: plugin folder " + notes + " holds 'README.txt', which is not a jar"),
                r.err());
        assertFalse(r.err().contains("\tat "), "no stack trace");
        MainCommandLineTest.Result missing = MainCommandLineTest.run("rules", "--plugins", tmp.resolve("none").toString());
        assertEquals(2, missing.exitCode());
        assertTrue(missing.err().contains("not found"), missing.err());
    }
}
