package org.protolyte.fuzz;

import org.junit.jupiter.api.Timeout;

import com.code_intelligence.jazzer.junit.FuzzTest;

/** The whole check of a formulation from bytes (seeds: the shipped sample formulations). */
class FormulationCheckFuzzTest {

    @FuzzTest
    @Timeout(60)
    void checkGivesAnHonestReport(byte[] input) {
        FuzzChecks.assertHonestReport(input, FuzzChecks.PROTOLYTE.check(FuzzChecks.SOURCE, input));
    }
}
