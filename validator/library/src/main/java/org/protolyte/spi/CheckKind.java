package org.protolyte.spi;

import java.util.List;

/**
 * A kind of check that a site adds, named by its rule packs in {@code "check"}. Found with {@link java.util.ServiceLoader}
 * on the class path, on the module path, or in a jar of the command line's {@code --plugins DIR}.
 *
 * <p>A kind is stateless, and says so with {@link Stateless}: one instance judges every document, from many threads at
 * once; a kind whose class is not so annotated, or has an instance field that is not final, is refused when it is
 * loaded. Its parameters are a record ({@link #parameters()}): a pack's {@code "parameters"} object is bound to it and
 * checked once, when the pack is loaded, and a pack whose parameters do not fit is refused with the place in the pack.
 * A component of the record may be absent from the pack only if it is an {@code Optional}, {@code OptionalDouble},
 * {@code OptionalInt} or {@code OptionalLong}; the record's constructor may refuse values by throwing
 * {@link IllegalArgumentException}, whose message the pack's author reads.
 *
 * <p>A check judges only what the engine could determine: a condition without a pH is the engine's diagnostic, not
 * the rule's business. A check that throws makes the document {@code INDETERMINATE}, never {@code PASS}.
 *
 * @param <P> the parameter record
 */
public interface CheckKind<P extends Record> {

    /** Kebab-case name that packs use in {@code "check"}; unique among all kinds, the shipped ones included. */
    String id();

    /** One line: what the check asks for. */
    String summary();

    /** The record a rule's parameters bind to. */
    Class<P> parameters();

    /**
     * The places where the document breaks the rule; empty when it keeps it. The rule's severity, explanation, remedy,
     * safety note and references come from its pack.
     */
    List<Violation> check(Analysis analysis, P parameters);
}
