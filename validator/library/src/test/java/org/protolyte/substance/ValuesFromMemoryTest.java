package org.protolyte.substance;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import org.junit.jupiter.api.Test;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The constants of the shipped library that rest (wholly or partly) on memory rather than on a publication read
 * for this project. The lists may only shrink: raise a ceiling only with a reason in review. A passing build prints
 * nothing; a failing one names the entries.
 */
class ValuesFromMemoryTest {

    /** Dissociation steps whose source says "from memory", after the readings of issue 15 (24 of 131). */
    private static final int CEILING = 24;

    /** The other constants (complexes, solids, solubility tables) resting on memory: 7 of 32. */
    private static final int OTHER_CEILING = 7;

    /** The buffers the shipped rule packs and samples rely on (issue 15). */
    private static final Set<String> NAMED_BUFFERS = Set.of("phosphate", "citrate", "acetate", "histidine", "Tris",
            "HEPES", "MOPS", "MES", "carbonate", "borate", "succinate", "glycine", "lactate");

    /**
     * Their steps still resting on memory, because no reachable copy of a publication gave the value (the
     * Goldberg, Kishore and Lennen 2002 tables could not be read here). Remove an entry when it is read.
     */
    private static final Set<String> NAMED_STILL_RECALLED = Set.of("HEPES step 1", "MES step 1");

    private static JsonNode library() throws IOException {
        try (InputStream in = LibraryLoader.class.getResourceAsStream("substances.json")) {
            return JsonMapper.builder().build().readTree(in);
        }
    }

    private static List<String> recalledSteps(JsonNode library) {
        List<String> recalled = new ArrayList<>();
        for (JsonNode system : library.path("systems")) {
            int k = 0;
            for (JsonNode step : system.path("steps")) {
                k++;
                if (step.path("source").asString().contains("from memory")) {
                    recalled.add(system.path("name").asString() + " step " + k);
                }
            }
        }
        return recalled;
    }

    @Test
    void recalledStepsDoNotGrow() throws IOException {
        List<String> recalled = recalledSteps(library());
        assertTrue(recalled.size() <= CEILING, "recalled steps grew to " + recalled.size() + ": " + recalled);
    }

    @Test
    void theNamedBuffersGainNoRecalledStep() throws IOException {
        List<String> named = recalledSteps(library()).stream()
                .filter(s -> NAMED_BUFFERS.contains(s.substring(0, s.lastIndexOf(" step "))))
                .filter(s -> !NAMED_STILL_RECALLED.contains(s))
                .toList();
        assertTrue(named.isEmpty(), "a buffer the samples rely on rests on memory: " + named);
    }

    /** The list of named buffers' recalled steps holds only steps that are still recalled, so it shrinks as they are read. */
    @Test
    void theNamedBuffersStillRecalledAreStillRecalled() throws IOException {
        List<String> recalled = recalledSteps(library());
        List<String> read = NAMED_STILL_RECALLED.stream().filter(s -> !recalled.contains(s)).sorted().toList();
        assertTrue(read.isEmpty(), "read now, remove from NAMED_STILL_RECALLED: " + read);
    }

    @Test
    void recalledComplexAndSolubilityValuesDoNotGrow() throws IOException {
        JsonNode library = library();
        List<String> recalled = new ArrayList<>();
        for (String section : List.of("complexes", "phases", "solubilities")) {
            for (JsonNode entry : library.path(section)) {
                if (entry.path("source").asString().contains("from memory")) {
                    recalled.add(section + ": " + entry.path("name").asString());
                }
            }
        }
        assertTrue(recalled.size() <= OTHER_CEILING, "recalled values grew to " + recalled.size() + ": " + recalled);
    }
}
