package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.protolyte.rules.Analyses.analyse;
import static org.protolyte.rules.Analyses.component;
import static org.protolyte.rules.Analyses.condition;
import static org.protolyte.rules.Analyses.conditions;
import static org.protolyte.rules.Analyses.formulation;
import static org.protolyte.rules.Analyses.run;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.analysis.TitrantResult;
import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.SolidPhase;

/**
 * titrant-plausible on a hand-set q.s. and buffer, with the proton count checked against Henderson–Hasselbalch;
 * saturation-index on hand-set indices; solubility-limit on the library's table for disodium hydrogen phosphate.
 */
class TitrantAndSolidKindsTest {

    private static List<String> where(List<Finding> f) {
        return f.stream().map(x -> x.pointer().orElseThrow()).toList();
    }

    // ---- titrant-plausible ----

    /** Phosphoric acid brought up with sodium hydroxide: a titrant line whose figures the tests then set. */
    private static final FormulationAnalysis QS = analyse(formulation(", \"conditions\": [{\"name\": \"use\", "
            + "\"temperature\": \"25 Cel\"}]", component("phosphoric acid", "10 mmol/L"),
            "{\"substance\": \"sodium hydroxide\", \"stock\": {\"concentration\": \"1 mol/L\"}, \"adjustTo\": "
                    + "{\"pH\": 7.0, \"temperature\": \"25 Cel\"}}"));

    /** The q.s. set to {@code moles} per basis from {@code start} to {@code goal}; the main buffer 10 mmol of it. */
    private static FormulationAnalysis qs(String system, double moles, double start, double goal) {
        TitrantResult t = QS.titrants().get(0);
        TitrantResult set = new TitrantResult(t.ingredient(), t.role(), moles, true, t.setpointPH(), t.adjustKelvin(),
                goal, t.goalKelvin(), Optional.empty()).withStartPH(start);
        return titrants(conditions(QS, c -> Analyses.buffers(c, Analyses.buffer(system, 7.2, 1, false))), set);
    }

    private static FormulationAnalysis titrants(FormulationAnalysis a, TitrantResult... t) {
        return new FormulationAnalysis(a.recipe(), a.solution(), a.conditions(), List.of(t), a.caveats(),
                a.assumptions(), a.targetSensitivities(), a.drifts(), a.titratableAcidity(), a.robustness(),
                a.working());
    }

    private static List<String> plausible(FormulationAnalysis a, String parameters) {
        return run(new TitrantPlausible(), a, parameters).stream().map(Finding::message).toList();
    }

    @Test
    void aMonoproticSystemIsHalfProtonatedAtItsPKa() {
        // Henderson–Hasselbalch: bound fraction 1 / (1 + 10^(pH − pKa))
        AcidBaseSystem tris = Analyses.LIBRARY.system("Tris").orElseThrow();
        double k = 298.15;
        double pKa = tris.steps().get(0).pKa(k);
        assertEquals(0.5, TitrantPlausible.meanProtons(tris, k, pKa), 1e-12);
        assertEquals(1 / 11.0, TitrantPlausible.meanProtons(tris, k, pKa + 1), 1e-12);
        assertEquals(10 / 11.0, TitrantPlausible.meanProtons(tris, k, pKa - 1), 1e-12);
    }

    @Test
    void phosphateGivesUpTheProtonsOfTheStepsItsPHCrosses() {
        // phosphate pKa 2.15, 7.20, 12.35 (from memory, CRC Handbook): pH 1 → 9.7 crosses two steps, 4.7 → 7.2 half one
        AcidBaseSystem p = Analyses.LIBRARY.system("phosphate").orElseThrow();
        assertEquals(2, TitrantPlausible.titratableProtons(p, 298.15, 1.0, 9.7));
        assertEquals(2, TitrantPlausible.titratableProtons(p, 298.15, 9.7, 1.0));
        assertEquals(1, TitrantPlausible.titratableProtons(p, 298.15, 4.7, 7.2));
        assertEquals(1, TitrantPlausible.titratableProtons(p, 298.15, 7.0, 7.0), "at least one");
        assertEquals(3, TitrantPlausible.titratableProtons(p, 298.15, 0.5, 14.0));
        assertEquals(2.0, TitrantPlausible.meanProtons(p, 298.15, 4.675), 0.01);
    }

