package org.protolyte.document;

import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.StreamReadConstraints;
import tools.jackson.core.StreamReadFeature;
import tools.jackson.core.TokenStreamLocation;
import tools.jackson.core.exc.StreamConstraintsException;
import tools.jackson.core.json.JsonFactory;
import tools.jackson.databind.DeserializationFeature;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Strict JSON reading: duplicate keys, trailing content, nesting deeper than {@value #MAX_DEPTH} and
 * numbers beyond the range of a double are errors, each named by place. Records where every value
 * begins so that later problems can name a line and column.
 */
public final class JsonReader {

    public static final int MAX_DEPTH = 64;
    private static final long MAX_BYTES = 16L * 1024 * 1024;

    private final JsonMapper mapper;
    private final long maxBytes;

    public JsonReader() {
        this(MAX_BYTES);
    }

    /** A reader that refuses files larger than {@code maxBytes}. */
    public JsonReader(long maxBytes) {
        this.maxBytes = maxBytes;
        JsonFactory factory = JsonFactory.builder()
                .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
                .streamReadConstraints(StreamReadConstraints.builder().maxNestingDepth(MAX_DEPTH).build())
                .build();
        mapper = JsonMapper.builder(factory)
                .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
                .build();
    }

    public SourceDocument read(String source, byte[] content) {
        if (content.length > maxBytes) {
            throw new DocumentException(new Problem("", Optional.empty(),
                    "file is larger than " + (maxBytes >= 1024 * 1024 ? maxBytes / (1024 * 1024) + " MiB"
                            : maxBytes / 1024 + " KiB")));
        }
        Map<String, Location> locations = new HashMap<>();
        JsonNode root;
        try (JsonParser p = mapper.createParser(content)) {
            try {
                scan(p, locations);
            } catch (StreamConstraintsException e) {
                String pointer = p.streamReadContext() == null ? "" : p.streamReadContext().pathAsPointer().toString();
                TokenStreamLocation l = p.currentTokenLocation();
                throw new DocumentException(new Problem(pointer, Optional.of(new Location(l.getLineNr(), l.getColumnNr())),
                        "nesting deeper than " + MAX_DEPTH + " levels is refused"));
            } catch (JacksonException e) {
                // the parser's context at the fault is the place to start looking (e.g. the repeated key)
                String pointer = p.streamReadContext() == null ? "" : p.streamReadContext().pathAsPointer().toString();
                throw new DocumentException(new Problem(pointer, locationOf(e), "not valid JSON: "
                        + e.getOriginalMessage()));
            }
            root = mapper.readTree(content);
        } catch (JacksonException e) {
            throw new DocumentException(new Problem("", locationOf(e), "not valid JSON: " + e.getOriginalMessage()));
        }
        return new SourceDocument(source, root, locations);
    }

    /** One pass over the tokens: where each value begins; numbers must be finite; one root value only. */
    private static void scan(JsonParser p, Map<String, Location> locations) {
        JsonToken t;
        int depth = 0;
        boolean rootDone = false;
        while ((t = p.nextToken()) != null) {
            TokenStreamLocation l = p.currentTokenLocation();
            Location here = new Location(l.getLineNr(), l.getColumnNr());
            if (rootDone) {
                throw new DocumentException(new Problem("", Optional.of(here),
                        "not valid JSON: content after the end of the document"));
            }
            String pointer = p.streamReadContext().pathAsPointer().toString();
            if (t == JsonToken.PROPERTY_NAME || t.isScalarValue() || t.isStructStart()) {
                locations.putIfAbsent(pointer, here);
            }
            if (t.isNumeric() && !Double.isFinite(p.getDoubleValue())) {
                throw new DocumentException(new Problem(pointer, Optional.of(here),
                        "the number " + p.getString() + " is outside the range of a finite number"));
            }
            if (t.isStructStart()) {
                depth++;
            } else if (t.isStructEnd()) {
                depth--;
            }
            rootDone = depth == 0 && (t.isStructEnd() || t.isScalarValue());
        }
    }

    private static Optional<Location> locationOf(JacksonException e) {
        TokenStreamLocation l = e.getLocation();
        if (l == null || l.getLineNr() < 1) {
            return Optional.empty();
        }
        return Optional.of(new Location(l.getLineNr(), l.getColumnNr()));
    }
}
