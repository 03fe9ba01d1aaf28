package org.protolyte.analysis;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

import org.protolyte.chemistry.Caveat;
import org.protolyte.chemistry.Component;
import org.protolyte.chemistry.Derivatives;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.chemistry.IndeterminateException;
import org.protolyte.chemistry.RootFinder;
import org.protolyte.document.Formulation;
import org.protolyte.recipe.BatchTotals;
import org.protolyte.recipe.Ingredient;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.Solution;

/**
 * Batches of one recipe, solved through problems prepared once: the species and the temperatures are the same for
 * every batch, only the amounts change, and each solve starts from the nominal batch's solution. A q.s. is dosed
 * again in every batch until the meter (adjustment temperature, part volume, closed) reads its setpoint. One sampler
 * serves one thread.
 */
final class BatchSampler {

    /** One batch: solved at every condition, or not, with the reason. */
    sealed interface Sample permits Solved, Unsolved {
    }

    /** Per condition: pH, β (mol/L per pH) and osmolality (osmol/kg). */
    record Solved(double[] pH, double[] bufferCapacity, double[] osmolality) implements Sample {
    }

    /** A batch the engine cannot stand behind: not a sample, counted unsolved. */
    record Unsolved(String reason) implements Sample {
    }

    /** The nominal q.s. of each titrant line (0 where not used) and the meter reading the batch record prescribes. */
    record Nominal(double[] moles, double[] setpoint) {
        static Nominal of(Analyzer analyzer, Recipe recipe) {
            List<TitrantResult> titrated = analyzer.titrate(recipe);
            double[] moles = new double[titrated.size()];
            double[] setpoint = new double[titrated.size()];
            for (int i = 0; i < titrated.size(); i++) {
                TitrantResult t = titrated.get(i);
                moles[i] = t.used() && t.unreachable().isEmpty() ? t.moles() : 0;
                setpoint[i] = t.setpointPH().orElse(Double.NaN);
            }
            return new Nominal(moles, setpoint);
        }

        /** The doses as the recipe's titrant lines take them. */
        Map<Ingredient, Double> doses(Recipe recipe) {
            Map<Ingredient, Double> out = new java.util.LinkedHashMap<>();
            for (int i = 0; i < moles.length; i++) {
                out.put(recipe.titrants().get(i), moles[i]);
            }
            return out;
        }

        static Nominal none() {
            return new Nominal(new double[0], new double[0]);
        }
    }

    private final Recipe recipe;
    private final Nominal dose;
    private final Batches batches;
    private final Equilibrium.Prepared[] conditions;
    private final Equilibrium.Point[] warm;
    private final Equilibrium.Prepared[] meters;      // per titrant, at its adjustment; null where not dosed again
    private final Meter[] meterCurves;
    private final int[] titrantIndex;                 // per titrant: its index among the ingredients
    private final double[] atVolume;                  // per titrant: the fraction of volume it is dosed at
    private final Sample nominal;

    BatchSampler(Analyzer analyzer, Recipe recipe, Nominal dose, Batches batches) {
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
        meterCurves = new Meter[titrants.size()];
        titrantIndex = new int[titrants.size()];
        atVolume = new double[titrants.size()];
        for (int i = 0; i < titrants.size(); i++) {
            titrantIndex[i] = recipe.ingredients().indexOf(titrants.get(i));
            atVolume[i] = titrants.get(i).line().adjustTo().map(Formulation.Adjustment::atVolume).orElse(1.0);
            if (redosed(i)) {
                double kelvin = titrants.get(i).line().adjustTo().orElseThrow().kelvin();
                meters[i] = analyzer.prepare(recipe, s, kelvin, OptionalDouble.empty(), Set.of());
                meterCurves[i] = new Meter(i);
            }
        }
        nominal = sample(Map.of(), 0);      // fills the warm starts of what it solves
    }

    /** The nominal batch, as {@link #sample} gives it. */
    Sample nominal() {
        return nominal;
    }

    private boolean redosed(int titrant) {
        return dose.moles()[titrant] > 0 && !Double.isNaN(dose.setpoint()[titrant]);
    }

