package org.phasewright.runtime.model;

/** Find and classify every equilibrium of the model at the declared parameter values. */
public record EquilibriumSearch() implements Analysis {
}
