package org.protolyte.batch;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.protolyte.analysis.Analyzer;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.analysis.RecipeConflict;
import org.protolyte.chemistry.Caveat;
import org.protolyte.chemistry.EquilibriumState;
import org.protolyte.chemistry.Thermo;
import org.protolyte.document.DocumentException;
import org.protolyte.document.Formulation;
import org.protolyte.document.Problem;
import org.protolyte.document.SourceDocument;
import org.protolyte.recipe.Ingredient;
import org.protolyte.recipe.Recipe;
import org.protolyte.recipe.RecipeResolver;
import org.protolyte.recipe.Solution;
import org.protolyte.substance.LookupException;
import org.protolyte.substance.Substance;
import org.protolyte.substance.SubstanceLibrary;
import org.protolyte.units.Dimension;
import org.protolyte.units.Quantity;
import org.protolyte.substance.AtomicWeights;

import tools.jackson.databind.node.JsonNodeFactory;

/**
 * Compares a batch record with its master and with chemistry. The batch as recorded is built as a formulation of
 * its own (every addition in mmol after the certificate corrections, per batch), and the engine predicts each
 * measurement from the additions made up to its step. For a q.s. recipe the meter sets the pH after the titrant, so
 * that pH is the goal of a q.s. computed from the recorded weighings, and the titrant volume is what is compared.
 * Where a prediction misses a measurement, the usual mistakes are tried: another form of a weighed substance, one
 * amount ten times too much or too little, an addition left out, a titrant or stock at another strength.
 *
 * <p>Longer than the project's ~400 lines: the record as made, its forecasts and the mistakes tried all work on the
 * same resolved additions and scenarios. Cut into parts (the comparison of additions, the forecasts, the diagnosis)
 * it would pass those between classes; that cut is worth making when the batch rules next grow.
 */
public final class BatchAnalyzer {

    /** Below these differences nothing needs explaining; a rule's own limits are larger (defaults 0.1, 10 %, 3 %). */
    private static final double QUIET_PH = 0.02;
    private static final double QUIET_RELATIVE = 0.01;
    /** Osmolality is reported at this temperature where the record gives none (freezing-point osmometers). */
    private static final double OSMOLALITY_KELVIN = 298.15;

    private final SubstanceLibrary library;
    private final RecipeResolver resolver;
    private final Analyzer analyzer;

    public BatchAnalyzer(SubstanceLibrary library, Analyzer analyzer) {
        this.library = library;
        this.resolver = new RecipeResolver(library);
        this.analyzer = analyzer;
    }

    /** An addition as the chemistry sees it: the form, the moles in the batch, and a titrant's stock (NaN: none). */
    record Made(BatchRecord.Addition recorded, Substance substance, double moles, boolean titrant, double molarity) {
        Made with(Substance other, double newMoles) {
            return new Made(recorded, other, newMoles, titrant, molarity);
        }

        /** A titrant taken from a stated stock: the q.s., whose volume is what is compared. */
        boolean stocked() {
            return titrant && molarity > 0;
        }
    }

    public BatchAnalysis analyze(BatchRecord r) {
        Recipe master = resolver.resolve(r.master());
        double scale = r.batchSize() / r.master().basis().amount();
        List<Made> made = made(r, master);
        List<BatchAnalysis.AdditionCheck> checks = compare(master, made, scale);
        List<Caveat> caveats = new ArrayList<>();
        Plan plan = plan(r, made, false);
        Predicted[] recorded = predict(r, master, made, plan, 1);
        // a goal means a q.s.: the titrant volume is the plan's last observation
        Optional<String> noQs = plan.goal.isPresent() ? recorded[recorded.length - 1].unpredicted() : Optional.empty();
        if (noQs.isPresent()) {
            // the reading the q.s. aimed at is still a result: judge it against the pH the recorded additions give
            plan = plan(r, made, true);
            recorded = predict(r, master, made, plan, 1);
            caveats.add(Caveat.warning("batch-titrant-not-compared", "the titrant volume is not compared: "
                    + noQs.get() + "; the pH read at step " + plan.goal.get().step() + " (" + plan.goal.get().pointer()
                    + ") is compared with the pH the recorded additions, titrant included, give instead"));
        }
        List<BatchAnalysis.Observation> observations = new ArrayList<>();
        for (int i = 0; i < plan.observations.size(); i++) {
            BatchAnalysis.Observation o = plan.observations.get(i);
            observations.add(new BatchAnalysis.Observation(o.kind(), o.label(), o.measured(), recorded[i].value(),
                    o.pointer(), recorded[i].unpredicted(),
                    i < plan.measured.size() ? bufferCapacity(r, master, made, plan.measured.get(i)) : Double.NaN));
        }
        List<BatchAnalysis.Candidate> candidates = new ArrayList<>();
        if (observations.stream().anyMatch(BatchAnalyzer::unexplained)) {
            candidates.add(new BatchAnalysis.Candidate("as recorded", values(recorded), further(r, master, made, plan, 1),
                    unpredicted(recorded)));
            for (Scenario s : scenarios(made, master)) {
                Predicted[] p = predict(r, master, s.made(), plan, s.titrantFactor());
                candidates.add(new BatchAnalysis.Candidate(s.cause(), values(p), further(r, master, s.made(), plan,
                        s.titrantFactor()), unpredicted(p)));
            }
        }
        Optional<FormulationAnalysis> asMade = asMade(r, master, made, caveats);
        return new BatchAnalysis(r, master, scale, checks, observations, candidates, specifiedPh(r, master, made),
                asMade, caveats);
    }

