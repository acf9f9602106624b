package org.phasewright.language.ide.server;

/** How the studies of one saved model went: run to the end, failed (with the reason), or not started. */
public record StudyOutcome(Status status, String message, long millis) {

    public enum Status {
        FINISHED, FAILED, NOT_RUN
    }
}
