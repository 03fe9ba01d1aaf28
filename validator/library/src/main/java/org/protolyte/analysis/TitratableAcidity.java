package org.protolyte.analysis;

import java.util.OptionalDouble;

/**
 * Strong base (positive) or acid (negative), in mmol, needed to bring one litre, and one dose where the
 * document gives a dose volume, to pH 7.4 at 37 °C (closed): what the body must neutralise.
 */
public record TitratableAcidity(double mmolPerLitre, OptionalDouble mmolPerDose) {
    public static final double PHYSIOLOGICAL_PH = 7.4;
    public static final double BODY_KELVIN = 310.15;
}
