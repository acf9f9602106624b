package org.phasewright.runtime.model;

/** The current value of a bound index (of the family being defined, or of an enclosing {@link Sum}). */
public record IndexValue(String name) implements Expr {
}
