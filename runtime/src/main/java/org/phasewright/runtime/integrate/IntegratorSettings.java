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
 * @param componentRelativeTolerances per-component relative tolerances overriding the scalar one, or null
 * @param componentAbsoluteTolerances per-component absolute tolerances overriding the scalar one, or null
 */
public record IntegratorSettings(double relativeTolerance, double absoluteTolerance, double initialStep,
        double maxStep, long maxSteps, double blowUpBound, long deadlineNanos, BooleanSupplier cancelled,
        double[] componentRelativeTolerances, double[] componentAbsoluteTolerances) {

    public static final IntegratorSettings DEFAULT = new IntegratorSettings(1e-8, 1e-10, 0.0,
            Double.POSITIVE_INFINITY, 10_000_000L, 1e12, Long.MAX_VALUE, () -> false);

    /** Scalar tolerances for every component. */
    public IntegratorSettings(double relativeTolerance, double absoluteTolerance, double initialStep, double maxStep,
            long maxSteps, double blowUpBound, long deadlineNanos, BooleanSupplier cancelled) {
        this(relativeTolerance, absoluteTolerance, initialStep, maxStep, maxSteps, blowUpBound, deadlineNanos,
                cancelled, null, null);
    }

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
        componentRelativeTolerances = positiveCopy(componentRelativeTolerances, "relative");
        componentAbsoluteTolerances = positiveCopy(componentAbsoluteTolerances, "absolute");
    }

    private static double[] positiveCopy(double[] v, String what) {
        if (v == null) {
            return null;
        }
        for (double x : v) {
            if (!(x > 0) || !Double.isFinite(x)) {
                throw new IllegalArgumentException(what + " tolerances must be positive, got " + x);
            }
        }
        return v.clone();
    }

    /** Per-component tolerances (either may be null to keep the scalar value for every component). */
    public IntegratorSettings withComponentTolerances(double[] rtol, double[] atol) {
        return new IntegratorSettings(relativeTolerance, absoluteTolerance, initialStep, maxStep, maxSteps,
                blowUpBound, deadlineNanos, cancelled, rtol, atol);
    }

    /** Relative tolerance of each of {@code n} components, freshly allocated (call once per integration). */
    public double[] relativeTolerances(int n) {
        return expand(componentRelativeTolerances, relativeTolerance, n);
    }

    /** Absolute tolerance of each of {@code n} components, freshly allocated (call once per integration). */
    public double[] absoluteTolerances(int n) {
        return expand(componentAbsoluteTolerances, absoluteTolerance, n);
    }

    private static double[] expand(double[] v, double scalar, int n) {
        if (v == null) {
            double[] out = new double[n];
            java.util.Arrays.fill(out, scalar);
            return out;
        }
        if (v.length != n) {
            throw new IllegalArgumentException(v.length + " component tolerances for " + n + " components");
        }
        return v.clone();
    }

    public IntegratorSettings withTolerances(double rtol, double atol) {
        return new IntegratorSettings(rtol, atol, initialStep, maxStep, maxSteps, blowUpBound, deadlineNanos,
                cancelled, componentRelativeTolerances,
                componentAbsoluteTolerances);
    }

    public IntegratorSettings withSteps(double initial, double max) {
        return new IntegratorSettings(relativeTolerance, absoluteTolerance, initial, max, maxSteps, blowUpBound,
                deadlineNanos, cancelled, componentRelativeTolerances,
                componentAbsoluteTolerances);
    }

    public IntegratorSettings withMaxSteps(long steps) {
        return new IntegratorSettings(relativeTolerance, absoluteTolerance, initialStep, maxStep, steps, blowUpBound,
                deadlineNanos, cancelled, componentRelativeTolerances,
                componentAbsoluteTolerances);
    }

    public IntegratorSettings withBlowUpBound(double bound) {
        return new IntegratorSettings(relativeTolerance, absoluteTolerance, initialStep, maxStep, maxSteps, bound,
                deadlineNanos, cancelled, componentRelativeTolerances,
                componentAbsoluteTolerances);
    }

    public IntegratorSettings withDeadline(long nanoTime) {
        return new IntegratorSettings(relativeTolerance, absoluteTolerance, initialStep, maxStep, maxSteps,
                blowUpBound, nanoTime, cancelled, componentRelativeTolerances,
                componentAbsoluteTolerances);
    }

    public IntegratorSettings withCancellation(BooleanSupplier flag) {
        return new IntegratorSettings(relativeTolerance, absoluteTolerance, initialStep, maxStep, maxSteps,
                blowUpBound, deadlineNanos, flag, componentRelativeTolerances,
                componentAbsoluteTolerances);
    }
}
