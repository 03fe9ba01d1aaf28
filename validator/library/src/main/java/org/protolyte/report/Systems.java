package org.protolyte.report;

import java.util.HashMap;
import java.util.Map;

import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.Component;
import org.protolyte.substance.SubstanceLibrary;

/** Names of the acid–base systems, by their mass-balance component, for speciation tables. */
final class Systems {
    private final Map<Component, String> names = new HashMap<>();

    Systems(SubstanceLibrary library) {
        for (AcidBaseSystem s : library.systems()) {
            names.put(s.basis(), s.name());
        }
    }

    String of(Component c) {
        return names.getOrDefault(c, c.name());
    }

    boolean isSystem(Component c) {
        return names.containsKey(c);
    }
}
