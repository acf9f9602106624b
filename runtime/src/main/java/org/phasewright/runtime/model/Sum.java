package org.phasewright.runtime.model;

/** The sum of {@code body} over every value of {@code range}, bound to the index named {@code range.name()}. */
public record Sum(IndexRange range, Expr body) implements Expr {
}
