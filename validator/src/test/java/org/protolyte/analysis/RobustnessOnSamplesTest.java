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
        try (Stream<Path> s = Files.list(Path.of(System.getProperty("protolyte.projectRoot", ".."), "sample-formulations"))) {
            List<Path> files = s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
            return files.stream();
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("samples")
    void robustnessGivesIntervalsOrSaysIndeterminate(Path sample) throws IOException {
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read(sample.toString(), Files.readAllBytes(sample)));
        Recipe recipe = new RecipeResolver(LibraryLoader.shipped(SCHEMAS)).resolve(f);
        Robustness.Result r = new Robustness(new Equilibrium(Davies.INSTANCE))
                .run(recipe, new Robustness.Settings(100, 5, 0.01, 0.01), x -> { });
        String text = new RobustnessRenderer().text(sample.toString(), recipe, r);
        if (r.samplesSolved() == 0) {
            assertTrue(text.contains("INDETERMINATE"), text);
            return;
        }
        assertEquals(recipe.formulation().conditions().size(), r.conditions().size());
        for (Robustness.ConditionRobustness c : r.conditions()) {
            assertTrue(c.pH().p025() <= c.pH().mean() && c.pH().mean() <= c.pH().p975(), c.condition());
            assertTrue(text.contains(c.condition()));
        }
    }
}
