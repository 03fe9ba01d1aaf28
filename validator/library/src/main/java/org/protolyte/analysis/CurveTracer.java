package org.protolyte.analysis;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.Set;

import org.apache.commons.math3.exception.MathIllegalStateException;
import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.Component;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.chemistry.EquilibriumState;
import org.protolyte.chemistry.IndeterminateException;
import org.protolyte.chemistry.SolidPhase;
import org.protolyte.chemistry.SpeciesAmount;
import org.protolyte.chemistry.TemperatureRange;
import org.protolyte.chemistry.Thermo;
import org.protolyte.recipe.Ingredient;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.Solution;

/** Traces the {@link Curves} of an analysed recipe. */
final class CurveTracer {

    /** Points of the titration and of the temperature sweep. */
    static final int TITRATION_POINTS = 81;
    static final int TEMPERATURE_POINTS = 21;
    /** The titration runs from this far below the lowest pH of interest to this far above the highest. */
    static final double PH_MARGIN = 1.5;
    /** A system whose share of β is at least this at some condition is a buffering system; its forms are traced. */
    static final double BUFFERING_SHARE = 0.05;
    private static final double LOWEST_PH = 1.5;
    private static final double HIGHEST_PH = 12.5;

    private final Analyzer analyzer;
    private final TargetSearches searches;

    CurveTracer(Analyzer analyzer, TargetSearches searches) {
        this.analyzer = analyzer;
        this.searches = searches;
    }

    Curves trace(FormulationAnalysis a) {
        Recipe recipe = a.recipe();
        double kelvin = a.titrants().stream().filter(TitrantResult::used).findFirst().map(TitrantResult::adjustKelvin)
                .orElse(recipe.makeUpKelvin());
        OptionalDouble co2 = Titration.co2At(recipe, kelvin);
        List<AcidBaseSystem> buffering = recipe.library().systems().stream().filter(s -> a.conditions().stream()
                .flatMap(c -> c.buffers().stream()).anyMatch(b -> b.system().equals(s.name())
                        && b.share() >= BUFFERING_SHARE)).toList();
        List<String> forms = new ArrayList<>();
        buffering.forEach(s -> s.forms().forEach(f -> forms.add(s.name() + ": " + f.name())));

        Solution bare = a.titrants().isEmpty() ? a.solution() : recipe.solution(Map.of());
        OptionalDouble qsAdded = OptionalDouble.empty();
        OptionalDouble qsPH = OptionalDouble.empty();
        List<TitrantResult> used = a.titrants().stream().filter(t -> t.used() && t.unreachable().isEmpty()).toList();
        if (!used.isEmpty() && used.stream().allMatch(t -> t.ingredient().substance().composition().systems().isEmpty())) {
            double perLitre = 1000 / a.solution().volumeLitres(kelvin);
            qsAdded = OptionalDouble.of(used.stream().mapToDouble(t -> (t.role() == TitrantResult.Role.BASE ? 1 : -1)
                    * t.moles() * perLitre).sum());
            qsPH = pHOrEmpty(recipe, a.solution(), kelvin, co2);
        }
        List<Curves.TitrationPoint> titration = titration(a, bare, kelvin, co2, buffering, qsPH);
        TemperatureRange valid = TemperatureRange.UNBOUNDED;
        for (AcidBaseSystem s : buffering) {
            for (var step : s.steps()) {
                valid = valid.intersect(step.validity());
            }
        }
        List<String> solids = new ArrayList<>(new LinkedHashSet<>(a.conditions().stream()
                .flatMap(c -> c.saturation().stream()).map(x -> x.phase().name()).toList()));
        return new Curves(kelvin, titration, forms, qsAdded, qsPH, temperature(recipe, a.solution(), solids), solids,
                valid.minKelvin(), valid.maxKelvin());
    }

