package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.protolyte.document.SchemaCatalog;

import tools.jackson.databind.json.JsonMapper;

/** Which packs judge a document: by its intended use, instead of it (--rules), or in addition (--rules +pack). */
class CheckerSelectionTest {

    private static final RuleBook BOOK = RuleBook.shipped(new SchemaCatalog(), CheckKinds.load());

    @Test
    void anAddedPackJoinsTheIntendedUsesPacksOnce() {
        Checker plus = new Checker(BOOK, List.of(), List.of("parenteral"));
        assertEquals(List.of("ophthalmic", "parenteral"), plus.selection(Optional.of("ophthalmic")));
        assertEquals(List.of("parenteral"), plus.selection(Optional.of("parenteral")));
        assertEquals(List.of("ophthalmic"), new Checker(BOOK, List.of("ophthalmic"), List.of())
                .selection(Optional.of("parenteral")));
    }

    @Test
    void anUnknownPackIsRefusedByName() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Checker(BOOK, List.of(), List.of("parenteraal")));
        assertEquals("no rule pack named 'parenteraal'", e.getMessage());
    }

    @Test
    void theIntendedUsesAreThoseTheFormulationSchemaAllows() throws Exception {
        Path schema = Path.of(System.getProperty("protolyte.projectRoot", "../.."), "schemas", "formulation.schema.json");
        if (!Files.exists(schema)) {
            schema = Path.of("..", "schemas", "formulation.schema.json");
        }
        List<String> allowed = new ArrayList<>();
        JsonMapper.builder().build().readTree(Files.readAllBytes(schema)).path("properties").path("intendedUse")
                .path("enum").forEach(n -> allowed.add(n.asString()));
        assertTrue(!allowed.isEmpty(), schema.toString());
        assertEquals(allowed, Checker.intendedUses());
    }
}
