/**
 * The library's API: build a {@link org.protolyte.api.Validator} once, then {@link org.protolyte.api.Validator#check
 * check} formulation documents and batch records from any thread. A {@link org.protolyte.api.Result} gives the status,
 * the findings, the diagnostics, the digests and one summary per condition as plain records, and renders the report
 * as text, JSON, SARIF or HTML with the same bytes as the command line. Everything outside this package and
 * {@code org.protolyte.spi} is internal and may change in any release.
 *
 * <p>Protolyte is a decision aid: release decisions rest on measured values, the applicable pharmacopoeia, local SOPs
 * and qualified QA review.
 */
package org.protolyte.api;
