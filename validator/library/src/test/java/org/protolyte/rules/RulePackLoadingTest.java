package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.document.DocumentException;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.Status;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;

/** The rule-pack loader: inheritance, changes to inherited rules, and every way a pack is refused, with its place. */
class RulePackLoadingTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(SCHEMAS);

    /**
     * A site pack on top of general: pka-near-target becomes an error with a tighter distance, titrant-plausible
     * changes one of its two parameters. Nothing else is copied.
     */
    private static final String SITE_PACK = """
            {
              "document": "rule-pack",
              "formatVersion": 1,
              "name": "site-strict",
              "version": "2.1.0",
              "extends": "general",
              "rules": [
                { "id": "pka-near-target", "severity": "error", "parameters": { "maxDistance": 0.3 } },
                { "id": "titrant-plausible", "parameters": { "maxEquivalents": 1.5 } }
              ]
            }
            """;

    private static RuleBook shipped() {
        return RuleBook.shipped(SCHEMAS, CheckKinds.load());
    }

    private static byte[] utf8(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    private static RuleBook withSitePack() {
        RuleBook book = shipped();
        book.add("site-strict.json", utf8(SITE_PACK), false);
        return book;
    }

    private static Rule rule(RuleBook book, String pack, String id) {
        return book.rules(List.of(pack)).stream().filter(r -> r.id().equals(id)).findFirst().orElseThrow();
    }

    /** A pack extending general with the given rule entries. */
    private static String pack(String name, String rules) {
        return "{\n"
                + "  \"document\": \"rule-pack\",\n"
                + "  \"formatVersion\": 1,\n"
                + "  \"name\": \"" + name + "\",\n"
                + "  \"version\": \"1.0.0\",\n"
                + "  \"extends\": \"general\",\n"
                + "  \"rules\": [\n"
                + rules + "\n"
                + "  ]\n"
                + "}\n";
    }

    /** Adds the pack to a fresh shipped book and returns the refusal. */
    private static DocumentException refused(String content) {
        return refused(utf8(content));
    }

    private static DocumentException refused(byte[] content) {
        RuleBook book = shipped();
        return assertThrows(DocumentException.class, () -> book.add("hostile.json", content, false));
    }

    private static Problem problemAt(DocumentException e, String pointer) {
        return e.problems().stream().filter(p -> p.pointer().equals(pointer)).findFirst()
                .orElseThrow(() -> new AssertionError("no problem at " + pointer + ": " + e.problems()));
    }

    private static byte[] example(String ruleId, String file) {
        String path = "/rule-examples/" + ruleId + "/" + file;
        try (InputStream in = RulePackLoadingTest.class.getResourceAsStream(path)) {
            if (in == null) {
                throw new IllegalStateException("missing " + path);
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static DocumentReport judge(RuleBook book, String pack, String ruleId, String file) {
        Protolyte p = new Protolyte(SCHEMAS, LIBRARY, new Checker(book, List.of(pack), List.of()), Severity.ERROR);
        return p.check(ruleId + "/" + file, example(ruleId, file));
    }

    private static List<Finding> findings(DocumentReport r, String ruleId) {
        return r.findings().stream().filter(f -> f.rule().equals(ruleId)).toList();
    }

    // ---- extending a shipped pack ----

    @Test
    void extendingPackKeepsEveryInheritedRule() {
        RuleBook book = withSitePack();
        Set<String> general = book.rules(List.of("general")).stream().map(Rule::id).collect(Collectors.toSet());
        Set<String> site = book.rules(List.of("site-strict")).stream().map(Rule::id).collect(Collectors.toSet());
        assertEquals(general, site);
    }

    @Test
    void changedRuleTakesTheNewSeverity() {
        assertEquals(Severity.ERROR, rule(withSitePack(), "site-strict", "pka-near-target").severity());
    }

    @Test
    void changedRuleTakesTheNewParameter() {
        assertEquals(0.3, rule(withSitePack(), "site-strict", "pka-near-target").number("maxDistance", -1), 0);
    }

    @Test
    void changedParameterIsMergedWithTheInheritedOnes() {
        Rule r = rule(withSitePack(), "site-strict", "titrant-plausible");
        assertEquals(1.5, r.number("maxEquivalents", -1), 0);
        assertEquals(rule(shipped(), "general", "titrant-plausible").number("nearFullEquivalent", -1),
                r.number("nearFullEquivalent", -2), 0);
    }

    @Test
    void changedRuleKeepsTheInheritedTexts() {
        Rule general = rule(shipped(), "general", "pka-near-target");
        Rule site = rule(withSitePack(), "site-strict", "pka-near-target");
        assertEquals(general.explanation(), site.explanation());
        assertEquals(general.references(), site.references());
        assertEquals(general.check(), site.check());
    }

    @Test
    void changedRuleNamesTheUserPack() {
        assertEquals("site-strict", rule(withSitePack(), "site-strict", "pka-near-target").pack());
    }

    @Test
    void unchangedRuleStillNamesThePackThatDefinedIt() {
        assertEquals("general", rule(withSitePack(), "site-strict", "revision-stated").pack());
    }

    @Test
    void extendingPackLeavesTheShippedPackAsItWas() {
        Rule r = rule(withSitePack(), "general", "pka-near-target");
        assertEquals(Severity.WARNING, r.severity());
        assertEquals("general", r.pack());
    }

    // The quiet example's target, pH 5.2, is about 0.44 from acetate's pKa 4.756 at 25 °C (the shipped library's
    // value): inside general's distance of 1.0, outside the site pack's 0.3.
    @Test
    void documentQuietUnderGeneralFailsUnderTheStricterPack() {
        DocumentReport r = judge(withSitePack(), "site-strict", "pka-near-target", "quiet.json");
        assertEquals(Status.FAIL, r.status(), () -> r.findings().toString());
        List<Finding> f = findings(r, "pka-near-target");
        assertEquals(1, f.size(), () -> r.findings().toString());
        assertEquals(Severity.ERROR, f.get(0).severity());
    }

    @Test
    void documentJudgedByTheUserPackNamesItsChain() {
        DocumentReport r = judge(withSitePack(), "site-strict", "pka-near-target", "quiet.json");
        assertEquals(List.of("general", "site-strict"), r.packs().stream().map(RulePack::name).toList());
    }

    @Test
    void sameDocumentUnderGeneralHasNoSuchFinding() {
        DocumentReport r = judge(withSitePack(), "general", "pka-near-target", "quiet.json");
        assertEquals(List.of(), findings(r, "pka-near-target"));
        assertEquals(Status.PASS, r.status(), () -> r.findings().toString());
    }

    // ---- switching a rule off ----

    @Test
    void disabledRuleIsMarkedDisabled() {
        RuleBook book = shipped();
        book.add("quiet-revisions.json", utf8(pack("quiet-revisions",
                "    { \"id\": \"revision-stated\", \"enabled\": false }")), false);
        assertFalse(rule(book, "quiet-revisions", "revision-stated").enabled());
    }

    @Test
    void disabledRuleReportsNothing() {
        RuleBook book = shipped();
        book.add("quiet-revisions.json", utf8(pack("quiet-revisions",
                "    { \"id\": \"revision-stated\", \"enabled\": false }")), false);
        DocumentReport r = judge(book, "quiet-revisions", "revision-stated", "fires.json");
        assertEquals(List.of(), findings(r, "revision-stated"));
    }

    // ---- refusals ----

    @Test
    void newRuleWithoutExplanationIsRefusedAtItsEntry() {
        DocumentException e = refused(pack("site", """
                    { "id": "site-hepes-cap", "check": "concentration-limit", "severity": "warning",
                      "parameters": { "substance": "HEPES", "max": "15 mmol/L" },
                      "summary": "HEPES stays below the site's cap.", "references": ["common practice"] }"""));
        Problem p = problemAt(e, "/rules/0");
        assertTrue(p.message().contains("explanation"), p::toString);
        assertTrue(p.location().isPresent(), p::toString);
        assertEquals(8, p.location().get().line(), p::toString);
    }

    @Test
    void unknownCheckKindIsRefusedAtItsCheckListingTheKnownKinds() {
        DocumentException e = refused(pack("site", """
                    { "id": "site-osmolality", "check": "tonicity-by-freezing-point", "severity": "warning",
                      "summary": "Osmolality within range.", "explanation": "Tonicity matters.",
                      "references": ["common practice"] }"""));
        Problem p = problemAt(e, "/rules/0/check");
        assertTrue(p.message().contains("tonicity-by-freezing-point"), p::toString);
        for (String kind : CheckKinds.load().all().keySet()) {
            assertTrue(p.message().contains(kind), () -> kind + " not listed: " + p);
        }
        assertEquals(8, p.location().orElseThrow().line(), p::toString);
    }

    /** A range with its ends swapped judges nothing as written: refused at load, not left to each check to read. */
    @Test
    void aRangeWithMinAboveMaxIsRefusedAtItsParameters() {
        DocumentException e = refused(pack("site", """
                    { "id": "site-osmolality", "check": "osmolality-range", "severity": "error",
                      "parameters": { "min": 2000, "max": 1000 },
                      "summary": "Osmolality within range.", "explanation": "Tonicity matters.",
                      "references": ["common practice"] }"""));
        Problem p = problemAt(e, "/rules/0/parameters");
        assertTrue(p.message().contains("min 2000") && p.message().contains("max 1000"), p::toString);
    }

    @Test
    void parameterOfTheWrongTypeIsRefusedAtTheParameter() {
        DocumentException e = refused(pack("site", """
                    { "id": "pka-near-target",
                      "parameters": { "maxDistance": "one" } }"""));
        Problem p = problemAt(e, "/rules/0/parameters/maxDistance");
        assertEquals(9, p.location().orElseThrow().line(), p::toString);
    }

    @Test
    void unknownParameterIsRefusedByName() {
        DocumentException e = refused(pack("site", """
                    { "id": "pka-near-target",
                      "parameters": { "maxDistanse": 0.5 } }"""));
        Problem p = problemAt(e, "/rules/0/parameters/maxDistanse");
        assertTrue(p.message().contains("maxDistance"), () -> "no suggestion of the known name: " + p);
        assertEquals(9, p.location().orElseThrow().line(), p::toString);
    }

    @Test
    void newRuleWithParametersItsKindDoesNotAcceptIsRefused() {
        DocumentException e = refused(pack("site", """
                    { "id": "site-ph-window", "check": "ph-within-limits", "severity": "warning",
                      "parameters": { "min": "6.5" },
                      "summary": "pH window.", "explanation": "Site window.", "references": ["common practice"] }"""));
        Problem p = problemAt(e, "/rules/0/parameters/min");
        assertTrue(p.location().isPresent(), p::toString);
    }

    @Test
    void extendingAnUnknownPackIsRefusedAtExtends() {
        DocumentException e = refused(pack("site", "    { \"id\": \"revision-stated\", \"severity\": \"warning\" }")
                .replace("\"extends\": \"general\"", "\"extends\": \"generall\""));
        Problem p = problemAt(e, "/extends");
        assertTrue(p.message().contains("generall"), p::toString);
        assertTrue(p.message().contains("general,") || p.message().endsWith("general")
                || p.message().contains("general "), () -> "known packs not listed: " + p);
        assertEquals(6, p.location().orElseThrow().line(), p::toString);
    }

    @Test
    void packNamedLikeAShippedPackIsRefusedAtName() {
        DocumentException e = refused(pack("parenteral", "    { \"id\": \"revision-stated\", \"severity\": \"warning\" }"));
        Problem p = problemAt(e, "/name");
        assertTrue(p.message().contains("parenteral"), p::toString);
        assertEquals(4, p.location().orElseThrow().line(), p::toString);
    }

    @Test
    void sameUserPackAddedTwiceIsRefusedTheSecondTime() {
        RuleBook book = shipped();
        book.add("site-strict.json", utf8(SITE_PACK), false);
        DocumentException e = assertThrows(DocumentException.class,
                () -> book.add("copy/site-strict.json", utf8(SITE_PACK), false));
        Problem p = problemAt(e, "/name");
        assertTrue(p.message().contains("site-strict.json"), () -> "the first file is not named: " + p);
    }

    @Test
    void refusedPackIsNotLeftInTheBook() {
        RuleBook book = shipped();
        assertThrows(DocumentException.class, () -> book.add("hostile.json", utf8(pack("site",
                "    { \"id\": \"pka-near-target\", \"parameters\": { \"maxDistance\": \"one\" } }")), false));
        assertEquals(Optional.empty(), book.pack("site"));
    }

    @Test
    void fileLargerThanOneMebibyteIsRefusedBeforeParsing() {
        // not JSON at all: a parser would complain about the first byte, the size check comes first
        byte[] big = new byte[1024 * 1024 + 1];
        Arrays.fill(big, (byte) '!');
        DocumentException e = refused(big);
        assertEquals(1, e.problems().size(), () -> e.problems().toString());
        Problem p = e.problems().get(0);
        assertEquals("", p.pointer());
        assertTrue(p.message().contains("1 MiB"), p::toString);
    }

    @Test
    void fileOfExactlyOneMebibyteIsRead() {
        // a valid pack padded with spaces to exactly 1 MiB passes the size check
        byte[] packBytes = utf8(pack("padded", "    { \"id\": \"revision-stated\", \"severity\": \"warning\" }"));
        byte[] padded = new byte[1024 * 1024];
        Arrays.fill(padded, (byte) ' ');
        System.arraycopy(packBytes, 0, padded, 0, packBytes.length);
        RuleBook book = shipped();
        assertEquals("padded", book.add("padded.json", padded, false).name());
    }

    /** A pack whose description is an array nested 70 deep, on line 6. */
    private static DocumentException refusedForNesting() {
        String deep = "[".repeat(70) + "]".repeat(70);
        return refused(pack("site", "    { \"id\": \"revision-stated\", \"severity\": \"warning\" }")
                .replace("\"version\": \"1.0.0\",", "\"version\": \"1.0.0\",\n  \"description\": " + deep + ","));
    }

    @Test
    void nestingDeeperThanSixtyFourLevelsIsRefusedNamingTheNesting() {
        DocumentException e = refusedForNesting();
        assertEquals(1, e.problems().size(), () -> e.problems().toString());
        Problem p = e.problems().get(0);
        assertTrue(p.message().toLowerCase(java.util.Locale.ROOT).contains("nesting"), p::toString);
        assertTrue(p.message().contains("64"), p::toString);
    }

    @Test
    void nestingDeeperThanSixtyFourLevelsIsRefusedAtItsPointer() {
        Problem p = refusedForNesting().problems().get(0);
        assertTrue(p.pointer().startsWith("/description/0/0"), p::toString);
    }

    @Test
    void nestingDeeperThanSixtyFourLevelsIsRefusedWithItsLine() {
        Problem p = refusedForNesting().problems().get(0);
        assertEquals(6, p.location().orElseThrow().line(), p::toString);
    }

    @Test
    void formulationDocumentIsRefusedAsNotARulePack() {
        byte[] formulation = example("revision-stated", "quiet.json");
        DocumentException e = refused(formulation);
        Problem p = problemAt(e, "/document");
        assertTrue(p.message().contains("rule-pack"), p::toString);
        assertEquals(2, p.location().orElseThrow().line(), p::toString);
    }

    @Test
    void changingTheCheckKindOfAnInheritedRuleIsRefusedAtItsCheck() {
        DocumentException e = refused(pack("site", """
                    { "id": "pka-near-target", "check": "buffer-capacity-range",
                      "parameters": { "min": 5 } }"""));
        Problem p = problemAt(e, "/rules/0/check");
        assertTrue(p.message().contains("pka-near-target"), p::toString);
        assertEquals(8, p.location().orElseThrow().line(), p::toString);
    }

    @Test
    void everyBrokenEntryOfAPackIsReportedAtOnce() {
        DocumentException e = refused(pack("site", """
                    { "id": "pka-near-target", "parameters": { "maxDistance": "one" } },
                    { "id": "site-osmolality", "check": "tonicity-by-freezing-point", "severity": "warning",
                      "summary": "s", "explanation": "e", "references": ["common practice"] }"""));
        problemAt(e, "/rules/0/parameters/maxDistance");
        problemAt(e, "/rules/1/check");
    }

    @Test
    void packThatBreaksItsSchemaIsRefusedAtThePlace() {
        DocumentException e = refused(pack("site", "    { \"id\": \"revision-stated\", \"severity\": \"fatal\" }"));
        Problem p = problemAt(e, "/rules/0/severity");
        assertEquals(8, p.location().orElseThrow().line(), p::toString);
    }

    // ---- a rule aimed at a condition the document lacks ----

    @Test
    void ruleNamingAConditionTheDocumentLacksMakesItIndeterminate() {
        RuleBook book = shipped();
        book.add("site-typo.json", utf8(pack("site-typo", """
                    { "id": "site-use-ph", "check": "ph-within-limits", "severity": "error",
                      "parameters": { "min": 0, "max": 1, "condition": "usee" },
                      "summary": "s", "explanation": "e", "references": ["common practice"] }""")), false);
        DocumentReport r = judge(book, "site-typo", "revision-stated", "quiet.json");
        assertEquals(Status.INDETERMINATE, r.status(), () -> r.status() + " " + r.diagnostics());
        assertTrue(r.diagnostics().stream().anyMatch(d -> d.code().equals("rule-not-judged")
                && d.message().contains("'usee'") && d.message().contains("site-use-ph")), r.diagnostics()::toString);
    }

    @Test
    void driftFromAConditionTheDocumentLacksMakesItIndeterminate() {
        RuleBook book = shipped();
        book.add("site-drift.json", utf8(pack("site-drift", """
                    { "id": "temperature-drift", "parameters": { "maxChange": 0.3, "from": "mixing" } }""")), false);
        DocumentReport r = judge(book, "site-drift", "revision-stated", "quiet.json");
        assertEquals(Status.INDETERMINATE, r.status(), () -> r.status() + " " + r.diagnostics());
        assertTrue(r.diagnostics().stream().anyMatch(d -> d.code().equals("rule-not-judged")
                && d.message().contains("'mixing'") && d.message().contains("temperature-drift")), r.diagnostics()::toString);
    }

    @Test
    void aPerDoseLimitOnADocumentWithoutADoseMakesItIndeterminate() {
        RuleBook book = shipped();
        book.add("site-dose.json", utf8(pack("site-dose", """
                    { "id": "site-sodium-per-dose", "check": "amount-per-dose", "severity": "note",
                      "parameters": { "ion": "Na+", "maxPerDose": "1 mmol" },
                      "summary": "s", "explanation": "e", "references": ["common practice"] }""")), false);
        DocumentReport r = judge(book, "site-dose", "revision-stated", "quiet.json");
        assertEquals(Status.INDETERMINATE, r.status(), () -> r.status() + " " + r.diagnostics());
        assertTrue(r.diagnostics().stream().anyMatch(d -> d.code().equals("rule-not-judged")
                && d.message().contains("site-sodium-per-dose") && d.message().contains("dose.volume")),
                r.diagnostics()::toString);
    }

    @Test
    void ruleNamingAConditionTheDocumentHasJudgesIt() {
        RuleBook book = shipped();
        book.add("site-use.json", utf8(pack("site-use", """
                    { "id": "site-use-ph", "check": "ph-within-limits", "severity": "error",
                      "parameters": { "min": 0, "max": 1, "condition": "use" },
                      "summary": "s", "explanation": "e", "references": ["common practice"] }""")), false);
        DocumentReport r = judge(book, "site-use", "revision-stated", "quiet.json");
        assertEquals(Status.FAIL, r.status(), () -> r.status() + " " + r.diagnostics());
        assertEquals(1, findings(r, "site-use-ph").size(), r.findings()::toString);
    }
}
