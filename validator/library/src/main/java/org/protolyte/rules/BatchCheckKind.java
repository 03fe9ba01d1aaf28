package org.protolyte.rules;

import java.util.List;

import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.batch.BatchAnalysis;

/**
 * A check kind that judges batch records: what was made against its master and against chemistry. It has no
 * findings on a formulation, and a batch record is judged by these kinds only (its master is judged on its own).
 */
public interface BatchCheckKind extends CheckKind {

    List<Finding> check(BatchAnalysis batch, Rule rule);

    /** With the other rules the record is judged by, for a kind that takes a limit from one of them. */
    default List<Finding> check(BatchAnalysis batch, Rule rule, List<Rule> selection) {
        return check(batch, rule);
    }

    @Override
    default List<Finding> check(FormulationAnalysis analysis, Rule rule) {
        return List.of();
    }
}
