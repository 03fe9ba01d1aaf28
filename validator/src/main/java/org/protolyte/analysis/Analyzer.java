package org.protolyte.analysis;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;
import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.CarbonDioxide;
import org.protolyte.chemistry.Caveat;
import org.protolyte.chemistry.Component;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.chemistry.EquilibriumState;
import org.protolyte.chemistry.IndeterminateException;
import org.protolyte.chemistry.Species;
import org.protolyte.chemistry.SpeciesAmount;
import org.protolyte.chemistry.Thermo;
import org.protolyte.document.DocumentException;
import org.protolyte.document.Formulation;
import org.protolyte.recipe.DensityModel;
import org.protolyte.recipe.Ingredient;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.Solution;
import org.protolyte.substance.Substance;

/**
 * Runs the chemistry for a recipe: finds the q.s. amount of its titrant, then solves the equilibrium
 * at every condition with that amount.
 */
public final class Analyzer {

    /** Upper limit of a q.s. search, mol of titrant per kg of water: far beyond any buffer's need. */
    static final double MAX_TITRANT_MOLALITY = 2.0;
    /** Name of the library system that a CO2 condition opens. */
    static final String CARBONATE = "carbonate";

    private final Equilibrium equilibrium;

    public Analyzer(Equilibrium equilibrium) {
        this.equilibrium = equilibrium;
    }

    public FormulationAnalysis analyze(Recipe recipe) {
        List<Caveat> caveats = new ArrayList<>();
        List<TitrantResult> titrants = new ArrayList<>();
        Map<Ingredient, Double> doses = new HashMap<>();
        if (!recipe.titrants().isEmpty()) {
            titrants.addAll(adjust(recipe, caveats));
            titrants.forEach(t -> doses.put(t.ingredient(), t.moles()));
        }
        Solution solution = recipe.solution(doses);
        List<ConditionResult> results = new ArrayList<>();
        for (Formulation.Condition c : recipe.formulation().conditions()) {
            results.add(condition(recipe, solution, c));
        }
        return new FormulationAnalysis(recipe, solution, results, titrants, caveats, assumptions(recipe),
                sensitivities(recipe, doses, results));
    }

    /** dpH at the target's temperature per +1 % of each weighed component, titrants held at their q.s. */
    private List<Sensitivity> sensitivities(Recipe recipe, Map<Ingredient, Double> doses, List<ConditionResult> results) {
        Optional<Formulation.PhTarget> target = recipe.formulation().pHTarget();
        if (target.isEmpty()) {
            return List.of();
        }
        Optional<ConditionResult> at = results.stream().filter(ConditionResult::determinate)
                .filter(c -> Math.abs(c.condition().kelvin() - target.get().kelvin()) < 0.005).findFirst();
        if (at.isEmpty()) {
            return List.of();
        }
        double base = at.get().state().orElseThrow().pH();
        double kelvin = at.get().condition().kelvin();
        List<Sensitivity> out = new ArrayList<>();
        for (Ingredient ing : recipe.ingredients()) {
            if (ing.kind() == Ingredient.Kind.TITRANT || ing.substance().solvent() || !ing.substance().composition()
                    .isIonizable()) {
                continue;
            }
            List<Ingredient> changed = new ArrayList<>(recipe.ingredients());
            Ingredient more = new Ingredient(ing.line(), ing.substance(), ing.kind(), ing.value() * 1.01,
                    ing.stockMolarity(), ing.stockDensity());
            changed.set(changed.indexOf(ing), more);
            Recipe r = new Recipe(recipe.formulation(), recipe.library(), changed, recipe.makeUpKelvin());
            Map<Ingredient, Double> titrants = new HashMap<>(doses);
            try {
                Solution s = r.solution(titrants);
                double pH = solve(recipe, s, kelvin, at.get().condition().co2Pascal(), Map.of()).pH();
                out.add(new Sensitivity(ing.substance().name(), ing.line().pointer(), pH - base));
            } catch (IndeterminateException e) {
                // a component whose 1 % change cannot be solved has no sensitivity to report
            }
        }
        out.sort(java.util.Comparator.comparingDouble((Sensitivity x) -> -Math.abs(x.dpHPerPercent())));
        return out;
    }

