package org.protolyte.analysis;

import java.util.Optional;
import java.util.OptionalDouble;

import org.protolyte.recipe.Ingredient;

/**
 * The q.s. of one titrant line.
 *
 * @param moles         mol per basis (0 for the one of an acid/base pair that is not needed)
 * @param setpointPH    the pH the meter must read at the adjustment temperature
 * @param unreachable   why the goal cannot be met, with the pH the titrant can reach, if so
 */
public record TitrantResult(Ingredient ingredient, Role role, double moles, boolean used,
                            OptionalDouble setpointPH, double adjustKelvin, double goalPH, double goalKelvin,
                            Optional<Unreachable> unreachable) {

    public enum Role { ACID, BASE }

    /** The goal pH lies beyond what this titrant can do; {@code reachablePH} is the nearest it gets. */
    public record Unreachable(String reason, double reachablePH, double startPH) {
    }

    /** mL of stock per basis, where the line names a stock. */
    public OptionalDouble stockMillilitres() {
        return ingredient.hasStock() ? OptionalDouble.of(moles / ingredient.stockMolarity() * 1000)
                : OptionalDouble.empty();
    }
}
