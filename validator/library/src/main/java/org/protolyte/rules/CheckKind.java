package org.protolyte.rules;

import java.util.List;
import java.util.Optional;

import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.document.SourceDocument;

import tools.jackson.databind.node.ObjectNode;

/**
 * One kind of check, implemented in code and named by packs. It reads the analysis, never solves
 * anything itself, and judges only determinate numbers: indeterminate conditions are the engine's
 * diagnostics, not findings. The shipped kinds are found with {@link java.util.ServiceLoader}; a site's own
 * implement {@link org.protolyte.spi.CheckKind} and run as a {@link PluginCheck}.
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

    /**
     * Checks a rule's parameters once, when its pack is loaded, adding every problem (placed under {@code at}); the
     * parameters bound to the kind's record where it has one (a site's kind), else empty: a shipped kind reads them from
     * the rule's JSON, which its schema has checked.
     */
    default Optional<Record> bind(SchemaCatalog schemas, SourceDocument doc, String at, ObjectNode parameters,
                                  List<Problem> problems) {
        problems.addAll(schemas.validate(doc, at, parameters, parameterSchema()));
        return Optional.empty();
    }

    List<Finding> check(FormulationAnalysis analysis, Rule rule);
}
