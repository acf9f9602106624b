package org.phasewright.runtime.integrate;

/** One accepted step with its continuous extension; valid only during {@link StepObserver#step}. */
public interface DenseStep {
    double startTime();

    double endTime();

    /** The interpolated state at {@code t} in [startTime, endTime], written into {@code out}. */
    void stateAt(double t, double[] out);

    /** The state at {@link #endTime()}. A read-only view: do not modify or keep it. */
    double[] endState();
}
