package org.protolyte.analysis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.ActivityModel;
import org.protolyte.chemistry.Caveat;
import org.protolyte.chemistry.Component;
import org.protolyte.chemistry.Derivatives;
import org.protolyte.chemistry.DissociationStep;
import org.protolyte.chemistry.Equilibrium;
import org.protolyte.chemistry.IndeterminateException;
import org.protolyte.chemistry.IonInteraction;
import org.protolyte.chemistry.Pitzer;
import org.protolyte.chemistry.Species;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.Solution;

/**
 * The pH's uncertainty from the constants and the activity model (see {@link Uncertainty} for what it covers), by
 * linear propagation with derivatives from implicit differentiation ({@link Derivatives}): each pKa used, each ΔH°
 * that has an uncertainty, each complex's log K, pKw and the activity model's log γ, moved by its standard
 * uncertainty u, gives at each condition
 * <pre>
 *   c = ∂pH/∂θ·u + ∂pH/∂n · dn/dθ·u,     dn/dθ = −(∂pH_goal/∂θ)/(∂pH_goal/∂n)
 * </pre>
 * where n is the q.s. dose, held to its goal pH (the implicit function theorem once more); the changes add in
 * quadrature with the covariance of a step's pKa and ΔH° (u² = Σ c_i² + 2ρ c_pKa c_ΔH; they come from one fit).
 */
final class ConstantsPropagation {

    /** pH changes smaller than this are below the solver's resolution: none, so that a report is the same every run. */
    static final double PH_RESOLUTION = 1e-9;

    private final Analyzer analyzer;

    ConstantsPropagation(Analyzer analyzer) {
        this.analyzer = analyzer;
    }

    /** One constant moved by its uncertainty: its response at a state of a given temperature. */
    interface Move {
        Derivatives.Response at(Derivatives d, double kelvin);

        /** The standard uncertainty reported with the change: the constant's own unless it depends on the state. */
        default double u(Derivatives d, double kelvin, double nominal) {
            return nominal;
        }

        /** Whether it is left out of a condition's budget where it moves nothing (it does not apply there). */
        default boolean onlyWhereItMoves() {
            return false;
        }
    }

    /** The activity model's systematic error, reported per unit z² of log10 γ of the ions with parameters. */
    private static final Move ACTIVITY_MODEL = new Move() {
        @Override
        public Derivatives.Response at(Derivatives d, double kelvin) {
            return d.activityModel();
        }

        /** To two significant digits: the solver's last digits are not the model's. */
        @Override
        public double u(Derivatives d, double kelvin, double nominal) {
            double u = d.activityModelUncertainty();
            return u > 0 ? new java.math.BigDecimal(u).round(new java.math.MathContext(2)).doubleValue() : 0;
        }
    };

    record Perturbation(String name, double u, Move move, int pair, double correlation) {
    }

    /** A Pitzer pair without temperature terms: its β moved to their bound at the state's temperature. */
    private static Move pitzerPair(Pitzer.Pair pair) {
        return new Move() {
            @Override
            public Derivatives.Response at(Derivatives d, double kelvin) {
                return d.pitzerPair(pair.cation(), pair.anion());
            }

            @Override
            public double u(Derivatives d, double kelvin, double nominal) {
                return Pitzer.betaOneBound(kelvin);
            }

            @Override
            public boolean onlyWhereItMoves() {
                return true;
            }
        };
    }

