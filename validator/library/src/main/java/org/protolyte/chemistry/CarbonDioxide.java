package org.protolyte.chemistry;

/**
 * Dissolved CO2 in equilibrium with a gas phase (Henry's law). Hcp = 3.3e-4 mol/(m³·Pa) at 298.15 K with
 * d ln Hcp / d(1/T) = 2400 K: the recommended CO2 row of Sander's compilation (Atmos. Chem. Phys. 15 (2015)
 * 4399, and its online successor, read there). No salting-out correction: at I = 0.15 mol/kg it would lower
 * CO2(aq) by about 4 % (Setschenow coefficient near 0.11 kg/mol, derived from Harned and Davis's data; not read).
 */
public final class CarbonDioxide {

    /** The form of a system that Henry's law holds at a gas phase's partial pressure. */
    public static final String DISSOLVED = "CO2(aq)";

    /** mol/(m³·Pa) at 298.15 K. */
    public static final double HCP_25 = 3.3e-4;
    /** K, the van 't Hoff temperature dependence of Hcp. */
    public static final double HCP_TEMPERATURE_DEPENDENCE = 2400;

    private CarbonDioxide() {
    }

    /** Henry's solubility Hcp at a temperature, mol/(m³·Pa). */
    public static double henry(double kelvin) {
        return HCP_25 * Math.exp(HCP_TEMPERATURE_DEPENDENCE * (1 / kelvin - 1 / Thermo.T_REF));
    }

    /** Molality of CO2(aq), mol/kg water, at a CO2 partial pressure (Pa): c = Hcp·p, then per kg of water. */
    public static double dissolvedMolality(double kelvin, double partialPressurePa) {
        return henry(kelvin) * partialPressurePa / Water.density(kelvin);
    }
}
