package org.protolyte.report;

import java.io.IOException;
import java.io.Writer;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.protolyte.plugin.Plugins;
import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.Curves;
import org.protolyte.analysis.DrugSolubility;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.analysis.ProteinCharge;
import org.protolyte.analysis.TitrantResult;
import org.protolyte.batch.BatchAnalysis;
import org.protolyte.chemistry.EquilibriumState;
import org.protolyte.chemistry.SolidPhase;
import org.protolyte.document.Formulation;
import org.protolyte.report.plot.Axis;
import org.protolyte.report.plot.Plot;
import org.protolyte.report.plot.Stroke;
import org.protolyte.rules.Finding;
import org.protolyte.units.Quantity;

/**
 * The report as one self-contained HTML file to read on screen, print, or attach to a batch record: no script, no
 * font, no image and no address outside the file; inline CSS (with a print style) and inline SVG plots. The same
 * input gives the same bytes, apart from the time stamp in {@code meta name="generated"} and {@code time.generated}.
 */
public final class HtmlRenderer {

    private static final String NL = "\n";
    private static final Stroke[] STROKES = Stroke.values();

    private final Optional<Quantity> batchSize;

    /** @param batchSize the batch the weigh sheets also give amounts for (--batch-size) */
    public HtmlRenderer(Optional<Quantity> batchSize) {
        this.batchSize = batchSize;
    }

