package org.protolyte.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
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

/** A robustness study of 1,000 batches of the HEPES medium sample (three conditions, q.s. with NaOH). */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 3)
@Measurement(iterations = 3, time = 3)
@Fork(1)
public class RobustnessBenchmark {

    private Recipe recipe;
    private Robustness robustness;

    @Setup
    public void setUp() throws Exception {
        Path root = Path.of(System.getProperty("protolyte.projectRoot", ".."));
        byte[] medium = Files.readAllBytes(root.resolve("sample-formulations/cell-culture-hepes-basal-medium.json"));
        SchemaCatalog schemas = new SchemaCatalog();
        recipe = new RecipeResolver(LibraryLoader.shipped(schemas))
                .resolve(new FormulationReader(schemas).read(new JsonReader().read("m", medium)));
        robustness = new Robustness(new Equilibrium(Davies.INSTANCE));
    }

    @Benchmark
    public Robustness.Result thousandBatches() {
        return robustness.run(recipe, new Robustness.Settings(1000, 1, 0.01, 0.01), x -> { });
    }
}
