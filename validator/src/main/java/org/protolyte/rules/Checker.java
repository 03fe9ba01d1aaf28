package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;

import org.protolyte.analysis.FormulationAnalysis;

/** Runs the checks on an analysis. Until rule packs exist, the built-in checks are the rules. */
public final class Checker {

    private final List<CheckKind> checks;

    public Checker(List<CheckKind> checks) {
        this.checks = List.copyOf(checks);
    }

    public static Checker builtIn() {
        return new Checker(List.of(new PhWithinTarget(), new TitrantReachesGoal(), new RevisionStated()));
    }

    public List<Finding> check(FormulationAnalysis analysis) {
        List<Finding> out = new ArrayList<>();
        for (CheckKind c : checks) {
            out.addAll(c.check(analysis));
        }
        return out;
    }
}
