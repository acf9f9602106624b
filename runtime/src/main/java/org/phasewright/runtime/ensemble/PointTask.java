package org.phasewright.runtime.ensemble;

import java.io.Serializable;
import java.util.function.BooleanSupplier;

import org.phasewright.runtime.compile.CompiledModel;

/**
 * The work of an ensemble: a pure function from (model, point number) to a small serializable row. Every input
 * other than the model travels inside the task, so any executor on any JVM computes the same row for the same
 * point, bit for bit.
 *
 * @param <R> the row type
 */
public interface PointTask<R extends Serializable> extends Serializable {
    /** Number of points, numbered 0 .. points() - 1 in grid order. */
    int points();

    /**
     * @param deadlineNanos {@link System#nanoTime()} value of this JVM after which integrations stop
     * @param cancelled     polled by the integrations
     */
    R compute(CompiledModel model, int point, long deadlineNanos, BooleanSupplier cancelled);

    /** Checks that a model rebuilt from a recipe is the one the task was made for (same shape). */
    void checkModel(CompiledModel model);
}
