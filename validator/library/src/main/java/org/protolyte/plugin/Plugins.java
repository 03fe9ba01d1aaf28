package org.protolyte.plugin;

import java.io.IOException;
import java.io.InputStream;
import java.net.URISyntaxException;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.CodeSource;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.ServiceConfigurationError;
import java.util.ServiceLoader;
import java.util.stream.Stream;

import org.protolyte.document.Digests;
import org.protolyte.spi.CheckKind;
import org.protolyte.spi.SubstanceLibrarySource;

/**
 * A site's check kinds and substance libraries: those on the class path or the module path, and those in the jars of a
 * plugin folder. Each jar is read once, hashed, and loaded from a private copy of the bytes that were hashed, so that
 * what a report names is what ran.
 */
public final class Plugins {

    /** Largest plugin jar read. */
    static final long MAX_JAR_BYTES = 64L * 1024 * 1024;

    /**
     * Where providers came from: a jar with its SHA-256, or a folder of classes (no digest), and what it gave.
     *
     * @param location the jar's path (in a plugin folder: the folder as named, and the jar's name), or the folder's
     */
    public record Origin(String location, Optional<String> sha256, List<String> checkKinds,
                         List<String> substanceLibraries) {
        public Origin {
            checkKinds = List.copyOf(checkKinds);
            substanceLibraries = List.copyOf(substanceLibraries);
        }

        /** "site-checks.jar (SHA-256 ab12…)" for messages. */
        public String describe() {
            return location + sha256.map(s -> " (SHA-256 " + s + ")").orElse("");
        }
    }

    /** A site's check kind and where it came from. */
    public record Kind(CheckKind<?> kind, Origin origin) {
    }

    /** A substance library a plugin carries: the name reports give it, and its bytes. */
    public record Library(String name, byte[] content, Origin origin) {
    }

    /** A plugin folder or jar that cannot be used; every problem, each naming its file. */
    public static final class Unusable extends Exception {
        private static final long serialVersionUID = 1L;
        private final List<String> problems;

        public Unusable(List<String> problems) {
            super(String.join("; ", problems));
            this.problems = List.copyOf(problems);
        }

        public List<String> problems() {
            return problems;
        }
    }

    private final List<Origin> origins;
    private final List<Kind> kinds;
    private final List<Library> libraries;

    private Plugins(List<Origin> origins, List<Kind> kinds, List<Library> libraries) {
        this.origins = List.copyOf(origins);
        this.kinds = List.copyOf(kinds);
        this.libraries = List.copyOf(libraries);
    }

    /** What the class path or the module path provides. */
    public static Plugins found() throws Unusable {
        return found(Optional.empty());
    }

    /**
     * What the class path or the module path provides, and every jar directly in {@code folder}. The folder holds jars
     * only: any other entry, a jar that provides nothing, or an empty folder is refused, never passed over.
     */
    public static Plugins found(Optional<Path> folder) throws Unusable {
        return found(folder, Plugins.class.getClassLoader(), Plugins.class.getModule());
    }

