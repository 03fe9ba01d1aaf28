package org.protolyte.document;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import tools.jackson.databind.JsonNode;

/**
 * The two dates of a waiver entry, read strictly (ISO 8601 calendar dates, so no 2026-02-30) and in order: a waiver
 * that expires before it was approved was never valid. Shared by waiver files and a document's own waivers, which
 * are refused at read time whether or not a pack would honour them.
 */
public record WaiverDates(LocalDate approved, LocalDate expires) {

    /** The dates of the entry at {@code at}, or the problems, each at its field. */
    public static WaiverDates read(SourceDocument doc, JsonNode waiver, String at) {
        List<Problem> problems = new ArrayList<>();
        Optional<LocalDate> approved = date(doc, waiver, at, "approved", problems);
        Optional<LocalDate> expires = date(doc, waiver, at, "expires", problems);
        if (approved.isPresent() && expires.isPresent() && expires.get().isBefore(approved.get())) {
            problems.add(doc.problem(at + "/expires", "the waiver expires on " + expires.get()
                    + ", before it was approved (" + approved.get() + "): it was never valid"));
        }
        if (!problems.isEmpty()) {
            throw new DocumentException(problems);
        }
        return new WaiverDates(approved.orElseThrow(), expires.orElseThrow());
    }

    private static Optional<LocalDate> date(SourceDocument doc, JsonNode waiver, String at, String field,
                                            List<Problem> problems) {
        String text = waiver.path(field).asString("");
        try {
            return Optional.of(LocalDate.parse(text));
        } catch (DateTimeParseException e) {
            // caught: the parser's message names its own formatter; the problem at the field says it for a reviewer
            problems.add(doc.problem(at + "/" + field, "the waiver's " + field + " date '" + text
                    + "' is not a calendar date (YYYY-MM-DD, a month 01–12 and a day that month has)"));
            return Optional.empty();
        }
    }
}
