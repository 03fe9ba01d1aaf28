package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.io.IOException;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.logging.Level;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.devtools.DevTools;
import org.openqa.selenium.devtools.v156.dom.model.Rect;
import org.openqa.selenium.devtools.v156.page.Page;
import org.openqa.selenium.devtools.v156.page.model.Viewport;
import org.openqa.selenium.json.Json;
import org.openqa.selenium.logging.LogEntry;
import org.openqa.selenium.logging.LogType;

import tools.jackson.databind.JsonNode;

/**
 * The HTML report of every sample, opened as a file in headless Chromium, shows what the JSON report of the same
 * run says, fetches nothing and logs nothing. Needs /usr/bin/chromium and /usr/bin/chromedriver;
 * {@code -Dprotolyte.browser=skip} skips it where there is no browser.
 */
class HtmlReportBrowserTest {

    private static final String CHROMIUM = "/usr/bin/chromium";
    private static final String CHROMEDRIVER = "/usr/bin/chromedriver";
    private static final Set<String> PLOTS = Set.of("titration", "capacity", "temperature", "speciation", "saturation");
    private static final Set<String> NEEDED_PLOTS = Set.of("titration", "capacity", "temperature");
    private static final Set<String> LINE_FIELDS = Set.of("mmol", "grams", "stockMillilitres", "batchMmol",
            "batchGrams", "batchStockMillilitres");
    private static final boolean SKIP = "skip".equals(System.getProperty("protolyte.browser"));
    private static final Json JSON = new Json();
    private static final Path SCREENSHOTS = HtmlReports.ROOT.resolve("validator/target/screenshots");

    @TempDir
    static Path profile;

    private static ChromeDriver driver;
    private static DevTools devTools;

    @BeforeAll
    static void startBrowser() {
        if (SKIP) {
            return;
        }
        for (String exe : List.of(CHROMIUM, CHROMEDRIVER)) {
            assertTrue(Files.isExecutable(Path.of(exe)), exe + " is missing: install Chromium and ChromeDriver with "
                    + "'apt-get install chromium chromium-driver' (or skip with -Dprotolyte.browser=skip)");
        }
        // explicit paths, so Selenium Manager neither looks for nor downloads a driver or a browser
        System.setProperty("webdriver.chrome.driver", CHROMEDRIVER);
        ChromeOptions options = new ChromeOptions().setBinary(CHROMIUM).addArguments("--headless", "--no-sandbox",
                "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking",
                "--disable-component-update", "--disable-sync", "--user-data-dir=" + profile,
                "--window-size=1280,1024");
        options.setCapability("goog:loggingPrefs", Map.of(LogType.BROWSER, "ALL", LogType.PERFORMANCE, "ALL"));
        ChromeDriverService service = new ChromeDriverService.Builder()
                .usingDriverExecutable(Path.of(CHROMEDRIVER).toFile()).build();
        driver = new ChromeDriver(service, options);
        devTools = driver.getDevTools();
        devTools.createSession();
    }

    @BeforeEach
    void needsTheBrowser() {
        assumeFalse(SKIP, "-Dprotolyte.browser=skip: the HTML report is not opened in a browser");
    }

    @AfterAll
    static void quitBrowser() {
        if (driver != null) {
            driver.quit();
        }
    }

