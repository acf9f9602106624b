package org.phasewright.runtime.model;

/**
 * Basins of attraction on a grid of initial values of two states (every other state starts at its initial value):
 * each start is integrated to {@code endTime} and labelled by the equilibrium it settles on, if any.
 * {@code tolerance} is the relative tolerance, or null.
 */
public record Basins(GridAxis first, GridAxis second, Expr endTime, Expr tolerance) implements Analysis {
    public Basins {
        if (first.variable().kind() != VariableKind.STATE || second.variable().kind() != VariableKind.STATE) {
            throw new IllegalArgumentException("basins are drawn over the initial values of two states");
        }
    }
}
