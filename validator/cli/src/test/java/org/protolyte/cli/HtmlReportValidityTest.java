package org.protolyte.cli;

import org.protolyte.report.RunReport;
import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.jsoup.nodes.Attribute;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.DocumentType;
import org.jsoup.nodes.Element;
import org.jsoup.parser.ParseError;
import org.jsoup.parser.Parser;
import org.jsoup.select.Elements;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** The HTML report of every sample is valid, self-contained HTML5 and the same for the same input (no browser). */
class HtmlReportValidityTest {

    private static final Set<String> URL_ATTRIBUTES = Set.of("src", "href", "xlink:href", "srcset", "action",
            "formaction", "poster", "data", "background");
    private static final Pattern FRAGMENT = Pattern.compile("#[^\\s#]+");
    private static final Pattern CSS_URL = Pattern.compile("(?i)url\\(([^)]*)\\)");
    private static final Pattern CSS_URL_OF_ID = Pattern.compile("\\s*(['\"]?)#[\\w.:-]+\\1\\s*");
    private static final Pattern META_GENERATED = Pattern.compile("<meta\\s+name=\"generated\"[^>]*>");
    private static final Pattern TIME_GENERATED = Pattern.compile("(?s)<time\\s+class=\"generated\"[^>]*>.*?</time>");

    static List<Path> samples() throws IOException {
        return HtmlReports.samples();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("samples")
    void theReportIsValidSelfContainedAndReproducible(Path sample) throws IOException {
        String name = HtmlReports.name(sample);
        Path dir = HtmlReports.OUT.resolve("validity");
        String first = Files.readString(HtmlReports.html(sample, dir.resolve(name + ".1.html")));
        String second = Files.readString(HtmlReports.html(sample, dir.resolve(name + ".2.html")));

        Parser parser = Parser.htmlParser().setTrackErrors(100);
        Document doc = parser.parseInput(first, "");
        List<ParseError> errors = parser.getErrors();

        assertAll(name,
                () -> assertTrue(errors.isEmpty(), () -> "HTML parse errors: " + errors),
                () -> assertHead(first, doc),
                () -> assertSelfContained(first, doc),
                () -> assertCautionEverywhere(doc),
                () -> assertSameLines(withoutTimestamp(first), withoutTimestamp(second)));
    }

    private static void assertHead(String html, Document doc) {
        assertTrue(html.startsWith("<!DOCTYPE html>"), "the file does not start with <!DOCTYPE html>");
        DocumentType type = doc.documentType();
        assertNotNull(type, "no doctype");
        assertEquals("", type.publicId() + type.systemId(), "the doctype is not plain <!DOCTYPE html>");
        assertEquals("en", doc.selectFirst("html").attr("lang"), "<html lang>");
        Element charset = doc.selectFirst("head > meta[charset]");
        assertNotNull(charset, "no <meta charset> in <head>");
        assertTrue(charset.attr("charset").equalsIgnoreCase("utf-8"), () -> "charset " + charset.attr("charset"));
        int at = html.toLowerCase(Locale.ROOT).indexOf("<meta charset");
        assertTrue(at >= 0 && at < 1024, "<meta charset> is not within the first 1024 bytes");
        Element title = doc.selectFirst("head > title");
        assertTrue(title != null && !title.text().isBlank(), "no non-empty <title> in <head>");
        assertEquals(1, doc.select("head > meta[name=generated]").size(), "<meta name=\"generated\"> once");
        assertFalse(doc.select("time.generated").isEmpty(), "no <time class=\"generated\">");
    }

    private static void assertSelfContained(String html, Document doc) {
        List<String> found = new ArrayList<>();
        for (Element e : doc.select("script, link, img, iframe, object, embed, base")) {
            found.add("<" + e.tagName() + ">");
        }
        for (Element e : doc.getAllElements()) {
            for (Attribute a : e.attributes()) {
                String key = a.getKey().toLowerCase(Locale.ROOT);
                if (key.startsWith("on")) {
                    found.add("<" + e.tagName() + " " + key + "> (a script)");
                } else if (URL_ATTRIBUTES.contains(key) && !FRAGMENT.matcher(a.getValue()).matches()) {
                    found.add("<" + e.tagName() + " " + key + "=\"" + a.getValue() + "\">");
                }
            }
        }
        // raw text: CSS in <style> and style="", and SVG presentation attributes such as fill="url(#g)"
        Matcher m = CSS_URL.matcher(html);
        while (m.find()) {
            if (!CSS_URL_OF_ID.matcher(m.group(1)).matches()) {
                found.add(m.group());
            }
        }
        // an address in an attribute or the style sheet could be fetched; one in the text (a rule's reference) is read
        List<String> fetchable = new ArrayList<>();
        doc.select("style").forEach(e -> fetchable.add(e.data()));
        for (Element e : doc.getAllElements()) {
            for (Attribute a : e.attributes()) {
                boolean svgNamespace = a.getKey().equals("xmlns") && a.getValue().equals("http://www.w3.org/2000/svg");
                if (!svgNamespace) {
                    fetchable.add(a.getValue());
                }
            }
        }
        for (String text : fetchable) {
            String lower = text.toLowerCase(Locale.ROOT);
            for (String word : List.of("@import", "http:", "https:", "//")) {
                if (lower.contains(word) && !(word.equals("//") && !lower.contains("://"))) {
                    found.add(word + " in '" + text.substring(0, Math.min(80, text.length())) + "'");
                }
            }
        }
        assertTrue(found.isEmpty(), () -> "not self-contained: " + found);
    }

    private static void assertCautionEverywhere(Document doc) {
        Elements sections = doc.select("section.document");
        assertFalse(sections.isEmpty(), "no <section class=\"document\">");
        List<String> without = new ArrayList<>();
        for (Element part : doc.select("header.run, section.document, footer.run")) {
            if (!part.text().contains(RunReport.CAUTION)) {
                without.add(part.tagName() + (part.id().isEmpty() ? "" : "#" + part.id()));
            }
        }
        assertEquals(1, doc.select("body > header.run").size(), "<header class=\"run\">");
        assertEquals(1, doc.select("body > footer.run").size(), "<footer class=\"run\">");
        assertTrue(without.isEmpty(), () -> "the caution is missing from " + without);
    }

    /** Equal, or fails with the first line that differs. */
    private static void assertSameLines(String first, String second) {
        String[] a = first.split("\n", -1);
        String[] b = second.split("\n", -1);
        for (int i = 0; i < Math.max(a.length, b.length); i++) {
            String x = i < a.length ? a[i] : "(end of file)";
            String y = i < b.length ? b[i] : "(end of file)";
            assertEquals(x, y, "two runs differ beyond the time stamp, at line " + (i + 1));
        }
    }

    private static String withoutTimestamp(String html) {
        return TIME_GENERATED.matcher(META_GENERATED.matcher(html).replaceAll("")).replaceAll("");
    }
}
