package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.time.LocalDate;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.protolyte.Protolyte;
import org.protolyte.document.Digests;
import org.protolyte.document.DocumentException;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.Status;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;

/** Waivers accept one finding on one revision; stale, expired and unused waivers are findings of their own. */
class WaiversTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(SCHEMAS);
    private static final LocalDate TODAY = LocalDate.of(2026, 12, 1);

    /** An equimolal phosphate buffer (pH 6.865 at 25 °C, Buck et al. 2002) against a target it misses. */
    private static final String DOC = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-WVR\","
            + " \"revision\": \"C\", \"basis\": {\"waterMass\": \"1 kg\"}, \"components\": ["
            + "{\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"25 mmol/kg\"},"
            + "{\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": \"25 mmol/kg\"}],"
            + " \"targets\": {\"pH\": {\"value\": 7.2, \"tolerance\": 0.1, \"temperature\": \"25 Cel\"}}%s}";

    private static String waiverFile(String revision, String expires, String extra) {
        return "{\"document\": \"waivers\", \"formatVersion\": 1, \"waivers\": [{\"rule\": \"ph-within-target\","
                + " \"documentId\": \"TST-WVR\", \"revision\": \"" + revision + "\", \"reason\": \"Accepted for a "
                + "stability study batch only.\", \"approver\": \"QA (test)\", \"approved\": \"2026-11-01\","
                + " \"expires\": \"" + expires + "\"" + extra + "}]}";
    }

    private static DocumentReport check(String waivers, String docExtra, Checker checker) {
        return check(waivers, docExtra, checker, TODAY, Severity.ERROR);
    }

    private static DocumentReport check(String waivers, String docExtra, Checker checker, LocalDate runDate,
                                        Severity failOn) {
        List<Waiver> held = waivers.isEmpty() ? List.of()
                : WaiverFile.read(SCHEMAS, "waivers.json", waivers.getBytes(StandardCharsets.UTF_8));
        Protolyte p = new Protolyte(SCHEMAS, LIBRARY, checker, failOn, new Waivers(held, runDate));
        return p.check("doc.json", String.format(DOC, docExtra).getBytes(StandardCharsets.UTF_8));
    }

    private static DocumentReport check(String waivers) {
        return check(waivers, "", Checker.byIntendedUse(RuleBook.shipped(SCHEMAS, CheckKinds.load())));
    }

    private static List<String> rules(DocumentReport r) {
        return r.findings().stream().map(Finding::rule).toList();
    }

    @Test
    void withoutAWaiverTheMissedTargetFails() {
        assertEquals(Status.FAIL, check("").status());
    }

    @Test
    void aMatchingWaiverPassesTheGateAndKeepsTheFinding() {
        DocumentReport r = check(waiverFile("C", "2027-06-01", ""));
        assertEquals(Status.PASS, r.status());
        Finding f = r.findings().stream().filter(x -> x.rule().equals("ph-within-target")).findFirst().orElseThrow();
        assertEquals("QA (test)", f.waivedBy().orElseThrow().approver());
    }

    @Test
    void aWaiverForAnotherRevisionIsStaleAndFails() {
        DocumentReport r = check(waiverFile("B", "2027-06-01", ""));
        assertEquals(Status.FAIL, r.status());
        assertTrue(rules(r).contains(Waivers.STALE));
    }

    @Test
    void aWaiverForOtherBytesIsStaleAndFails() {
        DocumentReport r = check(waiverFile("C", "2027-06-01", ", \"sha256\": \"" + "0".repeat(64) + "\""));
        assertEquals(Status.FAIL, r.status());
        assertTrue(r.findings().stream().anyMatch(f -> f.rule().equals(Waivers.STALE) && f.message().contains("bytes")));
    }

    @Test
    void aWaiverBoundToTheseBytesMatches() {
        String sha = Digests.sha256(String.format(DOC, "").getBytes(StandardCharsets.UTF_8));
        assertEquals(Status.PASS, check(waiverFile("C", "2027-06-01", ", \"sha256\": \"" + sha + "\"")).status());
    }

    @Test
    void anExpiredWaiverFails() {
        DocumentReport r = check(waiverFile("C", "2026-11-30", ""));
        assertEquals(Status.FAIL, r.status());
        assertTrue(rules(r).contains(Waivers.EXPIRED));
    }

    @Test
    void aWaiverWhoseRuleDidNotFireIsReportedUnused() {
        DocumentReport r = check(waiverFile("C", "2027-06-01", "").replace("ph-within-target", "pka-near-target"));
        assertTrue(rules(r).contains(Waivers.UNUSED));
    }

    @Test
    void anUnusedWaiverIsANoteSoFailOnWarningStillPasses() {
        String unused = waiverFile("C", "2027-06-01", "").replace("ph-within-target", "pka-near-target");
        // the document misses its target, so a second, matching waiver is needed for it to pass at all
        String both = unused.replace("}]}", "}, " + waiverFile("C", "2027-06-01", "")
                .substring(waiverFile("C", "2027-06-01", "").indexOf("[{") + 1));
        DocumentReport r = check(both, "", Checker.byIntendedUse(RuleBook.shipped(SCHEMAS, CheckKinds.load())),
                TODAY, Severity.WARNING);
        Finding f = r.findings().stream().filter(x -> x.rule().equals(Waivers.UNUSED)).findFirst().orElseThrow();
        assertEquals(Severity.NOTE, f.severity());
        assertEquals(Status.PASS, r.status(), () -> r.findings().toString());
    }

    @Test
    void aWaiverApprovedAfterTheRunDateIsRefusedAndTheFindingStands() {
        // approved 2026-11-01: on a run dated 2026-10-15 that approval lies in the future
        DocumentReport r = check(waiverFile("C", "2027-06-01", ""), "",
                Checker.byIntendedUse(RuleBook.shipped(SCHEMAS, CheckKinds.load())), LocalDate.of(2026, 10, 15),
                Severity.ERROR);
        assertEquals(Status.FAIL, r.status());
        Finding refusal = r.findings().stream().filter(x -> x.rule().equals(Waivers.FUTURE)).findFirst().orElseThrow();
        assertTrue(refusal.message().contains("2026-10-15"), refusal::message);
        assertTrue(r.findings().stream().filter(x -> x.rule().equals("ph-within-target"))
                .allMatch(x -> x.waivedBy().isEmpty()));
    }

    @Test
    void theRunDateDecidesExpirySoAnArchiveReRunSeesTheWaiverAsItWas() {
        // expired on 2026-11-30 for today's run, valid on the day of the archived run
        DocumentReport r = check(waiverFile("C", "2026-11-30", ""), "",
                Checker.byIntendedUse(RuleBook.shipped(SCHEMAS, CheckKinds.load())), LocalDate.of(2026, 11, 15),
                Severity.ERROR);
        assertEquals(Status.PASS, r.status(), () -> r.findings().toString());
    }

    @Test
    void aWaiverExpiringBeforeItsApprovalIsRefused() {
        assertThrows(DocumentException.class, () -> WaiverFile.read(SCHEMAS, "w.json",
                waiverFile("C", "2026-10-01", "").getBytes(StandardCharsets.UTF_8)));
    }

    private static final String OWN_WAIVER = ", \"waivers\": [{\"rule\": \"ph-within-target\", \"reason\": \"Author "
            + "accepts the drift for this lab batch.\", \"approver\": \"author (test)\", \"approved\": \"2026-11-01\","
            + " \"expires\": \"2027-01-01\"}]";

    @Test
    void aWaiverInTheDocumentIsIgnoredUnlessAPackAllowsIt() {
        DocumentReport r = check("", OWN_WAIVER, Checker.byIntendedUse(RuleBook.shipped(SCHEMAS, CheckKinds.load())));
        assertEquals(Status.FAIL, r.status());
        assertTrue(rules(r).contains(Waivers.NOT_ALLOWED));
    }

    @Test
    void aWaiverInTheDocumentCountsWhereAPackAllowsItAndIsMarkedAsTheAuthors() {
        RuleBook book = RuleBook.shipped(SCHEMAS, CheckKinds.load());
        book.add("lab.json", ("{\"document\": \"rule-pack\", \"formatVersion\": 1, \"name\": \"lab-site\","
                + " \"version\": \"1\", \"extends\": \"general\", \"documentWaivers\": true, \"rules\": []}")
                .getBytes(StandardCharsets.UTF_8), false);
        DocumentReport r = check("", OWN_WAIVER, new Checker(book, List.of("lab-site"), List.of()));
        assertEquals(Status.PASS, r.status());
        assertTrue(r.findings().stream().anyMatch(f -> f.waivedBy().map(Waiver::authorGranted).orElse(false)));
    }

    /** ISO 8601 has no month 13 and no 30 February; a waiver dated so is refused where it is read, never applied. */
    @ParameterizedTest
    @ValueSource(strings = {"2026-13-45", "2026-02-30"})
    void aWaiverFileWithAnImpossibleDateIsRefusedAtItsPlace(String date) {
        DocumentException e = assertThrows(DocumentException.class, () -> WaiverFile.read(SCHEMAS, "w.json",
                waiverFile("C", "2027-06-01", "").replace("2026-11-01", date).getBytes(StandardCharsets.UTF_8)));
        assertEquals("/waivers/0/approved", e.problems().get(0).pointer(), e.problems()::toString);
        assertTrue(e.problems().get(0).message().contains(date), e.problems()::toString);
    }

    /** A document's own waiver is read with the document: an impossible one is INVALID whatever the packs allow. */
    @ParameterizedTest
    @ValueSource(strings = {"\"approved\": \"2026-13-45\"", "\"approved\": \"2026-02-30\"",
        "\"expires\": \"2026-10-01\""})
    void aDocumentWaiverWithAnImpossibleDateIsInvalidAtItsPlace(String field) {
        String name = field.substring(1, field.indexOf('"', 1));
        String waiver = OWN_WAIVER.replaceAll("\"" + name + "\": \"[0-9-]+\"", java.util.regex.Matcher.quoteReplacement(field));
        assertTrue(!waiver.equals(OWN_WAIVER), "the change did not apply");
        DocumentReport r = check("", waiver, Checker.byIntendedUse(RuleBook.shipped(SCHEMAS, CheckKinds.load())));
        assertEquals(Status.INVALID, r.status(), () -> r.findings().toString());
        assertEquals("/waivers/0/" + name, r.findings().get(0).pointer().orElseThrow(), () -> r.findings().toString());
    }
}