    /**
     * The equilibrium of a solution at a temperature, closed or open to a CO2 partial pressure (Pa), with
     * extra strong ions (mol/kg) where a load is being tried.
     */
    EquilibriumState solve(Recipe recipe, Solution solution, double kelvin, OptionalDouble co2,
                           Map<Component, Double> extra) {
        List<Species> species = new ArrayList<>(solution.species());
        Map<Component, Double> totals = new LinkedHashMap<>(solution.totals());
        extra.forEach((c, m) -> {
            totals.merge(c, m, Double::sum);
            if (!species.contains(Species.free(c))) {
                species.add(Species.free(c));
            }
        });
        if (co2.isEmpty()) {
            return equilibrium.solve(species, totals, kelvin);
        }
        AcidBaseSystem carbonate = recipe.library().system(CARBONATE).orElseThrow(() -> new IndeterminateException(
                Caveat.indeterminate("no-carbonate-system", "the library has no 'carbonate' system for a CO2 condition")));
        for (Species x : carbonate.species()) {
            if (!species.contains(x)) {
                species.add(x);
            }
        }
        totals.putIfAbsent(carbonate.basis(), 0.0);
        Species dissolved = carbonate.species().get(0);
        return equilibrium.solve(species, totals, kelvin, Double.NaN,
                Map.of(dissolved, CarbonDioxide.dissolvedMolality(kelvin, co2.getAsDouble())));
    }

    private ConditionResult condition(Recipe recipe, Solution solution, Formulation.Condition c) {
        double volume = solution.volumeLitres(c.kelvin());
        try {
            EquilibriumState s = solve(recipe, solution, c.kelvin(), c.co2Pascal(), Map.of());
            double perLitre = solution.waterKg() / volume;
            return new ConditionResult(c, Optional.of(s), s.caveats(), s.bufferCapacity() * perLitre, volume,
                    buffers(recipe, solution, s, perLitre));
        } catch (IndeterminateException e) {
            return new ConditionResult(c, Optional.empty(), List.of(e.caveat()), Double.NaN, volume, List.of());
        }
    }

    /**
     * Each system's term of β = ln10·Σ_C Σ_s m_s (p_s − p̄_C)², the same sum the chemistry reports, split by
     * component; and the pKa(T) of the system's step nearest the pH.
     */
    private static List<BufferContribution> buffers(Recipe recipe, Solution solution, EquilibriumState s,
                                                    double perLitre) {
        List<BufferContribution> out = new ArrayList<>();
        for (AcidBaseSystem system : recipe.library().systems()) {
            Component basis = system.basis();
            List<SpeciesAmount> forms = s.species().stream().filter(x -> x.component().equals(basis)).toList();
            double total = forms.stream().mapToDouble(SpeciesAmount::molality).sum();   // open systems too
            if (total <= 0) {
                continue;
            }
            double mean = forms.stream().mapToDouble(x -> x.species().protons() * x.molality()).sum() / total;
            double variance = forms.stream().mapToDouble(x -> {
                double d = x.species().protons() - mean;
                return x.molality() * d * d;
            }).sum();
            double beta = Thermo.LN10 * variance * perLitre;
            double nearest = system.steps().stream().mapToDouble(st -> st.pKa(s.kelvin()))
                    .boxed().min(java.util.Comparator.comparingDouble(pk -> Math.abs(pk - s.pH()))).orElseThrow();
            out.add(new BufferContribution(system.name(), beta, beta / (s.bufferCapacity() * perLitre), nearest,
                    total * solution.waterKg()));
        }
        out.sort(java.util.Comparator.comparingDouble(BufferContribution::bufferCapacityPerLitre).reversed());
        return out;
    }

    private double pH(Recipe recipe, Ingredient titrant, double moles, double kelvin, OptionalDouble co2) {
        Solution s = recipe.solution(moles > 0 ? Map.of(titrant, moles) : Map.of());
        return solve(recipe, s, kelvin, co2, Map.of()).pH();
    }

    /** The CO2 state of the condition at a temperature (the first one there), closed if none matches. */
    private static OptionalDouble co2At(Recipe recipe, double kelvin) {
        return recipe.formulation().conditions().stream().filter(c -> Math.abs(c.kelvin() - kelvin) < 0.005)
                .findFirst().map(Formulation.Condition::co2Pascal).orElse(OptionalDouble.empty());
    }

    /** Acid or base: the pH of a 0.01 mol/kg solution of the titrant alone at 25 °C, below or above neutral. */
    TitrantResult.Role role(Recipe recipe, Ingredient titrant) {
        Recipe alone = new Recipe(recipe.formulation(), recipe.library(), List.of(titrant), recipe.makeUpKelvin());
        Solution s = alone.solution(Map.of(titrant, 0.01 * alone.solution(Map.of()).waterKg()));
        return equilibrium.solve(s.species(), s.totals(), Thermo.T_REF).pH() < 7
                ? TitrantResult.Role.ACID : TitrantResult.Role.BASE;
    }

