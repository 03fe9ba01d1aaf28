package org.protolyte.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.concurrent.Callable;

import org.protolyte.Protolyte;
import org.protolyte.analysis.RecipeConflict;
import org.protolyte.analysis.Robustness;
import org.protolyte.chemistry.IonInteraction;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.document.DocumentException;
import org.protolyte.document.Formulation;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.report.RobustnessRenderer;
import org.protolyte.report.Printable;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code protolyte robustness FILE}: Monte Carlo of batch-to-batch and systematic uncertainty. */
@Command(name = "robustness", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "How much a recipe can take: Monte Carlo over weighing tolerances and the meter reading "
                + "(batch to batch), apart from the uncertainty of the constants (systematic); worst-case corners and "
                + "sensitivities.%nExit codes: 0 done, 2 invalid input or usage.")
public final class RobustnessCommand implements Callable<Integer> {

    @Parameters(paramLabel = "FILE")
    Path file;

    @Option(names = "--samples", paramLabel = "N", description = "Monte Carlo samples (default 10000).")
    int samples = 10_000;

    @Option(names = "--seed", paramLabel = "SEED", description = "Random seed, reported so runs reproduce.")
    long seed = Robustness.Settings.defaults().seed();

    @Option(names = "--tolerance", paramLabel = "PERCENT",
            description = "Default weighing tolerance, ± per cent (components may state their own; default 1).")
    double tolerancePercent = 1;

    @Option(names = "--meter", paramLabel = "PH",
            description = "Standard uncertainty of the pH meter reading that sets a q.s. (default 0.01).")
    double meter = 0.01;

    @Option(names = "--format", paramLabel = "FORMAT", description = "text (default) or json.")
    String format = "text";

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "Write the report atomically to FILE.")
    Path output;

    @Mixin
    Setup setup;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        PrintWriter err = spec.commandLine().getErr();
        // a tolerance is a part of the amount, more than nothing and less than all of it (as in documents)
        if (samples < 10 || samples > 10_000_000 || !(tolerancePercent > 0 && tolerancePercent < 100)
                || !(meter >= 0 && Double.isFinite(meter)) || !format.equals("text") && !format.equals("json")) {
            err.println("protolyte: --samples takes 10 to 10000000, --tolerance a per cent above 0 and below 100, "
                    + "--meter a finite number ≥ 0, --format text or json");
            return 2;
        }
        Recipe recipe;
        Optional<ReportFile> target;
        try {
            byte[] content = Setup.read(file, "formulation");
            target = output == null ? Optional.empty() : Optional.of(ReportFile.of(output, inputs()));
            Formulation f = new FormulationReader(setup.schemas).read(new JsonReader().read(file.toString(), content));
            recipe = new RecipeResolver(setup.library()).resolve(f);
        } catch (Setup.UsageException e) {
            return Setup.usage(err, e);
        } catch (DocumentException e) {
            e.problems().forEach(p -> err.println("protolyte: " + Printable.text(file + ": " + p)));
            return 2;
        }
        boolean terminal = System.console() != null;
        Robustness.Settings settings = new Robustness.Settings(samples, seed, tolerancePercent / 100, meter);
        Robustness.Result result;
        try {
            result = new Robustness(new Equilibrium(IonInteraction.INSTANCE)).run(recipe, settings, done -> {
                if (terminal && done % Math.max(500, samples / 20) == 0) {
                    err.printf(Locale.ROOT, "\r%d of %d samples", done, samples);
                    err.flush();
                }
            });
        } catch (RecipeConflict e) {
            Protolyte.atAdjustment(recipe.formulation(), e).problems()
                    .forEach(p -> err.println("protolyte: " + Printable.text(file + ": " + p)));
            return 2;
        }
        if (terminal) {
            err.print("\r" + " ".repeat(40) + "\r");
            err.flush();
        }
        RobustnessRenderer r = new RobustnessRenderer();
        String text = format.equals("json") ? r.json(file.toString(), recipe, result) : r.text(file.toString(), recipe, result);
        if (target.isEmpty()) {
            spec.commandLine().getOut().print(text);
            spec.commandLine().getOut().flush();
            return 0;
        }
        try {
            return target.get().write(out -> {
                out.write(text);
                return 0;
            });
        } catch (IOException e) {
            err.println("protolyte: cannot write the report to " + Printable.text(output + ": " + e.getMessage()));
            return 2;
        }
    }

    private List<Path> inputs() {
        List<Path> all = new ArrayList<>(setup.files());
        all.add(file);
        return all;
    }

}
