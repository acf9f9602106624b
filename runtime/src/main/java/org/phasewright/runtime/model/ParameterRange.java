package org.phasewright.runtime.model;

/** The admissible interval of a parameter, bounds included. */
public record ParameterRange(Expr low, Expr high) {
}
