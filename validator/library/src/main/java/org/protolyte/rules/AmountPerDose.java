package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.document.Formulation;
import org.protolyte.recipe.Ingredient;
import org.protolyte.recipe.Solution;
import org.protolyte.substance.Formula;
import org.protolyte.substance.LookupException;
import org.protolyte.substance.Substance;
import org.protolyte.units.Dimension;
import org.protolyte.units.Quantity;

/**
 * The amount of one substance, one acid–base system's total or one ion (every line that brings it, q.s. doses
 * included) in one dose, at most {@code maxPerDose}, and in a day's doses, at most {@code maxPerDay} (mmol or mg). The
 * document's {@code dose} gives the volume per administration and the doses per day; a limit the document gives no
 * dose for is not judged, so the document cannot pass.
 */
public final class AmountPerDose implements CheckKind {

    @Override
    public String id() {
        return "amount-per-dose";
    }

    @Override
    public String summary() {
        return "a component's or ion's amount per dose and per day is within the pack's limit";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        Formulation f = a.recipe().formulation();
        Optional<String> ion = rule.text("ion");
        Optional<String> system = rule.text("system");
        Optional<Substance> substance = Optional.empty();
        if (ion.isEmpty() && system.isEmpty()) {
            try {
                substance = Optional.of(a.recipe().library().lookup(rule.text("substance").orElseThrow()));
            } catch (LookupException e) {
                // caught: the library does not hold the rule's substance, so no document can contain it: nothing to judge
                return List.of();
            }
        }
        String what = ion.or(() -> system.map(s -> "total " + s)).orElseGet(() -> rule.text("substance").orElseThrow());
        Solution s = a.solution();
        double moles = 0;
        double grams = 0;
        Ingredient first = null;
        for (Ingredient ing : a.recipe().ingredients()) {
            Substance sub = ing.substance();
            double count = ion.isPresent() ? sub.composition().ions().getOrDefault(ion.get(), 0.0)
                    : system.isPresent() ? sub.composition().systems().stream()
                    .filter(p -> p.system().equals(system.get())).mapToDouble(p -> p.count()).sum()
                    : sub.name().equals(substance.orElseThrow().name()) ? 1 : 0;
            double n = s.moles().getOrDefault(ing, 0.0) * count;
            if (n > 0) {
                moles += n;
                grams += n * (ion.isPresent() ? ionMolarMass(ion.get()) : sub.molarMass().orElse(Double.NaN));
                first = first == null ? ing : first;
            }
        }
        if (first == null) {
            return List.of();
        }
        double perBasis = 1 / s.volumeLitres(a.recipe().makeUpKelvin());   // per litre of solution
        List<Finding> out = new ArrayList<>();
        for (String limit : List.of("maxPerDose", "maxPerDay")) {
            Optional<String> text = rule.text(limit);
            if (text.isEmpty()) {
                continue;
            }
            boolean perDay = limit.equals("maxPerDay");
            if (f.doseLitres().isEmpty() || perDay && f.dosesPerDay().isEmpty()) {
                throw new NotJudged("rule " + rule.id() + " (pack " + rule.pack() + ") limits " + what + " per "
                        + (perDay ? "day" : "dose") + ", and the document does not state " + (perDay
                        ? "its dose volume and doses per day (dose.volume, dose.perDay)" : "its dose volume (dose.volume)"));
            }
            Quantity max = Quantity.parse(text.get()).require(limit, Dimension.AMOUNT, Dimension.MASS);
            boolean mass = max.dimension() == Dimension.MASS;
            double litres = f.doseLitres().get() * (perDay ? f.dosesPerDay().get() : 1);
            double value = (mass ? grams : moles) * perBasis * litres;
            if (Double.isNaN(value)) {
                throw new NotJudged("rule " + rule.id() + " (pack " + rule.pack() + ") limits the mass of " + what
                        + ", whose molar mass the library does not give; state the limit in mmol");
            }
            if (value > max.base()) {
                out.add(rule.finding(f, first.line().pointer(), String.format(Locale.ROOT,
                        "%s is %s per %s (%s mL%s); limit %s", what, mass ? String.format(Locale.ROOT, "%.3g mg",
                        value * 1000) : String.format(Locale.ROOT, "%.3g mmol", value * 1000), perDay ? "day" : "dose",
                        new java.math.BigDecimal(String.format(Locale.ROOT, "%.4g", litres * 1000)).stripTrailingZeros()
                        .toPlainString(), perDay ? String.format(Locale.ROOT, ", %s doses", fmt(f.dosesPerDay().get()))
                        : "", max)));
            }
        }
        return out;
    }

    private static String fmt(double x) {
        return x == Math.rint(x) ? String.valueOf((long) x) : String.valueOf(x);
    }

    /** g/mol of an ion from its name ("Na+", "HPO4-2"), with the IUPAC atomic weights; NaN where it is no formula. */
    static double ionMolarMass(String ion) {
        try {
            return Formula.parse(ion.replaceAll("[+-][0-9]*$", "")).molarMass();
        } catch (IllegalArgumentException e) {
            // caught: a name that is no formula has no mass; the caller refuses a mass limit for it
            return Double.NaN;
        }
    }
}