    private static boolean unexplained(BatchAnalysis.Observation o) {
        if (Double.isNaN(o.predicted())) {
            return false;
        }
        double d = Math.abs(o.predicted() - o.measured());
        return o.kind() == BatchAnalysis.Observation.Kind.PH ? d > QUIET_PH : d > QUIET_RELATIVE * Math.abs(o.measured());
    }

    /** Each addition resolved to its form and moles, the certificate corrections applied. */
    private List<Made> made(BatchRecord r, Recipe master) {
        List<Problem> problems = new ArrayList<>();
        List<Made> out = new ArrayList<>();
        for (BatchRecord.Addition a : r.additions()) {
            Substance s;
            try {
                s = library.lookup(a.substance());
            } catch (LookupException e) {
                problems.add(r.document().problem(a.pointer() + "/substance", e.getMessage()));
                continue;
            }
            boolean titrant = master.titrants().stream().anyMatch(t -> t.substance().equals(s));
            double moles;
            if (a.amount().dimension() == Dimension.VOLUME) {
                moles = a.amount().base() * a.stockMolarity().orElseThrow();
            } else if (a.amount().dimension() == Dimension.AMOUNT) {
                moles = a.amount().base();
            } else if (s.molarMass().isEmpty()) {
                problems.add(r.document().problem(a.pointer() + "/amount", "'" + s.name() + "' has no molar mass in "
                        + "the library; record it in mmol"));
                continue;
            } else {
                moles = corrected(a, s);
            }
            out.add(new Made(a, s, moles, titrant, a.stockMolarity().orElse(Double.NaN)));
        }
        if (!problems.isEmpty()) {
            throw new DocumentException(problems);
        }
        return out;
    }

    /**
     * Moles of the named form in a weighed mass. As is, with an assay on the dried substance:
     * n = m (1 − w) A / M_anhydrous, w the recorded water (a hydrate's nominal water where none is recorded, which with
     * no assay either is n = m / M); with an assay as is: n = m A / M; weighed at 100 %: n = m / M; weighed as
     * anhydrous: n = m / M_anhydrous.
     */
    static double corrected(BatchRecord.Addition a, Substance s) {
        double m = a.amount().base();
        double molar = s.molarMass().getAsDouble();
        double anhydrous = molar - s.hydrationWater() * AtomicWeights.WATER;
        return switch (a.weighed()) {
            case PURE -> m / molar;
            case ANHYDROUS -> m / anhydrous;
            case AS_IS -> {
                double assay = a.assay().orElse(1);
                if (a.assayAsIs()) {
                    yield m * assay / molar;
                }
                double w = a.water().orElse(s.hydrationWater() * AtomicWeights.WATER / molar);
                yield m * (1 - w) * assay / anhydrous;
            }
        };
    }

