package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import picocli.CommandLine;

/** {@code protolyte substances}: a reviewer checks a value and its source without opening JSON. */
class SubstancesCommandTest {

    private static String[] run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cl = new CommandLine(new Main());
        cl.setOut(new PrintWriter(out));
        cl.setErr(new PrintWriter(err));
        int code = cl.execute(args);
        return new String[] {String.valueOf(code), out.toString(), err.toString()};
    }

    @Test
    void aQueryForgivingSpellingShowsTheFormConstantsAndSource() {
        String[] r = run("substances", "Na2HPO4.7H2O");
        assertEquals("0", r[0]);
        assertTrue(r[1].contains("disodium hydrogen phosphate heptahydrate"));
        assertTrue(r[1].contains("pKa 7.1965"), r[1]);
        assertTrue(r[1].contains("source: "));
    }

    @Test
    void noMatchIsAUsageError() {
        String[] r = run("substances", "unobtainium");
        assertEquals("2", r[0]);
        assertTrue(r[2].contains("no substance matches"));
    }

    @Test
    void withoutAQueryEveryEntryIsListed() {
        String[] r = run("substances");
        assertTrue(r[1].contains("sucrose") && r[1].contains("Tris hydrochloride") && r[1].contains("boric acid"));
    }

    /** A reviewer sees which values were read and which recalled, with the source of each. */
    @Test
    void provenanceTellsReadFromRecalledWithTheSource() {
        String[] r = run("substances", "--provenance", "phosphate");
        assertEquals("0", r[0], r[2]);
        assertTrue(r[1].contains("phosphate step 1, H3PO4 ⇌ H2PO4-: pKa 2.148") && r[1].contains("[read]\n      Bates"),
                r[1]);
        assertTrue(r[1].contains("phosphate step 3, HPO4-2 ⇌ PO4-3") && r[1].contains("[recalled]\n      from memory"),
                r[1]);
    }

    /** The heading's count is the number of steps whose source says "from memory", counted here from the file. */
    @Test
    void provenanceCountsTheRecalledStepsOfTheWholeLibrary() throws Exception {
        tools.jackson.databind.JsonNode library;
        try (var in = org.protolyte.substance.LibraryLoader.class.getResourceAsStream(
                org.protolyte.substance.LibraryLoader.SHIPPED)) {
            library = tools.jackson.databind.json.JsonMapper.builder().build().readTree(in);
        }
        int steps = 0;
        int recalled = 0;
        for (var system : library.path("systems")) {
            for (var step : system.path("steps")) {
                steps++;
                recalled += step.path("source").asString().contains("from memory") ? 1 : 0;
            }
        }
        String[] r = run("substances", "--provenance");
        assertEquals("0", r[0], r[2]);
        assertTrue(steps > 100 && recalled > 0, steps + " steps, " + recalled + " recalled");
        assertTrue(r[1].contains("dissociation steps: " + recalled + " of " + steps + " not read"), r[1]);
        assertTrue(r[1].contains("\ncomplexes: ") && r[1].contains("\nhandling entries: "), r[1]);
    }

    @Test
    void provenanceOfNothingIsAUsageError() {
        String[] r = run("substances", "--provenance", "unobtainium");
        assertEquals("2", r[0]);
        assertTrue(r[2].contains("no system, complex, phase or substance matches 'unobtainium'"), r[2]);
    }

    /**
     * An exact name asks for that substance and its salts and hydrates, not for every name that contains the word
     * (issue 15: "Tris" is not trisodium citrate, "phenol" is not phenol red, "ethanol" is not triethanolamine).
     */
    @ParameterizedTest(name = "{0}")
    @CsvSource({"Tris, Tris, Tris hydrochloride, trisodium citrate", "phenol, phenol, , phenol red",
        "ethanol, ethanol, , triethanolamine"})
    void anExactNameListsItsFormsAndNothingThatMerelyContainsIt(String query, String first, String alsoListed,
            String notListed) {
        String[] r = run("substances", query);
        assertEquals("0", r[0], r[2]);
        assertTrue(r[1].startsWith(first + "\n"), r[1].substring(0, Math.min(200, r[1].length())));
        if (alsoListed != null) {
            assertTrue(r[1].contains("\n" + alsoListed + "\n"), r[1]);
        }
        assertFalse(r[1].contains("\n" + notListed), r[1]);
    }

    /** Without an exact name, every name that contains the query is listed. */
    @Test
    void withoutAnExactNameEveryContainingNameIsListed() {
        String[] r = run("substances", "citrate");
        assertEquals("0", r[0], r[2]);
        List<String> lines = r[1].lines().toList();
        assertTrue(lines.contains("trisodium citrate dihydrate") && lines.contains("potassium dihydrogen citrate"), r[1]);
    }

    /** A buffer's other abbreviation finds it first (EPPS is HEPPS), with the constants read for it. */
    @Test
    void anAbbreviationFindsItsBuffer() {
        String[] r = run("substances", "EPPS");
        assertEquals("0", r[0], r[2]);
        assertTrue(r[1].startsWith("HEPPS\n"), r[1].substring(0, Math.min(200, r[1].length())));
        assertTrue(r[1].contains("pKa 7.9564"), r[1]);
    }
}
