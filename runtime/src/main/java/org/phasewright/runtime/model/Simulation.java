package org.phasewright.runtime.model;

import java.util.List;

/**
 * Integrate from time 0 to {@code endTime}. {@code start} lists one expression per state, or is empty to start
 * from the declared initial values. {@code tolerance} is the relative tolerance, or null for the default.
 * {@code stop}, when not null, ends the simulation at an event before {@code endTime}.
 */
public record Simulation(Expr endTime, List<Expr> start, Expr tolerance, IntegrationMethod method,
        StopCondition stop) implements Analysis {
    public Simulation {
        start = List.copyOf(start);
        if (method == null) {
            method = IntegrationMethod.EXPLICIT;
        }
    }

    /** Without a stop condition. */
    public Simulation(Expr endTime, List<Expr> start, Expr tolerance, IntegrationMethod method) {
        this(endTime, start, tolerance, method, null);
    }

    /** With the default method and no stop condition. */
    public Simulation(Expr endTime, List<Expr> start, Expr tolerance) {
        this(endTime, start, tolerance, IntegrationMethod.EXPLICIT, null);
    }

    public boolean startsFromInitialValues() {
        return start.isEmpty();
    }
}
