package org.protolyte.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.protolyte.plugin.Plugins;
import org.protolyte.analysis.BufferContribution;
import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.analysis.TitrantResult;
import org.protolyte.batch.BatchAnalysis;
import org.protolyte.chemistry.Component;
import org.protolyte.chemistry.EquilibriumState;
import org.protolyte.chemistry.SolidPhase;
import org.protolyte.chemistry.SpeciesAmount;
import org.protolyte.document.Formulation;
import org.protolyte.rules.Finding;

/** The report as a person reads it in a terminal: what to set on the meter first, then the numbers. */
public final class TextRenderer {

    private static final String NL = System.lineSeparator();
    /** The systems shown per condition carry this share of the buffer capacity; the rest behind "--species all". */
    private static final double SHOWN_SHARE = 0.95;
    /** Forms shown per system, the largest first. */
    private static final int SHOWN_FORMS = 2;

    /** Columns of a terminal line: prose wraps here; only a name or a number longer than a line runs past it. */
    static final int WIDTH = 100;

    private final boolean allSpecies;
    private final Optional<org.protolyte.units.Quantity> batchSize;

    /** The main forms only: the systems that carry 95 % of β, at most two forms each. */
    public TextRenderer() {
        this(false);
    }

    /** @param allSpecies every system and every form of at least 5 % */
    public TextRenderer(boolean allSpecies) {
        this(allSpecies, Optional.empty());
    }

    /** @param batchSize the batch the weigh sheet also gives amounts for (--batch-size) */
    public TextRenderer(boolean allSpecies, Optional<org.protolyte.units.Quantity> batchSize) {
        this.allSpecies = allSpecies;
        this.batchSize = batchSize;
    }

    /**
     * {@code text} broken at spaces into lines of at most {@link #WIDTH} columns, the first after {@code first}, the
     * others after {@code rest}; each line ends with a line separator.
     */
    static String wrap(String first, String rest, String text) {
        StringBuilder b = new StringBuilder(first);
        int column = first.length();
        boolean empty = true;
        for (String word : text.split(" ")) {
            if (word.isEmpty()) {
                continue;
            }
            if (!empty && column + 1 + word.length() > WIDTH) {
                b.append(NL).append(rest);
                column = rest.length();
                empty = true;
            }
            if (!empty) {
                b.append(' ');
                column++;
            }
            b.append(word);
            column += word.length();
            empty = false;
        }
        return b.append(NL).toString();
    }

    public String render(RunReport run) {
        StringBuilder b = new StringBuilder();
        b.append(header(run.toolVersion()));
        for (DocumentReport r : run.reports()) {
            b.append(document(r));
        }
        b.append(footer(run.skipped(), run.reports().size(), run::count));
        return b.toString();
    }

    /** Streaming: the first line, each document's block, then the footer. */
    public String header(String version) {
        return header(version, Optional.empty(), List.of());
    }

    /**
     * The tool line, the run date the waivers were judged as of where one was given (--as-of), and each place a site's
     * check kinds or substance libraries came from.
     */
    public String header(String version, Optional<java.time.LocalDate> asOf, List<Plugins.Origin> plugins) {
        StringBuilder b = new StringBuilder("Protolyte " + version + NL + asOf.map(d -> "as of " + d + " (--as-of): "
                + "waiver approval and expiry judged on that date" + NL).orElse(""));
        for (Plugins.Origin o : plugins) {
            List<String> gave = new java.util.ArrayList<>();
            if (!o.checkKinds().isEmpty()) {
                gave.add("check kinds " + String.join(", ", o.checkKinds()));
            }
            if (!o.substanceLibraries().isEmpty()) {
                gave.add("substance libraries " + String.join(", ", o.substanceLibraries()));
            }
            b.append(wrap("plugin ", "  ", p(o.location()) + o.sha256().map(h -> " SHA-256 " + h).orElse("")
                    + ": " + p(String.join("; ", gave))));
        }
        return b.toString();
    }

    public String document(DocumentReport r) {
        StringBuilder b = new StringBuilder(NL);
        document(b, r);
        return b.toString();
    }