    /** Each master line with its additions: the same form, another form of it, missing; and additions it lacks. */
    private List<BatchAnalysis.AdditionCheck> compare(Recipe master, List<Made> made, double scale) {
        Solution nominal = master.solution(Map.of());
        List<BatchAnalysis.AdditionCheck> out = new ArrayList<>();
        List<Made> left = new ArrayList<>(made);
        for (Ingredient ing : master.ingredients()) {
            Substance want = ing.substance();
            if (ing.kind() == Ingredient.Kind.TITRANT) {
                List<Made> used = left.stream().filter(x -> x.titrant() && x.substance().equals(want))
                        .toList();
                left.removeAll(used);
                double moles = used.stream().mapToDouble(Made::moles).sum();
                out.add(new BatchAnalysis.AdditionCheck(BatchAnalysis.Match.TITRANT, Optional.of(ing.line()),
                        used.stream().findFirst().map(Made::recorded), Optional.of(want), Optional.of(want), Double.NaN,
                        moles, ing.line().tolerance()));
                continue;
            }
            double expected = nominal.moles().getOrDefault(ing, 0.0) * scale;
            List<Made> same = left.stream().filter(x -> x.substance().equals(want)).toList();
            BatchAnalysis.Match match = BatchAnalysis.Match.SAME;
            if (same.isEmpty()) {
                List<Substance> siblings = library.siblings(want);
                same = left.stream().filter(x -> siblings.stream().anyMatch(s -> s.equals(x.substance())))
                        .limit(1).toList();
                match = same.isEmpty() ? BatchAnalysis.Match.MISSING : BatchAnalysis.Match.OTHER_FORM;
            }
            left.removeAll(same);
            double actual = same.stream().mapToDouble(Made::moles).sum();
            out.add(new BatchAnalysis.AdditionCheck(match, Optional.of(ing.line()),
                    same.stream().findFirst().map(Made::recorded), Optional.of(want),
                    same.stream().findFirst().map(Made::substance), expected, same.isEmpty() ? 0 : actual,
                    ing.line().tolerance()));
        }
        for (Made x : left) {
            out.add(new BatchAnalysis.AdditionCheck(BatchAnalysis.Match.EXTRA, Optional.empty(), Optional.of(x.recorded()),
                    Optional.empty(), Optional.of(x.substance()), Double.NaN, x.moles(), Optional.empty()));
        }
        return out;
    }

    /** Which measurements are compared, and the pH that sets the titrant (the first pH read at or after it). */
    private record Plan(List<BatchAnalysis.Observation> observations, List<BatchRecord.Measurement> measured,
                        int titrantStep, Optional<BatchRecord.Measurement> goal) {
    }

    /**
     * {@code forward}: the q.s. cannot be predicted, so the pH it aimed at is compared as an ordinary reading (from the
     * recorded titrant amount) and the titrant volume is not.
     */
    private Plan plan(BatchRecord r, List<Made> made, boolean forward) {
        // a titrant counts as the q.s. only where it was taken from a stated stock (its volume is what is compared)
        int titrantStep = made.stream().filter(Made::stocked).mapToInt(x -> x.recorded().step())
                .min().orElse(Integer.MAX_VALUE);
        boolean qs = titrantStep != Integer.MAX_VALUE;     // a stocked titrant is one of the master's titrants
        Optional<BatchRecord.Measurement> goal = qs ? r.measurements().stream()
                .filter(m -> m.kind() == BatchRecord.Measurement.Kind.PH && m.step() >= titrantStep)
                .min(java.util.Comparator.comparingInt(BatchRecord.Measurement::step)) : Optional.empty();
        List<BatchAnalysis.Observation> obs = new ArrayList<>();
        List<BatchRecord.Measurement> measured = new ArrayList<>();
        for (BatchRecord.Measurement m : r.measurements()) {
            if (!forward && goal.isPresent() && goal.get() == m) {
                continue;
            }
            String label = m.kind() == BatchRecord.Measurement.Kind.PH
                    ? String.format(Locale.ROOT, "pH at step %d (%.1f °C)", m.step(),
                    m.kelvin().getAsDouble() - Thermo.KELVIN_OFFSET)
                    : String.format(Locale.ROOT, "osmolality at step %d", m.step());
            obs.add(new BatchAnalysis.Observation(m.kind() == BatchRecord.Measurement.Kind.PH
                    ? BatchAnalysis.Observation.Kind.PH : BatchAnalysis.Observation.Kind.OSMOLALITY, label, m.value(),
                    Double.NaN, m.pointer(), Optional.empty()));
            measured.add(m);
        }
        if (qs && !forward) {
            Made first = made.stream().filter(Made::stocked).findFirst().orElseThrow();
            double ml = made.stream().filter(x -> x.stocked() && x.substance().equals(first.substance()))
                    .mapToDouble(x -> x.moles() / x.molarity() * 1000).sum();
            obs.add(new BatchAnalysis.Observation(BatchAnalysis.Observation.Kind.TITRANT,
                    "mL of " + first.substance().name() + " " + molarityText(first.molarity()), ml, Double.NaN,
                    first.recorded().pointer() + "/amount", Optional.empty()));
        }
        return new Plan(obs, measured, titrantStep, goal);
    }

