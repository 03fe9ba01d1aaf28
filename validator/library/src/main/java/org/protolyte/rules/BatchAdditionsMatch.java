package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.protolyte.batch.BatchAnalysis;
import org.protolyte.batch.BatchRecord;

/** Every master line has its addition, in the form the master names, and nothing else was added. */
public final class BatchAdditionsMatch implements BatchCheckKind {

    @Override
    public String id() {
        return "batch-additions-match";
    }

    @Override
    public String summary() {
        return "every master line was added, in the form the master names, and nothing else";
    }

    @Override
    public List<Finding> check(BatchAnalysis b, Rule rule) {
        List<Finding> out = new ArrayList<>();
        BatchRecord r = b.record();
        for (BatchAnalysis.AdditionCheck c : b.additions()) {
            switch (c.match()) {
                case MISSING -> out.add(rule.finding(r.document(), "/additions", String.format(Locale.ROOT,
                        "%s (master line %d) has no addition in the record", c.expected().orElseThrow().name(),
                        c.line().orElseThrow().index() + 1)));
                case EXTRA -> out.add(rule.finding(r.document(), c.addition().orElseThrow().pointer() + "/substance",
                        String.format(Locale.ROOT, "%s at step %d is not in master %s", c.used().orElseThrow().name(),
                                c.addition().orElseThrow().step(), r.master().id())));
                case OTHER_FORM -> out.add(rule.finding(r.document(), c.addition().orElseThrow().pointer() + "/substance",
                        String.format(Locale.ROOT, "step %d used %s where the master names %s; %s",
                                c.addition().orElseThrow().step(), c.used().orElseThrow().name(),
                                c.expected().orElseThrow().name(), Math.abs(c.deviation()) < 0.005
                                        ? "the amount was recalculated to the same moles"
                                        : String.format(Locale.ROOT, "that is %+.1f %% of the moles the master gives",
                                        100 * c.deviation()))));
                case TITRANT -> {
                    if (c.addition().isEmpty()) {
                        out.add(rule.finding(r.document(), "/additions", String.format(Locale.ROOT,
                                "the master's q.s. titrant %s has no recorded addition", c.expected().orElseThrow().name())));
                    }
                }
                default -> { }
            }
        }
        return out;
    }
}
