package org.protolyte.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
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

    @CommandLine.Option(names = "--provenance", description = "List every constant and handling entry with its "
            + "source and whether it was read in a publication or recalled (its source says 'from memory'); QUERY then "
            + "selects by the name of the system, complex, phase or substance.")
    boolean provenance;

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
        if (provenance) {
            return provenance(out, library, key);
        }
        List<Substance> hits = library.substances().stream().filter(x -> rank(x, key) < NO_MATCH)
                .sorted(java.util.Comparator.comparingInt(x -> rank(x, key))).toList();   // stable: library order within a rank
        List<Substance> exact = hits.stream().takeWhile(x -> rank(x, key) == 0).toList();
        if (!exact.isEmpty()) {
            hits = formsOf(exact, hits);
        }
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

    private static final int NO_MATCH = 4;

    /**
     * How well a substance answers a query, best first: its name or a synonym is the query; begins with it as whole
     * words ("Tris hydrochloride"); its name contains it ("trisodium citrate"); a synonym does.
     */
    private static int rank(Substance s, String key) {
        if (key.isEmpty()) {
            return 0;
        }
        List<String> names = new java.util.ArrayList<>(List.of(s.name()));
        names.addAll(s.synonyms());
        if (names.stream().anyMatch(n -> SubstanceLibrary.normalise(n).equals(key))) {
            return 0;
        } else if (names.stream().anyMatch(n -> beginsWithWords(n, key))) {
            return 1;
        } else if (SubstanceLibrary.normalise(s.name()).contains(key)) {
            return 2;
        }
        return names.stream().anyMatch(n -> SubstanceLibrary.normalise(n).contains(key)) ? 3 : NO_MATCH;
    }

    /**
     * An exact name asks for that substance: the hits that share one of its acid–base systems or neutral solutes
     * (its salts and hydrates, Tris hydrochloride for Tris) and nothing that merely contains the word (issue 15:
     * {@code phenol} is not phenol red, {@code ethanol} is not triethanolamine).
     */
    private static List<Substance> formsOf(List<Substance> exact, List<Substance> hits) {
        Set<String> parts = new HashSet<>();
        exact.forEach(s -> parts.addAll(parts(s)));
        return hits.stream().filter(s -> exact.contains(s) || parts(s).stream().anyMatch(parts::contains)).toList();
    }

    private static Set<String> parts(Substance s) {
        Set<String> parts = new HashSet<>(s.composition().solutes().keySet());
        s.composition().systems().forEach(p -> parts.add(p.system()));
        return parts;
    }

    /** Whether the first words of {@code name}, run together as {@link SubstanceLibrary#normalise} does, are the key. */
    private static boolean beginsWithWords(String name, String key) {
        StringBuilder words = new StringBuilder();
        for (String w : name.split("[^\\p{L}\\p{N}]+")) {
            words.append(SubstanceLibrary.normalise(w));
            if (words.length() >= key.length()) {
                return words.toString().equals(key);
            }
        }
        return false;
    }

    /** A value's standing: read in the publication its source names, or recalled and to be checked against it. */
    private static String standing(String source) {
        return source.isBlank() ? "no source" : source.contains("from memory") ? "recalled" : "read";
    }

    private static boolean selected(String key, String name) {
        return key.isEmpty() || SubstanceLibrary.normalise(name).contains(key);
    }

    /**
     * {@code substances --provenance}: each dissociation step, complex, solid phase, solubility table and handling
     * entry with its source and standing, each section headed by how many of its values are recalled.
     */
    private int provenance(PrintWriter out, SubstanceLibrary library, String key) {
        List<String> lines = new java.util.ArrayList<>();
        int[] count = new int[3];      // entries in the section, of them not read, entries in all sections
        line(out, "%s", "Provenance of the library's values: 'read' where the source names the publication the value "
                + "was read in, 'recalled' where the source says 'from memory', wholly or in part (check it against "
                + "the paper before relying on it).");
        for (AcidBaseSystem system : library.systems()) {
            if (!selected(key, system.name())) {
                continue;
            }
            List<String> sources = library.stepSources(system.name());
            for (int k = 0; k < system.steps().size(); k++) {
                DissociationStep st = system.steps().get(k);
                String source = k < sources.size() ? sources.get(k) : "";
                entry(lines, count, source, String.format(Locale.ROOT, "%s step %d, %s ⇌ %s: pKa %s ± %s, ΔH° %s kJ/mol, "
                        + "ΔCp° %s J/(K·mol)", system.name(), k + 1, system.forms().get(k).name(),
                        system.forms().get(k + 1).name(), asWritten(st.pKa25()), asWritten(st.uncertainty()),
                        asWritten(st.deltaH() / 1000), asWritten(st.deltaCp())));
            }
        }
        section(out, "dissociation steps", lines, count);
        for (var complex : library.complexes()) {
            if (selected(key, complex.name())) {
                entry(lines, count, library.complexSource(complex.name()), String.format(Locale.ROOT,
                        "%s: log K %s ± %s at 25 °C", complex.name(), asWritten(complex.formation().log10K25()),
                        asWritten(complex.formation().uncertainty())));
            }
        }
        section(out, "complexes", lines, count);
        for (var phase : library.phases()) {
            if (selected(key, phase.name())) {
                entry(lines, count, library.phaseSource(phase.name()), String.format(Locale.ROOT,
                        "%s: log Ksp %s ± %s at 25 °C", phase.name(), asWritten(phase.solubility().log10K25()),
                        asWritten(phase.solubility().uncertainty())));
            }
        }
        section(out, "solid phases", lines, count);
        for (var table : library.solubilities()) {
            if (selected(key, table.name())) {
                entry(lines, count, table.source(), String.format(Locale.ROOT, "%s: solubility at %d temperatures, "
                        + "%s to %s °C", table.name(), table.celsius().length, plain(table.celsius()[0]),
                        plain(table.celsius()[table.celsius().length - 1])));
            }
        }
        section(out, "solubility tables", lines, count);
        for (Substance s : library.substances()) {
            if (!selected(key, s.name())) {
                continue;
            }
            s.handling().hazards().forEach(h -> entry(lines, count, h.source(), s.name() + ": hazard "
                    + h.classification()));
            s.handling().lightSensitivity().ifPresent(l -> entry(lines, count, l.source(), s.name() + ": light"));
            s.handling().solubility().ifPresent(l -> entry(lines, count, l.source(), s.name() + ": solubility"));
            s.handling().hygroscopy().ifPresent(h -> entry(lines, count, h.source(), s.name() + ": " + h.behaviour()));
        }
        section(out, "handling entries", lines, count);
        out.flush();
        if (count[2] == 0) {
            spec.commandLine().getErr().println("protolyte: no system, complex, phase or substance matches '"
                    + Printable.text(query) + "'");
            return 2;
        }
        return 0;
    }

    private static void entry(List<String> lines, int[] count, String source, String what) {
        String standing = standing(source);
        count[0]++;
        count[1] += standing.equals("read") ? 0 : 1;
        lines.add("  " + what + "  [" + standing + "]");
        lines.add("      " + (source.isBlank() ? "(none given)" : source));
    }

    /** Prints a section, if it has entries: its count of values not read, then its lines; then starts the next. */
    private static void section(PrintWriter out, String name, List<String> lines, int[] count) {
        if (count[0] > 0) {
            line(out, "%s", "");
            line(out, "%s: %d of %d not read", name, count[1], count[0]);
            lines.forEach(l -> line(out, "%s", l));
        }
        lines.clear();
        count[2] += count[0];
        count[0] = 0;
        count[1] = 0;
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
