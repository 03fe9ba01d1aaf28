package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.protolyte.rules.Analyses.analyse;
import static org.protolyte.rules.Analyses.component;
import static org.protolyte.rules.Analyses.formulation;
import static org.protolyte.rules.Analyses.run;

import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.protolyte.analysis.FormulationAnalysis;

/**
 * The kinds that judge what the recipe holds rather than a computed figure: form-stated, light-sensitive,
 * frozen-buffer and concentration-limit, each on a small formulation written for the case.
 */
class IngredientKindsTest {

    private static FormulationAnalysis of(String... components) {
        return analyse(formulation(", \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}]", components));
    }

    private static List<String> where(List<Finding> f) {
        return f.stream().map(x -> x.pointer().orElseThrow()).toList();
    }

    // ---- form-stated ----

    @Test
    void aBareFormulaWithHydratesInTheLibraryIsNamedWithTheOtherForms() {
        List<Finding> f = run(new FormStated(), of(component("sodium chloride", "100 mmol/L"),
                component("Na2HPO4", "10 mmol/L")), "{}");
        assertEquals(List.of("/components/1/substance"), where(f));
        String m = f.get(0).message();
        // 141.96 g/mol: Ph. Eur. monograph (from memory)
        assertTrue(m.startsWith("'Na2HPO4' was read as disodium hydrogen phosphate anhydrous (141.96 g/mol); the "
                + "library also holds "), m);
        for (String hydrate : List.of("dihydrate", "heptahydrate", "dodecahydrate")) {
            assertTrue(m.contains("disodium hydrogen phosphate " + hydrate), m);
        }
        assertTrue(!m.contains("holds disodium hydrogen phosphate anhydrous"), m);
    }

    @Test
    void aNameThatStatesTheFormIsQuiet() {
        for (String written : List.of("disodium hydrogen phosphate anhydrous", "anhydrous disodium hydrogen phosphate",
                "sodium phosphate monobasic dihydrate", "NaH2PO4·2H2O")) {
            assertEquals(List.of(), run(new FormStated(), of(component(written, "10 mmol/L")), "{}"), written);
        }
    }

    @Test
    void aSynonymOfASubstanceWithOneFormIsQuiet() {
        assertEquals(List.of(), run(new FormStated(), of(component("NaCl", "10 mmol/L"), component("KH2PO4",
                "10 mmol/L")), "{}"));
    }

    // ---- light-sensitive ----

    @Test
    void aLightSensitiveComponentIsNamedWithItsSource() {
        List<Finding> f = run(new LightSensitive(), of(component("sodium chloride", "100 mmol/L"),
                component("folic acid", "0.001 g/L")), "{}");
        assertEquals(List.of("/components/1/substance"), where(f));
        assertTrue(f.get(0).message().startsWith("folic acid: decomposes in light"), f.get(0).message());
        assertTrue(f.get(0).message().endsWith(" (USP monograph Folic Acid, packaging and storage: well-closed, "
                + "light-resistant containers; assay in low-actinic glassware)"), f.get(0).message());
    }

    @Test
    void hepesIsNamedOnlyWithAPhotosensitiser() {
        // HEPES forms hydrogen peroxide under light with riboflavin (Lepe-Zuniga, Zigler and Gery 1987)
        assertEquals(List.of(), run(new LightSensitive(), of(component("HEPES", "10 mmol/L"),
                component("sodium chloride", "100 mmol/L")), "{}"));
        // folic acid is light-sensitive but no photosensitiser
        assertEquals(List.of("/components/1/substance"), where(run(new LightSensitive(), of(component("HEPES",
                "10 mmol/L"), component("folic acid", "0.001 g/L")), "{}")));
        List<Finding> f = run(new LightSensitive(), of(component("HEPES", "10 mmol/L"),
                component("riboflavin", "0.0004 g/L")), "{}");
        assertEquals(List.of("/components/0/substance", "/components/1/substance"), where(f));
        assertTrue(f.get(0).message().startsWith("HEPES: "), f.get(0).message());
        assertTrue(f.get(0).message().contains("; the recipe holds the photosensitiser riboflavin ("),
                f.get(0).message());
        assertTrue(!f.get(1).message().contains("the recipe holds"), f.get(1).message());
    }

