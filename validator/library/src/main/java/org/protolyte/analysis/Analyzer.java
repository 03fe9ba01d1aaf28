package org.protolyte.analysis;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.CarbonDioxide;
import org.protolyte.chemistry.Caveat;
import org.protolyte.chemistry.Component;
import org.protolyte.chemistry.Derivatives;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.chemistry.EquilibriumState;
import org.protolyte.chemistry.SolidPhase;
import org.protolyte.chemistry.IndeterminateException;
import org.protolyte.chemistry.Species;
import org.protolyte.chemistry.SpeciesAmount;
import org.protolyte.chemistry.Thermo;
import org.protolyte.document.Formulation;
import org.protolyte.recipe.DensityModel;
import org.protolyte.recipe.Ingredient;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.recipe.Solution;
import org.protolyte.substance.Fluid;
import org.protolyte.substance.Substance;
import org.protolyte.units.Air;

/**
 * Runs the chemistry for a recipe: the q.s. of its titrants ({@link Titration}), then at every condition with that
 * dose the equilibrium, its derivatives and what follows from them (the uncertainty, {@link ConstantsPropagation}; the
 * sensitivities), the searches that rules judge ({@link TargetSearches}) and the drifts between conditions
 * ({@link Drifts}).
 */
public final class Analyzer {

    /** Upper limit of a q.s. search, mol of titrant per kg of water: far beyond any buffer's need. */
    static final double MAX_TITRANT_MOLALITY = 2.0;
    /**
     * The relative change of an amount between the two solutions whose secant is its slope: exact where moles and water
     * are affine in it ({@link AmountSlope}); a molality amount in a final volume is not, and its slope is then off by
     * about this fraction of itself.
     */
    static final double AMOUNT_STEP = 1e-3;

    private final Equilibrium equilibrium;
    private final Titration titration = new Titration(this);
    private final TargetSearches searches = new TargetSearches(this);

    public Analyzer(Equilibrium equilibrium) {
        this.equilibrium = equilibrium;
    }

    Equilibrium equilibrium() {
        return equilibrium;
    }

    /** The q.s. of every titrant line of the recipe, as {@link #analyze} doses them. */
    List<TitrantResult> titrate(Recipe recipe) {
        return titration.titrate(recipe);
    }

