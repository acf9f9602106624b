package org.phasewright.runtime.study;

import java.util.List;

import org.phasewright.runtime.continuation.ContinuationOutcome;
import org.phasewright.runtime.periodic.CycleBranch;

/**
 * @param continuation branches of equilibria and special points; null when the request could not be evaluated
 * @param cycles       the family of periodic orbits followed from each Hopf point (may be empty)
 */
public record ContinuationResult(ContinuationOutcome continuation, List<CycleBranch> cycles, Status status,
        String outcome, String message) implements AnalysisResult {

    public ContinuationResult {
        cycles = cycles == null ? List.of() : List.copyOf(cycles);
    }

    /** A result without periodic orbits. */
    public ContinuationResult(ContinuationOutcome continuation, Status status, String outcome, String message) {
        this(continuation, List.of(), status, outcome, message);
    }
}
