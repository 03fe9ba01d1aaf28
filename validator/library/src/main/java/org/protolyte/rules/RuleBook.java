package org.protolyte.rules;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.protolyte.document.Digests;
import org.protolyte.document.DocumentException;
import org.protolyte.document.JsonReader;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.document.SourceDocument;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * Every rule pack known to a run: the shipped ones (listed in {@code rules/index.txt}) and any a user
 * names. Resolves inheritance and checks each pack completely when it is added: unknown check kinds,
 * parameters that fail the kind's schema, incomplete new rules, unknown or circular parents are all
 * refused with the place in the pack.
 */
public final class RuleBook {

    public static final String SCHEMA = "rule-pack.schema.json";
    /** Packs are small; a larger file is refused before it is parsed. */
    static final long MAX_PACK_BYTES = 1024 * 1024;

    private final SchemaCatalog schemas;
    private final CheckKinds kinds;
    private final JsonReader reader = new JsonReader(MAX_PACK_BYTES);
    private final Map<String, RulePack> packs = new LinkedHashMap<>();

    public RuleBook(SchemaCatalog schemas, CheckKinds kinds) {
        this.schemas = schemas;
        this.kinds = kinds;
    }

    public static RuleBook shipped(SchemaCatalog schemas, CheckKinds kinds) {
        RuleBook book = new RuleBook(schemas, kinds);
        for (String file : resource("/rules/index.txt").lines().map(String::strip)
                .filter(l -> !l.isEmpty() && !l.startsWith("#")).toList()) {
            book.add("rules/" + file, resource("/rules/" + file).getBytes(StandardCharsets.UTF_8), true);
        }
        return book;
    }

