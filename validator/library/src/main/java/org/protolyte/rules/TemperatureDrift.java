package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.analysis.Drift;
import org.protolyte.analysis.FormulationAnalysis;

/**
 * The pH change from one condition to the others within {@code maxChange}: from the pack's {@code from}, else
 * "preparation", else the first condition (where the solution is made), to the pack's {@code to} or every other.
 * Names the system that causes most of it and its dpKa/dT.
 */
public final class TemperatureDrift implements CheckKind {

    @Override
    public String id() {
        return "temperature-drift";
    }

    @Override
    public String summary() {
        return "the pH moves no more than the pack's limit between preparation and the other conditions";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        double max = rule.number("maxChange", 0.1);
        List<String> names = a.recipe().formulation().conditions().stream().map(c -> c.name()).toList();
        if (names.isEmpty()) {
            return List.of();
        }
        String from = rule.text("from").orElse(names.contains("preparation") ? "preparation" : names.get(0));
        List<Finding> out = new ArrayList<>();
        for (Drift listed : a.drifts()) {
            // drifts are listed in document order: one that ends at the reference is read backwards
            Drift d = listed.to().equals(from) ? listed.reversed() : listed;
            boolean judged = d.from().equals(from) && rule.text("to").map(t -> t.equals(d.to())).orElse(true);
            if (!judged || d.co2Change().isPresent() || Math.abs(d.change()) <= max) {
                continue;
            }
            String pointer = a.recipe().formulation().conditions().stream().filter(c -> c.name().equals(d.to()))
                    .findFirst().map(c -> c.pointer()).orElse("");
            String cause = d.system().map(s -> String.format(Locale.ROOT, "; mostly %s, dpKa/dT %+.4f per K, %.0f %% of "
                    + "the buffering", s, d.dpKadT(), d.share() * 100)).orElse("; water's own ionisation");
            out.add(rule.finding(a.recipe().formulation(), pointer, String.format(Locale.ROOT,
                    "pH moves %+.2f from %s (%.0f °C) to %s (%.0f °C)%s%s", d.change(), d.from(),
                    d.fromCelsius(), d.to(), d.toCelsius(), Conditions.limit(",", max), cause)));
        }
        return out;
    }
}
