package org.protolyte.plugin;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Where a site's providers come from: a jar on the class path is hashed where it lies; the same jar in a plugin folder
 * is a second origin, loaded from its own copy, and the class path's providers are not counted twice through it.
 */
class PluginsTest {

    @TempDir
    Path tmp;

    private static String sha(Path jar) throws Exception {
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(jar)));
    }

    @Test
    void aJarOnTheClassPathIsNamedAndHashedWhereItLies() throws Exception {
        Path jar = PluginJars.build(tmp.resolve("cp/site-checks.jar"), PluginJars.example(), "");
        try (URLClassLoader classPath = new URLClassLoader(new URL[] {jar.toUri().toURL()},
                PluginsTest.class.getClassLoader())) {
            Plugins found = Plugins.found(Optional.empty(), classPath, PluginsTest.class.getModule());
            assertEquals(List.of(new Plugins.Origin(jar.toString(), Optional.of(sha(jar)),
                    List.of("ph-uncertainty-limit"), List.of("site-substances.json"))), found.origins());
            assertEquals(1, found.kinds().size());
            assertEquals(jar + "!/site-substances.json", found.libraries().get(0).name());
            assertTrue(new String(found.libraries().get(0).content(), java.nio.charset.StandardCharsets.UTF_8)
                    .contains("KC-1"), "the library's bytes as the jar holds them");
            assertEquals(jar + " (SHA-256 " + sha(jar) + ")", found.origins().get(0).describe());

            Path folder = tmp.resolve("plugins");
            Path other = PluginJars.build(folder.resolve("other.jar"), java.util.Map.of(
                    "org/example/other/Other.java", "package org.example.other;\nimport java.util.*;\n"
                            + "import org.protolyte.spi.*;\n@Stateless public final class Other implements "
                            + "CheckKind<Other.P> {\n public record P() {}\n public String id() { return \"site-other\"; }\n"
                            + " public String summary() { return \"other\"; }\n"
                            + " public Class<P> parameters() { return P.class; }\n"
                            + " public List<Violation> check(Analysis a, P p) { return List.of(); }\n}\n",
                    "META-INF/services/org.protolyte.spi.CheckKind", "org.example.other.Other\n"), "");
            Plugins both = Plugins.found(Optional.of(folder), classPath, PluginsTest.class.getModule());
            assertEquals(List.of(jar.toString(), other.toString()), both.origins().stream()
                    .map(Plugins.Origin::location).toList());
            assertEquals(List.of("ph-uncertainty-limit", "site-other"), both.kinds().stream().map(k -> k.kind().id())
                    .toList(), "the folder's loader does not list its parent's providers again");
            assertEquals(other.toString(), both.kinds().get(1).origin().location());

            Path same = Files.createDirectories(tmp.resolve("same"));
            Files.copy(jar, same.resolve("site-checks.jar"));
            Plugins.Unusable e = assertThrows(Plugins.Unusable.class, () -> Plugins.found(Optional.of(same), classPath,
                    PluginsTest.class.getModule()));
            assertEquals(List.of("plugin jar " + same.resolve("site-checks.jar") + " lists providers whose classes the "
                    + "class path already holds (the class path's are used); remove one of the two"), e.problems());
        }
    }

    @Test
    void aFolderOfClassesHasNoDigest() throws Exception {
        Path jar = PluginJars.build(tmp.resolve("cp/site-checks.jar"), PluginJars.example(), "");
        Path classes = Files.createDirectories(tmp.resolve("classes"));
        try (var fs = java.nio.file.FileSystems.newFileSystem(jar)) {
            for (Path root : fs.getRootDirectories()) {
                try (var all = Files.walk(root)) {
                    for (Path p : all.filter(Files::isRegularFile).toList()) {
                        Path target = classes.resolve(root.relativize(p).toString());
                        Files.createDirectories(target.getParent());
                        Files.copy(p, target);
                    }
                }
            }
        }
        try (URLClassLoader classPath = new URLClassLoader(new URL[] {classes.toUri().toURL()},
                PluginsTest.class.getClassLoader())) {
            Plugins found = Plugins.found(Optional.empty(), classPath, PluginsTest.class.getModule());
            assertEquals(Optional.empty(), found.origins().get(0).sha256());
            assertEquals(classes.toString(), found.origins().get(0).location());
            assertEquals(classes.toString(), found.origins().get(0).describe());
        }
    }

    @Test
    void aJarOverTheSizeLimitIsRefusedUnread() throws Exception {
        Path folder = Files.createDirectories(tmp.resolve("big"));
        try (var out = new java.io.RandomAccessFile(folder.resolve("big.jar").toFile(), "rw")) {
            out.setLength(Plugins.MAX_JAR_BYTES + 1);
        }
        Plugins.Unusable e = assertThrows(Plugins.Unusable.class, () -> Plugins.found(Optional.of(folder)));
        assertEquals(List.of("plugin jar " + folder.resolve("big.jar") + " is larger than 64 MiB"), e.problems());
    }
}
