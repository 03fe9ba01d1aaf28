package org.protolyte.analysis;

import java.util.List;
import java.util.OptionalDouble;

/**
 * The points behind a report's plots, all from the engine: a titration of the recipe without its q.s. titrants by
 * strong acid and base at the adjustment temperature (pH, β and the forms of the buffering systems at each point),
 * and the recipe as made, closed, from 0 to 50 °C (pH and each solid's saturation index).
 *
 * @param titrationKelvin     the adjustment temperature (the first used titrant's, else the make-up temperature)
 * @param titration           by added strong base (positive) or acid (negative), mmol per litre of solution
 * @param forms               "system: form" of each form whose fraction the titration points give, in order
 * @param qsAdded             where the q.s. titrants are strong: their dose as strong base (+) or acid (−), mmol/L
 * @param qsPH                the pH of the recipe as made at the adjustment temperature, where {@code qsAdded} is given
 * @param temperature         the recipe as made, closed, at 0 to 50 °C; a point without a pH has NaN
 * @param solids              the solids whose saturation index the temperature points give, in order
 * @param validFromKelvin     the range of temperatures common to the data of the buffering systems' constants
 */
public record Curves(double titrationKelvin, List<TitrationPoint> titration, List<String> forms, OptionalDouble qsAdded,
                     OptionalDouble qsPH, List<TemperaturePoint> temperature, List<String> solids,
                     double validFromKelvin, double validToKelvin) {

    public Curves {
        titration = List.copyOf(titration);
        forms = List.copyOf(forms);
        temperature = List.copyOf(temperature);
        solids = List.copyOf(solids);
    }

    /**
     * @param added            strong base (+) or acid (−), mmol per litre of solution
     * @param bufferCapacity   β = dC/dpH, the titration's own slope (the activity coefficients move with the added
     *                         ions; a condition's β holds them fixed, and differs from this by a few per cent where
     *                         the titration changes the ionic strength), mmol per litre of solution per pH unit
     * @param fractions        of each of {@link #forms}, of its system's total
     */
    public record TitrationPoint(double added, double pH, double bufferCapacity, List<Double> fractions) {
        public TitrationPoint {
            fractions = List.copyOf(fractions);
        }
    }

    /** @param saturationIndex of each of {@link #solids}; NaN where its ions are absent or the pH is unknown */
    public record TemperaturePoint(double kelvin, double pH, List<Double> saturationIndex) {
        public TemperaturePoint {
            saturationIndex = List.copyOf(saturationIndex);
        }
    }
}
