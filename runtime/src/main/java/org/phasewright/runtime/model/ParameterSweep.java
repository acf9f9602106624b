package org.phasewright.runtime.model;

/**
 * An orbit diagram: for {@code steps} evenly spaced values of {@code parameter} from {@code from} to {@code to},
 * integrate from the initial values to {@code endTime} and record the local maxima of every state over the second
 * half of the run (the first half is left to transients).
 */
public record ParameterSweep(Variable parameter, Expr from, Expr to, int steps, Expr endTime) implements Analysis {
    public ParameterSweep {
        if (parameter.kind() != VariableKind.PARAMETER) {
            throw new IllegalArgumentException("a sweep varies a parameter, not " + parameter.name());
        }
    }
}
