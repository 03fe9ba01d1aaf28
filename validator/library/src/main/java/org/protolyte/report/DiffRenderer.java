package org.protolyte.report;

import java.util.Locale;

import tools.jackson.databind.SerializationFeature;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/** A revision comparison as text for a reviewer, or as JSON for a change-control system. */
public final class DiffRenderer {

    private static final String NL = System.lineSeparator();

    public String text(RevisionDiff d) {
        StringBuilder b = new StringBuilder();
        b.append("Protolyte ").append(toolVersion()).append(" — revision comparison").append(NL);
        b.append("  old: ").append(label(d.before())).append(NL);
        b.append("  new: ").append(label(d.after())).append(NL);
        d.basis().ifPresent(x -> b.append(NL).append(Printable.text(x)).append(NL));
        b.append(NL).append("components (mmol per L of solution or kg of water):").append(d.components().isEmpty() ? " unchanged" : "").append(NL);
        for (RevisionDiff.ComponentChange c : d.components()) {
            switch (c.kind()) {
                case ADDED -> b.append(String.format(Locale.ROOT, "  + %s: %s (%.4g mmol)%n", Printable.text(c.substance()),
                        Printable.text(c.now().orElse("")), c.mmolAfter()));
                case REMOVED -> b.append(String.format(Locale.ROOT, "  - %s: %s (%.4g mmol)%n", Printable.text(c.substance()),
                        Printable.text(c.was().orElse("")), c.mmolBefore()));
                case CHANGED -> b.append(String.format(Locale.ROOT, "  ~ %s: %s → %s (%.4g → %.4g mmol, %+.1f %%)%n",
                        Printable.text(c.substance()), Printable.text(c.was().orElse("")),
                        Printable.text(c.now().orElse("")), c.mmolBefore(), c.mmolAfter(),
                        (c.mmolAfter() / c.mmolBefore() - 1) * 100));
                default -> throw new IllegalStateException();
            }
        }
        b.append(NL).append("predicted values:").append(d.values().isEmpty() ? " unchanged" : "").append(NL);
        for (RevisionDiff.ValueChange v : d.values()) {
            b.append(String.format(Locale.ROOT, "  %-24s %-16s %10s → %-10s (%s)%s%n", Printable.text(v.where()),
                    Printable.text(v.quantity()),
                    num(v.before()), num(v.after()), Double.isNaN(v.delta()) ? "—" : String.format(Locale.ROOT, "%+.3g",
                            v.delta()), v.unit().isEmpty() ? "" : " " + Printable.text(v.unit())));
        }
        b.append(NL).append(String.format(Locale.ROOT, "species that moved (share of their component, more than %.0f "
                + "percentage points):", RevisionDiff.SPECIES_MOVED * 100)).append(d.species().isEmpty() ? " none" : "")
                .append(NL);
        for (RevisionDiff.SpeciesChange s : d.species()) {
            b.append(String.format(Locale.ROOT, "  %-24s %-16s %5.1f %% → %5.1f %% of %s%n", s.where(), s.species(),
                    s.before() * 100, s.after() * 100, s.component()));
        }
        b.append(NL).append("findings:").append(d.findings().isEmpty() ? " unchanged" : "").append(NL);
        for (RevisionDiff.FindingChange f : d.findings()) {
            String sev = f.before().map(s -> s.code()).orElse("—") + " → " + f.after().map(s -> s.code()).orElse("cleared");
            b.append(String.format(Locale.ROOT, "  %s %s [%s] %s%n      %s%n", f.kind() == RevisionDiff.Kind.ADDED ? "+"
                    : f.kind() == RevisionDiff.Kind.REMOVED ? "-" : "~", Printable.text(f.rule()), Printable.text(f.subject()), sev,
                    Printable.text(f.message())));
        }
        b.append(NL).append(RunReport.CAUTION).append(NL);
        return b.toString();
    }

    public String json(RevisionDiff d, int exitCode) {
        JsonMapper mapper = JsonMapper.builder().enable(SerializationFeature.INDENT_OUTPUT).build();
        ObjectNode root = mapper.createObjectNode();
        root.putObject("tool").put("name", "Protolyte").put("version", toolVersion()).put("caution", RunReport.CAUTION);
        document(root.putObject("old"), d.before());
        document(root.putObject("new"), d.after());
        d.basis().ifPresent(x -> root.put("basis", x));
        ArrayNode comps = root.putArray("components");
        for (RevisionDiff.ComponentChange c : d.components()) {
            ObjectNode o = comps.addObject().put("change", c.kind().name().toLowerCase(Locale.ROOT))
                    .put("substance", c.substance());
            c.was().ifPresent(x -> o.put("was", x));
            c.now().ifPresent(x -> o.put("now", x));
            finite(o, "mmolBefore", c.mmolBefore());
            finite(o, "mmolAfter", c.mmolAfter());
        }
        ArrayNode values = root.putArray("values");
        for (RevisionDiff.ValueChange v : d.values()) {
            ObjectNode o = values.addObject().put("where", v.where()).put("quantity", v.quantity()).put("unit", v.unit());
            finite(o, "before", v.before());
            finite(o, "after", v.after());
        }
        ArrayNode species = root.putArray("species");
        for (RevisionDiff.SpeciesChange s : d.species()) {
            ObjectNode o = species.addObject().put("where", s.where()).put("component", s.component())
                    .put("species", s.species());
            finite(o, "shareBefore", s.before());
            finite(o, "shareAfter", s.after());
        }
        root.put("speciesThreshold", RevisionDiff.SPECIES_MOVED);
        ArrayNode findings = root.putArray("findings");
        for (RevisionDiff.FindingChange f : d.findings()) {
            ObjectNode o = findings.addObject().put("change", f.kind().name().toLowerCase(Locale.ROOT))
                    .put("rule", f.rule()).put("subject", f.subject()).put("message", f.message());
            f.before().ifPresent(s -> o.put("before", s.code()));
            f.after().ifPresent(s -> o.put("after", s.code()));
        }
        root.put("exitCode", exitCode);
        return mapper.writeValueAsString(root) + NL;
    }

    private static void document(ObjectNode o, DocumentReport r) {
        o.put("source", r.source());
        r.sha256().ifPresent(x -> o.put("sha256", x));
        r.id().ifPresent(x -> o.put("id", x));
        r.analysis().flatMap(a -> a.recipe().formulation().revision()).ifPresent(x -> o.put("revision", x));
        o.put("status", r.status().code());
    }

    private static void finite(ObjectNode o, String field, double x) {
        if (Double.isFinite(x)) {
            o.put(field, Numbers.significant(x, 5));
        } else {
            o.putNull(field);
        }
    }

    private static String num(double x) {
        return Double.isNaN(x) ? "—" : Numbers.significant(x, 4).toPlainString();
    }

    private static String label(DocumentReport r) {
        String rev = r.analysis().flatMap(a -> a.recipe().formulation().revision()).map(x -> " revision " + x).orElse("");
        return Printable.text(r.source() + r.id().map(x -> " [" + x + rev + "]").orElse("")) + " " + r.status().code();
    }

    private static String toolVersion() {
        return org.protolyte.Protolyte.version();
    }
}
