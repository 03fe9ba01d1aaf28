package org.protolyte.analysis;

/**
 * How much the pH at a condition moves when one component's amount rises by 1 % (titrants held at
 * their q.s. amount): the component a reviewer should look at first is the one with the largest |dpH|.
 */
public record Sensitivity(String substance, String pointer, double dpHPerPercent) {
}
