package org.phasewright.runtime.model;

/**
 * Lyapunov exponents along the orbit from the initial values up to {@code endTime}: the whole spectrum when
 * {@code leading} is 0, otherwise only the {@code leading} largest (what large lattices can afford).
 * {@code tolerance} is the relative tolerance, or null for the default.
 */
public record LyapunovExponents(Expr endTime, Expr tolerance, int leading) implements Analysis {
    public LyapunovExponents {
        if (leading < 0) {
            throw new IllegalArgumentException("leading must be 0 (all) or positive, got " + leading);
        }
    }

    /** The whole spectrum. */
    public LyapunovExponents(Expr endTime, Expr tolerance) {
        this(endTime, tolerance, 0);
    }
}
