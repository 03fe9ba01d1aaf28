package org.protolyte.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;
import org.protolyte.chemistry.DissociationStep;
import org.protolyte.chemistry.Thermo;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;

/**
 * Buffer and amino-acid constants of the shipped library against values read in the publications named in
 * spot-checks.csv: the pKa at a temperature and the temperature derivative the library's ΔH° and ΔCp° give.
 */
class CompilationSpotChecksTest {

    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(new SchemaCatalog());
    private static final double R = Thermo.R;

    @ParameterizedTest(name = "{0} step {1}: {2} {4} at {3} °C ({6})")
    @CsvFileSource(resources = "spot-checks.csv", numLinesToSkip = 1)
    void libraryAgreesWithThePublishedValue(String system, int step, String kind, double celsius, double value,
                                            double tolerance, String source) {
        DissociationStep s = LIBRARY.system(system).orElseThrow().steps().get(step - 1);
        double t = celsius + Thermo.KELVIN_OFFSET;
        double slope = (s.pKa(t + 0.5) - s.pKa(t - 0.5));          // dpKa/dT, per K
        switch (kind) {
            case "pKa" -> assertEquals(value, s.pKa(t), tolerance, source);
            case "deltaH" -> assertEquals(-value * 1000 / (R * t * t * Math.log(10)), slope,
                    tolerance * 1000 / (R * t * t * Math.log(10)), source);
            case "B" -> assertEquals(-value / (t * t), slope, tolerance / (t * t), source);
            default -> throw new IllegalArgumentException(kind);
        }
    }
}
