package org.protolyte.fuzz;

import org.junit.jupiter.api.Timeout;

import com.code_intelligence.jazzer.junit.FuzzTest;

/**
 * The whole check of a batch record from bytes, which has no folder, so its master is embedded (seeds: the shipped
 * batch records with their master written in).
 */
class BatchRecordCheckFuzzTest {

    @FuzzTest
    @Timeout(60)
    void checkGivesAnHonestReport(byte[] input) {
        FuzzChecks.assertHonestReport(input, FuzzChecks.PROTOLYTE.check(FuzzChecks.SOURCE, input));
    }
}