    @Test
    void aMonoproticSystemGivesUpOneProtonHoweverWideTheRange() {
        // across pH 1 to 15 Tris gives up all but 2e-7 of its proton: one, not two
        AcidBaseSystem tris = Analyses.LIBRARY.system("Tris").orElseThrow();
        assertEquals(1, TitrantPlausible.titratableProtons(tris, 298.15, 1, 15));
    }

    @Test
    void theProtonCountDoesNotOverflowFarFromThePKas() {
        // the weights are scaled by the largest, so 10^(Σ pKa − 3 pH) at pH −150 does not overflow: fully protonated
        AcidBaseSystem p = Analyses.LIBRARY.system("phosphate").orElseThrow();
        assertEquals(3.0, TitrantPlausible.meanProtons(p, 298.15, -150), 1e-12);
        assertEquals(0.0, TitrantPlausible.meanProtons(p, 298.15, 150), 1e-12);
    }

    @Test
    void moreThanAnEquivalentPerProtonIsTooMuchAndNearlyOneIsAnotherSaltForm() {
        assertEquals(List.of(), plausible(qs("phosphate", 0.0089, 4.7, 7.2), "{}"));
        List<String> near = plausible(qs("phosphate", 0.0091, 4.7, 7.2), "{}");
        assertEquals(List.of("q.s. sodium hydroxide is 9.10 mmol, 0.91 equivalents of the phosphate buffer "
                + "(10.0 mmol), which has 1 titratable proton between pH 4.70 and 7.20: nearly a whole equivalent per "
                + "proton, which converts the buffer into another salt form; check that the intended form was "
                + "written"), near);
        assertTrue(plausible(qs("phosphate", 0.0100, 4.7, 7.2), "{}").get(0).contains("nearly a whole equivalent"));
        assertEquals(List.of("q.s. sodium hydroxide is 10.1 mmol, 1.01 equivalents of the phosphate buffer "
                + "(10.0 mmol), which has 1 titratable proton between pH 4.70 and 7.20: more than the 1.00 equivalents "
                + "the buffer can take up there, so excess titrant sets the pH"), plausible(qs("phosphate", 0.0101,
                4.7, 7.2), "{}"));
        assertEquals(List.of("/components/1/adjustTo"), where(run(new TitrantPlausible(), qs("phosphate", 0.0101,
                4.7, 7.2), "{}")));
    }

    @Test
    void twoProtonsTakeTwiceTheEquivalents() {
        assertEquals(List.of(), plausible(qs("phosphate", 0.0189, 1.0, 9.7), "{}"));
        assertTrue(plausible(qs("phosphate", 0.0191, 1.0, 9.7), "{}").get(0).endsWith("check that the intended form "
                + "was written"));
        List<String> over = plausible(qs("phosphate", 0.0201, 1.0, 9.7), "{}");
        assertTrue(over.get(0).contains("which has 2 titratable protons between pH 1.00 and 9.70: more than the "
                + "2.00 equivalents"), over.get(0));
    }

    @Test
    void exactlyTheNearFullFractionOfAnEquivalentCounts() {
        // 5 mmol on 10 mmol is exactly 0.5 equivalents, as is 0.5 in binary
        assertTrue(plausible(qs("phosphate", 0.005, 4.7, 7.2), "{\"nearFullEquivalent\": 0.5}").get(0)
                .contains("nearly a whole equivalent"));
        assertEquals(List.of(), plausible(qs("phosphate", 0.0049, 4.7, 7.2), "{\"nearFullEquivalent\": 0.5}"));
    }

