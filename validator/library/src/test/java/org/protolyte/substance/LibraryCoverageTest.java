package org.protolyte.substance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.InputStream;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.protolyte.document.SchemaCatalog;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * What parenteral, ophthalmic, cell-culture and bioprocess recipes contain, written as a formulation scientist
 * writes it: each name resolves to one entry, or is refused with the forms that exist (never silently one of them).
 */
class LibraryCoverageTest {

    private static SubstanceLibrary library;
    private static JsonNode shipped;

    @BeforeAll
    static void load() throws IOException {
        library = LibraryLoader.shipped(new SchemaCatalog());
        try (InputStream in = LibraryLoader.class.getResourceAsStream("substances.json")) {
            shipped = JsonMapper.builder().build().readTree(in);
        }
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {
            // acids and bases
            "hydrochloric acid", "sulfuric acid", "phosphoric acid", "acetic acid", "citric acid anhydrous",
            "citric acid monohydrate", "lactic acid", "succinic acid", "tartaric acid", "malic acid", "maleic acid",
            "boric acid", "sodium hydrogen carbonate", "sodium carbonate", "gluconic acid", "ascorbic acid",
            "sodium ascorbate", "benzoic acid", "sodium benzoate", "sorbic acid", "potassium sorbate",
            "sodium hydroxide", "potassium hydroxide", "ammonia", "ammonium chloride", "ammonium sulfate",
            // salts
            "sodium chloride", "potassium chloride", "calcium chloride anhydrous", "calcium chloride dihydrate",
            "magnesium chloride hexahydrate", "sodium sulfate", "potassium sulfate", "magnesium sulfate anhydrous",
            "magnesium sulfate heptahydrate", "sodium dihydrogen phosphate monohydrate",
            "sodium phosphate dibasic heptahydrate", "potassium phosphate monobasic", "potassium phosphate dibasic",
            "trisodium citrate dihydrate", "potassium citrate", "sodium citrate", "sodium dihydrogen citrate",
            "sodium lactate", "sodium succinate", "sodium carbonate anhydrous", "sodium carbonate decahydrate",
            "sodium acetate", "sodium acetate trihydrate", "zinc sulfate heptahydrate", "ferric nitrate nonahydrate",
            "ferrous sulfate heptahydrate",
            // buffers
            "Tris", "Tris-HCl", "bis-Tris", "HEPES", "HEPES sodium salt", "MES", "MES monohydrate", "MOPS", "PIPES",
            "bicine", "tricine", "TES", "glycylglycine", "imidazole", "triethanolamine", "glycine",
            // amino acids
            "L-histidine", "L-histidine monohydrochloride monohydrate", "L-arginine", "L-arginine hydrochloride",
            "L-lysine", "L-lysine hydrochloride", "L-glutamine", "L-glutamic acid", "monosodium glutamate",
            "L-aspartic acid", "L-asparagine monohydrate", "L-methionine", "L-alanine", "L-proline", "L-serine",
            "L-threonine", "L-valine", "L-leucine", "L-isoleucine", "L-phenylalanine", "L-tryptophan", "L-tyrosine",
            "L-tyrosine disodium salt", "L-cysteine hydrochloride monohydrate", "L-cystine", "L-cystine dihydrochloride",
            // others
            "disodium EDTA dihydrate", "sodium pyruvate", "phenol red", "phenol red sodium salt", "sodium azide",
            "choline chloride", "nicotinamide", "riboflavin", "folic acid", "calcium pantothenate",
            "pyridoxine hydrochloride", "thiamine hydrochloride", "glucose anhydrous", "glucose monohydrate", "glucose",
            "sucrose", "trehalose dihydrate", "mannitol", "sorbitol", "glycerol", "polysorbate 20", "polysorbate 80",
            "poloxamer 188", "PEG 400", "PEG 3350", "PEG 4000", "PEG 6000"})
    void aNameInTheTradeResolvesOrListsItsForms(String name) {
        try {
            assertFalse(library.lookup(name).name().isEmpty());
        } catch (LookupException e) {
            assertTrue(e.getMessage().contains("names several forms"), name + ": " + e.getMessage());
            assertTrue(e.candidates().size() >= 2, name);
        }
    }

    @Test
    void everySynonymResolvesToItsEntry() {
        int n = 0;
        for (JsonNode s : shipped.path("substances")) {
            String name = s.path("name").asString();
            for (JsonNode syn : s.path("synonyms")) {
                assertEquals(name, library.lookup(syn.asString()).name(), "synonym '" + syn.asString() + "'");
                n++;
            }
        }
        assertTrue(n > 300, "synonyms checked: " + n);
    }

    @Test
    void everyAmbiguousNameListsFormsThatResolve() {
        for (JsonNode a : shipped.path("ambiguousNames")) {
            try {
                library.lookup(a.path("name").asString());
                fail("'" + a.path("name").asString() + "' resolved silently");
            } catch (LookupException e) {
                assertTrue(e.candidates().size() >= 2);
                for (String form : e.candidates()) {
                    assertEquals(form, library.lookup(form).name());
                }
            }
        }
    }

    @Test
    void everyEntryWithHandlingDataNamesItsSource() {
        for (JsonNode s : shipped.path("substances")) {
            for (String field : new String[] {"solubility", "hygroscopy", "lightSensitivity"}) {
                if (s.has(field)) {
                    assertTrue(s.get(field).path("source").asString().length() > 5, s.path("name").asString() + " " + field);
                }
            }
        }
    }
}
