package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.report.RobustnessRenderer;
import org.protolyte.substance.LibraryLoader;

/** The robustness study runs on every sample: intervals where the engine stands behind the numbers, none where not. */
class RobustnessOnSamplesTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();

    static Stream<Path> samples() throws IOException {
        try (Stream<Path> s = Files.list(Path.of(System.getProperty("protolyte.projectRoot", "../.."), "sample-formulations"))) {
            List<Path> files = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
            return files.stream();
        }
    }

    /**
     * A sample whose nominal analysis is determinate at every condition must be solved in every sampled batch, and
     * each condition's batch-to-batch interval must hold the nominal pH (the batches scatter around the recipe as
     * written); a sample the engine cannot stand behind must say INDETERMINATE rather than print intervals.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("samples")
    void robustnessGivesIntervalsOrSaysIndeterminate(Path sample) throws IOException {
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read(sample.toString(), Files.readAllBytes(sample)));
        Recipe recipe = new RecipeResolver(LibraryLoader.shipped(SCHEMAS)).resolve(f);
        Equilibrium equilibrium = new Equilibrium(Davies.INSTANCE);
        FormulationAnalysis nominal = new Analyzer(equilibrium).analyze(recipe);
        Robustness.Result r = new Robustness(equilibrium).run(recipe, new Robustness.Settings(100, 5, 0.01, 0.01), x -> { });
        String text = new RobustnessRenderer().text(sample.toString(), recipe, r);
        boolean determinate = nominal.conditions().stream().allMatch(ConditionResult::determinate);
        if (!determinate) {
            if (r.samplesSolved() == 0) {
                assertTrue(text.contains("INDETERMINATE"), text);
            }
            return;
        }
        assertEquals(100, r.samplesSolved(), "every sampled batch of a determinate recipe is solved");
        assertEquals(recipe.formulation().conditions().size(), r.conditions().size());
        for (Robustness.ConditionRobustness c : r.conditions()) {
            double pH = nominal.conditions().stream().filter(x -> x.condition().name().equals(c.condition()))
                    .findFirst().orElseThrow().state().orElseThrow().pH();
            assertTrue(c.pH().p025() <= c.pH().mean() && c.pH().mean() <= c.pH().p975(), c.condition());
            // the meter's 0.01 standard uncertainty alone spreads the q.s. batches by about ±0.02 around the setpoint
            assertTrue(c.pH().p025() - 0.01 <= pH && pH <= c.pH().p975() + 0.01,
                    () -> c.condition() + ": nominal pH " + pH + " outside " + c.pH());
            assertTrue(text.contains(c.condition()));
        }
    }
}
