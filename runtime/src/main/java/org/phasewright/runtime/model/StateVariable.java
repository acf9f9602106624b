package org.phasewright.runtime.model;

/** A state of the model. {@code initial} may refer to parameters. Unit and description may be null. */
public record StateVariable(String name, Expr initial, String unit, String description) {
}
