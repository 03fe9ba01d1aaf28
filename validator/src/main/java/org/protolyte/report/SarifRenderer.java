package org.protolyte.report;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.protolyte.Protolyte;
import org.protolyte.chemistry.Caveat;
import org.protolyte.document.Location;
import org.protolyte.rules.Finding;
import org.protolyte.rules.Rule;
import org.protolyte.rules.Severity;
import org.protolyte.rules.Waiver;

import tools.jackson.databind.SerializationFeature;
import tools.jackson.databind.json.JsonMapper;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * The run as one SARIF 2.1.0 log (OASIS Static Analysis Results Interchange Format), for code-review
 * platforms. Built on the Jackson tree, not on a SARIF model library, so the jar carries one Jackson.
 * No timestamps: the same inputs give the same bytes.
 */
public final class SarifRenderer {

    public static final String SCHEMA = "https://json.schemastore.org/sarif-2.1.0.json";
    public static final String VERSION = "2.1.0";
    /** Prefix of the rule ids given to the engine's diagnostics, which no rule pack defines. */
    public static final String ENGINE_PREFIX = "engine/";
    /** SARIF 2.1.0 §3.14.14: the conventional base id of the source tree, resolved by the consumer. */
    static final String SRCROOT = "%SRCROOT%";

    private final JsonMapper mapper = JsonMapper.builder().enable(SerializationFeature.INDENT_OUTPUT).build();

    public String render(RunReport run) {
        return mapper.writeValueAsString(tree(run)) + System.lineSeparator();
    }

    public ObjectNode tree(RunReport run) {
        ObjectNode root = mapper.createObjectNode();
        root.put("$schema", SCHEMA);
        root.put("version", VERSION);
        ObjectNode sarifRun = root.putArray("runs").addObject();

        Map<String, ObjectNode> descriptors = descriptors(run);
        Map<String, Integer> ruleIndex = new LinkedHashMap<>();
        ObjectNode driver = sarifRun.putObject("tool").putObject("driver");
        driver.put("name", "Protolyte");
        driver.put("version", run.toolVersion());
        ArrayNode rules = driver.putArray("rules");
        descriptors.forEach((id, d) -> {
            ruleIndex.put(id, rules.size());
            rules.add(d);
        });

        ObjectNode invocation = sarifRun.putArray("invocations").addObject();
        invocation.put("executionSuccessful", run.exitCode() < Status.FAULT.exitCode());
        if (!run.skipped().isEmpty()) {
            ArrayNode notes = invocation.putArray("toolExecutionNotifications");
            for (String s : run.skipped()) {
                ObjectNode n = notes.addObject();
                n.put("level", "note");
                n.putObject("message").put("text", "skipped: neither a formulation nor a batch record");
                n.putArray("locations").addObject().set("physicalLocation", physical(s, -1, Optional.empty()));
            }
        }

        Map<String, Integer> artifactIndex = new LinkedHashMap<>();
        ArrayNode artifacts = sarifRun.putArray("artifacts");
        for (DocumentReport r : run.reports()) {
            if (artifactIndex.containsKey(r.source())) {
                continue;
            }
            artifactIndex.put(r.source(), artifacts.size());
            ObjectNode a = artifacts.addObject();
            a.set("location", artifactLocation(r.source(), -1));
            a.putArray("roles").add("analysisTarget");
            r.sha256().ifPresent(h -> a.putObject("hashes").put("sha-256", h));
            ObjectNode props = a.putObject("properties");
            r.id().ifPresent(id -> props.put("id", id));
            props.put("status", r.status().code());
        }

        ArrayNode results = sarifRun.putArray("results");
        for (DocumentReport r : run.reports()) {
            int artifact = artifactIndex.get(r.source());
            for (Finding f : r.findings()) {
                ObjectNode res = result(f.rule(), ruleIndex, level(f.severity()), f.message());
                res.putArray("locations").add(location(r.source(), artifact, f.pointer(), f.location()));
                f.waivedBy().ifPresent(w -> suppression(res, w));
                results.add(res);
            }
            for (Diagnostic d : r.diagnostics()) {
                ObjectNode res = result(ENGINE_PREFIX + d.code(), ruleIndex, level(d.severity()), d.message());
                res.putArray("locations").add(location(r.source(), artifact, d.pointer(), d.location()));
                d.condition().ifPresent(c -> res.putObject("properties").put("condition", c));
                results.add(res);
            }
        }

        ObjectNode props = sarifRun.putObject("properties");
        props.put("exitCode", run.exitCode());
        props.put("caution", RunReport.CAUTION);
        return root;
    }

    /** One reportingDescriptor per rule id that has a result, in id order; a rule's first definition wins. */
    private Map<String, ObjectNode> descriptors(RunReport run) {
        Map<String, ObjectNode> out = new TreeMap<>();
        for (DocumentReport r : run.reports()) {
            for (Finding f : r.findings()) {
                out.computeIfAbsent(f.rule(), id -> f.definition().map(this::descriptor)
                        .orElseGet(() -> plainDescriptor(id, f.severity())));
            }
            for (Diagnostic d : r.diagnostics()) {
                out.computeIfAbsent(ENGINE_PREFIX + d.code(), id -> engineDescriptor(id, d.severity()));
            }
        }
        return out;
    }

    private ObjectNode descriptor(Rule rule) {
        ObjectNode d = mapper.createObjectNode();
        d.put("id", rule.id());
        d.putObject("shortDescription").put("text", rule.summary());
        d.putObject("fullDescription").put("text", rule.explanation());
        String help = Stream.concat(rule.remedy().stream(), rule.safety().map(s -> "Safety: " + s).stream())
                .collect(Collectors.joining(" "));
        if (!help.isEmpty()) {
            d.putObject("help").put("text", help);
        }
        d.putObject("defaultConfiguration").put("level", level(rule.severity()));
        ObjectNode props = d.putObject("properties");
        ArrayNode refs = props.putArray("references");
        rule.references().forEach(refs::add);
        props.put("pack", rule.pack());
        return d;
    }

