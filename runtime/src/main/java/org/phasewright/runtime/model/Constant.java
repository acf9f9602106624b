package org.phasewright.runtime.model;

/** A literal number (π is lowered to its value). */
public record Constant(double value) implements Expr {
    public static final Constant ZERO = new Constant(0.0);
    public static final Constant ONE = new Constant(1.0);
}