    /** Strong base (Na+) or acid (Cl-) added to the recipe without its titrants, from below to above the pHs of interest. */
    private List<Curves.TitrationPoint> titration(FormulationAnalysis a, Solution bare, double kelvin, OptionalDouble co2,
                                                  List<AcidBaseSystem> buffering, OptionalDouble qsPH) {
        Recipe recipe = a.recipe();
        double start;
        try {
            start = analyzer.solve(recipe, bare, kelvin, co2).pH();
        } catch (IndeterminateException e) {
            return List.of();       // caught: no titration to draw where the recipe itself has no pH; the report says why
        }
        double lo = start;
        double hi = start;
        for (double x : new double[] {qsPH.orElse(start), recipe.formulation().pHTarget().map(t -> t.min()).orElse(start),
                recipe.formulation().pHTarget().map(t -> t.max()).orElse(start)}) {
            if (Double.isFinite(x)) {
                lo = Math.min(lo, x);
                hi = Math.max(hi, x);
            }
        }
        double acid = reach(recipe, bare, kelvin, co2, Math.max(LOWEST_PH, lo - PH_MARGIN));
        double base = reach(recipe, bare, kelvin, co2, Math.min(HIGHEST_PH, hi + PH_MARGIN));
        Component sodium = recipe.library().ion("Na+").orElseThrow();
        Component chloride = recipe.library().ion("Cl-").orElseThrow();
        Equilibrium.Prepared problem = analyzer.prepare(recipe, bare, kelvin, co2, Set.of(sodium, chloride));
        double toMolality = bare.volumeLitres(kelvin) / bare.waterKg() / 1000;    // mmol/L → mol/kg of water
        double perLitre = bare.waterKg() / bare.volumeLitres(kelvin) * 1000;      // mol/kg → mmol/L
        List<Component> order = problem.components();
        double[] baseUnit = new double[order.size()];
        baseUnit[order.indexOf(sodium)] = 1;
        double[] acidUnit = new double[order.size()];
        acidUnit[order.indexOf(chloride)] = -1;     // strong acid: a negative dose of strong base
        List<Curves.TitrationPoint> out = new ArrayList<>();
        for (int i = 0; i < TITRATION_POINTS; i++) {
            double added = acid + (base - acid) * i / (TITRATION_POINTS - 1);
            Map<Component, Double> totals = new java.util.HashMap<>(bare.totals());
            totals.merge(added >= 0 ? sodium : chloride, Math.abs(added) * toMolality, Double::sum);
            try {
                EquilibriumState s = problem.solve(totals, Double.NaN);
                if (!s.determinate()) {
                    continue;
                }
                // β = dC/dpH along the titration, activity coefficients moving with it (implicit differentiation)
                double slope = problem.derivatives().totals(added >= 0 ? baseUnit : acidUnit).pH();
                out.add(new Curves.TitrationPoint(added, s.pH(), perLitre / slope, fractions(s, buffering)));
            } catch (IndeterminateException | MathIllegalStateException e) {
                // caught: a point the engine cannot solve is left out of the curve, which then has a gap there
            }
        }
        return out;
    }

    /** mmol/L of strong base (+) or acid (−) that brings the recipe to {@code pH}; the search's limit where none does. */
    private double reach(Recipe recipe, Solution bare, double kelvin, OptionalDouble co2, double pH) {
        try {
            return searches.load(recipe, bare, kelvin, co2, pH);
        } catch (IndeterminateException | MathIllegalStateException e) {
            // caught: the pH is beyond reach; the curve stops at the search's limit instead
            double limit = Analyzer.MAX_TITRANT_MOLALITY * bare.waterKg() / bare.volumeLitres(kelvin) * 1000;
            return pH < 7 ? -limit : limit;
        }
    }

    private static List<Double> fractions(EquilibriumState s, List<AcidBaseSystem> buffering) {
        List<Double> out = new ArrayList<>();
        for (AcidBaseSystem system : buffering) {
            for (AcidBaseSystem.Form f : system.forms()) {
                out.add(s.species().stream().filter(x -> x.component().equals(system.basis())
                        && !x.species().isComplex() && x.species().name().equals(f.name()))
                        .mapToDouble(SpeciesAmount::fractionOfComponent).sum());
            }
        }
        return out;
    }

    /** The recipe as made, closed, every 2.5 K from 0 to 50 °C: pH and each solid's saturation index. */
    private List<Curves.TemperaturePoint> temperature(Recipe recipe, Solution solution, List<String> solids) {
        List<Curves.TemperaturePoint> out = new ArrayList<>();
        for (int i = 0; i < TEMPERATURE_POINTS; i++) {
            double kelvin = Thermo.KELVIN_OFFSET + 50.0 * i / (TEMPERATURE_POINTS - 1);
            double pH = Double.NaN;
            List<Double> si = new ArrayList<>(java.util.Collections.nCopies(solids.size(), Double.NaN));
            try {
                EquilibriumState s = analyzer.solve(recipe, solution, kelvin, OptionalDouble.empty());
                if (s.determinate()) {
                    pH = s.pH();
                    for (SolidPhase phase : recipe.library().phases()) {
                        int at = solids.indexOf(phase.name());
                        if (at >= 0) {
                            phase.saturation(s).ifPresent(x -> si.set(at, x.index()));
                        }
                    }
                }
            } catch (IndeterminateException | MathIllegalStateException e) {
                // caught: a temperature where the engine has no pH (frozen, outside its data) is a gap in the curve
            }
            out.add(new Curves.TemperaturePoint(kelvin, pH, si));
        }
        return out;
    }

    private OptionalDouble pHOrEmpty(Recipe recipe, Solution s, double kelvin, OptionalDouble co2) {
        try {
            EquilibriumState state = analyzer.solve(recipe, s, kelvin, co2);
            return state.determinate() ? OptionalDouble.of(state.pH()) : OptionalDouble.empty();
        } catch (IndeterminateException e) {
            return OptionalDouble.empty();      // caught: no q.s. point is drawn where the recipe as made has no pH
        }
    }
}
