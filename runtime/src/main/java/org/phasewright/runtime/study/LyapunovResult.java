package org.phasewright.runtime.study;

import org.phasewright.runtime.lyapunov.LyapunovOutcome;

/**
 * @param spectrum exponents with their history and convergence data; null when the request could not be evaluated
 * @param endTime  the requested end time (NaN if it could not be evaluated)
 */
public record LyapunovResult(LyapunovOutcome spectrum, double endTime, Status status, String outcome,
        String message) implements AnalysisResult {
}
