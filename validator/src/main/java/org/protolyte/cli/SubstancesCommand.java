package org.protolyte.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.DissociationStep;
import org.protolyte.report.Printable;
import org.protolyte.substance.Composition;
import org.protolyte.substance.Substance;
import org.protolyte.substance.SubstanceLibrary;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;

/** {@code protolyte substances [QUERY]}: the library as a reviewer reads it, with constants and their sources. */
@Command(name = "substances", mixinStandardHelpOptions = true, versionProvider = VersionProvider.class,
        description = "Lists the substance library, or the entries whose name or synonym contains QUERY, with their "
                + "formula, molar mass, composition, and the constants and sources of their acid–base systems.")
public final class SubstancesCommand implements Callable<Integer> {

    @Parameters(arity = "0..1", paramLabel = "QUERY")
    String query;

    @Mixin
    Setup setup;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        PrintWriter out = spec.commandLine().getOut();
        SubstanceLibrary library;
        try {
            library = setup.library();
        } catch (Setup.UsageException e) {
            return Setup.usage(spec.commandLine().getErr(), e);
        }
        String key = query == null ? "" : SubstanceLibrary.normalise(query);
        List<Substance> hits = library.substances().stream().filter(s -> key.isEmpty()
                || SubstanceLibrary.normalise(s.name()).contains(key)
                || s.synonyms().stream().anyMatch(x -> SubstanceLibrary.normalise(x).contains(key))).toList();
        if (hits.isEmpty()) {
            spec.commandLine().getErr().println("protolyte: no substance matches '" + Printable.text(query) + "'");
            return 2;
        }
        for (Substance s : hits) {
            line(out, "%s%s", s.name(), s.origin().equals("shipped library") ? "" : "  [" + s.origin() + "]");
            s.formula().ifPresent(f -> line(out, "  formula %s, %.3f g/mol%s", f, s.molarMass().orElse(Double.NaN),
                    f.hydrationWater() > 0 ? ", " + plain(f.hydrationWater()) + " H2O of hydration" : ""));
            if (!s.synonyms().isEmpty()) {
                line(out, "%s", "  also: " + String.join("; ", s.synonyms()));
            }
            Composition c = s.composition();
            c.ions().forEach((ion, n) -> line(out, "  ion %s × %s", ion, n));
            c.solutes().forEach((solute, n) -> line(out, "  neutral solute %s × %s", solute, n));
            for (Composition.SystemPart part : c.systems()) {
                line(out, "  %s × %s as %s", part.system(), part.count(), part.form());
                AcidBaseSystem system = library.system(part.system()).orElseThrow();
                for (int k = 0; k < system.steps().size(); k++) {
                    DissociationStep st = system.steps().get(k);
                    line(out, "    %s ⇌ %s: pKa %s ± %s, ΔH° %s kJ/mol, ΔCp° %s J/(K·mol), %s",
                            system.forms().get(k).name(), system.forms().get(k + 1).name(), asWritten(st.pKa25()),
                            asWritten(st.uncertainty()), asWritten(st.deltaH() / 1000), asWritten(st.deltaCp()),
                            st.validity());
                    List<String> sources = library.stepSources(part.system());
                    if (k < sources.size()) {
                        line(out, "%s", "      source: " + sources.get(k));
                    }
                }
            }
            s.handling().hazards().forEach(h -> line(out, "  hazard %s, %s (%s)", h.classification(),
                    h.statement(), h.source()));
            s.handling().lightSensitivity().ifPresent(l -> line(out, "%s", "  light: " + l.text() + " (" + l.source() + ")"));
            s.handling().solubility().ifPresent(sol -> line(out, "  solubility in water: %s at %s °C (%s)",
                    sol.gramsPerLitre().isPresent()
                            ? plain(sol.gramsPerLitre().getAsDouble()) + " g/L" + sol.term().map(t -> ", " + t).orElse("")
                            : sol.term().orElseThrow(),
                    plain(sol.celsius()), sol.source()));
            s.handling().hygroscopy().ifPresent(h -> line(out, "%s", "  " + h.behaviour()
                    + (h.text().isEmpty() ? "" : ": " + h.text()) + " (" + h.source() + ")"));
        }
        out.flush();
        return 0;
    }

    /** One line of the listing: the library's text escaped, so that no entry can forge or repaint a line. */
    private static void line(PrintWriter out, String format, Object... args) {
        out.println(Printable.text(String.format(Locale.ROOT, format, args)));
    }

    /** A library constant as its source gives it (no rounding: a reviewer compares it with the table). */
    private static String asWritten(double x) {
        return new BigDecimal(Double.toString(x)).round(new MathContext(10)).stripTrailingZeros().toPlainString();
    }

    /** A handbook number as written: three significant figures, no trailing zeros. */
    private static String plain(double x) {
        return new BigDecimal(x).round(new MathContext(3)).stripTrailingZeros().toPlainString();
    }
}