    /**
     * The constants whose uncertainties count for this recipe, in a fixed order (systems by name); with Pitzer's
     * equations ({@link IonInteraction}), each pair of the recipe's ions whose parameters have no temperature terms.
     */
    static List<Perturbation> perturbations(Recipe recipe, Solution solution, ActivityModel activity) {
        List<Perturbation> out = new ArrayList<>();
        boolean anyCo2 = recipe.formulation().conditions().stream().anyMatch(c -> c.co2Pascal().isPresent());
        Optional<AcidBaseSystem> carbonDioxide = recipe.library().carbonDioxide();
        List<AcidBaseSystem> systems = new ArrayList<>(recipe.library().systems());
        systems.sort(Comparator.comparing(AcidBaseSystem::name));
        for (AcidBaseSystem sys : systems) {
            boolean used = solution.totals().getOrDefault(sys.basis(), 0.0) > 0
                    || anyCo2 && carbonDioxide.filter(sys::equals).isPresent();
            for (int k = 0; used && k < sys.steps().size(); k++) {
                DissociationStep step = sys.steps().get(k);
                String name = sys.name() + (sys.steps().size() > 1 ? " pKa" + (k + 1) : " pKa");
                Map<Species, Double> carried = Equilibrium.pKaShift(sys, k);
                int pair = out.size();
                double u = step.uncertainty();
                if (u > 0) {
                    out.add(new Perturbation(name, u, (d, kelvin) -> scaled(d.logBeta(carried), u), -1, 0));
                }
                double uH = step.deltaHUncertainty();
                if (uH > 0) {
                    boolean paired = u > 0 && step.correlation() != 0;
                    out.add(new Perturbation(name.replace("pKa", "ΔH°"), uH / 1000, (d, kelvin) ->
                            scaled(d.logBeta(carried), DissociationStep.pKaChangeFromDeltaH(uH, kelvin)),
                            paired ? pair : -1, step.correlation()));
                }
                double uCp = step.deltaCpUncertainty();
                if (uCp > 0) {
                    out.add(new Perturbation(name.replace("pKa", "ΔCp°"), uCp, (d, kelvin) ->
                            scaled(d.logBeta(carried), DissociationStep.pKaChangeFromDeltaCp(uCp, kelvin)), -1, 0));
                }
            }
        }
        for (Species complex : solution.species()) {       // complexes, ion pairs and esters the recipe forms
            double u = complex.formation().uncertainty();
            if (complex.isComplex() && u > 0) {
                out.add(new Perturbation(complex.name() + " log K", u,
                        (d, kelvin) -> scaled(d.logBeta(Map.of(complex, 1.0)), u), -1, 0));
            }
        }
        out.add(new Perturbation("pKw", Equilibrium.PKW_UNCERTAINTY,
                (d, kelvin) -> scaled(d.pKw(), Equilibrium.PKW_UNCERTAINTY), -1, 0));
        out.add(new Perturbation("activity model (log10 γ per z²)", 0, ACTIVITY_MODEL, -1, 0));
        if (activity instanceof IonInteraction) {
            java.util.Set<Pitzer.Ion> ions = new java.util.LinkedHashSet<>();
            for (Species s : solution.species()) {
                if (s.charge() != 0 && s.components().keySet().stream().noneMatch(Component::bound)) {
                    ions.add(new Pitzer.Ion(s.name(), s.charge()));
                }
            }
            ions.add(new Pitzer.Ion("H+", 1));
            ions.add(new Pitzer.Ion("OH-", -1));
            for (Pitzer.Pair pair : Pitzer.pairsWithoutTemperatureTerms(List.copyOf(ions))) {
                out.add(new Perturbation("Pitzer " + pair.name() + " (25 °C values; β¹ kg/mol)", 0, pitzerPair(pair),
                        -1, 0));
            }
        }
        return out;
    }

    private static Derivatives.Response scaled(Derivatives.Response r, double f) {
        return new Derivatives.Response(r.pH() * f, r.ionicStrength() * f, r.bufferCapacity() * f);
    }

    /** A solved condition, differentiated, with the slope of its totals along the q.s. dose (mol). */
    private record Differentiated(Derivatives d, double kelvin, AmountSlope dose) {
        Derivatives.Response perMole() {
            return d.totals(dose.totals());
        }
    }

    /** The derivatives of a condition: {@code known} where the analysis kept them, else from a solve here. */
    private Differentiated differentiate(Recipe recipe, Solution at, Optional<Solution> moved, double step,
                                         double kelvin, OptionalDouble co2, Optional<Derivatives> known) {
        Derivatives d;
        if (known.isPresent()) {
            d = known.get();
        } else {
            Equilibrium.Prepared p = analyzer.prepare(recipe, at, kelvin, co2, java.util.Set.of());
            p.trial(at.totals(), null);
            d = p.derivatives();
        }
        List<Component> order = d.components();
        return new Differentiated(d, kelvin, moved.map(m -> AmountSlope.between(at, m, step, order, kelvin))
                .orElseGet(() -> AmountSlope.none(at, order.size(), kelvin)));
    }

