package org.phasewright.runtime.integrate;

/**
 * Stops an integration at the first zero crossing of g (in the given direction) and passes the steps, cut at that
 * time, on to another observer, so samples never run past the event.
 */
public final class EventStop implements StepObserver {
    private final CrossingLocator locator;
    private final StepObserver downstream;
    private final Clipped clipped = new Clipped();
    private boolean stopped;
    private double time = Double.NaN;
    private double[] state;

    public EventStop(SwitchingFunction g, CrossingLocator.Direction direction, int dimension,
            StepObserver downstream) {
        this.locator = new CrossingLocator(g, direction, dimension, 1);
        this.downstream = downstream;
    }

    @Override
    public void start(double t0, double[] u0) {
        locator.start(t0, u0);
        downstream.start(t0, u0);
    }

    @Override
    public void step(DenseStep step) {
        if (stopped) {
            return;
        }
        locator.step(step);
        if (locator.count() > 0) {
            stopped = true;
            time = locator.times()[0];
            state = locator.states()[0];
            clipped.wrap(step, time, state);
            downstream.step(clipped);
        } else {
            downstream.step(step);
        }
    }

    @Override
    public boolean stopRequested() {
        return stopped;
    }

    /** Where the event happened, or NaN if it did not. */
    public double time() {
        return time;
    }

    /** The state at {@link #time()} (a copy), or null. */
    public double[] state() {
        return state == null ? null : state.clone();
    }

    /** A step cut at the event: same continuous extension, earlier end. */
    private static final class Clipped implements DenseStep {
        private DenseStep step;
        private double end;
        private double[] endState;

        void wrap(DenseStep step, double end, double[] endState) {
            this.step = step;
            this.end = end;
            this.endState = endState;
        }

        @Override
        public double startTime() {
            return step.startTime();
        }

        @Override
        public double endTime() {
            return end;
        }

        @Override
        public void stateAt(double t, double[] out) {
            step.stateAt(t, out);
        }

        @Override
        public double[] endState() {
            return endState;
        }
    }
}
