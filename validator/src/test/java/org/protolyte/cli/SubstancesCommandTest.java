package org.protolyte.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;

import org.junit.jupiter.api.Test;

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
}
