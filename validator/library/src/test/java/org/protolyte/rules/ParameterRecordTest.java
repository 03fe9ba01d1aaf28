package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.OptionalLong;

import org.junit.jupiter.api.Test;
import org.protolyte.document.JsonReader;
import org.protolyte.document.Problem;
import org.protolyte.document.SourceDocument;

import tools.jackson.databind.node.ObjectNode;

/** A site's parameter record bound from a pack's JSON: every type the contract lists, and every way a value misfits. */
class ParameterRecordTest {

    enum Mode { STRICT, LOOSE_ENOUGH }

    record All(boolean flag, int count, long big, double x, String name, Mode mode, List<String> names,
               List<Integer> counts, Optional<Double> maybe, Optional<Mode> maybeMode, OptionalInt oi, OptionalLong ol,
               OptionalDouble od, Boolean boxed) {
    }

    record Checked(double max) {
        Checked {
            if (max <= 0) {
                throw new IllegalArgumentException("max must be positive");
            }
        }
    }

    private static final ParameterRecord<All> ALL = new ParameterRecord<>(All.class);
    private static final String FULL = "{\"flag\": true, \"count\": 3, \"big\": 3000000000, \"x\": 2.5, \"name\": \"n\","
            + " \"mode\": \"loose-enough\", \"names\": [\"a\", \"b\"], \"counts\": [1, 2], \"maybe\": 0.5,"
            + " \"maybeMode\": \"STRICT\", \"oi\": 7, \"ol\": 8, \"od\": 9.5, \"boxed\": false}";

    private static <P extends Record> Optional<P> bind(ParameterRecord<P> r, String json, List<Problem> problems) {
        SourceDocument doc = new JsonReader().read("pack.json", json.getBytes(StandardCharsets.UTF_8));
        return r.bind(doc, "/p", (ObjectNode) doc.root(), "test-kind", problems);
    }

    @Test
    void everyTypeOfTheContractIsBound() {
        List<Problem> problems = new ArrayList<>();
        All a = bind(ALL, FULL, problems).orElseThrow();
        assertEquals(List.of(), problems);
        assertEquals(new All(true, 3, 3_000_000_000L, 2.5, "n", Mode.LOOSE_ENOUGH, List.of("a", "b"), List.of(1, 2),
                Optional.of(0.5), Optional.of(Mode.STRICT), OptionalInt.of(7), OptionalLong.of(8), OptionalDouble.of(9.5),
                false), a);
    }

    @Test
    void theOptionalOnesMayBeAbsentAndNoOtherMay() {
        List<Problem> problems = new ArrayList<>();
        String without = FULL.replace(", \"maybe\": 0.5, \"maybeMode\": \"STRICT\", \"oi\": 7, \"ol\": 8, \"od\": 9.5", "");
        All a = bind(ALL, without, problems).orElseThrow();
        assertEquals(Optional.empty(), a.maybe());
        assertEquals(Optional.empty(), a.maybeMode());
        assertEquals(OptionalInt.empty(), a.oi());
        assertEquals(OptionalLong.empty(), a.ol());
        assertEquals(OptionalDouble.empty(), a.od());
        assertTrue(bind(ALL, FULL.replace("\"count\": 3, ", ""), problems).isEmpty());
        assertEquals(List.of("/p: check kind 'test-kind': parameter 'count' is needed"),
                problems.stream().map(p -> p.pointer() + ": " + p.message()).toList());
    }

    @Test
    void aValueOfTheWrongKindIsNamedAtItsPlace() {
        Map<String, String> cases = Map.ofEntries(
                Map.entry("\"flag\": \"yes\"", "/p/flag: check kind 'test-kind': parameter 'flag' is true or false, not \"yes\""),
                Map.entry("\"count\": 1.5", "/p/count: check kind 'test-kind': parameter 'count' is a whole number of int range, not 1.5"),
                Map.entry("\"count\": 3000000000", "/p/count: check kind 'test-kind': parameter 'count' is a whole number of int range, not 3000000000"),
                Map.entry("\"big\": 2.5", "/p/big: check kind 'test-kind': parameter 'big' is a whole number, not 2.5"),
                Map.entry("\"x\": \"2.5\"", "/p/x: check kind 'test-kind': parameter 'x' is a number, not \"2.5\""),
                Map.entry("\"name\": 4", "/p/name: check kind 'test-kind': parameter 'name' is a string, not 4"),
                Map.entry("\"mode\": \"medium\"", "/p/mode: check kind 'test-kind': parameter 'mode' is one of strict, loose-enough, not \"medium\""),
                Map.entry("\"names\": \"a\"", "/p/names: check kind 'test-kind': parameter 'names' is a list"),
                Map.entry("\"counts\": [1, \"2\"]", "/p/counts: check kind 'test-kind': parameter 'counts' is a whole number of int range, not \"2\""),
                Map.entry("\"od\": true", "/p/od: check kind 'test-kind': parameter 'od' is a number, not true"),
                Map.entry("\"boxed\": 0", "/p/boxed: check kind 'test-kind': parameter 'boxed' is true or false, not 0"),
                Map.entry("\"ol\": 1.0", "/p/ol: check kind 'test-kind': parameter 'ol' is a whole number, not 1.0"),
                Map.entry("\"oi\": 1.0", "/p/oi: check kind 'test-kind': parameter 'oi' is a whole number of int range, not 1.0"));
        cases.forEach((field, expected) -> {
            String name = field.substring(1, field.indexOf('"', 1));
            String json = FULL.replaceFirst("\"" + name + "\": (\\[[^]]*]|\"[^\"]*\"|[^,}]+)", java.util.regex.Matcher.quoteReplacement(field));
            List<Problem> problems = new ArrayList<>();
            assertTrue(bind(ALL, json, problems).isEmpty(), field);
            assertEquals(List.of(expected), problems.stream().map(p -> p.pointer() + ": " + p.message()).toList(), json);
        });
    }

    @Test
    void anUnknownParameterIsNamedWithTheOnesTheKindTakes() {
        List<Problem> problems = new ArrayList<>();
        assertTrue(bind(new ParameterRecord<>(Checked.class), "{\"max\": 1, \"min\": 0}", problems).isEmpty());
        assertEquals(List.of("/p/min: check kind 'test-kind' takes no parameter 'min'; it takes: max"),
                problems.stream().map(p -> p.pointer() + ": " + p.message()).toList());
    }

    @Test
    void theRecordsOwnRefusalIsTheMessage() {
        List<Problem> problems = new ArrayList<>();
        assertTrue(bind(new ParameterRecord<>(Checked.class), "{\"max\": -1}", problems).isEmpty());
        assertEquals(List.of("/p: check kind 'test-kind' refuses these parameters: max must be positive"),
                problems.stream().map(p -> p.pointer() + ": " + p.message()).toList());
        problems.clear();
        assertEquals(Optional.of(new Checked(2)), bind(new ParameterRecord<>(Checked.class), "{\"max\": 2}", problems));
    }

    record Nested(List<Map<String, String>> rows) {
    }

    record Raw(List rows) {
    }

    @Test
    void aComponentAPackCannotGiveStopsTheKind() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new ParameterRecord<>(Nested.class)).getMessage()
                .endsWith("component 'rows' is a java.util.List<java.util.Map<java.lang.String, java.lang.String>>, "
                        + "which a rule pack cannot give"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new ParameterRecord<>(Raw.class)).getMessage()
                .contains("component 'rows' is a java.util.List,"));
    }
}
