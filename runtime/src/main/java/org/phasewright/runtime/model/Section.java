package org.phasewright.runtime.model;

/**
 * Poincaré section: integrate from the initial values to {@code endTime} and record every point where
 * {@code surface} (an expression of time, states, lets and params) crosses zero in the given direction.
 * {@code tolerance} is the relative tolerance, or null for the default.
 */
public record Section(Expr surface, Crossing direction, Expr endTime, Expr tolerance, IntegrationMethod method)
        implements Analysis {

    /** Which crossings count. */
    public enum Crossing {
        /** From negative to positive. */
        RISING,
        /** From positive to negative. */
        FALLING,
        BOTH
    }

    public Section {
        if (direction == null) {
            direction = Crossing.BOTH;
        }
        if (method == null) {
            method = IntegrationMethod.EXPLICIT;
        }
    }
}
