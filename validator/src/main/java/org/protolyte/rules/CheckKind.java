package org.protolyte.rules;

import java.util.List;

import org.protolyte.analysis.FormulationAnalysis;

/**
 * One kind of check: reads the analysis, never solves anything itself. Only determinate numbers may
 * be judged; indeterminate conditions are the engine's diagnostics, not findings.
 */
public interface CheckKind {

    /** Kebab-case rule id, e.g. {@code ph-within-target}. */
    String id();

    /** One-line summary of what the rule asks for. */
    String summary();

    List<Finding> check(FormulationAnalysis analysis);
}
