package org.protolyte.analysis;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.apache.commons.math3.exception.MathIllegalStateException;
import org.protolyte.chemistry.Caveat;
import org.protolyte.chemistry.IndeterminateException;
import org.protolyte.chemistry.Thermo;
import org.protolyte.document.Formulation;
import org.protolyte.recipe.Ingredient;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.Solution;

/**
 * The q.s. of a recipe's titrants: which one is an acid and which a base, the dose that meets the goal (an explicit
 * adjustTo pH read by the meter, or the pH target after making up) on one dose curve, the setpoint the meter reads
 * at the adjustment, and why a goal is out of a titrant's reach.
 */
final class Titration {

    private final Analyzer analyzer;

    Titration(Analyzer analyzer) {
        this.analyzer = analyzer;
    }

    /** Where adjustTo states its own pH and the target is missed: the setpoint that would meet the target. */
    TitrantResult explicitSetpointForTarget(Recipe recipe, TitrantResult t) {
        Formulation f = recipe.formulation();
        boolean explicit = t.ingredient().line().adjustTo().map(a -> a.pH().isPresent()).orElse(false);
        if (!explicit || !t.used() || t.unreachable().isPresent() || f.pHTarget().isEmpty()
                || !Double.isFinite(f.pHTarget().get().midpoint())) {
            return t;
        }
        Formulation.PhTarget target = f.pHTarget().get();
        try {
            double atTarget = pH(recipe, t.ingredient(), t.moles(), target.kelvin(), co2At(recipe, target.kelvin()));
            if (target.contains(atTarget)) {
                return t;
            }
            double goal = target.midpoint();
            double max = Analyzer.MAX_TITRANT_MOLALITY * recipe.solution(Map.of()).waterKg();
            DoseCurve curve = DoseCurve.of(analyzer, recipe, t.ingredient(), max, target.kelvin(),
                    co2At(recipe, target.kelvin()), 1);
            double atNone = curve.pH(0) - goal;
            double atMax = curve.pH(max) - goal;
            if (Math.signum(atNone) == Math.signum(atMax)) {
                return t;           // no dose of this titrant meets the target's midpoint
            }
            double n = curve.doseFor(goal, atNone, atMax, max);
            double part = t.ingredient().line().adjustTo().orElseThrow().atVolume();
            return t.withSetpointForTarget(pH(recipe, t.ingredient(), n, t.adjustKelvin(), OptionalDouble.empty(), part));
        } catch (IndeterminateException | MathIllegalStateException | IllegalArgumentException e) {
            // caught: an optional hint; no setpoint can be stood behind, and the pH finding stands on its own
            return t;
        }
    }

    private double pH(Recipe recipe, Ingredient titrant, double moles, double kelvin, OptionalDouble co2) {
        return pH(recipe, titrant, moles, kelvin, co2, 1);
    }

    /** pH with {@code moles} of titrant, at a fraction of the final volume (1: made up). */
    private double pH(Recipe recipe, Ingredient titrant, double moles, double kelvin, OptionalDouble co2,
                      double volumeFraction) {
        Solution s = recipe.solution(moles > 0 ? Map.of(titrant, moles) : Map.of(), volumeFraction);
        return analyzer.solve(recipe, s, kelvin, co2).pH();
    }

    /** The CO2 state of the condition at a temperature (the first one there), closed if none matches. */
    static OptionalDouble co2At(Recipe recipe, double kelvin) {
        return recipe.formulation().conditions().stream().filter(c -> Formulation.sameTemperature(c.kelvin(), kelvin))
                .findFirst().map(Formulation.Condition::co2Pascal).orElse(OptionalDouble.empty());
    }

    /** The q.s. of every titrant line of the recipe, as {@link Analyzer#analyze} doses them. */
    List<TitrantResult> titrate(Recipe recipe) {
        return recipe.titrants().isEmpty() ? List.of() : adjust(recipe, new ArrayList<>());
    }

    /** Acid or base: the pH of a 0.01 mol/kg solution of the titrant alone at 25 °C, below or above neutral. */
    TitrantResult.Role role(Recipe recipe, Ingredient titrant) {
        Recipe alone = new Recipe(recipe.formulation(), recipe.library(), List.of(titrant), recipe.makeUpKelvin());
        Solution s = alone.solution(Map.of(titrant, 0.01 * alone.solution(Map.of()).waterKg()));
        return analyzer.equilibrium().solve(s.species(), s.totals(), Thermo.T_REF).pH() < 7
                ? TitrantResult.Role.ACID : TitrantResult.Role.BASE;
    }

