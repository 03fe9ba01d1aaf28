package org.protolyte.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.module.ModuleDescriptor;
import java.lang.module.ModuleFinder;
import java.nio.file.Path;
import java.util.Set;
import java.util.TreeSet;

import org.junit.jupiter.api.Test;

/**
 * The library module exports its API alone: every other package is internal, open only to the project's own command
 * line. Read from the compiled module descriptor, as the JDK reads it on the module path.
 */
class ModuleBoundaryTest {

    private static ModuleDescriptor descriptor() {
        Path classes = Path.of("target", "classes");
        return ModuleFinder.of(classes).find("org.protolyte.library").orElseThrow(() ->
                new AssertionError("no module org.protolyte.library in " + classes.toAbsolutePath())).descriptor();
    }

    @Test
    void onlyTheApiIsExportedToEveryone() {
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
        assertEquals(Set.of("org.protolyte.api"), toAll);
        Set<String> all = new TreeSet<>(descriptor().packages());
        all.removeIf(p -> !p.startsWith("org.protolyte"));     // schemas/ and rules/: resources, read by the module itself
        all.removeAll(toAll);
        assertEquals(all, qualified, "every internal package is open to the command line only");
        assertTrue(descriptor().opens().isEmpty(), "nothing is open to reflection");
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
