package org.phasewright.runtime.study;

import org.phasewright.runtime.sweep.SweepOutcome;

/**
 * @param sweep the orbit diagram; null when the request could not be evaluated
 */
public record SweepResult(SweepOutcome sweep, Status status, String outcome, String message)
        implements AnalysisResult {
}
