package org.protolyte.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.protolyte.chemistry.DissociationStep;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;
import org.protolyte.substance.SubstanceLibrary;

/**
 * The pKa the library gives at 5, 25 and 37 °C for the buffers the shipped rule packs and samples rely on, against
 * the source each value was read from: its pK(T) equation where it prints one, its printed pK at a temperature, or
 * (where it prints pK, ΔH° and ΔCp° at 25 °C only) the pK(T) those three give, integrated here with a constant ΔCp°.
 * HEPES and MES are checked at 25 °C only: no source for their temperature terms could be read (see
 * ValuesFromMemoryTest).
 */
class NamedBuffersAcrossTemperatureTest {

    private static final SubstanceLibrary LIBRARY = LibraryLoader.shipped(new SchemaCatalog());

    private static final double R = 8.314462618;
    private static final double T_REF = 298.15;

    private static double libraryPKa(String system, int step, double celsius) {
        DissociationStep s = LIBRARY.system(system).orElseThrow().steps().get(step);
        return s.pKa(celsius + 273.15);
    }

    /**
     * pK(T) from pK, ΔH° (J/mol) and ΔCp° (J/(K·mol)) at 298.15 K, ΔCp° constant:
     * pK(T) = pK + ΔH°/(R ln 10)·(1/T − 1/T₀) + ΔCp°/(R ln 10)·(1 − T₀/T − ln(T/T₀)).
     */
    private static double fromThermodynamics(double pK, double deltaH, double deltaCp, double celsius) {
        double t = celsius + 273.15;
        double rLn10 = R * Math.log(10);
        return pK + deltaH / rLn10 * (1 / t - 1 / T_REF) + deltaCp / rLn10 * (1 - T_REF / t - Math.log(t / T_REF));
    }

    /**
     * Phosphoric acid, first step: Bates, "First dissociation constant of phosphoric acid from 0 °C to 60 °C",
     * abstract (catalogue record; see the library's source text): −log K1 = 799.31/T − 4.5535 + 0.013486 T, ±0.005.
     */
    @ParameterizedTest(name = "phosphate pK1 at {0} °C")
    @ValueSource(doubles = {5, 25, 37})
    void phosphateFirstStepFollowsBates(double celsius) {
        double t = celsius + 273.15;
        assertEquals(799.31 / t - 4.5535 + 0.013486 * t, libraryPKa("phosphate", 0, celsius), 0.005);
    }

    /**
     * Carbonic acid, Plummer and Busenberg, Geochim. Cosmochim. Acta 46 (1982) 1011, abstract:
     * log K1 = −356.3094 − 0.06091964 T + 21834.37/T + 126.8339 log T − 1684915/T²,
     * log K2 = −107.8871 − 0.03252849 T + 5151.79/T + 38.92561 log T − 563713.9/T².
     */
    @ParameterizedTest(name = "carbonate pK1 and pK2 at {0} °C")
    @ValueSource(doubles = {5, 25, 37})
    void carbonateFollowsPlummerAndBusenberg(double celsius) {
        double t = celsius + 273.15;
        double log10K1 = -356.3094 - 0.06091964 * t + 21834.37 / t + 126.8339 * Math.log10(t) - 1684915 / (t * t);
        double log10K2 = -107.8871 - 0.03252849 * t + 5151.79 / t + 38.92561 * Math.log10(t) - 563713.9 / (t * t);
        assertEquals(-log10K1, libraryPKa("carbonate", 0, celsius), 0.005, "pK1");
        assertEquals(-log10K2, libraryPKa("carbonate", 1, celsius), 0.005, "pK2");
    }

    /** Boric acid, Manov, DeLollis and Acree, J. Res. Natl. Bur. Stand. 33 (1944) 287: pK = 2237.94/T + 0.016883 T − 3.305. */
    @ParameterizedTest(name = "borate pK at {0} °C")
    @ValueSource(doubles = {5, 25, 37})
    void borateFollowsManov(double celsius) {
        double t = celsius + 273.15;
        assertEquals(2237.94 / t + 0.016883 * t - 3.305, libraryPKa("borate", 0, celsius), 0.005);
    }

    /**
     * Lactic acid, Martin and Tartar's determination as given in the ECHA registration dossier for lactic acid
     * (section 4.22): pKa = 3.857 + 5·10⁻⁵ (t/°C − 22.5)².
     */
    @ParameterizedTest(name = "lactate pK at {0} °C")
    @ValueSource(doubles = {5, 25, 37})
    void lactateFollowsMartinAndTartar(double celsius) {
        assertEquals(3.857 + 5e-5 * Math.pow(celsius - 22.5, 2), libraryPKa("lactate", 0, celsius), 0.003);
    }

