package org.phasewright.runtime.ensemble;

import java.io.Serializable;

import org.phasewright.runtime.compile.CompiledModel;

/** Runs every point of a task and returns the rows in grid order, whatever order they were computed in. */
public interface EnsembleExecutor {
    /**
     * @param model the compiled model the task was made for; executors that run elsewhere rebuild it from their
     *              recipe instead
     * @throws EnsembleFailure when the executor cannot run the job at all
     */
    <R extends Serializable> EnsembleRun<R> run(PointTask<R> task, CompiledModel model, EnsembleControl control);
}
