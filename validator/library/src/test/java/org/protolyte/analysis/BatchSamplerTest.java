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
import org.protolyte.substance.LibraryLoader;

/**
 * The robustness study's systematic part by derivatives ({@link BatchSampler#responses}, each q.s. held where its
 * meter reads the prescribed setpoint) beside the route it replaced: the nominal batch made again in a world with one
 * constant moved by ±u/10 (the same prescribed setpoint, dosed again), the central difference scaled to u. A tenth of
 * u, so that what is compared is the derivative, not the curvature of a response over ±u (the ester constant of the
 * borate–mannitol drops curves by 6 % over its ±u). On every shipped sample, at every condition, for every constant.
 */
class BatchSamplerTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final double FRACTION = 0.1;
    /** Within 1 %, or below 1e-6 pH per u. */
    private static final double RELATIVE = 0.01;
    private static final double FLOOR = 1e-6;

    static Stream<Path> samples() throws IOException {
        return DerivativeAndResolvingRoutesTest.samples();
    }

    private static double[] nominalPH(Equilibrium e, Recipe recipe, BatchSampler.Nominal dose) {
        BatchSampler.Sample s = new BatchSampler(new Analyzer(e), recipe, dose, new BatchSampler.Batches(recipe)).nominal();
        return s instanceof BatchSampler.Solved b ? b.pH() : null;
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("samples")
    void theSystematicResponsesAgreeWithWorldsSolvedAgain(Path sample) throws IOException {
        var f = new FormulationReader(SCHEMAS).read(new JsonReader().read(sample.toString(), Files.readAllBytes(sample)));
        Recipe recipe = new RecipeResolver(LibraryLoader.shipped(SCHEMAS)).resolve(f);
        Equilibrium e = new Equilibrium(Davies.INSTANCE);
        Analyzer analyzer = new Analyzer(e);
        BatchSampler.Nominal dose = BatchSampler.Nominal.of(analyzer, recipe);
        BatchSampler sampler = new BatchSampler(analyzer, recipe, dose, new BatchSampler.Batches(recipe));
        if (!(sampler.nominal() instanceof BatchSampler.Solved)) {
            return;     // a sample whose batches cannot be solved has no systematic band (RobustnessOnSamplesTest)
        }
        var solution = recipe.solution(dose.doses(recipe));
        List<ConstantsPropagation.Perturbation> constants = ConstantsPropagation.perturbations(recipe, solution,
                e.activityModel());
        List<DerivativeAndResolvingRoutesTest.Move> moves = DerivativeAndResolvingRoutesTest.moves(e, recipe, solution,
                FRACTION);
        assertEquals(moves.size(), constants.size(), "the same constants, in the same order");
        double[][] response = sampler.responses(constants);
        int compared = 0;
        for (int q = 0; q < moves.size(); q++) {
            double[] up = nominalPH(moves.get(q).up(), recipe, dose);
            double[] down = nominalPH(moves.get(q).down(), recipe, dose);
            if (up == null || down == null) {
                continue;
            }
            for (int c = 0; c < up.length; c++) {
                double resolved = (up[c] - down[c]) / 2 / moves.get(q).fraction();
                double derived = response[c][q];
                assertEquals(resolved, derived, Math.max(FLOOR, RELATIVE * Math.abs(resolved)),
                        sample.getFileName() + ", " + moves.get(q).name() + ", condition " + c);
                compared++;
            }
        }
        assertTrue(compared > 0, "at least one constant compared");
    }
}
