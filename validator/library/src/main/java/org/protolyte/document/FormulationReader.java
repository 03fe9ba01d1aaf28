package org.protolyte.document;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

import org.protolyte.units.Air;
import org.protolyte.units.Dimension;
import org.protolyte.units.Quantity;
import org.protolyte.units.UnitException;

import tools.jackson.databind.JsonNode;

/**
 * Reads a formulation document: schema first, then the rules a schema cannot state, then the typed
 * {@link Formulation}. Every problem names its place; all of them are collected before failing.
 */
public final class FormulationReader {

    public static final String SCHEMA = "formulation.schema.json";
    static final double DEFAULT_TEMPERATURE = 298.15;

    /** The largest dilution of a concentrate accepted: ten times the usual 1000x (common practice). */
    static final double MAX_DILUTION = 1e4;

    private final SchemaCatalog schemas;

    public FormulationReader(SchemaCatalog schemas) {
        this.schemas = schemas;
    }

    public Formulation read(SourceDocument doc) {
        JsonNode root = doc.root();
        if (!root.isObject() || !"formulation".equals(root.path("document").asString(""))) {
            throw new DocumentException(doc.problem(root.isObject() && root.has("document") ? "/document" : "",
                    "not a Protolyte formulation document: expected \"document\": \"formulation\""));
        }
        List<Problem> problems = schemas.validate(doc, SCHEMA);
        if (!problems.isEmpty()) {
            throw new DocumentException(problems);
        }
        return new Parse(doc).formulation();
    }

    /**
     * Why a name is refused: a control character (a NUL, a newline, an escape) would be dropped or folded when the
     * name is matched, so another text than the one written would be looked up. Empty when the name is printable.
     */
    public static Optional<String> controlCharacter(String name) {
        for (int i = 0; i < name.length(); i++) {
            char c = name.charAt(i);
            if (Character.isISOControl(c)) {
                return Optional.of(String.format(java.util.Locale.ROOT,
                        "a substance name must not hold a control character (U+%04X at character %d)", (int) c, i + 1));
            }
        }
        return Optional.empty();
    }

    /** One document's parse, collecting problems. */
    private static final class Parse {
        private final SourceDocument doc;
        private final List<Problem> problems = new ArrayList<>();
        private boolean basisIsFinalVolume;
        private double finalLitres;

        Parse(SourceDocument doc) {
            this.doc = doc;
        }

        Formulation formulation() {
            JsonNode root = doc.root();
            Formulation.Basis basis = basis(root.get("basis"));
            basisIsFinalVolume = basis.finalVolume();
            finalLitres = basis.amount();
            List<Formulation.Line> lines = new ArrayList<>();
            JsonNode comps = root.get("components");
            for (int i = 0; i < comps.size(); i++) {
                lines.add(line(comps.get(i), i));
            }
            Optional<Formulation.PhTarget> target = root.path("targets").has("pH")
                    ? Optional.ofNullable(target(root.path("targets").get("pH"))) : Optional.empty();
            List<Formulation.Condition> conditions = conditions(root.path("conditions"), target);
            JsonNode waivers = root.path("waivers");
            for (int i = 0; i < waivers.size(); i++) {
                try {
                    WaiverDates.read(doc, waivers.get(i), "/waivers/" + i);
                } catch (DocumentException e) {
                    problems.addAll(e.problems());
                }
            }
            if (!problems.isEmpty()) {
                throw new DocumentException(problems);
            }
            Optional<Double> dose = root.has("dose") ? positive(root.get("dose").get("volume"), "/dose/volume",
                    "a dose volume", Dimension.VOLUME).map(Quantity::base) : Optional.empty();
            Optional<Double> perDay = root.path("dose").has("perDay")
                    ? Optional.of(root.get("dose").get("perDay").asDouble()) : Optional.empty();
            if (!problems.isEmpty()) {
                throw new DocumentException(problems);
            }
            Optional<Formulation.Dilution> dilution = Optional.empty();
            if (root.has("dilution")) {
                JsonNode d = root.get("dilution");
                double factor = d.has("factor") ? d.get("factor").asDouble()
                        : (d.get("parts").get("concentrate").asDouble() + d.get("parts").get("diluent").asDouble())
                                / d.get("parts").get("concentrate").asDouble();
                if (!(factor <= MAX_DILUTION)) {
                    throw new DocumentException(doc.problem("/dilution", "a dilution of " + factor + " times is "
                            + "outside the plausible range (1, " + (long) MAX_DILUTION + "]: concentrates are made "
                            + "2x to 1000x (common practice)"));
                }
                dilution = Optional.of(new Formulation.Dilution(factor, d.path("diluent").asString("water"), "/dilution"));
            }
            List<Formulation.Admixture> admixtures = new ArrayList<>();
            for (int i = 0; i < root.path("admixture").size(); i++) {
                JsonNode a = root.get("admixture").get(i);
                String[] parts = a.get("ratio").asString().split("\\+");
                double product = Double.parseDouble(parts[0].trim());
                double fluid = Double.parseDouble(parts[1].trim());
                if (!(product > 0 && fluid > 0)) {
                    throw new DocumentException(doc.problem("/admixture/" + i + "/ratio", "both volumes of the ratio "
                            + "must be above zero: product + fluid, as \"1 + 9\""));
                }
                admixtures.add(new Formulation.Admixture(a.get("into").asString(), product, fluid, "/admixture/" + i));
            }
            return new Formulation(doc, root.get("id").asString(), text(root, "title"), text(root, "revision"),
                    text(root, "intendedUse"), basis, lines, target, conditions, dose, perDay, dilution, admixtures);
        }

