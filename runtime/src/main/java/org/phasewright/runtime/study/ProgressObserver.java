package org.phasewright.runtime.study;

import java.util.function.DoubleConsumer;

import org.phasewright.runtime.integrate.DenseStep;
import org.phasewright.runtime.integrate.StepObserver;

/** Passes every step on to the observer it wraps and tells a {@link ProgressListener} the fraction of time done. */
final class ProgressObserver implements StepObserver {
    private static final int STEPS_PER_RUN = 1000;

    private final StepObserver inner;
    private final ProgressListener listener;
    private final String task;
    private final double startTime;
    private final double span;
    private int reported = -1;

    private ProgressObserver(StepObserver inner, ProgressListener listener, String task, double startTime,
            double endTime) {
        this.inner = inner;
        this.listener = listener;
        this.task = task;
        this.startTime = startTime;
        this.span = endTime - startTime;
    }

    /** {@code inner} itself when nobody listens; {@code inner} may be null. */
    static StepObserver wrap(StepObserver inner, RunSettings settings, String task, double startTime,
            double endTime) {
        if (settings.progress() == ProgressListener.NONE || !(Math.abs(endTime - startTime) > 0)) {
            return inner;
        }
        return new ProgressObserver(inner, settings.progress(), task, startTime, endTime);
    }

    /** A listener for the time reached, or null when nobody listens. */
    static DoubleConsumer timeListener(RunSettings settings, String task, double startTime, double endTime) {
        if (settings.progress() == ProgressListener.NONE || !(Math.abs(endTime - startTime) > 0)) {
            return null;
        }
        return new ProgressObserver(null, settings.progress(), task, startTime, endTime)::tell;
    }

    /** "simulate to t = 1000". */
    static String task(String verb, String timeName, double endTime) {
        return verb + " to " + timeName + " = " + SectionRunner.plain(endTime);
    }

    @Override
    public void start(double t0, double[] u0) {
        if (inner != null) {
            inner.start(t0, u0);
        }
        tell(t0);
    }

    @Override
    public void step(DenseStep step) {
        if (inner != null) {
            inner.step(step);
        }
        tell(step.endTime());
    }

    void tell(double t) {
        double fraction = Math.max(0, Math.min(1, (t - startTime) / span));
        int permille = (int) (fraction * STEPS_PER_RUN);
        if (permille > reported) {
            reported = permille;
            listener.progress(task, fraction);
        }
    }
}
