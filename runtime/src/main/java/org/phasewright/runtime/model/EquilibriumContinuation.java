package org.phasewright.runtime.model;

/**
 * Follow every equilibrium branch through a parameter: the equilibria found at {@code from}, and the branches met
 * along the way, while {@code parameter} (a PARAMETER variable) moves to {@code to}. The bounds may use params.
 */
public record EquilibriumContinuation(Variable parameter, Expr from, Expr to) implements Analysis {
    public EquilibriumContinuation {
        if (parameter.kind() != VariableKind.PARAMETER) {
            throw new IllegalArgumentException("a continuation varies a parameter, not " + parameter.name());
        }
    }
}