    public String footer(List<Skipped> skippedFiles, int documents, java.util.function.ToLongFunction<Status> count) {
        StringBuilder b = new StringBuilder();
        if (!skippedFiles.isEmpty()) {
            b.append(NL);
        }
        for (Skipped skipped : skippedFiles) {
            b.append(wrap("skipped ", "  ", p(skipped.source()) + ": " + p(skipped.reason())));
        }
        b.append(NL).append(String.format(Locale.ROOT, "%d document(s): %d pass, %d fail, %d invalid, %d indeterminate",
                documents, count.applyAsLong(Status.PASS), count.applyAsLong(Status.FAIL),
                count.applyAsLong(Status.INVALID), count.applyAsLong(Status.INDETERMINATE)));
        if (count.applyAsLong(Status.FAULT) > 0) {
            b.append(", ").append(count.applyAsLong(Status.FAULT)).append(" internal fault(s)");
        }
        b.append(NL).append(wrap("", "", RunReport.CAUTION));
        return b.toString();
    }

    private void document(StringBuilder b, DocumentReport r) {
        String head = "== " + p(r.source());
        String tail = r.id().map(id -> "  [" + p(id) + "]").orElse("") + "  " + r.status().code().toUpperCase(Locale.ROOT);
        b.append(head).append(head.length() + tail.length() > WIDTH ? NL + " " : "").append(tail).append(NL);
        r.batch().ifPresent(x -> batch(b, x));
        r.analysis().ifPresent(a -> analysis(b, a, r.batch().isEmpty()));
        if (!r.findings().isEmpty()) {
            b.append("  findings:").append(NL);
            for (Finding f : r.findings()) {
                b.append("    ").append(f.severity().code()).append(" ").append(p(f.rule()));
                f.pointer().ifPresent(x -> b.append("  ").append(x.isEmpty() ? "(document)" : p(x)));
                f.location().ifPresent(l -> b.append(" (line ").append(l.line()).append(", column ")
                        .append(l.column()).append(")"));
                b.append(NL).append(wrap("      ", "      ", p(f.message())));
                f.waivedBy().ifPresent(w -> b.append(wrap("      ", "        ", "WAIVED by " + p(w.approver())
                        + (w.authorGranted() ? " (granted in the document by its author)" : "")
                        + " until " + w.expires() + ": " + p(w.reason()))));
                f.definition().filter(d -> f.severity() != org.protolyte.rules.Severity.NOTE)
                        .flatMap(org.protolyte.rules.Rule::remedy)
                        .ifPresent(rem -> b.append(wrap("      what to do: ", "        ", p(rem))));
            }
        }
        if (!r.diagnostics().isEmpty()) {
            b.append("  diagnostics:").append(NL);
            for (Diagnostic d : r.diagnostics()) {
                b.append("    ").append(d.severity().name().toLowerCase(Locale.ROOT)).append(" ").append(p(d.code()));
                d.condition().ifPresent(c -> b.append(" [").append(p(c)).append("]"));
                b.append(NL).append(wrap("      ", "      ", p(d.message())));
            }
        }
    }

    /** step, addition, recorded, mmol, master mmol, Δ: 90 columns. */
    private static final String BATCH_ROW = "  %-5s %-36s %-14s %10s %11s %8s%n";

    /** A batch record: master and size, each addition against the master, each measurement against prediction. */
    private static void batch(StringBuilder b, BatchAnalysis x) {
        var m = x.record().master();
        b.append(String.format(Locale.ROOT, "  batch %s of %s%s, %s × the master's basis%n", p(x.record().batch()), p(m.id()),
                m.revision().map(r -> " revision " + p(r)).orElse(""), Numbers.significant(x.scale(), 4).toPlainString()));
        b.append(String.format(Locale.ROOT, BATCH_ROW, "step", "addition", "recorded", "mmol", "master mmol", "Δ"));
        for (BatchAnalysis.AdditionCheck c : x.additions()) {
            String step = c.addition().map(a -> String.valueOf(a.step())).orElse("—");
            String name = c.used().or(() -> c.expected()).map(s -> p(s.name())).orElse("?");
            String note = p(note(c));
            String recorded = c.addition().map(a -> p(a.amount().toString())).orElse("—");
            String expected = Double.isFinite(c.expectedMoles()) ? Numbers.significant(c.expectedMoles() * 1000, 5)
                    .toPlainString() : "—";
            String dev = Double.isFinite(c.deviation()) ? String.format(Locale.ROOT, "%+.1f %%", 100 * c.deviation()) : "";
            b.append(String.format(Locale.ROOT, BATCH_ROW, step, name, recorded,
                    Numbers.significant(c.actualMoles() * 1000, 5).toPlainString(), expected, dev));
            if (!note.isEmpty()) {
                b.append(wrap("         (", "          ", note + ")"));     // under the name: the row stays aligned
            }
        }
        if (!x.observations().isEmpty()) {
            b.append("  measured, and predicted from the additions as recorded:").append(NL);
            for (BatchAnalysis.Observation o : x.observations()) {
                b.append(String.format(Locale.ROOT, "    %-50s %14s %14s%n", p(o.label()), o.kind().text(o.measured()),
                        o.kind().text(o.predicted())));
            }
        }
    }

