package org.protolyte.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.module.ModuleDescriptor;
import java.lang.reflect.Constructor;
import java.lang.reflect.Method;
import java.lang.reflect.Modifier;
import java.lang.reflect.Type;
import java.nio.file.Files;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import java.lang.module.ModuleFinder;
import java.nio.file.Path;
import java.util.Set;
import java.util.TreeSet;

import org.junit.jupiter.api.Test;

/**
 * The library module exports its API and its SPI alone: every other package is internal, open only to the project's
 * own command line. Read from the compiled module descriptor, as the JDK reads it on the module path; and no public
 * signature of the two exported packages names a type of another (no Jackson node, no engine type).
 */
class ModuleBoundaryTest {

    private static ModuleDescriptor descriptor() {
        Path classes = Path.of("target", "classes");
        return ModuleFinder.of(classes).find("org.protolyte.library").orElseThrow(() ->
                new AssertionError("no module org.protolyte.library in " + classes.toAbsolutePath())).descriptor();
    }

    @Test
    void onlyTheApiAndTheSpiAreExportedToEveryone() {
        Set<String> toAll = new TreeSet<>();
        Set<String> qualified = new TreeSet<>();
        for (ModuleDescriptor.Exports e : descriptor().exports()) {
            if (e.isQualified()) {
                assertEquals(Set.of("org.protolyte.cli"), e.targets(), e.source());
                qualified.add(e.source());
            } else {
                toAll.add(e.source());
            }
        }
        assertEquals(Set.of("org.protolyte.api", "org.protolyte.spi"), toAll);
        Set<String> all = new TreeSet<>(descriptor().packages());
        all.removeIf(p -> !p.startsWith("org.protolyte"));     // schemas/ and rules/: resources, read by the module itself
        all.removeAll(toAll);
        assertEquals(all, qualified, "every internal package is open to the command line only");
        assertTrue(descriptor().opens().isEmpty(), "nothing is open to reflection");
    }

    @Test
    void theModuleLooksForASitesKindsAndLibrariesAsServices() {
        assertEquals(Set.of("org.protolyte.spi.CheckKind", "org.protolyte.spi.SubstanceLibrarySource",
                "org.protolyte.rules.CheckKind"), descriptor().uses());
    }

    @Test
    void noPublicSignatureOfTheApiOrTheSpiNamesAnInternalOrAJacksonType() throws Exception {
        List<String> leaks = new ArrayList<>();
        int types = 0;
        for (String pkg : List.of("org.protolyte.api", "org.protolyte.spi")) {
            try (Stream<Path> files = Files.list(Path.of("target", "classes", pkg.replace('.', '/')))) {
                for (Path f : files.filter(p -> p.toString().endsWith(".class")).sorted().toList()) {
                    Class<?> c = Class.forName(pkg + "." + f.getFileName().toString().replace(".class", ""));
                    if (!Modifier.isPublic(c.getModifiers())) {
                        continue;
                    }
                    types++;
                    List<Type> named = new ArrayList<>();
                    for (Method m : c.getMethods()) {
                        named.add(m.getGenericReturnType());
                        named.addAll(List.of(m.getGenericParameterTypes()));
                        named.addAll(List.of(m.getGenericExceptionTypes()));
                    }
                    for (Constructor<?> k : c.getConstructors()) {
                        named.addAll(List.of(k.getGenericParameterTypes()));
                    }
                    for (Type t : named) {
                        String name = t.getTypeName();
                        for (String part : name.split("[<>,\\s\\[\\]?&]+")) {
                            boolean own = part.startsWith("org.protolyte.api.") || part.startsWith("org.protolyte.spi.");
                            boolean jdk = part.startsWith("java.") || !part.contains(".");
                            if (!part.isEmpty() && !own && !jdk && !part.equals("extends") && !part.equals("super")) {
                                leaks.add(c.getName() + " names " + part);
                            }
                        }
                    }
                }
            }
        }
        assertTrue(types >= 20, "found the public types: " + types);
        assertEquals(List.of(), leaks);
    }

    @Test
    void theShippedCheckKindsAreProvidedAsServices() {
        var provides = descriptor().provides().stream().filter(p -> p.service().equals("org.protolyte.rules.CheckKind"))
                .findFirst().orElseThrow();
        assertTrue(provides.providers().contains("org.protolyte.rules.PhWithinTarget"), provides.providers()::toString);
        assertEquals(org.protolyte.rules.CheckKinds.load().all().size(), provides.providers().size(),
                "the module provides what META-INF/services lists");
    }
}
