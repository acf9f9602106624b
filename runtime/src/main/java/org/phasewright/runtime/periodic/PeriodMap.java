package org.phasewright.runtime.periodic;

import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.continuation.ParameterVector;
import org.phasewright.runtime.integrate.DormandPrince853;
import org.phasewright.runtime.integrate.IntegrationOutcome;
import org.phasewright.runtime.integrate.IntegratorSettings;

/**
 * One shot over [0, T] from u0 at λ: the end point φ(T), the monodromy matrix ∂φ/∂u0, ∂φ/∂λ, and the smallest and
 * largest value of each state at the accepted steps (for bifurcation diagrams). Dormand–Prince 8(5,3) at a tight
 * tolerance, since Newton's method on the period map needs its derivatives to several digits.
 */
final class PeriodMap {
    /** What one shot gives; null fields never occur (a failed shot returns null instead). */
    record Shot(double[] end, double[] monodromy, double[] parameterDerivative, double[] minimum, double[] maximum,
            long steps) {
    }

    private final ShootingField shooting;
    private final ParameterVector parameters;
    private final int n;
    private final double[] p;
    private final IntegratorSettings settings;

    PeriodMap(VectorField model, ParameterVector parameters, int parameterCount, IntegratorSettings settings) {
        this.shooting = new ShootingField(model, parameters, parameterCount);
        this.parameters = parameters;
        this.n = model.dimension();
        this.p = new double[parameterCount];
        this.settings = settings;
    }

    /** @return the shot, or null when the integration did not reach T (blow-up, budget, cancellation) */
    Shot shoot(double[] u0, double period, double lambda) {
        if (!(period > 0) || !Double.isFinite(period)) {
            return null;
        }
        shooting.at(lambda);
        parameters.fill(lambda, p);
        int size = ShootingField.dimensionFor(n);
        double[] y0 = new double[size];
        System.arraycopy(u0, 0, y0, 0, n);
        for (int i = 0; i < n; i++) {
            y0[n + i * n + i] = 1;
        }
        double[] min = u0.clone(), max = u0.clone();
        IntegrationOutcome outcome = new DormandPrince853(shooting, p).integrate(0.0, y0, period, settings, step -> {
            double[] u = step.endState();
            for (int i = 0; i < n; i++) {
                min[i] = Math.min(min[i], u[i]);
                max[i] = Math.max(max[i], u[i]);
            }
        });
        if (!outcome.completed()) {
            return null;
        }
        double[] y = outcome.state();
        double[] end = java.util.Arrays.copyOf(y, n);
        double[] m = java.util.Arrays.copyOfRange(y, n, n + n * n);
        double[] w = java.util.Arrays.copyOfRange(y, n + n * n, size);
        return new Shot(end, m, w, min, max, outcome.acceptedSteps() + outcome.rejectedSteps());
    }
}