    /** @param formulation a formulation's own analysis (a batch as made has its additions table instead of a weigh sheet) */
    private void analysis(StringBuilder b, FormulationAnalysis a, boolean formulation) {
        Formulation f = a.recipe().formulation();
        String title = f.title().map(Printable::text).orElse("")
                + f.revision().map(rev -> " (revision " + p(rev) + ")").orElse("")
                + f.intendedUse().map(u -> " — " + p(u)).orElse("");
        if (!title.isEmpty()) {
            b.append(wrap("  ", "    ", title.strip()));
        }
        String basis = f.basis().finalVolume()
                ? String.format(Locale.ROOT, "per %s L of solution", Numbers.significant(f.basis().amount(), 6))
                : String.format(Locale.ROOT, "per %s kg of water", Numbers.significant(f.basis().amount(), 6));
        for (TitrantResult t : a.titrants()) {
            if (!t.used() || t.unreachable().isPresent()) {
                continue;
            }
            b.append(wrap("  ", "    ", String.format(Locale.ROOT, "q.s. %s: %s mmol %s", p(t.ingredient().substance().name()),
                    Numbers.significant(t.moles() * 1000, 4).toPlainString(), basis) + (t.stockMillilitres().isPresent()
                    ? String.format(Locale.ROOT, " = %s mL of stock", Numbers.significant(t.stockMillilitres()
                            .getAsDouble(), 4).toPlainString()) : "")));
            boolean explicit = t.ingredient().line().adjustTo().map(x -> x.pH().isPresent()).orElse(false);
            String part = t.atVolume() < 1 ? String.format(Locale.ROOT, " at %.0f %% of the final volume", t.atVolume() * 100)
                    : "";
            t.setpointPH().ifPresent(sp -> b.append(wrap("  ", "    ", String.format(Locale.ROOT,
                    "SETPOINT: adjust to pH %.2f on the meter at %.1f °C%s%s", sp, Numbers.celsius(t.adjustKelvin()),
                    part, explicit ? " (as the document states)" : String.format(Locale.ROOT, " (gives pH %.2f at %.1f °C)",
                            t.goalPH(), Numbers.celsius(t.goalKelvin()))))));
            t.pHAfterMakingUp().ifPresent(x -> b.append(String.format(Locale.ROOT,
                    "  after making up to volume: pH %.2f at %.1f °C%n", x, Numbers.celsius(t.adjustKelvin()))));
        }
        Systems systems = new Systems(a.recipe().library());
        if (formulation) {
            weighSheet(b, WeighSheet.of(a, batchSize));
        }
        conditionTable(b, a.conditions(), systems, allSpecies);
        solids(b, a.conditions());
        a.working().ifPresent(w -> {
            b.append(wrap("  ", "    ", String.format(Locale.ROOT, "working solution, diluted %s-fold with %s:",
                    Numbers.significant(w.dilution().factor(), 4).toPlainString(), p(w.dilution().diluent()))));
            conditionTable(b, w.conditions(), systems, allSpecies);
            solids(b, w.conditions());
            List<String> shifts = new ArrayList<>();
            for (int i = 0; i < a.conditions().size(); i++) {
                int at = i;
                a.dilutionShift(i).ifPresent(x -> shifts.add(String.format(Locale.ROOT, "%s %+.2f",
                        p(a.conditions().get(at).condition().name()), x)));
            }
            if (!shifts.isEmpty()) {
                b.append(wrap("  pH shift on dilution: ", "    ", String.join(", ", shifts)
                        + " (the activity coefficients' change with ionic strength)"));
            }
        });
        String first = a.conditions().isEmpty() ? "" : a.conditions().get(0).condition().name();
        for (var d : a.drifts()) {
            if (!d.from().equals(first)) {
                continue;       // the first condition (where it is made) to each other; every pair is in JSON
            }
            String cause = d.co2Change().map(x -> ", mostly the change of " + p(x)).orElseGet(() -> d.system()
                    .map(x -> String.format(Locale.ROOT, ", mostly %s (dpKa/dT %+.4f per K)", p(x), d.dpKadT())).orElse(""));
            b.append(wrap("  ", "    ", String.format(Locale.ROOT, "drift %s → %s: %+.2f pH%s", p(d.from()), p(d.to()),
                    d.change(), cause)));
        }
        for (ConditionResult c : a.conditions()) {
            List<String> extra = new ArrayList<>();
            if (c.determinate() && c.pHInAir().isPresent()) {
                extra.add(String.format(Locale.ROOT, "in room air pH %.2f", c.pHInAir().getAsDouble()));
            }
            c.loads().ifPresent(l -> extra.add("leaves the target after " + load(l.acidToLeaveTarget(), "acid") + " or "
                    + load(l.baseToLeaveTarget(), "base")));
            if (c.co2ForTarget().isPresent()) {
                extra.add(String.format(Locale.ROOT, "CO2 for the target's midpoint: %.3g kPa",
                        c.co2ForTarget().getAsDouble() / 1000));
            }
            if (!extra.isEmpty()) {
                b.append(wrap("  ", "    ", p(c.condition().name()) + ": " + String.join("; ", extra)));
            }
        }
        for (var pc : a.proteins()) {
            List<String> at = new ArrayList<>();
            pc.conditions().stream().filter(x -> !Double.isNaN(x.netCharge())).forEach(x -> at.add(String.format(
                    Locale.ROOT, "%s %+.1f (%.0f %% of β%s)", p(x.condition()), x.netCharge(), 100 * x.bufferShare(),
                    x.pHShift().isPresent() ? String.format(Locale.ROOT, ", pH %+.2f", x.pHShift().getAsDouble()) : "")));
            b.append(wrap("  ", "    ", String.format(Locale.ROOT, "%s (%.0f g/mol, pKa set '%s'): pI %s at 25 °C; net "
                    + "charge per molecule (share of β, pH shift against the buffer alone with every other amount as "
                    + "it is) %s; each group's pKa in a folded protein is uncertain by about one unit",
                    p(pc.protein().name()), pc.protein().molarMass(), p(pc.protein().pKaSet()),
                    pc.isoelectricPoint().isPresent() ? String.format(Locale.ROOT, "%.2f", pc.isoelectricPoint().getAsDouble())
                            : "none (no acidic or no basic group)", String.join(", ", at))));
        }
        for (var ds : a.drugs()) {
            List<String> at = new ArrayList<>();
            for (var x : ds.conditions()) {
                at.add(String.format(Locale.ROOT, "%s %.3g of %.3g mmol/L (%.0f %%, log10 ± %.2f; %s%s)%s",
                        p(x.condition()), x.dissolved() * 1000, x.solubility() * 1000, 100 * x.fraction(),
                        x.uncertainty(), p(x.limiting().name()), x.inRange() ? "" : ", extrapolated beyond its data",
                        dissolvedRange(x.window())));
            }
            b.append(wrap("  ", "    ", String.format(Locale.ROOT, "%s: dissolved of its solubility at the condition's "
                    + "pH (the solid that limits it): %s%s", p(ds.drug().name()), String.join("; ", at),
                    pHMax(ds))));
        }
        for (var m : a.admixtures()) {
            b.append(wrap("  ", "    ", admixture(m)));
        }
        a.titratableAcidity().ifPresent(t -> b.append(String.format(Locale.ROOT,
                "  titratable %s to pH 7.4 at 37 °C: %.3g mmol/L%s%n", t.mmolPerLitre() >= 0 ? "acidity" : "alkalinity",
                Math.abs(t.mmolPerLitre()), t.mmolPerDose().isPresent() ? String.format(Locale.ROOT, " (%.3g mmol per dose)",
                        Math.abs(t.mmolPerDose().getAsDouble())) : "")));
        if (a.conditions().stream().anyMatch(c -> c.condition().implicit())) {
            b.append("  * condition added by Protolyte (none given, or the pH target's temperature)").append(NL);
        }
        if (a.conditions().stream().anyMatch(c -> c.uncertainty().isPresent())) {
            b.append(wrap("  ", "    ", RunReport.UNCERTAINTY));
        }
        b.append(wrap("  assumed: ", "    ", p(String.join("; ", a.assumptions()))));
    }

