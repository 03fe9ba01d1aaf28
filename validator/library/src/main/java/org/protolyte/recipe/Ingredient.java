package org.protolyte.recipe;

import org.protolyte.document.Formulation;
import org.protolyte.substance.Substance;

/**
 * A resolved component line: moles per basis, or a molality (mol/kg water) where the recipe gives one,
 * or a titrant whose amount the analysis finds. {@code stockMolarity} (mol/L) is set where the line
 * names a stock.
 */
public record Ingredient(Formulation.Line line, Substance substance, Kind kind, double value,
                         double stockMolarity, double stockDensity) {

    public enum Kind { MOLES, MOLALITY, TITRANT }

    /** Equal ingredients share their line and amount; the deep hash of the line and substance is not needed. */
    @Override
    public int hashCode() {
        return 31 * line.index() + Double.hashCode(value);
    }

    public boolean hasStock() {
        return stockMolarity > 0;
    }
}
