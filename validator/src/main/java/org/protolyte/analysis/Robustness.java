package org.protolyte.analysis;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.function.IntConsumer;

import org.apache.commons.math3.random.RandomGenerator;
import org.apache.commons.math3.random.Well19937c;
import org.apache.commons.math3.stat.descriptive.DescriptiveStatistics;
import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.chemistry.IndeterminateException;
import org.protolyte.document.Formulation;
import org.protolyte.document.DocumentException;
import org.protolyte.chemistry.Component;
import org.protolyte.chemistry.DissociationStep;
import org.protolyte.recipe.BatchTotals;
import org.protolyte.recipe.Ingredient;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.Solution;

/**
 * How much a recipe can take, by Monte Carlo through the engine, keeping two kinds of uncertainty apart:
 * <ul>
 * <li>batch to batch: each weighed amount uniform within its tolerance, and for a q.s. recipe the meter
 *     reading (normal) that sets the dose — reported as the distribution of pH, buffer capacity and osmolality per
 *     condition and the probability of a batch leaving the pH target;</li>
 * <li>systematic: the constants (each step's pKa and ΔH° a normal pair with their standard uncertainties and
 *     correlation, and pKw), the same for every batch, so never mixed into that probability — reported as the
 *     spread of the predicted (nominal) pH.</li>
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
    private final Equilibrium equilibrium;

    public Robustness(Equilibrium equilibrium) {
        this.equilibrium = equilibrium;
        this.analyzer = new Analyzer(equilibrium);
    }

    /** Runs the study; {@code progress} receives the number of samples done (for a terminal display). */
    public Result run(Recipe recipe, Settings settings, IntConsumer progress) {
        List<Formulation.Condition> conditions = recipe.formulation().conditions();
        List<Ingredient> weighed = recipe.ingredients().stream().filter(i -> i.kind() != Ingredient.Kind.TITRANT
                && !i.substance().solvent()).toList();
        Map<String, Double> tolerances = new LinkedHashMap<>();
        weighed.forEach(i -> tolerances.put(i.substance().name(), tolerance(i, settings)));
        Nominal nominalDose = doses(analyzer, recipe);
        Batches batches = new Batches(recipe);
        Sampler sampler = new Sampler(analyzer, recipe, nominalDose, batches);
        RandomGenerator random = new Well19937c(settings.seed());
        int n = conditions.size();
        DescriptiveStatistics[] pH = stats(n);
        DescriptiveStatistics[] beta = stats(n);
        DescriptiveStatistics[] osmolality = stats(n);
        int[] outside = new int[n];
        int solved = 0;
        for (int k = 0; k < settings.samples(); k++) {
            Map<Ingredient, Double> scale = new LinkedHashMap<>();
            for (Ingredient i : weighed) {
                double t = tolerances.get(i.substance().name());
                scale.put(i, 1 + t * (2 * random.nextDouble() - 1));
            }
            double meter = settings.meterStandardUncertainty() * random.nextGaussian();
            double[][] r = sampler.sample(scale, meter);
            if (r != null) {
                solved++;
                for (int c = 0; c < n; c++) {
                    pH[c].addValue(r[0][c]);
                    beta[c].addValue(r[1][c] * 1000);
                    osmolality[c].addValue(r[2][c] * 1000);
                    if (outsideTarget(recipe, r[0][c])) {
                        outside[c]++;
                    }
                }
            }
            if ((k + 1) % 500 == 0) {
                progress.accept(k + 1);
            }
        }
        DescriptiveStatistics[] systematic = systematic(recipe, settings, random, n, nominalDose, batches);
        List<ConditionRobustness> out = new ArrayList<>();
        double[][] nominal = sampler.nominal();
        for (int c = 0; c < n; c++) {
            Formulation.Condition cond = conditions.get(c);
            boolean atTarget = recipe.formulation().pHTarget().map(t -> Formulation.sameTemperature(t.kelvin(), cond.kelvin()))
                    .orElse(false);
            Map<String, Double> sensitivities = sensitivities(sampler, weighed, c, nominal);
            double[] corners = corners(sampler, weighed, tolerances, sensitivities, c);
            out.add(new ConditionRobustness(cond.name(), interval(pH[c]), interval(beta[c]), interval(osmolality[c]),
                    atTarget && settings.samples() > 0
                            ? OptionalDouble.of((double) (outside[c] + settings.samples() - solved) / settings.samples())
                            : OptionalDouble.empty(),
                    interval(systematic[c]), corners[0], corners[1], sensitivities));
        }
        return new Result(settings, solved, out, tolerances, sampler.firstFailure());
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
     * The constants drawn once per "world": the nominal recipe, dosed to the prescribed setpoint, in each; the
     * spread of its pH is the uncertainty of the prediction itself.
     */
    private DescriptiveStatistics[] systematic(Recipe recipe, Settings settings, RandomGenerator random, int n,
                                               Nominal nominal, Batches batches) {
        DescriptiveStatistics[] out = stats(n);
        int worlds = Math.max(50, Math.min(500, settings.samples() / 20));
        for (int w = 0; w < worlds; w++) {
            Map<AcidBaseSystem, double[]> shifts = new LinkedHashMap<>();
            for (AcidBaseSystem sys : systemsOf(recipe)) {
                double[] d = new double[2 * sys.steps().size()];
                for (int k = 0; k < sys.steps().size(); k++) {
                    // pKa and ΔH° of one step come from one fit: a correlated normal pair
                    DissociationStep step = sys.steps().get(k);
                    double a = random.nextGaussian();
                    double b = random.nextGaussian();
                    double rho = step.correlation();
                    d[2 * k] = step.uncertainty() * a;
                    d[2 * k + 1] = step.deltaHUncertainty() * (rho * a + Math.sqrt(1 - rho * rho) * b);
                }
                shifts.put(sys, d);
            }
            Analyzer shifted = new Analyzer(equilibrium.withStepShifts(shifts)
                    .withPKwShift(Equilibrium.PKW_UNCERTAINTY * random.nextGaussian()));
            double[][] r = new Sampler(shifted, recipe, nominal, batches).nominal();
            if (r != null) {
                for (int c = 0; c < n; c++) {
                    out[c].addValue(r[0][c]);
                }
            }
        }
        return out;
    }

    /**
     * The acid–base systems the recipe's ingredients carry (the constants a systematic draw needs), by name: a fixed
     * order, so that a seed reproduces the same draws in every run.
     */
    private static List<AcidBaseSystem> systemsOf(Recipe recipe) {
        Set<String> used = new java.util.HashSet<>();
        recipe.ingredients().forEach(i -> i.substance().composition().systems().forEach(part -> used.add(part.system())));
        recipe.formulation().conditions().stream().filter(c -> c.co2Pascal().isPresent()).findAny()
                .ifPresent(c -> used.add(Analyzer.CARBONATE));
        return recipe.library().systems().stream().filter(s -> used.contains(s.name()))
                .sorted(java.util.Comparator.comparing(AcidBaseSystem::name)).toList();
    }

    /** The nominal q.s. of each titrant line (0 where not used) and the meter reading the batch record prescribes. */
    record Nominal(double[] moles, double[] setpoint) {
    }

    private static Nominal doses(Analyzer a, Recipe recipe) {
        List<TitrantResult> titrated = a.titrate(recipe);
        double[] moles = new double[titrated.size()];
        double[] setpoint = new double[titrated.size()];
        for (int i = 0; i < titrated.size(); i++) {
            TitrantResult t = titrated.get(i);
            moles[i] = t.used() && t.unreachable().isEmpty() ? t.moles() : 0;
            setpoint[i] = t.setpointPH().orElse(Double.NaN);
        }
        return new Nominal(moles, setpoint);
    }

    /**
     * Batches of one recipe, solved through problems prepared once: the species and the temperatures are the
     * same for every batch, only the amounts change, and each solve starts from the nominal batch's solution.
     */
    static final class Sampler {
        private final Recipe recipe;
        private final Nominal dose;
        private final Batches batches;
        private final Equilibrium.Prepared[] conditions;
        private final Equilibrium.Point[] warm;
        private final Equilibrium.Prepared[] meters;      // per titrant, at its adjustment; null where not dosed again
        private final Equilibrium.Point[] meterWarm;
        private final int[] titrantIndex;                 // per titrant: its index among the ingredients
        private final double[] atVolume;                  // per titrant: the fraction of volume it is dosed at
        private final double[][] nominal;
        private Optional<String> firstFailure = Optional.empty();

        Sampler(Analyzer analyzer, Recipe recipe, Nominal dose, Batches batches) {
            this.recipe = recipe;
            this.dose = dose;
            this.batches = batches;
            Solution s = recipe.solution(Map.of());
            List<Formulation.Condition> cs = recipe.formulation().conditions();
            conditions = new Equilibrium.Prepared[cs.size()];
            warm = new Equilibrium.Point[cs.size()];
            for (int c = 0; c < cs.size(); c++) {
                conditions[c] = analyzer.prepare(recipe, s, cs.get(c).kelvin(), cs.get(c).co2Pascal(), Set.of());
            }
            List<Ingredient> titrants = recipe.titrants();
            meters = new Equilibrium.Prepared[titrants.size()];
            meterWarm = new Equilibrium.Point[titrants.size()];
            titrantIndex = new int[titrants.size()];
            atVolume = new double[titrants.size()];
            for (int i = 0; i < titrants.size(); i++) {
                titrantIndex[i] = recipe.ingredients().indexOf(titrants.get(i));
                atVolume[i] = titrants.get(i).line().adjustTo().map(Formulation.Adjustment::atVolume).orElse(1.0);
                if (redosed(i)) {
                    double kelvin = titrants.get(i).line().adjustTo().orElseThrow().kelvin();
                    meters[i] = analyzer.prepare(recipe, s, kelvin, OptionalDouble.empty(), Set.of());
                }
            }
            nominal = sample(Map.of(), 0);      // fills the warm starts of what it solves
        }

        /** Why the first batch that could not be solved failed, if one did. */
        Optional<String> firstFailure() {
            return firstFailure;
        }

        /** The nominal batch, as {@link #sample} gives it; null where it cannot be solved. */
        double[][] nominal() {
            return nominal;
        }

        private boolean redosed(int titrant) {
            return dose.moles()[titrant] > 0 && !Double.isNaN(dose.setpoint()[titrant]);
        }

        /**
         * One batch: weighed amounts scaled, the q.s. dosed again so that the meter reads its setpoint plus
         * {@code meterError} (secant steps from the nominal dose), then every condition solved: {pH[], β[] in
         * mol/L per pH, osmolality[] in osmol/kg}. Null where the batch cannot be solved.
         */
        double[][] sample(Map<Ingredient, Double> scale, double meterError) {
            List<Ingredient> ings = recipe.ingredients();
            double[] x = new double[ings.size()];
            for (int k = 0; k < x.length; k++) {
                Ingredient i = ings.get(k);
                x[k] = i.kind() == Ingredient.Kind.TITRANT ? 0 : i.value() * scale.getOrDefault(i, 1.0);
            }
            try {
                for (int i = 0; i < meters.length; i++) {
                    if (meters[i] != null) {
                        x[titrantIndex[i]] = redose(x, i, dose.moles()[i], dose.setpoint()[i] + meterError);
                    }
                }
                List<Formulation.Condition> cs = recipe.formulation().conditions();
                double[][] out = new double[3][cs.size()];
                for (int c = 0; c < cs.size(); c++) {
                    Batches.Batch b = batches.batch(conditions[c].components(), 1, x);
                    Equilibrium.Point p = conditions[c].point(b.totals(), warm[c]);
                    if (warm[c] == null) {
                        warm[c] = p;
                    }
                    out[0][c] = p.pH();
                    out[1][c] = p.bufferCapacity() * b.waterKg() / b.volumeLitres(cs.get(c).kelvin());
                    out[2][c] = p.osmolality();
                }
                return out;
            } catch (IndeterminateException | IllegalStateException | DocumentException e) {
                // a number the engine cannot stand behind is not a sample: it is counted unsolved, with its reason
                if (firstFailure.isEmpty()) {
                    firstFailure = Optional.of(e.getMessage());
                }
                return null;
            }
        }

        /** The dose at which the meter (adjustment temperature, part volume, closed) reads {@code goal}: secant steps. */
        private double redose(double[] x, int titrant, double nominal, double goal) {
            double x0 = nominal;
            double f0 = meterReading(x, titrant, x0) - goal;
            double x1 = nominal * 1.01 + 1e-9;
            double f1 = meterReading(x, titrant, x1) - goal;
            for (int i = 0; i < 30 && Math.abs(f1) > 1e-7 && f1 != f0; i++) {
                double x2 = Math.max(0, x1 - f1 * (x1 - x0) / (f1 - f0));
                if (x2 == 0 && x1 == 0) {
                    return 0;   // the meter reads past the goal with no titrant at all: none is added
                }
                x0 = x1;
                f0 = f1;
                x1 = x2;
                f1 = meterReading(x, titrant, x1) - goal;
            }
            if (Math.abs(f1) > 1e-4) {
                throw new IllegalStateException("the q.s. of this batch did not converge");
            }
            return x1;
        }

        /** The meter's reading with {@code moles} of one titrant and none of the others (they are dosed after it). */
        private double meterReading(double[] amounts, int titrant, double moles) {
            double[] x = amounts.clone();
            for (int index : titrantIndex) {
                x[index] = 0;
            }
            x[titrantIndex[titrant]] = moles;
            Equilibrium.Point p = meters[titrant].point(
                    batches.batch(meters[titrant].components(), atVolume[titrant], x).totals(), meterWarm[titrant]);
            if (meterWarm[titrant] == null) {
                meterWarm[titrant] = p;
            }
            return p.pH();
        }
    }

    /**
     * A recipe's batches by their amounts (per ingredient, in the recipe's order; titrants in moles): through the
     * exact affine map of {@link BatchTotals} where the recipe has one, else through {@link Recipe#solution}.
     * Shared by every study of the recipe; the maps are made once per component order and volume fraction.
     */
    static final class Batches {
        record Batch(double[] totals, double waterKg, java.util.function.DoubleUnaryOperator litresAt) {
            double volumeLitres(double kelvin) {
                return litresAt.applyAsDouble(kelvin);
            }
        }

        private final Recipe recipe;
        private final Map<List<Object>, Optional<BatchTotals>> maps = new java.util.HashMap<>();

        Batches(Recipe recipe) {
            this.recipe = recipe;
        }

        Batch batch(List<Component> order, double volumeFraction, double[] amounts) {
            Optional<BatchTotals> map = maps.computeIfAbsent(List.of(order, volumeFraction),
                    k -> BatchTotals.of(recipe, order, volumeFraction));
            if (map.isPresent()) {
                double[] totals = new double[order.size()];
                double water = map.get().totals(amounts, totals);
                return new Batch(totals, water, kelvin -> map.get().volumeLitres(amounts, water, kelvin));
            }
            Solution s = BatchTotals.solution(recipe, amounts, volumeFraction);
            double[] totals = new double[order.size()];
            for (int j = 0; j < totals.length; j++) {
                totals[j] = s.totals().getOrDefault(order.get(j), 0.0);
            }
            return new Batch(totals, s.waterKg(), s::volumeLitres);
        }
    }

    /** dpH at one condition per +1 % of each weighed component, q.s. dosed again. */
    private static Map<String, Double> sensitivities(Sampler sampler, List<Ingredient> weighed, int c,
                                                     double[][] nominal) {
        Map<String, Double> out = new LinkedHashMap<>();
        if (nominal == null) {
            return out;
        }
        for (Ingredient i : weighed) {
            double[][] r = sampler.sample(Map.of(i, 1.01), 0);
            if (r != null) {
                out.put(i.substance().name(), r[0][c] - nominal[0][c]);
            }
        }
        return out;
    }

    /** Lowest and highest pH over the tolerance box, at the corners the sensitivities point to. */
    private static double[] corners(Sampler sampler, List<Ingredient> weighed, Map<String, Double> tolerances,
                                    Map<String, Double> sensitivities, int c) {
        Map<Ingredient, Double> low = new LinkedHashMap<>();
        Map<Ingredient, Double> high = new LinkedHashMap<>();
        for (Ingredient i : weighed) {
            double t = tolerances.get(i.substance().name());
            double s = sensitivities.getOrDefault(i.substance().name(), 0.0);
            low.put(i, s > 0 ? 1 - t : 1 + t);
            high.put(i, s > 0 ? 1 + t : 1 - t);
        }
        double[][] lo = sampler.sample(low, 0);
        double[][] hi = sampler.sample(high, 0);
        return new double[] {lo == null ? Double.NaN : lo[0][c], hi == null ? Double.NaN : hi[0][c]};
    }
}
