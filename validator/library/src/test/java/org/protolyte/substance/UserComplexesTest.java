package org.protolyte.substance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
import org.protolyte.analysis.Analyzer;
import org.protolyte.analysis.ConditionResult;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.document.DocumentException;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.recipe.RecipeResolver;

/**
 * Complexes declared in a library reach the recipe: a zinc citrate complex with an invented constant (a test value,
 * not data; the shipped library has none for zinc) appears in the speciation, takes zinc and citrate from their
 * balances and lowers the pH of a citrate buffer (binding the most deprotonated form releases protons, derived).
 */
class UserComplexesTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();

    private static SubstanceLibrary library(String complexes) {
        String json = "{\"document\": \"substance-library\", \"formatVersion\": 1, \"complexes\": [" + complexes + "]}";
        return new LibraryLoader(SCHEMAS).addShipped().add("site.json", json.getBytes(StandardCharsets.UTF_8), true).build();
    }

    private static ConditionResult use(SubstanceLibrary lib) {
        return at(lib, 25);
    }

    private static ConditionResult at(SubstanceLibrary lib, double celsius) {
        String doc = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-CX\", \"basis\": {\"finalVolume\": \"1 L\"},"
                + " \"components\": [{\"substance\": \"citric acid anhydrous\", \"amount\": \"10 mmol/L\"},"
                + " {\"substance\": \"trisodium citrate dihydrate\", \"amount\": \"10 mmol/L\"},"
                + " {\"substance\": \"zinc chloride\", \"amount\": \"5 mmol/L\"}],"
                + " \"conditions\": [{\"name\": \"use\", \"temperature\": \"" + celsius + " Cel\"}]}";
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read("t", doc.getBytes(StandardCharsets.UTF_8)));
        return new Analyzer(new Equilibrium(Davies.INSTANCE)).analyze(new RecipeResolver(lib).resolve(f)).conditions().get(0);
    }

    private static final String ZNCIT = "{\"name\": \"ZnCit-\", \"charge\": -1, \"components\": {\"Zn+2\": 1, \"Cit-3\": 1},"
            + " \"log10K\": 4.5, \"uncertainty\": 0.1, \"validFrom\": 0, \"validTo\": 50, \"source\": \"test value\"}";

    @Test
    void aDeclaredComplexBindsAndReleasesProtons() {
        ConditionResult without = use(library(""));
        ConditionResult with = use(library(ZNCIT));
        double bound = with.state().orElseThrow().species().stream().filter(s -> s.species().name().equals("ZnCit-"))
                .findFirst().orElseThrow().molality();
        assertTrue(bound > 0.001 && bound < 0.005, "ZnCit- " + bound);
        assertTrue(with.state().orElseThrow().pH() < without.state().orElseThrow().pH() - 0.05);
        assertEquals(without.state().orElseThrow().particleMolality() - bound,
                with.state().orElseThrow().particleMolality(), 2e-4, "a complex of two is one particle, less the protons released");
    }

    /**
     * A complex that moves the pH, used outside the temperatures of its data: within 25 K of them it is carried by
     * van 't Hoff with a warning that gives its pH effect; further out the result is void.
     */
    @Test
    void aComplexOutsideItsRangeWarnsNearItAndVoidsTheResultFarFromIt() {
        SubstanceLibrary lib = library(ZNCIT.replace("\"validFrom\": 0, \"validTo\": 50", "\"validFrom\": 40, \"validTo\": 50"));
        ConditionResult near = at(lib, 25);
        assertTrue(near.determinate(), near.caveats().toString());
        assertTrue(near.caveats().stream().anyMatch(c -> c.code().equals("temperature-out-of-range-complex")),
                near.caveats().toString());
        ConditionResult far = at(lib, 5);
        assertTrue(!far.determinate() && far.caveats().stream().anyMatch(c -> c.code().equals("temperature-out-of-range")),
                far.caveats().toString());
    }

    @Test
    void aComplexOfUnknownComponentsIsRefusedAtItsPlace() {
        DocumentException e = org.junit.jupiter.api.Assertions.assertThrows(DocumentException.class, () -> library(
                "{\"name\": \"XY\", \"charge\": 0, \"components\": {\"X+2\": 1, \"Cit-3\": 1}, \"log10K\": 1,"
                        + " \"uncertainty\": 0.1, \"validFrom\": 0, \"validTo\": 50, \"source\": \"test value\"}"));
        assertTrue(e.getMessage().contains("/complexes/0/components/X+2"), e.getMessage());
    }
}
