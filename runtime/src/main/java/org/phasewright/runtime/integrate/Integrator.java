package org.phasewright.runtime.integrate;

/**
 * A one-step method with error control and dense output. Implementations own their work arrays (the step loop
 * allocates nothing), are not thread-safe and can be reused for several integrations.
 */
public interface Integrator {
    /**
     * Integrates from (t0, u0) to tEnd (which may lie before t0). Never throws for numerical trouble: the outcome
     * names how it ended and at what time.
     *
     * @param observer receives every accepted step, or null
     */
    IntegrationOutcome integrate(double t0, double[] u0, double tEnd, IntegratorSettings settings,
            StepObserver observer);
}