    /** The page of a whole run at once. */
    public String render(RunReport run) {
        RunSummary summary = new RunSummary(run.toolVersion(), run.generatedAt(), run.libraryFiles(), run.plugins(),
                java.util.Optional.empty());
        run.skipped().forEach(summary::skip);
        java.io.StringWriter out = new java.io.StringWriter();
        try {
            new RunWriter(RunWriter.Format.HTML, false, batchSize).write(out, summary, run.reports());
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);     // a StringWriter does not throw
        }
        return out.toString();
    }

    /** A page written as it goes: {@link #begin}, then {@link Page#document} per report, then {@link Page#end}. */
    public Page begin(Writer out, RunSummary run) throws IOException {
        out.write("<!DOCTYPE html>" + NL + "<html lang=\"en\">" + NL + "<head>" + NL + "<meta charset=\"utf-8\">" + NL
                + "<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">" + NL
                + "<meta name=\"generated\" content=\"" + run.generatedAt() + "\">" + NL
                + "<title>Protolyte " + esc(run.toolVersion()) + " report</title>" + NL
                + "<style>" + NL + HtmlStyle.css() + "</style>" + NL + "</head>" + NL + "<body>" + NL
                + "<header class=\"run\"><h1>Protolyte formulation check</h1>" + NL
                + "<p>Protolyte " + esc(run.toolVersion()) + ", generated <time class=\"generated\" datetime=\""
                + run.generatedAt() + "\">" + run.generatedAt() + "</time>"
                + run.asOf().map(d -> "; waivers judged as of " + d + " (--as-of)").orElse("") + "</p>" + NL
                + plugins(run.plugins())
                + "<p class=\"caution\">" + esc(RunReport.CAUTION) + "</p></header>" + NL);
        return new Page(out);
    }

    /** Each place a site's check kinds or substance libraries came from, with its SHA-256. */
    private static String plugins(List<Plugins.Origin> plugins) {
        if (plugins.isEmpty()) {
            return "";
        }
        StringBuilder b = new StringBuilder("<ul class=\"plugins\">");
        for (Plugins.Origin o : plugins) {
            b.append("<li>plugin <code>").append(esc(o.location())).append("</code>");
            o.sha256().ifPresent(h -> b.append(" SHA-256 <code>").append(h).append("</code>"));
            if (!o.checkKinds().isEmpty()) {
                b.append("; check kinds ").append(esc(String.join(", ", o.checkKinds())));
            }
            if (!o.substanceLibraries().isEmpty()) {
                b.append("; substance libraries ").append(esc(String.join(", ", o.substanceLibraries())));
            }
            b.append("</li>");
        }
        return b.append("</ul>").append(NL).toString();
    }

    /** One page being written; not shared between threads. */
    public final class Page {
        private final Writer out;
        private int n;

        private Page(Writer out) {
            this.out = out;
        }

        public void document(DocumentReport r) throws IOException {
            StringBuilder b = new StringBuilder();
            HtmlRenderer.this.document(b, r, ++n);
            out.write(b.toString());
        }

        public void end(RunSummary run) throws IOException {
            StringBuilder b = new StringBuilder("<footer class=\"run\">");
            if (!run.skipped().isEmpty()) {
                b.append("<h2>Skipped files</h2><ul>");
                run.skipped().forEach(s -> b.append("<li>").append(esc(s.source())).append(": ").append(esc(s.reason()))
                        .append("</li>"));
                b.append("</ul>");
            }
            b.append(String.format(Locale.ROOT, "<p class=\"summary\">%d document(s): %d pass, %d fail, %d invalid, "
                    + "%d indeterminate, %d internal fault(s)</p>", run.documents(), run.count(Status.PASS),
                    run.count(Status.FAIL), run.count(Status.INVALID), run.count(Status.INDETERMINATE),
                    run.count(Status.FAULT)));
            b.append("<p class=\"caution\">").append(esc(RunReport.CAUTION)).append("</p></footer>").append(NL)
                    .append("</body>").append(NL).append("</html>").append(NL);
            out.write(b.toString());
        }
    }

    private void document(StringBuilder b, DocumentReport r, int n) {
        String status = r.status().code();
        b.append("<section class=\"document\" id=\"doc-").append(n).append("\" data-source=\"").append(esc(r.source()))
                .append("\">").append(NL);
        b.append("<header><h2>").append(esc(r.source())).append("</h2><p class=\"status\" data-status=\"")
                .append(status).append("\">").append(status.toUpperCase(Locale.ROOT)).append("</p></header>").append(NL);
        b.append("<p class=\"caution\">").append(esc(RunReport.CAUTION)).append("</p>").append(NL);
        b.append("<dl class=\"identity\">");
        r.id().ifPresent(id -> dd(b, "id", "Document", id));
        r.analysis().map(a -> a.recipe().formulation()).ifPresent(f -> {
            f.title().ifPresent(t -> dd(b, "title", "Title", t));
            f.revision().ifPresent(t -> dd(b, "revision", "Revision", t));
            f.intendedUse().ifPresent(t -> dd(b, "intended-use", "Intended use", t));
        });
        r.sha256().ifPresent(h -> dd(b, "sha256", "SHA-256 of the input", h));
        dd(b, "tool", "Tool", "Protolyte " + org.protolyte.Protolyte.version());
        b.append("</dl>").append(NL);
        r.batch().ifPresent(x -> batch(b, x));
        r.analysis().ifPresent(a -> analysis(b, a, r.batch().isEmpty(), "doc-" + n));
        findings(b, r.findings());
        if (!r.diagnostics().isEmpty()) {
            b.append("<section class=\"diagnostics\"><h3>Diagnostics</h3><ul>");
            for (Diagnostic d : r.diagnostics()) {
                b.append("<li><span class=\"severity\" data-severity=\"").append(d.severity().name().toLowerCase(Locale.ROOT))
                        .append("\">").append(d.severity().name().toLowerCase(Locale.ROOT)).append("</span> <code>")
                        .append(esc(d.code())).append("</code>");
                d.condition().ifPresent(c -> b.append(" [").append(esc(c)).append("]"));
                b.append(": ").append(esc(d.message())).append("</li>");
            }
            b.append("</ul></section>").append(NL);
        }
        r.analysis().ifPresent(a -> {
            b.append("<section class=\"assumptions\"><h3>Assumptions</h3><ul>");
            a.assumptions().forEach(x -> b.append("<li>").append(esc(x)).append("</li>"));
            b.append("</ul></section>").append(NL);
        });
        b.append("</section>").append(NL);
    }

    private static void dd(StringBuilder b, String cls, String term, String value) {
        b.append("<dt>").append(term).append("</dt><dd class=\"").append(cls).append("\">").append(esc(value)).append("</dd>");
    }

    private void analysis(StringBuilder b, FormulationAnalysis a, boolean formulation, String id) {
        if (formulation) {
            weighSheet(b, WeighSheet.of(a, batchSize));
        }
        for (TitrantResult t : a.titrants()) {
            t.setpointPH().ifPresent(sp -> b.append(String.format(Locale.ROOT, "<p class=\"setpoint\"><strong>Setpoint:"
                    + "</strong> adjust %s to pH %.2f on the meter at %.1f °C%s; it gives pH %.2f at %.1f °C.</p>%n",
                    esc(t.ingredient().substance().name()), sp, Numbers.celsius(t.adjustKelvin()),
                    t.atVolume() < 1 ? String.format(Locale.ROOT, " at %.0f %% of the final volume", t.atVolume() * 100) : "",
                    t.goalPH(), Numbers.celsius(t.goalKelvin()))));
            t.unreachable().ifPresent(u -> b.append("<p class=\"setpoint\">").append(esc(t.ingredient().substance().name()))
                    .append(": ").append(esc(u.reason())).append("</p>").append(NL));
        }
        b.append("<h3>Conditions</h3>").append(NL);
        Systems systems = new Systems(a.recipe().library());
        conditions(b, a.conditions(), systems);
        a.working().ifPresent(w -> {
            b.append("<h3>Working solution, diluted ").append(Numbers.significant(w.dilution().factor(), 4).toPlainString())
                    .append("-fold with ").append(esc(w.dilution().diluent())).append("</h3>").append(NL);
            conditions(b, w.conditions(), systems);
            List<String> shifts = new ArrayList<>();
            for (int i = 0; i < a.conditions().size(); i++) {
                int at = i;
                a.dilutionShift(i).ifPresent(x -> shifts.add(String.format(Locale.ROOT, "%s %+.2f",
                        esc(a.conditions().get(at).condition().name()), x)));
            }
            if (!shifts.isEmpty()) {
                b.append("<p>pH shift on dilution: ").append(String.join(", ", shifts))
                        .append(" (the activity coefficients' change with ionic strength)</p>").append(NL);
            }
        });
        if (!a.drifts().isEmpty()) {
            b.append("<ul class=\"drifts\">");
            String first = a.conditions().isEmpty() ? "" : a.conditions().get(0).condition().name();
            a.drifts().stream().filter(d -> d.from().equals(first)).forEach(d -> b.append(String.format(Locale.ROOT,
                    "<li>drift %s → %s: %+.2f pH%s</li>", esc(d.from()), esc(d.to()), d.change(), d.system()
                            .map(x -> String.format(Locale.ROOT, ", mostly %s (dpKa/dT %+.4f per K)", esc(x), d.dpKadT()))
                            .orElse(""))));
            b.append("</ul>").append(NL);
        }
        proteins(b, a.proteins());
        drugs(b, a.drugs());
        admixtures(b, a.admixtures());
        a.curves().ifPresent(c -> plots(b, a, c, id));
    }

    /** Each admixture: the mixture's pH and osmolarity, and each drug's margin in it, as the text report words it. */
    private static void admixtures(StringBuilder b, List<FormulationAnalysis.Admixed> admixtures) {
        if (admixtures.isEmpty()) {
            return;
        }
        b.append("<h3>Admixtures</h3><ul class=\"admixtures\">");
        admixtures.forEach(m -> b.append("<li>").append(esc(TextRenderer.admixture(m))).append("</li>"));
        b.append("</ul>").append(NL).append("<p class=\"note\">A prediction of precipitation does not replace a "
                + "compatibility study, the product's labelling or licensed pharmacy practice.</p>").append(NL);
    }

    /** Each drug substance: per condition its dissolved amount against its solubility, and its pH range. */
    private static void drugs(StringBuilder b, List<DrugSolubility> drugs) {
        for (DrugSolubility d : drugs) {
            b.append("<h3>Drug substance ").append(esc(d.drug().name())).append("</h3>").append(NL)
                    .append("<table class=\"drug\"><thead><tr><th>condition</th><th>dissolved (mmol/L)</th>"
                            + "<th>solubility (mmol/L)</th><th>of its solubility</th><th>limited by</th>"
                            + "<th>stays dissolved</th></tr></thead><tbody>");
            for (DrugSolubility.AtCondition x : d.conditions()) {
                b.append("<tr><td>").append(esc(x.condition())).append("</td><td class=\"number\">")
                        .append(Numbers.significant(x.dissolved() * 1000, 3).toPlainString())
                        .append("</td><td class=\"number\">").append(Numbers.significant(x.solubility() * 1000, 3)
                                .toPlainString()).append("</td><td class=\"number\">")
                        .append(String.format(Locale.ROOT, "%.0f %% (log10 ± %.2f)", 100 * x.fraction(),
                                x.uncertainty())).append("</td><td>").append(esc(x.limiting().name()))
                        .append(x.inRange() ? "" : " (extrapolated)").append("</td><td>")
                        .append(esc(TextRenderer.dissolvedRange(x.window()).replaceFirst("^, ", "")))
                        .append("</td></tr>");
            }
            b.append("</tbody></table>").append(NL).append("<p class=\"note\">Solubility at the condition's pH and "
                    + "temperature, the solution's activity coefficients and counterions held; a prediction does not "
                    + "replace a compatibility study.</p>").append(NL);
        }
    }

    /** Each protein: its pI, and per condition its net charge, share of β and pH shift against the buffer alone. */
    private static void proteins(StringBuilder b, List<ProteinCharge> proteins) {
        for (ProteinCharge pc : proteins) {
            b.append("<h3>Protein ").append(esc(pc.protein().name())).append("</h3>").append(NL)
                    .append(String.format(Locale.ROOT, "<p class=\"protein\">%.0f g/mol, pKa set '%s', pI %s at 25 °C; "
                            + "each group's pKa in a folded protein is uncertain by about one unit.</p>%n",
                            pc.protein().molarMass(), esc(pc.protein().pKaSet()), pc.isoelectricPoint().isPresent()
                                    ? String.format(Locale.ROOT, "%.2f", pc.isoelectricPoint().getAsDouble())
                                    : "none (no acidic or no basic group)"))
                    .append("<table class=\"protein\"><thead><tr><th>condition</th><th>net charge per molecule</th>"
                            + "<th>share of β</th><th>pH shift against the buffer alone</th></tr></thead><tbody>");
            for (ProteinCharge.AtCondition x : pc.conditions()) {
                b.append("<tr><td>").append(esc(x.condition())).append("</td>");
                if (Double.isNaN(x.netCharge())) {
                    b.append("<td colspan=\"3\">no result: see the diagnostics</td>");
                } else {
                    b.append(String.format(Locale.ROOT, "<td class=\"number\">%+.1f</td><td class=\"number\">%.0f %%"
                            + "</td><td class=\"number\">%s</td>", x.netCharge(), 100 * x.bufferShare(),
                            x.pHShift().isPresent() ? String.format(Locale.ROOT, "%+.2f", x.pHShift().getAsDouble())
                                    : "—"));
                }
                b.append("</tr>");
            }
            b.append("</tbody></table>").append(NL).append("<p class=\"note\">The buffer alone: the same solution "
                    + "without the protein and the counterions it brings, every other amount (the titrants' q.s. "
                    + "included) as it is.</p>").append(NL);
        }
    }

    /** The weigh sheet: each line as written, in mmol, and in g or mL of stock, per basis and per batch. */
    private static void weighSheet(StringBuilder b, WeighSheet w) {
        boolean batch = w.batch().isPresent();
        b.append("<h3>Weigh sheet</h3>").append(NL).append("<table class=\"weigh-sheet\"><caption>per ")
                .append(esc(w.basis())).append(w.batch().map(x -> " and for a batch of " + esc(x.size())).orElse(""))
                .append("</caption><thead><tr><th>component</th><th>as written</th><th>stock</th><th>mmol</th>"
                        + "<th>g</th><th>mL of stock</th>");
        if (batch) {
            b.append("<th>batch mmol</th><th>batch g</th><th>batch mL of stock</th>");
        }
        b.append("</tr></thead><tbody>");
        for (WeighSheet.Line l : w.lines()) {
            b.append("<tr data-pointer=\"").append(esc(l.pointer())).append("\"><td>").append(esc(l.substance()))
                    .append("</td><td data-field=\"recorded\">").append(esc(l.recorded())).append("</td><td>")
                    .append(esc(l.stock().orElse("—"))).append("</td>");
            cell(b, "mmol", l.mmol());
            cell(b, "grams", l.grams());
            cell(b, "stockMillilitres", l.stockMillilitres());
            if (batch) {
                cell(b, "batchMmol", l.batchMmol());
                cell(b, "batchGrams", l.batchGrams());
                cell(b, "batchStockMillilitres", l.batchStockMillilitres());
            }
            b.append("</tr>");
        }
        b.append("</tbody></table>").append(NL);
        w.notes().forEach(x -> b.append("<p class=\"note\">").append(esc(x)).append("</p>").append(NL));
    }

    private static void cell(StringBuilder b, String field, Optional<BigDecimal> v) {
        if (v.isPresent()) {
            b.append("<td class=\"number\" data-field=\"").append(field).append("\">").append(v.get().toPlainString())
                    .append("</td>");
        } else {
            b.append("<td class=\"number\">—</td>");
        }
    }

    /** One row per condition: T, pH ± u, β, I, osmolality and the main forms. */
    private static void conditions(StringBuilder b, List<ConditionResult> conditions, Systems systems) {
        b.append("<table class=\"conditions\"><thead><tr><th>condition</th><th>T (°C)</th><th>pH</th>"
                + "<th>β (mmol/L/pH)</th><th>I (mol/kg)</th><th>mOsm/kg</th><th>β carried by</th><th>main forms</th>"
                + "</tr></thead><tbody>");
        for (ConditionResult c : conditions) {
            b.append("<tr><td>").append(esc(c.condition().name())).append(c.condition().implicit() ? "*" : "")
                    .append("</td><td class=\"number\">").append(String.format(Locale.ROOT, "%.1f",
                            Numbers.celsius(c.condition().kelvin()))).append("</td>");
            if (c.determinate()) {
                EquilibriumState s = c.state().orElseThrow();
                b.append("<td class=\"number\">").append(c.uncertainty().map(u -> String.format(Locale.ROOT, "%.2f ± %.2f",
                        s.pH(), u.pH())).orElse(String.format(Locale.ROOT, "%.2f", s.pH()))).append("</td>");
                b.append("<td class=\"number\">").append(Numbers.significant(c.bufferCapacityPerLitre() * 1000, 3)
                        .toPlainString()).append("</td><td class=\"number\">")
                        .append(Numbers.significant(s.ionicStrength(), 3).toPlainString()).append("</td><td class=\"number\">")
                        .append(String.format(Locale.ROOT, "%.0f", s.osmolality() * 1000)).append("</td><td>");
                b.append(String.join(", ", TextRenderer.carrying(c).stream().map(x -> String.format(Locale.ROOT,
                        "%s %.0f %%", esc(x.system()), 100 * x.share())).toList())).append("</td><td>")
                        .append(esc(TextRenderer.speciation(c, s, systems, false).replace(" (--species all)", "")))
                        .append("</td>");
            } else {
                b.append("<td colspan=\"6\">no result: see the diagnostics</td>");
            }
            b.append("</tr>");
        }
        b.append("</tbody></table>").append(NL);
        if (conditions.stream().anyMatch(c -> c.uncertainty().isPresent())) {
            b.append("<p class=\"uncertainty\">").append(esc(RunReport.UNCERTAINTY)).append("</p>").append(NL);
        }
        List<String> solids = new ArrayList<>();
        for (ConditionResult c : conditions) {
            for (SolidPhase.Saturation x : c.saturation()) {
                solids.add(String.format(Locale.ROOT, "%s at %s: %+.2f%s", esc(x.phase().name()),
                        esc(c.condition().name()), x.index(), x.inRange() ? "" : " (Ksp extrapolated)"));
            }
        }
        if (!solids.isEmpty()) {
            b.append("<p class=\"saturation\">Saturation index (above 0 the solid can form): ")
                    .append(String.join("; ", solids)).append("</p>").append(NL);
        }
    }

    /** The plots, each with its numbers as a table: the names and the set match the JSON report's curves. */
    private static void plots(StringBuilder b, FormulationAnalysis a, Curves c, String id) {
        Optional<Formulation.PhTarget> target = a.recipe().formulation().pHTarget();
        double t = Numbers.celsius(c.titrationKelvin());
        b.append("<h3>Plots</h3>").append(NL);
        double[] added = c.titration().stream().mapToDouble(Curves.TitrationPoint::added).toArray();
        double[] pH = c.titration().stream().mapToDouble(Curves.TitrationPoint::pH).toArray();
        double[] beta = c.titration().stream().mapToDouble(Curves.TitrationPoint::bufferCapacity).toArray();
        boolean targetHere = target.isPresent() && Formulation.sameTemperature(target.get().kelvin(), c.titrationKelvin());

        Plot titration = Plot.of(String.format(Locale.ROOT, "Titration curve at %.1f °C", t),
                Axis.around("added strong acid (−) or base (+)", "mmol/L", added), new Axis("pH", "", floor(pH), ceil(pH)))
                .line("pH", added, pH, Stroke.SOLID);
        if (targetHere) {
            titration = titration.yBand(band("target", target.get()), lo(target.get()), hi(target.get()));
        }
        if (c.qsAdded().isPresent() && c.qsPH().isPresent()) {
            titration = titration.marker("q.s. point", c.qsAdded().getAsDouble(), c.qsPH().getAsDouble());
        }
        figure(b, id, "titration", titration, titration.title(), "pH of the recipe without its q.s. titrants, against strong base (+) or acid "
                + "(−) added per litre of solution, at the adjustment temperature"
                + (targetHere ? ", with the target band" : "") + (c.qsAdded().isPresent() ? " and the q.s. point" : ""));

        Plot capacity = Plot.of(String.format(Locale.ROOT, "Buffer capacity at %.1f °C", t),
                new Axis("pH", "", floor(pH), ceil(pH)), Axis.around("β", "mmol/L/pH", with0(beta)))
                .line("β", pH, beta, Stroke.SOLID);
        if (targetHere) {
            capacity = capacity.xBand(band("target", target.get()), lo(target.get()), hi(target.get()));
        }
        figure(b, id, "capacity", capacity, capacity.title(), "β = dC/dpH, the slope of the same titration (the activity coefficients move with the added ions; the conditions table holds them fixed)" + (targetHere ? ", with the target band" : ""));

        double[] celsius = c.temperature().stream().mapToDouble(x -> Numbers.celsius(x.kelvin())).toArray();
        double[] pHT = c.temperature().stream().mapToDouble(Curves.TemperaturePoint::pH).toArray();
        Plot temperature = Plot.of("pH against temperature", new Axis("temperature", "°C", 0, 50),
                Axis.around("pH", "", pHT)).line("pH, closed, as made", celsius, pHT, Stroke.SOLID);
        if (Double.isFinite(c.validToKelvin())) {
            temperature = temperature.xBand("constants' data range", Math.max(0, Numbers.celsius(c.validFromKelvin())),
                    Math.min(50, Numbers.celsius(c.validToKelvin())));
        }
        for (ConditionResult r : a.conditions()) {
            if (r.determinate()) {
                temperature = temperature.marker(r.condition().name() + (r.condition().co2Pascal().isPresent()
                        ? " (open to CO2)" : ""), Numbers.celsius(r.condition().kelvin()), r.state().orElseThrow().pH());
            }
        }
        figure(b, id, "temperature", temperature, temperature.title(), "the recipe as made, closed, from 0 to 50 °C, each condition marked with "
                + "its own pH; the shaded range is where the data behind the buffering systems' constants lie");

        if (!c.forms().isEmpty()) {
            Plot speciation = Plot.of(String.format(Locale.ROOT, "Forms of the buffering systems at %.1f °C", t),
                    new Axis("pH", "", floor(pH), ceil(pH)), new Axis("fraction of the system", "", 0, 1));
            for (int k = 0; k < c.forms().size(); k++) {
                int at = k;
                speciation = speciation.line(c.forms().get(k), pH,
                        c.titration().stream().mapToDouble(x -> x.fractions().get(at)).toArray(), STROKES[k % STROKES.length]);
            }
            if (targetHere) {
                speciation = speciation.xBand(band("target", target.get()), lo(target.get()), hi(target.get()));
            }
            figure(b, id, "speciation", speciation, speciation.title(), "the fraction of each buffering system in each form along the titration");
        }
        if (!c.solids().isEmpty()) {
            List<double[]> series = new ArrayList<>();
            for (int k = 0; k < c.solids().size(); k++) {
                int at = k;
                series.add(c.temperature().stream().mapToDouble(x -> x.saturationIndex().get(at)).toArray());
            }
            Plot saturation = Plot.of("Saturation index against temperature", new Axis("temperature", "°C", 0, 50),
                    Axis.around("saturation index", "", series.stream().flatMapToDouble(java.util.Arrays::stream)
                            .toArray()));
            for (int k = 0; k < c.solids().size(); k++) {
                saturation = saturation.line(c.solids().get(k), celsius, series.get(k), STROKES[k % STROKES.length]);
            }
            saturation = saturation.yBand("can form (index above 0)", 0, Double.POSITIVE_INFINITY);
            figure(b, id, "saturation", saturation, saturation.title(), "each solid's saturation index for the recipe as made, closed; above 0 "
                    + "the solid can form");
        }
    }

    private static void figure(StringBuilder b, String id, String name, Plot p, String title, String caption) {
        b.append("<figure class=\"plot\" data-plot=\"").append(name).append("\">").append(NL).append(p.svg(id + "-" + name))
                .append(NL)
                .append("<figcaption><strong>").append(esc(title)).append("</strong>: ").append(esc(caption))
                .append("</figcaption>").append(NL)
                .append("<details class=\"plot-data\"><summary>the numbers of this plot</summary><table><thead><tr>");
        Plot.Table table = p.table();
        table.header().forEach(h -> b.append("<th>").append(esc(h)).append("</th>"));
        b.append("</tr></thead><tbody>");
        for (List<String> row : table.rows()) {
            b.append("<tr>");
            row.forEach(x -> b.append("<td>").append(esc(x)).append("</td>"));
            b.append("</tr>");
        }
        b.append("</tbody></table></details></figure>").append(NL);
    }

    private static String band(String what, Formulation.PhTarget t) {
        return String.format(Locale.ROOT, "%s pH %s–%s", what, Double.isInfinite(t.min()) ? "" : String.format(Locale.ROOT,
                "%.2f", t.min()), Double.isInfinite(t.max()) ? "" : String.format(Locale.ROOT, "%.2f", t.max()));
    }

    private static double lo(Formulation.PhTarget t) {
        return Double.isInfinite(t.min()) ? 0 : t.min();
    }

    private static double hi(Formulation.PhTarget t) {
        return Double.isInfinite(t.max()) ? 14 : t.max();
    }

    private static double floor(double[] pH) {
        return Math.floor(java.util.Arrays.stream(pH).filter(Double::isFinite).min().orElse(0));
    }

    private static double ceil(double[] pH) {
        return Math.ceil(java.util.Arrays.stream(pH).filter(Double::isFinite).max().orElse(14));
    }

    private static double[] with0(double[] x) {
        double[] y = java.util.Arrays.copyOf(x, x.length + 1);
        y[x.length] = 0;
        return y;
    }

    /** A batch record: each addition against the master, each measurement against prediction. */
    private static void batch(StringBuilder b, BatchAnalysis x) {
        var m = x.record().master();
        b.append("<h3>Batch ").append(esc(x.record().batch())).append(" of ").append(esc(m.id()))
                .append(m.revision().map(r -> " revision " + esc(r)).orElse("")).append(", ")
                .append(Numbers.significant(x.scale(), 4).toPlainString()).append(" × the master's basis</h3>").append(NL);
        b.append("<table class=\"additions\"><thead><tr><th>step</th><th>addition</th><th>recorded</th><th>mmol</th>"
                + "<th>master mmol</th><th>Δ</th><th>note</th></tr></thead><tbody>");
        for (BatchAnalysis.AdditionCheck c : x.additions()) {
            b.append("<tr><td>").append(c.addition().map(a -> String.valueOf(a.step())).orElse("—")).append("</td><td>")
                    .append(esc(c.used().or(() -> c.expected()).map(s -> s.name()).orElse("?"))).append("</td><td>")
                    .append(esc(c.addition().map(a -> a.amount().toString()).orElse("—"))).append("</td><td class=\"number\">")
                    .append(Numbers.significant(c.actualMoles() * 1000, 5).toPlainString()).append("</td><td class=\"number\">")
                    .append(Double.isFinite(c.expectedMoles()) ? Numbers.significant(c.expectedMoles() * 1000, 5)
                            .toPlainString() : "—").append("</td><td class=\"number\">")
                    .append(Double.isFinite(c.deviation()) ? String.format(Locale.ROOT, "%+.1f %%", 100 * c.deviation()) : "")
                    .append("</td><td>").append(esc(TextRenderer.note(c))).append("</td></tr>");
        }
        b.append("</tbody></table>").append(NL);
        if (!x.observations().isEmpty()) {
            b.append("<table class=\"observations\"><thead><tr><th>measured</th><th>value</th><th>predicted from the "
                    + "additions as recorded</th></tr></thead><tbody>");
            for (BatchAnalysis.Observation o : x.observations()) {
                b.append("<tr><td>").append(esc(o.label())).append("</td><td class=\"number\">")
                        .append(esc(o.kind().text(o.measured()))).append("</td><td class=\"number\">")
                        .append(esc(o.kind().text(o.predicted()))).append("</td></tr>");
            }
            b.append("</tbody></table>").append(NL);
        }
    }

    /** Findings with what the rule says: explanation, what to do, safety, references, and any waiver. */
    private static void findings(StringBuilder b, List<Finding> findings) {
        if (findings.isEmpty()) {
            return;
        }
        b.append("<section class=\"findings\"><h3>Findings</h3>").append(NL);
        for (Finding f : findings) {
            String sev = f.severity().code();
            b.append("<article class=\"finding\" data-severity=\"").append(sev).append("\"><h4><span class=\"severity\">")
                    .append(sev).append("</span> <code>").append(esc(f.rule())).append("</code>");
            f.pointer().ifPresent(x -> b.append(" <span class=\"place\">").append(x.isEmpty() ? "(document)" : esc(x))
                    .append("</span>"));
            f.location().ifPresent(l -> b.append(" <span class=\"place\">line ").append(l.line()).append(", column ")
                    .append(l.column()).append("</span>"));
            b.append("</h4><p>").append(esc(f.message())).append("</p>");
            f.waivedBy().ifPresent(w -> b.append("<p class=\"waived\"><strong>WAIVED</strong> by ").append(esc(w.approver()))
                    .append(w.authorGranted() ? " (granted in the document by its author)" : "").append(" until ")
                    .append(w.expires()).append(": ").append(esc(w.reason())).append("</p>"));
            f.definition().ifPresent(d -> {
                b.append("<p class=\"explanation\">").append(esc(d.explanation())).append("</p>");
                d.remedy().ifPresent(x -> b.append("<p class=\"remedy\"><strong>What to do:</strong> ").append(esc(x))
                        .append("</p>"));
                d.safety().ifPresent(x -> b.append("<p class=\"safety\"><strong>Safety:</strong> ").append(esc(x))
                        .append("</p>"));
                if (!d.references().isEmpty()) {
                    b.append("<ul class=\"references\">");
                    d.references().forEach(x -> b.append("<li>").append(esc(x)).append("</li>"));
                    b.append("</ul>");
                }
            });
            b.append("</article>").append(NL);
        }
        b.append("</section>").append(NL);
    }

    /** Text from a document, a library or a file name, safe in HTML text and attributes (as in the plots' SVG). */
    static String esc(String s) {
        return org.protolyte.report.plot.Format.text(s);
    }
}
