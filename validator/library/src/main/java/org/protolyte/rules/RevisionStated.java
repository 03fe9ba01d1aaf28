package org.protolyte.rules;

import java.util.List;

import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.document.Formulation;

/** A controlled document states its revision: findings, reviews and waivers refer to one revision. */
public final class RevisionStated implements CheckKind {

    @Override
    public String id() {
        return "revision-stated";
    }

    @Override
    public String summary() {
        return "the document states its revision";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        Formulation f = a.recipe().formulation();
        return f.revision().isPresent() ? List.of()
                : List.of(rule.finding(f, "", "the document states no revision"));
    }
}
