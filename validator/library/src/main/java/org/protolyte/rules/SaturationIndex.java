package org.protolyte.rules;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.chemistry.SolidPhase;

/**
 * No solid phase supersaturated beyond {@code maxIndex} (default 0) at any determinate condition: preparation,
 * storage and use alike, since a solid that forms at one temperature need not redissolve at another. One finding
 * per phase, at the condition of its highest index, naming every condition with its index, so a reader sees where the
 * solution is clear and where it is not.
 * {@code phases} restricts the check to the named phases.
 */
public final class SaturationIndex implements CheckKind {

    @Override
    public String id() {
        return "saturation-index";
    }

    @Override
    public String summary() {
        return "no solid phase is supersaturated at any condition";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        double limit = rule.number("maxIndex", 0);
        Optional<List<String>> only = rule.texts("phases");
        Map<SolidPhase, List<String>> byPhase = new LinkedHashMap<>();
        Map<SolidPhase, ConditionResult> worst = new LinkedHashMap<>();   // the condition of the highest index, if over
        Map<SolidPhase, Double> highest = new LinkedHashMap<>();
        for (ConditionResult c : a.conditions()) {
            if (!c.determinate()) {
                continue;
            }
            for (SolidPhase.Saturation s : c.saturation()) {
                SolidPhase phase = s.phase();
                if (only.isPresent() && !only.get().contains(phase.name())) {
                    continue;
                }
                byPhase.computeIfAbsent(phase, k -> new ArrayList<>()).add(String.format(Locale.ROOT,
                        "%s (%.0f °C) %+.2f%s", c.condition().name(), Conditions.celsius(c), s.index(),
                        s.inRange() ? "" : ", Ksp extrapolated beyond its data"));
                if (s.index() > limit && s.index() > highest.getOrDefault(phase, Double.NEGATIVE_INFINITY)) {
                    highest.put(phase, s.index());
                    worst.put(phase, c);
                }
            }
        }
        List<Finding> out = new ArrayList<>();
        for (Map.Entry<SolidPhase, ConditionResult> e : worst.entrySet()) {
            SolidPhase phase = e.getKey();
            out.add(rule.finding(a.recipe().formulation(), Conditions.pointer(e.getValue()), String.format(Locale.ROOT,
                    "%s (%s) can precipitate: its saturation index exceeds %.2f, most at %s (%.0f °C); by condition: %s",
                    phase.name(), phase.formula(), limit, e.getValue().condition().name(),
                    Conditions.celsius(e.getValue()), String.join("; ", byPhase.get(e.getKey())))));
        }
        return out;
    }
}