    public FormulationAnalysis analyze(Recipe recipe) {
        List<Caveat> caveats = new ArrayList<>();
        List<TitrantResult> titrants = new ArrayList<>();
        Map<Ingredient, Double> doses = new HashMap<>();
        if (!recipe.titrants().isEmpty()) {
            titrants.addAll(titration.adjust(recipe, caveats));
            titrants.forEach(t -> doses.put(t.ingredient(), t.moles()));
        }
        Solution solution = recipe.solution(doses);
        List<ConditionResult> results = new ArrayList<>();
        List<Optional<Derivatives>> derivatives = new ArrayList<>();
        for (Formulation.Condition c : recipe.formulation().conditions()) {
            results.add(condition(recipe, solution, c, derivatives));
        }
        titrants.replaceAll(t -> titration.explicitSetpointForTarget(recipe, t));
        int n = results.size();
        Optional<Solution> working = recipe.formulation().dilution()
                .map(d -> solution.diluted(d.factor(), recipe.makeUpKelvin()));
        working.ifPresent(w -> recipe.formulation().conditions()
                .forEach(c -> results.add(condition(recipe, w, c, derivatives))));
        List<Solution> solutions = new ArrayList<>(java.util.Collections.nCopies(n, solution));
        List<java.util.function.UnaryOperator<Solution>> derived = new ArrayList<>(java.util.Collections.nCopies(n,
                java.util.function.UnaryOperator.identity()));
        working.ifPresent(w -> {
            solutions.addAll(java.util.Collections.nCopies(n, w));
            double factor = recipe.formulation().dilution().orElseThrow().factor();
            derived.addAll(java.util.Collections.nCopies(n, s -> s.diluted(factor, recipe.makeUpKelvin())));
        });
        int beforeAdmixtures = results.size();
        List<Fluid> fluids = new ArrayList<>();
        for (Formulation.Admixture ad : recipe.formulation().admixtures()) {
            Fluid fluid = recipe.library().fluid(ad.into()).orElseThrow();
            Solution received = new RecipeResolver(recipe.library()).fluid(fluid).solution(Map.of());
            java.util.function.UnaryOperator<Solution> mix = s -> s.mixed(received,
                    ad.fluidParts() / ad.productParts(), recipe.makeUpKelvin());
            Solution mixture = mix.apply(solution);
            results.add(admixture(recipe, mixture, new Formulation.Condition("into " + fluid.name() + " ("
                    + ad.ratio() + ")", fluid.kelvin(), true, ad.pointer(), fluid.co2Pascal()), derivatives));
            solutions.add(mixture);
            derived.add(mix);
            fluids.add(fluid);
        }
        Solution everything = solution;   // every component of every result: the fluids' constants count too
        for (Solution s : solutions.subList(beforeAdmixtures, solutions.size())) {
            everything = everything.mixed(s, 1, recipe.makeUpKelvin());
        }
        List<ConditionResult> all = new ConstantsPropagation(this).apply(recipe, everything, results, solutions,
                derived, derivatives, titrants);
        List<ConditionResult> own = all.subList(0, n);
        Optional<FormulationAnalysis.WorkingSolution> diluted = working.map(w -> new FormulationAnalysis.WorkingSolution(
                recipe.formulation().dilution().orElseThrow(), w, all.subList(n, beforeAdmixtures)));
        List<FormulationAnalysis.Admixed> admixed = new ArrayList<>();
        for (int i = 0; i < fluids.size(); i++) {
            ConditionResult r = all.get(beforeAdmixtures + i);
            Solution mixture = solutions.get(beforeAdmixtures + i);
            admixed.add(new FormulationAnalysis.Admixed(recipe.formulation().admixtures().get(i), fluids.get(i),
                    mixture, r, DrugSolubility.of(recipe.library().drugSubstances(), List.of(r), mixture.waterKg())));
        }
        Optional<TitratableAcidity> acidity = searches.titratableAcidity(recipe, solution, caveats);
        return new FormulationAnalysis(recipe, solution, own, titrants, caveats, assumptions(recipe),
                sensitivities(recipe, doses, solution, own, derivatives), Drifts.of(recipe, own), acidity, Optional.empty(),
                diluted, Optional.empty(), ProteinCharge.of(recipe.library().proteins(), own, p -> bufferAlone(recipe,
                doses, p)), DrugSolubility.of(recipe.library().drugSubstances(), own, solution.waterKg()), admixed);
    }

    /**
     * The product mixed into a receiving fluid, at the fluid's temperature and CO2: the equilibrium, β, osmolarity
     * and saturation, without the searches that belong to the product's own target.
     */
    private ConditionResult admixture(Recipe recipe, Solution mixture, Formulation.Condition c,
                                      List<Optional<Derivatives>> derivatives) {
        double volume = mixture.volumeLitres(c.kelvin());
        derivatives.add(Optional.empty());
        try {
            Equilibrium.Prepared problem = prepare(recipe, mixture, c.kelvin(), c.co2Pascal(), java.util.Set.of());
            EquilibriumState s = problem.solve(mixture.totals(), Double.NaN);
            if (s.determinate()) {
                derivatives.set(derivatives.size() - 1, differentiated(problem));
            }
            double perLitre = mixture.waterKg() / volume;
            return new ConditionResult(c, Optional.of(s), s.caveats(), s.bufferCapacity() * perLitre,
                    s.osmolality() * perLitre, volume, buffers(recipe, mixture, s, perLitre), OptionalDouble.empty(),
                    Optional.empty(), OptionalDouble.empty(), Optional.empty(),
                    s.determinate() ? saturation(recipe, s) : List.of()).finite();
        } catch (IndeterminateException e) {
            return new ConditionResult(c, Optional.empty(), List.of(e.caveat()), Double.NaN, Double.NaN, volume, List.of(),
                    OptionalDouble.empty(), Optional.empty(), OptionalDouble.empty(), Optional.empty(), List.of());
        }
    }

