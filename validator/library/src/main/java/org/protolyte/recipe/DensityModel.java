package org.protolyte.recipe;

import org.protolyte.substance.Substance;
import org.protolyte.chemistry.Water;
import org.protolyte.substance.AtomicWeights;

/**
 * Water mass of a solution made up to volume, from additive apparent molar volumes at infinite
 * dilution (Masson's rule at its limiting value; Millero, Chem. Rev. 71 (1971) 147):
 * <pre>
 *   V = m_w/ρw(T) + Σ n_i·φV_i     ⇒     m_w = ρw(T)·(V − Σ n_i·φV_i)
 * </pre>
 * φV_i is the library's apparentMolarVolume; where it has none, the anhydrous mass times a partial
 * specific volume of {@value #FALLBACK_SPECIFIC_VOLUME} cm³/g (common practice for sugars, amino acids and
 * organic buffers; it overstates the volume of inorganic salts, whose effect at buffer strength is below
 * 0.5 % of the water mass). The concentration dependence of φV and its change with temperature are neglected.
 */
public final class DensityModel {

    public static final double FALLBACK_SPECIFIC_VOLUME = 0.6;

    private DensityModel() {
    }

    /** cm³ per mole of the substance in solution (hydrate water counts as solvent). */
    public static double apparentMolarVolume(Substance s) {
        if (s.apparentMolarVolume().isPresent()) {
            return s.apparentMolarVolume().getAsDouble();
        }
        double anhydrous = s.molarMass().orElse(0) - s.hydrationWater() * AtomicWeights.WATER;
        return FALLBACK_SPECIFIC_VOLUME * Math.max(0, anhydrous);
    }

    public static boolean isEstimated(Substance s) {
        return s.apparentMolarVolume().isEmpty() && !s.solvent();
    }

    /** kg/L of pure water at the temperature. */
    public static double waterDensity(double kelvin) {
        return Water.density(kelvin) / 1000;
    }
}
