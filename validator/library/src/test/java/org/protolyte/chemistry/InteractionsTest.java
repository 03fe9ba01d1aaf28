package org.protolyte.chemistry;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;

/**
 * Pitzer's composition terms for one problem ({@link Interactions}), on invented molalities, each expectation derived
 * beside it from the class's own definitions and from Harvie, Møller and Weare (1984) eqs. 1–9: which ions are
 * covered and how much of their surroundings, the uncertainty each ion gets, Davies for an ion without parameters,
 * and one pair's missing temperature terms moved to their bound.
 */
class InteractionsTest {

    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(new SchemaCatalog());
    private static final AcidBaseSystem PHOSPHATE = LIBRARY.system("phosphate").orElseThrow();
    private static final AcidBaseSystem TRIS = LIBRARY.system("Tris").orElseThrow();
    private static final AcidBaseSystem HEPES = LIBRARY.system("HEPES").orElseThrow();
    private static final Component NA = LIBRARY.ion("Na+").orElseThrow();
    private static final Component CL = LIBRARY.ion("Cl-").orElseThrow();

    /** Na+, Cl-, the phosphate, Tris and HEPES forms, at this temperature. */
    private static PreparedProblem problem(double kelvin) {
        List<Species> species = new ArrayList<>(PHOSPHATE.species());
        species.addAll(TRIS.species());
        species.addAll(HEPES.species());
        species.add(Species.free(NA));
        species.add(Species.free(CL));
        List<Component> components = List.of(PHOSPHATE.basis(), TRIS.basis(), HEPES.basis(), NA, CL);
        return new PreparedProblem(IonInteraction.INSTANCE, species, components, kelvin, Map.of(),
                s -> s.formation().log10K(kelvin), Water.pKw(kelvin));
    }

    private static int ion(PreparedProblem p, String name) {
        for (int i = 0; i < p.n; i++) {
            if (p.sp[i].name().equals(name)) {
                return p.interactions.speciesIon[i];
            }
        }
        throw new AssertionError(name);
    }

    /** Species molalities: the named ones, the rest 0. */
    private static double[] molalities(PreparedProblem p, Map<String, Double> m) {
        double[] out = new double[p.n];
        for (int i = 0; i < p.n; i++) {
            out[i] = m.getOrDefault(p.sp[i].name(), 0.0);
        }
        return out;
    }

    @Test
    void coverageIsTheShareOfTheOppositeChargeAnIonHasParametersWith() {
        PreparedProblem p = problem(298.15);
        Interactions x = p.interactions;
        double[] m = molalities(p, Map.of("Na+", 1.0, "TrisH+", 0.5, "HPO4-2", 0.25, "HEPES-", 0.2, "Cl-", 0.8));
        double[] ionM = new double[x.ions];
        x.ionMolalities(m, 0, 0, ionM);
        // HPO4-2 has parameters with Na+ (PM73 VI) but none with TrisH+: 1.0 of 1.5 equivalents
        assertEquals(1.0 / 1.5, x.coveredShare(ion(p, "HPO4-2"), ionM), 1e-15);
        // Cl- has both (PM73 I; GT17)
        assertEquals(1.0, x.coveredShare(ion(p, "Cl-"), ionM), 1e-15);
        // HEPES- has none at all; Na+ has all its anions but HEPES-: (0.8 + 2·0.25) of (0.8 + 0.5 + 0.2)
        assertEquals(0.0, x.coveredShare(ion(p, "HEPES-"), ionM), 1e-15);
        assertEquals(1.3 / 1.5, x.coveredShare(ion(p, "Na+"), ionM), 1e-15);
        assertTrue(x.covered(ion(p, "HPO4-2")) && !x.covered(ion(p, "HEPES-")));
        // an ion with nothing of the opposite sign around it is not short of partners
        double[] alone = new double[x.ions];
        x.ionMolalities(molalities(p, Map.of("Na+", 1.0)), 0, 0, alone);
        assertEquals(1.0, x.coveredShare(ion(p, "Na+"), alone), 1e-15);
    }

