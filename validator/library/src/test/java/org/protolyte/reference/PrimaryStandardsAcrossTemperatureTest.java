package org.protolyte.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.IntStream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The primary pH standards from 0 to 50 °C, within ±0.03 (the tolerance: Davies versus the
 * Bates–Guggenheim convention, and constants extrapolated by van 't Hoff with ΔCp°).
 *
 * <p>Phosphate and carbonate: pH(PS) of Buck et al., "Measurement of pH. Definition, standards, and
 * procedures (IUPAC Recommendations 2002)", Pure Appl. Chem. 74 (2002) 2169, Table 2 — <b>from memory</b>: the
 * table could not be read here, the rows below are recalled. Two read values anchor them: 6.865 and 7.413 at
 * 25 °C (quoted by Partanen et al.) and 7.382 at 38 °C (Bates et al., J. Res. NBS 65A (1961), abstract), which
 * the recalled 37 and 40 °C entries bracket. Borax and potassium hydrogen phthalate are checked against read
 * equations over 0–50 and 0–60 °C: Manov, DeLollis, Lindvall and Acree (J. Res. NBS 36 (1946) 543) and Hetzer,
 * Durst, Robinson and Bates (J. Res. NBS 81A (1977) 21), both abstracts.
 */
class PrimaryStandardsAcrossTemperatureTest {

    private static final double TOLERANCE = 0.03;
    private static final double[] CELSIUS = {0, 5, 10, 15, 20, 25, 30, 35, 37, 40, 50};

    /** KH2PO4 0.025 + Na2HPO4 0.025 mol/kg (Buck et al. 2002, Table 2, from memory). */
    private static final double[] EQUIMOLAL_PHOSPHATE =
            {6.984, 6.951, 6.923, 6.900, 6.881, 6.865, 6.853, 6.844, 6.841, 6.838, 6.833};
    /** KH2PO4 0.008695 + Na2HPO4 0.03043 mol/kg (Buck et al. 2002, Table 2, from memory). */
    private static final double[] PHYSIOLOGICAL_PHOSPHATE =
            {7.534, 7.500, 7.472, 7.448, 7.429, 7.413, 7.400, 7.389, 7.386, 7.380, 7.367};
    /** NaHCO3 0.025 + Na2CO3 0.025 mol/kg (Buck et al. 2002, Table 2, from memory). */
    private static final double[] CARBONATE =
            {10.317, 10.245, 10.179, 10.118, 10.062, 10.012, 9.966, 9.926, 9.910, 9.889, 9.828};

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"equimolal phosphate", "physiological phosphate", "carbonate"})
    void standardFrom0To50Celsius(String standard) {
        ReferenceDocuments solution = ReferenceDocuments.standard(standard);
        double[] published = switch (standard) {
            case "equimolal phosphate" -> EQUIMOLAL_PHOSPHATE;
            case "physiological phosphate" -> PHYSIOLOGICAL_PHOSPHATE;
            default -> CARBONATE;
        };
        double[] computed = solution.pH(CELSIUS);
        IntStream.range(0, CELSIUS.length).forEach(i ->
                assertEquals(published[i], computed[i], TOLERANCE, standard + " at " + CELSIUS[i] + " °C"));
    }

    /**
     * 0.01 mol/kg borax: pH = 2331.7/T + 0.017433·T − 3.840 "from 0° to 60° C" (Manov, DeLollis, Lindvall and Acree,
     * J. Res. NBS 36 (1946) 543, abstract, read; T = t + 273.16), over the library's 0–50 °C for boric acid.
     */
    @ParameterizedTest(name = "borax at {0} °C")
    @ValueSource(doubles = {0, 5, 10, 15, 20, 25, 30, 35, 37, 40, 45, 50})
    void borax(double celsius) {
        double t = celsius + 273.16;
        double published = 2331.7 / t + 0.017433 * t - 3.840;
        double[] pH = ReferenceDocuments.standard("borax").pH(celsius);
        assertEquals(published, pH[0], TOLERANCE);
    }

    /** pH(S) = 2073.44/T − 13.3270 + 0.045199·T − 3.4846e−5·T², 0–60 °C (Hetzer et al. 1977, read). */
    @ParameterizedTest(name = "KHP at {0} °C")
    @ValueSource(doubles = {0, 5, 10, 15, 20, 25, 30, 35, 37, 40, 45, 50, 55, 60})
    void potassiumHydrogenPhthalate(double celsius) {
        double t = celsius + 273.15;
        double published = 2073.44 / t - 13.3270 + 0.045199 * t - 3.4846e-5 * t * t;
        double[] pH = ReferenceDocuments.standard("phthalate").pH(celsius);
        assertEquals(published, pH[0], TOLERANCE);
    }

    /**
     * Every standard of Buck et al. 2002 (Tables 2 and 3) that the library can form gets a pH at every 5 K from 0 to
     * 50 °C (issue 15, item 5), whether or not its published values could be read here. The compositions are those
     * of the IUPAC recommendation (ReferenceDocuments.standard), saturated tartrate at its 25 °C molality throughout.
     */
    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"tartrate", "citrate", "phthalate", "equimolal phosphate", "physiological phosphate",
        "borax", "carbonate", "tetroxalate", "calcium hydroxide", "Tris", "acetate"})
    void everyStandardTheLibraryFormsIsComputableFrom0To50Celsius(String standard) {
        ReferenceDocuments solution = ReferenceDocuments.standard(standard);
        double[] celsius = IntStream.rangeClosed(0, 10).mapToDouble(i -> 5.0 * i).toArray();
        double[] pH = solution.pH(celsius);   // fails with the reason if any condition is indeterminate
        IntStream.range(0, pH.length).forEach(i -> assertTrue(pH[i] > 1 && pH[i] < 14, standard + " at "
                + celsius[i] + " °C: " + pH[i]));
    }
}
