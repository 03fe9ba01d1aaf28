package org.protolyte.fuzz;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.time.Instant;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Timeout;
import org.protolyte.document.JsonReader;
import org.protolyte.document.Problem;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.HtmlRenderer;
import org.protolyte.report.JsonRenderer;
import org.protolyte.report.RunReport;
import org.protolyte.report.SarifRenderer;
import org.protolyte.report.TextRenderer;

import com.code_intelligence.jazzer.junit.FuzzTest;

/**
 * Whatever a check of arbitrary bytes reports, the text, JSON, HTML and SARIF renderers write it without throwing;
 * the JSON report (with the plots' points) conforms to its schema, the HTML parses without error and the SARIF log is
 * JSON (seeds: the sample formulations and batch records).
 */
class RenderersFuzzTest {

    private final JsonReader json = new JsonReader();
    /** With the points behind the plots, so that the HTML report draws every plot it can. */
    private static final org.protolyte.Protolyte WITH_CURVES = FuzzChecks.PROTOLYTE.withCurves();

    @FuzzTest
    @Timeout(60)
    void everyReportRendersInEveryFormat(byte[] input) {
        DocumentReport r = WITH_CURVES.check(FuzzChecks.SOURCE, input);
        RunReport run = new RunReport("fuzz", Instant.EPOCH, Map.of(), List.of(r), List.of());

        String text = new TextRenderer().render(run);
        assertTrue(text.contains(FuzzChecks.SOURCE), "the text report names the input");

        String report = new JsonRenderer().render(run);
        List<Problem> problems = FuzzChecks.SCHEMAS.validate(
                json.read("report.json", report.getBytes(StandardCharsets.UTF_8)), "report.schema.json");
        assertEquals(List.of(), problems, "the JSON report conforms to report.schema.json");

        org.jsoup.parser.Parser parser = org.jsoup.parser.Parser.htmlParser().setTrackErrors(10);
        org.jsoup.Jsoup.parse(new HtmlRenderer(java.util.Optional.of(org.protolyte.units.Quantity.parse("2 L")))
                .render(run), "", parser);
        assertEquals(List.of(), parser.getErrors().stream().map(Object::toString).toList(), "the HTML report parses");

        String sarif = new SarifRenderer().render(run);
        assertTrue(json.read("report.sarif", sarif.getBytes(StandardCharsets.UTF_8)).root().path("runs").isArray(),
                "the SARIF log is JSON with its runs");
    }
}
