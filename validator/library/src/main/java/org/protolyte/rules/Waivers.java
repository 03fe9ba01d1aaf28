package org.protolyte.rules;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.protolyte.document.DocumentException;
import org.protolyte.document.Formulation;

import tools.jackson.databind.JsonNode;

/**
 * Applies waivers to one document's findings. A matching waiver marks its findings as waived; a
 * waiver for another revision or other bytes is stale, one past its expiry is expired, one approved after the run
 * date is refused (all three are error findings of their own), and one whose rule did not fire is unused (a note:
 * nothing is wrong with the document).
 */
public final class Waivers {

    public static final String STALE = "waiver-stale";
    public static final String EXPIRED = "waiver-expired";
    public static final String UNUSED = "waiver-unused";
    public static final String FUTURE = "waiver-future-approval";
    public static final String NOT_ALLOWED = "waiver-not-allowed";

    private final List<Waiver> held;
    private final LocalDate today;

    /** @param held the waivers QA holds (a waiver file); {@code today}, the run date, decides approval and expiry */
    public Waivers(List<Waiver> held, LocalDate today) {
        this.held = List.copyOf(held);
        this.today = today;
    }

    public static Waivers none(LocalDate today) {
        return new Waivers(List.of(), today);
    }

    public List<Finding> apply(Formulation f, String sha256, boolean documentWaiversAllowed, List<Finding> findings) {
        List<Finding> out = new ArrayList<>(findings);
        List<Finding> extra = new ArrayList<>();
        List<Waiver> applicable = new ArrayList<>();
        for (Waiver w : held) {
            if (w.documentId().map(id -> id.equals(f.id())).orElse(false)) {
                applicable.add(w);
            }
        }
        JsonNode own = f.document().root().path("waivers");
        for (int i = 0; i < own.size(); i++) {
            String at = "/waivers/" + i;
            if (!documentWaiversAllowed) {
                extra.add(new Finding(NOT_ALLOWED, Severity.WARNING, "this document carries a waiver, but none of its "
                        + "rule packs allows waivers written in the document; it is ignored. QA holds waivers in a "
                        + "waiver file (--waivers)", Optional.of(at), f.document().locate(at)));
                continue;
            }
            try {
                applicable.add(WaiverFile.waiver(own.get(i), "document " + at, true, f.document(), at));
            } catch (DocumentException e) {
                e.problems().forEach(p -> extra.add(new Finding(STALE, Severity.ERROR, p.message(),
                        Optional.of(p.pointer()), p.location())));
            }
        }
        for (Waiver w : applicable) {
            String where = w.authorGranted() ? w.origin().substring("document ".length()) : "";
            Optional<String> problem = stale(w, f, sha256);
            if (problem.isPresent()) {
                extra.add(new Finding(STALE, Severity.ERROR, problem.get(), Optional.of(where),
                        f.document().locate(where)));
                continue;
            }
            if (w.approved().isAfter(today)) {
                extra.add(new Finding(FUTURE, Severity.ERROR, "waiver of " + w.rule() + " (" + w.origin()
                        + ", approved by " + w.approver() + ") is dated " + w.approved() + ", after the run date "
                        + today + ": a waiver cannot be approved in the future, so it is not applied (check its date, "
                        + "or give the run date with --as-of)", Optional.of(where), f.document().locate(where)));
                continue;
            }
            if (w.expires().isBefore(today)) {
                extra.add(new Finding(EXPIRED, Severity.ERROR, "waiver of " + w.rule() + " (" + w.origin()
                        + ", approved by " + w.approver() + ") expired on " + w.expires(), Optional.of(where),
                        f.document().locate(where)));
                continue;
            }
            boolean used = false;
            for (int i = 0; i < out.size(); i++) {
                Finding x = out.get(i);
                if (x.rule().equals(w.rule()) && x.waivedBy().isEmpty()
                        && w.pointer().map(p -> x.pointer().orElse("").equals(p)).orElse(true)) {
                    out.set(i, x.waived(w));
                    used = true;
                }
            }
            if (!used) {
                extra.add(new Finding(UNUSED, Severity.NOTE, "waiver of " + w.rule() + " (" + w.origin()
                        + ") matches no finding: the rule did not fire" + w.pointer().map(p -> " at " + p).orElse(""),
                        Optional.of(where), f.document().locate(where)));
            }
        }
        out.addAll(extra);
        return out;
    }

    private static Optional<String> stale(Waiver w, Formulation f, String sha256) {
        if (w.authorGranted()) {
            return Optional.empty();   // written in this very document: its revision and bytes are the document's
        }
        String granted = w.revision().orElse("");
        String current = f.revision().orElse("(none)");
        if (!granted.equals(current)) {
            return Optional.of("waiver of " + w.rule() + " (" + w.origin() + ") was granted for revision " + granted
                    + "; the document is at revision " + current + ": review the finding again");
        }
        if (w.sha256().isPresent() && !w.sha256().get().equals(sha256)) {
            return Optional.of("waiver of " + w.rule() + " (" + w.origin() + ") was granted for other bytes (SHA-256 "
                    + w.sha256().get().substring(0, 12) + "…, this file " + sha256.substring(0, 12)
                    + "…): the document changed without a new revision");
        }
        return Optional.empty();
    }
}
