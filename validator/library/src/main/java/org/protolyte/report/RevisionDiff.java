package org.protolyte.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.analysis.TitrantResult;
import org.protolyte.chemistry.SpeciesAmount;
import org.protolyte.document.Formulation;
import org.protolyte.recipe.Ingredient;
import org.protolyte.rules.Finding;
import org.protolyte.rules.Severity;

/**
 * Two revisions of a formulation side by side, as a change-control reviewer reads them: components
 * added, removed or changed; predicted values that moved per condition; findings added, cleared or
 * changed in severity. Components are matched by their library substance, conditions by name,
 * findings by rule and by the component or condition they concern.
 */
public record RevisionDiff(DocumentReport before, DocumentReport after, List<ComponentChange> components,
                           List<ValueChange> values, List<SpeciesChange> species, List<FindingChange> findings,
                           Optional<String> basis) {

    public enum Kind { ADDED, REMOVED, CHANGED }

    /**
     * A species' share of its component moves by more than this between revisions (0.05: five percentage points, the
     * smallest share the report's speciation lists) before it is named: below it, a buffer's form has not changed.
     */
    public static final double SPECIES_MOVED = 0.05;

    /**
     * A species whose share of its component (of the acid–base system or metal it belongs to) moved at a condition by
     * more than {@link #SPECIES_MOVED}; 0 where the revision has none of it, NaN where its condition is indeterminate.
     */
    public record SpeciesChange(String where, String component, String species, double before, double after) {
    }

    /**
     * A component line; amounts in mmol per litre of solution (finalVolume) or per kg of water (waterMass), so that
     * different units and batch sizes compare: 8 g in 1 L and 4 g in 500 mL are the same recipe.
     */
    public record ComponentChange(Kind kind, String substance, Optional<String> was, Optional<String> now,
                                  double mmolBefore, double mmolAfter) {
    }

    /** A predicted quantity at a condition (or a titrant's q.s.), before and after; NaN where absent. */
    public record ValueChange(String where, String quantity, String unit, double before, double after) {
        public double delta() {
            return after - before;
        }
    }

    public record FindingChange(Kind kind, String rule, String subject, Optional<Severity> before,
                                Optional<Severity> after, String message) {
    }

    public RevisionDiff {
        components = List.copyOf(components);
        values = List.copyOf(values);
        species = List.copyOf(species);
        findings = List.copyOf(findings);
    }

    /** True when the new revision fails on a finding that the old one did not fail on. */
    public boolean newFailure(Severity failOn) {
        return findings.stream().anyMatch(f -> f.after().map(s -> s.compareTo(failOn) >= 0).orElse(false)
                && !f.before().map(s -> s.compareTo(failOn) >= 0).orElse(false));
    }

    public static RevisionDiff compare(DocumentReport before, DocumentReport after) {
        List<ComponentChange> components = new ArrayList<>();
        List<ValueChange> values = new ArrayList<>();
        List<SpeciesChange> species = new ArrayList<>();
        if (before.analysis().isPresent() && after.analysis().isPresent()) {
            FormulationAnalysis a = before.analysis().get();
            FormulationAnalysis b = after.analysis().get();
            components(a, b, components);
            values(a, b, values);
            species(a, b, species);
        }
        return new RevisionDiff(before, after, components, values, species, findings(before, after),
                basis(before, after));
    }

    /** The basis as a reader names it, where the two revisions differ in it. */
    private static Optional<String> basis(DocumentReport before, DocumentReport after) {
        if (before.analysis().isEmpty() || after.analysis().isEmpty()) {
            return Optional.empty();
        }
        Formulation.Basis x = before.analysis().get().recipe().formulation().basis();
        Formulation.Basis y = after.analysis().get().recipe().formulation().basis();
        if (x.finalVolume() == y.finalVolume() && Math.abs(x.amount() - y.amount()) <= 1e-12 * x.amount()) {
            return Optional.empty();
        }
        String change = x.finalVolume() == y.finalVolume() ? "batch size" : "basis";
        return Optional.of(change + " " + basisText(x) + " → " + basisText(y)
                + (x.finalVolume() == y.finalVolume() ? "; amounts compared per " + (x.finalVolume() ? "litre of solution"
                : "kg of water") : "; amounts compared per litre of solution and per kg of water are not alike: "
                + "check every amount"));
    }

    private static String basisText(Formulation.Basis b) {
        return b.finalVolume() ? Numbers.significant(b.amount(), 6).toPlainString() + " L final volume"
                : Numbers.significant(b.amount(), 6).toPlainString() + " kg of water";
    }

    private static Map<String, Ingredient> bySubstance(FormulationAnalysis a) {
        Map<String, Ingredient> out = new LinkedHashMap<>();
        for (Ingredient i : a.recipe().ingredients()) {
            out.putIfAbsent(i.substance().name(), i);
        }
        return out;
    }

    /** mmol per litre (finalVolume) or per kg of water (waterMass) of the basis. */
    private static double mmol(FormulationAnalysis a, Ingredient i) {
        return a.solution().moles().getOrDefault(i, 0.0) * 1000 / a.recipe().formulation().basis().amount();
    }

    private static Optional<String> written(Ingredient i) {
        return Optional.of(i.line().amount().map(Object::toString).orElse("q.s. (adjustTo)"));
    }

    private static void components(FormulationAnalysis a, FormulationAnalysis b, List<ComponentChange> out) {
        Map<String, Ingredient> old = bySubstance(a);
        Map<String, Ingredient> now = bySubstance(b);
        for (Map.Entry<String, Ingredient> e : old.entrySet()) {
            Ingredient n = now.get(e.getKey());
            if (n == null) {
                out.add(new ComponentChange(Kind.REMOVED, e.getKey(), written(e.getValue()), Optional.empty(),
                        mmol(a, e.getValue()), Double.NaN));
            } else {
                double x = mmol(a, e.getValue());
                double y = mmol(b, n);
                // the written amounts differ whenever the batch size does: compare concentrations, and the text only
                // for a q.s. line, whose amount is a prediction
                boolean sameText = e.getValue().kind() != Ingredient.Kind.TITRANT
                        || written(e.getValue()).equals(written(n));
                boolean titrant = e.getValue().kind() == Ingredient.Kind.TITRANT;   // its q.s. is a predicted value
                if (!sameText || !titrant && Math.abs(x - y) > 1e-9 * Math.max(1, Math.abs(x))) {
                    out.add(new ComponentChange(Kind.CHANGED, e.getKey(), written(e.getValue()), written(n), x, y));
                }
            }
        }
        for (Map.Entry<String, Ingredient> e : now.entrySet()) {
            if (!old.containsKey(e.getKey())) {
                out.add(new ComponentChange(Kind.ADDED, e.getKey(), Optional.empty(), written(e.getValue()),
                        Double.NaN, mmol(b, e.getValue())));
            }
        }
    }

    private static void values(FormulationAnalysis a, FormulationAnalysis b, List<ValueChange> out) {
        for (ConditionResult x : a.conditions()) {
            for (ConditionResult y : b.conditions()) {
                if (!x.condition().name().equals(y.condition().name())) {
                    continue;
                }
                String where = x.condition().name();
                add(out, where, "pH", "", pH(x), pH(y));
                add(out, where, "buffer capacity", "mmol/L per pH", beta(x), beta(y));
                add(out, where, "ionic strength", "mol/kg", ionic(x), ionic(y));
                add(out, where, "osmolality", "mOsm/kg", osmolality(x), osmolality(y));
            }
        }
        for (TitrantResult x : a.titrants()) {
            for (TitrantResult y : b.titrants()) {
                if (x.ingredient().substance().name().equals(y.ingredient().substance().name())) {
                    add(out, "q.s. " + x.ingredient().substance().name(), "amount", "mmol per L or kg of basis",
                            x.moles() * 1000 / a.recipe().formulation().basis().amount(),
                            y.moles() * 1000 / b.recipe().formulation().basis().amount());
                }
            }
        }
    }

    /** Per condition of both revisions, determinate in both, the species whose share moved beyond the threshold. */
    private static void species(FormulationAnalysis a, FormulationAnalysis b, List<SpeciesChange> out) {
        for (ConditionResult x : a.conditions()) {
            for (ConditionResult y : b.conditions()) {
                if (!x.condition().name().equals(y.condition().name()) || !x.determinate() || !y.determinate()) {
                    continue;
                }
                Map<String, double[]> shares = new LinkedHashMap<>();
                for (SpeciesAmount s : x.state().orElseThrow().species()) {
                    shares.computeIfAbsent(s.component().name() + "|" + s.species().name(), k -> new double[2])[0] =
                            s.fractionOfComponent();
                }
                for (SpeciesAmount s : y.state().orElseThrow().species()) {
                    shares.computeIfAbsent(s.component().name() + "|" + s.species().name(), k -> new double[2])[1] =
                            s.fractionOfComponent();
                }
                shares.forEach((k, v) -> {
                    if (Math.abs(v[1] - v[0]) > SPECIES_MOVED) {
                        out.add(new SpeciesChange(x.condition().name(), k.substring(0, k.indexOf('|')),
                                k.substring(k.indexOf('|') + 1), v[0], v[1]));
                    }
                });
            }
        }
    }

    private static void add(List<ValueChange> out, String where, String quantity, String unit, double x, double y) {
        boolean same = Double.isNaN(x) && Double.isNaN(y) || Math.abs(x - y) <= 1e-9 * Math.max(1, Math.abs(x));
        if (!same) {
            out.add(new ValueChange(where, quantity, unit, x, y));
        }
    }

    private static double pH(ConditionResult c) {
        return c.determinate() ? c.state().orElseThrow().pH() : Double.NaN;
    }

    private static double beta(ConditionResult c) {
        return c.determinate() ? c.bufferCapacityPerLitre() * 1000 : Double.NaN;
    }

    private static double osmolality(ConditionResult c) {
        return c.determinate() ? c.state().orElseThrow().osmolality() * 1000 : Double.NaN;
    }

    private static double ionic(ConditionResult c) {
        return c.determinate() ? c.state().orElseThrow().ionicStrength() : Double.NaN;
    }

    /** What a finding is about, stable across revisions: the component's substance, else its pointer. */
    private static String subject(DocumentReport r, Finding f) {
        String p = f.pointer().orElse("");
        if (p.startsWith("/components/") && r.analysis().isPresent()) {
            String[] parts = p.split("/");
            int index = Integer.parseInt(parts[2]);
            Formulation form = r.analysis().get().recipe().formulation();
            if (index < form.components().size()) {
                return form.components().get(index).substance();
            }
        }
        if (p.startsWith("/conditions/") && r.analysis().isPresent()) {
            int index = Integer.parseInt(p.split("/")[2]);
            List<Formulation.Condition> cs = r.analysis().get().recipe().formulation().conditions();
            if (index < cs.size()) {
                return "condition " + cs.get(index).name();
            }
        }
        return p.isEmpty() ? "(document)" : p;
    }

    private static List<FindingChange> findings(DocumentReport before, DocumentReport after) {
        Map<String, Finding> old = new LinkedHashMap<>();
        before.findings().stream().filter(Finding::active).forEach(f -> old.putIfAbsent(f.rule() + "|" + subject(before, f), f));
        Map<String, Finding> now = new LinkedHashMap<>();
        after.findings().stream().filter(Finding::active).forEach(f -> now.putIfAbsent(f.rule() + "|" + subject(after, f), f));
        List<FindingChange> out = new ArrayList<>();
        now.forEach((k, f) -> {
            Finding o = old.get(k);
            String subject = k.substring(k.indexOf('|') + 1);
            if (o == null) {
                out.add(new FindingChange(Kind.ADDED, f.rule(), subject, Optional.empty(), Optional.of(f.severity()),
                        f.message()));
            } else if (!Objects.equals(o.severity(), f.severity())) {
                out.add(new FindingChange(Kind.CHANGED, f.rule(), subject, Optional.of(o.severity()),
                        Optional.of(f.severity()), f.message()));
            }
        });
        old.forEach((k, f) -> {
            if (!now.containsKey(k)) {
                out.add(new FindingChange(Kind.REMOVED, f.rule(), k.substring(k.indexOf('|') + 1),
                        Optional.of(f.severity()), Optional.empty(), f.message()));
            }
        });
        return out;
    }
}