    /**
     * One batch: weighed amounts scaled, the q.s. dosed again so that the meter reads its setpoint plus
     * {@code meterError}, then every condition solved.
     */
    Sample sample(Map<Ingredient, Double> scale, double meterError) {
        double[] x = amounts(scale);
        try {
            dose(x, meterError);
            List<Formulation.Condition> cs = recipe.formulation().conditions();
            double[] pH = new double[cs.size()];
            double[] beta = new double[cs.size()];
            double[] osmolality = new double[cs.size()];
            for (int c = 0; c < cs.size(); c++) {
                Batches.Batch b = batches.batch(conditions[c].components(), 1, x);
                Equilibrium.Point p = conditions[c].point(b.totals(), warm[c]);
                if (warm[c] == null) {
                    warm[c] = p;
                }
                pH[c] = p.pH();
                beta[c] = p.bufferCapacity() * b.waterKg() / b.volumeLitres(cs.get(c).kelvin());
                osmolality[c] = p.osmolality();
            }
            return new Solved(pH, beta, osmolality);
        } catch (IndeterminateException | IllegalStateException e) {
            // caught: a number the engine cannot stand behind is not a sample; it is counted unsolved, with its reason
            return new Unsolved(String.valueOf(e.getMessage()));
        }
    }

    private double[] amounts(Map<Ingredient, Double> scale) {
        List<Ingredient> ings = recipe.ingredients();
        double[] x = new double[ings.size()];
        for (int k = 0; k < x.length; k++) {
            Ingredient i = ings.get(k);
            x[k] = i.kind() == Ingredient.Kind.TITRANT ? 0 : i.value() * scale.getOrDefault(i, 1.0);
        }
        return x;
    }

    private void dose(double[] x, double meterError) {
        for (int i = 0; i < meters.length; i++) {
            if (meters[i] != null) {
                x[titrantIndex[i]] = meterCurves[i].doseFor(x, dose.setpoint()[i] + meterError, dose.moles()[i]);
            }
        }
    }

    /**
     * The pH response of the nominal batch at each condition to each constant moved by its standard uncertainty
     * ({@code [condition][perturbation]}), with each q.s. held where its meter reads the setpoint (the implicit
     * function theorem: dn/dθ = −(∂pH_meter/∂θ)/(∂pH_meter/∂n)).
     *
     * @throws IndeterminateException where the nominal batch cannot be solved or differentiated
     */
    double[][] responses(List<ConstantsPropagation.Perturbation> perturbations) {
        if (nominal instanceof Unsolved u) {
            throw new IndeterminateException(Caveat.indeterminate("nominal-unsolved",
                    u.reason()));
        }
        double[] x = amounts(Map.of());
        dose(x, 0);
        int q = perturbations.size();
        double[][] dDose = new double[meters.length][q];
        for (int i = 0; i < meters.length; i++) {
            if (meters[i] != null) {
                meterCurves[i].chord = false;     // the exact slope at the dose found
                double reading = meterCurves[i].pH(x, x[titrantIndex[i]]);
                if (!(Math.abs(meterCurves[i].slope()) > 0)) {
                    throw new IndeterminateException(Caveat.indeterminate("meter-flat",
                            "the meter reading does not move with the dose at pH " + reading));
                }
                Derivatives d = meters[i].derivatives();
                double kelvin = recipe.titrants().get(i).line().adjustTo().orElseThrow().kelvin();
                for (int k = 0; k < q; k++) {
                    dDose[i][k] = -perturbations.get(k).move().at(d, kelvin).pH() / meterCurves[i].slope();
                }
            }
        }
        List<Formulation.Condition> cs = recipe.formulation().conditions();
        double[][] out = new double[cs.size()][q];
        for (int c = 0; c < cs.size(); c++) {
            List<Component> order = conditions[c].components();
            warm[c] = conditions[c].point(batches.batch(order, 1, x).totals(), warm[c]);
            Derivatives d = conditions[c].derivatives();
            double[] perMole = new double[meters.length];
            for (int i = 0; i < meters.length; i++) {
                if (meters[i] != null) {
                    perMole[i] = d.totals(batches.slope(order, 1, x, titrantIndex[i])).pH();
                }
            }
            for (int k = 0; k < q; k++) {
                double v = perturbations.get(k).move().at(d, cs.get(c).kelvin()).pH();
                for (int i = 0; i < meters.length; i++) {
                    v += perMole[i] * dDose[i][k];
                }
                out[c][k] = v;
            }
        }
        return out;
    }

