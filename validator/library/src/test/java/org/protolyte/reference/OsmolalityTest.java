package org.protolyte.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.protolyte.chemistry.EquilibriumState;

/**
 * Osmolality from the equilibrium and the Davies osmotic coefficient (Gibbs–Duhem consistent with the activity
 * coefficients the pH uses), against published osmotic coefficients of single salts at 25 °C.
 */
class OsmolalityTest {

    /**
     * φ of NaCl and KCl from Robinson and Stokes, "Electrolyte Solutions" (2nd ed., 1959), Appendix 8.10, from
     * memory. Davies has no salt-specific parameter and gives one φ for every 1:1 salt: within 0.01 at 0.1 mol/kg,
     * and it runs high by up to 0.025 at 0.2 mol/kg, where the engine starts to warn (a salt-specific model is the
     * cure, not a looser tolerance elsewhere).
     */
    @ParameterizedTest(name = "{0} {1} mol/kg: φ {2}")
    @CsvSource({
            "sodium chloride, 0.1, 0.9324, 0.01",
            "potassium chloride, 0.1, 0.9266, 0.01",
            "sodium chloride, 0.2, 0.9245, 0.025",
            "potassium chloride, 0.2, 0.9130, 0.025"})
    void osmoticCoefficientOfASalt(String salt, double molality, double phi, double tolerance) {
        EquilibriumState s = ReferenceDocuments.solution().with(salt, molality).condition(25).state().orElseThrow();
        assertEquals(phi, s.osmolality() / (2 * molality), tolerance);
    }

    /** 9 g/L sodium chloride (0.154 mol/kg) is about 286 mOsm/kg by freezing point (common practice), φ ≈ 0.93. */
    @Test
    void normalSaline() {
        EquilibriumState s = ReferenceDocuments.solution().with("sodium chloride", 0.154).condition(25).state().orElseThrow();
        assertEquals(286, s.osmolality() * 1000, 4);
    }

    /**
     * A neutral solute counts once per mole, and a buffer counts its real particles: 0.05 mol/kg acetic acid with
     * 0.025 mol/kg NaOH is 0.025 mol/kg acetic acid, 0.025 acetate and 0.025 Na+ — 0.075 mol/kg of particles, not the
     * 0.1 a count of weighed moles would give (derived: the ions' φ correction at I = 0.025 is Davies's own).
     */
    @Test
    void aHalfNeutralisedBufferCountsItsRealParticles() {
        EquilibriumState s = ReferenceDocuments.solution().with("acetic acid", 0.05).with("sodium hydroxide", 0.025)
                .with("glucose anhydrous", 0.1).condition(25).state().orElseThrow();
        assertEquals(0.175, s.particleMolality(), 0.001);
        assertEquals(s.particleMolality(), s.osmolality(), 0.004);
    }

    /**
     * Above 0.3 mol/kg a saline solution's osmotic coefficient is Pitzer's: 1 mol/kg NaCl has φ = 0.935 (Pitzer,
     * Peiper and Busey, J. Phys. Chem. Ref. Data 13 (1984) 1, 25 °C, read in a reproduction, IDAES idaes-pse
     * pitzer_9.csv), 1870 mOsm/kg, where Davies would give about 2 % more.
     */
    @Test
    void aSalineConcentrateTakesPitzersOsmoticCoefficient() {
        var c = ReferenceDocuments.solution().with("sodium chloride", 1.0).condition(25);
        EquilibriumState s = c.state().orElseThrow();
        assertEquals(1870, s.osmolality() * 1000, 8);
        assertTrue(s.osmolalityModel().contains("Pitzer"), s.osmolalityModel());
    }

    /**
     * Osmolarity is osmolality times the mass of water in a litre of solution. That mass comes from the specific
     * volume of aqueous NaCl at 25 °C (CRC Handbook of Chemistry and Physics, "Volumetric properties of aqueous sodium
     * chloride solutions", after Rogers and Pitzer, J. Phys. Chem. Ref. Data 11 (1982) 15): 0.998834 cm³/g at
     * 0.100 mol/kg and 0.992832 cm³/g at 0.250 mol/kg. With M(NaCl) = 58.443 g/mol, a kilogram of water holds
     * (1000 + 58.443 m)·v cm³ of solution: 0.99535 kg of water per litre at 0.100 mol/kg, 0.99272 at 0.250. Normal
     * saline (9 g/L, 0.154 mol/kg) lies between, 0.99440 by linear interpolation in m. Without the factor the ratio
     * would be 1.
     */
    @ParameterizedTest(name = "{0} mol/kg NaCl at 25 °C: {1} kg of water per litre")
    @CsvSource({"0.100, 0.99535", "0.154, 0.99440", "0.250, 0.99272"})
    void osmolarityIsOsmolalityTimesTheWaterInALitre(double molality, double waterKgPerLitre) {
        var c = ReferenceDocuments.solution().with("sodium chloride", molality).condition(25);
        assertEquals(waterKgPerLitre, c.osmolarity() / c.state().orElseThrow().osmolality(), 0.0005);
    }
}
