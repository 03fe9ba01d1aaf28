package org.protolyte.chemistry;

/** A species at equilibrium: its molality (mol/kg water), activity coefficient and share of its component. */
public record SpeciesAmount(Species species, Component component, double molality, double activityCoefficient,
                            double fractionOfComponent) {
}
