package org.protolyte.report.plot;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.xpath.XPathConstants;
import javax.xml.xpath.XPathFactory;

import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NamedNodeMap;
import org.w3c.dom.NodeList;

class PlotTest {

    /** The plot area as this test expects it: 640 wide, margins 72 left, 16 right, 16 top, 56 below. */
    private static final double LEFT = 72;
    private static final double TOP = 16;
    private static final double AREA_W = 640 - 72 - 16;
    private static final double AREA_H = 400 - 16 - 56;

    private static final Axis DOSE = new Axis("added strong base", "mmol/L", 0, 40);
    private static final Axis PH = new Axis("pH", "", 0, 14);

    private static double px(double x) {
        return LEFT + (x - 0) / (40 - 0) * AREA_W;
    }

    private static double py(double y) {
        return TOP + AREA_H - (y - 0) / (14 - 0) * AREA_H;
    }

    private static Plot titration() {
        return Plot.of("Titration curve at 22.0 °C", DOSE, PH)
                .line("pH", new double[] {0, 10, 20, 30, 40}, new double[] {4.1, 6.2, 7.3, 8.9, 11.6}, Stroke.SOLID)
                .line("pH, no CO2", new double[] {0, 20, 40}, new double[] {4.3, 7.6, 12}, Stroke.DASHED)
                .yBand("target pH 7.20–7.40", 7.2, 7.4)
                .xBand("constants' data range", 10, 30)
                .marker("q.s. point", 21, 7.3)
                .marker("meter reading", 25, 8)
                .xMark("storage 5 °C", 5);
    }

    // ---- parsing