    /**
     * One titrant's meter: the reading with some moles of it and none of the titrants dosed after it, and the dose
     * at which it reads a goal: the root finder with the slope from the derivatives at the nominal dose, kept for the
     * steps that follow (a chord method: the slope barely changes over a batch's small move, each step still lands
     * inside the proven bracket, and the goal is met to the finder's one tolerance).
     */
    private final class Meter implements RootFinder.Function {
        private final int titrant;
        private double[] base;
        private double goal;
        private Equilibrium.Point warm;
        private double slope = Double.NaN;
        private boolean chord;

        Meter(int titrant) {
            this.titrant = titrant;
        }

        double pH(double[] amounts, double moles) {
            double[] x = amounts.clone();
            for (int index : titrantIndex) {
                x[index] = 0;
            }
            x[titrantIndex[titrant]] = moles;
            List<Component> order = meters[titrant].components();
            Equilibrium.Point p = meters[titrant].point(batches.batch(order, atVolume[titrant], x).totals(), warm);
            warm = p;
            if (!chord) {
                slope = DoseCurve.slope(meters[titrant], batches.slope(order, atVolume[titrant], x, titrantIndex[titrant]));
            }
            return p.pH();
        }

        /**
         * The dose at which the meter reads {@code goalPH}, searched first between the nominal dose and twice its
         * Newton step (a batch is near the nominal one), else between none and the most any search tries; none where
         * the meter reads past the goal with no titrant at all.
         */
        double doseFor(double[] amounts, double goalPH, double nominalDose) {
            base = amounts;
            goal = goalPH;
            chord = false;
            double atNominal = value(nominalDose);
            chord = Double.isFinite(slope) && slope != 0;
            if (Math.abs(atNominal) < RootFinder.PH_TOLERANCE) {
                return nominalDose;
            }
            double far = Math.max(0, nominalDose - 2 * atNominal / slope);
            if (Double.isFinite(far)) {
                double atFar = value(far);
                if (Math.signum(atFar) * Math.signum(atNominal) <= 0) {
                    return RootFinder.solve(this, nominalDose, atNominal, far, atFar, 0.5 * (nominalDose + far));
                }
            }
            chord = false;
            double reach = Analyzer.MAX_TITRANT_MOLALITY * batches.batch(meters[titrant].components(),
                    atVolume[titrant], amounts).waterKg();
            double atReach = value(reach);
            double atNone = value(0);
            if (Math.signum(atNone) != Math.signum(atReach)) {
                return RootFinder.solve(this, 0, atNone, reach, atReach, Math.min(reach, nominalDose));
            }
            if (Math.signum(atNone) == Math.signum(atReach - atNone)) {
                return 0;   // the meter reads past the goal with no titrant at all: none is added
            }
            throw new IndeterminateException(Caveat.indeterminate("batch-qs-unreachable",
                    "no dose of the titrant up to " + Analyzer.MAX_TITRANT_MOLALITY
                            + " mol/kg brings this batch's meter reading to its setpoint"));
        }

        @Override
        public double value(double moles) {
            return pH(base, moles) - goal;
        }

        @Override
        public double slope() {
            return slope;
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

        /**
         * d(totals)/d(amount of one ingredient), mol/kg per mol, by a difference of a millionth of the amount:
         * exact where the moles and the water are affine in it, off by about that fraction of itself elsewhere.
         */
        double[] slope(List<Component> order, double volumeFraction, double[] amounts, int ingredient) {
            double h = Math.max(Math.abs(amounts[ingredient]) * 1e-6, 1e-12);
            double[] moved = amounts.clone();
            moved[ingredient] += h;
            double[] a = batch(order, volumeFraction, amounts).totals();
            double[] b = batch(order, volumeFraction, moved).totals();
            for (int j = 0; j < a.length; j++) {
                b[j] = (b[j] - a[j]) / h;
            }
            return b;
        }
    }
}
