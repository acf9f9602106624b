package org.phasewright.runtime.model;

/** A binary arithmetic operation. */
public record Binary(BinaryOperator operator, Expr left, Expr right) implements Expr {
}