    /** A scenario of the usual mistakes: its additions and the true strength of the titrant over the recorded one. */
    private record Scenario(String cause, List<Made> made, double titrantFactor) {
    }

    private List<Scenario> scenarios(List<Made> made, Recipe master) {
        List<Scenario> out = new ArrayList<>();
        for (int i = 0; i < made.size(); i++) {
            Made x = made.get(i);
            String at = " (step " + x.recorded().step() + ")";
            boolean weighed = x.recorded().amount().dimension() == Dimension.MASS;
            if (weighed) {
                for (Substance other : library.siblings(x.substance())) {
                    if (other.molarMass().isEmpty()) {
                        continue;
                    }
                    double moles = x.recorded().amount().base() / other.molarMass().getAsDouble();
                    out.add(new Scenario(other.name() + " weighed in place of " + x.substance().name() + at,
                            replace(made, i, x.with(other, moles)), 1));
                }
            }
            if (x.titrant()) {
                continue;       // a titrant's amount is the meter's; its strength is tried below
            }
            String what = weighed ? x.substance().name() + " weighed " : "the " + x.substance().name() + " stock ";
            out.add(new Scenario(what + (weighed ? "ten times too much" : "at ten times its stated strength") + at,
                    replace(made, i, x.with(x.substance(), 10 * x.moles())), 1));
            out.add(new Scenario(what + (weighed ? "a tenth of what was recorded" : "at a tenth of its stated strength")
                    + at, replace(made, i, x.with(x.substance(), 0.1 * x.moles())), 1));
            List<Made> without = new ArrayList<>(made);
            without.remove(i);
            out.add(new Scenario(x.substance().name() + " left out" + at, without, 1));
        }
        made.stream().filter(Made::stocked).findFirst().ifPresent(t -> {
            for (double f : new double[] {10, 2, 0.5, 0.1}) {
                out.add(new Scenario(String.format(Locale.ROOT, "the %s stock at %s, not the %s recorded",
                        t.substance().name(), molarityText(t.molarity() * f), molarityText(t.molarity())), made, f));
            }
        });
        return out;
    }

    private static List<Made> replace(List<Made> made, int i, Made with) {
        List<Made> out = new ArrayList<>(made);
        out.set(i, with);
        return out;
    }

    /** A pH reading's predicted buffer capacity as recorded, mmol/kg of water per pH; NaN for another measurement. */
    private double bufferCapacity(BatchRecord r, Recipe master, List<Made> made, BatchRecord.Measurement m) {
        if (m.kind() != BatchRecord.Measurement.Kind.PH || m.kelvin().isEmpty()) {
            return Double.NaN;
        }
        return state(r, master, upTo(made, m.step()), m.atVolume(), m.kelvin().getAsDouble(), 1)
                .map(x -> x.bufferCapacity() * 1000).value();
    }

    /** A predicted value, or why the engine cannot give one. */
    private record Predicted(double value, Optional<String> unpredicted) {
        static Predicted of(double value) {
            return new Predicted(value, Optional.empty());
        }

        static Predicted none(String why) {
            return new Predicted(Double.NaN, Optional.of(why));
        }
    }

    /** An equilibrium, or why the engine cannot stand behind one. */
    private record Outcome(Optional<EquilibriumState> state, String unsolved) {
        Predicted map(java.util.function.ToDoubleFunction<EquilibriumState> f) {
            return state.map(s -> Predicted.of(f.applyAsDouble(s))).orElseGet(() -> Predicted.none(unsolved));
        }
    }

