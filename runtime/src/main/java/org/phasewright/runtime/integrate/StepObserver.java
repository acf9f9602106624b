package org.phasewright.runtime.integrate;

/** Receives the integration as it goes; the integrator knows nothing about what is done with it. */
public interface StepObserver {
    /** Called once with the initial point (a read-only view). */
    default void start(double t0, double[] u0) {
    }

    /** Called after every accepted step. */
    void step(DenseStep step);

    /** Polled after every step: true ends the integration with {@link IntegrationOutcome.Ending#STOPPED}. */
    default boolean stopRequested() {
        return false;
    }
}