    @Test
    void thePacksLimitsMoveBothThresholds() {
        String p = "{\"maxEquivalents\": 0.5, \"nearFullEquivalent\": 0.3}";
        assertEquals(List.of(), plausible(qs("phosphate", 0.0029, 4.7, 7.2), p));
        assertTrue(plausible(qs("phosphate", 0.0031, 4.7, 7.2), p).get(0).contains("nearly a whole"));
        assertTrue(plausible(qs("phosphate", 0.0051, 4.7, 7.2), p).get(0).contains("more than the 0.50 equivalents"));
    }

    @Test
    void aTitrantNotUsedUnreachableOrWithoutAStartOrSystemIsNotJudged() {
        TitrantResult t = QS.titrants().get(0);
        FormulationAnalysis base = conditions(QS, c -> Analyses.buffers(c, Analyses.buffer("phosphate", 7.2, 1,
                false)));
        TitrantResult unused = new TitrantResult(t.ingredient(), t.role(), 0.05, false, t.setpointPH(),
                t.adjustKelvin(), 7.2, t.goalKelvin(), Optional.empty()).withStartPH(4.7);
        TitrantResult unreachable = new TitrantResult(t.ingredient(), t.role(), 0.05, true, t.setpointPH(),
                t.adjustKelvin(), 7.2, t.goalKelvin(), Optional.of(new TitrantResult.Unreachable("too weak", 6, 4.7)))
                .withStartPH(4.7);
        TitrantResult none = new TitrantResult(t.ingredient(), t.role(), 0, true, t.setpointPH(), t.adjustKelvin(),
                7.2, t.goalKelvin(), Optional.empty()).withStartPH(4.7);
        TitrantResult noStart = new TitrantResult(t.ingredient(), t.role(), 0.05, true, t.setpointPH(),
                t.adjustKelvin(), 7.2, t.goalKelvin(), Optional.empty());
        for (TitrantResult x : List.of(unused, unreachable, none, noStart)) {
            assertEquals(List.of(), plausible(titrants(base, x), "{}"), x.toString());
        }
        assertEquals(List.of(), plausible(qs("no such system", 0.05, 4.7, 7.2), "{}"));
        assertEquals(List.of(), plausible(titrants(conditions(base, Analyses::indeterminate), t.withStartPH(4.7)),
                "{}"), "no determinate condition: no buffer to judge against");
        assertEquals(List.of(), plausible(titrants(conditions(base, c -> Analyses.buffers(c)), t.withStartPH(4.7)),
                "{}"), "no buffer");
    }

    /**
     * Histidine 10 mmol/L with a peptide of 10 His groups at 2 mmol/L, brought to pH 6.0 with HCl: most of the acid
     * goes to the peptide's groups, which are not the buffer as written. The rule takes off what the groups take up,
     * n·c·(θ_goal − θ_start) with θ = 1/(1 + 10^(pH − pKa)) (Henderson–Hasselbalch, by hand here), before counting
     * equivalents of histidine.
     */
    @Test
    void theProtonsAProteinTakesUpAreNotCountedAgainstTheBuffer() {
        FormulationAnalysis a = analyse(formulation(", \"conditions\": [{\"name\": \"use\", \"temperature\": "
                + "\"25 Cel\"}]", component("L-histidine", "10 mmol/L"), "{\"substance\": \"test peptide\", "
                + "\"protein\": {\"groups\": {\"His\": 10}, \"molarMass\": \"2000 g/mol\"}, \"amount\": "
                + "\"2 mmol/L\"}", "{\"substance\": \"hydrochloric acid\", \"adjustTo\": {\"pH\": 6.0, "
                + "\"temperature\": \"25 Cel\"}}"));
        TitrantResult t = a.titrants().get(0);
        AcidBaseSystem his = a.recipe().library().proteins().get(0).systems().values().iterator().next();
        double pKa = his.steps().get(0).pKa(298.15);
        double byHand = 10 * 2e-3 * Math.abs(1 / (1 + Math.pow(10, t.goalPH() - pKa))
                - 1 / (1 + Math.pow(10, t.startPH() - pKa)));
        assertTrue(t.moles() / 10e-3 > 1.0, "without the correction this q.s. is more than an equivalent of histidine");
        List<String> none = plausible(a, "{}");
        assertEquals(List.of(), none);
        String m = plausible(a, "{\"maxEquivalents\": 0.01}").get(0);
        assertTrue(m.startsWith(String.format(java.util.Locale.ROOT, "q.s. hydrochloric acid is %.3g mmol (%.3g mmol "
                + "of it taken by the protein's groups), %.2f equivalents of the histidine buffer", t.moles() * 1000,
                byHand * 1000, (t.moles() - byHand) / 10e-3)), m);
    }