    /**
     * MOPS, Roy et al., J. Solution Chem. (NaMOPS, emf 5 to 55 °C), abstract: pK2 7.18 at 25 °C and 7.044 at 37 °C
     * (the 25 °C value printed to 0.01). The abstract prints no 5 °C value.
     */
    @ParameterizedTest(name = "MOPS pK at {0} °C")
    @ValueSource(doubles = {25, 37})
    void mopsAgreesWithRoyAt25And37Celsius(double celsius) {
        assertEquals(celsius == 25 ? 7.18 : 7.044, libraryPKa("MOPS", 0, celsius), 0.01);
    }

    /**
     * Citric acid, "Dissociation quotients for citric acid in aqueous sodium chloride media to 150 °C", J. Solution
     * Chem. (1997), doi:10.1007/BF02439444, abstract, at infinite dilution and 25 °C: pK 3.127, 4.759, 6.397;
     * ΔH° 4.1, 2.2, −3.6 kJ/mol; ΔCp° −162, −192, −231 J/(K·mol).
     */
    @ParameterizedTest(name = "citrate pK1–pK3 at {0} °C")
    @ValueSource(doubles = {5, 25, 37})
    void citrateFollowsItsSourcesThermodynamics(double celsius) {
        double[] pK = {3.127, 4.759, 6.397};
        double[] dH = {4100, 2200, -3600};
        double[] dCp = {-162, -192, -231};
        for (int i = 0; i < 3; i++) {
            assertEquals(fromThermodynamics(pK[i], dH[i], dCp[i], celsius), libraryPKa("citrate", i, celsius), 0.003,
                    "pK" + (i + 1));
        }
    }

    /**
     * Succinic acid, J. Solution Chem. 24 (1995), doi:10.1007/BF00973050, abstract, 25 °C: pK 4.210 and 5.638,
     * ΔH° 2.9 and −0.5 kJ/mol, ΔCp° −98 and −215 J/(K·mol).
     */
    @ParameterizedTest(name = "succinate pK1 and pK2 at {0} °C")
    @ValueSource(doubles = {5, 25, 37})
    void succinateFollowsItsSourcesThermodynamics(double celsius) {
        assertEquals(fromThermodynamics(4.210, 2900, -98, celsius), libraryPKa("succinate", 0, celsius), 0.003, "pK1");
        assertEquals(fromThermodynamics(5.638, -500, -215, celsius), libraryPKa("succinate", 1, celsius), 0.003, "pK2");
    }

    /**
     * Tris, J. Solution Chem. 16 (1987), doi:10.1007/BF00646335, abstract, 25 °C, for the association reaction:
     * ΔH° −47.53 kJ/mol, ΔC°p 67 J/(K·mol), log K 8.071 (printed 8.701; the printed ΔH° and ΔS° give 8.071).
     * Signs reversed for the dissociation.
     */
    @ParameterizedTest(name = "Tris pK at {0} °C")
    @ValueSource(doubles = {5, 25, 37})
    void trisFollowsItsSourcesThermodynamics(double celsius) {
        assertEquals(fromThermodynamics(8.071, 47530, -67, celsius), libraryPKa("Tris", 0, celsius), 0.003);
    }

    /**
     * Tris against an independent emf series, every 5 K from 0 to 50 °C: Bates and Hetzer, J. Phys. Chem. 65 (1961)
     * 667, graded Reliable, as digitized in the IUPAC dissociation-constant dataset (github.com/IUPAC/
     * Dissociation-Constants, iupac_high-confidence_v2_4.csv, commit e099d8d9, row perrin144). The library's Tris is
     * read from another study, so this checks it against a second measurement, within 0.01.
     */
    @Test
    void trisAgreesWithBatesAndHetzerFrom0To50Celsius() {
        double[] printed = {8.85, 8.6774, 8.5164, 8.3616, 8.2138, 8.0746, 7.9344, 7.8031, 7.6772, 7.5543, 7.4365};
        for (int i = 0; i < printed.length; i++) {
            assertEquals(printed[i], libraryPKa("Tris", 0, 5.0 * i), 0.01, "Tris at " + 5 * i + " °C");
        }
    }

    /**
     * Glycine, pK 2.350 and 9.780 at 25 °C (Kaye and Laby, Tables of Physical and Chemical Constants, 3.9.7, after
     * Robinson and Stokes 1970), calorimetric ΔH° 4.4 and 46.3 kJ/mol (Thermochim. Acta 448 (2006) 44, abstract); no
     * ΔCp° was read, so none is integrated (its stated default uncertainty is what covers it).
     */
    @ParameterizedTest(name = "glycine pK1 and pK2 at {0} °C")
    @ValueSource(doubles = {5, 25, 37})
    void glycineFollowsItsSourcesThermodynamics(double celsius) {
        assertEquals(fromThermodynamics(2.350, 4400, 0, celsius), libraryPKa("glycine", 0, celsius), 0.003, "pK1");
        assertEquals(fromThermodynamics(9.780, 46300, 0, celsius), libraryPKa("glycine", 1, celsius), 0.003, "pK2");
    }

