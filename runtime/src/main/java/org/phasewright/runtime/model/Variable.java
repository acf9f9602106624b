package org.phasewright.runtime.model;

/**
 * A reference to a state, parameter, derived quantity or the time variable.
 * {@code index} is the position in {@link DynamicalModel#states()}, {@link DynamicalModel#parameters()} or
 * {@link DynamicalModel#derived()}; it is 0 for time. The name is kept for messages and generated code comments.
 */
public record Variable(VariableKind kind, int index, String name) implements Expr {
    public Variable {
        if (index < 0) {
            throw new IllegalArgumentException("negative index for " + name);
        }
    }
}
