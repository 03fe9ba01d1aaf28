package org.protolyte.substance;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

import org.protolyte.chemistry.AcidBaseSystem;
import org.protolyte.chemistry.Component;
import org.protolyte.chemistry.DissociationStep;
import org.protolyte.chemistry.FormationConstant;
import org.protolyte.chemistry.SaltSolubility;
import org.protolyte.chemistry.SolidPhase;
import org.protolyte.chemistry.DrugSubstance;
import org.protolyte.chemistry.Species;
import org.protolyte.chemistry.TemperatureRange;
import org.protolyte.document.Digests;
import org.protolyte.document.DocumentException;
import org.protolyte.document.JsonReader;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.document.SourceDocument;

import tools.jackson.databind.JsonNode;

/**
 * Builds a {@link SubstanceLibrary} from the shipped library and any user libraries, in order. A user
 * entry whose name (or a synonym) clashes with an earlier one is an error unless it declares
 * {@code "replaces": true}. Every entry is checked: electroneutral composition, known systems, ions and
 * forms, and a declared molar mass that matches the formula.
 *
 * <p>Longer than the project's ~400 lines because it reads one document kind whose every section (systems, complexes,
 * solids, solubilities, substances) is checked against the others as it is read; split by section, each part would
 * need the whole library built so far, and the checks of one entry would be spread over several classes.
 */
public final class LibraryLoader {

    public static final String SHIPPED = "/org/protolyte/substance/substances.json";
    public static final String SCHEMA = "substance-library.schema.json";
    /** A declared molar mass may differ from the formula's by rounding and older atomic-weight tables. */
    public static final double MOLAR_MASS_TOLERANCE = 0.02;

    private final JsonReader reader = new JsonReader();
    private final SchemaCatalog schemas;

    private final Map<String, AcidBaseSystem> systems = new LinkedHashMap<>();
    private final Map<String, Species> complexes = new LinkedHashMap<>();
    private final Map<String, String> complexSources = new LinkedHashMap<>();
    private final Map<String, SolidPhase> phases = new LinkedHashMap<>();
    private final Map<String, String> phaseSources = new LinkedHashMap<>();
    private final Map<String, SaltSolubility> solubilities = new LinkedHashMap<>();
    private final Map<String, DrugSubstance> drugs = new LinkedHashMap<>();
    private final Map<String, Fluid> fluids = new LinkedHashMap<>();
    private final Map<String, List<String>> stepSources = new LinkedHashMap<>();
    private final Map<String, Map<ProteinGroup, AcidBaseSystem>> proteinGroups = new LinkedHashMap<>();
    private final Map<String, Component> ions = new LinkedHashMap<>();
    private final Map<String, Component> solutes = new LinkedHashMap<>();
    private final Map<String, Substance> substances = new LinkedHashMap<>();
    private final Map<String, Substance> index = new LinkedHashMap<>();
    private final Map<String, List<String>> ambiguous = new LinkedHashMap<>();
    private final Map<String, String> files = new LinkedHashMap<>();   // source -> SHA-256 of its bytes

    public LibraryLoader(SchemaCatalog schemas) {
        this.schemas = schemas;
    }

    public static SubstanceLibrary shipped(SchemaCatalog schemas) {
        return new LibraryLoader(schemas).addShipped().build();
    }

