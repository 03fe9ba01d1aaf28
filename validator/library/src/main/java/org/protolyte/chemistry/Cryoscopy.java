package org.protolyte.chemistry;

/**
 * Freezing point of an aqueous solution from its solute particle molality, ΔTf = Kf·Σm, with the
 * cryoscopic constant of water Kf = 1.86 K·kg/mol (CRC Handbook of Chemistry and Physics, "Cryoscopic
 * constants"; from memory) and the osmotic coefficient taken as 1, which overestimates the depression
 * of salt solutions by a few per cent (Robinson and Stokes give φ ≈ 0.93 for 0.15 mol/kg NaCl).
 */
public final class Cryoscopy {
    public static final double KF = 1.86;

    private Cryoscopy() {
    }

    public static double freezingPointKelvin(double particleMolality) {
        return Thermo.KELVIN_OFFSET - KF * particleMolality;
    }
}
