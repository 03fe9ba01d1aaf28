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
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.protolyte.Protolyte;
import org.protolyte.chemistry.Davies;
import org.protolyte.chemistry.IonInteraction;
import org.protolyte.analysis.Analyzer;
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

/**
 * The in-process figures for the 8-component HEPES medium and the 30-component basal medium (or any sample given with
 * -p sample=): one equilibrium solve (from scratch, and prepared with a warm start as a study makes them), reading and
 * validation, the analysis, and one whole check (the rules are the rest), through the internals and through the API;
 * the solves and the analysis with either
 * activity model.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class EngineBenchmark {

    @Param({"cell-culture-hepes-basal-medium.json", "cell-culture-complete-basal-medium.json"})
    public String sample;

    /** The activity model of the solves and the analysis (a whole check takes the tool's own). */
    @Param({"IonInteraction", "Davies"})
    public String model;

    private byte[] medium;
    private Recipe recipe;
    private Analyzer analyzer;
    private Equilibrium.Prepared prepared;
    private Equilibrium.Point warm;
    private double[] nearby;
    private SchemaCatalog schemas;
    private Protolyte protolyte;
    private Solution solution;
    private Equilibrium equilibrium;
    private FormulationReader reader;
    private org.protolyte.api.Validator validator;

    @Setup
    public void setUp() throws Exception {
        Path root = Path.of(System.getProperty("protolyte.projectRoot", "../.."));
        medium = Files.readAllBytes(root.resolve("sample-formulations").resolve(sample));
        schemas = new SchemaCatalog();
        SubstanceLibrary library = LibraryLoader.shipped(schemas);
        protolyte = new Protolyte(schemas, library);
        validator = org.protolyte.api.Validator.builder().build();
        reader = new FormulationReader(schemas);
        recipe = new RecipeResolver(library).resolve(reader.read(new JsonReader().read("m", medium)));
        solution = recipe.solution(Map.of());
        equilibrium = new Equilibrium(model.equals("Davies") ? Davies.INSTANCE : IonInteraction.INSTANCE);
        analyzer = new Analyzer(equilibrium);
        prepared = equilibrium.prepare(solution.species(), solution.totals().keySet(), 310.15, Map.of());
        warm = prepared.point(solution.totals(), null);
        // a batch 0.5 % richer in everything: what the next Monte Carlo sample looks like to the solver
        nearby = new double[prepared.components().size()];
        for (int j = 0; j < nearby.length; j++) {
            nearby[j] = 1.005 * solution.totals().getOrDefault(prepared.components().get(j), 0.0);
        }
    }

    @Benchmark
    public EquilibriumState equilibriumSolve() {
        return equilibrium.solve(solution.species(), solution.totals(), 310.15);
    }

    @Benchmark
    public Equilibrium.Point preparedSolveFromANearbyBatch() {
        return prepared.point(nearby, warm);
    }

    @Benchmark
    public Object analysis() {
        return analyzer.analyze(recipe);
    }

    @Benchmark
    public Object readAndValidate() {
        return reader.read(new JsonReader().read("m", medium));
    }

    @Benchmark
    public DocumentReport wholeCheck() {
        return protolyte.check("m", medium);
    }

    /** The same whole check through the library's API: the source's copy of the bytes and the result's records. */
    @Benchmark
    public org.protolyte.api.Result wholeCheckThroughTheApi() {
        return validator.check(org.protolyte.api.Source.of("m", medium));
    }

    /** What the validation service does per request: the check through the API, and its JSON report. */
    @Benchmark
    public String checkAndJsonReport() {
        return validator.check(org.protolyte.api.Source.of("m", medium)).render(org.protolyte.api.Format.JSON);
    }
}
