package org.phasewright.runtime.ensemble;

import java.io.Serializable;
import java.util.function.BooleanSupplier;

import org.phasewright.runtime.integrate.IntegratorSettings;

/**
 * The serializable part of {@link IntegratorSettings}: the deadline and the cancellation flag belong to the JVM
 * that runs a point, so they are supplied there.
 */
public record IntegrationRecipe(double relativeTolerance, double absoluteTolerance, long maxSteps,
        double blowUpBound) implements Serializable {

    public IntegratorSettings settings(long deadlineNanos, BooleanSupplier cancelled) {
        return IntegratorSettings.DEFAULT.withTolerances(relativeTolerance, absoluteTolerance)
                .withMaxSteps(maxSteps)
                .withBlowUpBound(blowUpBound)
                .withDeadline(deadlineNanos)
                .withCancellation(cancelled);
    }
}