    /**
     * The pH at each condition of the recipe without one protein (and the counterions it brings), every other amount,
     * the titrants' q.s. doses included, as they are: the buffer alone, against which the protein's self-buffering
     * shows. Empty where that solution has no pH.
     */
    private List<OptionalDouble> bufferAlone(Recipe recipe, Map<Ingredient, Double> doses,
                                             org.protolyte.substance.Protein protein) {
        List<Ingredient> rest = recipe.ingredients().stream().filter(i -> i.substance() != protein.substance()).toList();
        Solution alone = new Recipe(recipe.formulation(), recipe.library(), rest, recipe.makeUpKelvin())
                .solution(new HashMap<>(doses));
        List<OptionalDouble> out = new ArrayList<>();
        for (Formulation.Condition c : recipe.formulation().conditions()) {
            try {
                EquilibriumState s = solve(recipe, alone, c.kelvin(), c.co2Pascal());
                out.add(s.determinate() ? OptionalDouble.of(s.pH()) : OptionalDouble.empty());
            } catch (IndeterminateException e) {
                // caught: the buffer alone then has no pH here, and the report shows no shift for this condition
                out.add(OptionalDouble.empty());
            }
        }
        return out;
    }

    /** The points behind a report's plots: the titration, β and the forms against pH, and pH from 0 to 50 °C. */
    public Curves curves(FormulationAnalysis a) {
        return new CurveTracer(this, searches).trace(a);
    }

    /**
     * What a recipe gives without its uncertainties: the q.s. dose of each titrant (mol per basis; empty where its
     * goal cannot be reached) and each condition's equilibrium (empty where it is indeterminate), with the reasons of
     * every empty one in {@code caveats}. For comparing a batch as made with what was measured, many times over.
     */
    public record Forecast(Map<Ingredient, OptionalDouble> doses, List<Optional<EquilibriumState>> states,
                           List<Caveat> caveats) {
        public Forecast {
            caveats = List.copyOf(caveats);
        }
    }

    public Forecast forecast(Recipe recipe) {
        Map<Ingredient, OptionalDouble> out = new LinkedHashMap<>();
        Map<Ingredient, Double> doses = new HashMap<>();
        List<Caveat> caveats = new ArrayList<>();
        if (!recipe.titrants().isEmpty()) {
            for (TitrantResult t : titration.adjust(recipe, caveats)) {
                boolean reached = t.unreachable().isEmpty();
                out.put(t.ingredient(), reached ? OptionalDouble.of(t.moles()) : OptionalDouble.empty());
                t.unreachable().ifPresent(u -> caveats.add(Caveat.indeterminate("qs-unreachable", u.reason())));
                doses.put(t.ingredient(), t.moles());
            }
        }
        Solution solution = recipe.solution(doses);
        List<Optional<EquilibriumState>> states = new ArrayList<>();
        for (Formulation.Condition c : recipe.formulation().conditions()) {
            try {
                EquilibriumState s = solve(recipe, solution, c.kelvin(), c.co2Pascal());
                states.add(s.determinate() ? Optional.of(s) : Optional.empty());
                caveats.addAll(s.caveats().stream().filter(x -> x.severity() == Caveat.Severity.INDETERMINATE).toList());
            } catch (IndeterminateException e) {
                states.add(Optional.empty());
                caveats.add(e.caveat());
            }
        }
        return new Forecast(out, states, caveats);
    }

