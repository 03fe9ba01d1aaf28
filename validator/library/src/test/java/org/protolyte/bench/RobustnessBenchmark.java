package org.protolyte.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.protolyte.analysis.Robustness;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.substance.LibraryLoader;

/**
 * A robustness study of 10,000 batches (three conditions, the q.s. with NaOH dosed again per batch) of the 8-component
 * HEPES medium and of the 30-component basal medium, with its systematic part, corners and sensitivities.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 3)
@Measurement(iterations = 3, time = 3)
@Fork(1)
public class RobustnessBenchmark {

    @Param({"cell-culture-hepes-basal-medium.json", "cell-culture-complete-basal-medium.json"})
    public String sample;

    private Recipe recipe;
    private Robustness robustness;

    @Setup
    public void setUp() throws Exception {
        Path root = Path.of(System.getProperty("protolyte.projectRoot", "../.."));
        byte[] medium = Files.readAllBytes(root.resolve("sample-formulations").resolve(sample));
        SchemaCatalog schemas = new SchemaCatalog();
        recipe = new RecipeResolver(LibraryLoader.shipped(schemas))
                .resolve(new FormulationReader(schemas).read(new JsonReader().read("m", medium)));
        robustness = new Robustness(new Equilibrium(Davies.INSTANCE));
    }

    @Benchmark
    public Robustness.Result tenThousandBatches() {
        return robustness.run(recipe, new Robustness.Settings(10_000, 1, 0.01, 0.01), x -> { });
    }
}