    public LibraryLoader addShipped() {
        try (InputStream in = LibraryLoader.class.getResourceAsStream(SHIPPED)) {
            if (in == null) {
                throw new IllegalStateException("the shipped substance library is missing from the jar");
            }
            return add("shipped library", in.readAllBytes(), false);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Adds one library file; throws {@link DocumentException} with every problem found in it. */
    public LibraryLoader add(String source, byte[] content, boolean user) {
        SourceDocument doc = reader.read(source, content);
        List<Problem> problems = new ArrayList<>(schemas.validate(doc, SCHEMA));
        if (!problems.isEmpty()) {
            throw new DocumentException(problems);
        }
        new FileReader(doc, user, problems).read();
        if (!problems.isEmpty()) {
            throw new DocumentException(problems);
        }
        files.put(source, Digests.sha256(content));
        return this;
    }

    public SubstanceLibrary build() {
        return new SubstanceLibrary(systems, stepSources, ions, solutes, substances, index, ambiguous, files,
                complexes, complexSources, phases, phaseSources, solubilities, proteinGroups, List.of(), drugs, fluids);
    }

    /** Reads one validated file into the builder's maps, collecting problems. */
    private final class FileReader {
        private final SourceDocument doc;
        private final boolean user;
        private final List<Problem> problems;

        FileReader(SourceDocument doc, boolean user, List<Problem> problems) {
            this.doc = doc;
            this.user = user;
            this.problems = problems;
        }

        void read() {
            JsonNode root = doc.root();
            each(root, "systems", this::system);
            each(root, "ions", (n, p) -> named(ions, n, p, new Component(n.get("name").asString(),
                    n.get("charge").asInt()), "ion"));
            each(root, "solutes", (n, p) -> named(solutes, n, p, new Component(n.get("name").asString(), 0),
                    "solute"));
            each(root, "substances", this::substance);
            each(root, "ambiguousNames", this::ambiguousName);
            each(root, "complexes", this::complex);
            each(root, "phases", this::phase);
            each(root, "solubilities", this::solubility);
            each(root, "drugSubstances", this::drug);
            each(root, "fluids", this::fluid);
        }

        /**
         * A receiving fluid: its components per litre, each a known substance with an amount per litre (mass or amount
         * concentration), and its temperature and CO2.
         */
        private void fluid(JsonNode n, String pointer) {
            List<org.protolyte.document.Formulation.Line> lines = new ArrayList<>();
            for (int i = 0; i < n.get("components").size(); i++) {
                JsonNode c = n.get("components").get(i);
                String at = pointer + "/components/" + i;
                String name = c.get("substance").asString();
                if (!index.containsKey(SubstanceLibrary.normalise(name))) {
                    problems.add(doc.problem(at + "/substance", "'" + name + "' is not a substance of the library"));
                    continue;
                }
                try {
                    org.protolyte.units.Quantity q = org.protolyte.units.Quantity.parse(c.get("amount").asString())
                            .require("an amount per litre of fluid", org.protolyte.units.Dimension.MASS_CONCENTRATION,
                                    org.protolyte.units.Dimension.AMOUNT_CONCENTRATION);
                    lines.add(new org.protolyte.document.Formulation.Line(i, name, Optional.of(q), Optional.empty(),
                            Optional.empty(), Optional.empty(), at, Optional.empty()));
                } catch (org.protolyte.units.UnitException e) {
                    problems.add(doc.problem(at + "/amount", e.getMessage()));
                }
            }
            List<String> synonyms = new ArrayList<>();
            n.path("synonyms").forEach(x -> synonyms.add(x.asString()));
            java.util.OptionalDouble co2 = n.has("co2") ? java.util.OptionalDouble.of(n.get("co2").asDouble() * 1000)
                    : java.util.OptionalDouble.empty();
            named(fluids, n, pointer, new Fluid(n.get("name").asString(), synonyms, lines,
                    n.get("temperature").asDouble() + org.protolyte.chemistry.Thermo.KELVIN_OFFSET, co2,
                    n.get("source").asString(), doc, pointer), "fluid");
        }

        /**
         * A drug substance: its system, the free form's intrinsic solubility (a solid dissolving into the system's
         * uncharged form, or the form named) and its salts (solids as in {@code phases}), each source kept as a phase's.
         */
        private void drug(JsonNode n, String pointer) {
            String name = n.get("name").asString();
            AcidBaseSystem system = systems.get(n.get("system").asString());
            if (system == null) {
                problems.add(doc.problem(pointer + "/system", "'" + n.get("system").asString() + "' is not an acid–base "
                        + "system of the library"));
                return;
            }
            JsonNode free = n.get("freeForm");
            List<AcidBaseSystem.Form> uncharged = system.forms().stream().filter(f -> free.has("form")
                    ? f.name().equals(free.get("form").asString()) : f.charge() == 0).toList();
            if (uncharged.size() != 1) {
                problems.add(doc.problem(pointer + "/freeForm" + (free.has("form") ? "/form" : ""), free.has("form")
                        ? "'" + free.get("form").asString() + "' is not a form of " + system.name()
                        : system.name() + " has " + uncharged.size() + " forms of charge 0; name the free form's"));
                return;
            }
            if (!ordered(free, pointer + "/freeForm")) {
                return;
            }
            List<SolidPhase> salts = new ArrayList<>();
            Map<String, Double> uDeltaH = new LinkedHashMap<>();
            for (int i = 0; i < n.path("salts").size(); i++) {
                JsonNode salt = n.get("salts").get(i);
                String at = pointer + "/salts/" + i;
                Map<String, Double> parts = new LinkedHashMap<>();
                for (var e : salt.get("ions").properties()) {
                    if (!e.getKey().equals(SolidPhase.HYDROGEN) && !knownSpecies(e.getKey())) {
                        problems.add(doc.problem(at + "/ions/" + e.getKey(), "'" + e.getKey() + "' is not H+, an ion, "
                                + "a form of an acid–base system or a complex in the library"));
                        return;
                    }
                    parts.put(e.getKey(), e.getValue().asDouble());
                }
                if (!ordered(salt, at)) {
                    return;
                }
                salts.add(new SolidPhase(salt.get("name").asString(), salt.get("formula").asString(), parts,
                        solid(salt, "log10Ksp")));
                uDeltaH.put(salt.get("name").asString(), deltaHUncertainty(salt));
                phaseSources.put(salt.get("name").asString(), salt.get("source").asString());
            }
            SolidPhase freeForm = new SolidPhase(name + " (free form)", uncharged.get(0).name(),
                    Map.of(uncharged.get(0).name(), 1.0), solid(free, "log10S0"));
            uDeltaH.put(freeForm.name(), deltaHUncertainty(free));
            try {
                DrugSubstance d = new DrugSubstance(name, system, freeForm, salts, uDeltaH);
                named(drugs, n, pointer, d, "drug substance");
                phaseSources.put(freeForm.name(), free.get("source").asString());
            } catch (IllegalArgumentException e) {
                problems.add(doc.problem(pointer + "/salts", e.getMessage()));
            }
        }

        /** A drug's solid: log10 K at 25 °C and ΔH° (kJ/mol) of dissolution, van 't Hoff with ΔCp° 0. */
        private static FormationConstant solid(JsonNode n, String logField) {
            return new FormationConstant(n.get(logField).asDouble(), n.path("deltaH").asDouble(0) * 1000, 0,
                    n.get("uncertainty").asDouble(), TemperatureRange.celsius(n.get("validFrom").asDouble(),
                    n.get("validTo").asDouble()));
        }

        /** u(ΔH°) of a drug's solid, J/mol: the source's, or the library's default ({@link UncertaintyDefaults}). */
        private static double deltaHUncertainty(JsonNode n) {
            if (!n.has("deltaH")) {
                return UncertaintyDefaults.UNPUBLISHED_SOLUTION_DELTA_H * 1000;
            }
            return n.path("deltaHUncertainty").asDouble(UncertaintyDefaults.DELTA_H) * 1000;
        }

        /** A salt's solubility table: its ions (as in a phase), the library forms that are the salt, the points. */
        private void solubility(JsonNode n, String pointer) {
            Map<String, Integer> parts = new LinkedHashMap<>();
            for (var e : n.get("ions").properties()) {
                if (!knownSpecies(e.getKey())) {
                    problems.add(doc.problem(pointer + "/ions/" + e.getKey(), "'" + e.getKey() + "' is not an ion or a "
                            + "form of an acid–base system in the library"));
                    return;
                }
                parts.put(e.getKey(), e.getValue().asInt());
            }
            List<String> forms = new ArrayList<>();
            for (int i = 0; i < n.get("forms").size(); i++) {
                String form = n.get("forms").get(i).asString();
                if (!substances.containsKey(form)) {
                    problems.add(doc.problem(pointer + "/forms/" + i, "'" + form + "' is not a substance in the library"));
                    return;
                }
                forms.add(form);
            }
            JsonNode points = n.get("points");
            double[] t = new double[points.size()];
            double[] g = new double[points.size()];
            for (int i = 0; i < t.length; i++) {
                t[i] = points.get(i).get(0).asDouble();
                g[i] = points.get(i).get(1).asDouble();
            }
            try {
                named(solubilities, n, pointer, new SaltSolubility(n.get("name").asString(), n.get("formula").asString(),
                        n.get("molarMass").asDouble(), parts, forms, t, g, n.get("source").asString()), "solubility");
            } catch (IllegalArgumentException e) {
                problems.add(doc.problem(pointer + "/points", e.getMessage()));
            }
        }

        private boolean knownSpecies(String species) {
            return ions.containsKey(species) || complexes.containsKey(species)
                    || systems.values().stream().flatMap(sys -> sys.species().stream())
                            .anyMatch(x -> x.name().equals(species));
        }

        /** A solid phase: the free species it dissolves into (ion, acid–base form, complex or H+) and its Ksp(T). */
        private void phase(JsonNode n, String pointer) {
            Map<String, Double> parts = new LinkedHashMap<>();
            for (var e : n.get("ions").properties()) {
                String species = e.getKey();
                if (!species.equals(SolidPhase.HYDROGEN) && !knownSpecies(species)) {
                    problems.add(doc.problem(pointer + "/ions/" + species, "'" + species + "' is not H+, an ion, a form "
                            + "of an acid–base system or a complex in the library"));
                    return;
                }
                parts.put(species, e.getValue().asDouble());
            }
            if (!ordered(n, pointer)) {
                return;
            }
            try {
                FormationConstant ksp = constant(n, "log10Ksp", "log10KspEquation");
                if (ksp == null) {
                    problems.add(doc.problem(pointer + "/log10KspEquation", String.format(Locale.ROOT,
                            "the equation's log10 Ksp at 25 °C differs from log10Ksp by more than 0.02")));
                    return;
                }
                SolidPhase phase = new SolidPhase(n.get("name").asString(), n.get("formula").asString(), parts, ksp);
                named(phases, n, pointer, phase, "solid phase");
                phaseSources.put(phase.name(), n.get("source").asString());
            } catch (IllegalArgumentException e) {
                problems.add(doc.problem(pointer, e.getMessage()));
            }
        }

        /** A range of data from validFrom up to validTo; the reverse is refused at its place. */
        private boolean ordered(JsonNode n, String pointer) {
            if (n.get("validFrom").asDouble() > n.get("validTo").asDouble()) {
                problems.add(doc.problem(pointer + "/validTo", "validTo is below validFrom"));
                return false;
            }
            return true;
        }

        /**
         * A constant at 25 °C with ΔH° (kJ/mol) and ΔCp°, or by the source's equation where {@code equationField} is
         * given; null where the equation disagrees with the 25 °C value.
         */
        private FormationConstant constant(JsonNode n, String logField, String equationField) {
            TemperatureRange range = TemperatureRange.celsius(n.get("validFrom").asDouble(), n.get("validTo").asDouble());
            double log = n.get(logField).asDouble();
            double u = n.get("uncertainty").asDouble();
            if (!n.has(equationField)) {
                return new FormationConstant(log, n.path("deltaH").asDouble(0) * 1000, n.path("deltaCp").asDouble(0), u,
                        range);
            }
            double[] a = new double[5];
            for (int i = 0; i < 5; i++) {
                a[i] = n.get(equationField).get(i).asDouble();
            }
            FormationConstant k = FormationConstant.ofEquation(a, u, range);
            return Math.abs(k.log10K25() - log) > 0.02 ? null : k;
        }

        /**
         * A complex or ion pair: its components by name (an ion, a solute, or any form of an acid–base system), the
         * protons it carries beyond them, and its formation constant from those. A form other than the least protonated
         * brings its protons and its own β, so a constant is entered as published (Ca+2 + HPO4-2 = CaHPO4) and solved
         * from the system's basis.
         */
        private void complex(JsonNode n, String pointer) {
            Map<Component, Integer> parts = new LinkedHashMap<>();
            int protons = n.path("protons").asInt(0);
            if (!ordered(n, pointer)) {
                return;
            }
            FormationConstant k = constant(n, "log10K", "log10KEquation");
            if (k == null) {
                problems.add(doc.problem(pointer + "/log10KEquation",
                        "the equation's log10 K at 25 °C differs from log10K by more than 0.02"));
                return;
            }
            for (var e : n.get("components").properties()) {
                int count = e.getValue().asInt();
                Component c = ions.get(e.getKey());
                if (c == null) {
                    c = solutes.get(e.getKey());
                }
                if (c == null) {        // a form of an acid–base system: its basis, with the form's protons and β
                    Species form = systems.values().stream().flatMap(sys -> sys.species().stream())
                            .filter(x -> x.name().equals(e.getKey())).findFirst().orElse(null);
                    if (form != null) {
                        c = form.components().keySet().iterator().next();
                        protons += count * form.protons();
                        k = k.plus(form.formation().times(count));
                    }
                }
                if (c == null) {
                    problems.add(doc.problem(pointer + "/components/" + e.getKey(), "'" + e.getKey() + "' is not an "
                            + "ion, a solute or a form of an acid–base system in the library"));
                    return;
                }
                parts.merge(c, count, Integer::sum);
            }
            try {
                Species s = new Species(n.get("name").asString(), n.get("charge").asInt(), parts, protons, k);
                named(complexes, n, pointer, s, "complex");
                complexSources.put(s.name(), n.get("source").asString());
            } catch (IllegalArgumentException e) {
                problems.add(doc.problem(pointer, e.getMessage()));
            }
        }

        private void each(JsonNode root, String field, java.util.function.BiConsumer<JsonNode, String> f) {
            JsonNode arr = root.get(field);
            if (arr == null) {
                return;
            }
            for (int i = 0; i < arr.size(); i++) {
                f.accept(arr.get(i), "/" + field + "/" + i);
            }
        }

        private <T> void named(Map<String, T> into, JsonNode n, String pointer, T value, String what) {
            String name = n.get("name").asString();
            if (into.containsKey(name)) {
                if (!user || !n.path("replaces").asBoolean(false)) {
                    problems.add(doc.problem(pointer + "/name", what + " '" + name + "' is already defined"
                            + (user ? "; declare \"replaces\": true to replace it" : "")));
                    return;
                }
            }
            into.put(name, value);
        }

        /**
         * A step as the library gives it, with the stated default for each uncertainty of ΔH° and ΔCp° its source
         * does not give ({@link UncertaintyDefaults}); a ΔH° or ΔCp° of 0 is one not published.
         */
        private static DissociationStep step(JsonNode s, double from, double to) {
            double deltaH = s.get("deltaH").asDouble();
            double deltaCp = s.path("deltaCp").asDouble(0);
            List<String> assumed = new ArrayList<>();   // in this order: ΔH°, then ΔCp°
            double uH;
            if (s.has("deltaHUncertainty")) {
                uH = s.get("deltaHUncertainty").asDouble();
            } else {
                uH = deltaH == 0 ? UncertaintyDefaults.UNPUBLISHED_DELTA_H : UncertaintyDefaults.DELTA_H;
                assumed.add(deltaH == 0 ? "ΔH° not published" : "u(ΔH°)");
            }
            double uCp;
            if (s.has("deltaCpUncertainty")) {
                uCp = s.get("deltaCpUncertainty").asDouble();
            } else {
                uCp = deltaCp == 0 ? UncertaintyDefaults.UNPUBLISHED_DELTA_CP : UncertaintyDefaults.DELTA_CP;
                assumed.add(deltaCp == 0 ? "ΔCp° not published" : "u(ΔCp°)");
            }
            return new DissociationStep(s.get("pKa").asDouble(), deltaH * 1000, deltaCp, s.get("uncertainty").asDouble(),
                    TemperatureRange.celsius(from, to), uH * 1000, s.path("pKaDeltaHCorrelation").asDouble(0), uCp,
                    assumed);
        }

        /**
         * A step whose temperature terms are a model compound's ({@code temperatureAs}): its own pKa and uncertainty,
         * the named step's ΔH°, ΔCp°, their uncertainties and range. Empty, with a problem, where that step is not above.
         */
        private Optional<DissociationStep> borrowed(JsonNode s, String pointer) {
            JsonNode ref = s.get("temperatureAs");
            AcidBaseSystem model = systems.get(ref.get("system").asString());
            int k = ref.get("step").asInt();
            if (model == null || k > model.steps().size()) {
                problems.add(doc.problem(pointer + "/temperatureAs", "temperatureAs names step " + k + " of '"
                        + ref.get("system").asString() + "', which is not a system with that step listed before this one"));
                return Optional.empty();
            }
            DissociationStep m = model.steps().get(k - 1);
            return Optional.of(new DissociationStep(s.get("pKa").asDouble(), m.deltaH(), m.deltaCp(),
                    s.get("uncertainty").asDouble(), m.validity(), m.deltaHUncertainty(), 0, m.deltaCpUncertainty(),
                    m.assumed()));
        }

        private void system(JsonNode n, String pointer) {
            String name = n.get("name").asString();
            List<AcidBaseSystem.Form> forms = new ArrayList<>();
            for (JsonNode f : n.get("forms")) {
                forms.add(new AcidBaseSystem.Form(f.get("name").asString(), f.get("charge").asInt()));
            }
            List<DissociationStep> steps = new ArrayList<>();
            List<String> sources = new ArrayList<>();
            for (int i = 0; i < n.get("steps").size(); i++) {
                JsonNode s = n.get("steps").get(i);
                if (s.has("temperatureAs")) {
                    Optional<DissociationStep> b = borrowed(s, pointer + "/steps/" + i);
                    if (b.isEmpty()) {
                        return;
                    }
                    steps.add(b.get());
                    sources.add(s.get("source").asString());
                    continue;
                }
                double from = s.get("validFrom").asDouble();
                double to = s.get("validTo").asDouble();
                if (from > to) {
                    problems.add(doc.problem(pointer + "/steps/" + i + "/validTo", "validTo is below validFrom"));
                    return;
                }
                steps.add(step(s, from, to));
                sources.add(s.get("source").asString());
            }
            try {
                AcidBaseSystem system = new AcidBaseSystem(name, forms, steps);
                named(systems, n, pointer, system, "acid–base system");
                stepSources.put(name, List.copyOf(sources));
                if (n.has("proteinGroup")) {
                    proteinGroup(n.get("proteinGroup"), pointer + "/proteinGroup", system);
                }
            } catch (IllegalArgumentException e) {
                problems.add(doc.problem(pointer, e.getMessage()));
            }
        }

        /** A protein group must be one step from a form of charge +1 or 0 to one charge less (schema: its name). */
        private void proteinGroup(JsonNode g, String pointer, AcidBaseSystem system) {
            ProteinGroup group = ProteinGroup.named(g.get("group").asString());
            if (system.steps().size() != 1 || system.forms().get(0).charge() != group.protonatedCharge()) {
                problems.add(doc.problem(pointer, "a protein group " + group.label() + " is one dissociation step from "
                        + "a form of charge " + group.protonatedCharge() + " to one of charge "
                        + (group.protonatedCharge() - 1)));
                return;
            }
            Map<ProteinGroup, AcidBaseSystem> set = proteinGroups.computeIfAbsent(g.get("set").asString(),
                    k -> new java.util.EnumMap<>(ProteinGroup.class));
            if (set.put(group, system) != null && !user) {
                problems.add(doc.problem(pointer, "the set '" + g.get("set").asString() + "' has group "
                        + group.label() + " twice"));
            }
        }

        private void substance(JsonNode n, String pointer) {
            String name = n.get("name").asString();
            int before = problems.size();
            Optional<Formula> formula = Optional.empty();
            if (n.has("formula")) {
                try {
                    formula = Optional.of(Formula.parse(n.get("formula").asString()));
                } catch (IllegalArgumentException e) {
                    problems.add(doc.problem(pointer + "/formula", e.getMessage()));
                }
            }
            boolean nominal = n.path("nominalMolarMass").asBoolean(false);
            OptionalDouble declared = n.has("molarMass") ? OptionalDouble.of(n.get("molarMass").asDouble())
                    : OptionalDouble.empty();
            OptionalDouble molarMass = declared;
            if (formula.isPresent() && !nominal) {
                double computed = formula.get().molarMass();
                molarMass = OptionalDouble.of(computed);
                if (declared.isPresent() && Math.abs(declared.getAsDouble() - computed) > MOLAR_MASS_TOLERANCE) {
                    problems.add(doc.problem(pointer + "/molarMass", String.format(Locale.ROOT,
                            "declared molar mass %.3f g/mol does not match the formula %s (%.3f g/mol)",
                            declared.getAsDouble(), formula.get(), computed)));
                }
            }
            Composition composition = composition(n.get("composition"), pointer + "/composition");
            if (problems.size() > before) {
                return;
            }
            List<String> synonyms = new ArrayList<>();
            n.path("synonyms").forEach(s -> synonyms.add(s.asString()));
            Substance s = new Substance(name, synonyms, formula, molarMass, nominal,
                    n.path("solvent").asBoolean(false), composition,
                    n.has("apparentMolarVolume") ? OptionalDouble.of(n.get("apparentMolarVolume").asDouble())
                            : OptionalDouble.empty(),
                    n.path("apparentMolarVolumeSource").asString(""),
                    n.has("density") ? OptionalDouble.of(n.get("density").asDouble()) : OptionalDouble.empty(),
                    n.path("notes").asString(""), handling(n), doc.source());
            register(s, n, pointer);
        }

        private Handling handling(JsonNode n) {
            List<Handling.Hazard> hazards = new ArrayList<>();
            for (JsonNode h : n.path("hazards")) {
                hazards.add(new Handling.Hazard(h.get("classification").asString(), h.get("statement").asString(),
                        h.path("appliesTo").asString("the substance as supplied"), h.get("source").asString()));
            }
            JsonNode light = n.get("lightSensitivity");
            JsonNode sol = n.get("solubility");
            JsonNode hyg = n.get("hygroscopy");
            return new Handling(hazards,
                    light == null ? Optional.empty()
                            : Optional.of(new Handling.Light(light.get("text").asString(), light.get("source").asString(),
                            light.path("photosensitiser").asBoolean(false),
                            light.path("onlyWithPhotosensitiser").asBoolean(false))),
                    sol == null ? Optional.empty() : Optional.of(new Handling.Solubility(
                            sol.has("gramsPerLitre") ? OptionalDouble.of(sol.get("gramsPerLitre").asDouble())
                                    : OptionalDouble.empty(),
                            sol.has("term") ? Optional.of(sol.get("term").asString()) : Optional.empty(),
                            sol.get("temperature").asDouble(), sol.get("source").asString())),
                    hyg == null ? Optional.empty() : Optional.of(new Handling.Hygroscopy(hyg.get("behaviour").asString(),
                            hyg.path("text").asString(""), hyg.get("source").asString())));
        }

        private void register(Substance s, JsonNode n, String pointer) {
            boolean replaces = user && n.path("replaces").asBoolean(false);
            Substance old = substances.get(s.name());
            if (old != null && !replaces) {
                problems.add(doc.problem(pointer + "/name", "substance '" + s.name() + "' is already defined in "
                        + old.origin() + (user ? "; declare \"replaces\": true to replace it" : "")));
                return;
            }
            if (old != null) {
                index.values().removeIf(v -> v.name().equals(old.name()));
            }
            List<String> keys = new ArrayList<>();
            keys.add(s.name());
            keys.addAll(s.synonyms());
            for (int i = 0; i < keys.size(); i++) {
                String key = SubstanceLibrary.normalise(keys.get(i));
                Substance other = index.get(key);
                if (other != null && !other.name().equals(s.name())) {
                    String where = i == 0 ? pointer + "/name" : pointer + "/synonyms/" + (i - 1);
                    problems.add(doc.problem(where, "'" + keys.get(i) + "' already names '" + other.name()
                            + "'; a name must resolve to one form"));
                    return;
                }
            }
            substances.put(s.name(), s);
            for (String k : keys) {
                index.put(SubstanceLibrary.normalise(k), s);
            }
        }

        private Composition composition(JsonNode n, String pointer) {
            Map<String, Double> ionAmounts = new LinkedHashMap<>();
            double charge = n.path("protons").asDouble(0);
            JsonNode ionNode = n.path("ions");
            for (String name : ionNode.propertyNames()) {
                Component c = ions.get(name);
                if (c == null) {
                    problems.add(doc.problem(pointer + "/ions/" + name, "unknown ion '" + name + "'"));
                    continue;
                }
                double count = ionNode.get(name).asDouble();
                ionAmounts.put(name, count);
                charge += c.charge() * count;
            }
            List<Composition.SystemPart> parts = new ArrayList<>();
            JsonNode sys = n.path("systems");
            for (int i = 0; i < sys.size(); i++) {
                JsonNode part = sys.get(i);
                String sysName = part.get("system").asString();
                AcidBaseSystem system = systems.get(sysName);
                if (system == null) {
                    problems.add(doc.problem(pointer + "/systems/" + i + "/system",
                            "unknown acid–base system '" + sysName + "'"));
                    continue;
                }
                int form = system.indexOf(part.get("form").asString());
                if (form < 0) {
                    problems.add(doc.problem(pointer + "/systems/" + i + "/form", "system '" + sysName
                            + "' has no form '" + part.get("form").asString() + "'; its forms: "
                            + system.forms().stream().map(AcidBaseSystem.Form::name).toList()));
                    continue;
                }
                double count = part.get("count").asDouble();
                parts.add(new Composition.SystemPart(sysName, part.get("form").asString(), count));
                charge += system.forms().get(form).charge() * count;
            }
            Map<String, Double> soluteAmounts = new LinkedHashMap<>();
            JsonNode sol = n.path("solutes");
            for (String name : sol.propertyNames()) {
                if (!solutes.containsKey(name)) {
                    problems.add(doc.problem(pointer + "/solutes/" + name, "unknown solute '" + name + "'"));
                    continue;
                }
                soluteAmounts.put(name, sol.get(name).asDouble());
            }
            if (Math.abs(charge) > 1e-9) {
                problems.add(doc.problem(pointer, String.format(Locale.ROOT,
                        "composition is not electrically neutral (net charge %+.3f per mole)", charge)));
            }
            return new Composition(ionAmounts, parts, soluteAmounts);
        }

        private void ambiguousName(JsonNode n, String pointer) {
            List<String> forms = new ArrayList<>();
            for (int i = 0; i < n.get("forms").size(); i++) {
                String f = n.get("forms").get(i).asString();
                if (!substances.containsKey(f)) {
                    problems.add(doc.problem(pointer + "/forms/" + i, "no substance named '" + f + "'"));
                }
                forms.add(f);
            }
            String key = SubstanceLibrary.normalise(n.get("name").asString());
            if (index.containsKey(key)) {
                problems.add(doc.problem(pointer + "/name", "'" + n.get("name").asString()
                        + "' already names the substance '" + index.get(key).name() + "'"));
                return;
            }
            ambiguous.merge(key, forms, (a, b) -> {
                List<String> all = new ArrayList<>(a);
                b.stream().filter(f -> !all.contains(f)).forEach(all::add);
                return all;
            });
        }
    }
}
