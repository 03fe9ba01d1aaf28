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
    /** Characters: no measured value needs more; Jackson's default, stated so the message can say it. */
    static final int MAX_NUMBER_LENGTH = 1000;
    /** Characters: the longest property name of any schema is under 40. */
    static final int MAX_NAME_LENGTH = 1000;
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
                .streamReadConstraints(StreamReadConstraints.builder().maxNestingDepth(MAX_DEPTH)
                        .maxNumberLength(MAX_NUMBER_LENGTH).maxNameLength(MAX_NAME_LENGTH).build())
                .build();
        mapper = JsonMapper.builder(factory)
                .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
                .enable(tools.jackson.databind.cfg.JsonNodeFeature.USE_BIG_DECIMAL_FOR_FLOATS)  // keeps "40.0" as written
                .build();
    }

    /** A JSON number as the document writes it, digit for digit ("40.0" stays "40.0"; an exponent may be expanded). */
    public static String written(JsonNode number) {
        return number.isBigDecimal() ? number.decimalValue().toString() : number.asString();
    }

    public SourceDocument read(String source, byte[] content) {
        if (content.length > maxBytes) {
            throw new DocumentException(new Problem("", Optional.empty(),
                    "file is larger than " + (maxBytes >= 1024 * 1024 ? maxBytes / (1024 * 1024) + " MiB"
                            : maxBytes / 1024 + " KiB")));
        }
        notUtf8(content).ifPresent(encoding -> {
            throw new DocumentException(new Problem("", Optional.of(new Location(1, 1)), "the file is " + encoding
                    + ", not UTF-8: JSON exchanged between systems is UTF-8 (RFC 8259, section 8.1); save it as UTF-8"));
        });
        Map<String, Location> locations = new HashMap<>();
        JsonNode root;
        try (JsonParser p = mapper.createParser(content)) {
            try {
                scan(p, locations);
            } catch (StreamConstraintsException e) {
                String pointer = p.streamReadContext() == null ? "" : p.streamReadContext().pathAsPointer().toString();
                TokenStreamLocation l = p.currentTokenLocation();
                throw new DocumentException(new Problem(pointer, Optional.of(new Location(l.getLineNr(), l.getColumnNr())),
                        limitExceeded(e.getOriginalMessage())));
            } catch (JacksonException e) {
                // the parser's context at the fault is the place to start looking (e.g. the repeated key)
                String pointer = p.streamReadContext() == null ? "" : p.streamReadContext().pathAsPointer().toString();
                throw new DocumentException(new Problem(pointer, locationOf(e), invalid(e.getOriginalMessage())));
            }
            root = mapper.readTree(content);
        } catch (JacksonException e) {
            throw new DocumentException(new Problem("", locationOf(e), invalid(e.getOriginalMessage())));
        }
        return new SourceDocument(source, root, locations);
    }

    /**
     * The encoding of a file that is plainly UTF-16 or UTF-32, by its byte-order mark or by the zero bytes that
     * ASCII text has in those encodings (the detection of RFC 4627, section 3); the parser would accept it.
     */
    static Optional<String> notUtf8(byte[] b) {
        int n = b.length;
        if (n >= 4 && b[0] == 0 && b[1] == 0 && (b[2] == 0 ? b[3] != 0 : (b[2] & 0xff) == 0xfe && (b[3] & 0xff) == 0xff)) {
            return Optional.of("UTF-32 (big-endian)");
        }
        if (n >= 4 && b[2] == 0 && b[3] == 0 && (b[0] != 0 && b[1] == 0 || (b[0] & 0xff) == 0xff && (b[1] & 0xff) == 0xfe)) {
            return Optional.of("UTF-32 (little-endian)");
        }
        // two ASCII characters in 16-bit units: 00 xx 00 yy or xx 00 yy 00 (one where the file is that short)
        boolean bigEndian = n >= 2 && b[0] == 0 && b[1] != 0 && (n < 4 || b[2] == 0 && b[3] != 0);
        boolean littleEndian = n >= 2 && b[0] != 0 && b[1] == 0 && (n < 4 || b[2] != 0 && b[3] == 0);
        if (n >= 2 && (b[0] & 0xff) == 0xfe && (b[1] & 0xff) == 0xff || bigEndian) {
            return Optional.of("UTF-16 (big-endian)");
        }
        if (n >= 2 && (b[0] & 0xff) == 0xff && (b[1] & 0xff) == 0xfe || littleEndian) {
            return Optional.of("UTF-16 (little-endian)");
        }
        return Optional.empty();
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

    /**
     * Which of the parser's limits tripped, in words. Jackson names the limit only in its message
     * ("Number value length (1001) exceeds ..."), so the message's opening words decide.
     */
    static String limitExceeded(String message) {
        String m = message == null ? "" : message;
        if (m.startsWith("Number value length")) {
            return "a number longer than " + MAX_NUMBER_LENGTH + " characters is refused";
        }
        if (m.startsWith("Name length")) {
            return "a property name longer than " + MAX_NAME_LENGTH + " characters is refused";
        }
        if (m.startsWith("String value length")) {
            return "a string longer than " + StreamReadConstraints.DEFAULT_MAX_STRING_LEN + " characters is refused";
        }
        if (m.contains("nesting depth")) {
            return "nesting deeper than " + MAX_DEPTH + " levels is refused";
        }
        return "refused: " + m;
    }

    private static final java.util.regex.Pattern PARSER_SETTING = java.util.regex.Pattern.compile("ALLOW_[A-Z_]+");

    /**
     * A syntax error in words. Where JSON forbids what some parsers allow, Jackson's own message names the parser
     * setting that would allow it, which means nothing to the author of the document: say what is not JSON.
     */
    static String invalid(String message) {
        String m = message == null ? "" : message;
        java.util.regex.Matcher setting = PARSER_SETTING.matcher(m);
        if (!setting.find()) {
            return "not valid JSON: " + m;
        }
        String what = switch (setting.group()) {
            case "ALLOW_NON_NUMERIC_NUMBERS" -> {
                int a = m.indexOf('\'');
                int b = a < 0 ? -1 : m.indexOf('\'', a + 1);
                yield (b > a ? m.substring(a, b + 1) : "the value") + " is not a JSON number";
            }
            case "ALLOW_LEADING_PLUS_SIGN_FOR_NUMBERS" -> "a number must not start with a plus sign";
            case "ALLOW_HEXADECIMAL_NUMBERS" -> "a hexadecimal number (0x...) is not a JSON number; write it in decimal";
            case "ALLOW_LEADING_ZEROS_FOR_NUMBERS" -> "a number must not start with a zero followed by digits";
            case "ALLOW_LEADING_DECIMAL_POINT_FOR_NUMBERS" -> "a number must not start with a decimal point; write 0.5";
            case "ALLOW_TRAILING_DECIMAL_POINT_FOR_NUMBERS" -> "a decimal point must be followed by a digit";
            case "ALLOW_SINGLE_QUOTES" -> "strings and names are written in double quotes";
            case "ALLOW_UNQUOTED_PROPERTY_NAMES", "ALLOW_UNQUOTED_FIELD_NAMES" -> "a property name must be in double quotes";
            case "ALLOW_JAVA_COMMENTS", "ALLOW_YAML_COMMENTS" -> "JSON has no comments";
            case "ALLOW_UNESCAPED_CONTROL_CHARS" -> "a control character inside a string must be escaped, e.g. \\n";
            case "ALLOW_BACKSLASH_ESCAPING_ANY_CHARACTER" -> "a backslash escape that JSON does not define";
            case "ALLOW_TRAILING_COMMA" -> "a comma before a closing bracket or brace";
            case "ALLOW_MISSING_VALUES" -> "a missing value between commas";
            default -> "a character that JSON does not allow here";
        };
        return "not valid JSON: " + what;
    }

    private static Optional<Location> locationOf(JacksonException e) {
        TokenStreamLocation l = e.getLocation();
        if (l == null || l.getLineNr() < 1) {
            return Optional.empty();
        }
        return Optional.of(new Location(l.getLineNr(), l.getColumnNr()));
    }
}
