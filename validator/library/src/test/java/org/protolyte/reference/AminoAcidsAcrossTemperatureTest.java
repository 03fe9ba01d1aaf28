package org.protolyte.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;

/**
 * Amino-acid dissociation constants against the emf series they were read from, value by value at every temperature
 * printed, as digitized in the IUPAC dissociation-constant dataset (github.com/IUPAC/Dissociation-Constants,
 * iupac_high-confidence_v2_4.csv, commit e099d8d9; each row graded Reliable by the compilation except aspartic acid's
 * amino step, graded Approximate). The library's ΔH° and ΔCp° were fitted to these series, so the check is that the
 * fit and the engine's van 't Hoff integration reproduce what was measured, within 0.01.
 */
class AminoAcidsAcrossTemperatureTest {

    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(new SchemaCatalog());
    private static final double[] SMITH = {1, 12.5, 25, 37.5, 50};
    private static final double[] DATTA = {0, 5, 10, 15, 20, 25, 30, 35, 40, 45, 50, 55};

    static Stream<Arguments> series() {
        return Stream.of(
                // Datta and Grzybowski, Biochem. J. 78 (1961) 289 (D7)
                Arguments.of("arginine", 0, DATTA, new double[] {1.914, 1.8847, 1.8697, 1.8488, 1.8374, 1.8217, 1.8138,
                    1.8013, 1.7995, 1.7852, 1.7871, 1.7731}),
                Arguments.of("arginine", 1, DATTA, new double[] {9.7178, 9.5626, 9.4073, 9.2669, 9.1226, 8.9936, 8.8589,
                    8.739, 8.614, 8.504, 8.3852, 8.2824}),
                // Smith and Smith, J. Biol. Chem. 146 (1942) 187 (S57)
                Arguments.of("aspartic acid", 0, SMITH, new double[] {2.122, 2.054, 1.99, 1.945, 1.907}),
                Arguments.of("aspartic acid", 1, SMITH, new double[] {4.006, 3.944, 3.9, 3.878, 3.87}),
                Arguments.of("aspartic acid", 2, SMITH, new double[] {10.604, 10.304, 10.002, 9.742, 9.512}),
                // Smith, Taylor and Smith, J. Biol. Chem. 122 (1937) 109 (S58)
                Arguments.of("valine", 0, SMITH, new double[] {2.32, 2.297, 2.286, 2.292, 2.31}),
                Arguments.of("leucine", 0, SMITH, new double[] {2.383, 2.348, 2.328, 2.327, 2.333}),
                Arguments.of("isoleucine", 0, SMITH, new double[] {2.365, 2.338, 2.318, 2.317, 2.332}),
                Arguments.of("isoleucine", 1, SMITH, new double[] {10.46, 10.1, 9.758, 9.439, 9.157}),
                // Smith, Gorham and Smith, J. Biol. Chem. 144 (1942) 737 (S55)
                Arguments.of("serine", 0, SMITH, new double[] {2.296, 2.232, 2.186, 2.154, 2.132}),
                Arguments.of("serine", 1, SMITH, new double[] {9.88, 9.542, 9.208, 8.904, 8.628}),
                Arguments.of("threonine", 0, SMITH, new double[] {2.2, 2.132, 2.088, 2.07, 2.055}),
                Arguments.of("threonine", 1, SMITH, new double[] {9.748, 9.42, 9.1, 8.812, 8.548}),
                Arguments.of("proline", 0, SMITH, new double[] {2.011, 1.964, 1.952, 1.95, 1.958}),
                Arguments.of("proline", 1, SMITH, new double[] {11.296, 10.972, 10.64, 10.342, 10.064}));
    }

    @ParameterizedTest(name = "{0} step {1}")
    @MethodSource("series")
    void followsItsEmfSeries(String system, int step, double[] celsius, double[] printed) {
        for (int i = 0; i < celsius.length; i++) {
            double pK = LIBRARY.system(system).orElseThrow().steps().get(step).pKa(celsius[i] + 273.15);
            assertEquals(printed[i], pK, 0.01, system + " step " + (step + 1) + " at " + celsius[i] + " °C");
        }
    }
}