    // ---- saturation-index ----

    private static final FormulationAnalysis THREE = analyse(formulation(", \"conditions\": ["
            + "{\"name\": \"preparation\", \"temperature\": \"20 Cel\"}, {\"name\": \"use\", \"temperature\": \"25 Cel\"},"
            + " {\"name\": \"storage\", \"temperature\": \"5 Cel\"}]", component("sodium chloride", "10 mmol/L")));

    private static SolidPhase phase(String name) {
        return Analyses.LIBRARY.phases().stream().filter(p -> p.name().equals(name)).findFirst().orElseThrow();
    }

    private static ConditionResult saturation(ConditionResult c, SolidPhase.Saturation... s) {
        return new ConditionResult(c.condition(), c.state(), c.caveats(), c.bufferCapacityPerLitre(), c.osmolarity(),
                c.volumeLitres(), c.buffers(), c.pHInAir(), c.loads(), c.co2ForTarget(), c.uncertainty(), List.of(s));
    }

    private static SolidPhase.Saturation index(String phase, double index, boolean inRange) {
        return new SolidPhase.Saturation(phase(phase), index, index - 6, -6, inRange);
    }

    /** brushite's index at preparation, use and storage. */
    private static FormulationAnalysis brushite(double prep, double use, double storage) {
        return condition(condition(condition(THREE, "preparation", c -> saturation(c, index("brushite", prep, true))),
                "use", c -> saturation(c, index("brushite", use, true))), "storage",
                c -> saturation(c, index("brushite", storage, true)));
    }

    @Test
    void anIndexAtTheLimitIsWithinAndJustAboveIsNot() {
        assertEquals(List.of(), run(new SaturationIndex(), brushite(-0.5, 0, -1), "{}"));
        List<Finding> f = run(new SaturationIndex(), brushite(-0.5, 0, 0.01), "{}");
        assertEquals(List.of("/conditions/2"), where(f));
        assertEquals("brushite (" + phase("brushite").formula() + ") can precipitate: its saturation index exceeds "
                + "0.00, most at storage (5 °C); by condition: preparation (20 °C) -0.50; use (25 °C) +0.00; storage "
                + "(5 °C) +0.01", f.get(0).message());
        // calcite "at most five-fold supersaturated": log10 5 = 0.699
        assertEquals(List.of(), run(new SaturationIndex(), brushite(0.6, 0.69, 0.1), "{\"maxIndex\": 0.7}"));
        assertEquals(1, run(new SaturationIndex(), brushite(0.6, 0.71, 0.1), "{\"maxIndex\": 0.7}").size());
    }

    @Test
    void theFindingSitsAtTheHighestIndexTheFirstOfEqualOnes() {
        assertEquals(List.of("/conditions/1"), where(run(new SaturationIndex(), brushite(0.2, 0.5, 0.3), "{}")));
        assertEquals(List.of("/conditions/0"), where(run(new SaturationIndex(), brushite(0.5, 0.5, 0.3), "{}")));
        assertEquals(List.of("/conditions/2"), where(run(new SaturationIndex(), brushite(0.2, 0.3, 0.5), "{}")));
    }

