package org.phasewright.runtime.integrate;

import java.util.Arrays;

/**
 * Records the state at requested output times by dense output, independent of where the integrator steps.
 * Storage is allocated up front; if the integration stops early only the times reached are filled.
 */
public final class OutputSampler implements StepObserver {
    private final double[] times;
    private final double[][] states;
    private final double direction;
    private int filled;

    /** @param times output times, monotone in the direction of integration */
    public OutputSampler(double[] times, int dimension) {
        this.times = times.clone();
        this.states = new double[times.length][dimension];
        this.direction = times.length > 1 && times[times.length - 1] < times[0] ? -1 : 1;
    }

    /** Evenly spaced times t0, ..., tEnd (both included). */
    public static double[] evenlySpaced(double t0, double tEnd, int count) {
        if (count < 2) {
            throw new IllegalArgumentException("need at least the start and end time, got " + count + " points");
        }
        double[] t = new double[count];
        for (int i = 0; i < count; i++) {
            t[i] = t0 + (tEnd - t0) * i / (count - 1);
        }
        t[count - 1] = tEnd; // exact, so the last sample is the end state itself
        return t;
    }

    @Override
    public void start(double t0, double[] u0) {
        while (filled < times.length && (times[filled] - t0) * direction <= 0) {
            System.arraycopy(u0, 0, states[filled++], 0, u0.length);
        }
    }

    @Override
    public void step(DenseStep step) {
        double end = step.endTime();
        while (filled < times.length && (times[filled] - end) * direction <= 0) {
            if (times[filled] == end) {
                System.arraycopy(step.endState(), 0, states[filled], 0, states[filled].length);
            } else {
                step.stateAt(times[filled], states[filled]);
            }
            filled++;
        }
    }

    /** Number of output times reached so far. */
    public int count() {
        return filled;
    }

    /** The output times reached. */
    public double[] times() {
        return Arrays.copyOf(times, filled);
    }

    /** States at {@link #times()}, one row per time. Rows are shared, not copied. */
    public double[][] states() {
        return Arrays.copyOf(states, filled);
    }
}
