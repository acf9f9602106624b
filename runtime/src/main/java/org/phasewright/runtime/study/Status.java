package org.phasewright.runtime.study;

/** Coarse result of an analysis, e.g. for an exit code. */
public enum Status {
    /** Did everything asked. */
    COMPLETED,
    /** Stopped by a budget or cancellation; partial results are kept. */
    INCOMPLETE,
    /** The numerics failed (blow-up, NaN, step underflow) or the request could not be evaluated. */
    FAILED
}
