package org.protolyte.plugin;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;
import java.util.stream.Stream;

/**
 * Builds plugin jars while the tests run: the example plugin of the README (test resources under {@code plugin/}),
 * and variants written by a test. Compiled with the JDK's own compiler against the library on the test class path.
 */
public final class PluginJars {

    /** The example plugin's files, as the README shows its check kind. */
    public static final List<String> EXAMPLE = List.of(
            "org/example/sitechecks/PhUncertaintyLimit.java",
            "org/example/sitechecks/SiteSubstances.java",
            "org/example/sitechecks/site-substances.json",
            "META-INF/services/org.protolyte.spi.CheckKind",
            "META-INF/services/org.protolyte.spi.SubstanceLibrarySource");

    private PluginJars() {
    }

    /** The example plugin's files, read from the test resources. */
    public static Map<String, String> example() throws IOException {
        Map<String, String> files = new LinkedHashMap<>();
        for (String f : EXAMPLE) {
            files.put(f, resource("plugin/" + f));
        }
        return files;
    }

    public static String resource(String name) throws IOException {
        try (InputStream in = PluginJars.class.getClassLoader().getResourceAsStream(name)) {
            if (in == null) {
                throw new IOException("test resource " + name + " is missing");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    /**
     * Compiles the {@code .java} files among {@code files} (path in the jar → content) and writes them, with the other
     * files as they are, into {@code jar}.
     *
     * @param modulePath where non-empty, compiled as a module against it instead of the class path
     */
    public static Path build(Path jar, Map<String, String> files, String modulePath) throws IOException {
        Path work = Files.createTempDirectory("plugin-src");
        Path classes = work.resolve("classes");
        Files.createDirectories(classes);
        List<String> args = new ArrayList<>(List.of("-d", classes.toString(), "--release", "17", "-proc:none"));
        if (modulePath.isEmpty()) {
            args.addAll(List.of("-classpath", System.getProperty("java.class.path")));
        } else {
            args.addAll(List.of("--module-path", modulePath));
        }
        for (Map.Entry<String, String> f : files.entrySet()) {
            Path p = (f.getKey().endsWith(".java") ? work.resolve("src") : classes).resolve(f.getKey());
            Files.createDirectories(p.getParent());
            Files.writeString(p, f.getValue());
            if (f.getKey().endsWith(".java")) {
                args.add(p.toString());
            }
        }
        java.util.spi.ToolProvider javac = java.util.spi.ToolProvider.findFirst("javac").orElseThrow(() ->
                new IllegalStateException("this JDK has no javac"));
        StringWriter messages = new StringWriter();
        java.io.PrintWriter w = new java.io.PrintWriter(messages);
        int rc = javac.run(w, w, args.toArray(String[]::new));
        if (rc != 0) {
            throw new IllegalStateException("the plugin does not compile:\n" + messages);
        }
        Files.createDirectories(jar.toAbsolutePath().getParent());
        try (OutputStream out = Files.newOutputStream(jar); JarOutputStream j = new JarOutputStream(out);
             Stream<Path> all = Files.walk(classes)) {
            for (Path p : all.filter(Files::isRegularFile).sorted().toList()) {
                j.putNextEntry(new JarEntry(classes.relativize(p).toString().replace('\\', '/')));
                j.write(Files.readAllBytes(p));
                j.closeEntry();
            }
        }
        return jar;
    }
}
