package org.protolyte.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
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
import org.protolyte.Protolyte;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.chemistry.EquilibriumState;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.recipe.Solution;
import org.protolyte.report.DocumentReport;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;

/** The in-process figures: one equilibrium solve, reading and validation, and one whole check. */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class EngineBenchmark {

    private byte[] medium;
    private SchemaCatalog schemas;
    private Protolyte protolyte;
    private Solution solution;
    private Equilibrium equilibrium;
    private FormulationReader reader;

    @Setup
    public void setUp() throws Exception {
        Path root = Path.of(System.getProperty("protolyte.projectRoot", ".."));
        medium = Files.readAllBytes(root.resolve("sample-formulations/cell-culture-hepes-basal-medium.json"));
        schemas = new SchemaCatalog();
        SubstanceLibrary library = LibraryLoader.shipped(schemas);
        protolyte = new Protolyte(schemas, library);
        reader = new FormulationReader(schemas);
        Recipe recipe = new RecipeResolver(library).resolve(reader.read(new JsonReader().read("m", medium)));
        solution = recipe.solution(Map.of());
        equilibrium = new Equilibrium(Davies.INSTANCE);
    }

    @Benchmark
    public EquilibriumState equilibriumSolve() {
        return equilibrium.solve(solution.species(), solution.totals(), 310.15);
    }

    @Benchmark
    public Object readAndValidate() {
        return reader.read(new JsonReader().read("m", medium));
    }

    @Benchmark
    public DocumentReport wholeCheck() {
        return protolyte.check("m", medium);
    }
}
