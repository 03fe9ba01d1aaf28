package org.protolyte.rules;

import java.util.List;

import org.protolyte.analysis.FormulationAnalysis;

/**
 * One kind of check, implemented in code and named by packs. It reads the analysis, never solves
 * anything itself, and judges only determinate numbers: indeterminate conditions are the engine's
 * diagnostics, not findings. Kinds are found with {@link java.util.ServiceLoader}, so a site can add
 * its own in a jar of its own.
 */
public interface CheckKind {

    /** Kebab-case name that packs use in {@code "check"}. */
    String id();

    /** One line: what the check asks for. */
    String summary();

    /** Class-path resource of the JSON Schema its parameters must satisfy. */
    default String parameterSchema() {
        return "checks/" + id() + ".schema.json";
    }

    List<Finding> check(FormulationAnalysis analysis, Rule rule);
}