    /** The prediction of each observation of the plan under a scenario, or why there is none. */
    private Predicted[] predict(BatchRecord r, Recipe master, List<Made> made, Plan plan, double titrantFactor) {
        Predicted[] out = new Predicted[plan.observations.size()];
        for (int i = 0; i < plan.measured.size(); i++) {
            BatchRecord.Measurement m = plan.measured.get(i);
            double kelvin = m.kelvin().orElse(OSMOLALITY_KELVIN);
            Outcome s = state(r, master, upTo(made, m.step()), m.atVolume(), kelvin, titrantFactor);
            out[i] = s.map(x -> m.kind() == BatchRecord.Measurement.Kind.PH ? x.pH() : x.osmolality() * 1000);
        }
        if (out.length > plan.measured.size()) {
            out[out.length - 1] = titrantVolume(r, master, made, plan, titrantFactor);
        }
        return out;
    }

    private static double[] values(Predicted[] p) {
        return java.util.Arrays.stream(p).mapToDouble(Predicted::value).toArray();
    }

    private static Optional<String> unpredicted(Predicted[] p) {
        return java.util.Arrays.stream(p).map(Predicted::unpredicted).flatMap(Optional::stream).findFirst();
    }

    /** Predictions of the measurements the record lacks that would tell candidates apart. */
    private List<BatchAnalysis.Further> further(BatchRecord r, Recipe master, List<Made> made, Plan plan,
                                                double titrantFactor) {
        List<BatchAnalysis.Further> out = new ArrayList<>();
        boolean osmolality = r.measurements().stream().anyMatch(m -> m.kind() == BatchRecord.Measurement.Kind.OSMOLALITY);
        if (!osmolality) {
            out.add(new BatchAnalysis.Further(BatchAnalysis.Observation.Kind.OSMOLALITY, "osmolality of the batch",
                    optional(state(r, master, made, 1, OSMOLALITY_KELVIN, titrantFactor).map(s -> s.osmolality() * 1000))));
        }
        if (plan.goal.isPresent() && r.measurements().stream().noneMatch(m -> m.kind() == BatchRecord.Measurement.Kind.PH
                && m.step() < plan.titrantStep)) {
            BatchRecord.Measurement g = plan.goal.get();
            out.add(new BatchAnalysis.Further(BatchAnalysis.Observation.Kind.PH, String.format(Locale.ROOT,
                    "pH before the titrant (%.1f °C)", g.kelvin().getAsDouble() - Thermo.KELVIN_OFFSET),
                    optional(state(r, master, upTo(made, plan.titrantStep - 1), g.atVolume(), g.kelvin().getAsDouble(),
                            titrantFactor).map(EquilibriumState::pH))));
        }
        return out;
    }

    /** A further measurement only tells candidates apart where it can be predicted; one that cannot is left blank. */
    private static OptionalDouble optional(Predicted x) {
        return x.unpredicted().isPresent() ? OptionalDouble.empty() : OptionalDouble.of(x.value());
    }

    private static List<Made> upTo(List<Made> made, int step) {
        return made.stream().filter(x -> x.recorded().step() <= step).toList();
    }

    /** The equilibrium of some additions at a fraction of the batch volume and a temperature. */
    private Outcome state(BatchRecord r, Recipe master, List<Made> made, double atVolume, double kelvin,
                          double titrantFactor) {
        if (made.isEmpty()) {
            return new Outcome(Optional.empty(), "no addition is recorded by then");
        }
        try {
            Recipe recipe = recipe(r, master, made, atVolume, conditions(List.of("c0"), List.of(kelvin)),
                    titrantFactor, Optional.empty());
            Analyzer.Forecast f = analyzer.forecast(recipe);
            return new Outcome(f.states().get(0), reasons(f.caveats()));
        } catch (DocumentException | RecipeConflict e) {
            return new Outcome(Optional.empty(), problems(e));
        }
    }

    private static String reasons(List<Caveat> caveats) {
        return caveats.isEmpty() ? "the engine gives no determinate result"
                : String.join("; ", caveats.stream().map(Caveat::message).toList());
    }

    private static String problems(RuntimeException e) {
        return "the batch cannot be computed: " + (e instanceof DocumentException d
                ? String.join("; ", d.problems().stream().map(Problem::message).toList()) : e.getMessage());
    }

