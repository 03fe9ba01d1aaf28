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
 * @param setpointForTarget where adjustTo states its own pH: the setpoint that would have met the pH target
 * @param atVolume      fraction of the final volume at which the meter is read (1: at volume)
 * @param pHAfterMakingUp where adjusted at part volume: the pH at the adjustment temperature after making up
 * @param startPH       the pH before any titrant, at the goal's temperature and volume (NaN where not computed): with
 *                      the goal, the range the titrant crosses
 */
public record TitrantResult(Ingredient ingredient, Role role, double moles, boolean used,
                            OptionalDouble setpointPH, double adjustKelvin, double goalPH, double goalKelvin,
                            Optional<Unreachable> unreachable, OptionalDouble setpointForTarget, double atVolume,
                            OptionalDouble pHAfterMakingUp, double startPH) {

    public TitrantResult(Ingredient ingredient, Role role, double moles, boolean used, OptionalDouble setpointPH,
                         double adjustKelvin, double goalPH, double goalKelvin, Optional<Unreachable> unreachable) {
        this(ingredient, role, moles, used, setpointPH, adjustKelvin, goalPH, goalKelvin, unreachable,
                OptionalDouble.empty(), 1, OptionalDouble.empty(), Double.NaN);
    }

    public TitrantResult withStartPH(double pH) {
        return new TitrantResult(ingredient, role, moles, used, setpointPH, adjustKelvin, goalPH, goalKelvin,
                unreachable, setpointForTarget, atVolume, pHAfterMakingUp, pH);
    }

    public TitrantResult withSetpointForTarget(double pH) {
        return new TitrantResult(ingredient, role, moles, used, setpointPH, adjustKelvin, goalPH, goalKelvin,
                unreachable, OptionalDouble.of(pH), atVolume, pHAfterMakingUp, startPH);
    }

    /** Adjusted at a part volume: the fraction, and the pH at the adjustment temperature once made up. */
    public TitrantResult withMakingUp(double fraction, double pH) {
        return new TitrantResult(ingredient, role, moles, used, setpointPH, adjustKelvin, goalPH, goalKelvin,
                unreachable, setpointForTarget, fraction, OptionalDouble.of(pH), startPH);
    }

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
