package org.phasewright.runtime.study;

import org.phasewright.runtime.integrate.IntegrationOutcome;

/**
 * The crossings of a Poincaré section, in time order.
 *
 * @param points      one row per crossing (time, states, lets); null when the request could not be evaluated
 * @param integration counters and where the integration ended; null when it could not start
 * @param endTime     the requested end time (NaN if it could not be evaluated)
 */
public record SectionResult(Trajectory points, IntegrationOutcome integration, double endTime, Status status,
        String outcome, String message) implements AnalysisResult {
}
