package org.protolyte.document;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

import com.networknt.schema.Error;
import com.networknt.schema.Schema;
import com.networknt.schema.SchemaLocation;
import com.networknt.schema.SchemaRegistry;
import com.networknt.schema.SpecificationVersion;
import com.networknt.schema.path.NodePath;

import org.protolyte.text.Excerpt;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The JSON Schemas shipped in the jar under {@code schemas/}, validated with networknt's validator.
 * Schemas are identified by {@value #ID_PREFIX}…; that prefix is mapped to the class path and nothing
 * else may be loaded, so a {@code $ref} or {@code $schema} can never cause a network fetch.
 */
public final class SchemaCatalog {

    public static final String ID_PREFIX = "https://protolyte.org/schemas/";
    private static final String CLASSPATH_PREFIX = "classpath:schemas/";

    /**
     * The most problems one validation lists. Enough to fix a document by; without a bound, a file of 200,000 unknown
     * keys would cost a message and a line of the report each.
     */
    public static final int MOST_PROBLEMS_LISTED = 100;

    private final SchemaRegistry registry;
    private final Map<String, Schema> schemas = new ConcurrentHashMap<>();
    private final Map<String, JsonNode> schemaTrees = new ConcurrentHashMap<>();
    private final JsonMapper mapper = JsonMapper.builder().build();

    public SchemaCatalog() {
        // read by this module itself: on the module path the validator's own class-path loader cannot see them
        registry = SchemaRegistry.withDefaultDialect(SpecificationVersion.DRAFT_2020_12, builder -> builder
                .resourceLoaders(loaders -> loaders.resources(SchemaCatalog::shipped))
                .schemaLoader(loader -> loader
                        .fetchRemoteResources(false)
                        .allow(iri -> isLocal(iri.toString()))));
    }

    /** A shipped schema's text by its id, or null (the loader's "not mine") for any other address. */
    private static String shipped(String iri) {
        if (!iri.startsWith(ID_PREFIX) || iri.contains("..") || iri.contains("\\")) {
            return null;
        }
        try (InputStream in = SchemaCatalog.class.getResourceAsStream("/schemas/" + iri.substring(ID_PREFIX.length()))) {
            return in == null ? null : new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("shipped schema " + iri + " cannot be read", e);
        }
    }

    /** Only our own schemas (read from the library itself) and the validator's built-in meta-schemas. */
    static boolean isLocal(String iri) {
        return iri.startsWith(ID_PREFIX) || iri.startsWith("classpath:")
                || iri.startsWith("https://json-schema.org/draft/2020-12/");
    }

    public Schema schema(String fileName) {
        return schemas.computeIfAbsent(fileName, f -> registry.getSchema(SchemaLocation.of(ID_PREFIX + f)));
    }

    /** The schema file's own tree, for naming the properties a place allows. */
    JsonNode schemaTree(String fileName) {
        return schemaTrees.computeIfAbsent(fileName, f -> {
            try (InputStream in = SchemaCatalog.class.getResourceAsStream("/schemas/" + f)) {
                if (in == null) {
                    throw new IllegalStateException("schema " + f + " is missing from the jar");
                }
                return mapper.readTree(in);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
        });
    }

    /** Validates, returning problems in document order, each naming its place. */
    public List<Problem> validate(SourceDocument doc, String schemaFile) {
        return validate(doc, "", doc.root(), schemaFile);
    }

    /**
     * Validates the part of {@code doc} at {@code at} (its node {@code node}); places are named in {@code doc}. The
     * first {@value #MOST_PROBLEMS_LISTED} problems in document order are listed, the rest counted by place.
     */
    public List<Problem> validate(SourceDocument doc, String at, JsonNode node, String schemaFile) {
        record Placed(Error error, String pointer, Optional<Location> location) {
        }
        List<Placed> placed = new ArrayList<>();
        for (Error e : schema(schemaFile).validate(node)) {
            String pointer = at + pointer(e.getInstanceLocation()) + (isUnknownProperty(e) ? "/" + escape(e.getProperty()) : "");
            placed.add(new Placed(e, pointer, doc.locate(pointer)));
        }
        placed.sort(Comparator.comparing((Placed p) -> p.location().map(Location::line).orElse(0))
                .thenComparing(p -> p.location().map(Location::column).orElse(0)));
        List<Problem> out = new ArrayList<>();
        Set<List<String>> seen = new HashSet<>(); // one problem per place and message
        Set<String> listed = new HashSet<>();
        Set<String> unlisted = new HashSet<>();
        Optional<Placed> firstUnlisted = Optional.empty();
        Map<String, List<String>> allowed = new HashMap<>(); // by schema location
        for (Placed p : placed) {
            if (out.size() < MOST_PROBLEMS_LISTED) {
                String message = message(p.error(), schemaFile, allowed);
                if (seen.add(List.of(p.pointer(), message))) {
                    out.add(new Problem(p.pointer(), p.location(), message));
                    listed.add(p.pointer());
                }
            } else if (!listed.contains(p.pointer()) && unlisted.add(p.pointer()) && firstUnlisted.isEmpty()) {
                firstUnlisted = Optional.of(p);
            }
        }
        firstUnlisted.ifPresent(p -> out.add(new Problem(p.pointer(), p.location(), "… and problems at "
                + unlisted.size() + " more places from here on, not listed (a report lists the first "
                + MOST_PROBLEMS_LISTED + " problems of a document)")));
        return out;
    }

    private static boolean isUnknownProperty(Error e) {
        return ("additionalProperties".equals(e.getKeyword()) || "unevaluatedProperties".equals(e.getKeyword()))
                && e.getProperty() != null;
    }

    private String message(Error e, String schemaFile, Map<String, List<String>> allowed) {
        String keyword = e.getKeyword() == null ? "" : e.getKeyword();
        if (isUnknownProperty(e)) {
            return unknownProperty(e, allowed.computeIfAbsent(e.getSchemaLocation().toString(),
                    l -> allowedProperties(e, schemaFile)));
        } else if (keyword.equals("required") && e.getProperty() != null) {
            return "required property '" + e.getProperty() + "' is missing";
        } else if (keyword.equals("dependentRequired") && args(e) >= 2) {
            return "'" + e.getArguments()[0] + "' is required when '" + e.getArguments()[1] + "' is given";
        } else if (keyword.equals("const") && args(e) >= 1) {
            return "must be " + e.getArguments()[0];
        } else if (keyword.equals("enum") && args(e) >= 1) {
            return "must be one of " + e.getArguments()[0];
        } else if (keyword.equals("type") && args(e) >= 2) {
            return "is " + article(String.valueOf(e.getArguments()[0])) + ", expected "
                    + String.valueOf(e.getArguments()[1]).replace("[", "").replace("]", "").replace(", ", " or ");
        } else if (keyword.equals("pattern") && e.getSchemaLocation().toString().contains("/quantity/")) {
            return "'" + Excerpt.of(e.getInstanceNode().asString()) + "' is not of the form \"<number> <unit>\", e.g. \"20 mmol/L\"";
        }
        return stripPath(e.getMessage());
    }

    private static int args(Error e) {
        return e.getArguments() == null ? 0 : e.getArguments().length;
    }

    private static String article(String type) {
        return ("aeiou".indexOf(type.isEmpty() ? 'x' : type.charAt(0)) >= 0 ? "an " : "a ") + type;
    }

    private static String unknownProperty(Error e, List<String> known) {
        String name = e.getProperty();
        Optional<String> nearest = Suggestions.nearest(name, known);
        String base = "unknown property '" + name + "'";
        if (nearest.isPresent()) {
            return base + "; did you mean '" + nearest.get() + "'?";
        }
        return known.isEmpty() ? base : base + "; allowed here: " + String.join(", ", known);
    }

    /** The names under the sibling {@code properties} of the failing keyword, from the schema file. */
    private List<String> allowedProperties(Error e, String schemaFile) {
        List<String> out = new ArrayList<>();
        NodePath fragment = e.getSchemaLocation().getFragment();
        JsonNode node = schemaTree(fileOf(e.getSchemaLocation(), schemaFile));
        for (int i = 0; i < fragment.getNameCount() - 1 && node != null; i++) {
            Object el = fragment.getElement(i);
            node = el instanceof Integer idx ? node.get(idx) : node.get(String.valueOf(el));
        }
        if (node != null && node.get("properties") != null) {
            Iterator<String> names = node.get("properties").propertyNames().iterator();
            names.forEachRemaining(out::add);
        }
        return out;
    }

    private static String fileOf(SchemaLocation location, String fallback) {
        String iri = location.getAbsoluteIri() == null ? "" : location.getAbsoluteIri().toString();
        for (String prefix : List.of(ID_PREFIX, CLASSPATH_PREFIX)) {
            if (iri.startsWith(prefix)) {
                return iri.substring(prefix.length());
            }
        }
        return fallback;
    }

    static String pointer(NodePath path) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < path.getNameCount(); i++) {
            b.append('/').append(escape(String.valueOf(path.getElement(i))));
        }
        return b.toString();
    }

    private static String escape(String s) {
        return s.replace("~", "~0").replace("/", "~1");
    }

    /** networknt prefixes messages with the instance path, which we report separately. */
    private static String stripPath(String message) {
        int colon = message.indexOf(": ");
        return message.startsWith("$") && colon > 0 ? message.substring(colon + 2) : message;
    }
}