    /**
     * Oxalic acid at 25 °C: the first step from Kettler, Palmer and Wesolowski, J. Solution Chem. 20 (1991), no. 9,
     * abstract (pK 1.277, ΔH° −4.1 kJ/mol, ΔCp° −168 J/(K·mol)), the second from the same group's later fit, J. Chem.
     * Eng. Data 43 (1998) 337, abstract (4.264, −7.3 kJ/mol, −229 J/(K·mol)); the library's source text says why.
     */
    @ParameterizedTest(name = "oxalate pK1 and pK2 at {0} °C")
    @ValueSource(doubles = {5, 25, 37})
    void oxalateFollowsItsSourcesThermodynamics(double celsius) {
        assertEquals(fromThermodynamics(1.277, -4100, -168, celsius), libraryPKa("oxalate", 0, celsius), 0.003, "pK1");
        assertEquals(fromThermodynamics(4.264, -7300, -229, celsius), libraryPKa("oxalate", 1, celsius), 0.003, "pK2");
    }

    /**
     * Phosphate, second and third steps: pK 7.1965 (Partanen and Minkkinen, Acta Chem. Scand. 50 (1996) 1081,
     * abstract) and 12.375 (Kaye and Laby 3.9.7); ΔH° 3.600 and 18.200 − 3.600 kJ/mol (CODATA 1989 as tabulated in the
     * Thermoddem V1.10 database file); ΔCp° from the species heat capacities of Shock and Helgeson 1988 and Shock et
     * al. 1997 as tabulated in the OBIGT database file, −215 and −277 J/(K·mol).
     */
    @ParameterizedTest(name = "phosphate pK2 and pK3 at {0} °C")
    @ValueSource(doubles = {5, 25, 37})
    void phosphateSecondAndThirdStepsFollowTheirSourcesThermodynamics(double celsius) {
        assertEquals(fromThermodynamics(7.1965, 3600, -215, celsius), libraryPKa("phosphate", 1, celsius), 0.003,
                "pK2");
        assertEquals(fromThermodynamics(12.375, 14600, -277, celsius), libraryPKa("phosphate", 2, celsius), 0.003,
                "pK3");
    }

    /**
     * Acetic acid: pK 4.757 and ΔH° −0.41 kJ/mol (MINTEQA2 version 4, NIST SRD 46), ΔCp° −144 J/(K·mol) from the
     * species heat capacities of Shock 1995 as tabulated in the OBIGT database file.
     */
    @ParameterizedTest(name = "acetate pK at {0} °C")
    @ValueSource(doubles = {5, 25, 37})
    void acetateFollowsItsSourcesThermodynamics(double celsius) {
        assertEquals(fromThermodynamics(4.757, -410, -144, celsius), libraryPKa("acetate", 0, celsius), 0.003);
    }

    /**
     * L-Histidine, the three steps from the standard molal properties of its four protonation states in the OBIGT
     * database file (Kitadai, Origins Life Evol. Biospheres 45 (2015) 377; Amend and Helgeson, J. Chem. Soc., Faraday
     * Trans. 93 (1997) 1927), cal/mol and cal/(K·mol) as printed, converted with 4.184 J/cal:
     * His+2 −58750, −116300, 87.8; His+ −56570, −115300, 59.1; His −48420, −108200, 56.2; His− −35760, −97700, 37.9
     * (ΔfG°, ΔfH°, Cp°).
     */
    @ParameterizedTest(name = "histidine pK1, pK2 and pK3 at {0} °C")
    @ValueSource(doubles = {5, 25, 37})
    void histidineFollowsItsSourcesThermodynamics(double celsius) {
        double[][] gHCp = {{-58750, -116300, 87.8}, {-56570, -115300, 59.1}, {-48420, -108200, 56.2},
            {-35760, -97700, 37.9}};
        for (int k = 0; k < 3; k++) {
            double pK = (gHCp[k + 1][0] - gHCp[k][0]) * 4.184 / (R * T_REF * Math.log(10));
            double deltaH = (gHCp[k + 1][1] - gHCp[k][1]) * 4.184;
            double deltaCp = (gHCp[k + 1][2] - gHCp[k][2]) * 4.184;
            assertEquals(fromThermodynamics(pK, deltaH, deltaCp, celsius), libraryPKa("histidine", k, celsius), 0.003,
                    "pK" + (k + 1));
        }
    }

    /** HEPES and MES at 25 °C, Vega and Bates, Anal. Chem. 48 (1976) 1293, abstract: pK2 7.565 and 6.270. */
    @Test
    void goodsBuffersAgreeWithVegaAndBatesAt25Celsius() {
        assertEquals(7.565, libraryPKa("HEPES", 0, 25), 0.003, "HEPES");
        assertEquals(6.270, libraryPKa("MES", 0, 25), 0.003, "MES");
    }
}