    @Test
    void anExtrapolatedKspIsSaidSoAndAnIndeterminateConditionIsLeftOut() {
        FormulationAnalysis a = condition(brushite(0.2, 0.5, 0.3), "storage", c -> saturation(c, index("brushite",
                0.9, false)));
        String m = run(new SaturationIndex(), a, "{}").get(0).message();
        assertTrue(m.endsWith("storage (5 °C) +0.90, Ksp extrapolated beyond its data"), m);
        FormulationAnalysis off = condition(a, "storage", Analyses::indeterminate);
        String without = run(new SaturationIndex(), off, "{}").get(0).message();
        assertTrue(without.contains("most at use (25 °C)") && !without.contains("storage"), without);
    }

    @Test
    void onePhasePerFindingAndOnlyTheNamedPhases() {
        FormulationAnalysis two = conditions(THREE, c -> saturation(c, index("brushite", 0.3, true),
                index("calcite", 0.4, true)));
        List<String> m = run(new SaturationIndex(), two, "{}").stream().map(Finding::message).toList();
        assertEquals(2, m.size());
        assertTrue(m.get(0).startsWith("brushite") && m.get(1).startsWith("calcite"), m.toString());
        List<String> only = run(new SaturationIndex(), two, "{\"phases\": [\"calcite\"]}").stream()
                .map(Finding::message).toList();
        assertEquals(1, only.size());
        assertTrue(only.get(0).startsWith("calcite") && !only.get(0).contains("brushite"), only.get(0));
    }

    // ---- solubility-limit ----

    private static FormulationAnalysis dibasic(String amount, String... celsius) {
        StringBuilder c = new StringBuilder();
        String[] names = {"use", "cold"};
        for (int i = 0; i < celsius.length; i++) {
            c.append(i == 0 ? "" : ", ").append("{\"name\": \"").append(names[i]).append("\", \"temperature\": \"")
                    .append(celsius[i]).append(" Cel\"}");
        }
        return analyse(formulation(", \"conditions\": [" + c + "]", component("disodium hydrogen phosphate anhydrous",
                amount)));
    }

    @Test
    void aSaltAboveItsSolubilityInTheColdIsNamedThere() {
        // disodium hydrogen phosphate: 1.7 g per 100 g water at 0 °C, 3.9 at 10 °C, 11.8 at 25 °C (CRC Handbook,
        // from memory): 0.35 mol/kg (about 5 g per 100 g) is clear at 25 °C and oversaturated at 5 °C (2.8 g)
        List<Finding> f = run(new SolubilityLimit(), dibasic("0.35 mol/L", "25", "5"), "{}");
        assertEquals(List.of("/conditions/1"), where(f));
        String m = f.get(0).message();
        assertTrue(m.startsWith("disodium hydrogen phosphate (Na2HPO4) can crystallise at cold (5 °C): the solution "
                + "holds "), m);
        assertTrue(m.contains("against a solubility of 2.80 g in pure water there"), m);
        assertTrue(m.contains("; by condition: use (25 °C) "), m);
        assertEquals(List.of(), run(new SolubilityLimit(), dibasic("0.35 mol/L", "25"), "{}"));
        assertEquals(List.of(), run(new SolubilityLimit(), dibasic("0.05 mol/L", "25", "5"), "{}"));
    }

