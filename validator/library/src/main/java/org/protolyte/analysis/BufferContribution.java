package org.protolyte.analysis;

/**
 * What one acid–base system contributes to the buffer capacity at a condition: its share of β, and
 * its pKa at the condition's temperature nearest the pH: thermodynamic, or apparent where complexes move it (borate
 * with a polyol, citrate with calcium).
 *
 * @param bufferCapacityPerLitre mol per litre of solution per pH unit
 * @param molesPerBasis          the system's total amount in the recipe, mol per basis
 * @param open                   exchanging with a gas phase (bicarbonate under CO2): it then buffers well
 *                               above its pKa, and the usual "within one unit" rule does not apply
 * @param apparent               the pKa is the conditional one, moved by 0.05 or more by the system's complexes
 */
public record BufferContribution(String system, double bufferCapacityPerLitre, double share, double nearestPKa,
                                 double molesPerBasis, boolean open, boolean apparent) {
}
