package org.phasewright.language.ui.results;

/** One row of the equilibria table, already in words and numbers for display. */
public record EquilibriumRow(String name, double[] coordinates, String eigenvalues, String type, String orbit) {
}
