package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.protolyte.analysis.BufferContribution;
import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.analysis.TitrantResult;

/**
 * The q.s. amount makes sense for the buffer as written. Titrating a weak base or acid to near its pKa
 * takes a good fraction of an equivalent; more than {@code maxEquivalents} means the titrant, not the
 * buffer, sets the pH, and close to a whole equivalent means the recipe converts the buffer into another
 * salt form that could be weighed instead (Tris + 1 eq HCl is Tris-HCl).
 */
public final class TitrantPlausible implements CheckKind {

    @Override
    public String id() {
        return "titrant-plausible";
    }

    @Override
    public String summary() {
        return "the q.s. amount is plausible for the buffer form as written";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        double max = rule.number("maxEquivalents", 1.0);
        double nearFull = rule.number("nearFullEquivalent", 0.9);
        List<Finding> out = new ArrayList<>();
        Optional<BufferContribution> buffer = a.conditions().stream().filter(ConditionResult::determinate)
                .findFirst().flatMap(ConditionResult::mainBuffer);
        if (buffer.isEmpty()) {
            return out;
        }
        BufferContribution b = buffer.get();
        for (TitrantResult t : a.titrants()) {
            if (!t.used() || t.unreachable().isPresent() || t.moles() <= 0) {
                continue;
            }
            double eq = t.moles() / b.molesPerBasis();
            String pointer = t.ingredient().line().pointer() + "/adjustTo";
            String head = String.format(Locale.ROOT, "q.s. %s is %.3g mmol, %.2f equivalents of the %s buffer "
                    + "(%.3g mmol)", t.ingredient().substance().name(), t.moles() * 1000, eq, b.system(),
                    b.molesPerBasis() * 1000);
            if (eq > max) {
                out.add(rule.finding(a.recipe().formulation(), pointer, head + String.format(Locale.ROOT,
                        ": more than the %.2f equivalents the buffer can take up, so excess titrant sets the pH", max)));
            } else if (eq >= nearFull) {
                out.add(rule.finding(a.recipe().formulation(), pointer, head + ": nearly a whole equivalent, which "
                        + "converts the buffer into another salt form; check that the intended form was written"));
            }
        }
        return out;
    }
}