    /**
     * dpH at the target's temperature per +1 % of each weighed component, titrants held at their q.s.: the derivative
     * with respect to the amount (implicit differentiation, {@link Derivatives}) times 1 %, to first order.
     */
    private List<Sensitivity> sensitivities(Recipe recipe, Map<Ingredient, Double> doses, Solution solution,
                                            List<ConditionResult> results, List<Optional<Derivatives>> derivatives) {
        Optional<Formulation.PhTarget> target = recipe.formulation().pHTarget();
        if (target.isEmpty()) {
            return List.of();
        }
        int at = -1;
        for (int i = 0; i < results.size() && at < 0; i++) {
            if (results.get(i).determinate() && derivatives.get(i).isPresent()
                    && Formulation.sameTemperature(results.get(i).condition().kelvin(), target.get().kelvin())) {
                at = i;
            }
        }
        if (at < 0) {
            return List.of();
        }
        Derivatives d = derivatives.get(at).orElseThrow();
        double kelvin = results.get(at).condition().kelvin();
        List<Sensitivity> out = new ArrayList<>();
        for (Ingredient ing : recipe.ingredients()) {
            if (ing.kind() == Ingredient.Kind.TITRANT || ing.substance().solvent() || !ing.substance().composition()
                    .isIonizable()) {
                continue;
            }
            List<Ingredient> changed = new ArrayList<>(recipe.ingredients());
            changed.set(changed.indexOf(ing), new Ingredient(ing.line(), ing.substance(), ing.kind(),
                    ing.value() * (1 + AMOUNT_STEP), ing.stockMolarity(), ing.stockDensity()));
            Solution more = new Recipe(recipe.formulation(), recipe.library(), changed, recipe.makeUpKelvin())
                    .solution(new HashMap<>(doses));
            AmountSlope slope = AmountSlope.between(solution, more, AMOUNT_STEP, d.components(), kelvin);
            try {
                out.add(new Sensitivity(ing.substance().name(), ing.line().pointer(),
                        0.01 * d.totals(slope.totals()).pH()));
            } catch (IndeterminateException e) {
                // caught: a component whose amount cannot be differentiated here has no sensitivity to report
            }
        }
        out.sort(java.util.Comparator.comparingDouble((Sensitivity x) -> -Math.abs(x.dpHPerPercent())));
        return out;
    }

    /** The equilibrium of a solution at a temperature, closed or open to a CO2 partial pressure (Pa). */
    EquilibriumState solve(Recipe recipe, Solution solution, double kelvin, OptionalDouble co2) {
        return prepare(recipe, solution, kelvin, co2, java.util.Set.of()).solve(solution.totals(), Double.NaN);
    }

    /**
     * The problem of a solution's species at a temperature, closed or open to a CO2 partial pressure (Pa), with
     * room for extra strong ions: prepared once, solved for any amounts of the same ingredients.
     */
    Equilibrium.Prepared prepare(Recipe recipe, Solution solution, double kelvin, OptionalDouble co2,
                                 java.util.Set<Component> extraIons) {
        java.util.Set<Species> species = new java.util.LinkedHashSet<>(solution.species());
        // a fixed order (by name), so that problems prepared from different solutions of one recipe agree
        java.util.Set<Component> components = new java.util.TreeSet<>(
                java.util.Comparator.comparing(Component::name).thenComparingInt(Component::charge));
        components.addAll(solution.totals().keySet());
        for (Component c : extraIons) {
            components.add(c);
            species.add(Species.free(c));
        }
        if (co2.isEmpty()) {
            return equilibrium.prepare(List.copyOf(species), components, kelvin, Map.of());
        }
        AcidBaseSystem carbonate = recipe.library().carbonDioxide().orElseThrow(() -> new IndeterminateException(
                Caveat.indeterminate("no-carbonate-system", "the library has no system whose acid form is "
                        + CarbonDioxide.DISSOLVED + " for a CO2 condition")));
        species.addAll(carbonate.species());
        components.add(carbonate.basis());
        Species dissolved = carbonate.species().get(0);
        return equilibrium.prepare(List.copyOf(species), components, kelvin,
                Map.of(dissolved, CarbonDioxide.dissolvedMolality(kelvin, co2.getAsDouble())));
    }

