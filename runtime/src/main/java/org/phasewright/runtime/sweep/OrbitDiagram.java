package org.phasewright.runtime.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.continuation.ParameterVector;
import org.phasewright.runtime.integrate.CrossingLocator;
import org.phasewright.runtime.integrate.DenseStep;
import org.phasewright.runtime.integrate.ExplicitMethod;
import org.phasewright.runtime.integrate.IntegrationOutcome;
import org.phasewright.runtime.integrate.IntegratorSettings;
import org.phasewright.runtime.integrate.StepObserver;
import org.phasewright.runtime.symbolic.InitialValues;

/**
 * Orbit diagram column: one integration per parameter value; the ensemble executors (via
 * {@link org.phasewright.runtime.ensemble.OrbitPoints}) run the columns in parallel. A local maximum of state i is a
 * falling zero of its rate f_i, located on the dense output (so its value is accurate to the integration tolerance,
 * not to the step).
 */
public final class OrbitDiagram {
    private OrbitDiagram() {
    }

    // column() is public, so it guards its own budget rather than trusting every caller to.
    private static boolean expired(IntegratorSettings s) {
        return s.deadlineNanos() != Long.MAX_VALUE && System.nanoTime() - s.deadlineNanos() > 0;
    }

    /**
     * One parameter value; null when the budget ran out before it started. Public so that ensemble executors
     * compute each column with exactly this code.
     */
    public static SweepColumn column(CompiledModel model, ParameterVector parameters, double value, double endTime,
            IntegratorSettings settings, BooleanSupplier cancelled) {
        if (cancelled.getAsBoolean() || expired(settings)) {
            return null;
        }
        double[] p = parameters.at(value);
        double[] u0 = InitialValues.resolve(model.model(), p);
        VectorField field = model.field();
        int n = model.dimension();
        double settle = endTime / 2; // the first half is left to transients
        List<CrossingLocator> locators = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            final int state = i;
            double[] rates = new double[n]; // one buffer per locator and thread
            locators.add(new CrossingLocator((t, u) -> {
                field.rates(t, u, p, rates);
                return rates[state];
            }, CrossingLocator.Direction.FALLING, n, 100_000));
        }
        StepObserver afterTransients = new StepObserver() {
            private boolean started;
            private final double[] u = new double[n];

            @Override
            public void step(DenseStep step) {
                if (step.endTime() <= settle) {
                    return;
                }
                if (!started) { // the locators begin at the first step that reaches past the transients
                    step.stateAt(step.startTime(), u);
                    for (CrossingLocator l : locators) {
                        l.start(step.startTime(), u);
                    }
                    started = true;
                }
                for (CrossingLocator l : locators) {
                    l.step(step);
                }
            }
        };
        // one worker: the ensemble already runs many columns at once
        IntegrationOutcome outcome = ExplicitMethod.create(model, p, 1).integrate(0.0, u0, endTime,
                settings, afterTransients);
        double[][] maxima = new double[n][];
        for (int i = 0; i < n; i++) {
            double[] times = locators.get(i).times();
            double[][] states = locators.get(i).states();
            List<Double> kept = new ArrayList<>();
            for (int k = 0; k < times.length; k++) {
                if (times[k] >= settle) {
                    kept.add(states[k][i]);
                }
            }
            maxima[i] = kept.stream().mapToDouble(Double::doubleValue).toArray();
        }
        return new SweepColumn(value, maxima, outcome.ending().name());
    }
}
