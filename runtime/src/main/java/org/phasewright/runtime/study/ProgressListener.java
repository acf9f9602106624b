package org.phasewright.runtime.study;

/**
 * Hears how far the integrations of a study have got, for a progress display. Called on the thread that runs the
 * study, at most about a thousand times per analysis (whenever another 0.1% of the simulated time is done), so an
 * implementation may print but should not block.
 */
@FunctionalInterface
public interface ProgressListener {
    /** Hears nothing. */
    ProgressListener NONE = (task, fraction) -> {
    };

    /**
     * @param task     what is running, e.g. "simulate to t = 1000"
     * @param fraction of the simulated time done, from 0 to 1
     */
    void progress(String task, double fraction);
}