        private static Optional<String> text(JsonNode n, String field) {
            return n.has(field) ? Optional.of(n.get(field).asString()) : Optional.empty();
        }

        private Optional<Quantity> quantity(JsonNode n, String pointer, String what, Dimension... allowed) {
            try {
                Quantity q = n.isString() ? Quantity.parse(n.asString())
                        : Quantity.of(n.get("value").asDouble(), JsonReader.written(n.get("value")), n.get("unit").asString());
                return within(Optional.of(q.require(what, allowed)), pointer, what, Plausible.of(q.dimension()));
            } catch (UnitException e) {
                problems.add(doc.problem(pointer, e.getMessage()));
                return Optional.empty();
            }
        }

        /** The quantity if it lies in the range; otherwise a problem at the pointer. */
        private Optional<Quantity> within(Optional<Quantity> q, String pointer, String what, Plausible range) {
            Optional<String> outside = q.flatMap(x -> range.check(what, x));
            outside.ifPresent(why -> problems.add(doc.problem(pointer, why)));
            return outside.isPresent() ? Optional.empty() : q;
        }

        private Optional<Quantity> positive(JsonNode n, String pointer, String what, Dimension... allowed) {
            Optional<Quantity> q = quantity(n, pointer, what, allowed);
            if (q.isPresent() && !(q.get().value() > 0)) {
                problems.add(doc.problem(pointer, what + " must be greater than zero, not " + q.get()));
                return Optional.empty();
            }
            return q;
        }

        private OptionalDouble temperature(JsonNode n, String pointer, Plausible range) {
            Optional<Quantity> q = within(quantity(n, pointer, "a temperature", Dimension.TEMPERATURE), pointer,
                    "a temperature", range);
            return q.isEmpty() ? OptionalDouble.empty() : OptionalDouble.of(q.get().base());
        }

        private Formulation.Basis basis(JsonNode n) {
            if (n.has("finalVolume")) {
                String p = "/basis/finalVolume";
                Optional<Quantity> q = positive(n.get("finalVolume"), p, "the final volume", Dimension.VOLUME);
                return new Formulation.Basis(true, q.map(Quantity::base).orElse(1.0), p);
            }
            String p = "/basis/waterMass";
            Optional<Quantity> q = positive(n.get("waterMass"), p, "the water mass", Dimension.MASS);
            return new Formulation.Basis(false, q.map(x -> x.base() / 1000).orElse(1.0), p);
        }