    List<TitrantResult> adjust(Recipe recipe, List<Caveat> caveats) {
        Formulation f = recipe.formulation();
        List<Ingredient> lines = recipe.titrants();
        Map<Ingredient, TitrantResult.Role> roles = new HashMap<>();
        for (Ingredient t : lines) {
            roles.put(t, role(recipe, t));
        }
        if (lines.size() > 2 || (lines.size() == 2 && roles.get(lines.get(0)) == roles.get(lines.get(1)))) {
            String what = lines.size() > 2 ? "more than two components carry adjustTo"
                    : "two " + (roles.get(lines.get(0)) == TitrantResult.Role.ACID ? "acids" : "bases")
                    + " carry adjustTo; give at most one acid and one base";
            throw new RecipeConflict(lines.get(1), what);
        }
        Formulation.Adjustment adj = lines.get(0).line().adjustTo().orElseThrow();
        double adjustK = adj.kelvin();
        double part = adj.atVolume();
        double goalPH;
        double goalK;
        boolean explicit = adj.pH().isPresent();
        if (explicit) {
            goalPH = adj.pH().getAsDouble();
            goalK = adjustK;
        } else if (f.pHTarget().isPresent() && Double.isFinite(f.pHTarget().get().midpoint())) {
            goalPH = f.pHTarget().get().midpoint();
            goalK = f.pHTarget().get().kelvin();
        } else {
            throw new RecipeConflict(lines.get(0), "adjustTo has no pH and the document has no pH target to adjust to");
        }
        if (lines.size() == 2) {
            Formulation.Adjustment other = lines.get(1).line().adjustTo().orElseThrow();
            if (!Formulation.sameTemperature(other.kelvin(), adjustK) || !other.pH().equals(adj.pH())) {
                throw new RecipeConflict(lines.get(1),
                        "an acid and a base adjusting the same recipe must carry the same adjustTo");
            }
        }
        double startPH;
        try {
            startPH = pH(recipe, lines.get(0), 0, goalK, goalCo2(recipe, explicit, goalK), explicit ? part : 1);
        } catch (IndeterminateException e) {
            caveats.add(Caveat.indeterminate("qs-indeterminate", "the q.s. could not be computed: " + e.getMessage()));
            return lines.stream().map(t -> new TitrantResult(t, roles.get(t), 0, false, OptionalDouble.empty(),
                    adjustK, goalPH, goalK, Optional.empty())).toList();
        }
        TitrantResult.Role needed = startPH > goalPH ? TitrantResult.Role.ACID : TitrantResult.Role.BASE;
        List<TitrantResult> out = new ArrayList<>();
        for (Ingredient t : lines) {
            if (roles.get(t) != needed) {
                Optional<TitrantResult.Unreachable> why = lines.size() == 1
                        ? Optional.of(new TitrantResult.Unreachable(String.format(Locale.ROOT,
                        "%s is %s and can only %s the pH; before adjustment the recipe is at pH %.2f at %.0f °C, "
                                + "%s the goal pH %.2f", t.substance().name(),
                        roles.get(t) == TitrantResult.Role.ACID ? "an acid" : "a base",
                        roles.get(t) == TitrantResult.Role.ACID ? "lower" : "raise", startPH,
                        goalK - Thermo.KELVIN_OFFSET, startPH > goalPH ? "already above" : "already below", goalPH),
                        startPH, startPH))
                        : Optional.empty();
                out.add(new TitrantResult(t, roles.get(t), 0, false, OptionalDouble.empty(), adjustK, goalPH, goalK,
                        why));
            } else {
                out.add(dose(recipe, t, needed, startPH, goalPH, goalK, adjustK, explicit, part, caveats));
            }
        }
        return out.stream().map(r -> r.withStartPH(startPH)).toList();
    }

