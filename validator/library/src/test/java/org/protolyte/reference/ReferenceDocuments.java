package org.protolyte.reference;

import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

import org.protolyte.Protolyte;
import org.protolyte.analysis.ConditionResult;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.report.DocumentReport;
import org.protolyte.report.Status;
import org.protolyte.substance.LibraryLoader;

/** Builds molal formulation documents of reference solutions and runs them through the whole flow. */
final class ReferenceDocuments {

    private static final SchemaCatalog SCHEMAS = new SchemaCatalog();
    private static final Protolyte PROTOLYTE = new Protolyte(SCHEMAS, LibraryLoader.shipped(SCHEMAS));

    private final Map<String, Double> molalities = new LinkedHashMap<>();

    static ReferenceDocuments solution() {
        return new ReferenceDocuments();
    }

    /**
     * A pH standard in the composition of Buck et al., Pure Appl. Chem. 74 (2002) 2169, Tables 2 and 3, by a short
     * name; saturated potassium hydrogen tartrate at its 25 °C molality, 0.0341 mol/kg (common practice).
     */
    static ReferenceDocuments standard(String name) {
        return switch (name) {
            case "tartrate" -> solution().with("potassium hydrogen tartrate", 0.0341);
            case "citrate" -> solution().with("potassium dihydrogen citrate", 0.05);
            case "phthalate" -> solution().with("potassium hydrogen phthalate", 0.05);
            case "equimolal phosphate" -> solution()
                    .with("potassium dihydrogen phosphate", 0.025).with("disodium hydrogen phosphate anhydrous", 0.025);
            case "physiological phosphate" -> solution()
                    .with("potassium dihydrogen phosphate", 0.008695).with("disodium hydrogen phosphate anhydrous", 0.03043);
            case "borax" -> solution().with("disodium tetraborate decahydrate", 0.01);
            case "carbonate" -> solution()
                    .with("sodium hydrogen carbonate", 0.025).with("sodium carbonate anhydrous", 0.025);
            case "tetroxalate" -> solution().with("potassium tetroxalate dihydrate", 0.05);
            case "calcium hydroxide" -> solution().with("calcium hydroxide", 0.0203);
            case "Tris" -> solution().with("Tris", 0.01667).with("Tris hydrochloride", 0.05);
            case "acetate" -> solution().with("acetic acid", 0.1).with("sodium acetate anhydrous", 0.1);
            default -> throw new IllegalArgumentException("no such standard: " + name);
        };
    }

    ReferenceDocuments with(String substance, double molKg) {
        molalities.put(substance, molKg);
        return this;
    }

    /** The document: 1 kg of water, the molalities, one condition per temperature (°C). */
    String json(double... celsius) {
        StringBuilder c = new StringBuilder();
        molalities.forEach((s, m) -> c.append(c.length() == 0 ? "" : ",\n").append(String.format(Locale.ROOT,
                "    {\"substance\": \"%s\", \"amount\": {\"value\": %s, \"unit\": \"mol/kg\"}}", s, m)));
        StringBuilder t = new StringBuilder();
        for (double x : celsius) {
            t.append(t.length() == 0 ? "" : ",\n").append(String.format(Locale.ROOT,
                    "    {\"name\": \"T%s\", \"temperature\": \"%s Cel\"}", x, x));
        }
        return "{\n  \"document\": \"formulation\", \"formatVersion\": 1, \"id\": \"REF\",\n"
                + "  \"basis\": {\"waterMass\": \"1 kg\"},\n  \"components\": [\n" + c + "\n  ],\n"
                + "  \"conditions\": [\n" + t + "\n  ]\n}\n";
    }

    /** pH at each temperature; fails loudly if the document is not determinate. */
    double[] pH(double... celsius) {
        DocumentReport r = PROTOLYTE.check("reference", json(celsius).getBytes(StandardCharsets.UTF_8));
        if (r.status() != Status.PASS) {
            throw new AssertionError("reference document is " + r.status() + ": " + r.findings() + r.diagnostics());
        }
        return r.analysis().orElseThrow().conditions().stream()
                .mapToDouble(cr -> cr.state().orElseThrow().pH()).toArray();
    }

    ConditionResult condition(double celsius) {
        DocumentReport r = PROTOLYTE.check("reference", json(celsius).getBytes(StandardCharsets.UTF_8));
        return r.analysis().orElseThrow().conditions().get(0);
    }
}
