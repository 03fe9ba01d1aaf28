package org.protolyte.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.protolyte.TestDocs;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Every string, array and open object an input document may hold has a bound in its schema (issue 14: bounded
 * resources), and the schema's patterns take linear time on long text.
 */
class SchemaBoundsTest {

    private static final Path SCHEMAS = Path.of(System.getProperty("protolyte.projectRoot", "../.."), "schemas");

    private static List<Path> inputSchemas() throws IOException {
        try (Stream<Path> s = Files.walk(SCHEMAS)) {
            return s.filter(p -> p.toString().endsWith(".schema.json"))
                    .filter(p -> !p.getFileName().toString().equals("report.schema.json"))   // output, not input
                    .sorted().toList();
        }
    }

    private static void unbounded(JsonNode n, String at, List<String> out) {
        if (n.isObject()) {
            List<String> types = new ArrayList<>();
            n.path("type").forEach(t -> types.add(t.asString()));
            if (n.path("type").isString()) {
                types.add(n.get("type").asString());
            }
            if (types.contains("string") && !n.has("maxLength") && !n.has("enum") && !n.has("const")) {
                out.add(at + " (a string without maxLength)");
            }
            if (types.contains("array") && !n.has("maxItems")) {
                out.add(at + " (an array without maxItems)");
            }
            boolean open = !n.path("additionalProperties").isBoolean() || n.get("additionalProperties").asBoolean();
            if (types.contains("object") && open && !n.has("maxProperties")) {
                out.add(at + " (an open object without maxProperties)");
            }
            n.properties().forEach(e -> unbounded(e.getValue(), at + "/" + e.getKey(), out));
        } else if (n.isArray()) {
            for (int i = 0; i < n.size(); i++) {
                unbounded(n.get(i), at + "/" + i, out);
            }
        }
    }

    @Test
    void everyStringArrayAndOpenObjectOfAnInputIsBounded() throws IOException {
        List<Path> schemas = inputSchemas();
        assertTrue(schemas.size() >= 30, "the document schemas and the check kinds' parameter schemas: " + schemas);
        List<String> out = new ArrayList<>();
        JsonMapper json = JsonMapper.builder().build();
        for (Path p : schemas) {
            unbounded(json.readTree(Files.readString(p)), SCHEMAS.relativize(p) + "#", out);
        }
        assertEquals(List.of(), out);
    }

    /**
     * A quantity of digits followed by two line ends: the former pattern (number, optional space, then {@code \S.*$})
     * tried every split of the digit run, and 2,000 digits took over a minute. Now the schema checks only the start and
     * the reader reads the rest in one pass; the bound of 64 characters refuses the value besides.
     */
    @ParameterizedTest
    @ValueSource(ints = {2_000, 100_000})
    void aLongDigitRunInAQuantityIsRefusedAtOnce(int digits) {
        String doc = TestDocs.formulation("{\"substance\": \"sodium chloride\", \"amount\": \""
                + "1".repeat(digits) + "\\n\\n\"}", "");
        List<Problem> problems = assertTimeoutPreemptively(Duration.ofSeconds(20),
                () -> new SchemaCatalog().validate(new JsonReader().read("x.json", TestDocs.bytes(doc)),
                        "formulation.schema.json"));
        assertTrue(problems.stream().anyMatch(p -> p.pointer().equals("/components/0/amount")), problems.toString());
        assertTrue(problems.stream().allMatch(p -> p.message().length() < 300), problems.toString());
    }

    /** The batch record's quantities had the same pattern. */
    @Test
    void aLongDigitRunInABatchSizeIsRefusedAtOnce() {
        String doc = "{\"document\": \"batch-record\", \"formatVersion\": 1, \"id\": \"BR-1\", \"batch\": \"B1\", "
                + "\"master\": {\"path\": \"m.json\"}, \"batchSize\": \"" + "1".repeat(100_000) + "\\n\\n\", "
                + "\"additions\": [], \"measurements\": []}";
        List<Problem> problems = assertTimeoutPreemptively(Duration.ofSeconds(20),
                () -> new SchemaCatalog().validate(new JsonReader().read("b.json", TestDocs.bytes(doc)),
                        "batch-record.schema.json"));
        assertTrue(problems.stream().anyMatch(p -> p.pointer().equals("/batchSize")), problems.toString());
    }
}
