package org.protolyte.rules;

import java.util.List;
import java.util.Optional;

import org.protolyte.document.Formulation;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * One rule as a pack defines it: the check kind it runs, its parameters, severity and the words a
 * reviewer reads. {@code pack} names the pack that last defined or changed it; {@code bound} holds the parameters
 * bound to a site's check kind's record when the pack was loaded.
 */
public record Rule(String id, String check, ObjectNode parameters, Severity severity, boolean enabled,
                   String summary, String explanation, Optional<String> remedy, Optional<String> safety,
                   List<String> references, String pack, Optional<Record> bound) {

    public Rule {
        references = List.copyOf(references);
        parameters = parameters.deepCopy();
    }

    public Rule(String id, String check, ObjectNode parameters, Severity severity, boolean enabled, String summary,
                String explanation, Optional<String> remedy, Optional<String> safety, List<String> references,
                String pack) {
        this(id, check, parameters, severity, enabled, summary, explanation, remedy, safety, references, pack,
                Optional.empty());
    }

    /** This rule with its parameters bound to its kind's record. */
    public Rule withBound(Optional<Record> b) {
        return new Rule(id, check, parameters, severity, enabled, summary, explanation, remedy, safety, references,
                pack, b);
    }

    /** A rule outside any pack, for the built-in checks the tests call directly. */
    public static Rule of(String id, String check, Severity severity) {
        return new Rule(id, check, JsonNodeFactory.instance.objectNode(), severity, true, id, id, Optional.empty(),
                Optional.empty(), List.of("common practice"), "built-in");
    }

    public Rule withParameters(ObjectNode p) {
        return new Rule(id, check, p, severity, enabled, summary, explanation, remedy, safety, references, pack);
    }

    public double number(String name, double fallback) {
        JsonNode n = parameters.get(name);
        return n != null && n.isNumber() ? n.asDouble() : fallback;
    }

    public Optional<String> text(String name) {
        JsonNode n = parameters.get(name);
        return n != null && n.isString() ? Optional.of(n.asString()) : Optional.empty();
    }

    /** A list of strings, where the parameter is one. */
    public Optional<List<String>> texts(String name) {
        JsonNode n = parameters.get(name);
        if (n == null || !n.isArray()) {
            return Optional.empty();
        }
        return Optional.of(n.valueStream().map(JsonNode::asString).toList());
    }

    /** A finding of this rule at a place in another document than a formulation (a batch record). */
    public Finding finding(org.protolyte.document.SourceDocument doc, String pointer, String message) {
        return new Finding(id, severity, message, Optional.of(pointer), doc.locate(pointer), Optional.of(this));
    }

    /** A finding of this rule at a place in the document. */
    public Finding finding(Formulation f, String pointer, String message) {
        return new Finding(id, severity, message, Optional.of(pointer), f.document().locate(pointer), Optional.of(this));
    }
}
