package org.protolyte.analysis;

import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.apache.commons.math3.exception.MathIllegalStateException;
import org.protolyte.chemistry.Caveat;
import org.protolyte.chemistry.Component;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.chemistry.IndeterminateException;
import org.protolyte.chemistry.RootFinder;
import org.protolyte.chemistry.Thermo;
import org.protolyte.document.Formulation;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.Solution;

/**
 * The searches on a condition's prepared problem that the rules judge or a report hints at: the strong acid and base
 * loads that take the pH out of its target, the titratable acidity to a physiological pH, and the CO2 level that
 * gives the target's midpoint. Each is a root of the pH minus its goal ({@link RootFinder}).
 */
final class TargetSearches {

    /** The highest CO2 partial pressure a search for the target's CO2 level tries, Pa (50 kPa). */
    private static final double CO2_SEARCH_MAX_PASCAL = 5e4;

    private final Analyzer analyzer;

    TargetSearches(Analyzer analyzer) {
        this.analyzer = analyzer;
    }

    /** Strong base (or acid, negative) per litre and per dose to bring the recipe to pH 7.4 at 37 °C, closed. */
    Optional<TitratableAcidity> titratableAcidity(Recipe recipe, Solution solution, List<Caveat> caveats) {
        try {
            double perLitre = load(recipe, solution, TitratableAcidity.BODY_KELVIN, OptionalDouble.empty(),
                    TitratableAcidity.PHYSIOLOGICAL_PH);
            OptionalDouble perDose = recipe.formulation().doseLitres().isPresent()
                    ? OptionalDouble.of(perLitre * recipe.formulation().doseLitres().get()) : OptionalDouble.empty();
            return Optional.of(new TitratableAcidity(perLitre, perDose));
        } catch (IndeterminateException | MathIllegalStateException e) {
            caveats.add(Caveat.warning("titratable-acidity-not-computed", "the titratable acidity to pH 7.4 at 37 °C "
                    + "could not be computed, so no rule judges it: " + e.getMessage()));
            return Optional.empty();
        }
    }

    /**
     * mmol per litre of solution of strong base (positive) or strong acid (negative) that brings the pH at a
     * temperature to {@code goal}: added sodium or chloride (the strong ions of NaOH, HCl), found by the root finder
     * with dpH/dC from the derivatives, up to {@link Analyzer#MAX_TITRANT_MOLALITY}.
     */
    double load(Recipe recipe, Solution solution, double kelvin, OptionalDouble co2, double goal) {
        Component sodium = recipe.library().ion("Na+").orElseThrow();
        Component chloride = recipe.library().ion("Cl-").orElseThrow();
        Equilibrium.Prepared problem = analyzer.prepare(recipe, solution, kelvin, co2, java.util.Set.of(sodium, chloride));
        List<Component> order = problem.components();
        double[] totals = new double[order.size()];
        for (int j = 0; j < totals.length; j++) {
            totals[j] = solution.totals().getOrDefault(order.get(j), 0.0);
        }
        boolean base = problem.trial(totals, null).pH() < goal;
        int ion = order.indexOf(base ? sodium : chloride);
        double present = totals[ion];
        double[] unit = new double[totals.length];
        unit[ion] = 1;
        RootFinder.Function f = new RootFinder.Function() {
            private Equilibrium.Point warm;
            private double slope;

            @Override
            public double value(double x) {
                totals[ion] = present + x;
                warm = problem.trial(totals, warm);
                slope = DoseCurve.slope(problem, unit);
                return warm.pH() - goal;
            }

            @Override
            public double slope() {
                return slope;
            }
        };
        double atNone = f.value(0);
        if (Math.abs(atNone) < RootFinder.PH_TOLERANCE) {
            return 0;
        }
        // the bracket's top: twice the first Newton step, four times wider until the pH passes the goal
        double newton = -atNone / f.slope();
        boolean stepped = Double.isFinite(newton) && newton > 0;
        double top = stepped ? Math.min(2 * newton, Analyzer.MAX_TITRANT_MOLALITY) : Analyzer.MAX_TITRANT_MOLALITY;
        double atTop = f.value(top);
        while (Math.signum(atTop) == Math.signum(atNone) && top < Analyzer.MAX_TITRANT_MOLALITY) {
            top = Math.min(4 * top, Analyzer.MAX_TITRANT_MOLALITY);
            atTop = f.value(top);
        }
        if (Math.signum(atNone) == Math.signum(atTop)) {
            throw new IndeterminateException(Caveat.indeterminate("load-not-found", "no amount of strong "
                    + (base ? "base" : "acid") + " up to " + Analyzer.MAX_TITRANT_MOLALITY + " mol/kg reaches pH " + goal));
        }
        double x = RootFinder.solve(f, 0, atNone, top, atTop, stepped ? Math.min(newton, top) : 0);
        double mmolPerLitre = x * solution.waterKg() / solution.volumeLitres(kelvin) * 1000;
        return base ? mmolPerLitre : -mmolPerLitre;
    }