    /** Significant from 5 % of the charge of its sign on (Interactions.SIGNIFICANT), counted with |z|. */
    @Test
    void anIonIsSignificantFromFivePerCentOfItsSignsCharge() {
        PreparedProblem p = problem(298.15);
        Interactions x = p.interactions;
        double[] ionM = new double[x.ions];
        // cations: Na+ 0.95, TrisH+ 0.05 → TrisH+ exactly 5 %
        x.ionMolalities(molalities(p, Map.of("Na+", 0.95, "TrisH+", 0.05, "Cl-", 1.0)), 0, 0, ionM);
        assertTrue(x.significant(ion(p, "TrisH+"), ionM));
        x.ionMolalities(molalities(p, Map.of("Na+", 0.96, "TrisH+", 0.04, "Cl-", 1.0)), 0, 0, ionM);
        assertFalse(x.significant(ion(p, "TrisH+"), ionM));
        // anions: HPO4-2 0.03 counts 0.06 of 0.06 + 0.94 = 6 %
        x.ionMolalities(molalities(p, Map.of("Na+", 1.0, "HPO4-2", 0.03, "Cl-", 0.94)), 0, 0, ionM);
        assertTrue(x.significant(ion(p, "HPO4-2"), ionM));
        assertTrue(x.significant(ion(p, "Cl-"), ionM));
    }

    /**
     * At I = 0.2 mol/kg the hand-over weight is ½ (t = ½), so an ion with parameters gets z²(½d + ½·0.0054) and one
     * without z²·d, d being Davies' disagreement with Pitzer for NaCl there; all zero at I = 0.
     */
    @Test
    void eachIonsUncertaintyFollowsItsChargeAndWhetherItHasParameters() {
        PreparedProblem p = problem(298.15);
        Interactions x = p.interactions;
        // I = ½(0.1 + 0.1 + 4·0.025 + 0.05 + 0.05) = 0.2 with H+ and OH- at 0
        double[] m = molalities(p, Map.of("Na+", 0.1, "Cl-", 0.1, "HPO4-2", 0.025, "HEPES-", 0.05, "TrisH+", 0.05));
        double ionic = x.ionMolalities(m, 0, 0, new double[x.ions]);
        assertEquals(0.2, ionic, 1e-15);
        double d = IonInteraction.daviesDisagreement(0.2);
        double covered = 0.5 * d + 0.5 * Interactions.PITZER_UNCERTAINTY;
        double[] species = new double[p.n];
        double[] component = new double[p.components.length];
        double[] water = new double[2];
        double perZ2 = x.uncertainty(m, 0, 0, new double[x.ions], new double[x.ions], species, component, water);
        assertEquals(covered, perZ2, 1e-15);
        for (int i = 0; i < p.n; i++) {
            String name = p.sp[i].name();
            double zz = p.charge[i] * p.charge[i];
            // no parameters: HEPES- (none at all) and PO4-3 (no Na3PO4 pair in the table)
            double expected = p.charge[i] == 0 ? 0 : name.equals("HEPES-") || name.equals("PO4-3") ? zz * d
                    : zz * covered;
            assertEquals(expected, species[i], 1e-15, name);
        }
        assertArrayEquals(new double[] {covered, covered}, water, 1e-15, "H+ with Cl-, OH- with Na+");
        double[] none = new double[p.n];
        assertEquals(0, x.uncertainty(new double[p.n], 0, 0, new double[x.ions], new double[x.ions], none,
                new double[p.components.length], new double[2]), 0);
        assertArrayEquals(new double[p.n], none, 0);
    }

