package org.phasewright.runtime.ensemble;

/**
 * The executor itself failed (a cluster that cannot be reached, a job that Spark aborted): the ensemble has no
 * result, and the analysis reports it as a named outcome rather than an internal error.
 */
public final class EnsembleFailure extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public EnsembleFailure(String message, Throwable cause) {
        super(message, cause);
    }
}
