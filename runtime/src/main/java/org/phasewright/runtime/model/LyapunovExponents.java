package org.phasewright.runtime.model;

/**
 * The full spectrum of Lyapunov exponents along the orbit from the initial values up to {@code endTime}.
 * {@code tolerance} is the relative tolerance, or null for the default.
 */
public record LyapunovExponents(Expr endTime, Expr tolerance) implements Analysis {
}
