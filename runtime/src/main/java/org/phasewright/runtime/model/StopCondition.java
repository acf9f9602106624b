package org.phasewright.runtime.model;

/** End a simulation early at the first zero of {@code surface} crossed in {@code direction}. */
public record StopCondition(Expr surface, Section.Crossing direction) {
    public StopCondition {
        if (direction == null) {
            direction = Section.Crossing.BOTH;
        }
    }
}
