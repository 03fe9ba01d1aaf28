package org.protolyte.analysis;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.apache.commons.math3.exception.MathIllegalStateException;
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
import org.protolyte.chemistry.RootFinder;
import org.protolyte.chemistry.SpeciesAmount;
import org.protolyte.chemistry.Thermo;
import org.protolyte.document.Formulation;
import org.protolyte.document.FormulationReader;
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
    /**
     * The relative change of an amount between the two solutions whose secant is its slope: exact where moles and water
     * are affine in it ({@link AmountSlope}); a molality amount in a final volume is not, and its slope is then off by
     * about this fraction of itself.
     */
    static final double AMOUNT_STEP = 1e-3;
    /** The highest CO2 partial pressure a search for the target's CO2 level tries, Pa (50 kPa). */
    private static final double CO2_SEARCH_MAX_PASCAL = 5e4;

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
        List<Optional<Derivatives>> derivatives = new ArrayList<>();
        for (Formulation.Condition c : recipe.formulation().conditions()) {
            results.add(condition(recipe, solution, c, derivatives));
        }
        titrants.replaceAll(t -> explicitSetpointForTarget(recipe, t));
        int n = results.size();
        Optional<Solution> working = recipe.formulation().dilution()
                .map(d -> solution.diluted(d.factor(), recipe.makeUpKelvin()));
        working.ifPresent(w -> recipe.formulation().conditions()
                .forEach(c -> results.add(condition(recipe, w, c, derivatives))));
        List<Solution> solutions = new ArrayList<>(java.util.Collections.nCopies(n, solution));
        working.ifPresent(w -> solutions.addAll(java.util.Collections.nCopies(n, w)));
        List<ConditionResult> all = new ConstantsPropagation(this).apply(recipe, solution, results, solutions,
                derivatives, titrants);
        List<ConditionResult> own = all.subList(0, n);
        Optional<FormulationAnalysis.WorkingSolution> diluted = working.map(w -> new FormulationAnalysis.WorkingSolution(
                recipe.formulation().dilution().orElseThrow(), w, all.subList(n, all.size())));
        Optional<TitratableAcidity> acidity = titratableAcidity(recipe, solution, caveats);
        return new FormulationAnalysis(recipe, solution, own, titrants, caveats, assumptions(recipe),
                sensitivities(recipe, doses, solution, own, derivatives), drifts(recipe, own), acidity, Optional.empty(), diluted);
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
            for (TitrantResult t : adjust(recipe, caveats)) {
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

    /** Where adjustTo states its own pH and the target is missed: the setpoint that would meet the target. */
    private TitrantResult explicitSetpointForTarget(Recipe recipe, TitrantResult t) {
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
            double max = MAX_TITRANT_MOLALITY * recipe.solution(Map.of()).waterKg();
            DoseCurve curve = DoseCurve.of(this, recipe, t.ingredient(), max, target.kelvin(),
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

    /**
     * pH change between the pairs of conditions that matter, in document order, with its main cause: every pair that
     * holds a reference condition (the first, one named "preparation" or "use", or the first at the pH target's
     * temperature). At most four lines per condition, where every pair would give a report quadratic in the conditions.
     */
    private static boolean isReference(Formulation.Condition c) {
        return c.name().equals("preparation") || c.name().equals("use");
    }

    private static List<Drift> drifts(Recipe recipe, List<ConditionResult> results) {
        List<Drift> out = new ArrayList<>();
        Optional<Formulation.PhTarget> target = recipe.formulation().pHTarget();
        int atTarget = -1;
        for (int i = 0; i < results.size() && target.isPresent() && atTarget < 0; i++) {
            if (Formulation.sameTemperature(results.get(i).condition().kelvin(), target.get().kelvin())) {
                atTarget = i;
            }
        }
        for (int i = 0; i < results.size(); i++) {
            for (int j = i + 1; j < results.size(); j++) {
                ConditionResult a = results.get(i);
                ConditionResult b = results.get(j);
                boolean reference = i == 0 || i == atTarget || j == atTarget
                        || isReference(a.condition()) || isReference(b.condition());
                if (!reference || !a.determinate() || !b.determinate()) {
                    continue;
                }
                double ta = a.condition().kelvin();
                double tb = b.condition().kelvin();
                double mid = (ta + tb) / 2;
                // a system that carries less of β than water's own H+ and OH- (an unbuffered solution) is not the
                // cause, however small the share that would otherwise win
                EquilibriumState sa = a.state().orElseThrow();
                double water = Thermo.LN10 * (sa.hydrogenMolality() + sa.hydroxideMolality()) / sa.bufferCapacity();
                Optional<String> cause = Optional.empty();
                double slope = 0;
                double share = 0;
                double weight = -1;
                for (BufferContribution bc : a.buffers()) {
                    AcidBaseSystem sys = recipe.library().system(bc.system()).orElseThrow();
                    double nearest = bc.nearestPKa();
                    // the step whose pKa is nearest the pH carries the buffering; its slope at the mean temperature
                    DissociationStepSlope d = DissociationStepSlope.of(sys, nearest, ta, mid);
                    if (bc.share() > water && bc.share() * Math.abs(d.slope()) > weight) {
                        weight = bc.share() * Math.abs(d.slope());
                        cause = Optional.of(bc.system());
                        slope = d.slope();
                        share = bc.share();
                    }
                }
                OptionalDouble ca = a.condition().co2Pascal();
                OptionalDouble cb = b.condition().co2Pascal();
                Optional<String> co2 = ca.equals(cb) ? Optional.empty()
                        : Optional.of("CO2 " + co2Text(ca) + " → " + co2Text(cb));
                out.add(new Drift(a.condition().name(), b.condition().name(), ta - Thermo.KELVIN_OFFSET,
                        tb - Thermo.KELVIN_OFFSET, b.state().orElseThrow().pH() - a.state().orElseThrow().pH(), cause,
                        slope, share, co2));
            }
        }
        return out;
    }

    private static String co2Text(OptionalDouble pascal) {
        return pascal.isPresent() ? String.format(Locale.ROOT, "%.3g kPa", pascal.getAsDouble() / 1000) : "closed";
    }

    /** Strong base (or acid, negative) per litre and per dose to bring the recipe to pH 7.4 at 37 °C, closed. */
    private Optional<TitratableAcidity> titratableAcidity(Recipe recipe, Solution solution, List<Caveat> caveats) {
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
     * with dpH/dC from the derivatives, up to {@link #MAX_TITRANT_MOLALITY}.
     */
    private double load(Recipe recipe, Solution solution, double kelvin, OptionalDouble co2, double goal) {
        Component sodium = recipe.library().ion("Na+").orElseThrow();
        Component chloride = recipe.library().ion("Cl-").orElseThrow();
        Equilibrium.Prepared problem = prepare(recipe, solution, kelvin, co2, java.util.Set.of(sodium, chloride));
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
        double atMax = f.value(MAX_TITRANT_MOLALITY);
        double atNone = f.value(0);
        if (Math.signum(atNone) == Math.signum(atMax) && Math.abs(atNone) >= RootFinder.PH_TOLERANCE) {
            throw new IndeterminateException(Caveat.indeterminate("load-not-found", "no amount of strong "
                    + (base ? "base" : "acid") + " up to " + MAX_TITRANT_MOLALITY + " mol/kg reaches pH " + goal));
        }
        double x = RootFinder.solve(f, 0, atNone, MAX_TITRANT_MOLALITY, atMax, 0);
        double mmolPerLitre = x * solution.waterKg() / solution.volumeLitres(kelvin) * 1000;
        return base ? mmolPerLitre : -mmolPerLitre;
    }

    private Optional<Loads> loads(Recipe recipe, Solution solution, Formulation.Condition c, double pH,
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
    private OptionalDouble co2ForTarget(Recipe recipe, Solution solution, Formulation.Condition c) {
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
                    atOnePascal = prepare(recipe, solution, c.kelvin(), OptionalDouble.of(1.0), java.util.Set.of());
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
            Optional<Loads> loads = determinate ? loads(recipe, solution, c, s.pH(), caveats) : Optional.empty();
            return new ConditionResult(c, Optional.of(s), caveats, s.bufferCapacity() * perLitre,
                    s.osmolality() * perLitre, volume,
                    buffers(recipe, solution, s, perLitre),
                    determinate ? inAir(recipe, solution, c, s) : OptionalDouble.empty(),
                    loads,
                    determinate ? co2ForTarget(recipe, solution, c) : OptionalDouble.empty(), Optional.empty(),
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
            double air = FormulationReader.AIR_CO2_FRACTION * FormulationReader.STANDARD_PRESSURE;
            // started from the closed solution: the same recipe, a little carbonic acid taken up
            Equilibrium.Point start = new Equilibrium.Point(closed.pH(), closed.ionicStrength(), Double.NaN, Double.NaN);
            return OptionalDouble.of(prepare(recipe, solution, c.kelvin(), OptionalDouble.of(air), java.util.Set.of())
                    .trial(solution.totals(), start).pH());
        } catch (IndeterminateException e) {
            // caught: a hint in the report only (no rule judges it); where it cannot be solved none is shown
            return OptionalDouble.empty();
        }
    }

    private double pH(Recipe recipe, Ingredient titrant, double moles, double kelvin, OptionalDouble co2) {
        return pH(recipe, titrant, moles, kelvin, co2, 1);
    }

    /** pH with {@code moles} of titrant, at a fraction of the final volume (1: made up). */
    private double pH(Recipe recipe, Ingredient titrant, double moles, double kelvin, OptionalDouble co2,
                      double volumeFraction) {
        Solution s = recipe.solution(moles > 0 ? Map.of(titrant, moles) : Map.of(), volumeFraction);
        return solve(recipe, s, kelvin, co2).pH();
    }

    /** The CO2 state of the condition at a temperature (the first one there), closed if none matches. */
    private static OptionalDouble co2At(Recipe recipe, double kelvin) {
        return recipe.formulation().conditions().stream().filter(c -> Formulation.sameTemperature(c.kelvin(), kelvin))
                .findFirst().map(Formulation.Condition::co2Pascal).orElse(OptionalDouble.empty());
    }

    /** The q.s. of every titrant line of the recipe, as {@link #analyze} doses them. */
    List<TitrantResult> titrate(Recipe recipe) {
        return recipe.titrants().isEmpty() ? List.of() : adjust(recipe, new ArrayList<>());
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
        double max = MAX_TITRANT_MOLALITY * water;
        OptionalDouble co2 = goalCo2(recipe, explicit, goalK);
        double goalVolume = explicit ? part : 1;
        double moles;
        try {
            DoseCurve curve = DoseCurve.of(this, recipe, t, max, goalK, co2, goalVolume);
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
