package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;

import tools.jackson.databind.JsonNode;

/** The HTML report's protein table says what the JSON report's {@code proteins} says, condition by condition. */
class HtmlProteinBlockTest {

    @Test
    void theProteinTableShowsTheJsonReportsChargeShareAndShift() throws IOException {
        Path sample = HtmlReports.ROOT.resolve("sample-formulations/parenteral-antibody-histidine-self-buffering.json");
        Path dir = HtmlReports.OUT.resolve("protein");
        Document html = Jsoup.parse(Files.readString(HtmlReports.html(sample, dir.resolve("antibody.html"))));
        JsonNode protein = HtmlReports.documents(HtmlReports.readJson(HtmlReports.json(sample,
                dir.resolve("antibody.json")))).get(0).path("proteins").get(0);
        var rows = html.select("table.protein tbody tr");
        assertEquals(protein.path("conditions").size(), rows.size());
        assertTrue(html.select("p.protein").text().contains(String.format(java.util.Locale.ROOT, "pI %.2f",
                protein.path("isoelectricPoint").asDouble())), html.select("p.protein").text());
        for (int i = 0; i < rows.size(); i++) {
            JsonNode c = protein.path("conditions").get(i);
            Element row = rows.get(i);
            assertEquals(c.path("name").asString(), row.child(0).text());
            // each cell rounds the number the JSON prints with more digits: within half the cell's last digit of it
            assertEquals(c.path("netCharge").asDouble(), Double.parseDouble(row.child(1).text()), 0.05 + 0.005);
            assertEquals(100 * c.path("bufferShare").asDouble(), Double.parseDouble(row.child(2).text()
                    .replace(" %", "")), 0.5 + 0.05);
            assertTrue(row.child(3).text().startsWith("+") || row.child(3).text().startsWith("-"), row.child(3).text());
            assertEquals(c.path("pHShift").asDouble(), Double.parseDouble(row.child(3).text()), 0.005 + 0.0005);
        }
    }
}
