package org.protolyte.substance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.InputStream;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.DissociationStep;
import org.protolyte.document.SchemaCatalog;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/** The shipped library as data: molar masses, sources, and the core entries the foundation needs. */
class ShippedLibraryTest {

    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(new SchemaCatalog());

    private static JsonNode raw() throws Exception {
        try (InputStream in = LibraryLoader.class.getResourceAsStream(LibraryLoader.SHIPPED)) {
            return JsonMapper.builder().build().readTree(in);
        }
    }

    /**
     * The library keeps the order of its file: the systems (which the analysis, the uncertainty budget and the
     * robustness draws walk in turn) come out as written, in every run, not in a hash order that changes between runs.
     */
    @Test
    void theSystemsComeInTheOrderOfTheFile() throws Exception {
        List<String> written = new java.util.ArrayList<>();
        raw().get("systems").forEach(n -> written.add(n.get("name").asString()));
        assertTrue(written.size() > 10, "the shipped library has more than ten systems");
        assertEquals(written, LIBRARY.systems().stream().map(AcidBaseSystem::name).toList());
    }

    /** Every declared molar mass (pharmacopoeial monograph values) matches its formula with IUPAC atomic weights. */
    @Test
    void everyDeclaredMolarMassMatchesItsFormula() throws Exception {
        int checked = 0;
        int withFormula = 0;
        for (JsonNode s : raw().get("substances")) {
            if (!s.has("formula") || s.path("nominalMolarMass").asBoolean(false)) {
                continue;
            }
            withFormula++;
            assertTrue(s.has("molarMass"), s.get("name").asString() + " has a formula but no declared molar mass");
            double computed = Formula.parse(s.get("formula").asString()).molarMass();
            assertEquals(s.get("molarMass").asDouble(), computed, 0.015, s.get("name").asString());
            checked++;
        }
        assertEquals(withFormula, checked);
        assertTrue(checked >= 38, "core library has " + checked + " entries with a formula");
    }

    /** Hand-checked against the IUPAC conventional atomic weights (CIAAW 2021), to three decimals. */
    @ParameterizedTest(name = "{0} = {1} g/mol")
    @CsvSource({"NaCl, 58.440", "Na2HPO4·12H2O, 358.137", "C4H11NO3·HCl, 157.594", "Ca(CH3COO)2, 158.166",
        "Na2B4O7·10H2O, 381.363"})
    void formulaMolarMassFromAtomicWeights(String formula, double molarMass) {
        assertEquals(molarMass, Formula.parse(formula).molarMass(), 0.0015);
    }

    @Test
    void hydrationWaterComesFromTheFormula() {
        assertEquals(12, Formula.parse("Na2HPO4·12H2O").hydrationWater());
        assertEquals(1.5, Formula.parse("C6H6Na2O7·1.5H2O").hydrationWater());
        assertEquals(7, Formula.parse("Na2HPO4.7H2O").hydrationWater());
        assertEquals(1, Formula.parse("C6H9N3O2·HCl·H2O").hydrationWater());
        assertEquals(0, Formula.parse("C4H11NO3·HCl").hydrationWater());
    }

    @Test
    void everyDissociationStepNamesItsSourceAndRange() throws Exception {
        for (JsonNode system : raw().get("systems")) {
            for (JsonNode step : system.get("steps")) {
                assertTrue(step.get("source").asString().length() > 10, system.get("name").asString());
                assertTrue(step.has("temperatureAs")     // the range of its model compound's step (ProteinTest)
                        || step.get("validFrom").asDouble() < step.get("validTo").asDouble());
            }
        }
    }

    /** The foundation's core list, each a specific form. */
    @Test
    void coreEntriesArePresent() {
        List<String> core = List.of("water", "hydrochloric acid", "sodium hydroxide", "potassium hydroxide",
                "sodium chloride", "potassium chloride", "phosphoric acid", "potassium dihydrogen phosphate",
                "dipotassium hydrogen phosphate", "sodium dihydrogen phosphate monohydrate",
                "sodium dihydrogen phosphate dihydrate", "disodium hydrogen phosphate anhydrous",
                "disodium hydrogen phosphate dihydrate", "disodium hydrogen phosphate heptahydrate",
                "disodium hydrogen phosphate dodecahydrate", "acetic acid", "sodium acetate anhydrous",
                "sodium acetate trihydrate", "citric acid monohydrate", "trisodium citrate dihydrate",
                "sodium hydrogen carbonate", "sodium carbonate anhydrous", "potassium hydrogen phthalate",
                "disodium tetraborate decahydrate", "boric acid", "Tris", "Tris hydrochloride", "HEPES",
                "HEPES sodium salt", "L-histidine", "L-histidine monohydrochloride monohydrate", "glucose anhydrous",
                "glucose monohydrate", "sucrose");
        for (String name : core) {
            assertEquals(name, LIBRARY.lookup(name).name());
        }
    }

    /** Tris-HCl is Tris in its protonated form plus chloride; Na2HPO4·7H2O is phosphate at HPO4 plus two sodium. */
    @Test
    void saltFormsCarryTheirProtonationState() {
        Substance trisHcl = LIBRARY.lookup("Tris-HCl");
        assertEquals("TrisH+", trisHcl.composition().systems().get(0).form());
        assertEquals(1.0, trisHcl.composition().ions().get("Cl-"));
        Substance hepta = LIBRARY.lookup("Na2HPO4·7H2O");
        assertEquals("HPO4-2", hepta.composition().systems().get(0).form());
        assertEquals(2.0, hepta.composition().ions().get("Na+"));
        assertEquals(7, hepta.hydrationWater());
    }

    @Test
    void stepsAreOrderedFromMostToLeastAcidic() {
        for (AcidBaseSystem s : LIBRARY.systems()) {
            List<DissociationStep> steps = s.steps();
            for (int i = 1; i < steps.size(); i++) {
                assertTrue(steps.get(i).pKa25() > steps.get(i - 1).pKa25(), s.name());
            }
        }
    }

    @Test
    void valuesRecalledRatherThanReadSaySo() throws Exception {
        for (JsonNode system : raw().get("systems")) {
            for (JsonNode step : system.get("steps")) {
                String source = step.get("source").asString();
                assertFalse(source.isBlank());
                if (!source.startsWith("from memory")) {
                    assertTrue(source.contains("(") && source.matches(".*\\d{4}.*"), "needs a citation: " + source);
                }
            }
        }
    }
}