    /**
     * mL of the recorded titrant stock the recorded weighings need for the meter to read the goal pH: a q.s. of the
     * master's titrant line at the true strength (recorded × factor), in volume of that stock.
     */
    private Predicted titrantVolume(BatchRecord r, Recipe master, List<Made> made, Plan plan, double factor) {
        // called for a q.s. only, which every scenario keeps (a stocked titrant is neither weighed nor left out)
        Made titrant = made.stream().filter(Made::stocked).findFirst().orElseThrow();
        int goalStep = plan.goal.map(BatchRecord.Measurement::step).orElse(Integer.MAX_VALUE);
        List<Made> before = made.stream().filter(x -> !x.titrant() && x.recorded().step() <= goalStep).toList();
        double goalPH;
        double goalKelvin;
        double atVolume;
        String goal;
        if (plan.goal.isPresent()) {
            BatchRecord.Measurement g = plan.goal.get();
            goalPH = g.value();
            goalKelvin = g.kelvin().getAsDouble();
            atVolume = g.atVolume();
            goal = String.format(Locale.ROOT, "the pH %.2f read at step %d (%s)", goalPH, g.step(), g.pointer());
        } else {
            Formulation.Adjustment adj = master.titrants().get(0).line().adjustTo().orElseThrow();
            Optional<Formulation.PhTarget> target = master.formulation().pHTarget();
            if (adj.pH().isEmpty() && target.isEmpty()) {
                return Predicted.none("no pH was read after the titrant and the master states no pH to adjust to");
            }
            goalPH = adj.pH().isPresent() ? adj.pH().getAsDouble() : target.get().midpoint();
            goalKelvin = adj.kelvin();
            atVolume = adj.atVolume();
            goal = String.format(Locale.ROOT, "the master's pH %.2f (no pH was read after the titrant)", goalPH);
        }
        if (before.isEmpty()) {
            return Predicted.none("no addition is recorded before the titrant");
        }
        String why = "the q.s. to " + goal + " cannot be predicted: ";
        try {
            Recipe recipe = recipe(r, master, before, 1, conditions(List.of("c0"), List.of(goalKelvin)), factor,
                    Optional.of(new Goal(titrant.substance(), titrant.molarity() * factor, goalPH, goalKelvin, atVolume)));
            Analyzer.Forecast f = analyzer.forecast(recipe);
            for (Map.Entry<Ingredient, OptionalDouble> e : f.doses().entrySet()) {
                if (e.getKey().substance().equals(titrant.substance()) && e.getValue().isPresent()) {
                    return Predicted.of(e.getValue().getAsDouble() / (titrant.molarity() * factor) * 1000);
                }
            }
            return Predicted.none(why + reasons(f.caveats()));
        } catch (DocumentException | RecipeConflict e) {
            return Predicted.none(why + problems(e));
        }
    }

    /** A q.s. to write into the batch's own formulation. */
    private record Goal(Substance titrant, double molarity, double pH, double kelvin, double atVolume) {
    }

    private static List<Formulation.Condition> conditions(List<String> names, List<Double> kelvins) {
        List<Formulation.Condition> out = new ArrayList<>();
        for (int i = 0; i < names.size(); i++) {
            out.add(new Formulation.Condition(names.get(i), kelvins.get(i), false, "/conditions/" + i));
        }
        return out;
    }

    /**
     * The batch (or part of it) as a formulation of its own, built as objects: every addition in mmol, on the batch's
     * basis (at a fraction of its volume), at the given conditions; the titrant either as recorded (times the factor)
     * or, for a goal, as a q.s. Nothing a record says is written out as text and read again.
     */
    private Recipe recipe(BatchRecord r, Recipe master, List<Made> made, double atVolume,
                          List<Formulation.Condition> conditions, double titrantFactor, Optional<Goal> goal) {
        Formulation m = master.formulation();
        Map<String, Double> moles = new LinkedHashMap<>();
        for (Made x : made) {
            moles.merge(x.substance().name(), x.moles() * (x.titrant() ? titrantFactor : 1), Double::sum);
        }
        List<Formulation.Line> lines = new ArrayList<>();
        moles.forEach((name, n) -> {
            String p = "/components/" + lines.size();
            lines.add(new Formulation.Line(lines.size(), name, Optional.of(Quantity.of(n * 1000, "mmol")),
                    Optional.empty(), Optional.empty(), Optional.empty(), p, Optional.empty()));
        });
        goal.ifPresent(g -> {
            String p = "/components/" + lines.size();
            lines.add(new Formulation.Line(lines.size(), g.titrant().name(), Optional.empty(),
                    Optional.of(new Formulation.Stock(Quantity.of(g.molarity(), "mol/L"), Optional.empty(), p + "/stock")),
                    Optional.of(new Formulation.Adjustment(OptionalDouble.of(g.pH()), g.kelvin(), p + "/adjustTo",
                            g.atVolume())), Optional.empty(), p, Optional.empty()));
        });
        Formulation.Basis basis = m.basis().finalVolume()
                ? new Formulation.Basis(true, r.batchSize() * atVolume, "/basis/finalVolume")
                : new Formulation.Basis(false, r.batchSize(), "/basis/waterMass");
        SourceDocument doc = new SourceDocument(r.document().source() + " (as made)",
                JsonNodeFactory.instance.objectNode(), Map.of());
        Formulation f = new Formulation(doc, r.id() + " as made", Optional.of("batch " + r.batch() + " as made"),
                Optional.empty(), m.intendedUse(), basis, lines, Optional.empty(), conditions, Optional.empty(),
                Optional.empty(), Optional.empty(), List.of());
        return resolver.resolve(f);
    }

