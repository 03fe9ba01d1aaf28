package org.protolyte.substance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;
import org.protolyte.document.SchemaCatalog;

class SubstanceLookupTest {

    private static SubstanceLibrary library;

    @BeforeAll
    static void load() {
        library = LibraryLoader.shipped(new SchemaCatalog());
    }

    @ParameterizedTest(name = "''{0}'' is {1}")
    @CsvSource(delimiter = '|', value = {
            "na2hpo4 7h2o|disodium hydrogen phosphate heptahydrate",
            "Na2HPO4.7H2O|disodium hydrogen phosphate heptahydrate",
            "NA2HPO4·7H2O|disodium hydrogen phosphate heptahydrate",
            "tris-hcl|Tris hydrochloride",
            "TRIS HCL|Tris hydrochloride",
            "Sodium-Chloride|sodium chloride"})
    void lookupForgivesCaseSpacesHyphensAndDots(String written, String canonical) {
        assertEquals(canonical, library.lookup(written).name());
    }

    /**
     * The substances a new user reached for and did not find (issue 15, item 3), by the names of the trade: each
     * resolves, directly or, for a name shared only by hydrates, as its form with the least water.
     */
    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"MES", "MOPS", "MOPSO", "ACES", "BES", "HEPPS", "EPPS",
        "TES", "bicine", "tricine", "MES sodium salt", "MOPS sodium salt", "HEPES sodium salt", "CHES", "CAPS", "TAPS",
        "malic acid", "tartaric acid", "potassium hydrogen tartrate", "oxalic acid", "potassium tetroxalate",
        "succinic acid", "disodium succinate", "maleic acid", "gluconic acid", "calcium gluconate", "calcium lactate",
        "potassium acetate", "sodium sulfate", "potassium sulfate", "potassium hydrogen carbonate", "calcium hydroxide",
        "meglumine", "lysine acetate", "sodium metabisulfite", "sodium selenite", "glucose", "dextrose", "ethanol",
        "propylene glycol", "glycerol", "benzyl alcohol", "phenol", "m-cresol", "DMSO", "polysorbate 80",
        "polysorbate 20"})
    void everySubstanceOfTheTradeThatWasMissingResolves(String name) {
        Substance s = library.formOfHydratesOnly(name).orElseGet(() -> library.lookup(name));
        assertEquals(s, library.lookup(s.name()), name + ": its canonical name finds it again");
    }

    @Test
    void unknownNameOffersTheNearestLibraryNames() {
        LookupException e = assertThrows(LookupException.class, () -> library.lookup("sodium chlorde"));
        assertTrue(e.candidates().contains("sodium chloride"), e.candidates().toString());
        assertTrue(e.getMessage().contains("unknown substance 'sodium chlorde'"), e.getMessage());
        assertTrue(e.getMessage().contains("sodium chloride"), e.getMessage());
    }

    @Test
    void unknownNameCandidatesAreNearNotArbitrary() {
        LookupException e = assertThrows(LookupException.class, () -> library.lookup("potasium chloride"));
        assertEquals("potassium chloride", e.candidates().get(0));
        assertTrue(e.candidates().size() <= 5, e.candidates().toString());
    }

    /** A 1 MiB name took 34 s: the edit distance is quadratic, so names past the bound get no suggestions. */
    @Test
    void aMegabyteNameIsRefusedAtOnceWithoutSuggestions() {
        String name = "tromethamin" + "e".repeat(1 << 20);
        LookupException e = assertTimeoutPreemptively(Duration.ofSeconds(10),
                () -> assertThrows(LookupException.class, () -> library.lookup(name)));
        assertTrue(e.candidates().isEmpty(), e.candidates().toString());
        assertTrue(e.getMessage().contains("no nearest names are sought for a name of more than 100 characters"),
                e.getMessage());
        assertTrue(e.getMessage().length() < 300, "the name is quoted cut, not whole: " + e.getMessage().length());
    }

    @Test
    void nameFarFromEverythingOffersAUserLibraryInstead() {
        LookupException e = assertThrows(LookupException.class, () -> library.lookup("TST-zq-9931"));
        assertTrue(e.candidates().isEmpty(), e.candidates().toString());
        assertTrue(e.getMessage().contains("--substances"), e.getMessage());
    }

    @Test
    void glucoseIsRefusedWithItsFormsListed() {
        LookupException e = assertThrows(LookupException.class, () -> library.lookup("glucose"));
        assertEquals(Set.of("glucose anhydrous", "glucose monohydrate"), new HashSet<>(e.candidates()));
        assertTrue(e.getMessage().contains("several forms"), e.getMessage());
        e.candidates().forEach(f -> assertTrue(e.getMessage().contains(f), f));
    }

    @Test
    void sodiumPhosphateIsRefusedWithEveryFormListed() {
        LookupException e = assertThrows(LookupException.class, () -> library.lookup("Sodium Phosphate"));
        List<String> expected = List.of("sodium dihydrogen phosphate anhydrous",
                "sodium dihydrogen phosphate monohydrate", "sodium dihydrogen phosphate dihydrate",
                "disodium hydrogen phosphate anhydrous", "disodium hydrogen phosphate dihydrate",
                "disodium hydrogen phosphate heptahydrate", "disodium hydrogen phosphate dodecahydrate",
                "trisodium phosphate anhydrous", "trisodium phosphate dodecahydrate");
        assertEquals(new HashSet<>(expected), new HashSet<>(e.candidates()));
        for (String form : e.candidates()) {
            assertEquals(form, library.lookup(form).name(), "a listed form must itself resolve");
        }
    }
}
