package org.protolyte.analysis;

import org.protolyte.recipe.Ingredient;

/**
 * A recipe the analysis cannot take as written, named by the component whose adjustment is in conflict (two acids
 * adjusting, no pH to adjust to, an acid and a base with different adjustments). The analysis knows components, not
 * places in a document: the layer that reads documents turns this into a problem at the component's adjustTo.
 */
public final class RecipeConflict extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final transient Ingredient component;

    RecipeConflict(Ingredient component, String reason) {
        super(reason);
        this.component = component;
    }

    /** The component whose adjustment the conflict concerns. */
    public Ingredient component() {
        return component;
    }
}
