package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.protolyte.chemistry.Caveat;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.chemistry.EquilibriumState;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.substance.LibraryLoader;

/**
 * The forecast a batch record is compared with is the analysis without its extras: the same q.s. dose and the same
 * equilibrium at every condition (two paths through the engine that must agree), and no dose where the goal is out
 * of reach, with the reason.
 */
class ForecastTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Analyzer ANALYZER = new Analyzer(new Equilibrium(Davies.INSTANCE));

    private static Recipe recipe(String components) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-FC\", \"revision\": \"A\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": [" + components + "],"
                + " \"conditions\": [{\"name\": \"bench\", \"temperature\": \"25 Cel\"},"
                + " {\"name\": \"cold\", \"temperature\": \"4 Cel\"}]}";
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read("t", json.getBytes(StandardCharsets.UTF_8)));
        return new RecipeResolver(LibraryLoader.shipped(SCHEMAS)).resolve(f);
    }

    /** Tris taken to pH 8.0 with hydrochloric acid: the forecast's dose and pH are the analysis's own. */
    @Test
    void theForecastDosesAndSolvesAsTheAnalysisDoes() {
        Recipe r = recipe("{\"substance\": \"Tris\", \"amount\": \"50 mmol/L\"},"
                + " {\"substance\": \"hydrochloric acid\", \"stock\": {\"concentration\": \"1 mol/L\"},"
                + " \"adjustTo\": {\"pH\": 8.0, \"temperature\": \"25 Cel\"}}");
        FormulationAnalysis a = ANALYZER.analyze(r);
        Analyzer.Forecast f = ANALYZER.forecast(r);
        TitrantResult t = a.titrants().get(0);
        assertTrue(t.moles() > 0.01, t::toString);
        assertEquals(t.moles(), f.doses().get(t.ingredient()).getAsDouble(), 1e-12);
        assertEquals(2, f.states().size());
        for (int i = 0; i < 2; i++) {
            EquilibriumState s = f.states().get(i).orElseThrow();
            assertEquals(a.conditions().get(i).state().orElseThrow().pH(), s.pH(), 1e-9);
        }
        assertEquals(8.0, f.states().get(0).orElseThrow().pH(), 0.01);
        assertTrue(f.caveats().isEmpty(), f.caveats()::toString);
    }

    /** A base cannot bring a Tris buffer down to pH 7: no dose, and the reason as an indeterminate caveat. */
    @Test
    void aGoalOutOfReachGivesNoDoseAndSaysWhy() {
        Recipe r = recipe("{\"substance\": \"Tris\", \"amount\": \"50 mmol/L\"},"
                + " {\"substance\": \"sodium hydroxide\", \"stock\": {\"concentration\": \"1 mol/L\"},"
                + " \"adjustTo\": {\"pH\": 7.0, \"temperature\": \"25 Cel\"}}");
        Analyzer.Forecast f = ANALYZER.forecast(r);
        assertTrue(f.doses().values().iterator().next().isEmpty(), f::toString);
        List<Caveat> c = f.caveats();
        assertEquals(1, c.size(), c::toString);
        assertEquals(Caveat.Severity.INDETERMINATE, c.get(0).severity());
        assertTrue(c.get(0).message().contains("can only raise the pH"), c::toString);
        // the conditions are still solved, with no titrant in the batch
        assertTrue(f.states().stream().allMatch(Optional::isPresent));
    }

    /**
     * Without a titrant there is no dose. 0.3 mol/L sodium chloride is past the Davies equation's comfortable range (a
     * warning beside the pH, which the forecast leaves out); 3 mol/L is beyond it (indeterminate: no state, and why).
     */
    @Test
    void aForecastKeepsOnlyTheCaveatsThatMakeAPHIndeterminate() {
        Recipe saline = recipe("{\"substance\": \"sodium chloride\", \"amount\": \"0.3 mol/L\"},"
                + " {\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"20 mmol/L\"}");
        FormulationAnalysis a = ANALYZER.analyze(saline);
        assertTrue(a.conditions().get(0).caveats().stream().anyMatch(x -> x.severity() == Caveat.Severity.WARNING),
                () -> "the case needs a warning beside the pH: " + a.conditions().get(0).caveats());
        Analyzer.Forecast f = ANALYZER.forecast(saline);
        assertTrue(f.doses().isEmpty());
        assertTrue(f.caveats().isEmpty(), f::toString);
        assertTrue(f.states().stream().allMatch(Optional::isPresent), f::toString);

        Analyzer.Forecast brine = ANALYZER.forecast(recipe("{\"substance\": \"sodium chloride\", \"amount\": \"3 mol/L\"},"
                + " {\"substance\": \"potassium dihydrogen phosphate\", \"amount\": \"20 mmol/L\"}"));
        assertTrue(brine.states().stream().allMatch(Optional::isEmpty), brine::toString);
        assertEquals(2, brine.caveats().size(), brine::toString);
        assertTrue(brine.caveats().stream().allMatch(x -> x.code().equals("ionic-strength-out-of-range")), brine::toString);
    }
}
