package org.protolyte.document;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTimeoutPreemptively;

import java.time.Duration;
import java.util.List;

import org.junit.jupiter.api.Test;

class SuggestionsTest {

    @Test
    void aNameOfTheLongestLengthStillGetsItsNearestName() {
        String near = "b" + "a".repeat(99);
        assertEquals(List.of(near), Suggestions.nearest("a".repeat(Suggestions.LONGEST_NAME), List.of(near), 1));
    }

    @Test
    void aLongerNameGetsNone() {
        String near = "a".repeat(Suggestions.LONGEST_NAME);
        assertEquals(List.of(), Suggestions.nearest("a".repeat(Suggestions.LONGEST_NAME + 1), List.of(near), 1));
    }

    /** The edit distance costs the product of the lengths: a 4 MiB name hung before names were bounded. */
    @Test
    void aFourMebibyteNameIsAnsweredAtOnce() {
        String name = "formulaton" + "n".repeat(4 << 20);
        assertEquals(List.of(), assertTimeoutPreemptively(Duration.ofSeconds(10),
                () -> Suggestions.nearest(name, List.of("formulation", "batch-record", "x".repeat(1 << 20)), 3)));
    }
}
