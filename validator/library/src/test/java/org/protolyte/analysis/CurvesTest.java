package org.protolyte.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.protolyte.Protolyte;
import org.protolyte.chemistry.Thermo;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.substance.LibraryLoader;

/**
 * The points behind the plots against the engine itself: the titration passes through the q.s. point at the target
 * pH, its slope is the buffer capacity the engine reports, and the temperature sweep meets each condition's pH.
 * Invented recipes (Tris titrated with HCl; acetate), not data: the checks are of consistency between two routes.
 */
class CurvesTest {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS)).withCurves();

    private static FormulationAnalysis analysis(String components, String target, String conditions) {
        String json = "{\"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"TST-CURVES\","
                + " \"basis\": {\"finalVolume\": \"1 L\"}, \"components\": [" + components + "]"
                + ", \"targets\": {\"pH\": " + target + "}, \"conditions\": [" + conditions + "]}";
        return PROTOLYTE.check("test", json.getBytes(StandardCharsets.UTF_8)).analysis().orElseThrow();
    }

    private static final String TRIS_HCL = "{\"substance\": \"Tris\", \"amount\": \"50 mmol/L\"},"
            + " {\"substance\": \"hydrochloric acid\", \"stock\": {\"concentration\": \"1 mol/L\"},"
            + " \"adjustTo\": {\"temperature\": \"25 Cel\"}}";
    private static final String AT_25 = "{\"value\": 7.9, \"tolerance\": 0.1, \"temperature\": \"25 Cel\"}";
    private static final String CONDITIONS = "{\"name\": \"preparation\", \"temperature\": \"25 Cel\"},"
            + " {\"name\": \"storage\", \"temperature\": \"5 Cel\"}";

    /** Linear interpolation of y at x on a curve whose x rises. */
    private static double at(double[] xs, double[] ys, double x) {
        for (int i = 1; i < xs.length; i++) {
            if (xs[i] >= x) {
                double f = (x - xs[i - 1]) / (xs[i] - xs[i - 1]);
                return ys[i - 1] + f * (ys[i] - ys[i - 1]);
            }
        }
        throw new AssertionError(x + " is beyond the curve");
    }

    @Test
    void titrationPassesThroughTheQsPointAtTheTargetPH() {
        Curves c = analysis(TRIS_HCL, AT_25, CONDITIONS).curves().orElseThrow();
        List<Curves.TitrationPoint> t = c.titration();
        assertEquals(CurveTracer.TITRATION_POINTS, t.size(), "every point of the Tris titration solves");
        assertEquals(25.0, c.titrationKelvin() - Thermo.KELVIN_OFFSET, 1e-9);
        double qs = c.qsAdded().orElseThrow();
        assertTrue(qs < 0, "HCl is strong acid: a negative dose, " + qs);
        assertEquals(7.9, c.qsPH().orElseThrow(), 1e-6, "the q.s. meets the target's midpoint at its temperature");
        double[] added = t.stream().mapToDouble(Curves.TitrationPoint::added).toArray();
        double[] pH = t.stream().mapToDouble(Curves.TitrationPoint::pH).toArray();
        // the curve adds HCl as its strong ion without the stock's water: 27 mL in 1 L moves Tris' pH by < 0.005
        assertEquals(7.9, at(added, pH, qs), 0.005);
        assertTrue(pH[0] < 7.9 - 1.4 && pH[pH.length - 1] > 7.9 + 1.4, "the curve spans the target ± 1.5 pH");
    }

    /**
     * β = dC/dpH: the titration's own slope, by central differences, against the β the curve gives (from the implicit
     * derivatives) at three points; and against the condition's β, which holds the activity coefficients fixed, at the
     * q.s. point, within the few per cent that the added HCl's change of ionic strength makes.
     */
    @Test
    void slopeOfTheTitrationIsTheBufferCapacity() {
        FormulationAnalysis a = analysis(TRIS_HCL, AT_25, CONDITIONS);
        Curves c = a.curves().orElseThrow();
        List<Curves.TitrationPoint> t = c.titration();
        for (int i : new int[] {t.size() / 4, t.size() / 2, 3 * t.size() / 4}) {
            double slope = (t.get(i + 1).added() - t.get(i - 1).added()) / (t.get(i + 1).pH() - t.get(i - 1).pH());
            assertEquals(t.get(i).bufferCapacity(), slope, 0.005 * t.get(i).bufferCapacity(), "at pH " + t.get(i).pH());
        }
        double[] added = t.stream().mapToDouble(Curves.TitrationPoint::added).toArray();
        double[] beta = t.stream().mapToDouble(Curves.TitrationPoint::bufferCapacity).toArray();
        double atQs = at(added, beta, c.qsAdded().orElseThrow());
        double condition = a.conditions().get(0).bufferCapacityPerLitre() * 1000;
        assertEquals(condition, atQs, 0.05 * condition, "the titration's β near the condition's at the q.s. point");
    }

    @Test
    void formsOfTheBufferingSystemAddUpAndCrossNearItsPKa() {
        FormulationAnalysis a = analysis(TRIS_HCL, AT_25, CONDITIONS);
        Curves c = a.curves().orElseThrow();
        assertEquals(List.of("Tris: TrisH+", "Tris: Tris"), c.forms());
        for (Curves.TitrationPoint p : c.titration()) {
            assertEquals(1.0, p.fractions().get(0) + p.fractions().get(1), 1e-9, "at pH " + p.pH());
        }
        double[] pH = c.titration().stream().mapToDouble(Curves.TitrationPoint::pH).toArray();
        double[] acid = c.titration().stream().mapToDouble(p -> p.fractions().get(0)).toArray();
        double cross = Double.NaN;
        for (int i = 1; i < pH.length; i++) {
            if (acid[i - 1] >= 0.5 && acid[i] < 0.5) {
                cross = pH[i - 1] + (0.5 - acid[i - 1]) / (acid[i] - acid[i - 1]) * (pH[i] - pH[i - 1]);
            }
        }
        double pKa = a.conditions().get(0).buffers().get(0).nearestPKa();
        // equal amounts at pH = pKa + log10(γ(Tris)/γ(TrisH+)): γ(TrisH+) < 1 puts the crossing above the pKa, by
        // 0.08 at I ≈ 0.03 mol/kg (Davies), far less than the 1.5 pH the curve spans
        assertTrue(cross > pKa && cross < pKa + 0.15, "forms cross at " + cross + ", pKa " + pKa);
    }

    @Test
    void temperatureSweepMeetsEachClosedConditionsPH() {
        FormulationAnalysis a = analysis(TRIS_HCL, AT_25, CONDITIONS);
        Curves c = a.curves().orElseThrow();
        assertEquals(CurveTracer.TEMPERATURE_POINTS, c.temperature().size());
        for (ConditionResult r : a.conditions()) {
            double celsius = r.condition().kelvin() - Thermo.KELVIN_OFFSET;   // 25 and 5 °C lie on the 2.5 K grid
            Curves.TemperaturePoint p = c.temperature().stream()
                    .filter(x -> Math.abs(x.kelvin() - r.condition().kelvin()) < 1e-9).findFirst().orElseThrow();
            assertEquals(r.state().orElseThrow().pH(), p.pH(), 1e-9, "at " + celsius + " °C");
        }
        assertTrue(c.validToKelvin() > c.validFromKelvin(), "Tris' constants have a data range");
    }
}
