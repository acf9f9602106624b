package org.phasewright.runtime.model;

/**
 * A parameter. {@code value} may refer to other parameters (never cyclically; the language checks).
 * Unit, range and description may be null.
 */
public record Parameter(String name, Expr value, String unit, ParameterRange range, String description) {
}