    Optional<Loads> loads(Recipe recipe, Solution solution, Formulation.Condition c, double pH,
                                  List<Caveat> caveats) {
        Optional<Formulation.PhTarget> target = recipe.formulation().pHTarget();
        // a target holds at its own temperature: another condition's pH is not judged against it
        if (target.isEmpty() || !Formulation.sameTemperature(c.kelvin(), target.get().kelvin())) {
            return Optional.empty();
        }
        try {
            double min = target.get().min();
            double max = target.get().max();
            OptionalDouble acid = Double.isInfinite(min) ? OptionalDouble.empty()
                    : OptionalDouble.of(pH <= min ? 0 : -load(recipe, solution, c.kelvin(), c.co2Pascal(), min));
            OptionalDouble base = Double.isInfinite(max) ? OptionalDouble.empty()
                    : OptionalDouble.of(pH >= max ? 0 : load(recipe, solution, c.kelvin(), c.co2Pascal(), max));
            return Optional.of(new Loads(acid, base));
        } catch (IndeterminateException | MathIllegalStateException e) {
            caveats.add(Caveat.warning("loads-not-computed", "the acid and base loads that take the pH out of the "
                    + "target could not be computed, so no rule judges them: " + e.getMessage()));
            return Optional.empty();
        }
    }

    /** For a CO2 condition at the target's temperature: the CO2 partial pressure giving the target's midpoint. */
    OptionalDouble co2ForTarget(Recipe recipe, Solution solution, Formulation.Condition c) {
        Optional<Formulation.PhTarget> target = recipe.formulation().pHTarget();
        if (c.co2Pascal().isEmpty() || target.isEmpty() || !Formulation.sameTemperature(target.get().kelvin(), c.kelvin())
                || !Double.isFinite(target.get().midpoint())) {
            return OptionalDouble.empty();
        }
        double goal = target.get().midpoint();
        // pH falls as CO2 rises; search x = log10 of the partial pressure (Pa) between 1 Pa and 50 kPa, on the problem
        // prepared at 1 Pa with its dissolved CO2 scaled (Henry's law is linear), dpH/dx from the derivatives
        double top = Math.log10(CO2_SEARCH_MAX_PASCAL);
        RootFinder.Function f = new RootFinder.Function() {
            private Equilibrium.Prepared atOnePascal;
            private Equilibrium.Point warm;
            private double slope;

            @Override
            public double value(double x) {
                if (atOnePascal == null) {
                    atOnePascal = analyzer.prepare(recipe, solution, c.kelvin(), OptionalDouble.of(1.0), java.util.Set.of());
                }
                Equilibrium.Prepared p = atOnePascal.withFixedScaled(Math.pow(10, x));
                warm = p.trial(solution.totals(), warm);
                slope = Thermo.LN10 * p.derivatives().fixedScaled().pH();
                return warm.pH() - goal;
            }

            @Override
            public double slope() {
                return slope;
            }
        };
        try {
            double atLow = f.value(0);
            double atTop = f.value(top);
            if (atLow < 0 || atTop > 0) {
                return OptionalDouble.empty();
            }
            double start = Math.min(top, Math.max(0, Math.log10(c.co2Pascal().getAsDouble())));
            return OptionalDouble.of(Math.pow(10, RootFinder.solve(f, 0, atLow, top, atTop, start)));
        } catch (IndeterminateException | MathIllegalStateException e) {
            // caught: a hint in the report only (no rule judges it); where it cannot be found none is shown
            return OptionalDouble.empty();
        }
    }
}
