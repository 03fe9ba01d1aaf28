package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.chemistry.Species;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.substance.LibraryLoader;

/** What complexes do to the numbers a reviewer reads: the apparent pKa and the pH uncertainty. */
class ComplexEffectsTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Equilibrium EQUILIBRIUM = new Equilibrium(Davies.INSTANCE);

    private static Recipe sample(String name) throws IOException {
        Path p = Path.of(System.getProperty("protolyte.projectRoot", "../.."), "sample-formulations", name);
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read(p.toString(), Files.readAllBytes(p)));
        return new RecipeResolver(LibraryLoader.shipped(SCHEMAS)).resolve(f);
    }

    /**
     * Mannitol esterifies borate, not boric acid, so it makes boric acid a stronger acid: the pharmacopoeial assay
     * of boric acid titrates it with sodium hydroxide only after mannitol is added (Ph. Eur. monograph "Boric acid";
     * common practice). The apparent pKa must therefore lie well below the thermodynamic 9.24.
     */
    @Test
    void mannitolLowersTheApparentPKaOfBoricAcid() throws IOException {
        FormulationAnalysis a = new Analyzer(EQUILIBRIUM).analyze(sample("ophthalmic-borate-mannitol-drops.json"));
        BufferContribution borate = a.conditions().get(0).buffers().stream().filter(b -> b.system().equals("borate"))
                .findFirst().orElseThrow();
        assertTrue(borate.apparent(), "the pKa shown is the conditional one");
        assertTrue(borate.nearestPKa() < 9.24 - 1, "apparent pKa " + borate.nearestPKa());
    }

    /**
     * The standard uncertainty of the pH holds each complex's log K uncertainty: it is at least the pH change that
     * moving the dominant ester's log K by its own standard uncertainty causes (linear propagation adds the
     * contributions in quadrature, so the total is never below any one of them).
     */
    @Test
    void complexLogKUncertaintyReachesThePHUncertainty() throws IOException {
        Recipe recipe = sample("ophthalmic-borate-mannitol-drops.json");
        FormulationAnalysis nominal = new Analyzer(EQUILIBRIUM).analyze(recipe);
        Species ester = nominal.solution().species().stream().filter(s -> s.name().equals("B(mannitol)2-"))
                .findFirst().orElseThrow();
        double u = ester.formation().uncertainty();
        assertTrue(u > 0, "the recalled ester constant carries an uncertainty");
        FormulationAnalysis moved = new Analyzer(EQUILIBRIUM.withLogKShift(ester, u)).analyze(recipe);
        ConditionResult c = nominal.conditions().get(0);
        double change = Math.abs(moved.conditions().get(0).state().orElseThrow().pH() - c.state().orElseThrow().pH());
        assertTrue(change > 0.01, "the ester's log K moves the pH: " + change);
        assertTrue(c.uncertainty().orElseThrow().pH() >= 0.95 * change,
                "u(pH) " + c.uncertainty().orElseThrow().pH() + " must hold the ester's " + change);
    }
}
