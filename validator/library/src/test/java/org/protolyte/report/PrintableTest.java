package org.protolyte.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.protolyte.Protolyte;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;

import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ObjectNode;

/** Document text printed in the text report cannot forge a line, repaint the terminal or reverse what is read. */
class PrintableTest {

    private static final String FORGED = "X\n== forged.json  [LB-FAKE]  PASS";

    // the escapes are JSON's (RFC 8259, section 7), so the printed text reads back as the document wrote it
    @Test
    void controlCharactersAreWrittenAsJsonEscapes() {
        assertEquals("a\\nb\\rc\\td", Printable.text("a\nb\rc\td"));
        assertEquals("\\u001b[2J\\u0007\\u0008\\u0000", Printable.text("\u001b[2J\u0007\b\u0000"));
        assertEquals("\\u007f\\u009b2J", Printable.text("\u007f\u009b2J"));
    }

    // bidi controls of Unicode UAX #9 and the two separators of Unicode chapter 5.8 (common practice)
    @Test
    void bidiControlsAndUnicodeLineBreaksAreEscaped() {
        assertEquals("\\u202eSSAP", Printable.text("\u202eSSAP"));
        assertEquals("\\u202a\\u202b\\u202c\\u202d\\u2066\\u2067\\u2068\\u2069",
                Printable.text("\u202a\u202b\u202c\u202d\u2066\u2067\u2068\u2069"));
        assertEquals("a\\u2028b\\u2029c", Printable.text("a\u2028b\u2029c"));
    }

    @Test
    void aBackslashIsDoubledSoThatAnEscapeIsNeverAmbiguous() {
        assertEquals("C:\\\\x \\\\n", Printable.text("C:\\x \\n"));
        assertFalse(Printable.text("\\n").equals(Printable.text("\n")));
    }

    @Test
    void printableTextIsLeftAsItIs() {
        String s = "Tris 50 mmol/L — 37 °C, µg × 2, pH ≥ 7.4, 化合物 \uD83E\uDDEA";
        assertSame(s, Printable.text(s));
    }

    @Test
    void aLoneSurrogateIsShownNotReplaced() {
        assertEquals("a\\ud800b", Printable.text("a\ud800b"));
        assertEquals("\\udc00", Printable.text("\udc00"));
    }

    /** Title, id, condition name and file name all hold a forged report line; the report shows one document only. */
    @Test
    void aForgedReportLineNeverStandsOnItsOwn(@TempDir Path dir) throws IOException {
        Path root = Path.of(System.getProperty("protolyte.projectRoot", "../.."));
        JsonMapper json = JsonMapper.builder().build();
        ObjectNode doc = (ObjectNode) json.readTree(
                Files.readString(root.resolve("sample-formulations/laboratory-tris-buffer-37c.json")));
        doc.put("title", FORGED).put("id", FORGED).put("revision", FORGED);
        ((ObjectNode) doc.get("conditions").get(0)).put("name", FORGED);
        Path file = dir.resolve("x" + FORGED.replace("X", "") + ".json");
        Files.writeString(file, json.writeValueAsString(doc), StandardCharsets.UTF_8);

        SchemaCatalog schemas = new SchemaCatalog();
        RunReport run = new Protolyte(schemas, LibraryLoader.shipped(schemas)).check(List.of(file));
        String text = new TextRenderer().render(run);

        List<String> documentLines = text.lines().filter(l -> l.startsWith("==")).toList();
        assertEquals(1, documentLines.size(), text);
        assertTrue(text.lines().noneMatch(l -> l.startsWith("== forged")), text);
        assertTrue(text.contains("X\\n== forged.json  [LB-FAKE]  PASS"), text);
    }
}