    @Test
    void nothingLightSensitiveIsQuiet() {
        assertEquals(List.of(), run(new LightSensitive(), of(component("sodium chloride", "100 mmol/L")), "{}"));
    }

    // ---- frozen-buffer ----

    private static final String SODIUM_PHOSPHATE = "{\"system\": \"phosphate\", \"counterion\": \"Na+\"}";

    private static FormulationAnalysis at(String celsius, String... components) {
        return analyse(formulation(", \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}, "
                + "{\"name\": \"freezer\", \"temperature\": \"" + celsius + " Cel\"}]", components));
    }

    @Test
    void aSodiumPhosphateBufferBelowItsFreezingPointIsNamed() {
        List<Finding> f = run(new FrozenBuffer(), at("-20", component("sodium dihydrogen phosphate dihydrate",
                "10 mmol/L"), component("disodium hydrogen phosphate heptahydrate", "10 mmol/L")), SODIUM_PHOSPHATE);
        assertEquals(List.of("/conditions/1"), where(f));
        String m = f.get(0).message();
        assertTrue(m.startsWith("freezer: "), m);
        assertTrue(m.contains("below the estimated freezing point"), m);
        assertTrue(m.endsWith(". As ice forms, the Na+ salt of phosphate crystallises out and the unfrozen liquid's "
                + "pH shifts"), m);
    }

    @Test
    void theSystemAndTheCounterionMustBothBeThereAndFrozen() {
        assertEquals(List.of(), run(new FrozenBuffer(), at("5", component("sodium dihydrogen phosphate dihydrate",
                "10 mmol/L")), SODIUM_PHOSPHATE), "not frozen");
        assertEquals(List.of(), run(new FrozenBuffer(), at("-20", component("potassium dihydrogen phosphate",
                "10 mmol/L")), SODIUM_PHOSPHATE), "potassium, not sodium");
        assertEquals(List.of(), run(new FrozenBuffer(), at("-20", component("sodium chloride", "10 mmol/L")),
                SODIUM_PHOSPHATE), "no phosphate");
        assertEquals(List.of(), run(new FrozenBuffer(), at("-20", component("sodium chloride", "10 mmol/L"),
                component("HEPES", "10 mmol/L")), SODIUM_PHOSPHATE), "another system");
        FormulationAnalysis warm = Analyses.conditions(at("5", component("sodium dihydrogen phosphate dihydrate",
                "10 mmol/L")), c -> c.withCaveat(org.protolyte.chemistry.Caveat.warning("ionic-strength-high", "x")));
        assertEquals(List.of(), run(new FrozenBuffer(), warm, SODIUM_PHOSPHATE), "another caveat than freezing");
        // the counterion may come from another component than the buffer
        assertEquals(List.of("/conditions/1"), where(run(new FrozenBuffer(), at("-20",
                component("potassium dihydrogen phosphate", "10 mmol/L"), component("sodium chloride", "10 mmol/L")),
                SODIUM_PHOSPHATE)));
        assertEquals(List.of("/conditions/1"), where(run(new FrozenBuffer(), at("-20",
                component("sodium chloride", "10 mmol/L"), component("potassium dihydrogen phosphate", "10 mmol/L")),
                SODIUM_PHOSPHATE)));
    }

    // ---- concentration-limit ----

    @Test
    void aConcentrationAtTheLimitIsWithinAndJustAboveIsNot() {
        String p = "{\"substance\": \"potassium chloride\", \"max\": \"40 mmol/L\"}";
        assertEquals(List.of(), run(new ConcentrationLimit(), of(component("potassium chloride", "40 mmol/L")), p));
        List<Finding> f = run(new ConcentrationLimit(), of(component("sodium chloride", "100 mmol/L"),
                component("potassium chloride", "40.1 mmol/L")), p);
        assertEquals(List.of("/components/1"), where(f));
        assertEquals("potassium chloride is 40.1 mmol/L; limit 40 mmol/L", f.get(0).message());
    }

    @Test
    void aMassLimitIsJudgedInGramsPerLitre() {
        // KCl 74.55 g/mol (IUPAC atomic weights, from memory): 40 mmol/L is 2.98 g/L, 41 mmol/L 3.06 g/L
        String p = "{\"substance\": \"KCl\", \"max\": \"3 g/L\"}";
        assertEquals(List.of(), run(new ConcentrationLimit(), of(component("potassium chloride", "40 mmol/L")), p));
        assertEquals(List.of("potassium chloride is 3.06 g/L; limit 3 g/L"), run(new ConcentrationLimit(),
                of(component("potassium chloride", "41 mmol/L")), p).stream().map(Finding::message).toList());
    }