    /** Text from the document, a library or a file name, escaped for the terminal. */
    private static String p(String s) {
        return Printable.text(s);
    }

    private static String load(java.util.OptionalDouble mmol, String what) {
        if (mmol.isEmpty()) {
            return "(no limit) " + what;
        }
        return mmol.getAsDouble() == 0 ? "no " + what + " (already outside on that side)"
                : String.format(Locale.ROOT, "%.3g mmol/L of strong %s", mmol.getAsDouble(), what);
    }

    /** The systems that carry 95 % of a condition's β, largest first. */
    static List<BufferContribution> carrying(ConditionResult c) {
        List<BufferContribution> out = new ArrayList<>();
        double carried = 0;
        for (BufferContribution x : c.buffers()) {     // largest first
            if (carried >= SHOWN_SHARE) {
                break;
            }
            out.add(x);
            carried += x.share();
        }
        return out;
    }

    /** What a batch addition is against its master, where it is not the same: missing, extra, another form, the q.s. */
    static String note(BatchAnalysis.AdditionCheck c) {
        return switch (c.match()) {
            case MISSING -> "missing";
            case EXTRA -> "not in the master";
            case OTHER_FORM -> "master: " + c.expected().orElseThrow().name();
            case TITRANT -> "q.s.";
            default -> "";
        };
    }