    /** One condition's result; its derivatives (for the uncertainty and the sensitivities) go to {@code derivatives}. */
    private ConditionResult condition(Recipe recipe, Solution solution, Formulation.Condition c,
                                      List<Optional<Derivatives>> derivatives) {
        double volume = solution.volumeLitres(c.kelvin());
        derivatives.add(Optional.empty());
        try {
            Equilibrium.Prepared problem = prepare(recipe, solution, c.kelvin(), c.co2Pascal(), java.util.Set.of());
            EquilibriumState s = problem.solve(solution.totals(), Double.NaN);
            if (s.determinate()) {
                derivatives.set(derivatives.size() - 1, differentiated(problem));
            }
            double perLitre = solution.waterKg() / volume;
            boolean determinate = s.determinate();
            List<Caveat> caveats = new ArrayList<>(s.caveats());
            Optional<Loads> loads = determinate ? searches.loads(recipe, solution, c, s.pH(), caveats) : Optional.empty();
            return new ConditionResult(c, Optional.of(s), caveats, s.bufferCapacity() * perLitre,
                    s.osmolality() * perLitre, volume,
                    buffers(recipe, solution, s, perLitre),
                    determinate ? inAir(recipe, solution, c, s) : OptionalDouble.empty(),
                    loads,
                    determinate ? searches.co2ForTarget(recipe, solution, c) : OptionalDouble.empty(), Optional.empty(),
                    determinate ? saturation(recipe, s) : List.of()).finite();
        } catch (IndeterminateException e) {
            return new ConditionResult(c, Optional.empty(), List.of(e.caveat()), Double.NaN, Double.NaN, volume, List.of(),
                    OptionalDouble.empty(), Optional.empty(), OptionalDouble.empty(), Optional.empty(), List.of());
        }
    }

    /** The derivatives of the last solve of a problem; empty where its balances are singular there. */
    private static Optional<Derivatives> differentiated(Equilibrium.Prepared problem) {
        try {
            return Optional.of(problem.derivatives());
        } catch (IndeterminateException e) {
            // caught: the uncertainty and sensitivities of this condition are then not computed, which each says
            return Optional.empty();
        }
    }

    /** The saturation index of every library solid whose ions the equilibrium holds. */
    private static List<SolidPhase.Saturation> saturation(Recipe recipe, EquilibriumState s) {
        List<SolidPhase.Saturation> out = new ArrayList<>();
        for (SolidPhase phase : recipe.library().phases()) {
            phase.saturation(s).ifPresent(out::add);
        }
        return out;
    }

    /** Each system's term of β as the chemistry reports it, and its pKa(T) nearest the pH. */
    private static List<BufferContribution> buffers(Recipe recipe, Solution solution, EquilibriumState s,
                                                    double perLitre) {
        List<BufferContribution> out = new ArrayList<>();
        for (AcidBaseSystem system : recipe.library().systems()) {
            Component basis = system.basis();
            double total = s.species().stream().filter(x -> x.component().equals(basis))
                    .mapToDouble(SpeciesAmount::molality).sum();   // open systems too
            if (total <= 0) {
                continue;
            }
            double beta = s.componentBufferCapacity().getOrDefault(basis, 0.0) * perLitre;
            double[] shift = complexShift(system, s);
            double nearest = Double.NaN;
            for (int k = 0; k < system.steps().size(); k++) {
                double pKa = system.steps().get(k).pKa(s.kelvin()) + shift[k];
                if (Double.isNaN(nearest) || Math.abs(pKa - s.pH()) < Math.abs(nearest - s.pH())) {
                    nearest = pKa;
                }
            }
            boolean apparent = java.util.Arrays.stream(shift).anyMatch(x -> Math.abs(x) >= 0.05);
            out.add(new BufferContribution(system.name(), beta, beta / (s.bufferCapacity() * perLitre), nearest,
                    total * solution.waterKg(), s.openComponents().contains(basis), apparent));
        }
        out.sort(java.util.Comparator.comparingDouble(BufferContribution::bufferCapacityPerLitre).reversed());
        return out;
    }