    @Test
    void aSystemsTotalCountsEveryComponentThatCarriesIt() {
        String p = "{\"system\": \"phosphate\", \"max\": \"40 mmol/L\"}";
        FormulationAnalysis two = of(component("sodium chloride", "100 mmol/L"),
                component("sodium dihydrogen phosphate dihydrate", "20 mmol/L"),
                component("disodium hydrogen phosphate heptahydrate", "20.5 mmol/L"));
        List<Finding> f = run(new ConcentrationLimit(), two, p);
        assertEquals(List.of("/components/1"), where(f), "at the first component that carries it");
        assertEquals("total phosphate is 40.5 mmol/L; limit 40 mmol/L", f.get(0).message());
        assertEquals(List.of(), run(new ConcentrationLimit(), of(component("sodium dihydrogen phosphate dihydrate",
                "20 mmol/L"), component("disodium hydrogen phosphate heptahydrate", "20 mmol/L")), p));
    }

    @Test
    void anAmountInAHalfLitreBatchIsJudgedPerLitre() {
        // 1.5 g of potassium chloride made up to 500 mL is 3.00 g/L
        FormulationAnalysis half = analyse("{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-HALF\", "
                + "\"revision\": \"A\", \"basis\": {\"finalVolume\": \"500 mL\"}, \"conditions\": [{\"name\": \"use\", "
                + "\"temperature\": \"25 Cel\"}], \"components\": [" + component("potassium chloride", "1.5 g") + "]}");
        assertEquals(List.of("potassium chloride is 3.00 g/L; limit 2.9 g/L"), run(new ConcentrationLimit(), half,
                "{\"substance\": \"potassium chloride\", \"max\": \"2.9 g/L\"}").stream().map(Finding::message).toList());
        assertEquals(List.of(), run(new ConcentrationLimit(), half, "{\"substance\": \"potassium chloride\", "
                + "\"max\": \"3.1 g/L\"}"));
    }

    @Test
    void aSystemCountsAsOftenAsTheFormulaHoldsIt() {
        // (NH4)2SO4 holds two ammonium and one sulfate per formula unit
        FormulationAnalysis a = of(component("ammonium sulfate", "10.5 mmol/L"));
        assertEquals(List.of("total ammonia is 21.0 mmol/L; limit 20.5 mmol/L"), run(new ConcentrationLimit(), a,
                "{\"system\": \"ammonia\", \"max\": \"20.5 mmol/L\"}").stream().map(Finding::message).toList());
        assertEquals(List.of(), run(new ConcentrationLimit(), a, "{\"system\": \"sulfate\", \"max\": \"11 mmol/L\"}"));
        assertEquals(1, run(new ConcentrationLimit(), a, "{\"system\": \"sulfate\", \"max\": \"10 mmol/L\"}").size());
    }

    @Test
    void aSubstanceTheRecipeOrTheLibraryLacksIsNotJudged() {
        FormulationAnalysis saline = of(component("sodium chloride", "100 mmol/L"));
        assertEquals(List.of(), run(new ConcentrationLimit(), saline, "{\"substance\": \"potassium chloride\", "
                + "\"max\": \"0 mmol/L\"}"));
        assertEquals(List.of(), run(new ConcentrationLimit(), saline, "{\"substance\": \"no such salt\", "
                + "\"max\": \"0 mmol/L\"}"));
        assertEquals(List.of(), run(new ConcentrationLimit(), saline, "{\"system\": \"HEPES\", \"max\": \"0 mmol/L\"}"));
    }

    // ---- hazard-notes, bicarbonate-needs-co2, titrant-reaches-goal ----

    private static final String NAOH_QS = "{\"substance\": \"sodium hydroxide\", \"stock\": {\"concentration\": "
            + "\"1 mol/L\"}, \"adjustTo\": {\"pH\": 7.0, \"temperature\": \"25 Cel\"}}";

