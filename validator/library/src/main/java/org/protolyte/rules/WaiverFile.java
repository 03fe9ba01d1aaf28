package org.protolyte.rules;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.protolyte.document.DocumentException;
import org.protolyte.document.JsonReader;
import org.protolyte.document.Problem;
import org.protolyte.document.SchemaCatalog;
import org.protolyte.document.SourceDocument;
import org.protolyte.document.WaiverDates;

import tools.jackson.databind.JsonNode;

/** Reads a waiver file (schema {@code waivers.schema.json}); every problem names its place. */
public final class WaiverFile {

    public static final String SCHEMA = "waivers.schema.json";

    private WaiverFile() {
    }

    public static List<Waiver> read(SchemaCatalog schemas, String source, byte[] content) {
        SourceDocument doc = new JsonReader(4L * 1024 * 1024).read(source, content);
        if (!"waivers".equals(doc.root().path("document").asString(""))) {
            throw new DocumentException(doc.problem(doc.root().has("document") ? "/document" : "",
                    "not a Protolyte waiver file: expected \"document\": \"waivers\""));
        }
        List<Problem> problems = new ArrayList<>(schemas.validate(doc, SCHEMA));
        if (!problems.isEmpty()) {
            throw new DocumentException(problems);
        }
        List<Waiver> out = new ArrayList<>();
        JsonNode list = doc.root().get("waivers");
        for (int i = 0; i < list.size(); i++) {
            JsonNode w = list.get(i);
            String at = "/waivers/" + i;
            try {
                out.add(waiver(w, source + " " + at, false, doc, at));
            } catch (DocumentException e) {
                problems.addAll(e.problems());
            }
        }
        if (!problems.isEmpty()) {
            throw new DocumentException(problems);
        }
        return out;
    }

    /** One waiver entry, from a waiver file or from a document's own "waivers". */
    static Waiver waiver(JsonNode w, String origin, boolean authorGranted, SourceDocument doc, String at) {
        WaiverDates dates = WaiverDates.read(doc, w, at);
        return new Waiver(w.get("rule").asString(), text(w, "documentId"), text(w, "revision"), text(w, "sha256"),
                text(w, "pointer"), w.get("reason").asString(), w.get("approver").asString(), dates.approved(), dates.expires(),
                origin, authorGranted);
    }

    private static Optional<String> text(JsonNode w, String field) {
        return w.has(field) ? Optional.of(w.get(field).asString()) : Optional.empty();
    }
}