    private static String resource(String path) {
        try (InputStream in = RuleBook.class.getResourceAsStream(path)) {
            if (in == null) {
                throw new IllegalStateException(path + " is missing from the jar");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    public CheckKinds kinds() {
        return kinds;
    }

    public Map<String, RulePack> packs() {
        return Map.copyOf(packs);
    }

    public Optional<RulePack> pack(String name) {
        return Optional.ofNullable(packs.get(name));
    }

    /** Adds a pack file; throws {@link DocumentException} naming every problem in it. */
    public RulePack add(String source, byte[] content, boolean shipped) {
        SourceDocument doc = reader.read(source, content);
        if (!"rule-pack".equals(doc.root().path("document").asString(""))) {
            throw new DocumentException(doc.problem(doc.root().has("document") ? "/document" : "",
                    "not a Protolyte rule pack: expected \"document\": \"rule-pack\""));
        }
        List<Problem> problems = new ArrayList<>(schemas.validate(doc, SCHEMA));
        if (!problems.isEmpty()) {
            throw new DocumentException(problems);
        }
        JsonNode root = doc.root();
        String name = root.get("name").asString();
        if (packs.containsKey(name)) {
            throw new DocumentException(doc.problem("/name", "a rule pack named '" + name + "' is already loaded ("
                    + packs.get(name).document().source() + "); give yours its own name and extend that one"));
        }
        List<String> applies = new ArrayList<>();
        root.path("appliesTo").forEach(n -> applies.add(n.asString()));
        Optional<String> parent = root.has("extends") ? Optional.of(root.get("extends").asString()) : Optional.empty();
        if (parent.isPresent() && !packs.containsKey(parent.get())) {
            throw new DocumentException(doc.problem("/extends", "extends '" + parent.get()
                    + "', which is not loaded; known packs: " + String.join(", ", packs.keySet())));
        }
        RulePack pack = new RulePack(name, root.get("version").asString(),
                root.has("title") ? Optional.of(root.get("title").asString()) : Optional.empty(), applies, parent,
                root.path("documentWaivers").asBoolean(false), doc, Digests.sha256(content), shipped);
        packs.put(name, pack);
        try {
            rules(List.of(name));   // checks the whole chain now, with places
        } catch (DocumentException e) {
            packs.remove(name);
            throw e;
        }
        return pack;
    }

    /**
     * The effective rules of the named packs: each pack's ancestors first, every pack applied once, an
     * entry with a known id changing only the fields it gives.
     */
    public List<Rule> rules(List<String> selected) {
        Map<String, Rule> rules = new LinkedHashMap<>();
        for (RulePack pack : withAncestors(selected)) {
            apply(pack, rules);
        }
        return List.copyOf(rules.values());
    }

    /** Default choice for a document: the packs that apply to its intended use, without their ancestors. */
    public List<String> defaultSelection(Optional<String> intendedUse) {
        List<String> chosen = new ArrayList<>();
        for (RulePack p : packs.values()) {
            if (p.shipped() && (p.appliesTo().contains("all") || intendedUse.map(p::appliesTo).orElse(false))) {
                chosen.add(p.name());
            }
        }
        Set<String> ancestors = new LinkedHashSet<>();
        for (String c : chosen) {
            RulePack p = packs.get(c);
            while (p.extendsPack().isPresent()) {
                ancestors.add(p.extendsPack().get());
                p = packs.get(p.extendsPack().get());
            }
        }
        chosen.removeAll(ancestors);
        return chosen;
    }

    /** The packs and their ancestors, ancestors first, each once. */
    public List<RulePack> withAncestors(List<String> selected) {
        LinkedHashSet<RulePack> out = new LinkedHashSet<>();
        for (String name : selected) {
            List<RulePack> chain = new ArrayList<>();
            RulePack p = packs.get(name);
            Set<String> seen = new LinkedHashSet<>();
            while (p != null) {
                if (!seen.add(p.name())) {
                    throw new DocumentException(p.document().problem("/extends", "rule packs extend each other in a "
                            + "circle: " + String.join(" → ", seen) + " → " + p.name()));
                }
                chain.add(0, p);
                p = p.extendsPack().map(packs::get).orElse(null);
            }
            out.addAll(chain);
        }
        return List.copyOf(out);
    }

    private void apply(RulePack pack, Map<String, Rule> rules) {
        SourceDocument doc = pack.document();
        JsonNode entries = doc.root().get("rules");
        List<Problem> problems = new ArrayList<>();
        for (int i = 0; i < entries.size(); i++) {
            String at = "/rules/" + i;
            JsonNode e = entries.get(i);
            String id = e.get("id").asString();
            Rule base = rules.get(id);
            try {
                Rule r = base == null ? complete(pack, e, at) : change(pack, base, e, at);
                CheckKind kind = kinds.get(r.check()).orElseThrow(() -> new DocumentException(doc.problem(at + "/check",
                        "unknown check kind '" + r.check() + "'; known: " + String.join(", ", kinds.all().keySet()))));
                Optional<Record> bound = kind.bind(schemas, doc, at + "/parameters", r.parameters(), problems);
                inverted(doc, at + "/parameters", r.parameters(), problems);
                rules.put(id, r.withBound(bound));
            } catch (DocumentException ex) {
                problems.addAll(ex.problems());
            }
        }
        if (!problems.isEmpty()) {
            // name the pack: when packs are combined the problem belongs to this file, not to the one being added
            throw new DocumentException(problems.stream().map(p -> new Problem(p.pointer(), p.location(),
                    p.message() + " (in rule pack " + pack.name() + ", " + doc.source() + ")")).toList());
        }
    }

    /**
     * A range whose lower end lies above its upper one ({@code min}/{@code max}, {@code minX}/{@code maxX}, at any
     * depth) passes nothing, or everything, depending on how a check reads it: a schema cannot say so, so it is
     * refused here, after a pack's changes are merged into its parent's values.
     */
    private static void inverted(SourceDocument doc, String at, JsonNode parameters, List<Problem> problems) {
        if (!parameters.isObject()) {
            return;
        }
        parameters.properties().forEach(p -> {
            String name = p.getKey();
            JsonNode upper = parameters.get("max" + name.substring(Math.min(3, name.length())));
            if (name.startsWith("min") && p.getValue().isNumber() && upper != null && upper.isNumber()
                    && p.getValue().asDouble() > upper.asDouble()) {
                String max = "max" + name.substring(3);
                problems.add(doc.problem(at, name + " " + p.getValue().asString() + " is above " + max + " "
                        + upper.asString() + ": the range is inverted and would judge nothing as stated"));
            }
            inverted(doc, at + "/" + name.replace("~", "~0").replace("/", "~1"), p.getValue(), problems);
        });
    }

    private static Rule complete(RulePack pack, JsonNode e, String at) {
        List<String> missing = new ArrayList<>();
        for (String field : List.of("check", "severity", "summary", "explanation", "references")) {
            if (!e.has(field)) {
                missing.add(field);
            }
        }
        if (!missing.isEmpty()) {
            throw new DocumentException(pack.document().problem(at, "rule '" + e.get("id").asString()
                    + "' is new in this pack and needs " + String.join(", ", missing)
                    + (pack.extendsPack().isPresent() ? " (or an id that " + pack.extendsPack().get() + " defines)" : "")));
        }
        List<String> refs = new ArrayList<>();
        e.get("references").forEach(r -> refs.add(r.asString()));
        return new Rule(e.get("id").asString(), e.get("check").asString(),
                e.has("parameters") ? (ObjectNode) e.get("parameters") : JsonNodeFactory.instance.objectNode(),
                severity(e.get("severity").asString()), e.path("enabled").asBoolean(true), e.get("summary").asString(),
                e.get("explanation").asString(), text(e, "remedy"), text(e, "safety"), refs, pack.name());
    }

    private static Rule change(RulePack pack, Rule base, JsonNode e, String at) {
        if (e.has("check") && !e.get("check").asString().equals(base.check())) {
            throw new DocumentException(pack.document().problem(at + "/check", "rule '" + base.id() + "' runs '"
                    + base.check() + "' in " + base.pack() + "; a pack may change its parameters, not its check kind"));
        }
        ObjectNode params = base.parameters().deepCopy();
        if (e.has("parameters")) {
            e.get("parameters").properties().forEach(p -> params.set(p.getKey(), p.getValue()));
        }
        List<String> refs = base.references();
        if (e.has("references")) {
            List<String> r = new ArrayList<>();
            e.get("references").forEach(x -> r.add(x.asString()));
            refs = r;
        }
        return new Rule(base.id(), base.check(), params,
                e.has("severity") ? severity(e.get("severity").asString()) : base.severity(),
                e.path("enabled").asBoolean(base.enabled()),
                e.has("summary") ? e.get("summary").asString() : base.summary(),
                e.has("explanation") ? e.get("explanation").asString() : base.explanation(),
                text(e, "remedy").or(base::remedy), text(e, "safety").or(base::safety), refs, pack.name());
    }

    private static Optional<String> text(JsonNode e, String field) {
        return e.has(field) ? Optional.of(e.get(field).asString()) : Optional.empty();
    }

    static Severity severity(String code) {
        return Severity.valueOf(code.toUpperCase(java.util.Locale.ROOT));
    }
}
