package org.protolyte.report;

import java.util.Locale;

import org.protolyte.analysis.Robustness;
import org.protolyte.recipe.Recipe;

import tools.jackson.databind.SerializationFeature;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/** The robustness study as text for a formulation scientist, or JSON. */
public final class RobustnessRenderer {

    private static final String NL = System.lineSeparator();

    public String text(String source, Recipe recipe, Robustness.Result r) {
        StringBuilder b = new StringBuilder();
        Robustness.Settings s = r.settings();
        b.append("Protolyte ").append(org.protolyte.Protolyte.version()).append(" — robustness of ").append(Printable.text(source))
                .append(" [").append(Printable.text(recipe.formulation().id())).append("]").append(NL);
        b.append(String.format(Locale.ROOT, "  %d batches simulated (%d solved), seed %d; weighing ±%.3g %% uniform by "
                        + "default, meter reading σ %.3g pH%n", s.samples(), r.samplesSolved(), s.seed(),
                s.defaultTolerance() * 100, s.meterStandardUncertainty()));
        if (r.samplesSolved() == 0) {
            b.append("  INDETERMINATE: no batch could be solved within the engine's limits; 'protolyte check' gives "
                    + "the diagnostics").append(NL).append(RunReport.CAUTION).append(NL);
            return b.toString();
        }
        b.append(String.format(Locale.ROOT, "  %-12s %-26s %-22s %-18s %-10s %-22s %s%n", "condition",
                "pH batch mean [2.5–97.5 %]", "β mmol/L/pH [2.5–97.5]", "mOsm/kg [2.5–97.5]", "P(outside)",
                "systematic pH [2.5–97.5]", "worst corners"));
        for (Robustness.ConditionRobustness c : r.conditions()) {
            b.append(String.format(Locale.ROOT, "  %-12s %-26s %-22s %-18s %-10s %-22s %.3f … %.3f%n", Printable.text(c.condition()),
                    String.format(Locale.ROOT, "%.3f [%.3f–%.3f]", c.pH().mean(), c.pH().p025(), c.pH().p975()),
                    String.format(Locale.ROOT, "%.3g [%.3g–%.3g]", c.bufferCapacity().mean(), c.bufferCapacity().p025(),
                            c.bufferCapacity().p975()),
                    String.format(Locale.ROOT, "%.0f [%.0f–%.0f]", c.osmolality().mean(), c.osmolality().p025(),
                            c.osmolality().p975()),
                    c.probabilityOutsideTarget().isPresent()
                            ? String.format(Locale.ROOT, "%.1f %%", c.probabilityOutsideTarget().getAsDouble() * 100) : "—",
                    String.format(Locale.ROOT, "%.3f [%.3f–%.3f]", c.systematicPH().mean(), c.systematicPH().p025(),
                            c.systematicPH().p975()),
                    c.lowestCornerPH(), c.highestCornerPH()));
        }
        b.append("  dpH per +1 % of each component (q.s. dosed again):").append(NL);
        for (Robustness.ConditionRobustness c : r.conditions()) {
            StringBuilder line = new StringBuilder();
            c.sensitivities().entrySet().stream().sorted((x, y) -> Double.compare(Math.abs(y.getValue()), Math.abs(x.getValue())))
                    .limit(4).forEach(e -> line.append(line.length() == 0 ? "" : ", ")
                            .append(String.format(Locale.ROOT, "%s %+.4f", Printable.text(e.getKey()), e.getValue())));
            b.append("    ").append(Printable.text(c.condition())).append(": ").append(line.length() == 0 ? "—" : line).append(NL);
        }
        b.append("  Batch-to-batch figures come from the tolerances; the systematic column is the uncertainty of the "
                + "published constants, the same for every batch, and is not in P(outside).").append(NL);
        b.append(RunReport.CAUTION).append(NL);
        return b.toString();
    }

    public String json(String source, Recipe recipe, Robustness.Result r) {
        JsonMapper mapper = JsonMapper.builder().enable(SerializationFeature.INDENT_OUTPUT).build();
        ObjectNode root = mapper.createObjectNode();
        root.putObject("tool").put("name", "Protolyte").put("version", org.protolyte.Protolyte.version())
                .put("caution", RunReport.CAUTION);
        root.put("source", source).put("id", recipe.formulation().id());
        Robustness.Settings s = r.settings();
        root.putObject("settings").put("samples", s.samples()).put("seed", s.seed())
                .put("defaultTolerance", s.defaultTolerance()).put("meterStandardUncertainty", s.meterStandardUncertainty());
        root.put("samplesSolved", r.samplesSolved());
        ObjectNode tol = root.putObject("tolerances");
        r.tolerances().forEach(tol::put);
        ArrayNode conditions = root.putArray("conditions");
        for (Robustness.ConditionRobustness c : r.conditions()) {
            ObjectNode o = conditions.addObject().put("name", c.condition());
            interval(o.putObject("pH"), c.pH());
            interval(o.putObject("bufferCapacity"), c.bufferCapacity());
            interval(o.putObject("osmolality"), c.osmolality());
            c.probabilityOutsideTarget().ifPresent(p -> o.put("probabilityOutsideTarget", p));
            interval(o.putObject("systematicPH"), c.systematicPH());
            o.put("lowestCornerPH", c.lowestCornerPH()).put("highestCornerPH", c.highestCornerPH());
            ObjectNode sens = o.putObject("dpHPerPercent");
            c.sensitivities().forEach(sens::put);
        }
        return mapper.writeValueAsString(root) + NL;
    }

    private static void interval(ObjectNode o, Robustness.Interval i) {
        o.put("mean", i.mean()).put("standardDeviation", i.standardDeviation()).put("p2_5", i.p025())
                .put("p97_5", i.p975());
    }
}
