package org.phasewright.runtime.integrate;

import java.util.function.BooleanSupplier;

/**
 * Tolerances and budgets for one integration. Error control is per component with weight
 * atol + rtol·max(|u_old|, |u_new|), as in Hairer's DOPRI5.
 *
 * @param initialStep   first step size, or 0 to choose it automatically
 * @param maxStep       largest step size allowed (infinite: the whole interval)
 * @param maxSteps      attempted steps (accepted plus rejected) before giving up
 * @param blowUpBound   |u|_inf above which the solution is reported as blowing up
 * @param deadlineNanos {@link System#nanoTime()} value after which to stop, or {@link Long#MAX_VALUE} for none
 * @param cancelled     polled once per step; true stops the integration
 */
public record IntegratorSettings(double relativeTolerance, double absoluteTolerance, double initialStep,
        double maxStep, long maxSteps, double blowUpBound, long deadlineNanos, BooleanSupplier cancelled) {

    public static final IntegratorSettings DEFAULT = new IntegratorSettings(1e-8, 1e-10, 0.0,
            Double.POSITIVE_INFINITY, 10_000_000L, 1e12, Long.MAX_VALUE, () -> false);

    public IntegratorSettings {
        if (!(relativeTolerance > 0) || !(absoluteTolerance > 0)) {
            throw new IllegalArgumentException("tolerances must be positive: rtol " + relativeTolerance
                    + ", atol " + absoluteTolerance);
        }
        if (!(initialStep >= 0) || !(maxStep > 0) || maxSteps <= 0 || !(blowUpBound > 0)) {
            throw new IllegalArgumentException("step settings must be positive");
        }
        if (cancelled == null) {
            cancelled = () -> false;
        }
    }

    public IntegratorSettings withTolerances(double rtol, double atol) {
        return new IntegratorSettings(rtol, atol, initialStep, maxStep, maxSteps, blowUpBound, deadlineNanos,
                cancelled);
    }

    public IntegratorSettings withSteps(double initial, double max) {
        return new IntegratorSettings(relativeTolerance, absoluteTolerance, initial, max, maxSteps, blowUpBound,
                deadlineNanos, cancelled);
    }

    public IntegratorSettings withMaxSteps(long steps) {
        return new IntegratorSettings(relativeTolerance, absoluteTolerance, initialStep, maxStep, steps, blowUpBound,
                deadlineNanos, cancelled);
    }

    public IntegratorSettings withBlowUpBound(double bound) {
        return new IntegratorSettings(relativeTolerance, absoluteTolerance, initialStep, maxStep, maxSteps, bound,
                deadlineNanos, cancelled);
    }

    public IntegratorSettings withDeadline(long nanoTime) {
        return new IntegratorSettings(relativeTolerance, absoluteTolerance, initialStep, maxStep, maxSteps,
                blowUpBound, nanoTime, cancelled);
    }

    public IntegratorSettings withCancellation(BooleanSupplier flag) {
        return new IntegratorSettings(relativeTolerance, absoluteTolerance, initialStep, maxStep, maxSteps,
                blowUpBound, deadlineNanos, flag);
    }
}
