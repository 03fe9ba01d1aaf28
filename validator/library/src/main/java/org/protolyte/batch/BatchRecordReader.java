package org.protolyte.batch;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

import org.protolyte.document.DocumentException;
import org.protolyte.document.Formulation;
import org.protolyte.document.FormulationReader;
import org.protolyte.document.JsonReader;
import org.protolyte.document.Location;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.document.SourceDocument;
import org.protolyte.document.Plausible;
import org.protolyte.units.Dimension;
import org.protolyte.units.Quantity;
import org.protolyte.units.UnitException;

import tools.jackson.databind.JsonNode;

/**
 * Reads a batch record and its master. A master path is resolved against the record's folder and must stay inside
 * {@code root}, the folder tree being checked (the record's own folder when a single file is checked): an absolute
 * path, a URL, a path that climbs out of the tree or a link that leads out of it is refused at /master/path.
 */
public final class BatchRecordReader {

    public static final String SCHEMA = "batch-record.schema.json";
    /**
     * A recorded pH lies within −2 to 16 inclusive, the display range of a laboratory pH meter (common practice): a
     * value beyond it cannot have been read and is a recording error. Inside it, a reading far from the buffers of
     * USP <791> and Ph. Eur. 2.2.3 (below 0 or above 14, say) is still a result: it is judged, and fails.
     */
    static final double MIN_PH = -2;
    static final double MAX_PH = 16;
    /** mOsm/kg: saturated sodium chloride is about 10,000; no medium comes near it (common practice). */
    static final double MAX_OSMOLALITY = 10000;
    /**
     * Certificate values, as fractions: an assay above 50 % and up to 102 % (pharmacopoeial assays on the dried
     * substance run to 100.5–102.0 %, e.g. 98.0–102.0 %), a water content or loss on drying below 90 % (common practice).
     */
    static final Plausible ASSAY = new Plausible(0.5, false, 1.02, true, "%", 100,
            "a certificate's assay lies above 50 % and, on the dried substance, up to 102 % (common practice)");
    static final Plausible WATER = new Plausible(0, true, 0.9, false, "%", 100,
            "water content or loss on drying is below 90 % of any material weighed as a solid (common practice)");

    private final SchemaCatalog schemas;
    private final FormulationReader formulations;
    private final JsonReader json = new JsonReader();

    public BatchRecordReader(SchemaCatalog schemas) {
        this.schemas = schemas;
        this.formulations = new FormulationReader(schemas);
    }

    /**
     * @param file the record's path; its folder where it was given as bytes read from one; empty for bytes without a
     *             folder (then only an embedded master is possible)
     * @param root the folder tree a master path must stay in
     */
    public BatchRecord read(SourceDocument doc, Optional<Path> file, Optional<Path> root) {
        List<Problem> problems = new ArrayList<>(schemas.validate(doc, SCHEMA));
        if (!problems.isEmpty()) {
            throw new DocumentException(problems);
        }
        JsonNode r = doc.root();
        Formulation master = master(doc, r.get("master"), file, root);
        Optional<String> revision = r.get("master").has("revision")
                ? Optional.of(r.get("master").get("revision").asString()) : Optional.empty();
        if (revision.isPresent() && !revision.equals(master.revision())) {
            problems.add(doc.problem("/master/revision", "the record follows revision " + revision.get()
                    + " of " + master.id() + ", but the master is revision " + master.revision().orElse("(none)")));
        }
        Quantity size = quantity(doc, r.get("batchSize"), "/batchSize", problems, Dimension.VOLUME, Dimension.MASS);
        double batchSize = Double.NaN;
        if (size != null) {
            boolean volume = size.dimension() == Dimension.VOLUME;
            if (volume != master.basis().finalVolume()) {
                problems.add(doc.problem("/batchSize", "the master is on a " + (master.basis().finalVolume()
                        ? "finalVolume" : "waterMass") + " basis, so the batch size must be a "
                        + (master.basis().finalVolume() ? "volume" : "water mass")));
            } else {
                batchSize = volume ? size.base() : size.base() / 1000;     // litres, or kg of water
            }
        }
        List<BatchRecord.Addition> additions = new ArrayList<>();
        for (int i = 0; i < r.get("additions").size(); i++) {
            BatchRecord.Addition a = addition(doc, r.get("additions").get(i), "/additions/" + i, problems);
            if (a != null) {
                additions.add(a);
            }
        }
        List<BatchRecord.Measurement> measurements = new ArrayList<>();
        for (int i = 0; i < r.path("measurements").size(); i++) {
            BatchRecord.Measurement m = measurement(doc, r.get("measurements").get(i), "/measurements/" + i, problems);
            if (m != null) {
                measurements.add(m);
            }
        }
        if (!problems.isEmpty()) {
            throw new DocumentException(problems);
        }
        return new BatchRecord(doc, r.get("id").asString(), r.get("batch").asString(), master, revision, batchSize,
                "/batchSize", additions, measurements);
    }