    /** As {@link #found(Optional)}, with {@code own} standing for the class path (and {@code module} for the library). */
    static Plugins found(Optional<Path> folder, ClassLoader own, Module module) throws Unusable {
        List<String> problems = new ArrayList<>();
        Map<Path, Origin> byCopy = new LinkedHashMap<>();   // private copy -> the jar it copies
        if (folder.isPresent()) {
            copy(folder.get(), byCopy, problems);
        }
        List<ServiceLoader.Provider<CheckKind>> kindProviders = new ArrayList<>();
        List<ServiceLoader.Provider<SubstanceLibrarySource>> libraryProviders = new ArrayList<>();
        try {
            if (module.isNamed() && module.getLayer() != null) {
                ServiceLoader.load(module.getLayer(), CheckKind.class).stream().forEach(kindProviders::add);
                ServiceLoader.load(module.getLayer(), SubstanceLibrarySource.class).stream()
                        .forEach(libraryProviders::add);
            } else {
                ServiceLoader.load(CheckKind.class, own).stream().forEach(kindProviders::add);
                ServiceLoader.load(SubstanceLibrarySource.class, own).stream().forEach(libraryProviders::add);
            }
            if (!byCopy.isEmpty()) {
                URL[] urls = byCopy.keySet().stream().map(Plugins::url).toArray(URL[]::new);
                // stays open for the life of the validator: its classes judge every document
                URLClassLoader loader = new URLClassLoader("protolyte-plugins", urls, own);
                ServiceLoader.load(CheckKind.class, loader).stream().filter(p -> p.type().getClassLoader() == loader)
                        .forEach(kindProviders::add);
                ServiceLoader.load(SubstanceLibrarySource.class, loader).stream()
                        .filter(p -> p.type().getClassLoader() == loader).forEach(libraryProviders::add);
            }
        } catch (ServiceConfigurationError e) {
            problems.add("a plugin's provider list cannot be read: " + e.getMessage());
        }
        Map<String, Origin> origins = new LinkedHashMap<>();
        Map<String, List<String>> kindNames = new LinkedHashMap<>();
        Map<String, List<String>> libraryNames = new LinkedHashMap<>();
        List<Map.Entry<String, CheckKind<?>>> kinds = new ArrayList<>();
        List<Map.Entry<String, Map.Entry<String, byte[]>>> libraries = new ArrayList<>();
        for (ServiceLoader.Provider<CheckKind> p : kindProviders) {
            String at = where(p.type(), byCopy, origins, problems);
            try {
                CheckKind<?> k = p.get();
                kinds.add(Map.entry(at, k));
                kindNames.computeIfAbsent(at, x -> new ArrayList<>()).add(k.id());
            } catch (ServiceConfigurationError | RuntimeException | LinkageError e) {
                problems.add("check kind " + p.type().getName() + " in " + at + " cannot be created: " + e);
            }
        }
        for (ServiceLoader.Provider<SubstanceLibrarySource> p : libraryProviders) {
            String at = where(p.type(), byCopy, origins, problems);
            try {
                SubstanceLibrarySource s = p.get();
                byte[] bytes;
                try (InputStream in = s.open()) {
                    bytes = in.readNBytes((int) MAX_JAR_BYTES + 1);
                }
                if (bytes.length > MAX_JAR_BYTES) {
                    problems.add("substance library " + s.name() + " in " + at + " is larger than 64 MiB");
                    continue;
                }
                libraries.add(Map.entry(at, Map.entry(s.name(), bytes)));
                libraryNames.computeIfAbsent(at, x -> new ArrayList<>()).add(s.name());
            } catch (IOException | ServiceConfigurationError | RuntimeException | LinkageError e) {
                problems.add("substance library " + p.type().getName() + " in " + at + " cannot be read: " + e);
            }
        }
        for (Map.Entry<Path, Origin> c : byCopy.entrySet()) {
            String at = c.getValue().location();
            if (!kindNames.containsKey(at) && !libraryNames.containsKey(at)) {
                problems.add("plugin jar " + at + (listsProviders(c.getKey())
                        ? " lists providers whose classes the class path already holds (the class path's are used); "
                        + "remove one of the two"
                        : " provides no check kind and no substance library (a jar lists its providers in "
                        + "META-INF/services/" + CheckKind.class.getName() + " or "
                        + SubstanceLibrarySource.class.getName() + ")"));
            }
        }
        if (!problems.isEmpty()) {
            throw new Unusable(problems);
        }
        Map<String, Origin> complete = new LinkedHashMap<>();
        origins.forEach((at, o) -> complete.put(at, new Origin(o.location(), o.sha256(),
                kindNames.getOrDefault(at, List.of()), libraryNames.getOrDefault(at, List.of()))));
        return new Plugins(List.copyOf(complete.values()),
                kinds.stream().map(e -> new Kind(e.getValue(), complete.get(e.getKey()))).toList(),
                libraries.stream().map(e -> new Library(e.getKey() + "!/" + e.getValue().getKey(),
                        e.getValue().getValue(), complete.get(e.getKey()))).toList());
    }

