package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.protolyte.analysis.Analyzer;
import org.protolyte.analysis.DrugSolubility;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;

/** drug-solubility-margin on a weak acid's sodium salt brought to a pH with hydrochloric acid. */
class DrugSolubilityMarginTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    static final SubstanceLibrary LIBRARY = library();

    private static SubstanceLibrary library() {
        try (InputStream in = DrugSolubilityMarginTest.class.getResourceAsStream("test-drugs.json")) {
            return new LibraryLoader(SCHEMAS).addShipped().add("test-drugs.json", in.readAllBytes(), true).build();
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /** {@code grams} of sodium phenobarbital per litre brought to {@code pH} at 25 °C with hydrochloric acid. */
    static FormulationAnalysis analyse(String grams, double pH) {
        return analyse(grams, pH, "");
    }

    /** As {@link #analyse(String, double)}, with an admixture array's items. */
    static FormulationAnalysis analyse(String grams, double pH, String admixtures) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-DRUG\", \"revision\": \"A\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": [{\"substance\": \"sodium phenobarbital\","
                + " \"amount\": \"" + grams + "\"}, {\"substance\": \"hydrochloric acid\", \"adjustTo\": {\"pH\": " + pH
                + ", \"temperature\": \"25 Cel\"}}], \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}]"
                + (admixtures.isEmpty() ? "" : ", \"admixture\": [" + admixtures + "]") + "}";
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read("t", json.getBytes(StandardCharsets.UTF_8)));
        return new Analyzer(new Equilibrium(Davies.INSTANCE)).analyze(new RecipeResolver(LIBRARY).resolve(f));
    }

    private static List<Finding> check(FormulationAnalysis a, String parameters) {
        return new DrugSolubilityMargin().check(a, Analyses.rule("drug-solubility-margin", parameters));
    }

    @Test
    void aWeakAcidBelowThePhWhereItSeparatesIsFlaggedAtItsLine() {
        FormulationAnalysis low = analyse("10 g", 7.9);
        DrugSolubility.AtCondition x = low.drugs().get(0).conditions().get(0);
        assertTrue(x.log10Fraction() > 0, "10 g/L at pH 7.9 is above its solubility: " + x);
        List<Finding> f = check(low, "{}");
        assertEquals(1, f.size());
        assertEquals("/components/0", f.get(0).pointer().orElseThrow());
        assertTrue(f.get(0).message().startsWith("phenobarbital exceeds 100 % of its solubility: at use (pH 7.90)"),
                f.get(0).message());
        assertTrue(f.get(0).message().contains("phenobarbital (free form) allows"), f.get(0).message());
    }

    @Test
    void wellAboveItTheDrugPassesAndAMarginOrTheUncertaintyCanStillFlagIt() {
        FormulationAnalysis high = analyse("10 g", 9.5);
        DrugSolubility.AtCondition x = high.drugs().get(0).conditions().get(0);
        assertTrue(x.log10Fraction() < -1, x.toString());
        assertEquals(List.of(), check(high, "{}"));
        // a site's margin of a hundredth of the solubility catches it
        assertEquals(1, check(high, "{\"maxFraction\": 0.01}").size());
        // just below saturation: the central value passes, its uncertainty does not
        FormulationAnalysis edge = analyse("10 g", edgePH());
        DrugSolubility.AtCondition e = edge.drugs().get(0).conditions().get(0);
        assertTrue(e.log10Fraction() < 0 && e.log10Fraction() + 2 * e.uncertainty() > 0, e.toString());
        List<Finding> f = check(edge, "{}");
        assertEquals(1, f.size());
        assertTrue(f.get(0).message().contains("may exceed, within its uncertainty,"), f.get(0).message());
        assertEquals(List.of(), check(edge, "{\"coverage\": 0}"));
    }

    /** 0.05 pH above where 10 g/L reaches its solubility at the solution's medium. */
    private static double edgePH() {
        DrugSolubility.AtCondition x = analyse("10 g", 9.5).drugs().get(0).conditions().get(0);
        return x.window().orElseThrow().low().getAsDouble() + 0.05;
    }

    /**
     * Fail closed: the test library's constants hold at 20–30 °C, so the solution mixed 1 + 1 into the plasma model at
     * 37 °C has no pH, the rule cannot judge it there, and the document is INDETERMINATE with the admixture named;
     * 1 + 99 into saline at 25 °C is judged (unbuffered saline keeps the pH, the drug is diluted a hundredfold).
     */
    @Test
    void anAdmixtureOutsideTheDrugsDataLeavesTheDocumentIndeterminate() throws Exception {
        FormulationAnalysis a = analyse("10 g", 9.5, "{\"into\": \"plasma model\", \"ratio\": \"1 + 1\"},"
                + " {\"into\": \"normal saline\", \"ratio\": \"1 + 99\"}");
        assertEquals(2, a.admixtures().size());
        var plasma = a.admixtures().get(0);
        assertTrue(!plasma.result().determinate() && plasma.drugs().isEmpty(), plasma.result().caveats().toString());
        DrugSolubility.AtCondition saline = a.admixtures().get(1).drugs().get(0).conditions().get(0);
        assertEquals("into 0.9 % sodium chloride (1 + 99)", saline.condition());
        assertEquals(10 / 254.22 / 100, saline.dissolved(), 0.002 * 10 / 254.22 / 100, "a hundredth, per litre");
        assertTrue(saline.log10Fraction() < -1, saline.toString());
        assertEquals(List.of(), check(a, "{}"));
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-ADM\", \"basis\": "
                + "{\"finalVolume\": \"1 L\"}, \"components\": [{\"substance\": \"sodium phenobarbital\", \"amount\": "
                + "\"10 g\"}], \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}], \"admixture\": "
                + "[{\"into\": \"plasma model\", \"ratio\": \"1 + 1\"}]}";
        byte[] library;
        try (InputStream in = DrugSolubilityMarginTest.class.getResourceAsStream("test-drugs.json")) {
            library = in.readAllBytes();
        }
        org.protolyte.api.Result r = org.protolyte.api.Validator.builder().substanceLibrary("test-drugs.json", library)
                .build().check(org.protolyte.api.Source.of("adm.json", json.getBytes(StandardCharsets.UTF_8)));
        assertEquals(org.protolyte.api.Status.INDETERMINATE, r.status());
        assertTrue(r.diagnostics().stream().anyMatch(d -> d.indeterminate()
                && d.condition().orElse("").equals("into plasma model (1 + 1)")), r.diagnostics().toString());
    }

    /**
     * The weak-base sample (invented demo constants, site library) with a third admixture: the finding names the
     * admixture with the least room (found here from the analysis, not written in), and lists every condition and
     * admixture with its share.
     */
    @Test
    void theFindingNamesTheAdmixtureWithTheLeastRoomAndListsEveryOne() throws IOException {
        java.nio.file.Path root = java.nio.file.Path.of(System.getProperty("protolyte.projectRoot", "../.."),
                "sample-formulations", "site-library");
        SubstanceLibrary site = new LibraryLoader(SCHEMAS).addShipped().add("site-substances.json",
                java.nio.file.Files.readAllBytes(root.resolve("site-substances.json")), true).build();
        String json = java.nio.file.Files.readString(root.resolve("parenteral-weak-base-injection-acetate.json"))
                .replace("\"ratio\": \"1 + 4\"", "\"ratio\": \"1 + 4\"\n    },\n    {\n      \"into\": \"plasma model\",\n"
                        + "      \"ratio\": \"1 + 19\"");
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read("s", json.getBytes(StandardCharsets.UTF_8)));
        FormulationAnalysis a = new Analyzer(new Equilibrium(Davies.INSTANCE)).analyze(new RecipeResolver(site).resolve(f));
        assertEquals(3, a.admixtures().size());
        List<DrugSolubility.AtCondition> mixed = a.admixtures().stream().map(m -> m.drugs().get(0).conditions().get(0))
                .toList();
        DrugSolubility.AtCondition worst = mixed.stream().max(java.util.Comparator.comparingDouble(x ->
                x.log10Fraction() + 2 * x.uncertainty())).orElseThrow();
        assertTrue(worst.condition().startsWith("into plasma model"), worst.toString());
        List<Finding> found = check(a, "{}");
        assertEquals(1, found.size());
        String m = found.get(0).message();
        assertTrue(m.startsWith(String.format(java.util.Locale.ROOT, "demobasine exceeds 100 %% of its solubility: "
                + "mixed %s (pH %.2f) %.3g mmol/L is dissolved, %.0f %% of the %.3g mmol/L", worst.condition(),
                worst.pH(), worst.dissolved() * 1000, 100 * worst.fraction(), worst.solubility() * 1000)), m);
        for (DrugSolubility.AtCondition x : a.drugs().get(0).conditions()) {
            assertTrue(m.contains(String.format(java.util.Locale.ROOT, "%s %.0f %% (up to %.0f %%)", x.condition(),
                    100 * x.fraction(), 100 * Math.pow(10, x.log10Fraction() + 2 * x.uncertainty()))), m);
        }
        for (DrugSolubility.AtCondition x : mixed) {
            assertTrue(m.contains(String.format(java.util.Locale.ROOT, "; %s %.0f %% (up to %.0f %%)", x.condition(),
                    100 * x.fraction(), 100 * Math.pow(10, x.log10Fraction() + 2 * x.uncertainty()))), m);
        }
    }
}
