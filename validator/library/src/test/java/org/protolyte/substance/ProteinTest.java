package org.protolyte.substance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.DissociationStep;
import org.protolyte.document.Formulation;
import org.protolyte.document.SchemaCatalog;

/** A protein line's groups, mass and charge from its definition; published checks are in the reference package. */
class ProteinTest {

    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(new SchemaCatalog());
    private static final double T25 = 298.15;

    static Formulation.Protein chains(int disulfides, Formulation.Chain... chains) {
        return new Formulation.Protein(List.of(chains), Map.of(), disulfides, OptionalDouble.empty(), Optional.empty(),
                List.of(), "/components/0/protein");
    }

    static Formulation.Chain chain(String sequence, int copies) {
        return new Formulation.Chain(sequence, copies, false, false, "/components/0/protein/chains/0");
    }

    @Test
    void groupsAreCountedFromTheChainsLessTheDisulfideCysteines() {
        Protein p = Protein.define("x", chains(1, chain("DEHCCYKRG", 2), chain("KC", 1)), LIBRARY);
        assertEquals(3, p.groups().get(ProteinGroup.N_TERMINUS));
        assertEquals(3, p.groups().get(ProteinGroup.C_TERMINUS));
        assertEquals(2, p.groups().get(ProteinGroup.ASP));
        assertEquals(2, p.groups().get(ProteinGroup.HIS));
        assertEquals(3, p.groups().get(ProteinGroup.LYS));
        assertEquals(5 - 2, p.groups().get(ProteinGroup.CYS));
        assertEquals(2, p.groups().get(ProteinGroup.ARG));
    }

    @Test
    void blockedTerminiDoNotTitrate() {
        Protein p = Protein.define("x", chains(0, new Formulation.Chain("AKA", 1, true, true, "/c")), LIBRARY);
        assertEquals(0, p.groups().get(ProteinGroup.N_TERMINUS));
        assertEquals(0, p.groups().get(ProteinGroup.C_TERMINUS));
        // Ac-AKA-NH2: AKA is C12H24N4O4 (alanine C3H7NO2 ×2 + lysine C6H14N2O2 − 2 H2O); + C2H2O; + NH − O
        assertEquals(Formula.parse("C14H27N5O4").molarMass(), p.molarMass(), 1e-9);
    }

    /** Gly-Gly is glycylglycine, C4H8N2O3; Gly-Gly-Gly is C6H11N3O4 (each peptide bond loses one water). */
    @Test
    void theMassOfAPeptideIsItsFormulas() {
        assertEquals(LIBRARY.lookup("glycylglycine").molarMass().orElseThrow(),
                Protein.define("gg", chains(0, chain("GG", 1)), LIBRARY).molarMass(), 1e-9);
        assertEquals(Formula.parse("C6H11N3O4").molarMass(),
                Protein.define("ggg", chains(0, chain("GGG", 1)), LIBRARY).molarMass(), 1e-9);
        // a disulfide between two cysteines takes two hydrogens: cystine C6H12N2O4S2 from two cysteines
        assertEquals(2 * Formula.parse("C3H7NO2S").molarMass() - 2 * AtomicWeights.of("H").orElseThrow(),
                Protein.define("cc", chains(1, chain("C", 1), chain("C", 1)), LIBRARY).molarMass(), 1e-9);
    }

    /** The titration by hand: Σ n (z_protonated − 1/(1 + 10^(pKa − pH))) with the set's pKa at 25 °C. */
    @Test
    void netChargeIsTheSumOfTheGroupsByHand() {
        Protein p = Protein.define("x", chains(0, chain("DDEHKKKRY", 1)), LIBRARY);
        Map<ProteinGroup, AcidBaseSystem> set = LIBRARY.proteinGroups().get(Protein.DEFAULT_SET);
        for (double pH : new double[] {2, 4, 6.5, 9, 12}) {
            double z = 0;
            Object[][] groups = {{ProteinGroup.N_TERMINUS, 1, 1}, {ProteinGroup.C_TERMINUS, 1, 0},
                    {ProteinGroup.ASP, 2, 0}, {ProteinGroup.GLU, 1, 0}, {ProteinGroup.HIS, 1, 1},
                    {ProteinGroup.LYS, 3, 1}, {ProteinGroup.ARG, 1, 1}, {ProteinGroup.TYR, 1, 0}};
            for (Object[] g : groups) {
                double pKa = set.get((ProteinGroup) g[0]).steps().get(0).pKa25();
                z += (int) g[1] * ((int) g[2] - 1 / (1 + Math.pow(10, pKa - pH)));
            }
            assertEquals(z, p.netCharge(pH, T25), 1e-12, "pH " + pH);
        }
        assertEquals(0, p.netCharge(p.isoelectricPoint(T25).orElseThrow(), T25), 1e-5);
    }

    @Test
    void aGroupTakesItsTemperatureTermsFromItsModelCompound() {
        DissociationStep his = LIBRARY.proteinGroups().get(Protein.DEFAULT_SET).get(ProteinGroup.HIS).steps().get(0);
        DissociationStep model = LIBRARY.system("histidine").orElseThrow().steps().get(1);
        assertEquals(6.54, his.pKa25());
        assertEquals(model.deltaH(), his.deltaH());
        assertEquals(model.deltaHUncertainty(), his.deltaHUncertainty());
        assertEquals(model.validity(), his.validity());
        assertTrue(his.pKa(278.15) > his.pKa(298.15) + 0.3, "histidine's ΔH° raises the pKa by about 0.37 at 5 °C");
    }

    @Test
    void everyGroupOfEverySetIsPresentWithAnUncertaintyOfAFoldedProtein() {
        for (String set : List.of("model peptides", "folded-protein averages")) {
            Map<ProteinGroup, AcidBaseSystem> groups = LIBRARY.proteinGroups().get(set);
            assertEquals(ProteinGroup.values().length, groups.size(), set);
            // Grimsley, Scholtz and Pace 2009: the smallest spread is the N-terminus's, 0.5
            groups.values().forEach(s -> assertTrue(s.steps().get(0).uncertainty() >= 0.5, s.name()));
        }
    }

    @Test
    void moreDisulfidesThanCysteinesIsRefusedAtItsPlace() {
        Protein.DefinitionException e = assertThrows(Protein.DefinitionException.class,
                () -> Protein.define("x", chains(2, chain("CKC", 1)), LIBRARY));
        assertEquals("/components/0/protein/disulfides", e.pointer());
    }
}