    private List<TitrantResult> adjust(Recipe recipe, List<Caveat> caveats) {
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
            throw new DocumentException(f.document().problem(lines.get(1).line().pointer() + "/adjustTo", what));
        }
        Formulation.Adjustment adj = lines.get(0).line().adjustTo().orElseThrow();
        double adjustK = adj.kelvin();
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
            throw new DocumentException(f.document().problem(adj.pointer(),
                    "adjustTo has no pH and the document has no pH target to adjust to"));
        }
        if (lines.size() == 2) {
            Formulation.Adjustment other = lines.get(1).line().adjustTo().orElseThrow();
            if (Math.abs(other.kelvin() - adjustK) > 0.005 || !other.pH().equals(adj.pH())) {
                throw new DocumentException(f.document().problem(other.pointer(),
                        "an acid and a base adjusting the same recipe must carry the same adjustTo"));
            }
        }
        double startPH;
        try {
            startPH = pH(recipe, lines.get(0), 0, goalK, goalCo2(recipe, explicit, goalK));
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
                out.add(dose(recipe, t, needed, startPH, goalPH, goalK, adjustK, explicit, caveats));
            }
        }
        return out;
    }

    private TitrantResult dose(Recipe recipe, Ingredient t, TitrantResult.Role role, double startPH, double goalPH,
                               double goalK, double adjustK, boolean explicit, List<Caveat> caveats) {
        double water = recipe.solution(Map.of()).waterKg();
        double max = MAX_TITRANT_MOLALITY * water;
        OptionalDouble co2 = goalCo2(recipe, explicit, goalK);
        UnivariateFunction g = n -> pH(recipe, t, n, goalK, co2) - goalPH;
        double moles;
        try {
            double atMax = g.value(max);
            if ((role == TitrantResult.Role.ACID) ? atMax > 0 : atMax < 0) {
                double reach = atMax + goalPH;
                return new TitrantResult(t, role, 0, true, OptionalDouble.empty(), adjustK, goalPH, goalK,
                        Optional.of(new TitrantResult.Unreachable(String.format(Locale.ROOT,
                                "%s cannot bring the pH to %.2f: even %.0f mmol per kg of water reaches only pH %.2f "
                                        + "at %.0f °C", t.substance().name(), goalPH, max / water * 1000, reach,
                                goalK - Thermo.KELVIN_OFFSET), reach, startPH)));
            }
            moles = Math.abs(startPH - goalPH) < 1e-9 ? 0
                    : new BrentSolver(1e-13, 1e-15 * max, 1e-10).solve(1000, g, 0, max);
        } catch (IndeterminateException | MathIllegalStateException e) {
            caveats.add(Caveat.indeterminate("qs-indeterminate", "the q.s. of " + t.substance().name()
                    + " could not be computed: " + e.getMessage()));
            return new TitrantResult(t, role, 0, true, OptionalDouble.empty(), adjustK, goalPH, goalK,
                    Optional.empty());
        }
        OptionalDouble setpoint;
        try {
            setpoint = OptionalDouble.of(explicit ? goalPH : pH(recipe, t, moles, adjustK, OptionalDouble.empty()));
        } catch (IndeterminateException e) {
            caveats.add(Caveat.indeterminate("qs-indeterminate", "the setpoint at the adjustment temperature "
                    + "could not be computed: " + e.getMessage()));
            setpoint = OptionalDouble.empty();
        }
        return new TitrantResult(t, role, moles, true, setpoint, adjustK, goalPH, goalK, Optional.empty());
    }

    /** The meter reads a closed sample while adjusting; the target holds in the CO2 state of its condition. */
    private static OptionalDouble goalCo2(Recipe recipe, boolean explicitAdjustment, double goalK) {
        return explicitAdjustment ? OptionalDouble.empty() : co2At(recipe, goalK);
    }

    private List<String> assumptions(Recipe recipe) {
        List<String> out = new ArrayList<>();
        for (Formulation.Condition c : recipe.formulation().conditions()) {
            c.co2Pascal().ifPresent(p -> out.add(String.format(Locale.ROOT, "%s: open to CO2 at %.3g kPa (Henry's law, "
                    + "Sander 2015)", c.name(), p / 1000)));
        }
        out.add(recipe.formulation().conditions().stream().allMatch(c -> c.co2Pascal().isPresent())
                ? "no condition is closed" : "conditions without a CO2 level: closed, free of CO2 as made "
                + "(no exchange with air)");
        out.add("activity coefficients from the " + equilibrium.activityModel().name()
                + " equation; pH on the conventional (Bates–Guggenheim) scale");
        Formulation.Basis b = recipe.formulation().basis();
        if (b.finalVolume()) {
            out.add(String.format(Locale.ROOT, "made up to volume at %.0f °C; water mass from additive apparent "
                    + "molar volumes", recipe.makeUpKelvin() - Thermo.KELVIN_OFFSET));
            List<String> estimated = recipe.ingredients().stream().map(Ingredient::substance)
                    .filter(DensityModel::isEstimated).map(Substance::name).distinct().toList();
            if (!estimated.isEmpty()) {
                out.add("apparent molar volume estimated from the molar mass ("
                        + DensityModel.FALLBACK_SPECIFIC_VOLUME + " cm³/g) for: " + String.join(", ", estimated));
            }
        }
        return out;
    }
}