    /** A form without the name of the substance its system belongs to: "His H+" in "antibody X: His". */
    private static String formLabel(String system, String form) {
        int colon = system.lastIndexOf(": ");
        String owner = colon < 0 ? "" : system.substring(0, colon) + " ";
        return colon > 0 && form.startsWith(owner) ? form.substring(owner.length()) : form;
    }

    /**
     * The forms of each acid–base system (≥ 5 % of it), e.g. "phosphate: H2PO4- 61 %, HPO4-2 39 %": unless all are
     * asked for, only the systems that carry 95 % of β, largest first, with their two largest forms, and a count of
     * the rest.
     */
    /** One admixture: the mixture's pH and osmolarity at the fluid's temperature and CO2, and each drug's margin. */
    static String admixture(FormulationAnalysis.Admixed m) {
        var r = m.result();
        String head = String.format(Locale.ROOT, "mixed %s (product + fluid) at %.1f °C%s: ", p(r.condition().name()),
                Numbers.celsius(r.condition().kelvin()), r.condition().co2Pascal().isPresent()
                        ? String.format(Locale.ROOT, " under %.1f kPa CO2", r.condition().co2Pascal().getAsDouble() / 1000)
                        : ", closed");
        if (!r.determinate()) {
            return head + "no pH: " + p(r.caveats().stream().filter(c -> c.severity() == org.protolyte.chemistry.Caveat
                    .Severity.INDETERMINATE).map(org.protolyte.chemistry.Caveat::message).findFirst().orElse("see the diagnostics"));
        }
        var s = r.state().orElseThrow();
        List<String> parts = new ArrayList<>();
        parts.add(r.uncertainty().map(u -> String.format(Locale.ROOT, "pH %.2f ± %.2f", s.pH(), u.pH()))
                .orElse(String.format(Locale.ROOT, "pH %.2f", s.pH())));
        parts.add(String.format(Locale.ROOT, "%.0f mOsm/L", r.osmolarity() * 1000));
        for (var d : m.drugs()) {
            for (var x : d.conditions()) {
                parts.add(String.format(Locale.ROOT, "%s %.3g of %.3g mmol/L (%.0f %% of its solubility, log10 ± %.2f; "
                        + "%s)%s", p(d.drug().name()), x.dissolved() * 1000, x.solubility() * 1000, 100 * x.fraction(),
                        x.uncertainty(), p(x.limiting().name()), dissolvedRange(x.window())));
            }
        }
        return head + String.join("; ", parts);
    }

