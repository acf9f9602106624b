package org.phasewright.language.standalone;

/** The studies could not start: an unknown study name, a value that cannot be evaluated, unwritable results. */
public final class StudyPipelineException extends Exception {
    private static final long serialVersionUID = 1L;

    public StudyPipelineException(String message) {
        super(message);
    }
}