    private static double held(String message) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("holds ([0-9.]+) g per 100 g water").matcher(message);
        assertTrue(m.find(), message);
        return Double.parseDouble(m.group(1));
    }

    @Test
    void whatTheSolutionHoldsIsPerHundredGramsOfItsWater() {
        // 0.35 mol of Na2HPO4 (141.96 g/mol) is 49.7 g; a litre of such a solution holds a little less than 1 kg of
        // water, so 4.97 to 5.2 g per 100 g
        double concentrate = held(run(new SolubilityLimit(), dibasic("0.35 mol/L", "25", "5"), "{}").get(0).message());
        assertTrue(concentrate > 4.97 && concentrate < 5.2, () -> "" + concentrate);
        // 0.15 mol/L solves (ionic strength 0.45 mol/kg) and is oversaturated at 0 °C (1.7 g per 100 g): 2.13 to 2.2 g
        String m = run(new SolubilityLimit(), dibasic("0.15 mol/L", "25", "0"), "{}").get(0).message();
        assertTrue(m.contains("against a solubility of 1.70 g in pure water there"), m);
        double solved = held(m);
        assertTrue(solved > 2.13 && solved < 2.2, () -> "" + solved);
        double times = Double.parseDouble(m.replaceAll(".*the ion product is ([0-9.]+) times.*", "$1"));
        assertTrue(times > 1 && times < 3, m);
    }

    @Test
    void aSaltWhoseIonsComeFromOtherComponentsIsNamedAsSuch() {
        // NaH2PO4 + Na3PO4 give 2 HPO4-2 and 4 Na+: 0.15 and 0.30 mol/kg, the same ions as 0.15 mol/L Na2HPO4
        FormulationAnalysis a = analyse(formulation(", \"conditions\": [{\"name\": \"use\", \"temperature\": "
                + "\"25 Cel\"}, {\"name\": \"cold\", \"temperature\": \"0 Cel\"}]",
                component("sodium dihydrogen phosphate dihydrate", "75 mmol/L"),
                component("trisodium phosphate dodecahydrate", "75 mmol/L")));
        List<Finding> f = run(new SolubilityLimit(), a, "{}");
        assertEquals(List.of("/conditions/1"), where(f));
        assertTrue(f.get(0).message().startsWith("disodium hydrogen phosphate (Na2HPO4) can crystallise at cold (0 °C): "
                + "its ions come from other components (solubility 1.70 g per 100 g water there); the ion product is "),
                f.get(0).message());
    }

    @Test
    void aConcentrateBeyondTheActivityModelIsReckonedFromWhatWasWeighed() {
        // 0.35 mol/L is beyond the activity model (ionic strength about 1 mol/kg): Na+ at its total, HPO4-2 as weighed;
        // without the salt itself weighed there is nothing to reckon with
        FormulationAnalysis weighed = dibasic("0.35 mol/L", "25", "5");
        assertTrue(weighed.conditions().stream().noneMatch(ConditionResult::determinate), "a concentrate");
        assertEquals(1, run(new SolubilityLimit(), weighed, "{}").size());
        FormulationAnalysis other = analyse(formulation(", \"conditions\": [{\"name\": \"cold\", \"temperature\": "
                + "\"5 Cel\"}]", component("sodium dihydrogen phosphate dihydrate", "175 mmol/L"),
                component("trisodium phosphate dodecahydrate", "175 mmol/L")));
        assertTrue(other.conditions().stream().noneMatch(ConditionResult::determinate), "a concentrate");
        assertEquals(List.of(), run(new SolubilityLimit(), other, "{}"));
    }

    @Test
    void ofTwoConditionsEquallyOversaturatedTheFirstIsNamed() {
        // two conditions at 5 °C are the same solution: the finding sits at the first
        FormulationAnalysis a = analyse(formulation(", \"conditions\": [{\"name\": \"use\", \"temperature\": "
                + "\"25 Cel\"}, {\"name\": \"cold\", \"temperature\": \"5 Cel\"}, {\"name\": \"fridge\", "
                + "\"temperature\": \"5 Cel\"}]", component("disodium hydrogen phosphate anhydrous", "0.35 mol/L")));
        assertEquals(List.of("/conditions/1"), where(run(new SolubilityLimit(), a, "{}")));
    }

    @Test
    void outsideTheTablesTemperaturesNothingIsSaid() {
        // the table ends at 30 °C
        assertEquals(List.of(), run(new SolubilityLimit(), dibasic("2 mol/L", "40"), "{}"));
    }
}
