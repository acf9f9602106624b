package org.phasewright.runtime.integrate;

import java.util.ArrayList;
import java.util.List;

/**
 * Finds where g(t, u(t)) crosses zero along an integration, using the integrator's dense output, so events cost no
 * extra steps. Each accepted step is scanned in a few sub-intervals (so two crossings inside one long step are not
 * missed when g changes sign twice between its ends), and a bracketed sign change is refined by the Illinois
 * variant of regula falsi (Dowell &amp; Jarratt 1971) to a time accuracy near round-off. The located state has the
 * accuracy of the dense output.
 */
public final class CrossingLocator implements StepObserver {
    /** Which sign changes count. */
    public enum Direction { RISING, FALLING, BOTH }

    private static final int SCAN_PIECES = 4;
    private static final int MAX_ITERATIONS = 100;

    private final SwitchingFunction g;
    private final Direction direction;
    private final int limit;
    private final double[] u, uLo;
    private final List<double[]> points = new ArrayList<>();
    private final List<Double> times = new ArrayList<>();
    private double tPrev, gPrev;
    private boolean started, truncated;

    /** @param limit most crossings kept (the rest are counted as truncated) */
    public CrossingLocator(SwitchingFunction g, Direction direction, int dimension, int limit) {
        this.g = g;
        this.direction = direction;
        this.limit = limit;
        this.u = new double[dimension];
        this.uLo = new double[dimension];
    }

    @Override
    public void start(double t0, double[] u0) {
        tPrev = t0;
        gPrev = g.value(t0, u0);
        started = true;
    }

    @Override
    public void step(DenseStep step) {
        if (!started) {
            throw new IllegalStateException("start was not called");
        }
        double t0 = step.startTime(), t1 = step.endTime();
        for (int k = 1; k <= SCAN_PIECES; k++) {
            double t = k == SCAN_PIECES ? t1 : t0 + (t1 - t0) * k / SCAN_PIECES;
            double[] state;
            if (k == SCAN_PIECES) {
                state = step.endState();
            } else {
                step.stateAt(t, u);
                state = u;
            }
            double gt = g.value(t, state);
            if (counts(gPrev, gt)) {
                locate(step, tPrev, gPrev, t, gt);
            }
            tPrev = t;
            gPrev = gt;
        }
    }

    /** A sign change from a to b (a zero at the left end was already reported, one at the right end counts). */
    private boolean counts(double a, double b) {
        if (!Double.isFinite(a) || !Double.isFinite(b) || a == 0) {
            return false;
        }
        boolean rising = a < 0 && b >= 0, falling = a > 0 && b <= 0;
        return switch (direction) {
            case RISING -> rising;
            case FALLING -> falling;
            case BOTH -> rising || falling;
        };
    }

    private void locate(DenseStep step, double a, double ga, double b, double gb) {
        int side = 0;
        double tol = 4 * Math.ulp(Math.max(Math.abs(a), Math.abs(b)));
        double root;
        for (int i = 0; i < MAX_ITERATIONS && gb != 0 && Math.abs(b - a) > tol; i++) {
            double c = (a * gb - b * ga) / (gb - ga);
            if (!(c > Math.min(a, b) && c < Math.max(a, b))) { // works backward in time too
                c = 0.5 * (a + b);
            }
            step.stateAt(c, uLo);
            double gc = g.value(c, uLo);
            if (gc == 0) {
                a = c;
                b = c;
                break;
            }
            if ((gc > 0) == (gb > 0)) { // root in [a, c]
                b = c;
                gb = gc;
                if (side == -1) {
                    ga *= 0.5; // Illinois: halve the stale end's value so the bracket shrinks from both sides
                }
                side = -1;
            } else {
                a = c;
                ga = gc;
                if (side == 1) {
                    gb *= 0.5;
                }
                side = 1;
            }
        }
        root = gb == 0 ? b : (Math.abs(ga) < Math.abs(gb) ? a : b);
        if (times.size() >= limit) {
            truncated = true;
            return;
        }
        double[] state = new double[u.length];
        if (root == step.endTime()) {
            System.arraycopy(step.endState(), 0, state, 0, state.length);
        } else {
            step.stateAt(root, state);
        }
        times.add(root);
        points.add(state);
    }

    public int count() {
        return times.size();
    }

    public double[] times() {
        double[] t = new double[times.size()];
        for (int i = 0; i < t.length; i++) {
            t[i] = times.get(i);
        }
        return t;
    }

    /** The states at {@link #times()}, one row each (owned by the caller). */
    public double[][] states() {
        return points.toArray(new double[0][]);
    }

    /** True when more crossings happened than were kept. */
    public boolean truncated() {
        return truncated;
    }
}