    /**
     * How far the system's complexes move each step's pKa at this equilibrium (the conditional pKa less the
     * thermodynamic one): step k exchanges a proton between the forms with n−k and n−k−1 protons, and a complex shown
     * under the system counts with the forms of its proton number, so pKa'_k = pKa_k + log10(M_acid/m_acid) −
     * log10(M_base/m_base), M the total of a proton number, m its free form. Zero where no complex holds the system.
     */
    private static double[] complexShift(AcidBaseSystem system, EquilibriumState s) {
        int n = system.steps().size();
        double[] free = new double[n + 1];          // by proton number
        double[] all = new double[n + 1];
        boolean any = false;
        for (SpeciesAmount sp : s.species()) {
            if (!sp.component().equals(system.basis())) {
                continue;
            }
            int p = sp.species().protons();
            if (p < 0 || p > n) {
                continue;
            }
            all[p] += sp.molality() * sp.species().components().get(system.basis());
            if (sp.species().isComplex()) {
                any = true;
            } else {
                free[p] += sp.molality();
            }
        }
        double[] shift = new double[n];
        for (int k = 0; any && k < n; k++) {
            int acid = n - k;
            int base = n - k - 1;
            if (free[acid] > 0 && free[base] > 0) {
                shift[k] = Math.log10(all[acid] / free[acid]) - Math.log10(all[base] / free[base]);
            }
        }
        return shift;
    }

    /** A closed condition's pH once equilibrated with room air (CO2 at its fraction of standard pressure). */
    private OptionalDouble inAir(Recipe recipe, Solution solution, Formulation.Condition c, EquilibriumState closed) {
        if (c.co2Pascal().isPresent()) {
            return OptionalDouble.empty();
        }
        try {
            double air = Air.co2Pascal(Air.STANDARD_PRESSURE);
            // started from the closed solution: the same recipe, a little carbonic acid taken up
            Equilibrium.Point start = new Equilibrium.Point(closed.pH(), closed.ionicStrength(), Double.NaN, Double.NaN);
            return OptionalDouble.of(prepare(recipe, solution, c.kelvin(), OptionalDouble.of(air), java.util.Set.of())
                    .trial(solution.totals(), start).pH());
        } catch (IndeterminateException e) {
            // caught: a hint in the report only (no rule judges it); where it cannot be solved none is shown
            return OptionalDouble.empty();
        }
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
        out.add("activity coefficients: " + equilibrium.activityModel().name() + "; pH on the conventional "
                + "(Bates–Guggenheim) scale to ionic strength 0.1 mol/kg, on the scale of the model's single-ion "
                + "coefficients above");
        for (Ingredient ing : recipe.ingredients()) {
            List<String> forms = recipe.library().forms(ing.line().substance());
            if (!forms.isEmpty()) {
                out.add(String.format(Locale.ROOT, "'%s' names forms that differ only in their water of hydration (%s); "
                        + "for a molar amount the form does not change the chemistry: %s was assumed for the water it "
                        + "brings (%.0f mol per mol); a hydrate weighed instead brings its own water of hydration too",
                        ing.line().substance(), String.join(", ", forms), ing.substance().name(),
                        ing.substance().hydrationWater()));
            }
        }
        defaultedUncertainties(recipe).ifPresent(out::add);
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

    /** The steps of the recipe's systems whose ΔH° or ΔCp° uncertainty is the library's default, named. */
    private static java.util.Optional<String> defaultedUncertainties(Recipe recipe) {
        java.util.Set<String> used = new java.util.HashSet<>();
        recipe.ingredients().forEach(i -> i.substance().composition().systems().forEach(p -> used.add(p.system())));
        if (recipe.formulation().conditions().stream().anyMatch(c -> c.co2Pascal().isPresent())) {
            recipe.library().carbonDioxide().ifPresent(c -> used.add(c.name()));
        }
        List<String> named = new ArrayList<>();
        recipe.library().systems().stream().filter(sys -> used.contains(sys.name()))
                .sorted(java.util.Comparator.comparing(org.protolyte.chemistry.AcidBaseSystem::name)).forEach(sys -> {
                    for (int k = 0; k < sys.steps().size(); k++) {
                        var step = sys.steps().get(k);
                        if (!step.assumed().isEmpty()) {
                            named.add(sys.name() + (sys.steps().size() > 1 ? " pKa" + (k + 1) : " pKa") + " ("
                                    + String.join(", ", step.assumed()) + ")");
                        }
                    }
                });
        return named.isEmpty() ? java.util.Optional.empty()
                : java.util.Optional.of(org.protolyte.substance.UncertaintyDefaults.STATED + ": " + String.join("; ",
                named));
    }
}
