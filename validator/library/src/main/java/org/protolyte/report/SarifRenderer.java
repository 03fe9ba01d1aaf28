package org.protolyte.report;

import java.io.File;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.protolyte.plugin.Plugins;
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

    /** One for every renderer: immutable and thread-safe, and costly to build per report. */
    private static final JsonMapper MAPPER = JsonMapper.builder().enable(SerializationFeature.INDENT_OUTPUT).build();

    /** The whole run at once: the same bytes as streaming it. */
    public String render(RunReport run) {
        StringWriter out = new StringWriter();
        RunSummary summary = new RunSummary(run.toolVersion(), run.generatedAt(), run.libraryFiles(), run.plugins(),
                java.util.Optional.empty());
        try {
            Log s = begin(out);
            for (DocumentReport r : run.reports()) {
                summary.add(r);
                s.document(r);
            }
            run.skipped().forEach(summary::skip);
            s.end(summary);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString();
    }

    /**
     * A log written as it goes, so that an archive fits a small heap: the results first, one document at a time,
     * then what they refer to (rules, artifacts), which is kept small. Member order carries no meaning in JSON
     * (RFC 8259 §4), so a SARIF consumer reads the same log.
     */
    public Log begin(Writer out) throws IOException {
        out.write("{\n  \"$schema\" : " + MAPPER.writeValueAsString(SCHEMA) + ",\n  \"version\" : "
                + MAPPER.writeValueAsString(VERSION) + ",\n  \"runs\" : [ {\n  \"results\" : [");
        return new Log(out);
    }

    /** One streamed log; not shared between threads. */
    public final class Log {
        private final Writer out;
        private final Map<String, ObjectNode> descriptors = new LinkedHashMap<>();
        private final Map<String, Integer> ruleIndex = new LinkedHashMap<>();
        private final Map<String, Integer> artifactIndex = new LinkedHashMap<>();
        private final ArrayNode artifacts = MAPPER.createArrayNode();
        private boolean first = true;

        private Log(Writer out) {
            this.out = out;
        }

        public void document(DocumentReport r) throws IOException {
            Integer artifact = artifactIndex.get(r.source());
            if (artifact == null) {
                artifact = artifacts.size();
                artifactIndex.put(r.source(), artifact);
                ObjectNode a = artifacts.addObject();
                a.set("location", artifactLocation(r.source(), -1));
                a.putArray("roles").add("analysisTarget");
                r.sha256().ifPresent(h -> a.putObject("hashes").put("sha-256", h));
                ObjectNode props = a.putObject("properties");
                r.id().ifPresent(id -> props.put("id", id));
                props.put("status", r.status().code());
            }
            for (Finding f : r.findings()) {
                rule(f.rule(), () -> f.definition().map(SarifRenderer.this::descriptor)
                        .orElseGet(() -> plainDescriptor(f.rule(), f.severity())));
                ObjectNode res = result(f.rule(), ruleIndex, level(f.severity()), f.message());
                res.putArray("locations").add(location(r.source(), artifact, f.pointer(), f.location()));
                f.waivedBy().ifPresent(w -> suppression(res, w));
                write(res);
            }
            for (Diagnostic d : r.diagnostics()) {
                String id = ENGINE_PREFIX + d.code();
                rule(id, () -> engineDescriptor(id, d.severity()));
                ObjectNode res = result(id, ruleIndex, level(d.severity()), d.message());
                res.putArray("locations").add(location(r.source(), artifact, d.pointer(), d.location()));
                d.condition().ifPresent(c -> res.putObject("properties").put("condition", c));
                write(res);
            }
        }

        /** A rule's first definition wins; its index is its place in order of first use. */
        private void rule(String id, java.util.function.Supplier<ObjectNode> descriptor) {
            if (!ruleIndex.containsKey(id)) {
                ruleIndex.put(id, descriptors.size());
                descriptors.put(id, descriptor.get());
            }
        }

        private void write(ObjectNode result) throws IOException {
            out.write(first ? " " : ", ");
            out.write(MAPPER.writeValueAsString(result));
            first = false;
        }

        public void end(RunSummary run) throws IOException {
            ObjectNode driver = MAPPER.createObjectNode();
            driver.put("name", "Protolyte");
            driver.put("version", run.toolVersion());
            ArrayNode rules = driver.putArray("rules");
            descriptors.values().forEach(rules::add);
            ObjectNode tool = MAPPER.createObjectNode();
            tool.set("driver", driver);
            if (!run.plugins().isEmpty()) {
                ArrayNode extensions = tool.putArray("extensions");   // SARIF 2.1.0 §3.18.3: plug-ins of the tool
                for (Plugins.Origin o : run.plugins()) {
                    ObjectNode e = extensions.addObject().put("name", o.location());
                    ObjectNode props = e.putObject("properties");
                    o.sha256().ifPresent(h -> props.put("sha256", h));
                    o.checkKinds().forEach(props.withArray("checkKinds")::add);
                    o.substanceLibraries().forEach(props.withArray("substanceLibraries")::add);
                }
            }

            ArrayNode invocations = MAPPER.createArrayNode();
            ObjectNode invocation = invocations.addObject();
            invocation.put("executionSuccessful", run.exitCode() < Status.FAULT.exitCode());
            if (!run.skipped().isEmpty()) {
                ArrayNode notes = invocation.putArray("toolExecutionNotifications");
                for (Skipped s : run.skipped()) {
                    ObjectNode n = notes.addObject();
                    n.put("level", "note");
                    n.putObject("message").put("text", "skipped: " + s.reason());
                    n.putArray("locations").addObject().set("physicalLocation",
                            physical(s.source(), -1, Optional.empty()));
                }
            }

            ObjectNode props = MAPPER.createObjectNode();
            props.put("exitCode", run.exitCode());
            props.put("caution", RunReport.CAUTION);
            out.write(" ],\n  \"tool\" : " + MAPPER.writeValueAsString(tool)
                    + ",\n  \"invocations\" : " + MAPPER.writeValueAsString(invocations)
                    + ",\n  \"artifacts\" : " + MAPPER.writeValueAsString(artifacts)
                    + ",\n  \"properties\" : " + MAPPER.writeValueAsString(props)
                    + "\n} ]\n}" + System.lineSeparator());
        }
    }

    private ObjectNode descriptor(Rule rule) {
        ObjectNode d = MAPPER.createObjectNode();
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
        ObjectNode d = MAPPER.createObjectNode();
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
        ObjectNode d = MAPPER.createObjectNode();
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
        ObjectNode res = MAPPER.createObjectNode();
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
        ObjectNode loc = MAPPER.createObjectNode();
        loc.set("physicalLocation", physical(source, artifact, at));
        pointer.filter(p -> !p.isEmpty()).ifPresent(p -> {
            ObjectNode logical = loc.putArray("logicalLocations").addObject();
            logical.put("fullyQualifiedName", p);
        });
        return loc;
    }

    private ObjectNode physical(String source, int artifact, Optional<Location> at) {
        ObjectNode phys = MAPPER.createObjectNode();
        phys.set("artifactLocation", artifactLocation(source, artifact));
        at.ifPresent(l -> {
            ObjectNode region = phys.putObject("region");
            region.put("startLine", l.line());
            region.put("startColumn", l.column());
        });
        return phys;
    }

    private ObjectNode artifactLocation(String source, int artifact) {
        ObjectNode a = MAPPER.createObjectNode();
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