    static List<Path> samples() throws IOException {
        return HtmlReports.samples();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("samples")
    void theBrowserShowsWhatTheJsonReportSays(Path sample) throws IOException {
        String name = HtmlReports.name(sample);
        Path html = HtmlReports.html(sample, HtmlReports.OUT.resolve(name + ".html"));
        List<JsonNode> documents = HtmlReports.documents(
                HtmlReports.readJson(HtmlReports.json(sample, HtmlReports.OUT.resolve(name + ".json"))));

        String url = html.toUri().toString();
        driver.manage().logs().get(LogType.BROWSER);        // what an earlier page left
        driver.manage().logs().get(LogType.PERFORMANCE);
        driver.get(url);
        assertEquals("complete", driver.executeScript("return document.readyState"));
        List<LogEntry> console = driver.manage().logs().get(LogType.BROWSER).getAll();
        List<LogEntry> performance = driver.manage().logs().get(LogType.PERFORMANCE).getAll();
        screenshot(SCREENSHOTS.resolve(name + ".png"));

        List<WebElement> sections = driver.findElements(By.cssSelector("section.document"));
        List<Executable> checks = new ArrayList<>();
        checks.add(() -> assertRequestsOnlyItself(url, performance));
        checks.add(() -> assertConsoleQuiet(console));
        checks.add(() -> assertEquals(documents.size(), sections.size(),
                "one <section class=\"document\"> per document of the JSON report"));
        for (int i = 0; i < Math.min(documents.size(), sections.size()); i++) {
            WebElement section = sections.get(i);
            JsonNode doc = documents.get(i);
            String where = "document " + i + " (" + doc.path("source").asString() + ")";
            checks.add(() -> assertStatus(where, section, doc));
            checks.add(() -> assertPlots(where, section, doc));
            checks.add(() -> assertWeighSheet(where, section, doc));
        }
        assertAll(name, checks);
    }

    private static void assertStatus(String where, WebElement section, JsonNode doc) {
        List<WebElement> status = section.findElements(By.cssSelector("p.status"));
        assertEquals(1, status.size(), where + ": one <p class=\"status\">");
        assertTrue(status.get(0).isDisplayed(), where + ": the status word is not shown");
        String word = status.get(0).getText().strip();
        assertTrue(word.equalsIgnoreCase(doc.path("status").asString()),
                () -> where + ": status shown '" + word + "', JSON '" + doc.path("status").asString() + "'");
    }

    private static void assertPlots(String where, WebElement section, JsonNode doc) {
        Set<String> shown = new TreeSet<>();
        for (WebElement figure : section.findElements(By.cssSelector("figure.plot"))) {
            String plot = figure.getDomAttribute("data-plot");
            String at = where + ", figure " + plot;
            assertTrue(plot != null && PLOTS.contains(plot), at + ": data-plot is not one of " + PLOTS);
            assertTrue(shown.add(plot), at + ": shown twice");
            List<WebElement> svg = figure.findElements(By.cssSelector("svg"));
            assertEquals(1, svg.size(), at + ": one inline <svg>");
            for (String axis : List.of("g.x-axis", "g.y-axis")) {
                List<WebElement> labels = svg.get(0).findElements(By.cssSelector(axis + " text.axis-label"));
                assertFalse(labels.isEmpty(), at + ": no " + axis + " text.axis-label");
                assertFalse(text(labels.get(0)).isBlank(), at + ": " + axis + " has an empty axis label");
            }
            assertFalse(figure.findElements(By.cssSelector("details.plot-data table tr:has(td)")).isEmpty(),
                    at + ": details.plot-data has no table row of numbers");
        }
        Set<String> curves = new TreeSet<>(doc.path("curves").propertyNames());
        assertEquals(curves, shown, where + ": data-plot names against the JSON curves");
        if (!doc.path("conditions").isEmpty()) {
            assertTrue(shown.containsAll(NEEDED_PLOTS), where + ": has conditions, so needs " + NEEDED_PLOTS
                    + ", shows " + shown);
        }
    }

    private static void assertWeighSheet(String where, WebElement section, JsonNode doc) {
        Map<String, JsonNode> lines = new LinkedHashMap<>();
        doc.path("weighSheet").path("lines").forEach(l -> lines.put(l.path("pointer").asString(), l));
        Map<String, WebElement> rows = new LinkedHashMap<>();
        for (WebElement row : section.findElements(By.cssSelector("table.weigh-sheet tr[data-pointer]"))) {
            assertTrue(rows.put(row.getDomAttribute("data-pointer"), row) == null,
                    where + ": two weigh-sheet rows for " + row.getDomAttribute("data-pointer"));
        }
        assertEquals(lines.keySet(), rows.keySet(), where + ": weigh-sheet rows against the JSON lines");
        // a batch record shows its additions against the master instead of a weigh sheet
        assertTrue(!lines.isEmpty() || doc.path("conditions").isEmpty() || doc.has("batch"),
                where + ": analysed, but no weigh sheet");
        for (Map.Entry<String, WebElement> e : rows.entrySet()) {
            JsonNode line = lines.get(e.getKey());
            String at = where + ", line " + e.getKey();
            Set<String> seen = new LinkedHashSet<>();
            for (WebElement cell : e.getValue().findElements(By.cssSelector("td[data-field]"))) {
                String field = cell.getDomAttribute("data-field");
                String shown = text(cell);
                assertTrue(seen.add(field), at + ": two cells for " + field);
                if (field.equals("recorded")) {
                    assertTrue(line.path("recorded").isString(), at + ": the JSON line has no recorded string");
                    assertEquals(line.path("recorded").asString(), shown, at + ": recorded");
                    continue;
                }
                assertTrue(LINE_FIELDS.contains(field), at + ": unknown data-field " + field);
                JsonNode value = line.path(field);
                assertTrue(value.isNumber(), at + ": the cell shows " + field + " '" + shown
                        + "', the JSON line has " + value);
                assertEquals(0, value.decimalValue().compareTo(number(at + ", " + field, shown)),
                        at + ": " + field + " shown '" + shown + "', JSON " + value.decimalValue());
            }
            assertTrue(seen.contains("recorded"), at + ": no recorded cell");
            for (String field : LINE_FIELDS) {
                assertTrue(seen.contains(field) || !line.path(field).isNumber(),
                        at + ": the JSON line has " + field + " but no cell shows it");
            }
        }
    }

    private static BigDecimal number(String at, String text) {
        try {
            return new BigDecimal(text);
        } catch (NumberFormatException e) {
            throw new AssertionError(at + ": '" + text + "' is not a number as JSON prints it", e);
        }
    }

    /** Every request the page made (DevTools' Network.requestWillBeSent) is the report itself or a data: URL. */
    private static void assertRequestsOnlyItself(String url, List<LogEntry> performance) {
        List<String> requested = new ArrayList<>();
        for (LogEntry entry : performance) {
            Map<String, Object> message = asMap(JSON.<Map<String, Object>>toType(entry.getMessage(), Json.MAP_TYPE)
                    .get("message"));
            if ("Network.requestWillBeSent".equals(message.get("method"))) {
                requested.add(String.valueOf(asMap(asMap(message.get("params")).get("request")).get("url")));
            }
        }
        assertTrue(requested.contains(url), () -> "the performance log shows no request of the report itself "
                + url + ", so it cannot tell what else was fetched: " + requested);
        List<String> others = requested.stream().filter(u -> !u.equals(url) && !u.startsWith("data:")).toList();
        assertTrue(others.isEmpty(), () -> "the report fetched " + others);
    }

    private static void assertConsoleQuiet(List<LogEntry> console) {
        List<String> loud = console.stream().filter(e -> e.getLevel().intValue() >= Level.WARNING.intValue())
                .map(e -> e.getLevel() + " " + e.getMessage()).toList();
        assertTrue(loud.isEmpty(), () -> "the console shows " + loud);
    }

    /** The whole page, not only the window, as PNG (DevTools Page.captureScreenshot beyond the viewport). */
    private static void screenshot(Path file) throws IOException {
        Rect size = devTools.send(Page.getLayoutMetrics()).getCssContentSize();
        String png = devTools.send(Page.captureScreenshot(Optional.of(Page.CaptureScreenshotFormat.PNG),
                Optional.empty(), Optional.of(new Viewport(0, 0, size.getWidth(), size.getHeight(), 1)),
                Optional.empty(), Optional.of(true), Optional.empty()));
        Files.createDirectories(file.getParent());
        Files.write(file, Base64.getDecoder().decode(png));
    }

    private static String text(WebElement e) {
        return String.valueOf(e.getDomProperty("textContent")).strip();
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> asMap(Object o) {
        if (!(o instanceof Map)) {
            fail("unexpected performance log entry: " + o);
        }
        return (Map<String, Object>) o;
    }
}
