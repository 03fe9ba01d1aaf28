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