    /** The whole batch as recorded, analysed at the master's own conditions, for the report; a failure is a caveat. */
    private Optional<FormulationAnalysis> asMade(BatchRecord r, Recipe master, List<Made> made, List<Caveat> caveats) {
        List<Formulation.Condition> cs = master.formulation().conditions().stream().filter(c -> !c.implicit()).toList();
        try {
            Recipe recipe = recipe(r, master, made, 1, conditions(cs.stream().map(Formulation.Condition::name).toList(),
                    cs.stream().map(Formulation.Condition::kelvin).toList()), 1, Optional.empty());
            return Optional.of(analyzer.analyze(recipe));
        } catch (DocumentException | RecipeConflict e) {
            caveats.add(Caveat.warning("batch-as-made", "the batch as made cannot be shown at the master's conditions: "
                    + problems(e)));
            return Optional.empty();
        }
    }

    /**
     * Each pH reading of the finished batch with the master's pH target at its temperature. At another temperature
     * than the target's, the target moves with the batch: by the pH change the engine predicts for the additions as
     * recorded between the two temperatures (a reading at 25 °C of a target set at 20 °C is held to the target plus
     * that drift). Where the drift cannot be predicted, the reading cannot be judged and says why.
     */
    private List<BatchAnalysis.SpecifiedPh> specifiedPh(BatchRecord r, Recipe master, List<Made> made) {
        Optional<Formulation.PhTarget> target = master.formulation().pHTarget();
        List<BatchAnalysis.SpecifiedPh> out = new ArrayList<>();
        if (target.isEmpty()) {
            return out;
        }
        Formulation.PhTarget t = target.get();
        for (BatchRecord.Measurement m : r.measurements()) {
            if (m.kind() != BatchRecord.Measurement.Kind.PH || !r.ofFinishedBatch(m)) {
                continue;
            }
            double kelvin = m.kelvin().getAsDouble();
            String label = String.format(Locale.ROOT, "pH at step %d (%.1f °C)", m.step(), kelvin - Thermo.KELVIN_OFFSET);
            if (Formulation.sameTemperature(kelvin, t.kelvin())) {
                out.add(new BatchAnalysis.SpecifiedPh(label, m.value(), t.min(), t.max(), t.kelvin(), 0, m.pointer(),
                        Optional.empty()));
                continue;
            }
            List<Made> upTo = upTo(made, m.step());
            Predicted at = state(r, master, upTo, 1, kelvin, 1).map(EquilibriumState::pH);
            Predicted atTarget = state(r, master, upTo, 1, t.kelvin(), 1).map(EquilibriumState::pH);
            Optional<String> why = at.unpredicted().or(atTarget::unpredicted);
            double shift = why.isPresent() ? Double.NaN : at.value() - atTarget.value();
            out.add(new BatchAnalysis.SpecifiedPh(label, m.value(), t.min() + shift, t.max() + shift, t.kelvin(), shift,
                    m.pointer(), why.map(w -> String.format(Locale.ROOT, "the pH target (at %.1f °C) cannot be moved to "
                    + "the reading's temperature: %s", t.kelvin() - Thermo.KELVIN_OFFSET, w))));
        }
        return out;
    }

    static String molarityText(double molarity) {
        return String.format(Locale.ROOT, "%.3g mol/L", molarity);
    }
}
