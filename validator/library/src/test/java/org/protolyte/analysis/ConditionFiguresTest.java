package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.chemistry.Caveat;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.substance.LibraryLoader;

/**
 * The figures beside each condition's pH: each system's part of β, the pH in air, the CO2 for the target, the
 * assumptions, the drift's CO2 change, the loads, the q.s. details. Expected values are conservation, definitions,
 * or published values named beside them.
 */
class ConditionFiguresTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    private static FormulationAnalysis analyse(String body) {
        return analyse("{\"finalVolume\": \"1 L\"}", body);
    }

    private static FormulationAnalysis analyse(String basis, String body) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-FIG\", \"revision\": \"A\","
                + " \"basis\": " + basis + ", " + body + "}";
        DocumentReport r = PROTOLYTE.check("t.json", json.getBytes(StandardCharsets.UTF_8));
        return r.analysis().orElseThrow(() -> new AssertionError(r.findings().toString()));
    }

    private static final String TRIS_AND_PHOSPHATE = "\"components\": [{\"substance\": \"Tris\", \"amount\": \"3 mmol/L\"},"
            + " {\"substance\": \"Tris hydrochloride\", \"amount\": \"10 mmol/L\"},"
            + " {\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": \"16 mmol/L\"},"
            + " {\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"4 mmol/L\"}]";

    /**
     * Each system present, and only those, with its amount (conservation: 20 mmol phosphate, 13 mmol Tris in the
     * litre), its share of β (its term over the total, the terms adding up to the total but water's own
     * 2.303([H⁺] + [OH⁻]), under 10⁻⁵ mol/L at pH 7.6), the largest first, and the pKa nearest the pH: phosphate's
     * second step, 7.1965 at 25 °C (Partanen and Minkkinen 1996, the library's value).
     */
    @Test
    void eachSystemPresentHasItsAmountShareAndNearestPKa() {
        ConditionResult c = analyse(TRIS_AND_PHOSPHATE + ", \"conditions\": [{\"name\": \"use\", \"temperature\": \"25 Cel\"}]")
                .conditions().get(0);
        List<BufferContribution> b = c.buffers();
        assertEquals(Set.of("phosphate", "Tris"), Set.copyOf(b.stream().map(BufferContribution::system).toList()));
        assertEquals(2, b.size());
        assertTrue(b.get(0).bufferCapacityPerLitre() >= b.get(1).bufferCapacityPerLitre(), b::toString);
        assertEquals(b.get(0).system(), c.mainBuffer().orElseThrow().system());
        BufferContribution phosphate = b.stream().filter(x -> x.system().equals("phosphate")).findFirst().orElseThrow();
        BufferContribution tris = b.stream().filter(x -> x.system().equals("Tris")).findFirst().orElseThrow();
        assertEquals(0.020, phosphate.molesPerBasis(), 1e-9);
        assertEquals(0.013, tris.molesPerBasis(), 1e-9);
        double sum = phosphate.bufferCapacityPerLitre() + tris.bufferCapacityPerLitre();
        assertEquals(c.bufferCapacityPerLitre(), sum, 1e-5);
        assertEquals(phosphate.bufferCapacityPerLitre() / c.bufferCapacityPerLitre(), phosphate.share(), 1e-12);
        assertEquals(tris.bufferCapacityPerLitre() / c.bufferCapacityPerLitre(), tris.share(), 1e-12);
        assertEquals(7.1965, phosphate.nearestPKa(), 0.05);
        assertEquals(8.07, tris.nearestPKa(), 0.05);
        assertFalse(phosphate.open());
    }

    /**
     * A closed condition's pH once in air: pure water (here 10 mmol/L NaCl) in equilibrium with air is near pH 5.6
     * (common practice, "clean rain"); an open condition has no such figure.
     */
    @Test
    void aClosedConditionShowsItsPHInAirAndAnOpenOneDoesNot() {
        FormulationAnalysis a = analyse("\"components\": [{\"substance\": \"sodium chloride\", \"amount\": \"10 mmol/L\"}],"
                + " \"conditions\": [{\"name\": \"closed\", \"temperature\": \"25 Cel\"},"
                + " {\"name\": \"open\", \"temperature\": \"25 Cel\", \"co2\": \"air\"}]");
        assertEquals(5.6, a.conditions().get(0).pHInAir().getAsDouble(), 0.05);
        assertTrue(a.conditions().get(1).pHInAir().isEmpty());
    }

    private static final String BICARBONATE = "\"components\": [{\"substance\": \"sodium hydrogen carbonate\", \"amount\":"
            + " \"24 mmol/L\"}, {\"substance\": \"sodium chloride\", \"amount\": \"100 mmol/L\"}],"
            + " \"targets\": {\"pH\": {\"value\": 7.4, \"tolerance\": 0.2, \"temperature\": \"37 Cel\"}},";

    /**
     * The CO2 level that puts a bicarbonate medium at its target's midpoint: 24 mmol/L bicarbonate is at pH 7.4 under
     * 40 mmHg, 5.3 kPa (Henderson–Hasselbalch with pK' 6.1 and 0.03 mmol/L per mmHg, textbook acid–base physiology,
     * from memory); the medium solved at that pressure is at the midpoint (self-consistency).
     */
    @Test
    void theCo2ForTheTargetPutsTheMediumAtTheTargetsMidpoint() {
        ConditionResult use = analyse(BICARBONATE + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"37 Cel\","
                + " \"co2\": \"5 %\"}]").conditions().get(0);
        double pascal = use.co2ForTarget().getAsDouble();
        assertEquals(5300, pascal, 0.2 * 5300);
        ConditionResult again = analyse(BICARBONATE + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"37 Cel\","
                + " \"co2\": \"" + String.format(Locale.ROOT, "%.6f kPa", pascal / 1000) + "\"}]").conditions().get(0);
        assertEquals(7.4, again.state().orElseThrow().pH(), 0.002);
    }

    /** Assumptions say which conditions are open and at what CO2, and where the volume was made up. */
    @Test
    void theAssumptionsNameTheCo2StateAndTheMakeUpTemperature() {
        List<String> mixed = analyse(TRIS_AND_PHOSPHATE + ", \"conditions\": [{\"name\": \"use\", \"temperature\": "
                + "\"37 Cel\", \"co2\": \"5 %\"}, {\"name\": \"bench\", \"temperature\": \"25 Cel\"}]").assumptions();
        assertTrue(mixed.stream().anyMatch(s -> s.startsWith("use: open to CO2 at 5.07 kPa")), mixed::toString);
        assertTrue(mixed.stream().anyMatch(s -> s.startsWith("conditions without a CO2 level: closed")), mixed::toString);
        // Recipe: the volume is made up at the preparation condition, else at 20 °C
        assertTrue(mixed.stream().anyMatch(s -> s.startsWith("made up to volume at 20 °C")), mixed::toString);
        List<String> open = analyse(TRIS_AND_PHOSPHATE + ", \"conditions\": [{\"name\": \"use\", \"temperature\": "
                + "\"37 Cel\", \"co2\": \"5 %\"}]").assumptions();
        assertTrue(open.contains("no condition is closed"), open::toString);
        List<String> saline = analyse("\"components\": [{\"substance\": \"sodium chloride\", \"amount\": \"10 mmol/L\"}]")
                .assumptions();
        assertTrue(saline.stream().noneMatch(s -> s.startsWith("apparent molar volume estimated")), saline::toString);
    }

    /** A drift between a closed and an open condition names the CO2 change; one between two closed ones does not. */
    @Test
    void aDriftNamesTheCo2ChangeAndItsTemperatures() {
        FormulationAnalysis a = analyse(TRIS_AND_PHOSPHATE + ", \"conditions\": [{\"name\": \"bench\", \"temperature\": "
                + "\"25 Cel\"}, {\"name\": \"cold\", \"temperature\": \"4 Cel\"}, {\"name\": \"use\", \"temperature\": "
                + "\"37 Cel\", \"co2\": \"5 %\"}]");
        Drift closed = a.drifts().get(0);
        assertEquals(25, closed.fromCelsius(), 1e-9);
        assertEquals(4, closed.toCelsius(), 1e-9);
        assertTrue(closed.co2Change().isEmpty(), closed::toString);
        Drift open = a.drifts().get(1);
        assertEquals("use", open.to());
        assertEquals(Optional.of("CO2 closed → 5.07 kPa"), open.co2Change());
    }

    /**
     * Phosphate alone from 25 to 37 °C: the step that buffers is the second, and its slope at the mean temperature is
     * van 't Hoff's −ΔH(T)/(R ln10 T²) with ΔH(T) = ΔH° + ΔCp°(T − 298.15 K), the library's 3.6 kJ/mol and
     * −230 J/(K·mol) (Goldberg, Kishore and Lennen 2002, from memory): −0.00125 per K at 31 °C (derived). The first
     * step (ΔH° −8.0 kJ/mol) would give +0.005.
     */
    @Test
    void theDriftSlopeIsThatOfTheStepThatBuffers() {
        Drift d = analyse("\"components\": [{\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": "
                + "\"16 mmol/L\"}, {\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"4 mmol/L\"}],"
                + " \"conditions\": [{\"name\": \"bench\", \"temperature\": \"25 Cel\"}, {\"name\": \"use\","
                + " \"temperature\": \"37 Cel\"}]").drifts().get(0);
        double t = 304.15;
        double dH = 3600 - 230 * (t - 298.15);
        assertEquals(-dH / (8.314462618 * Math.log(10) * t * t), d.dpKadT(), 0.0002);
        assertEquals("phosphate", d.system().orElseThrow());
    }

    private static final String WEAK_ACID = "{\"substance\": \"acetic acid\", \"amount\": \"3.6 mmol/kg\"},"
            + " {\"substance\": \"sodium acetate anhydrous\", \"amount\": \"6.4 mmol/kg\"}";
    private static final String BODY = "\"conditions\": [{\"name\": \"body\", \"temperature\": \"37 Cel\"}]";

    /**
     * The titratable acidity is the strong base per litre at 37 °C that brings the recipe to pH 7.4 there: that much
     * sodium hydroxide (per kg of water: times the litres a kilogram of water makes at 37 °C) weighed into the recipe
     * puts it there (self-consistency; near the end point the pH is steep, so an error of a per cent in the amount
     * shows as tenths of a pH unit).
     */
    @Test
    void theTitratableAcidityWeighedInAsSodiumHydroxideGivesPH74() {
        FormulationAnalysis a = analyse("{\"waterMass\": \"1 kg\"}", "\"components\": [" + WEAK_ACID + "], " + BODY);
        double litres = a.conditions().get(0).volumeLitres();
        double mmolPerKg = a.titratableAcidity().orElseThrow().mmolPerLitre() * litres;
        ConditionResult body = analyse("{\"waterMass\": \"1 kg\"}", "\"components\": [" + WEAK_ACID + ","
                + " {\"substance\": \"sodium hydroxide\", \"amount\": \""
                + String.format(Locale.ROOT, "%.9f", mmolPerKg) + " mmol/kg\"}], " + BODY).conditions().get(0);
        assertEquals(7.4, body.state().orElseThrow().pH(), 0.005);
    }

    /** A basic recipe needs acid to reach 7.4: Tris base (pKa 7.75 at 37 °C) is about 70 % protonated there. */
    @Test
    void aBasicRecipesTitratableAcidityIsNegative() {
        TitratableAcidity t = analyse("\"components\": [{\"substance\": \"Tris\", \"amount\": \"10 mmol/L\"}]")
                .titratableAcidity().orElseThrow();
        assertEquals(-7, t.mmolPerLitre(), 1);
        assertTrue(t.mmolPerDose().isEmpty());
    }

    /** The base load to leave the target upwards is about β·ΔpH too (the definition of β, derived). */
    @Test
    void baseLoadMatchesBufferCapacityTimesTheDistanceToTheUpperEdge() {
        ConditionResult c = analyse("\"components\": [{\"substance\": \"potassium dihydrogen phosphate\", \"amount\": "
                + "\"50 mmol/L\"}, {\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": \"50 mmol/L\"}],"
                + " \"targets\": {\"pH\": {\"min\": 6.70, \"max\": 6.84, \"temperature\": \"25 Cel\"}}").conditions().get(0);
        double distance = 6.84 - c.state().orElseThrow().pH();
        double expected = c.bufferCapacityPerLitre() * 1000 * distance;
        assertTrue(distance > 0 && distance < 0.05, "pH " + c.state().orElseThrow().pH());
        assertEquals(expected, c.loads().orElseThrow().baseToLeaveTarget().getAsDouble(), 0.1 * expected);
    }

    /**
     * Every constant in the uncertainty budget has an uncertainty and belongs to a system the recipe holds, or is pKw:
     * phosphate's steps only, no CO2 system for a closed recipe; and the activity model.
     */
    @Test
    void theUncertaintyBudgetListsOnlyTheConstantsThatApply() {
        Uncertainty u = analyse("\"components\": [{\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": "
                + "\"16 mmol/L\"}, {\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"4 mmol/L\"}]")
                .conditions().get(0).uncertainty().orElseThrow();
        assertFalse(u.contributions().isEmpty());
        for (Uncertainty.Contribution c : u.contributions()) {
            assertTrue(c.standardUncertainty() > 0, c::toString);
            assertTrue(c.constant().startsWith("phosphate ") || c.constant().equals("pKw")
                    || c.constant().startsWith("activity model"), c::toString);
        }
        for (int i = 1; i < u.contributions().size(); i++) {
            assertTrue(Math.abs(u.contributions().get(i - 1).pHChange()) >= Math.abs(u.contributions().get(i).pHChange()));
        }
    }

    /** mL of stock is mol over the stock's mol/L: 0.5 mol/L takes twice the millilitres of the moles in mmol. */
    @Test
    void stockMillilitresAreMolesOverTheStocksMolarity() {
        TitrantResult t = analyse("\"components\": [{\"substance\": \"Tris\", \"amount\": \"50 mmol/L\"},"
                + " {\"substance\": \"hydrochloric acid\", \"stock\": {\"concentration\": \"0.5 mol/L\"},"
                + " \"adjustTo\": {\"pH\": 8.0, \"temperature\": \"25 Cel\"}}]").titrants().get(0);
        assertEquals(t.moles() / 0.5 * 1000, t.stockMillilitres().getAsDouble(), 1e-9);
        assertTrue(t.moles() > 0.01);
        assertTrue(t.pHAfterMakingUp().isEmpty(), "adjusted at volume: nothing changes on making up");
        assertEquals(1, t.atVolume());
        assertTrue(t.setpointForTarget().isEmpty(), "no target to propose a setpoint for");
    }

    /**
     * A q.s. that needs more stock than the recipe makes is out of reach: 100 mmol/L Tris taken to pH 7 needs about
     * 90 mmol of HCl (Tris pKa 8.07), 9 L of a 0.01 mol/L stock for a 1 L batch.
     */
    @Test
    void aQsThatNeedsMoreStockThanTheBatchIsUnreachable() {
        TitrantResult t = analyse("\"components\": [{\"substance\": \"Tris\", \"amount\": \"100 mmol/L\"},"
                + " {\"substance\": \"hydrochloric acid\", \"stock\": {\"concentration\": \"0.01 mol/L\"},"
                + " \"adjustTo\": {\"pH\": 7.0, \"temperature\": \"25 Cel\"}}]").titrants().get(0);
        String why = t.unreachable().orElseThrow().reason();
        assertTrue(why.contains("more than the 1000.0 mL of solution"), why);
        assertTrue(why.contains("use a stronger stock"), why);
    }

    /** A base cannot lower the pH: the reason says what it is, where the recipe starts and at what temperature. */
    @Test
    void aTitrantOfTheWrongKindSaysWhereTheRecipeStarts() {
        TitrantResult t = analyse("\"components\": [{\"substance\": \"Tris\", \"amount\": \"50 mmol/L\"},"
                + " {\"substance\": \"sodium hydroxide\", \"stock\": {\"concentration\": \"1 mol/L\"},"
                + " \"adjustTo\": {\"pH\": 7.0, \"temperature\": \"25 Cel\"}}]").titrants().get(0);
        String why = t.unreachable().orElseThrow().reason();
        assertTrue(why.contains("is a base and can only raise the pH"), why);
        assertTrue(why.contains("at 25 °C, already above the goal pH 7.00"), why);
    }

    /** A weak titrant that runs out says the most it was tried with: 2 mol per kg of water, at the goal's temperature. */
    @Test
    void aTitrantThatRunsOutSaysHowMuchWasTried() {
        TitrantResult t = analyse("\"components\": [{\"substance\": \"Tris\", \"amount\": \"50 mmol/L\"},"
                + " {\"substance\": \"acetic acid\", \"stock\": {\"concentration\": \"1 mol/L\"},"
                + " \"adjustTo\": {\"pH\": 3.0, \"temperature\": \"25 Cel\"}}]").titrants().get(0);
        String why = t.unreachable().orElseThrow().reason();
        assertTrue(why.contains("even 2000 mmol per kg of water reaches only pH"), why);
        assertTrue(why.endsWith("at 25 °C"), why);
    }

    /** The sensitivities at the target come largest first. */
    @Test
    void sensitivitiesComeLargestFirst() {
        List<Sensitivity> s = analyse(TRIS_AND_PHOSPHATE + ", \"targets\": {\"pH\": {\"value\": 7.6, \"tolerance\": 0.5,"
                + " \"temperature\": \"25 Cel\"}}").targetSensitivities();
        assertEquals(4, s.size(), s::toString);
        for (int i = 1; i < s.size(); i++) {
            assertTrue(Math.abs(s.get(i - 1).dpHPerPercent()) >= Math.abs(s.get(i).dpHPerPercent()), s::toString);
        }
    }

    /** A saturation index is reported where the ions of a library solid are present (calcium with phosphate). */
    @Test
    void aConditionHoldingCalciumAndPhosphateReportsSaturation() {
        ConditionResult c = analyse("\"components\": [{\"substance\": \"calcium chloride anhydrous\", \"amount\": "
                + "\"2 mmol/L\"}, {\"substance\": \"disodium hydrogen phosphate anhydrous\", \"amount\": \"16 mmol/L\"},"
                + " {\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"4 mmol/L\"}]").conditions().get(0);
        assertTrue(c.determinate());
        assertFalse(c.saturation().isEmpty());
    }

    /** A warning beside the pH leaves the condition determinate; only an indeterminate caveat does not. */
    @Test
    void aWarningAloneLeavesAConditionDeterminate() {
        ConditionResult c = analyse("\"components\": [{\"substance\": \"sodium chloride\", \"amount\": \"10 mmol/L\"}]")
                .conditions().get(0);
        assertTrue(c.withCaveat(Caveat.warning("test", "a warning")).determinate());
        assertFalse(c.withCaveat(Caveat.indeterminate("test", "not determinate")).determinate());
    }
}
