package org.phasewright.runtime.study;

/** The result of one analysis of a study: never an exception, always a named outcome and a message for people. */
public sealed interface AnalysisResult permits SimulationResult, EquilibriumResult, SectionResult, LyapunovResult,
        ContinuationResult, SweepResult, LyapunovMapResult, BasinsResult {
    Status status();

    /** Name of the specific ending, e.g. COMPLETED, BLEW_UP, WORK_LIMIT, INVALID_INPUT. */
    String outcome();

    /** One line, e.g. "integration blew up at t = 3.2e-01: |u| exceeded 1e12". */
    String message();
}
