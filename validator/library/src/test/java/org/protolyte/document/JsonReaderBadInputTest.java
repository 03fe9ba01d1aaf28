package org.protolyte.document;

import static org.junit.jupiter.api.Assertions.assertDoesNotThrow;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.protolyte.TestDocs;

class JsonReaderBadInputTest {

    private final JsonReader reader = new JsonReader();

    private Problem onlyProblem(String json) {
        DocumentException e = assertThrows(DocumentException.class, () -> reader.read("t.json", TestDocs.bytes(json)));
        assertEquals(1, e.problems().size(), () -> "problems: " + e.problems());
        return e.problems().get(0);
    }

    @Test
    void missingCommaIsInvalidJsonWithLineAndColumn() {
        // the comma is missing at the end of line 2; the parser trips on line 3
        Problem p = onlyProblem("{\n\"document\": \"formulation\"\n\"id\": \"TST-001\"\n}");
        assertTrue(p.message().startsWith("not valid JSON"), p.message());
        Location l = p.location().orElseThrow(() -> new AssertionError("no location: " + p));
        assertEquals(3, l.line());
        assertTrue(l.column() >= 1, "column " + l.column());
    }

    private static final String DUPLICATE_ID = "{\n\"id\": \"TST-001\",\n\"title\": \"t\",\n\"id\": \"TST-002\"\n}";

    @Test
    void duplicateKeyIsRefusedNamingTheKeyAndItsLine() {
        Problem p = onlyProblem(DUPLICATE_ID);
        assertTrue(p.message().contains("Duplicate") && p.message().contains("\"id\""), p.message());
        assertEquals(4, p.location().orElseThrow().line());
    }

    @Test
    void duplicateKeyDirectlyAfterTheFirstIsPointedAt() {
        Problem p = onlyProblem("{\n\"id\": \"TST-001\",\n\"id\": \"TST-002\"\n}");
        assertEquals("/id", p.pointer());
    }

    @Test
    void duplicateKeyIsPointedAtEvenWhenNotAdjacent() {
        assertEquals("/id", onlyProblem(DUPLICATE_ID).pointer());
    }

    @Test
    void nestingDeeperThanMaxDepthIsRefused() {
        int depth = JsonReader.MAX_DEPTH + 1;
        Problem p = onlyProblem("[".repeat(depth) + "]".repeat(depth));
        assertTrue(p.message().contains("nesting deeper than " + JsonReader.MAX_DEPTH), p.message());
    }

    @Test
    void nestingExactlyMaxDepthIsRead() {
        int depth = JsonReader.MAX_DEPTH;
        assertDoesNotThrow(() -> reader.read("t.json", TestDocs.bytes("[".repeat(depth) + "]".repeat(depth))));
    }

    @Test
    void numberBeyondDoubleRangeIsRefusedAsNonFiniteWithItsPointer() {
        Problem p = onlyProblem("{\n\"components\": [\n{\"amount\": {\"value\": 1e999, \"unit\": \"g\"}}\n]\n}");
        assertEquals("/components/0/amount/value", p.pointer());
        assertTrue(p.message().contains("1e999") && p.message().contains("finite"), p.message());
        assertEquals(3, p.location().orElseThrow().line());
    }

    @Test
    void integerBeyondDoubleRangeIsRefusedAsNonFiniteWithItsPointer() {
        Problem p = onlyProblem("{\"tolerance\": 1" + "0".repeat(400) + "}");
        assertEquals("/tolerance", p.pointer());
        assertTrue(p.message().contains("finite"), p.message());
    }

    @Test
    void trailingContentAfterTheRootValueIsInvalidJson() {
        DocumentException e = assertThrows(DocumentException.class,
                () -> reader.read("t.json", TestDocs.bytes("{\"id\": \"TST-001\"}\n{}")));
        assertTrue(e.problems().get(0).message().startsWith("not valid JSON"), e.problems().toString());
    }

    @Test
    void numberLongerThanTheLimitIsRefusedAsTooLongNotAsNesting() {
        Problem p = onlyProblem("{\"id\": 1" + "2".repeat(1001) + "}");
        assertTrue(p.message().contains("number longer than 1000"), p.message());
        assertFalse(p.message().contains("nesting"), p.message());
    }

    @Test
    void propertyNameLongerThanTheLimitIsRefusedAsTooLongNotAsNesting() {
        Problem p = onlyProblem("{\"" + "k".repeat(50_001) + "\": 1}");
        assertTrue(p.message().contains("property name longer than"), p.message());
        assertFalse(p.message().contains("nesting"), p.message());
    }

    @ParameterizedTest
    @ValueSource(strings = {"NaN", "Infinity", "-Infinity"})
    void nonNumericLiteralIsNotAJsonNumberWithLineAndColumn(String literal) {
        Problem p = onlyProblem("{\n  \"x\": " + literal + "}");
        assertTrue(p.message().contains("is not a JSON number"), p.message());
        assertFalse(p.message().contains("ALLOW_") || p.message().contains("enable"), p.message());
        assertEquals(2, p.location().orElseThrow().line());
    }

    // RFC 8259, section 8.1: JSON exchanged between systems is UTF-8; the parser alone would read these
    @ParameterizedTest
    @ValueSource(strings = {"UTF-16LE", "UTF-16BE", "UTF-16", "UTF-32LE", "UTF-32BE"})
    void utf16AndUtf32AreRefusedNamingTheEncoding(String charset) {
        byte[] bytes = "{\"document\": \"formulation\"}".getBytes(java.nio.charset.Charset.forName(charset));
        DocumentException e = assertThrows(DocumentException.class, () -> reader.read("t.json", bytes));
        String m = e.problems().get(0).message();
        assertTrue(m.contains(charset.substring(0, 6)) && m.contains("not UTF-8") && m.contains("RFC 8259"), m);
    }

    @Test
    void aNulBeforeUtf8TextIsNotCalledUtf16() {
        byte[] bytes = "\u0000\n  {\"a\": 1}".getBytes(java.nio.charset.StandardCharsets.UTF_8);
        DocumentException e = assertThrows(DocumentException.class, () -> reader.read("t.json", bytes));
        assertFalse(e.problems().get(0).message().contains("UTF-16"), e.problems()::toString);
    }

    @Test
    void utf8IsRead() {
        assertDoesNotThrow(() -> reader.read("t.json", "{\"title\": \"µ °C\"}".getBytes(java.nio.charset.StandardCharsets.UTF_8)));
    }

    @ParameterizedTest
    @ValueSource(strings = {"{\"a\": +7.8}", "{\"a\": 0x1}", "{'a': 1}", "{\"a\": 1,}", "{\"a\": .5}", "{a: 1}",
        "{\"a\": 01}", "{\"a\": NaN}"})
    void aSyntaxErrorIsSaidInWordsWithItsPlaceNotAsAParserSetting(String json) {
        Problem p = onlyProblem(json);
        assertTrue(p.message().startsWith("not valid JSON: "), p.message());
        assertFalse(p.message().contains("ALLOW_") || p.message().contains("Feature"), p.message());
        assertTrue(p.location().isPresent(), p::toString);
    }
}
