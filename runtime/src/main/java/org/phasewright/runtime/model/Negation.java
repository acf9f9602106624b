package org.phasewright.runtime.model;

/** Unary minus. */
public record Negation(Expr operand) implements Expr {
}
