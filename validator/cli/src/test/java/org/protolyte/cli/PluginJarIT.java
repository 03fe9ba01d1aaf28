package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.protolyte.plugin.PluginJars;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * {@code java -jar protolyte.jar --plugins DIR}: the self-contained jar loads a site's plugin jar, built while the
 * tests run from the README's example, as a separate process would.
 */
class PluginJarIT {

    @TempDir
    Path work;

    @Test
    void thePackagedJarLoadsAPluginFolder() throws Exception {
        PackagedJar jar = PackagedJar.find();
        Path plugin = PluginJars.build(work.resolve("plugins/site-checks.jar"), PluginJars.example(), "");
        Path pack = Files.writeString(work.resolve("site-pack.json"), PluginJars.resource("plugin/site-pack.json"));
        Files.copy(PackagedJar.ROOT.resolve("sample-formulations/cell-culture-hepes-basal-medium.json"),
                work.resolve("hepes.json"));
        String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(plugin)));

        PackagedJar.Run rules = jar.run(work, 120, List.of(), "rules", "--plugins", "plugins", "--rules", "+site-pack.json");
        assertEquals(0, rules.exitCode(), rules.err());
        String listed = Files.readString(rules.out());
        assertTrue(listed.contains("plugin " + Path.of("plugins", "site-checks.jar") + " SHA-256 " + sha), listed);

        PackagedJar.Run check = jar.run(work, 120, List.of(), "check", "--plugins", "plugins", "--rules",
                "+site-pack.json", "--format", "json", "hepes.json");
        assertEquals(1, check.exitCode(), check.err());
        JsonNode json = JsonMapper.builder().build().readTree(Files.readString(check.out()));
        assertEquals(sha, json.at("/tool/plugins/0/sha256").asString());
        assertTrue(json.at("/reports/0/findings").toString().contains("site-ph-known"), json.toString());
    }
}
