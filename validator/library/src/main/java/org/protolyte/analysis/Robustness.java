package org.protolyte.analysis;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.IntConsumer;

import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;
import org.protolyte.chemistry.ActivityModel;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.chemistry.IndeterminateException;
import org.protolyte.document.Formulation;
import org.protolyte.analysis.BatchSampler.Nominal;
import org.protolyte.recipe.Ingredient;
import org.protolyte.recipe.Recipe;

/**
 * How much a recipe can take, by Monte Carlo through the engine, keeping two kinds of uncertainty apart:
 * <ul>
 * <li>batch to batch: each weighed amount uniform within its tolerance, and for a q.s. recipe the meter
 *     reading (normal) that sets the dose — reported as the distribution of pH, buffer capacity and osmolality per
 *     condition and the probability of a batch leaving the pH target;</li>
 * <li>systematic: the constants (each step's pKa and ΔH° a normal pair with their standard uncertainties and
 *     correlation, each complex's log K, and pKw), the same for every batch, so never mixed into that probability —
 *     reported as the spread of the predicted (nominal) pH, to first order in the constants.</li>
 * </ul>
 * Also the worst-case corners of the tolerance box (chosen by the sign of each component's sensitivity)
 * and the local sensitivities, dpH per +1 % of each component with the q.s. dosed again.
 */
public final class Robustness {

    /** Settings; tolerances are half-widths as fractions (0.01 = ±1 %). */
    public record Settings(int samples, long seed, double defaultTolerance, double meterStandardUncertainty) {
        public static Settings defaults() {
            return new Settings(10_000, 20_261_201L, 0.01, 0.01);
        }
    }

    /** Mean, standard deviation and 2.5 / 97.5 % percentiles of one quantity at one condition. */
    public record Interval(double mean, double standardDeviation, double p025, double p975) {
    }

    public record ConditionRobustness(String condition, Interval pH, Interval bufferCapacity, Interval osmolality,
                                      OptionalDouble probabilityOutsideTarget, Interval systematicPH,
                                      double lowestCornerPH, double highestCornerPH, Map<String, Double> sensitivities) {
    }

    /**
     * {@code samplesSolved} of the settings' samples; the others could not be solved, {@code unsolved} says why (the
     * first such batch's reason). An unsolved batch counts as one outside the pH target: a batch the engine cannot
     * stand behind is not one that passes, so the risk is never understated.
     */
    public record Result(Settings settings, int samplesSolved, List<ConditionRobustness> conditions,
                         Map<String, Double> tolerances, Optional<String> unsolved) {
        public int samplesUnsolved() {
            return settings.samples() - samplesSolved;
        }
    }

    private final Analyzer analyzer;
    public Robustness(Equilibrium equilibrium) {
        this.analyzer = new Analyzer(equilibrium);
    }

    /** Runs the study; {@code progress} receives the number of samples done (for a terminal display). */
    public Result run(Recipe recipe, Settings settings, IntConsumer progress) {
        List<Formulation.Condition> conditions = recipe.formulation().conditions();
        List<Ingredient> weighed = recipe.ingredients().stream().filter(i -> i.kind() != Ingredient.Kind.TITRANT
                && !i.substance().solvent()).toList();
        Map<String, Double> tolerances = new LinkedHashMap<>();
        weighed.forEach(i -> tolerances.put(i.substance().name(), tolerance(i, settings)));
        Nominal nominalDose = Nominal.of(analyzer, recipe);
        BatchSampler sampler = new BatchSampler(analyzer, recipe, nominalDose, new BatchSampler.Batches(recipe));
        RandomGenerator random = new Well19937c(settings.seed());
        int n = conditions.size();
        DescriptiveStatistics[] pH = stats(n);
        DescriptiveStatistics[] beta = stats(n);
        DescriptiveStatistics[] osmolality = stats(n);
        int[] outside = new int[n];
        int solved = 0;
        Optional<String> firstFailure = sampler.nominal() instanceof BatchSampler.Unsolved u
                ? Optional.of(u.reason()) : Optional.empty();
        for (int k = 0; k < settings.samples(); k++) {
            Map<Ingredient, Double> scale = new LinkedHashMap<>();
            for (Ingredient i : weighed) {
                double t = tolerances.get(i.substance().name());
                scale.put(i, 1 + t * (2 * random.nextDouble() - 1));
            }
            double meter = settings.meterStandardUncertainty() * random.nextGaussian();
            BatchSampler.Sample r = sampler.sample(scale, meter);
            if (r instanceof BatchSampler.Solved b) {
                solved++;
                for (int c = 0; c < n; c++) {
                    pH[c].addValue(b.pH()[c]);
                    beta[c].addValue(b.bufferCapacity()[c] * 1000);
                    osmolality[c].addValue(b.osmolality()[c] * 1000);
                    if (outsideTarget(recipe, b.pH()[c])) {
                        outside[c]++;
                    }
                }
            } else if (r instanceof BatchSampler.Unsolved u && firstFailure.isEmpty()) {
                firstFailure = Optional.of(u.reason());
            }
            if ((k + 1) % 500 == 0) {
                progress.accept(k + 1);
            }
        }
        DescriptiveStatistics[] systematic;
        try {
            systematic = systematic(recipe, settings, random, n, sampler, nominalDose,
                    analyzer.equilibrium().activityModel());
        } catch (IndeterminateException e) {
            // caught: the systematic band is not shown (NaN), and the reason is the study's first failure
            systematic = stats(n);
            if (firstFailure.isEmpty()) {
                firstFailure = Optional.of("the systematic spread could not be computed: " + e.getMessage());
            }
        }
        List<ConditionRobustness> out = new ArrayList<>();
        for (int c = 0; c < n; c++) {
            Formulation.Condition cond = conditions.get(c);
            boolean atTarget = recipe.formulation().pHTarget().map(t -> Formulation.sameTemperature(t.kelvin(), cond.kelvin()))
                    .orElse(false);
            Map<String, Double> sensitivities = sensitivities(sampler, weighed, c);
            double[] corners = corners(sampler, weighed, tolerances, sensitivities, c);
            out.add(new ConditionRobustness(cond.name(), interval(pH[c]), interval(beta[c]), interval(osmolality[c]),
                    atTarget && settings.samples() > 0
                            ? OptionalDouble.of((double) (outside[c] + settings.samples() - solved) / settings.samples())
                            : OptionalDouble.empty(),
                    interval(systematic[c]), corners[0], corners[1], sensitivities));
        }
        return new Result(settings, solved, out, tolerances, firstFailure);
    }

