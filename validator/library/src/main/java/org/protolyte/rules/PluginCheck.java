package org.protolyte.rules;

import java.lang.reflect.Modifier;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;

import org.protolyte.analysis.ConditionResult;
import org.protolyte.analysis.FormulationAnalysis;
import org.protolyte.chemistry.Thermo;
import org.protolyte.document.Formulation;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.document.SourceDocument;
import org.protolyte.recipe.Ingredient;
import org.protolyte.spi.Analysis;
import org.protolyte.spi.Component;
import org.protolyte.spi.Condition;
import org.protolyte.spi.Stateless;
import org.protolyte.spi.Target;
import org.protolyte.spi.Violation;

import tools.jackson.databind.node.ObjectNode;

/**
 * A site's check kind ({@link org.protolyte.spi.CheckKind}) as the rule book runs it: its parameters bound to its
 * record once, at pack load, and its view of the analysis a copy. {@code origin} names where it was loaded from.
 */
final class PluginCheck<P extends Record> implements CheckKind {

    /** A site's check that threw: the document is not judged by that rule, so it cannot pass. */
    static final class Failure extends RuntimeException {
        private static final long serialVersionUID = 1L;

        Failure(String message, Throwable cause) {
            super(message, cause);
        }
    }

    private final org.protolyte.spi.CheckKind<P> kind;
    private final ParameterRecord<P> binder;
    private final String origin;

    private PluginCheck(org.protolyte.spi.CheckKind<P> kind, String origin) {
        this.kind = kind;
        this.binder = new ParameterRecord<>(kind.parameters());
        this.origin = origin;
    }

    /**
     * @throws IllegalArgumentException for a kind that does not declare itself {@link Stateless}, keeps a field that is
     *                                  not final, or names no parameter record
     */
    static PluginCheck<?> of(org.protolyte.spi.CheckKind<?> kind, String origin) {
        Class<?> type = kind.getClass();
        String who = "check kind " + type.getName() + " (" + origin + ")";
        if (!type.isAnnotationPresent(Stateless.class)) {
            throw new IllegalArgumentException(who + " does not declare itself @Stateless; one instance judges every "
                    + "document from many threads, so a kind must keep nothing between calls");
        }
        for (Class<?> c = type; c != null && c != Object.class; c = c.getSuperclass()) {
            for (var f : c.getDeclaredFields()) {
                if (!Modifier.isStatic(f.getModifiers()) && !Modifier.isFinal(f.getModifiers())) {
                    throw new IllegalArgumentException(who + " is declared @Stateless but its field '" + f.getName()
                            + "' is not final");
                }
            }
        }
        if (kind.parameters() == null || !kind.parameters().isRecord()) {
            throw new IllegalArgumentException(who + " names no parameter record");
        }
        if (kind.id() == null || !kind.id().matches("[a-z][a-z0-9]*(-[a-z0-9]+)*")) {
            throw new IllegalArgumentException(who + " has the id '" + kind.id() + "'; an id is kebab-case");
        }
        try {
            return new PluginCheck<>(kind, origin);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(who + ": " + e.getMessage(), e);
        }
    }

    @Override
    public String id() {
        return kind.id();
    }

    @Override
    public String summary() {
        return kind.summary();
    }

    /** Where the kind was loaded from: a jar and its SHA-256, or the class path. */
    String origin() {
        return origin;
    }

    @Override
    public Optional<Record> bind(SchemaCatalog schemas, SourceDocument doc, String at, ObjectNode parameters,
                                 List<Problem> problems) {
        return binder.bind(doc, at, parameters, id(), problems).map(Record.class::cast);
    }

    @Override
    public List<Finding> check(FormulationAnalysis a, Rule rule) {
        P parameters = kind.parameters().cast(rule.bound().orElseThrow(() -> new IllegalStateException(
                "rule " + rule.id() + " was not bound to its parameters at pack load")));
        Formulation f = a.recipe().formulation();
        List<Violation> found;
        try {
            found = List.copyOf(kind.check(view(a), parameters));
        } catch (RuntimeException | LinkageError e) {
            throw new Failure("rule " + rule.id() + " (pack " + rule.pack() + "): check kind '" + id() + "' from "
                    + origin + " failed: " + e, e);
        }
        List<Finding> out = new ArrayList<>();
        for (Violation v : found) {
            out.add(rule.finding(f, v.pointer(), v.message()));
        }
        return out;
    }

    /** The analysis as a site's check sees it: plain values, copied. */
    static Analysis view(FormulationAnalysis a) {
        Formulation f = a.recipe().formulation();
        double litres = a.solution().volumeLitres(a.recipe().makeUpKelvin());
        List<Component> components = new ArrayList<>();
        for (Ingredient ing : a.recipe().ingredients()) {
            Double moles = a.solution().moles().get(ing);
            components.add(new Component(ing.substance().name(), ing.line().pointer(), moles == null
                    ? OptionalDouble.empty() : OptionalDouble.of(moles / litres * 1000)));
        }
        List<Condition> conditions = new ArrayList<>();
        for (ConditionResult r : a.conditions()) {
            double celsius = r.condition().kelvin() - Thermo.KELVIN_OFFSET;
            OptionalDouble none = OptionalDouble.empty();
            if (!r.determinate()) {
                conditions.add(new Condition(r.condition().name(), r.condition().pointer(), celsius, none, none, none,
                        none, none));
                continue;
            }
            var s = r.state().orElseThrow();
            conditions.add(new Condition(r.condition().name(), r.condition().pointer(), celsius,
                    OptionalDouble.of(s.pH()), r.uncertainty().map(u -> OptionalDouble.of(u.pH())).orElse(none),
                    OptionalDouble.of(r.bufferCapacityPerLitre() * 1000), OptionalDouble.of(s.ionicStrength()),
                    OptionalDouble.of(s.osmolality() * 1000)));
        }
        return new Analysis(f.id(), f.title(), f.revision(), f.intendedUse(), f.pHTarget().map(t -> new Target(t.min(),
                t.max(), t.kelvin() - Thermo.KELVIN_OFFSET, t.pointer())), components, conditions);
    }
}