    /** Above the hand-over an ion without parameters keeps Davies' γ; one with them takes Pitzer's, times w. */
    @Test
    void anIonWithoutParametersKeepsDavies() {
        PreparedProblem p = problem(298.15);
        Interactions x = p.interactions;
        double[] m = molalities(p, Map.of("Na+", 0.1, "Cl-", 0.1, "HPO4-2", 0.025, "HEPES-", 0.05, "TrisH+", 0.05));
        double[] ionM = new double[x.ions];
        double[] ionLn = new double[x.ions];
        double[] species = new double[p.n];
        double w = x.specific(m, 0, 0, ionM, ionLn, species, new double[p.components.length], new double[2]);
        assertEquals(0.5, w, 1e-15);
        double[] pitzer = new double[x.ions];
        x.mixture().lnGamma(ionM, pitzer);
        for (int i = 0; i < p.n; i++) {
            String name = p.sp[i].name();
            if (name.equals("HEPES-")) {
                assertEquals(0.5 * Davies.INSTANCE.log10Gamma(-1, 0.2, p.debyeHuckelA), species[i], 1e-15);
            } else if (name.equals("HPO4-2")) {
                assertEquals(0.5 * pitzer[x.speciesIon[i]] / Thermo.LN10, species[i], 1e-15);
            }
        }
        // below the hand-over nothing at all
        double[] dilute = molalities(p, Map.of("Na+", 0.05, "Cl-", 0.05));
        double[] s = new double[p.n];
        assertEquals(0, x.specific(dilute, 0, 0, ionM, ionLn, s, new double[p.components.length], new double[2]));
        assertArrayEquals(new double[p.n], s, 0);
    }

    /**
     * Na+–HPO4-2 has no published temperature terms: at 5 °C its β⁰, β¹ and Cφ move by 20 K times the bounds
     * (7.159e-4, 28.60e-4, −18.94e-5 per K). In 1 mol/kg Na+ with 0.05 HPO4-2 and 0.9 Cl- (I = 1.05, w = 1), HMW84's
     * eqs. give, with ΔB = Δβ⁰ + Δβ¹g(2√I), ΔB' = Δβ¹g'(2√I)/I, ΔC = ΔCφ/(2√2), Z = Σ m|z|:
     * Δln γ(HPO4-2) = 4 m_Na m_HPO4 ΔB' + m_Na (2ΔB + ZΔC) + 2 m_Na m_HPO4 ΔC;
     * Δln γ(Cl-) = m_Na m_HPO4 ΔB' + m_Na m_HPO4 ΔC. At 25 °C nothing moves.
     */
    @Test
    void aPairWithoutTemperatureTermsIsMovedToItsBound() {
        PreparedProblem cold = problem(278.15);
        Interactions x = cold.interactions;
        double na = 1.0;
        double hpo4 = 0.05;
        double cl = 0.9;
        double[] m = molalities(cold, Map.of("Na+", na, "HPO4-2", hpo4, "Cl-", cl));
        double[] species = new double[cold.n];
        assertTrue(x.pairShift("Na+", "HPO4-2", m, 0, 0, new double[x.ions], new double[x.ions], species,
                new double[cold.components.length], new double[2]));
        double ionic = 0.5 * (na + 4 * hpo4 + cl);
        double s = Math.sqrt(ionic);
        double dBeta0 = 7.159e-4 * 20;
        double dBeta1 = 28.60e-4 * 20;
        double dC = -18.94e-5 * 20 / (2 * Math.sqrt(2));
        double dB = dBeta0 + dBeta1 * Pitzer.g(2 * s);
        double dBPrime = dBeta1 * Pitzer.gPrime(2 * s) / ionic;
        double z = na + 2 * hpo4 + cl;
        double hydrogenPhosphate = 4 * na * hpo4 * dBPrime + na * (2 * dB + z * dC) + 2 * na * hpo4 * dC;
        double chloride = na * hpo4 * dBPrime + na * hpo4 * dC;
        for (int i = 0; i < cold.n; i++) {
            String name = cold.sp[i].name();
            if (name.equals("HPO4-2")) {
                assertEquals(hydrogenPhosphate / Thermo.LN10, species[i], 1e-12);
            } else if (name.equals("Cl-")) {
                assertEquals(chloride / Thermo.LN10, species[i], 1e-12);
            }
        }
        PreparedProblem warm = problem(298.15);
        assertFalse(warm.interactions.pairShift("Na+", "HPO4-2", molalities(warm, Map.of("Na+", na, "HPO4-2", hpo4,
                "Cl-", cl)), 0, 0, new double[x.ions], new double[x.ions], new double[warm.n],
                new double[warm.components.length], new double[2]));
        // a pair with published slopes is never moved
        assertFalse(x.pairShift("Na+", "Cl-", m, 0, 0, new double[x.ions], new double[x.ions], new double[cold.n],
                new double[cold.components.length], new double[2]));
    }
}