    /** ", dissolved above pH a and below b" for a drug's window; where none holds it, says so. */
    static String dissolvedRange(Optional<org.protolyte.chemistry.DrugSubstance.Window> w) {
        if (w.isEmpty()) {
            return ", above its solubility at every pH";
        }
        var low = w.get().low();
        var high = w.get().high();
        if (low.isEmpty() && high.isEmpty()) {
            return ", dissolved at every pH from 0 to 14";
        }
        return ", dissolved" + (low.isPresent() ? String.format(Locale.ROOT, " above pH %.2f", low.getAsDouble()) : "")
                + (low.isPresent() && high.isPresent() ? " and" : "")
                + (high.isPresent() ? String.format(Locale.ROOT, " below pH %.2f", high.getAsDouble()) : "");
    }

    /** "; pHmax of SALT x at CONDITION" for each salt whose counterion the first condition holds. */
    private static String pHMax(org.protolyte.analysis.DrugSolubility ds) {
        if (ds.conditions().isEmpty()) {
            return "";
        }
        var first = ds.conditions().get(0);
        List<String> out = new ArrayList<>();
        first.pHMax().forEach((salt, x) -> out.add(String.format(Locale.ROOT, "pHmax of %s %.2f", p(salt), x)));
        return out.isEmpty() ? "" : "; at " + p(first.condition()) + ": " + String.join(", ", out);
    }

    static String speciation(ConditionResult c, EquilibriumState s, Systems systems, boolean all) {
        Map<String, List<SpeciesAmount>> bySystem = new LinkedHashMap<>();
        for (SpeciesAmount sp : s.species()) {
            if (systems.isSystem(sp.component()) && sp.fractionOfComponent() >= 0.05) {
                bySystem.computeIfAbsent(systems.of(sp.component()), k -> new ArrayList<>()).add(sp);
            }
        }
        List<String> shown = all ? new ArrayList<>(bySystem.keySet()) : carrying(c).stream()
                .map(BufferContribution::system).filter(bySystem::containsKey).toList();
        List<String> parts = new ArrayList<>();
        for (String system : shown) {
            List<SpeciesAmount> forms = new ArrayList<>(bySystem.get(system));
            if (!all) {
                forms.sort(java.util.Comparator.comparingDouble(SpeciesAmount::fractionOfComponent).reversed());
                forms = forms.subList(0, Math.min(SHOWN_FORMS, forms.size()));
            }
            parts.add(p(system) + ": " + String.join(", ", forms.stream().map(sp -> String.format(Locale.ROOT,
                    "%s %.0f %%", p(formLabel(system, sp.species().name())), sp.fractionOfComponent() * 100)).toList()));
        }
        int hidden = bySystem.size() - shown.size();
        if (hidden > 0) {
            parts.add(String.format(Locale.ROOT, "+%d system%s (--species all)", hidden, hidden == 1 ? "" : "s"));
        }
        Map<Component, Double> totals = Complexes.totals(s);
        java.util.Set<Component> bound = new java.util.HashSet<>();
        s.species().stream().filter(x -> x.species().isComplex()).forEach(x -> bound.addAll(x.species().components().keySet()));
        for (SpeciesAmount sp : s.species()) {      // a metal or polyol that complexes bind: its free share
            Component m = sp.component();
            if (!systems.isSystem(m) && bound.contains(m) && !sp.species().isComplex()) {
                parts.add(String.format(Locale.ROOT, "%s: %.0f %% free", p(m.name()), 100 * sp.molality() / totals.get(m)));
            }
        }
        return String.join("; ", parts);
    }