    @Test
    void aClassifiedComponentCarriesItsClassificationsAndSaysWhenItIsTheTitrant() {
        // sodium hydroxide: Skin Corr. 1A, H314 (Regulation (EC) No 1272/2008, Annex VI, from memory)
        List<Finding> f = run(new HazardNotes(), of(component("sodium dihydrogen phosphate dihydrate", "10 mmol/L"),
                NAOH_QS), "{}");
        assertEquals(List.of("/components/1/substance"), where(f));
        assertTrue(f.get(0).message().startsWith("sodium hydroxide used as titrant: Skin Corr. 1A (H314: causes severe "
                + "skin burns and eye damage; the solid and solutions of 5 % or more); "), f.get(0).message());
        List<Finding> weighed = run(new HazardNotes(), of(component("sodium hydroxide", "10 mmol/L")), "{}");
        assertTrue(weighed.get(0).message().startsWith("sodium hydroxide: Skin Corr. 1A"), weighed.get(0).message());
        assertEquals(List.of(), run(new HazardNotes(), of(component("sodium chloride", "10 mmol/L")), "{}"));
    }

    @Test
    void bicarbonateWithoutACo2LevelIsNamedAndWithOneIsQuiet() {
        List<Finding> f = run(new BicarbonateNeedsCo2(), of(component("sodium chloride", "100 mmol/L"),
                component("sodium hydrogen carbonate", "24 mmol/L")), "{}");
        assertEquals(List.of("/components/1"), where(f));
        assertEquals("sodium hydrogen carbonate buffers with CO2, but no condition states a CO2 level: every pH here is "
                + "for a closed vessel, free of CO2 as made", f.get(0).message());
        FormulationAnalysis inAir = analyse(formulation(", \"conditions\": [{\"name\": \"use\", \"temperature\": "
                + "\"25 Cel\"}, {\"name\": \"open\", \"temperature\": \"25 Cel\", \"co2\": \"air\"}]",
                component("sodium hydrogen carbonate", "24 mmol/L")));
        assertEquals(List.of(), run(new BicarbonateNeedsCo2(), inAir, "{}"));
        assertEquals(List.of(), run(new BicarbonateNeedsCo2(), of(component("sodium chloride", "100 mmol/L")), "{}"));
    }

    @Test
    void aTitrantThatCannotReachItsGoalIsNamedUnlessAnotherDoes() {
        FormulationAnalysis a = of(component("sodium dihydrogen phosphate dihydrate", "10 mmol/L"), NAOH_QS);
        org.protolyte.analysis.TitrantResult t = a.titrants().get(0);
        org.protolyte.analysis.TitrantResult stuck = new org.protolyte.analysis.TitrantResult(t.ingredient(), t.role(),
                0, false, t.setpointPH(), t.adjustKelvin(), 13.5, t.goalKelvin(), Optional.of(
                new org.protolyte.analysis.TitrantResult.Unreachable("1 mol/L sodium hydroxide reaches pH 12.9 at most",
                12.9, 4.5)));
        org.protolyte.analysis.TitrantResult dosed = new org.protolyte.analysis.TitrantResult(t.ingredient(), t.role(),
                0.001, true, t.setpointPH(), t.adjustKelvin(), 7.0, t.goalKelvin(), Optional.empty());
        org.protolyte.analysis.TitrantResult idle = new org.protolyte.analysis.TitrantResult(t.ingredient(), t.role(),
                0, false, t.setpointPH(), t.adjustKelvin(), 7.0, t.goalKelvin(), Optional.empty());
        List<Finding> f = run(new TitrantReachesGoal(), titrants(a, stuck), "{}");
        assertEquals(List.of("/components/1/adjustTo"), where(f));
        assertEquals("1 mol/L sodium hydroxide reaches pH 12.9 at most", f.get(0).message());
        assertEquals(List.of(), run(new TitrantReachesGoal(), titrants(a, stuck, dosed), "{}"), "the other titrant does");
        assertEquals(1, run(new TitrantReachesGoal(), titrants(a, stuck, idle), "{}").size(), "an unused one does not");
    }

    private static FormulationAnalysis titrants(FormulationAnalysis a, org.protolyte.analysis.TitrantResult... t) {
        return new FormulationAnalysis(a.recipe(), a.solution(), a.conditions(), List.of(t), a.caveats(),
                a.assumptions(), a.targetSensitivities(), a.drifts(), a.titratableAcidity(), a.robustness(),
                a.working());
    }
}