    /** Every place providers came from, in the order found, with what each gave. */
    public List<Origin> origins() {
        return origins;
    }

    public List<Kind> kinds() {
        return kinds;
    }

    public List<Library> libraries() {
        return libraries;
    }

    private static void copy(Path folder, Map<Path, Origin> byCopy, List<String> problems) {
        if (!Files.isDirectory(folder)) {
            problems.add("plugin folder " + folder + ": " + (Files.exists(folder) ? "is a file, not a folder"
                    : "not found"));
            return;
        }
        List<Path> entries;
        try (Stream<Path> s = Files.list(folder)) {
            entries = s.sorted().toList();
        } catch (IOException e) {
            problems.add("plugin folder " + folder + " cannot be listed: " + e.getMessage());
            return;
        }
        for (Path p : entries) {
            String name = p.getFileName().toString();
            if (!name.endsWith(".jar") || !Files.isRegularFile(p)) {
                problems.add("plugin folder " + folder + " holds '" + name + "', which is not a jar; the folder holds "
                        + "plugin jars only (move it out)");
                continue;
            }
            try {
                if (Files.size(p) > MAX_JAR_BYTES) {
                    problems.add("plugin jar " + p + " is larger than 64 MiB");
                    continue;
                }
                byte[] bytes = Files.readAllBytes(p);
                Path copy = Files.createTempFile("protolyte-plugin-", ".jar");
                copy.toFile().deleteOnExit();
                Files.write(copy, bytes);
                byCopy.put(copy, new Origin(p.toString(), Optional.of(Digests.sha256(bytes)), List.of(), List.of()));
            } catch (IOException e) {
                problems.add("plugin jar " + p + " cannot be read: " + e.getMessage());
            }
        }
        if (entries.isEmpty()) {
            problems.add("plugin folder " + folder + " holds no jar");
        }
    }

    /** The jar has a provider list for either service. */
    private static boolean listsProviders(Path jar) {
        try (java.util.jar.JarFile j = new java.util.jar.JarFile(jar.toFile())) {
            return j.getEntry("META-INF/services/" + CheckKind.class.getName()) != null
                    || j.getEntry("META-INF/services/" + SubstanceLibrarySource.class.getName()) != null;
        } catch (IOException e) {
            return false;   // caught: not a readable jar, so it lists nothing; the message says it provides nothing
        }
    }

    private static URL url(Path p) {
        try {
            return p.toUri().toURL();
        } catch (java.net.MalformedURLException e) {
            throw new IllegalStateException("a temporary file has no URL: " + p, e);
        }
    }

    /** The key of a provider's origin: its plugin jar as named, or its code source, hashed where it is a file. */
    private static String where(Class<?> type, Map<Path, Origin> byCopy, Map<String, Origin> origins,
                                List<String> problems) {
        CodeSource cs = type.getProtectionDomain().getCodeSource();
        Path location = null;
        if (cs != null && cs.getLocation() != null) {
            try {
                location = Path.of(cs.getLocation().toURI());
            } catch (URISyntaxException | IllegalArgumentException | java.nio.file.FileSystemNotFoundException e) {
                // caught: a code source that is not a file (a jrt: or a remote address) has no bytes to hash; the
                // provider is named by its class below
                location = null;
            }
        }
        if (location != null && byCopy.containsKey(location)) {
            Origin o = byCopy.get(location);
            origins.putIfAbsent(o.location(), o);
            return o.location();
        }
        String at = location == null ? "class " + type.getName() : location.toString();
        if (!origins.containsKey(at)) {
            Optional<String> sha = Optional.empty();
            if (location != null && Files.isRegularFile(location)) {
                try {
                    sha = Optional.of(Digests.sha256(Files.readAllBytes(location)));
                } catch (IOException e) {
                    problems.add("the jar of " + type.getName() + " (" + location + ") cannot be read to hash it: "
                            + e.getMessage());
                }
            }
            origins.put(at, new Origin(at, sha, List.of(), List.of()));
        }
        return at;
    }
}