    /** The saturation index of each solid at each condition, where any solid's ions are present. */
    private static void solids(StringBuilder b, List<ConditionResult> conditions) {
        Map<String, List<String>> rows = new LinkedHashMap<>();
        for (ConditionResult c : conditions) {
            for (SolidPhase.Saturation x : c.saturation()) {
                rows.computeIfAbsent(p(x.phase().name() + " (" + x.phase().formula() + ")"), k -> new ArrayList<>())
                        .add(String.format(Locale.ROOT, "%s %+.2f%s", p(c.condition().name()), x.index(),
                                x.inRange() ? "" : "†"));
            }
        }
        if (rows.isEmpty()) {
            return;
        }
        b.append("  saturation index (> 0: the solid can form):").append(NL);
        rows.forEach((k, v) -> b.append(wrap("    ", "      ", k + ": " + String.join(", ", v))));
        if (conditions.stream().flatMap(c -> c.saturation().stream()).anyMatch(x -> !x.inRange())) {
            b.append("    † Ksp extrapolated beyond the temperatures of its data").append(NL);
        }
    }

    /**
     * Every component line as written, what it resolved to in mmol, and what to weigh (g) or measure (mL of stock),
     * per the basis and, where a batch size is given, for the batch.
     */
    private static void weighSheet(StringBuilder b, WeighSheet w) {
        boolean batch = w.batch().isPresent();
        b.append(wrap("  weigh sheet, per ", "    ", w.basis() + w.batch().map(x -> " and for a batch of " + p(x.size()))
                .orElse("") + ":"));
        String row = batch ? "    %-28s %-12s %10s %12s %11s %13s%n" : "    %-28s %-12s %10s %12s%n";
        b.append(String.format(Locale.ROOT, row, "component", "as written", "mmol", "to weigh", "batch mmol",
                "batch weigh"));
        for (WeighSheet.Line l : w.lines()) {
            String name = p(l.substance());
            if (name.length() > 28) {       // a long name on a line of its own keeps the columns aligned
                b.append(wrap("    ", "      ", name));
                name = "";
            }
            b.append(String.format(Locale.ROOT, row, name, p(l.recorded()), plain(l.mmol()),
                    measure(l.grams(), l.stockMillilitres()), plain(l.batchMmol()),
                    measure(l.batchGrams(), l.batchStockMillilitres())));
            l.stock().ifPresent(x -> b.append(wrap("      (", "        ", "of a " + p(x) + " stock)")));
        }
        w.notes().forEach(n -> b.append(wrap("    ", "      ", p(n))));
    }

    private static String plain(Optional<java.math.BigDecimal> x) {
        return x.map(java.math.BigDecimal::toPlainString).orElse("—");
    }

    private static String measure(Optional<java.math.BigDecimal> grams, Optional<java.math.BigDecimal> ml) {
        return grams.map(g -> g.toPlainString() + " g").or(() -> ml.map(v -> v.toPlainString() + " mL")).orElse("—");
    }

    /** One row per condition: temperature, pH with its uncertainty, β, I, osmolality and the main forms. */
    private static void conditionTable(StringBuilder b, List<ConditionResult> conditions, Systems systems,
                                       boolean allSpecies) {
        b.append(String.format(Locale.ROOT, "  %-14s %8s %13s %14s %11s %9s%n", "condition", "T (°C)", "pH",
                "β (mmol/L/pH)", "I (mol/kg)", "mOsm/kg"));
        for (ConditionResult c : conditions) {
            String name = p(c.condition().name()) + (c.condition().implicit() ? "*" : "");
            if (c.determinate()) {
                EquilibriumState s = c.state().orElseThrow();
                String pH = c.uncertainty().map(u -> String.format(Locale.ROOT, "%.2f ± %.2f", s.pH(), u.pH()))
                        .orElse(String.format(Locale.ROOT, "%.2f", s.pH()));
                b.append(String.format(Locale.ROOT, "  %-14s %8.1f %13s %14s %11s %9.0f%n", name,
                        Numbers.celsius(c.condition().kelvin()), pH,
                        Numbers.significant(c.bufferCapacityPerLitre() * 1000, 3).toPlainString(),
                        Numbers.significant(s.ionicStrength(), 3).toPlainString(), s.osmolality() * 1000));
                String forms = speciation(c, s, systems, allSpecies);
                if (!forms.isEmpty()) {
                    b.append(wrap("      ", "        ", forms));
                }
            } else {
                b.append(String.format(Locale.ROOT, "  %-14s %8.1f %13s %14s %11s %9s  (see diagnostics)%n", name,
                        Numbers.celsius(c.condition().kelvin()), "—", "—", "—", "—"));
            }
        }
    }
}
