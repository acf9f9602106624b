package org.phasewright.runtime.model;

/**
 * The largest Lyapunov exponent over a two-parameter grid: for every grid point, the orbit from the initial values
 * up to {@code endTime}. Both axes vary parameters. {@code tolerance} is the relative tolerance, or null.
 */
public record LyapunovMap(GridAxis first, GridAxis second, Expr endTime, Expr tolerance) implements Analysis {
    public LyapunovMap {
        if (first.variable().kind() != VariableKind.PARAMETER || second.variable().kind() != VariableKind.PARAMETER) {
            throw new IllegalArgumentException("a Lyapunov map varies two parameters");
        }
    }
}
