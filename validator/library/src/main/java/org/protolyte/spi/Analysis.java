package org.protolyte.spi;

import java.util.List;
import java.util.Optional;

/**
 * What a check may read of one formulation: a copy of the engine's results, so that no check can change what another
 * sees.
 *
 * @param id          the document's id
 * @param revision    the document's revision, where it states one
 * @param intendedUse the document's {@code intendedUse}, where it states one
 * @param pHTarget    the document's pH target, where it states one
 * @param components  the composition, in the document's order
 * @param conditions  every condition, in the document's order
 */
public record Analysis(String id, Optional<String> title, Optional<String> revision, Optional<String> intendedUse,
                       Optional<Target> pHTarget, List<Component> components, List<Condition> conditions) {
    public Analysis {
        components = List.copyOf(components);
        conditions = List.copyOf(conditions);
    }
}
