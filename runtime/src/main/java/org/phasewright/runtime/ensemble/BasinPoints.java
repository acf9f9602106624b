package org.phasewright.runtime.ensemble;

import java.util.function.BooleanSupplier;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.integrate.ExplicitMethod;
import org.phasewright.runtime.integrate.IntegrationOutcome;

/**
 * Basins points: the start whose two chosen states take the values of the grid (the first axis varying slowest,
 * point = i * second.steps() + j; every other state keeps its initial value) is integrated to {@code endTime} and
 * labelled by the nearest of the equilibria found beforehand, if the final state lies within
 * {@code captureRadius * (1 + |e|_inf)} of it in the max norm.
 *
 * @param equilibria coordinates of the known equilibria; labels are indices into this array
 */
public record BasinPoints(ModelShape shape, double[] parameters, double[] initialState, Axis first, Axis second,
        double endTime, IntegrationRecipe integration, double[][] equilibria, double captureRadius)
        implements PointTask<BasinPoint> {

    /** The label of a start that settled on no known equilibrium (or did not finish). */
    public static final int NONE = -1;
    /** Relative distance within which a final state counts as having reached an equilibrium. */
    public static final double DEFAULT_CAPTURE_RADIUS = 1e-3;

    public static BasinPoints of(CompiledModel model, Axis first, Axis second, double endTime,
            IntegrationRecipe integration, double[][] equilibria) {
        return new BasinPoints(ModelShape.of(model), model.parameters(), model.initialState(), first, second,
                endTime, integration, equilibria, DEFAULT_CAPTURE_RADIUS);
    }

    @Override
    public int points() {
        return first.steps() * second.steps();
    }

    /** The start of a point. */
    public double[] start(int point) {
        double[] u0 = initialState.clone();
        u0[first.index()] = first.value(point / second.steps());
        u0[second.index()] = second.value(point % second.steps());
        return u0;
    }

    @Override
    public BasinPoint compute(CompiledModel model, int point, long deadlineNanos, BooleanSupplier cancelled) {
        // one worker: the ensemble already runs many points at once
        IntegrationOutcome o = ExplicitMethod.create(model, parameters, 1)
                .integrate(0.0, start(point), endTime, integration.settings(deadlineNanos, cancelled), null);
        return new BasinPoint(o.completed() ? label(o.state()) : NONE, o.ending().name());
    }

    /** Index of the nearest equilibrium within the capture radius, or {@link #NONE}. */
    public int label(double[] u) {
        int best = NONE;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (int e = 0; e < equilibria.length; e++) {
            double distance = 0, size = 0;
            for (int i = 0; i < u.length; i++) {
                distance = Math.max(distance, Math.abs(u[i] - equilibria[e][i]));
                size = Math.max(size, Math.abs(equilibria[e][i]));
            }
            if (distance <= captureRadius * (1 + size) && distance < bestDistance) {
                best = e;
                bestDistance = distance;
            }
        }
        return best;
    }

    @Override
    public void checkModel(CompiledModel model) {
        shape.check(model);
    }
}
