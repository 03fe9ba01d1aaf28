package org.example.sitechecks;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.protolyte.spi.Analysis;
import org.protolyte.spi.CheckKind;
import org.protolyte.spi.Condition;
import org.protolyte.spi.Stateless;
import org.protolyte.spi.Violation;

/** A site's own check: the pH at a condition is known to within max (its standard uncertainty). */
@Stateless
public final class PhUncertaintyLimit implements CheckKind<PhUncertaintyLimit.Parameters> {

    /** The pack's parameters: the largest standard uncertainty, and the one condition judged (else every one). */
    public record Parameters(double max, Optional<String> condition) {
        public Parameters {
            if (!(max > 0)) {
                throw new IllegalArgumentException("max is a positive number of pH units, not " + max);
            }
        }
    }

    @Override
    public String id() {
        return "ph-uncertainty-limit";
    }

    @Override
    public String summary() {
        return "the calculated pH is known to within the pack's limit";
    }

    @Override
    public Class<Parameters> parameters() {
        return Parameters.class;
    }

    @Override
    public List<Violation> check(Analysis analysis, Parameters p) {
        List<Violation> out = new ArrayList<>();
        for (Condition c : analysis.conditions()) {
            boolean judged = p.condition().map(c.name()::equals).orElse(true);
            if (judged && c.determinate() && c.pHUncertainty().orElse(0) > p.max()) {
                out.add(new Violation(c.pointer(), String.format(java.util.Locale.ROOT,
                        "pH at %s is %.2f ± %.3f; limit ± %.3f", c.name(), c.pH().getAsDouble(),
                        c.pHUncertainty().getAsDouble(), p.max())));
            }
        }
        return out;
    }
}
