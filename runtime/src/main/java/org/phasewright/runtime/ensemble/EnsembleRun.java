package org.phasewright.runtime.ensemble;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * The rows of an ensemble in grid order; a point that did not run (deadline, cancellation) has a null row.
 *
 * @param executor  where it ran, for people (e.g. "4 threads", "Spark local[*], 4 cores")
 * @param workers   points that could run at the same time (threads or executor cores)
 * @param cancelled whether the caller cancelled the run
 */
public record EnsembleRun<R>(List<R> rows, String executor, int workers, boolean cancelled) {
    public EnsembleRun {
        rows = Collections.unmodifiableList(new ArrayList<>(rows)); // keeps the nulls List.copyOf refuses
    }

    public int completed() {
        int n = 0;
        for (R r : rows) {
            if (r != null) {
                n++;
            }
        }
        return n;
    }
}
