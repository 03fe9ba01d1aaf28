package org.protolyte.substance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.TestDocs;
import org.protolyte.document.DocumentException;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.recipe.Ingredient;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.Status;
import org.protolyte.rules.Finding;

class UserLibraryTest {

    private static final String USER = "tst-user-library.json";
    private static SchemaCatalog schemas;

    @BeforeAll
    static void load() {
        schemas = new SchemaCatalog();
    }

    private static String library(String substances) {
        return "{\n\"document\": \"substance-library\",\n\"formatVersion\": 1,\n"
                + "\"substances\": [\n" + substances + "\n]\n}";
    }

    private static LibraryLoader withUser(String json) {
        return new LibraryLoader(schemas).addShipped().add(USER, TestDocs.bytes(json), true);
    }

    private static List<Problem> refused(String json) {
        LibraryLoader loader = new LibraryLoader(schemas).addShipped();
        DocumentException e = assertThrows(DocumentException.class,
                () -> loader.add(USER, TestDocs.bytes(json), true));
        return e.problems();
    }

    private static final String NEW_SALT = "{\"name\": \"TST tonicity salt\", \"synonyms\": [\"TST-TS\"],\n"
            + " \"formula\": \"KCl\", \"composition\": {\"ions\": {\"K+\": 1, \"Cl-\": 1}}}";

    @Test
    void userSubstanceIsAddedAndResolvable() {
        SubstanceLibrary lib = withUser(library(NEW_SALT)).build();
        Substance s = lib.lookup("tst ts");
        assertEquals("TST tonicity salt", s.name());
        assertEquals(USER, s.origin());
        assertEquals(lib.lookup("KCl").molarMass().getAsDouble(), s.molarMass().getAsDouble(), 1e-9,
                "same formula, same molar mass");
    }

    @Test
    void userSubstanceCanBeUsedInARecipe() {
        Protolyte p = new Protolyte(schemas, withUser(library(NEW_SALT)).build());
        DocumentReport r = p.check("recipe.json", TestDocs.bytes(TestDocs.formulation(
                TestDocs.ACETATE + ",\n{\"substance\": \"TST tonicity salt\", \"amount\": \"2 g\"}",
                ",\n\"targets\": {\"pH\": {\"value\": 4.7, \"tolerance\": 0.5, \"temperature\": \"25 Cel\"}}")));
        assertEquals(Status.PASS, r.status(), () -> r.findings() + " " + r.diagnostics());
        Ingredient salt = r.analysis().orElseThrow().recipe().ingredients().get(2);
        assertEquals(USER, salt.substance().origin());
        assertEquals(2.0 / salt.substance().molarMass().getAsDouble(), salt.value(), 1e-12,
                "2 g per 1 L basis, in moles");
    }

    @Test
    void shippedRecipeNameIsUnknownWithoutTheUserLibrary() {
        Protolyte p = new Protolyte(schemas, LibraryLoader.shipped(schemas));
        DocumentReport r = p.check("recipe.json", TestDocs.bytes(TestDocs.formulation(
                "{\"substance\": \"TST tonicity salt\", \"amount\": \"2 g\"}", "")));
        assertEquals(Status.INVALID, r.status());
    }

    @Test
    void userEntryClashingWithShippedNameNeedsReplaces() {
        Problem p = refused(library("{\"name\": \"sodium chloride\", \"formula\": \"NaCl\",\n"
                + " \"composition\": {\"ions\": {\"Na+\": 1, \"Cl-\": 1}}}")).get(0);
        assertEquals("/substances/0/name", p.pointer());
        assertTrue(p.message().contains("'sodium chloride' is already defined"), p.message());
        assertTrue(p.message().contains("\"replaces\": true"), p.message());
        assertEquals(5, p.location().orElseThrow().line());
    }

    @Test
    void userSynonymClashingWithShippedSynonymIsRefusedAtTheSynonym() {
        Problem p = refused(library("{\"name\": \"TST brine salt\", \"synonyms\": [\"TST-B\", \"NaCl\"],\n"
                + " \"formula\": \"NaCl\", \"composition\": {\"ions\": {\"Na+\": 1, \"Cl-\": 1}}}")).get(0);
        assertEquals("/substances/0/synonyms/1", p.pointer());
        assertTrue(p.message().contains("'NaCl' already names 'sodium chloride'"), p.message());
    }

    @Test
    void userEntryWithReplacesTrueReplacesTheShippedOne() {
        SubstanceLibrary lib = withUser(library("{\"name\": \"sodium chloride\", \"replaces\": true,\n"
                + " \"formula\": \"NaCl\", \"composition\": {\"ions\": {\"Na+\": 1, \"Cl-\": 1}},\n"
                + " \"notes\": \"TST replacement entry\"}")).build();
        Substance s = lib.lookup("sodium chloride");
        assertEquals(USER, s.origin());
        assertEquals("TST replacement entry", s.notes());
        assertEquals(1, lib.substances().stream().filter(x -> x.name().equals("sodium chloride")).count());
    }

    @Test
    void shippedLibraryCannotBeReplacedByANonUserFile() {
        LibraryLoader loader = new LibraryLoader(schemas).addShipped();
        assertThrows(DocumentException.class, () -> loader.add("second.json", TestDocs.bytes(library(
                "{\"name\": \"sodium chloride\", \"replaces\": true, \"formula\": \"NaCl\",\n"
                        + " \"composition\": {\"ions\": {\"Na+\": 1, \"Cl-\": 1}}}")), false));
    }

    @Test
    void declaredMolarMassThatContradictsTheFormulaIsRefused() {
        Problem p = refused(library("{\"name\": \"TST heavy salt\", \"formula\": \"KCl\", \"molarMass\": 80.0,\n"
                + " \"composition\": {\"ions\": {\"K+\": 1, \"Cl-\": 1}}}")).get(0);
        assertEquals("/substances/0/molarMass", p.pointer());
        assertTrue(p.message().contains("does not match the formula"), p.message());
    }

    @Test
    void declaredMolarMassWithinRoundingOfTheFormulaIsAccepted() {
        double computed = Formula.parse("KCl").molarMass();
        double declared = computed + LibraryLoader.MOLAR_MASS_TOLERANCE / 2;
        Substance s = withUser(library("{\"name\": \"TST rounded salt\", \"formula\": \"KCl\", \"molarMass\": "
                + declared + ",\n \"composition\": {\"ions\": {\"K+\": 1, \"Cl-\": 1}}}")).build()
                .lookup("TST rounded salt");
        assertEquals(computed, s.molarMass().getAsDouble(), 1e-9, "the formula's molar mass is the one used");
    }

    @Test
    void entryWithoutMolarMassWeighedInGramsMakesTheDocumentInvalid() {
        String lib = "{\n\"document\": \"substance-library\",\n\"formatVersion\": 1,\n"
                + "\"solutes\": [{\"name\": \"TST-polymer-solute\"}],\n"
                + "\"substances\": [{\"name\": \"TST polymer\", \"composition\": {\"solutes\": {\"TST-polymer-solute\": 1}}}]\n}";
        Protolyte p = new Protolyte(schemas, withUser(lib).build());
        DocumentReport r = p.check("recipe.json", TestDocs.bytes(TestDocs.formulation(
                "{\"substance\": \"TST polymer\", \"amount\": \"1 g\"}", "")));
        assertEquals(Status.INVALID, r.status());
        Finding f = r.findings().get(0);
        assertEquals("/components/0/amount", f.pointer().orElseThrow());
        assertTrue(f.message().contains("no molar mass"), f.message());
    }
}
