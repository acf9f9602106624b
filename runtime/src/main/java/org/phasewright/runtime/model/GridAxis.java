package org.phasewright.runtime.model;

/**
 * One axis of an ensemble grid: {@code steps} evenly spaced values of a parameter or of a state's initial value,
 * from {@code from} to {@code to} inclusive.
 */
public record GridAxis(Variable variable, Expr from, Expr to, int steps) {
    public GridAxis {
        if (variable.kind() != VariableKind.PARAMETER && variable.kind() != VariableKind.STATE) {
            throw new IllegalArgumentException("a grid runs over a parameter or a state, not " + variable.name());
        }
        if (steps < 1) {
            throw new IllegalArgumentException("a grid axis needs at least one step");
        }
    }
}
