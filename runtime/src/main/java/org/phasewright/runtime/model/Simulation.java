package org.phasewright.runtime.model;

import java.util.List;

/**
 * Integrate from time 0 to {@code endTime}. {@code start} lists one expression per state, or is empty to start
 * from the declared initial values. {@code tolerance} is the relative tolerance, or null for the default.
 */
public record Simulation(Expr endTime, List<Expr> start, Expr tolerance) implements Analysis {
    public Simulation {
        start = List.copyOf(start);
    }

    public boolean startsFromInitialValues() {
        return start.isEmpty();
    }
}