        private Formulation.Line line(JsonNode n, int i) {
            String p = "/components/" + i;
            String substance = n.get("substance").asString();
            controlCharacter(substance).ifPresent(why -> problems.add(doc.problem(p + "/substance", why)));
            boolean hasAmount = n.has("amount");
            boolean hasAdjust = n.has("adjustTo");
            if (hasAmount == hasAdjust) {
                problems.add(doc.problem(p, hasAmount
                        ? "component '" + substance + "' has both amount and adjustTo; give one"
                        : "component '" + substance + "' needs an amount, or adjustTo for q.s. to a pH"));
            }
            Optional<Quantity> amount = hasAmount ? positive(n.get("amount"), p + "/amount", "amount",
                    Dimension.MASS, Dimension.AMOUNT, Dimension.VOLUME, Dimension.AMOUNT_CONCENTRATION,
                    Dimension.MASS_CONCENTRATION, Dimension.MOLALITY, Dimension.VOLUME_FRACTION,
                    Dimension.MASS_FRACTION) : Optional.empty();
            Optional<Formulation.Stock> stock = Optional.empty();
            if (n.has("stock")) {
                JsonNode s = n.get("stock");
                Optional<Quantity> c = positive(s.get("concentration"), p + "/stock/concentration",
                        "a stock concentration", Dimension.AMOUNT_CONCENTRATION, Dimension.MASS_CONCENTRATION,
                        Dimension.MASS_FRACTION);
                Optional<Double> density = s.has("density")
                        ? positive(s.get("density"), p + "/stock/density", "a density", Dimension.DENSITY)
                        .map(Quantity::base) : Optional.empty();
                if (c.isPresent() && c.get().dimension() == Dimension.MASS_FRACTION && density.isEmpty()) {
                    problems.add(doc.problem(p + "/stock", "a stock given in % w/w needs its density, "
                            + "e.g. \"density\": \"1.18 g/mL\""));
                }
                if (c.isPresent()) {
                    stock = Optional.of(new Formulation.Stock(c.get(), density, p + "/stock"));
                }
            }
            Optional<Formulation.Adjustment> adjust = Optional.empty();
            if (hasAdjust) {
                JsonNode a = n.get("adjustTo");
                OptionalDouble t = temperature(a.get("temperature"), p + "/adjustTo/temperature",
                        Plausible.LIQUID_TEMPERATURE);
                OptionalDouble pH = a.has("pH") ? OptionalDouble.of(a.get("pH").asDouble()) : OptionalDouble.empty();
                double atVolume = 1;
                if (a.has("atVolume")) {
                    JsonNode v = a.get("atVolume");
                    String at = p + "/adjustTo/atVolume";
                    if (!basisIsFinalVolume) {
                        problems.add(doc.problem(at, "atVolume needs a finalVolume basis: there is no volume to make up to"));
                    } else if (v.isNumber()) {
                        atVolume = v.asDouble();
                    } else {
                        atVolume = positive(v, at, "a part volume", Dimension.VOLUME).map(q -> q.base() / finalLitres)
                                .orElse(1.0);
                        if (atVolume > 1) {
                            problems.add(doc.problem(at, "the part volume is larger than the final volume"));
                        }
                    }
                }
                adjust = Optional.of(new Formulation.Adjustment(pH, t.orElse(DEFAULT_TEMPERATURE), p + "/adjustTo",
                        atVolume));
            }
            Optional<Double> density = n.has("density")
                    ? positive(n.get("density"), p + "/density", "a density", Dimension.DENSITY).map(Quantity::base)
                    : Optional.empty();
            Optional<Double> tolerance = n.has("tolerance")
                    ? within(quantity(n.get("tolerance"), p + "/tolerance", "a weighing tolerance", Dimension.FRACTION),
                    p + "/tolerance", "a weighing tolerance", Plausible.TOLERANCE).map(Quantity::base) : Optional.empty();
            Optional<Formulation.Protein> protein = n.has("protein") ? protein(n.get("protein"), p + "/protein")
                    : Optional.empty();
            return new Formulation.Line(i, substance, amount, stock, adjust, density, p, tolerance, protein);
        }

        /** A protein line's definition (the schema has checked its shape: chains or groups, counts ≥ 0). */
        private Optional<Formulation.Protein> protein(JsonNode n, String p) {
            List<Formulation.Chain> chains = new ArrayList<>();
            JsonNode cs = n.path("chains");
            for (int k = 0; k < cs.size(); k++) {
                JsonNode c = cs.get(k);
                String at = p + "/chains/" + k;
                String seq = c.get("sequence").asString().replaceAll("\\s", "");
                chains.add(new Formulation.Chain(seq, c.path("copies").asInt(1),
                        c.path("nTerminus").asString("free").equals("acetylated"),
                        c.path("cTerminus").asString("free").equals("amidated"), at));
            }
            java.util.Map<String, Integer> groups = new java.util.LinkedHashMap<>();
            if (n.has("groups")) {
                for (var e : n.get("groups").properties()) {
                    groups.put(e.getKey(), e.getValue().asInt());
                }
            }
            OptionalDouble mass = OptionalDouble.empty();
            if (n.has("molarMass")) {
                Optional<Quantity> q = positive(n.get("molarMass"), p + "/molarMass", "a molar mass", Dimension.MOLAR_MASS);
                if (q.isEmpty()) {
                    return Optional.empty();
                }
                mass = OptionalDouble.of(q.get().base());
            } else if (chains.isEmpty()) {
                problems.add(doc.problem(p, "a protein given by its group counts needs its molarMass (\"148 kDa\")"));
                return Optional.empty();
            }
            List<Formulation.Counterion> counterions = new ArrayList<>();
            JsonNode ci = n.path("counterions");
            for (int k = 0; k < ci.size(); k++) {
                counterions.add(new Formulation.Counterion(ci.get(k).get("substance").asString(),
                        ci.get(k).get("perMole").asDouble(), p + "/counterions/" + k));
            }
            Optional<String> set = n.has("pKaSet") ? Optional.of(n.get("pKaSet").asString()) : Optional.empty();
            return Optional.of(new Formulation.Protein(chains, groups, n.path("disulfides").asInt(0), mass, set,
                    counterions, p));
        }