    private static double tolerance(Ingredient i, Settings settings) {
        return i.line().tolerance().orElse(settings.defaultTolerance());
    }

    /** Counted at every condition, reported only at one at the target's temperature. */
    private static boolean outsideTarget(Recipe recipe, double pH) {
        return recipe.formulation().pHTarget().map(t -> !t.contains(pH)).orElse(false);
    }

    private static DescriptiveStatistics[] stats(int n) {
        DescriptiveStatistics[] s = new DescriptiveStatistics[n];
        for (int i = 0; i < n; i++) {
            s[i] = new DescriptiveStatistics();
        }
        return s;
    }

    private static Interval interval(DescriptiveStatistics s) {
        if (s.getN() == 0) {
            return new Interval(Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        }
        return new Interval(s.getMean(), s.getStandardDeviation(), s.getPercentile(2.5), s.getPercentile(97.5));
    }

    /**
     * The constants drawn once per "world", as many worlds as batches: each constant's standard normal draw (a step's
     * pKa and ΔH° a correlated pair, as one fit gives them) times the nominal batch's pH response to it, q.s. held
     * at the meter's setpoint ({@link BatchSampler#responses}); the spread of that pH is the uncertainty of the
     * prediction itself. Linear in the constants, as the report's uncertainty budget is.
     */
    private static DescriptiveStatistics[] systematic(Recipe recipe, Settings settings, RandomGenerator random, int n,
                                                      BatchSampler sampler, Nominal nominalDose,
                                                      ActivityModel activity) {
        List<ConstantsPropagation.Perturbation> constants = ConstantsPropagation.perturbations(recipe,
                recipe.solution(nominalDose.doses(recipe)), activity);
        double[][] response = sampler.responses(constants);     // throws where the nominal batch is unsolved
        double[] nominal = ((BatchSampler.Solved) sampler.nominal()).pH();
        DescriptiveStatistics[] out = stats(n);
        double[] z = new double[constants.size()];
        for (int w = 0; w < settings.samples(); w++) {
            for (int q = 0; q < z.length; q++) {
                ConstantsPropagation.Perturbation p = constants.get(q);
                double g = random.nextGaussian();
                z[q] = p.pair() >= 0 ? p.correlation() * z[p.pair()] + Math.sqrt(1 - p.correlation() * p.correlation()) * g
                        : g;
            }
            for (int c = 0; c < n; c++) {
                double pH = nominal[c];
                for (int q = 0; q < z.length; q++) {
                    pH += response[c][q] * z[q];
                }
                out[c].addValue(pH);
            }
        }
        return out;
    }

    /** dpH at one condition per +1 % of each weighed component, q.s. dosed again. */
    private static Map<String, Double> sensitivities(BatchSampler sampler, List<Ingredient> weighed, int c) {
        Map<String, Double> out = new LinkedHashMap<>();
        if (!(sampler.nominal() instanceof BatchSampler.Solved nominal)) {
            return out;
        }
        for (Ingredient i : weighed) {
            if (sampler.sample(Map.of(i, 1.01), 0) instanceof BatchSampler.Solved r) {
                out.put(i.substance().name(), r.pH()[c] - nominal.pH()[c]);
            }
        }
        return out;
    }

    /** Lowest and highest pH over the tolerance box, at the corners the sensitivities point to; NaN where unsolved. */
    private static double[] corners(BatchSampler sampler, List<Ingredient> weighed, Map<String, Double> tolerances,
                                    Map<String, Double> sensitivities, int c) {
        Map<Ingredient, Double> low = new LinkedHashMap<>();
        Map<Ingredient, Double> high = new LinkedHashMap<>();
        for (Ingredient i : weighed) {
            double t = tolerances.get(i.substance().name());
            double s = sensitivities.getOrDefault(i.substance().name(), 0.0);
            low.put(i, s > 0 ? 1 - t : 1 + t);
            high.put(i, s > 0 ? 1 + t : 1 - t);
        }
        return new double[] {pH(sampler.sample(low, 0), c), pH(sampler.sample(high, 0), c)};
    }

    private static double pH(BatchSampler.Sample s, int c) {
        return s instanceof BatchSampler.Solved b ? b.pH()[c] : Double.NaN;
    }
}
