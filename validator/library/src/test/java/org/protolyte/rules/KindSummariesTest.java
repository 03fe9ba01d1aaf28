package org.protolyte.rules;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** `protolyte rules` prints each kind's summary: one line, a sentence fragment, never empty. */
class KindSummariesTest {

    @Test
    void everyShippedKindHasAOneLineSummary() {
        for (CheckKind k : CheckKinds.load().all().values()) {
            String s = k.summary();
            assertTrue(s.length() > 10 && !s.contains("\n") && s.equals(s.strip()), () -> k.id() + ": '" + s + "'");
        }
    }
}