    private static Document parse(String svg) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        f.setFeature("http://xml.org/sax/features/external-general-entities", false);
        f.setFeature("http://xml.org/sax/features/external-parameter-entities", false);
        f.setAttribute(XMLConstants.ACCESS_EXTERNAL_DTD, "");
        f.setAttribute(XMLConstants.ACCESS_EXTERNAL_SCHEMA, "");
        f.setExpandEntityReferences(false);
        f.setNamespaceAware(true);
        DocumentBuilder b = f.newDocumentBuilder();
        b.setErrorHandler(null);
        return b.parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
    }

    /** Elements found by an XPath over local names, e.g. {@code //*[local-name()='path']}. */
    private static List<Element> select(Document d, String xpath) throws Exception {
        NodeList nodes = (NodeList) XPathFactory.newInstance().newXPath().evaluate(xpath, d, XPathConstants.NODESET);
        List<Element> found = new ArrayList<>();
        for (int i = 0; i < nodes.getLength(); i++) {
            found.add((Element) nodes.item(i));
        }
        return found;
    }

    private static String g(String cls) {
        return "//*[local-name()='g'][@class='" + cls + "']";
    }

    private static List<String> seriesPaths(String svg, int series) throws Exception {
        return select(parse(svg), "//*[local-name()='g'][@class='series'][@data-series='" + series
                + "']/*[local-name()='path']").stream().map(e -> e.getAttribute("d")).toList();
    }

    private static String xy(double x, double y) {
        return Format.coordinate(x) + " " + Format.coordinate(y);
    }

    // ---- the picture

    @Test
    void theSvgIsAnInlineElementWithItsTitleAndDescription() throws Exception {
        String svg = titration().svg("doc-1-titration");
        assertTrue(svg.startsWith("<svg xmlns=\"http://www.w3.org/2000/svg\" viewBox=\"0 0 640 "), svg);
        assertFalse(svg.contains("<?xml") || svg.contains("<!DOCTYPE"));
        Document d = parse(svg);
        Element root = d.getDocumentElement();
        assertEquals("http://www.w3.org/2000/svg", root.getNamespaceURI());
        assertEquals("img", root.getAttribute("role"));
        assertEquals("100%", root.getAttribute("width"));
        assertEquals("sans-serif", root.getAttribute("font-family"));
        assertEquals("doc-1-titration-title doc-1-titration-desc", root.getAttribute("aria-labelledby"));
        Element title = select(d, "//*[@id='doc-1-titration-title']").get(0);
        assertEquals("title", title.getLocalName());
        assertEquals("Titration curve at 22.0 °C", title.getTextContent());
        Element desc = select(d, "//*[@id='doc-1-titration-desc']").get(0);
        assertEquals("desc", desc.getLocalName());
        assertTrue(desc.getTextContent().startsWith("pH against added strong base (mmol/L); x from 0 to 40"),
                desc.getTextContent());
    }

    @Test
    void viewBoxIs640By400PlusTheLegendRows() throws Exception {
        Plot one = Plot.of("t", DOSE, PH).line("pH", new double[] {1}, new double[] {7}, Stroke.SOLID);
        assertEquals("0 0 640 426", parse(one.svg("p")).getDocumentElement().getAttribute("viewBox"));
        // 7 entries in two columns: 4 rows
        assertEquals("0 0 640 480", parse(titration().svg("p")).getDocumentElement().getAttribute("viewBox"));
        assertEquals("0 0 640 400", parse(Plot.of("t", DOSE, PH).svg("p")).getDocumentElement()
                .getAttribute("viewBox"));
    }

    @Test
    void theFrameIsThePlotArea() throws Exception {
        Element frame = select(parse(titration().svg("p")), "//*[@class='frame']").get(0);
        assertEquals(List.of("72", "16", "552", "328"), List.of(frame.getAttribute("x"), frame.getAttribute("y"),
                frame.getAttribute("width"), frame.getAttribute("height")));
    }

    @Test
    void axesCarryTheirLabelsWithUnitsAndTheirTicks() throws Exception {
        Document d = parse(titration().svg("p"));
        assertEquals("added strong base (mmol/L)",
                select(d, g("x-axis") + "/*[@class='axis-label']").get(0).getTextContent());
        assertEquals("pH", select(d, g("y-axis") + "/*[@class='axis-label']").get(0).getTextContent());
        List<String> xTicks = select(d, g("x-axis") + "/*[@class='tick-label']").stream()
                .map(Element::getTextContent).toList();
        assertEquals(List.of("0", "10", "20", "30", "40"), xTicks);
        List<Element> yTicks = select(d, g("y-axis") + "/*[@class='tick-label']");
        assertEquals(List.of("0", "2", "4", "6", "8", "10", "12", "14"),
                yTicks.stream().map(Element::getTextContent).toList());
        assertEquals(Format.coordinate(py(14) + 4), yTicks.get(7).getAttribute("y"));   // baseline below the tick
        String ticks = select(d, g("x-axis") + "/*[@class='ticks']").get(0).getAttribute("d");
        assertEquals("M72 344v5M210 344v5M348 344v5M486 344v5M624 344v5", ticks);
    }

    @Test
    void aDataPointLandsOnItsPixel() throws Exception {
        Plot p = Plot.of("t", DOSE, PH).line("pH", new double[] {10, 30}, new double[] {7, 3.5}, Stroke.SOLID)
                .marker("q.s. point", 21, 7.3);
        String svg = p.svg("p");
        assertEquals(List.of("M" + xy(px(10), py(7)) + "L" + xy(px(30), py(3.5))), seriesPaths(svg, 0));
        assertEquals("M210 180L486 262", seriesPaths(svg, 0).get(0));         // 72 + 10/40 * 552, 344 - 7/14 * 328
        String circle = select(parse(svg), g("marker") + "/*[local-name()='path']").get(0).getAttribute("d");
        assertTrue(circle.startsWith("M" + xy(px(21), py(7.3)) + "m-4.5 0"), circle);
    }

    @Test
    void bandsCoverTheirRangeAndAreClippedToTheAxes() throws Exception {
        Plot p = Plot.of("t", DOSE, PH).yBand("target pH 7.20–7.40", 7.2, 7.4).xBand("data", 30, 55)
                .xBand("beyond", 50, 60);
        List<Element> rects = select(parse(p.svg("p")), g("band") + "/*[local-name()='rect']");
        assertEquals(2, rects.size(), "the band beyond the axis is not drawn");
        Element y = rects.get(0);
        assertEquals(List.of("72", Format.coordinate(py(7.4)), "552", Format.coordinate(py(7.2) - py(7.4))),
                List.of(y.getAttribute("x"), y.getAttribute("y"), y.getAttribute("width"), y.getAttribute("height")));
        Element x = rects.get(1);
        assertEquals(List.of(Format.coordinate(px(30)), "16", Format.coordinate(px(40) - px(30)), "328"),
                List.of(x.getAttribute("x"), x.getAttribute("y"), x.getAttribute("width"), x.getAttribute("height")));
        assertEquals("0.2", y.getAttribute("fill-opacity"));
    }

    @Test
    void aLineLeavingTheAxesIsCutAtTheFrame() throws Exception {
        // from pH 7 at 0 to pH 21 at 40: leaves the top (pH 14) at 20, comes back at 40 below
        Plot p = Plot.of("t", DOSE, PH).line("pH", new double[] {0, 40, 40}, new double[] {7, 21, 10}, Stroke.SOLID);
        List<String> paths = seriesPaths(p.svg("p"), 0);
        assertEquals(List.of("M" + xy(px(0), py(7)) + "L" + xy(px(20), py(14)),
                "M" + xy(px(40), py(14)) + "L" + xy(px(40), py(10))), paths);
    }

    @Test
    void noDrawnCoordinateFallsOutsideThePlotArea() throws Exception {
        double[] xs = {-100, -5, 0, 12, 25, 41, 80, 1e300, 20};
        double[] ys = {-3, 20, 7, -1e300, 15, 7, -2, 7, 7};
        String svg = Plot.of("t", DOSE, PH).line("pH", xs, ys, Stroke.DOTTED).svg("p");
        Pattern pair = Pattern.compile("(-?[0-9.]+) (-?[0-9.]+)");
        List<String> paths = seriesPaths(svg, 0);
        assertFalse(paths.isEmpty());
        for (String d : paths) {
            Matcher m = pair.matcher(d);
            while (m.find()) {
                double x = Double.parseDouble(m.group(1));
                double y = Double.parseDouble(m.group(2));
                assertTrue(x >= LEFT && x <= LEFT + AREA_W && y >= TOP && y <= TOP + AREA_H, d);
            }
        }
    }

    @Test
    void aMissingValueBreaksTheLineIntoTwoPaths() throws Exception {
        double[] xs = {0, 10, 20, 30, 40};
        Plot p = Plot.of("t", DOSE, PH).line("pH", xs, new double[] {4, 6, Double.NaN, 9, 11}, Stroke.SOLID)
                .line("pH", xs, new double[] {4, Double.POSITIVE_INFINITY, 7, 9, 11}, Stroke.DASHED);
        String svg = p.svg("p");
        assertEquals(List.of("M" + xy(px(0), py(4)) + "L" + xy(px(10), py(6)),
                "M" + xy(px(30), py(9)) + "L" + xy(px(40), py(11))), seriesPaths(svg, 0));
        assertEquals(List.of("M" + xy(px(0), py(4)) + "h0",
                "M" + xy(px(20), py(7)) + "L" + xy(px(30), py(9)) + "L" + xy(px(40), py(11))), seriesPaths(svg, 1));
    }

    @Test
    void aLonePointBetweenGapsIsADot() throws Exception {
        Plot p = Plot.of("t", DOSE, PH).line("pH", new double[] {0, 10, 20}, new double[] {Double.NaN, 6,
                Double.NaN}, Stroke.SOLID);
        assertEquals(List.of("M" + xy(px(10), py(6)) + "h0"), seriesPaths(p.svg("p"), 0));
    }

    @Test
    void noNumberInTheOutputIsNaNOrInfiniteOrHasMoreThanTwoDecimals() throws Exception {
        double n = Double.NaN;
        double inf = Double.POSITIVE_INFINITY;
        Plot p = Plot.of("t", DOSE, PH)
                .line("pH", new double[] {n, 1.23456, 2.98765, inf, 3.3333333, 1e-300},
                        new double[] {7.123456, n, 7.777777, 8, -inf, 1e300}, Stroke.SOLID)
                .yBand("band", n, 7).xBand("band", 3.14159, 9.87654).marker("m", n, 7).marker("m", 1.11111, 2.22222)
                .xMark("mark", inf).xMark("mark", 33.333333);
        String svg = p.svg("p");
        assertFalse(svg.contains("NaN") || svg.contains("Infinity"), svg);
        Document d = parse(svg);
        Pattern tooLong = Pattern.compile("\\d\\.\\d{3,}|[eE][-+]?\\d");
        for (Element e : select(d, "//*")) {
            NamedNodeMap attributes = e.getAttributes();
            for (int i = 0; i < attributes.getLength(); i++) {
                String value = attributes.item(i).getNodeValue();
                assertFalse(tooLong.matcher(value).find(), e.getTagName() + " " + value);
            }
        }
        assertTrue(svg.contains("M" + xy(px(2.98765), py(7.777777)) + "h0"), "rounded, not dropped: " + svg);
    }

    @Test
    void anEmptyOrAllMissingPlotShowsItsAxesAndSaysNoData() throws Exception {
        double n = Double.NaN;
        for (Plot p : List.of(Plot.of("t", DOSE, PH),
                Plot.of("t", DOSE, PH).line("pH", new double[0], new double[0], Stroke.SOLID),
                Plot.of("t", DOSE, PH).line("pH", new double[] {1, 2}, new double[] {n, n}, Stroke.SOLID),
                Plot.of("t", DOSE, PH).line("pH", new double[] {1, 2}, new double[] {50, 60}, Stroke.SOLID))) {
            Document d = parse(p.svg("p"));
            assertEquals(1, select(d, g("x-axis")).size());
            assertEquals(1, select(d, g("y-axis")).size());
            assertEquals(1, select(d, "//*[@class='no-data'][text()='no data']").size(), p.svg("p"));
            assertEquals(0, select(d, g("series") + "/*").size());
        }
        Document drawn = parse(titration().svg("p"));
        assertEquals(0, select(drawn, "//*[@class='no-data']").size());
    }

    @Test
    void hostileLabelsComeOutEscapedAndTheSvgStaysWellFormed() throws Exception {
        String script = "<script>alert(1)</script>";
        String quotes = "\"&'";
        String controls = "a\u0000b\u0007c\u001b[31md\u007f\u009be\u202Ef\ud800g\tx\ny";
        Plot p = Plot.of(script + quotes, new Axis(script, quotes, 0, 40), new Axis(controls, "", 0, 14))
                .line(script, new double[] {1, 2}, new double[] {3, 4}, Stroke.SOLID)
                .yBand(quotes, 1, 2).xBand("]]>", 1, 2).marker(controls, 3, 3).xMark("&amp;" + script, 5);
        String svg = p.svg("p");
        assertFalse(svg.contains("<script"), svg);
        assertTrue(svg.contains("&lt;script&gt;alert(1)&lt;/script&gt;&quot;&amp;&#39;"), svg);
        assertTrue(svg.contains("&amp;amp;"), svg);
        assertTrue(svg.contains("]]&gt;"), svg);
        assertTrue(svg.chars().noneMatch(c -> c < 0x20 || c >= 0x7f && c <= 0x9f || c == 0x202e
                || Character.isSurrogate((char) c)), "control characters left");
        Document d = parse(svg);
        assertEquals(script + quotes, select(d, "//*[@id='p-title']").get(0).getTextContent());
        assertEquals(script + " (" + quotes + ")",
                select(d, g("x-axis") + "/*[@class='axis-label']").get(0).getTextContent());
        assertEquals("abc[31mdefg x y", select(d, g("y-axis") + "/*[@class='axis-label']").get(0).getTextContent());
        assertEquals(1, select(d, "//*[local-name()='svg']").size());
        assertEquals(0, select(d, "//*[local-name()='script']").size());
    }

    @Test
    void theSameInputGivesTheSameBytes() {
        String once = titration().svg("doc-2-titration");
        assertEquals(once, titration().svg("doc-2-titration"));
        Plot p = titration();
        assertEquals(p.svg("x"), p.svg("x"));
        assertEquals(titration().table(), titration().table());
    }

    @Test
    void addingMakesANewPlotAndTheCallersArraysAreCopied() {
        double[] xs = {0, 10};
        double[] ys = {4, 6};
        Plot p = Plot.of("t", DOSE, PH).line("pH", xs, ys, Stroke.SOLID);
        String before = p.svg("p");
        Plot more = p.marker("m", 5, 5);
        xs[1] = 20;
        ys[0] = 13;
        assertEquals(before, p.svg("p"));
        assertNotEquals(before, more.svg("p"));
        assertEquals(List.of("pH", "10", "6"), p.table().rows().get(1));
    }

    @Test
    void theLegendListsEverySeriesBandMarkerAndRuleWithADistinctSample() throws Exception {
        Plot p = titration().line("dotted", new double[] {1}, new double[] {1}, Stroke.DOTTED)
                .line("dash-dot", new double[] {1}, new double[] {1}, Stroke.DASH_DOT)
                .marker("third", 1, 1).marker("fourth", 1, 1);
        Document d = parse(p.svg("p"));
        List<String> labels = select(d, g("legend") + "/*[@class='legend-label']").stream()
                .map(Element::getTextContent).toList();
        assertEquals(List.of("pH", "pH, no CO2", "dotted", "dash-dot", "target pH 7.20–7.40", "constants' data range",
                "q.s. point", "meter reading", "third", "fourth", "storage 5 °C"), labels);
        List<Element> samples = select(d, g("legend") + "/*[local-name()='path']");
        assertEquals(labels.size(), samples.size());
        List<String> dashes = samples.subList(0, 4).stream().map(e -> e.getAttribute("stroke-dasharray")).toList();
        assertEquals(4, new HashSet<>(dashes).size(), "each stroke its own dash pattern: " + dashes);
        assertEquals("", dashes.get(0));
        List<String> shapes = samples.subList(6, 10).stream()
                .map(e -> e.getAttribute("d").replaceFirst("^M[-0-9. ]+", "")).toList();
        assertEquals(4, new HashSet<>(shapes).size(), "each marker its own shape: " + shapes);
    }

    @Test
    void thePaletteIsDarkWithDistinctGreys() {
        String[] palette = Svg.PALETTE;
        for (int i = 0; i < palette.length; i++) {
            double l = luminance(palette[i]);
            assertTrue(1.05 / (l + 0.05) >= 3, palette[i] + " too light on white paper");
            for (int j = 0; j < i; j++) {
                assertTrue(Math.abs(l - luminance(palette[j])) >= 0.04,
                        palette[i] + " prints as nearly the same grey as " + palette[j]);
            }
        }
    }

    private static double luminance(String hex) {
        double l = 0;
        double[] weights = {0.2126, 0.7152, 0.0722};
        for (int i = 0; i < 3; i++) {
            double c = Integer.parseInt(hex.substring(1 + 2 * i, 3 + 2 * i), 16) / 255.0;
            l += weights[i] * (c <= 0.04045 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4));
        }
        return l;
    }

    // ---- the text alternative

    @Test
    void theTableHasTheSeriesNumbersThenBandsMarkersAndRules() {
        Plot.Table t = titration().table();
        assertEquals(List.of("item", "added strong base (mmol/L)", "pH"), t.header());
        List<List<String>> rows = t.rows();
        assertEquals(5 + 3 + 2 + 2 + 1, rows.size());
        assertEquals(List.of("pH", "0", "4.1"), rows.get(0));
        assertEquals(List.of("pH", "40", "11.6"), rows.get(4));
        assertEquals(List.of("pH, no CO2", "20", "7.6"), rows.get(6));
        assertEquals(List.of("target pH 7.20–7.40", "", "7.2 to 7.4"), rows.get(8));
        assertEquals(List.of("constants' data range", "10 to 30", ""), rows.get(9));
        assertEquals(List.of("q.s. point", "21", "7.3"), rows.get(10));
        assertEquals(List.of("storage 5 °C", "5", ""), rows.get(12));
    }

    @Test
    void theTableGivesEachPointToSixDigitsAndADashWhereThereIsNoValue() {
        double[] xs = {0.1, 2.0 / 3, 12345.678, 1e-9};
        double[] ys = {7.123456789, Double.NaN, -0.000123456, 1e20};
        List<List<String>> rows = Plot.of("t", DOSE, PH).line("L", xs, ys, Stroke.SOLID).table().rows();
        assertEquals(List.of(List.of("L", "0.1", "7.12346"), List.of("L", "0.666667", "—"),
                List.of("L", "12345.7", "-0.000123456"), List.of("L", "1E-9", "1E+20")), rows);
        for (int i = 0; i < xs.length; i++) {
            assertEquals(xs[i], Double.parseDouble(rows.get(i).get(1)), Math.abs(xs[i]) * 1e-5);
        }
    }

    @Test
    void anIdThatCouldBreakThePageIsRefused() {
        Plot p = Plot.of("t", DOSE, PH);
        for (String id : List.of("", "1abc", "a b", "a\"b", "a>b")) {
            assertThrows(IllegalArgumentException.class, () -> p.svg(id), id);
        }
    }

    @Test
    void linesOfUnequalLengthAreRefused() {
        assertThrows(IllegalArgumentException.class,
                () -> Plot.of("t", DOSE, PH).line("pH", new double[] {1, 2}, new double[] {1}, Stroke.SOLID));
    }
}
