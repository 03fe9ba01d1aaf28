package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.protolyte.document.DocumentException;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;

/** The rule-pack loader at its edges: a degenerate range, a nested one, references, a new rule in a root pack. */
class RulePackEdgesTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();

    private static RuleBook book() {
        return RuleBook.shipped(SCHEMAS, CheckKinds.load());
    }

    private static String pack(String name, String extendsPart, String rules) {
        return "{\"document\": \"rule-pack\", \"formatVersion\": 1, \"name\": \"" + name + "\", \"version\": \"1.0.0\""
                + extendsPart + ", \"rules\": [" + rules + "]}";
    }

    private static RuleBook added(String content) {
        RuleBook b = book();
        b.add("site.json", content.getBytes(StandardCharsets.UTF_8), false);
        return b;
    }

    private static DocumentException refused(String content) {
        RuleBook b = book();
        return assertThrows(DocumentException.class, () -> b.add("site.json", content.getBytes(StandardCharsets.UTF_8),
                false));
    }

    private static Rule rule(RuleBook b, String pack, String id) {
        return b.rules(List.of(pack)).stream().filter(r -> r.id().equals(id)).findFirst().orElseThrow();
    }

    private static final String OSMOLALITY = "{\"id\": \"site-osmolality\", \"check\": \"osmolality-range\", "
            + "\"severity\": \"error\", \"parameters\": %s, \"summary\": \"s\", \"explanation\": \"e\", "
            + "\"references\": [\"site SOP 12\", \"common practice\"]}";

    @Test
    void aRangeOfOnePointIsNotInverted() {
        RuleBook b = added(pack("site", ", \"extends\": \"general\"", String.format(OSMOLALITY,
                "{\"min\": 290, \"max\": 290}")));
        assertEquals(290.0, rule(b, "site", "site-osmolality").number("max", 0));
    }

    @Test
    void anInvertedRangeNestedInAParameterIsRefusedAtItsPlace() {
        DocumentException e = refused(pack("site", ", \"extends\": \"general\"", "{\"id\": \"site-spec\", \"check\": "
                + "\"batch-out-of-specification\", \"severity\": \"error\", \"parameters\": {\"osmolality\": "
                + "{\"min\": 300, \"max\": 280}}, \"summary\": \"s\", \"explanation\": \"e\", \"references\": "
                + "[\"common practice\"]}"));
        Problem p = e.problems().stream().filter(x -> x.pointer().equals("/rules/0/parameters/osmolality"))
                .findFirst().orElseThrow(() -> new AssertionError(e.problems().toString()));
        assertTrue(p.message().startsWith("min 300 is above max 280: the range is inverted"), p.message());
    }

    @Test
    void aNewRuleKeepsItsReferencesAndAChangedOneTakesNewOnes() {
        RuleBook b = added(pack("site", ", \"extends\": \"general\"", String.format(OSMOLALITY, "{\"min\": 280}")
                + ", {\"id\": \"revision-stated\", \"references\": [\"site SOP 3\"]}"));
        assertEquals(List.of("site SOP 12", "common practice"), rule(b, "site", "site-osmolality").references());
        assertEquals(List.of("site SOP 3"), rule(b, "site", "revision-stated").references());
        assertTrue(!rule(b, "general", "revision-stated").references().isEmpty());
        assertTrue(!rule(b, "general", "revision-stated").references().equals(List.of("site SOP 3")));
    }

    @Test
    void anIncompleteNewRuleNamesTheParentOnlyWhereThereIsOne() {
        String entry = "{\"id\": \"site-extra\", \"check\": \"revision-stated\", \"severity\": \"note\", "
                + "\"summary\": \"A revision is stated.\", \"references\": [\"common practice\"]}";
        String child = refused(pack("site", ", \"extends\": \"general\"", entry)).problems().toString();
        assertTrue(child.contains("is new in this pack and needs explanation (or an id that general defines)"), child);
        String root = refused(pack("site", "", entry)).problems().toString();
        assertTrue(root.contains("is new in this pack and needs explanation") && !root.contains("or an id"), root);
    }
}
