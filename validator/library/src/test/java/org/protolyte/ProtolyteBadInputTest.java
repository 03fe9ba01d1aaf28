package org.protolyte;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.RunReport;
import org.protolyte.report.Status;
import org.protolyte.substance.LibraryLoader;

class ProtolyteBadInputTest {

    private static Protolyte protolyte;

    @BeforeAll
    static void load() {
        SchemaCatalog schemas = new SchemaCatalog();
        protolyte = new Protolyte(schemas, LibraryLoader.shipped(schemas));
    }

    @Test
    void missingFileIsAnInvalidReportNotAnException(@TempDir Path dir) {
        Path missing = dir.resolve("TST-missing.json");
        DocumentReport r = protolyte.check(missing);
        assertEquals(Status.INVALID, r.status());
        assertEquals(missing.toString(), r.source());
        assertEquals(Protolyte.INVALID_DOCUMENT, r.findings().get(0).rule());
        assertTrue(r.findings().get(0).message().contains("file not found"), r.findings().toString());
    }

    @Test
    void oneBadFileDoesNotStopTheOthers(@TempDir Path dir) {
        RunReport run = protolyte.check(List.of(dir.resolve("absent.json"), TestDocs.resource("malformed.json"),
                TestDocs.resource("pass-acetate.json")));
        assertEquals(List.of(Status.INVALID, Status.INVALID, Status.PASS),
                run.reports().stream().map(DocumentReport::status).toList());
        assertEquals(2, run.exitCode());
    }

    @Test
    void idOfAnInvalidDocumentIsStillReported() {
        DocumentReport r = protolyte.check("t.json", TestDocs.resourceBytes("invalid-unit.json"));
        assertEquals(Status.INVALID, r.status());
        assertEquals(Optional.of("TST-003"), r.id());
    }

    @Test
    void amountsThatFillTheWholeFinalVolumeAreInvalid() {
        DocumentReport r = protolyte.check("t.json", TestDocs.bytes(TestDocs.formulation(
                "{\"substance\": \"sodium chloride\", \"amount\": \"5 kg\"}", "")));
        assertEquals(Status.INVALID, r.status(), () -> r.diagnostics().toString());
        assertTrue(r.findings().stream().anyMatch(f -> f.pointer().orElse("").startsWith("/components")),
                r.findings()::toString);
    }
}
