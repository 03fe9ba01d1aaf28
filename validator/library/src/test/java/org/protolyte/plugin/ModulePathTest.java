package org.protolyte.plugin;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The library on the module path, as a modular application uses it: the example plugin built as a module
 * ({@code provides org.protolyte.spi.CheckKind}) is found by the library's {@code uses} clause, without a plugin folder,
 * in a separate JVM started with {@code --module-path}. A small application module drives it through the API.
 */
class ModulePathTest {

    /** The library's own dependencies among the test class path's jars. */
    private static final String RUNTIME = "(jackson-|json-schema-validator-|itu-|commons-math3-|slf4j-api-|snakeyaml-"
            + "|joni-|jcodings-).*\\.jar";

    @TempDir
    Path tmp;

    @Test
    void aPluginModuleIsFoundThroughTheLibrarysUsesClause() throws Exception {
        List<String> path = new ArrayList<>(List.of(Path.of("target", "classes").toAbsolutePath().toString()));
        for (String e : System.getProperty("java.class.path").split(File.pathSeparator)) {
            if (Path.of(e).getFileName().toString().matches(RUNTIME)) {
                path.add(e);
            }
        }
        String modulePath = String.join(File.pathSeparator, path);
        Map<String, String> plugin = new LinkedHashMap<>(PluginJars.example());
        plugin.put("module-info.java", PluginJars.resource("plugin/module-info.java"));
        Path pluginJar = PluginJars.build(tmp.resolve("mods/site-checks.jar"), plugin, modulePath);

        Map<String, String> app = new LinkedHashMap<>();
        app.put("module-info.java", "module org.example.app { requires org.protolyte.library; }");
        app.put("org/example/app/Main.java", """
                package org.example.app;

                import java.nio.file.Files;
                import java.nio.file.Path;
                import org.protolyte.api.*;

                public final class Main {
                    public static void main(String[] args) throws Exception {
                        Validator v = Validator.builder().rulePack(Path.of(args[0])).build();
                        for (Plugin p : v.plugins()) {
                            System.out.println("plugin " + p.location() + " " + p.sha256().orElse("-") + " "
                                    + p.checkKinds() + " " + p.substanceLibraries());
                        }
                        Result r = v.check(Source.of(Path.of(args[1])));
                        System.out.println("status " + r.status());
                        r.findings().stream().filter(f -> f.rule().equals("site-ph-known"))
                                .forEach(f -> System.out.println("finding " + f.message()));
                    }
                }
                """);
        Path appJar = PluginJars.build(tmp.resolve("mods/app.jar"), app, modulePath);
        Path pack = Files.writeString(tmp.resolve("site-pack.json"), PluginJars.resource("plugin/site-pack.json"));
        Path sample = Path.of(System.getProperty("protolyte.projectRoot", "../.."), "sample-formulations",
                "cell-culture-hepes-basal-medium.json");

        Path launcher = Path.of(System.getProperty("java.home"), "bin", "java");
        Process p = new ProcessBuilder(launcher.toString(), "--module-path", modulePath + File.pathSeparator + pluginJar
                + File.pathSeparator + appJar, "-m", "org.example.app/org.example.app.Main", pack.toString(),
                sample.toString()).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(120, TimeUnit.SECONDS), "the application finished");
        assertEquals(0, p.exitValue(), out);
        String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(pluginJar)));
        assertTrue(out.contains("plugin " + pluginJar + " " + sha + " [ph-uncertainty-limit] [site-substances.json]"),
                out);
        assertTrue(out.contains("status FAIL"), out);
        assertTrue(out.lines().anyMatch(l -> l.startsWith("finding pH at ")), out);
    }
}
