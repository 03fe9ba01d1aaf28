package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;

import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.recipe.Ingredient;

/**
 * Components the library marks as light-sensitive or photoreactive. A component whose hazard needs a photosensitiser
 * (HEPES forms hydrogen peroxide under light only with riboflavin) is named only where the recipe holds one.
 */
public final class LightSensitive implements CheckKind {

    @Override
    public String id() {
        return "light-sensitive";
    }

    @Override
    public String summary() {
        return "light-sensitive or photoreactive components are named, so the medium is kept dark";
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        List<Ingredient> sensitisers = a.recipe().ingredients().stream()
                .filter(i -> i.substance().handling().lightSensitivity().map(l -> l.photosensitiser()).orElse(false))
                .toList();
        List<Finding> out = new ArrayList<>();
        for (Ingredient ing : a.recipe().ingredients()) {
            ing.substance().handling().lightSensitivity().ifPresent(l -> {
                if (l.withPhotosensitiser() && sensitisers.isEmpty()) {
                    return;
                }
                String with = l.withPhotosensitiser() ? "; the recipe holds the photosensitiser "
                        + String.join(", ", sensitisers.stream().map(i -> i.substance().name()).distinct().toList()) : "";
                out.add(rule.finding(a.recipe().formulation(), ing.line().pointer() + "/substance",
                        ing.substance().name() + ": " + l.text() + with + " (" + l.source() + ")"));
            });
        }
        return out;
    }
}
