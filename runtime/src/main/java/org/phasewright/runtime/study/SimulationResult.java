package org.phasewright.runtime.study;

import org.phasewright.runtime.integrate.IntegrationOutcome;

/**
 * @param trajectory  samples up to where the integration got; null when it could not start (INVALID_INPUT)
 * @param integration counters and final state; null when it could not start
 * @param endTime     the requested end time (NaN if it could not be evaluated)
 */
public record SimulationResult(Trajectory trajectory, IntegrationOutcome integration, double endTime,
        double relativeTolerance, Status status, String outcome, String message) implements AnalysisResult {
}