    /**
     * The q.s. amount. An explicit adjustTo.pH is what the meter reads at the adjustment temperature and
     * part volume; otherwise the target must hold after making up, at its temperature and CO2 state, and the
     * setpoint is the meter reading at part volume.
     */
    private TitrantResult dose(Recipe recipe, Ingredient t, TitrantResult.Role role, double startPH, double goalPH,
                               double goalK, double adjustK, boolean explicit, double part, List<Caveat> caveats) {
        double water = recipe.solution(Map.of()).waterKg();
        double max = Analyzer.MAX_TITRANT_MOLALITY * water;
        OptionalDouble co2 = goalCo2(recipe, explicit, goalK);
        double goalVolume = explicit ? part : 1;
        double moles;
        try {
            DoseCurve curve = DoseCurve.of(analyzer, recipe, t, max, goalK, co2, goalVolume);
            double atMax = curve.pH(max) - goalPH;
            if ((role == TitrantResult.Role.ACID) ? atMax > 0 : atMax < 0) {
                double reach = atMax + goalPH;
                return new TitrantResult(t, role, 0, true, OptionalDouble.empty(), adjustK, goalPH, goalK,
                        Optional.of(new TitrantResult.Unreachable(String.format(Locale.ROOT,
                                "%s cannot bring the pH to %.2f: even %.0f mmol per kg of water reaches only pH %.2f "
                                        + "at %.0f °C", t.substance().name(), goalPH, max / water * 1000, reach,
                                goalK - Thermo.KELVIN_OFFSET), reach, startPH)));
            }
            moles = curve.doseFor(goalPH, startPH - goalPH, atMax, max);
            Optional<TitrantResult.Unreachable> overflow = overflow(recipe, t, moles, goalPH, startPH);
            if (overflow.isPresent()) {
                return new TitrantResult(t, role, 0, true, OptionalDouble.empty(), adjustK, goalPH, goalK, overflow);
            }
        } catch (IndeterminateException | MathIllegalStateException e) {
            caveats.add(Caveat.indeterminate("qs-indeterminate", "the q.s. of " + t.substance().name()
                    + " could not be computed: " + e.getMessage()));
            return new TitrantResult(t, role, 0, true, OptionalDouble.empty(), adjustK, goalPH, goalK,
                    Optional.empty());
        }
        OptionalDouble setpoint;
        try {
            setpoint = OptionalDouble.of(explicit ? goalPH
                    : pH(recipe, t, moles, adjustK, OptionalDouble.empty(), part));
        } catch (IndeterminateException e) {
            caveats.add(Caveat.indeterminate("qs-indeterminate", "the setpoint at the adjustment temperature "
                    + "could not be computed: " + e.getMessage()));
            setpoint = OptionalDouble.empty();
        }
        TitrantResult result = new TitrantResult(t, role, moles, true, setpoint, adjustK, goalPH, goalK, Optional.empty());
        if (part < 1) {
            try {
                result = result.withMakingUp(part, pH(recipe, t, moles, adjustK, OptionalDouble.empty(), 1));
            } catch (IndeterminateException e) {
                caveats.add(Caveat.indeterminate("qs-indeterminate", "the pH after making up could not be computed: "
                        + e.getMessage()));
            }
        }
        return result;
    }

    /**
     * A q.s. whose stock volume exceeds the final volume cannot be made: the goal is out of this stock's reach
     * (however the pH would come out, the recipe would have to hold more stock than solution).
     */
    private static Optional<TitrantResult.Unreachable> overflow(Recipe recipe, Ingredient t, double moles, double goalPH,
                                                              double startPH) {
        Formulation.Basis basis = recipe.formulation().basis();
        if (!basis.finalVolume() || !t.hasStock() || !(moles / t.stockMolarity() > basis.amount())) {
            return Optional.empty();
        }
        return Optional.of(new TitrantResult.Unreachable(String.format(Locale.ROOT,
                "the q.s. to pH %.2f needs %.1f mL of the %.3g mol/L %s stock, more than the %.1f mL of solution the "
                        + "recipe makes; use a stronger stock", goalPH, moles / t.stockMolarity() * 1000,
                t.stockMolarity(), t.substance().name(), basis.amount() * 1000), startPH, startPH));
    }

    /** Where the q.s. of a titrant is judged: the temperature, CO2 state and fraction of the final volume. */
    record Goal(double kelvin, OptionalDouble co2, double volumeFraction) {
    }

    /** The goal of a titrant's q.s., as {@link #dose} meets it. */
    static Goal goal(Recipe recipe, TitrantResult t) {
        Formulation.Adjustment adj = t.ingredient().line().adjustTo().orElseThrow();
        boolean explicit = adj.pH().isPresent();
        return new Goal(t.goalKelvin(), goalCo2(recipe, explicit, t.goalKelvin()), explicit ? adj.atVolume() : 1);
    }

    /** The meter reads a closed sample while adjusting; the target holds in the CO2 state of its condition. */
    private static OptionalDouble goalCo2(Recipe recipe, boolean explicitAdjustment, double goalK) {
        return explicitAdjustment ? OptionalDouble.empty() : co2At(recipe, goalK);
    }
}