    private Formulation master(SourceDocument doc, JsonNode m, Optional<Path> file, Optional<Path> root) {
        if (m.has("formulation")) {
            String at = "/master/formulation";
            Map<String, Location> locations = new LinkedHashMap<>();
            doc.locations().forEach((p, l) -> {
                if (p.equals(at) || p.startsWith(at + "/")) {
                    locations.put(p.substring(at.length()), l);
                }
            });
            SourceDocument embedded = new SourceDocument(doc.source() + "#" + at, m.get("formulation"), locations);
            try {
                return formulations.read(embedded);
            } catch (DocumentException e) {
                throw new DocumentException(e.problems().stream().map(p -> doc.problem(at + p.pointer(),
                        "embedded master: " + p.message())).toList());
            }
        }
        String text = m.get("path").asString();
        Path target = inside(doc, text, file, root);
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(target);
        } catch (IOException e) {
            throw new DocumentException(doc.problem("/master/path", "cannot read the master '" + text + "': "
                    + e.getMessage()));
        }
        try {
            // named as the user reaches it: beside the record as the record was named (the real path is for reading)
            Path place = file.orElseThrow();
            return formulations.read(json.read((Files.isDirectory(place) ? place.resolve(text) : place.resolveSibling(text))
                    .normalize().toString(), bytes));
        } catch (DocumentException e) {
            throw new DocumentException(doc.problem("/master/path", "the master '" + text + "' is not a valid "
                    + "formulation: " + e.problems().get(0)));
        }
    }

    /** The master's real path, refused unless it is a relative path that stays inside the folder tree. */
    static Path inside(SourceDocument doc, String text, Optional<Path> file, Optional<Path> root) {
        String where = "/master/path";
        if (text.matches("^[A-Za-z][A-Za-z0-9+.-]*:.*") || text.startsWith("//") || text.startsWith("\\\\")) {
            throw new DocumentException(doc.problem(where, "the master reference '" + text + "' is a URL or a drive: "
                    + "a master is a relative path inside the folder tree being checked, and nothing is fetched"));
        }
        if (file.isEmpty() || root.isEmpty()) {
            throw new DocumentException(doc.problem(where, "a master path needs the record's folder; embed the "
                    + "master as \"formulation\" instead"));
        }
        Path relative;
        try {
            relative = Path.of(text);
        } catch (InvalidPathException e) {
            throw new DocumentException(doc.problem(where, "'" + text + "' is not a path: " + e.getMessage()));
        }
        if (relative.isAbsolute() || text.startsWith("/") || text.startsWith("\\")) {
            throw new DocumentException(doc.problem(where, "the master path '" + text + "' is absolute: it must be "
                    + "relative to the record, inside the folder tree being checked"));
        }
        try {
            Path tree = root.get().toRealPath();
            Path place = file.get().toRealPath();
            Path resolved = (Files.isDirectory(place) ? place : place.getParent()).resolve(relative).normalize();
            if (!resolved.startsWith(tree)) {
                throw outside(doc, text, tree);       // climbs out of the tree by its own '..'
            }
            Path real = resolved.toRealPath();       // and a link inside may not lead out either
            if (!real.startsWith(tree)) {
                throw outside(doc, text, tree);
            }
            if (!Files.isRegularFile(real)) {
                throw new DocumentException(doc.problem(where, "the master '" + text + "' is not a file"));
            }
            return real;
        } catch (IOException e) {
            throw new DocumentException(doc.problem(where, "the master '" + text + "' was not found: "
                    + e.getMessage()));
        }
    }

    private static DocumentException outside(SourceDocument doc, String text, Path tree) {
        return new DocumentException(doc.problem("/master/path", "the master path '" + text + "' leads outside the "
                + "folder tree being checked (" + tree + "); it is refused: keep the master beside its records"));
    }

    private static BatchRecord.Addition addition(SourceDocument doc, JsonNode n, String p, List<Problem> problems) {
        FormulationReader.controlCharacter(n.get("substance").asString())
                .ifPresent(why -> problems.add(doc.problem(p + "/substance", why)));
        Quantity amount = quantity(doc, n.get("amount"), p + "/amount", problems, Dimension.MASS, Dimension.VOLUME,
                Dimension.AMOUNT);
        OptionalDouble molarity = OptionalDouble.empty();
        if (n.has("stock")) {
            Quantity c = quantity(doc, n.get("stock").get("concentration"), p + "/stock/concentration", problems,
                    Dimension.AMOUNT_CONCENTRATION);
            if (c != null) {        // greater than zero, as every amount concentration (Plausible)
                molarity = OptionalDouble.of(c.base());
            }
        }
        if (amount != null && amount.dimension() == Dimension.VOLUME && molarity.isEmpty()) {
            problems.add(doc.problem(p + "/amount", "a volume needs the stock it was taken from (\"stock\": "
                    + "{\"concentration\": ...})"));
            return null;
        }
        OptionalDouble assay = fraction(doc, n, "assay", ASSAY, p, problems);
        OptionalDouble water = fraction(doc, n, n.has("waterContent") ? "waterContent" : "lossOnDrying", WATER, p,
                problems);
        if (amount == null) {
            return null;
        }
        BatchRecord.Weighed weighed = switch (n.path("weighed").asString("as-is")) {
            case "100 %" -> BatchRecord.Weighed.PURE;
            case "anhydrous" -> BatchRecord.Weighed.ANHYDROUS;
            default -> BatchRecord.Weighed.AS_IS;
        };
        return new BatchRecord.Addition(n.get("step").asInt(), n.get("substance").asString(), amount, molarity,
                n.has("lot") ? Optional.of(n.get("lot").asString()) : Optional.empty(), assay,
                "as-is".equals(n.path("assayBasis").asString("dried")), water, weighed, p);
    }

    private static BatchRecord.Measurement measurement(SourceDocument doc, JsonNode n, String p,
                                                       List<Problem> problems) {
        BatchRecord.Measurement.Kind kind = "pH".equals(n.get("quantity").asString())
                ? BatchRecord.Measurement.Kind.PH : BatchRecord.Measurement.Kind.OSMOLALITY;
        OptionalDouble kelvin = OptionalDouble.empty();
        if (n.has("temperature")) {
            Quantity t = quantity(doc, n.get("temperature"), p + "/temperature", problems, Dimension.TEMPERATURE);
            if (t == null) {
                return null;
            }
            Optional<String> implausible = Plausible.LIQUID_TEMPERATURE.check("a temperature", t);
            if (implausible.isPresent()) {
                problems.add(doc.problem(p + "/temperature", implausible.get()));
                return null;
            }
            kelvin = OptionalDouble.of(t.base());
        }
        double value = n.get("value").asDouble();
        if (kind == BatchRecord.Measurement.Kind.PH && !(value >= MIN_PH && value <= MAX_PH)) {
            problems.add(doc.problem(p + "/value", "a pH reading of " + value + " is outside " + MIN_PH + " to " + MAX_PH
                    + ", the range a pH meter displays; check the record"));
            return null;
        }
        if (kind == BatchRecord.Measurement.Kind.OSMOLALITY && !(value > 0 && value <= MAX_OSMOLALITY)) {
            problems.add(doc.problem(p + "/value", "an osmolality of " + value + " mOsm/kg is outside the plausible "
                    + "range (0, " + (long) MAX_OSMOLALITY + "]: saturated salt solutions stay below it (common practice)"));
            return null;
        }
        return new BatchRecord.Measurement(n.get("step").asInt(), kind, value, kelvin, n.path("atVolume").asDouble(1),
                p);
    }

    /** A certificate value, a fraction within its own range (which is narrower or wider than 0–100 %). */
    private static OptionalDouble fraction(SourceDocument doc, JsonNode n, String field, Plausible range, String p,
                                           List<Problem> problems) {
        if (!n.has(field)) {
            return OptionalDouble.empty();
        }
        Quantity q = quantity(doc, n.get(field), p + "/" + field, problems, Optional.of(range), Dimension.FRACTION);
        return q == null ? OptionalDouble.empty() : OptionalDouble.of(q.base());
    }

    private static Quantity quantity(SourceDocument doc, JsonNode n, String pointer, List<Problem> problems,
                                     Dimension... allowed) {
        return quantity(doc, n, pointer, problems, Optional.empty(), allowed);
    }

    /** A quantity of an allowed dimension within {@code range}, or else the range of its dimension. */
    private static Quantity quantity(SourceDocument doc, JsonNode n, String pointer, List<Problem> problems,
                                     Optional<Plausible> range, Dimension... allowed) {
        try {
            Quantity q = n.isString() ? Quantity.parse(n.asString())
                    : Quantity.of(n.get("value").asDouble(), JsonReader.written(n.get("value")), n.get("unit").asString());
            String what = "a " + pointer.substring(pointer.lastIndexOf('/') + 1);
            Dimension d = q.require(what, allowed).dimension();
            Optional<String> outside = range.orElse(Plausible.of(d)).check(what, q);
            if (outside.isPresent()) {
                problems.add(doc.problem(pointer, outside.get()));
                return null;
            }
            return q;
        } catch (UnitException e) {
            problems.add(doc.problem(pointer, e.getMessage()));
            return null;
        }
    }
}