    /**
     * @param constants a solution holding every component of the results' solutions: its constants are the ones moved
     * @param solutions the solution of each result (the concentrate's, then the working solution's, then each
     *                  admixture's)
     * @param derived   for each result, how its solution follows from the recipe's at another dose (the identity, a
     *                  dilution, a mixture)
     * @param titrants  the q.s. results: the one dosed (moles &gt; 0, goal reached) is held to its goal
     */
    List<ConditionResult> apply(Recipe recipe, Solution constants, List<ConditionResult> results,
                                List<Solution> solutions, List<java.util.function.UnaryOperator<Solution>> derived,
                                List<Optional<Derivatives>> derivatives, List<TitrantResult> titrants) {
        List<Perturbation> perturbations = perturbations(recipe, constants, analyzer.equilibrium().activityModel());
        Optional<TitrantResult> dosed = titrants.stream()
                .filter(t -> t.used() && t.unreachable().isEmpty() && t.moles() > 0).findFirst();
        int n = results.size();
        // dn per perturbation, where a dose is held to its goal
        double[] dDose = new double[perturbations.size()];
        double step = dosed.map(t -> t.moles() * 1e-3).orElse(0.0);
        boolean doseFailed = false;
        if (dosed.isPresent()) {
            TitrantResult t = dosed.get();
            Titration.Goal goal = Titration.goal(recipe, t);
            try {
                Solution at = recipe.solution(Map.of(t.ingredient(), t.moles()), goal.volumeFraction());
                Solution more = recipe.solution(Map.of(t.ingredient(), t.moles() + step), goal.volumeFraction());
                Differentiated g = differentiate(recipe, at, Optional.of(more), step, goal.kelvin(), goal.co2(),
                        Optional.empty());
                double perMole = g.perMole().pH();
                for (int q = 0; q < perturbations.size(); q++) {
                    dDose[q] = -perturbations.get(q).move().at(g.d(), g.kelvin()).pH() / perMole;
                }
                doseFailed = !(Math.abs(perMole) > 0);
            } catch (IndeterminateException | IllegalStateException e) {
                // caught: a q.s. that cannot be differentiated leaves every condition without its uncertainty, which
                // each one then says (below)
                doseFailed = true;
            }
        }
        List<ConditionResult> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            ConditionResult r = results.get(i);
            if (!r.determinate()) {
                out.add(r);
                continue;
            }
            Optional<Uncertainty> u = doseFailed ? Optional.empty()
                    : uncertainty(recipe, r, solutions.get(i), derivatives.get(i), dosed, step, perturbations, dDose,
                    derived.get(i));
            out.add(u.map(r::withUncertainty).orElseGet(() -> r.withCaveat(Caveat.warning("uncertainty-not-computed",
                    "the uncertainty from the constants could not be computed here: the pH is shown without it"))));
        }
        return out;
    }

    private Optional<Uncertainty> uncertainty(Recipe recipe, ConditionResult r, Solution solution,
                                              Optional<Derivatives> known, Optional<TitrantResult> dosed, double step, List<Perturbation> perturbations,
                                              double[] dDose, java.util.function.UnaryOperator<Solution> derive) {
        Differentiated c;
        try {
            Optional<Solution> more = dosed.map(t -> derive.apply(recipe.solution(Map.of(t.ingredient(),
                    t.moles() + step))));
            c = differentiate(recipe, solution, more, step, r.condition().kelvin(), r.condition().co2Pascal(), known);
        } catch (IndeterminateException | IllegalStateException e) {
            // caught: this condition's uncertainty is not computed, which the caller says in a caveat
            return Optional.empty();
        }
        Derivatives.Response perMole = dosed.isPresent() ? c.perMole() : new Derivatives.Response(0, 0, 0);
        double beta = r.bufferCapacityPerLitre() / c.dose().waterPerLitre();         // mol/kg per pH
        double pH2 = 0;
        double beta2 = 0;
        double[] dpHs = new double[perturbations.size()];
        double[] dBetas = new double[perturbations.size()];
        List<Uncertainty.Contribution> parts = new ArrayList<>();
        for (int q = 0; q < perturbations.size(); q++) {
            Perturbation p = perturbations.get(q);
            Derivatives.Response own = p.move().at(c.d(), c.kelvin());
            double raw = own.pH() + perMole.pH() * dDose[q];
            double dpH = Math.abs(raw) < PH_RESOLUTION ? 0 : raw;
            double dBeta = (own.bufferCapacity() + perMole.bufferCapacity() * dDose[q]) * c.dose().waterPerLitre()
                    + beta * c.dose().dWaterPerLitre() * dDose[q];
            dpHs[q] = dpH;
            dBetas[q] = dBeta;
            pH2 += dpH * dpH;
            beta2 += dBeta * dBeta;
            if (p.pair() >= 0) {        // the covariance term with the same step's pKa
                pH2 += 2 * p.correlation() * dpH * dpHs[p.pair()];
                beta2 += 2 * p.correlation() * dBeta * dBetas[p.pair()];
            }
            if (!p.move().onlyWhereItMoves() || dpH != 0 || dBeta != 0) {
                parts.add(new Uncertainty.Contribution(p.name(), p.move().u(c.d(), c.kelvin(), p.u()), dpH));
            }
        }
        parts.sort(Comparator.comparingDouble((Uncertainty.Contribution x) -> -Math.abs(x.pHChange())));
        return Optional.of(new Uncertainty(Math.sqrt(Math.max(0, pH2)), Math.sqrt(Math.max(0, beta2)), parts));
    }
}
