package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.analysis.Robustness;

/**
 * The probability that a batch leaves the pH target, from the robustness study (batch-to-batch: weighing
 * tolerances and the meter reading), is at most {@code maxProbability}. Says nothing unless the run asked
 * for the study ({@code check --robustness N}).
 */
public final class BatchRisk implements CheckKind {

    @Override
    public String id() {
        return "batch-risk";
    }

    @Override
    public String summary() {
        return "the probability of a batch leaving the pH target is below the pack's limit";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        List<Finding> out = new ArrayList<>();
        if (a.robustness().isEmpty()) {
            return out;
        }
        double max = rule.number("maxProbability", 0.05);
        Robustness.Result r = a.robustness().get();
        for (Robustness.ConditionRobustness c : r.conditions()) {
            if (c.probabilityOutsideTarget().isPresent() && c.probabilityOutsideTarget().getAsDouble() > max) {
                String pointer = a.recipe().formulation().pHTarget().map(t -> t.pointer()).orElse("");
                String unsolved = r.samplesUnsolved() == 0 ? "" : String.format(Locale.ROOT, "; %d of them could not "
                        + "be solved and count as outside (%s)", r.samplesUnsolved(), r.unsolved().orElse("no reason given"));
                out.add(rule.finding(a.recipe().formulation(), pointer, String.format(Locale.ROOT,
                        "%.1f %% of simulated batches (%d, seed %d) leave the pH target at %s; limit %.1f %%; batch pH "
                                + "%.3f [%.3f–%.3f]%s", c.probabilityOutsideTarget().getAsDouble() * 100,
                        r.settings().samples(), r.settings().seed(), c.condition(), max * 100, c.pH().mean(),
                        c.pH().p025(), c.pH().p975(), unsolved)));
            }
        }
        return out;
    }
}
