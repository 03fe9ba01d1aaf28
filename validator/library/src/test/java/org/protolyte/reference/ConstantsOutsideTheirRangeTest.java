package org.protolyte.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.protolyte.analysis.ConditionResult;

/**
 * A component whose constants are not valid at a condition's temperature voids the pH only where it carries the
 * buffering: the library's leucine constants hold at 10–40 °C, phosphate's at 0–75 °C.
 */
class ConstantsOutsideTheirRangeTest {

    @Test
    void aTraceOutsideItsRangeIsAWarningAndLeavesThePHUnchanged() {
        ConditionResult with = ReferenceDocuments.solution().with("potassium dihydrogen phosphate", 0.01)
                .with("disodium hydrogen phosphate anhydrous", 0.01).with("L-leucine", 0.0001).condition(5);
        ConditionResult without = ReferenceDocuments.solution().with("potassium dihydrogen phosphate", 0.01)
                .with("disodium hydrogen phosphate anhydrous", 0.01).condition(5);
        assertTrue(with.determinate());
        assertTrue(with.caveats().stream().anyMatch(c -> c.code().equals("temperature-out-of-range-minor")
                && c.message().contains("Leu")), with.caveats().toString());
        // 0.1 mM of a zwitterion at pH 7 takes up almost no protons: the pH moves by well under 0.005
        assertEquals(without.state().orElseThrow().pH(), with.state().orElseThrow().pH(), 0.005);
    }

    @Test
    void theBufferItselfOutsideItsRangeIsIndeterminate() {
        ConditionResult r = ReferenceDocuments.solution().with("L-leucine", 0.05).with("sodium hydroxide", 0.025)
                .condition(5);
        assertFalse(r.determinate());
        assertTrue(r.caveats().stream().anyMatch(c -> c.code().equals("temperature-out-of-range")));
    }
}