    /** A finding without a pack definition: the invalid-document problems, or a site's own check. */
    private ObjectNode plainDescriptor(String id, Severity severity) {
        ObjectNode d = mapper.createObjectNode();
        d.put("id", id);
        if (id.equals(Protolyte.INVALID_DOCUMENT)) {
            d.putObject("shortDescription").put("text",
                    "The document is well-formed JSON, matches the formulation schema and names known substances.");
            d.putObject("fullDescription").put("text", "Every input is read strictly and validated against "
                    + "schemas/formulation.schema.json before anything is computed. A document that fails cannot "
                    + "be checked at all; each problem names its JSON pointer, line and column.");
            d.putObject("help").put("text", "Correct each problem at the place given, then check the document again.");
        } else {
            d.putObject("shortDescription").put("text", id);
        }
        d.putObject("defaultConfiguration").put("level", level(severity));
        return d;
    }

    private ObjectNode engineDescriptor(String id, Caveat.Severity severity) {
        ObjectNode d = mapper.createObjectNode();
        d.put("id", id);
        d.putObject("shortDescription").put("text", "Engine diagnostic " + id.substring(ENGINE_PREFIX.length())
                + ": where the computed numbers stop being trustworthy.");
        d.putObject("fullDescription").put("text", "Diagnostics come from the engine, not from a rule pack; they "
                + "are always reported and cannot be waived. A warning means the number stands with reduced "
                + "accuracy; an indeterminate condition has no number, and the document cannot pass.");
        d.putObject("defaultConfiguration").put("level", level(severity));
        return d;
    }

    private ObjectNode result(String ruleId, Map<String, Integer> ruleIndex, String level, String message) {
        ObjectNode res = mapper.createObjectNode();
        res.put("ruleId", ruleId);
        res.put("ruleIndex", ruleIndex.get(ruleId));
        res.put("level", level);
        res.putObject("message").put("text", message);
        return res;
    }

    /**
     * A waived finding stays a result, suppressed (SARIF 2.1.0 §3.35): "inSource" when the document itself
     * grants it, "external" for the QA waiver file; "accepted" because QA approved it.
     */
    private static void suppression(ObjectNode res, Waiver w) {
        ObjectNode s = res.putArray("suppressions").addObject();
        s.put("kind", w.authorGranted() ? "inSource" : "external");
        s.put("status", "accepted");
        s.put("justification", w.reason());
        ObjectNode props = s.putObject("properties");
        props.put("approver", w.approver());
        props.put("approved", w.approved().toString());
        props.put("expires", w.expires().toString());
        props.put("grantedIn", w.origin());
    }

    private ObjectNode location(String source, int artifact, Optional<String> pointer, Optional<Location> at) {
        ObjectNode loc = mapper.createObjectNode();
        loc.set("physicalLocation", physical(source, artifact, at));
        pointer.filter(p -> !p.isEmpty()).ifPresent(p -> {
            ObjectNode logical = loc.putArray("logicalLocations").addObject();
            logical.put("fullyQualifiedName", p);
        });
        return loc;
    }

    private ObjectNode physical(String source, int artifact, Optional<Location> at) {
        ObjectNode phys = mapper.createObjectNode();
        phys.set("artifactLocation", artifactLocation(source, artifact));
        at.ifPresent(l -> {
            ObjectNode region = phys.putObject("region");
            region.put("startLine", l.line());
            region.put("startColumn", l.column());
        });
        return phys;
    }

    private ObjectNode artifactLocation(String source, int artifact) {
        ObjectNode a = mapper.createObjectNode();
        Optional<String> absolute = absoluteUri(source);
        a.put("uri", absolute.orElseGet(() -> relativeUri(source)));
        if (absolute.isEmpty()) {
            a.put("uriBaseId", SRCROOT);
        }
        if (artifact >= 0) {
            a.put("index", artifact);
        }
        return a;
    }

    /** An absolute path as a file: URI; a relative one stays relative. */
    private static Optional<String> absoluteUri(String source) {
        try {
            Path p = Path.of(source);
            return p.isAbsolute() ? Optional.of(p.toUri().toASCIIString()) : Optional.empty();
        } catch (InvalidPathException e) {
            // caught: a source that is no path on this system stays a relative reference, as given
            return Optional.empty();
        }
    }

    /** SARIF 2.1.0 §3.4.3: a relative reference with forward slashes, other characters percent-encoded (RFC 3986). */
    static String relativeUri(String source) {
        String path = File.separatorChar == '/' ? source : source.replace(File.separatorChar, '/');
        StringBuilder b = new StringBuilder();
        for (byte x : path.getBytes(StandardCharsets.UTF_8)) {
            int c = x & 0xff;
            if (c < 0x80 && (Character.isLetterOrDigit(c) || "-._~/!$&'()*+,;=@".indexOf(c) >= 0)) {
                b.append((char) c);
            } else {
                b.append('%').append(String.format(Locale.ROOT, "%02X", c));
            }
        }
        return b.toString();
    }

    private static String level(Severity s) {
        return switch (s) {
            case ERROR -> "error";
            case WARNING -> "warning";
            case NOTE -> "note";
        };
    }

    private static String level(Caveat.Severity s) {
        return s == Caveat.Severity.INDETERMINATE ? "error" : "warning";
    }
}
