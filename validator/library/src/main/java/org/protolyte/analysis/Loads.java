package org.protolyte.analysis;

import java.util.OptionalDouble;

/**
 * How much strong acid and strong base (mmol per litre of solution) the recipe takes at a condition before
 * its pH leaves the target range: for a cell-culture medium, the lactic acid the cells may make first.
 * Empty on a side where the target has no limit; zero where the pH is already outside. Computed only at a condition
 * at the target's temperature: the target says nothing about the pH at another temperature.
 */
public record Loads(OptionalDouble acidToLeaveTarget, OptionalDouble baseToLeaveTarget) {
}