        /** CO2 partial pressure in Pa: "air", a fraction of the (stated or standard) pressure, or a pressure. */
        private OptionalDouble co2(JsonNode c, String p) {
            JsonNode co2 = c.get("co2");
            if (co2 == null) {
                return OptionalDouble.empty();
            }
            double pressure = Air.STANDARD_PRESSURE;   // where a condition states a CO2 fraction but no pressure
            if (c.has("pressure")) {
                Optional<Quantity> q = positive(c.get("pressure"), p + "/pressure", "a pressure", Dimension.PRESSURE);
                pressure = q.map(Quantity::base).orElse(pressure);
            }
            if (co2.isString() && co2.asString().equals("air")) {
                return OptionalDouble.of(Air.co2Pascal(pressure));
            }
            Optional<Quantity> q = quantity(co2, p + "/co2", "a CO2 level", Dimension.FRACTION, Dimension.PRESSURE);
            if (q.isEmpty()) {
                return OptionalDouble.empty();
            }
            double v = q.get().dimension() == Dimension.FRACTION ? q.get().base() * pressure : q.get().base();
            if (!(v >= 0) || q.get().dimension() == Dimension.FRACTION && q.get().base() > 1) {
                problems.add(doc.problem(p + "/co2", "a CO2 level must lie between 0 and 100 % of the gas phase"));
                return OptionalDouble.empty();
            }
            return OptionalDouble.of(v);
        }

        private Formulation.PhTarget target(JsonNode n) {
            String p = "/targets/pH";
            double min = Double.NEGATIVE_INFINITY;
            double max = Double.POSITIVE_INFINITY;
            if (n.has("value")) {
                min = n.get("value").asDouble() - n.get("tolerance").asDouble();
                max = n.get("value").asDouble() + n.get("tolerance").asDouble();
                if (n.has("min") || n.has("max")) {
                    problems.add(doc.problem(p, "give either value with tolerance, or min/max, not both"));
                }
            } else {
                min = n.has("min") ? n.get("min").asDouble() : min;
                max = n.has("max") ? n.get("max").asDouble() : max;
                if (min > max) {
                    problems.add(doc.problem(p + "/min", "min " + min + " is above max " + max));
                }
            }
            boolean stated = n.has("temperature");
            double t = stated ? temperature(n.get("temperature"), p + "/temperature",
                    Plausible.LIQUID_TEMPERATURE).orElse(DEFAULT_TEMPERATURE)
                    : DEFAULT_TEMPERATURE;
            return new Formulation.PhTarget(min, max, t, stated, p);
        }

        private List<Formulation.Condition> conditions(JsonNode n, Optional<Formulation.PhTarget> target) {
            List<Formulation.Condition> out = new ArrayList<>();
            Set<String> names = new HashSet<>();
            for (int i = 0; i < n.size(); i++) {
                String p = "/conditions/" + i;
                String name = n.get(i).get("name").asString();
                if (!names.add(name)) {
                    problems.add(doc.problem(p + "/name", "condition name '" + name + "' is used twice"));
                }
                OptionalDouble t = temperature(n.get(i).get("temperature"), p + "/temperature",
                        Plausible.CONDITION_TEMPERATURE);
                out.add(new Formulation.Condition(name, t.orElse(DEFAULT_TEMPERATURE), false, p, co2(n.get(i), p)));
            }
            if (out.isEmpty()) {
                out.add(new Formulation.Condition("use", DEFAULT_TEMPERATURE, true, ""));
            }
            if (target.isPresent()) {
                double tk = target.get().kelvin();
                boolean matched = out.stream().anyMatch(c -> Formulation.sameTemperature(c.kelvin(), tk));
                if (!matched) {
                    String name = names.contains("target") ? "target (pH)" : "target";
                    out.add(new Formulation.Condition(name, tk, true, target.get().pointer()));
                }
            }
            return out;
        }
    }
}
