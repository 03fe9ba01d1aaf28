package org.protolyte.rules;

import java.lang.reflect.Constructor;
import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.RecordComponent;
import java.lang.reflect.Type;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.OptionalLong;

import org.protolyte.document.Problem;
import org.protolyte.document.SourceDocument;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * Binds a rule's {@code "parameters"} to a site's parameter record by its canonical constructor. A component is a
 * {@code boolean}, {@code int}, {@code long}, {@code double}, {@code String} or enum (a constant's name, or its
 * lower-case, hyphenated form), a {@code List} of one of those, an {@code Optional} of one, or {@code OptionalDouble},
 * {@code OptionalInt}, {@code OptionalLong}; only the optional ones may be absent. Written here rather than left to a
 * data binder, so that the contract is this list, and so that a record on the module path needs its package exported,
 * not opened to reflection.
 */
final class ParameterRecord<P extends Record> {

    private final Class<P> type;
    private final RecordComponent[] components;
    private final Constructor<P> constructor;

    /** @throws IllegalArgumentException naming a component of a type a pack cannot give */
    ParameterRecord(Class<P> type) {
        this.type = type;
        this.components = type.getRecordComponents();
        for (RecordComponent c : components) {
            Type t = c.getGenericType();
            boolean wrapped = c.getType() == List.class || c.getType() == Optional.class;
            Class<?> element = wrapped ? element(t) : c.getType();
            if (element == null || !scalar(element) && !(c.getType() == OptionalDouble.class
                    || c.getType() == OptionalInt.class || c.getType() == OptionalLong.class)) {
                throw new IllegalArgumentException("parameter record " + type.getName() + ": component '" + c.getName()
                        + "' is a " + t.getTypeName() + ", which a rule pack cannot give");
            }
        }
        try {
            this.constructor = type.getDeclaredConstructor(java.util.Arrays.stream(components)
                    .map(RecordComponent::getType).toArray(Class<?>[]::new));
        } catch (NoSuchMethodException e) {
            throw new IllegalArgumentException("parameter record " + type.getName() + " has no canonical constructor", e);
        }
    }

    private static Class<?> element(Type t) {
        return t instanceof ParameterizedType p && p.getActualTypeArguments()[0] instanceof Class<?> c ? c : null;
    }

    private static boolean scalar(Class<?> c) {
        return c == boolean.class || c == Boolean.class || c == int.class || c == Integer.class || c == long.class
                || c == Long.class || c == double.class || c == Double.class || c == String.class || c.isEnum();
    }

    /** The record, or empty with every problem added under {@code at}. */
    Optional<P> bind(SourceDocument doc, String at, ObjectNode parameters, String kind, List<Problem> problems) {
        int before = problems.size();
        List<String> names = java.util.Arrays.stream(components).map(RecordComponent::getName).toList();
        for (String name : parameters.propertyNames()) {
            if (!names.contains(name)) {
                problems.add(doc.problem(at + "/" + name, "check kind '" + kind + "' takes no parameter '" + name
                        + "'; it takes: " + (names.isEmpty() ? "none" : String.join(", ", names))));
            }
        }
        Object[] values = new Object[components.length];
        for (int i = 0; i < components.length; i++) {
            RecordComponent c = components[i];
            JsonNode n = parameters.get(c.getName());
            String place = at + "/" + c.getName();
            try {
                values[i] = value(c, n);
            } catch (IllegalArgumentException e) {
                problems.add(doc.problem(n == null ? at : place, "check kind '" + kind + "': parameter '" + c.getName()
                        + "' " + e.getMessage()));
            }
        }
        if (problems.size() > before) {
            return Optional.empty();
        }
        try {
            return Optional.of(constructor.newInstance(values));
        } catch (InvocationTargetException e) {
            problems.add(doc.problem(at, "check kind '" + kind + "' refuses these parameters: "
                    + e.getCause().getMessage()));
        } catch (ReflectiveOperationException | RuntimeException e) {
            problems.add(doc.problem(at, "check kind '" + kind + "': its parameter record " + type.getName()
                    + " cannot be made (is its package exported?): " + e));
        }
        return Optional.empty();
    }

    private static Object value(RecordComponent c, JsonNode n) {
        Class<?> t = c.getType();
        if (t == OptionalDouble.class) {
            return n == null ? OptionalDouble.empty() : OptionalDouble.of((Double) scalar(double.class, n));
        }
        if (t == OptionalInt.class) {
            return n == null ? OptionalInt.empty() : OptionalInt.of((Integer) scalar(int.class, n));
        }
        if (t == OptionalLong.class) {
            return n == null ? OptionalLong.empty() : OptionalLong.of((Long) scalar(long.class, n));
        }
        if (t == Optional.class) {
            return n == null ? Optional.empty() : Optional.of(scalar(element(c.getGenericType()), n));
        }
        if (n == null) {
            throw new IllegalArgumentException("is needed");
        }
        if (t == List.class) {
            if (!n.isArray()) {
                throw new IllegalArgumentException("is a list");
            }
            List<Object> out = new ArrayList<>();
            for (JsonNode e : n) {
                out.add(scalar(element(c.getGenericType()), e));
            }
            return List.copyOf(out);
        }
        return scalar(t, n);
    }

    private static Object scalar(Class<?> t, JsonNode n) {
        if (t == boolean.class || t == Boolean.class) {
            if (!n.isBoolean()) {
                throw new IllegalArgumentException("is true or false, not " + n);
            }
            return n.asBoolean();
        }
        if (t == double.class || t == Double.class) {
            if (!n.isNumber() || !Double.isFinite(n.asDouble())) {
                throw new IllegalArgumentException("is a number, not " + n);
            }
            return n.asDouble();
        }
        if (t == int.class || t == Integer.class || t == long.class || t == Long.class) {
            boolean small = t == int.class || t == Integer.class;
            if (!n.isIntegralNumber() || small && !n.canConvertToInt() || !n.canConvertToLong()) {
                throw new IllegalArgumentException("is a whole number" + (small ? " of int range" : "") + ", not " + n);
            }
            return small ? (Object) n.asInt() : (Object) n.asLong();
        }
        if (!n.isString()) {
            throw new IllegalArgumentException("is a string, not " + n);
        }
        String s = n.asString();
        if (t == String.class) {
            return s;
        }
        for (Object constant : t.getEnumConstants()) {
            String name = ((Enum<?>) constant).name();
            if (name.equals(s) || name.toLowerCase(Locale.ROOT).replace('_', '-').equals(s)) {
                return constant;
            }
        }
        List<String> allowed = java.util.Arrays.stream(t.getEnumConstants())
                .map(x -> ((Enum<?>) x).name().toLowerCase(Locale.ROOT).replace('_', '-')).toList();
        throw new IllegalArgumentException("is one of " + String.join(", ", allowed) + ", not " + n);
    }
}
