package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;

import org.protolyte.analysis.FormulationAnalysis;

/**
 * Runs the rules of the selected packs on an analysis. The selection is the packs that apply to the
 * document's intended use, unless the run replaces it ({@code --rules PACK}) or adds to it
 * ({@code --rules +PACK}).
 */
public final class Checker {

    /**
     * The packs a document was judged by, what they found, and the rules that could not judge it (a rule that names a
     * condition the document does not have): such a document cannot pass.
     */
    public record Verdict(List<RulePack> packs, List<Finding> findings, List<Unjudged> unjudged) {
        public Verdict {
            packs = List.copyOf(packs);
            findings = List.copyOf(findings);
            unjudged = List.copyOf(unjudged);
        }

        public Verdict(List<RulePack> packs, List<Finding> findings) {
            this(packs, findings, List.of());
        }

        /** The same verdict with its findings replaced (waivers applied). */
        public Verdict withFindings(List<Finding> changed) {
            return new Verdict(packs, changed, unjudged);
        }
    }

    /** A rule that could not be applied to a document, and why. */
    public record Unjudged(String rule, String pack, String reason) {
    }

    private final RuleBook book;
    private final List<String> replace;
    private final List<String> add;
    /** Effective rules per selection, resolved (and their parameters validated) once, not per document. */
    private final java.util.Map<List<String>, List<Rule>> resolved = new java.util.concurrent.ConcurrentHashMap<>();

    /**
     * @throws IllegalArgumentException for a pack name the book does not hold
     * @throws org.protolyte.document.DocumentException when the chosen packs cannot be combined (naming the pack)
     */
    public Checker(RuleBook book, List<String> replace, List<String> add) {
        this.book = book;
        this.replace = List.copyOf(replace);
        this.add = List.copyOf(add);
        for (String name : java.util.stream.Stream.concat(this.replace.stream(), this.add.stream()).toList()) {
            if (book.pack(name).isEmpty()) {
                throw new IllegalArgumentException("no rule pack named '" + name + "'");
            }
        }
        for (String use : USES) {
            book.rules(selection(use.isEmpty() ? Optional.empty() : Optional.of(use)));
        }
    }

    /** Every intendedUse (and none): a combination of packs is checked for each before any document is. */
    private static final List<String> USES = List.of("", "parenteral", "ophthalmic", "cell-culture", "bioprocess",
            "oral", "topical", "laboratory", "other");

    /** The intended uses a document may state (the formulation schema's list). */
    public static List<String> intendedUses() {
        return USES.subList(1, USES.size());
    }

    /** The check kinds its rules run, the shipped ones and a site's. */
    public CheckKinds kinds() {
        return book.kinds();
    }

    public static Checker byIntendedUse(RuleBook book) {
        return new Checker(book, List.of(), List.of());
    }

    public List<String> selection(Optional<String> intendedUse) {
        List<String> chosen = new ArrayList<>(replace.isEmpty() ? book.defaultSelection(intendedUse) : replace);
        add.stream().filter(p -> !chosen.contains(p)).forEach(chosen::add);
        return chosen;
    }

    /** A batch record, by the batch check kinds of the packs its master's intended use selects. */
    public Verdict check(org.protolyte.batch.BatchAnalysis batch) {
        List<String> selected = selection(batch.record().master().intendedUse());
        List<Finding> out = new ArrayList<>();
        List<Rule> rules = resolved.computeIfAbsent(selected, book::rules);
        for (Rule rule : rules) {
            if (rule.enabled() && book.kinds().get(rule.check()).orElseThrow() instanceof BatchCheckKind k) {
                out.addAll(k.check(batch, rule, rules));
            }
        }
        return new Verdict(book.withAncestors(selected), out);
    }

    public Verdict check(FormulationAnalysis analysis) {
        List<String> selected = selection(analysis.recipe().formulation().intendedUse());
        List<Finding> out = new ArrayList<>();
        List<Unjudged> unjudged = new ArrayList<>();
        List<String> names = analysis.conditions().stream().map(c -> c.condition().name()).toList();
        for (Rule rule : resolved.computeIfAbsent(selected, book::rules)) {
            if (!rule.enabled()) {
                continue;
            }
            // a rule aimed at a condition the document lacks would otherwise judge nothing and stay silent
            Optional<String> missing = Stream.of("condition", "from", "to").map(rule::text).flatMap(Optional::stream)
                    .filter(n -> !names.contains(n)).findFirst();
            if (missing.isPresent()) {
                unjudged.add(new Unjudged(rule.id(), rule.pack(), "rule " + rule.id() + " (pack " + rule.pack()
                        + ") judges the condition '" + missing.get() + "', which this document does not have (its "
                        + "conditions: " + String.join(", ", names) + "); name the condition in the document or "
                        + "correct the pack"));
                continue;
            }
            try {
                out.addAll(book.kinds().get(rule.check()).orElseThrow().check(analysis, rule));
            } catch (PluginCheck.Failure | NotJudged e) {
                unjudged.add(new Unjudged(rule.id(), rule.pack(), e.getMessage()));
            }
        }
        return new Verdict(book.withAncestors(selected), out, unjudged);
    }
}
