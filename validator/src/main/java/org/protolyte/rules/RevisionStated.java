package org.protolyte.rules;

import java.util.List;
import java.util.Optional;

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
    public List<Finding> check(FormulationAnalysis a) {
        Formulation f = a.recipe().formulation();
        if (f.revision().isPresent()) {
            return List.of();
        }
        return List.of(new Finding(id(), Severity.NOTE, "the document states no revision; add \"revision\" so that "
                + "reviews and waivers can refer to the version they judged", Optional.of(""), f.document().locate("")));
    }
}
