package org.phasewright.runtime.periodic;

import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.continuation.ParameterVector;

/**
 * The model with its first variational equations in the states and in the varied parameter λ:
 * u' = f(u; λ), Φ' = f_u Φ (n×n, row-major after the states), w' = f_u w + f_λ (n more), so that integrating from
 * (u0, I, 0) over one period gives φ(T), the monodromy matrix and ∂φ/∂λ together. f_λ is a central difference with
 * step cbrt(machine epsilon)·max(1, |λ|). Not thread-safe (work arrays).
 */
final class ShootingField implements VectorField {
    private static final double STEP = Math.cbrt(2.220446049250313e-16);

    private final VectorField model;
    private final ParameterVector parameters;
    private final int n;
    private final double[] jac, pPlus, pMinus, fPlus, fMinus;
    private double lambda;

    ShootingField(VectorField model, ParameterVector parameters, int parameterCount) {
        this.model = model;
        this.parameters = parameters;
        this.n = model.dimension();
        this.jac = new double[n * n];
        this.pPlus = new double[parameterCount];
        this.pMinus = new double[parameterCount];
        this.fPlus = new double[n];
        this.fMinus = new double[n];
    }

    /** Sets λ (the integrator receives the matching full parameter vector separately). */
    void at(double value) {
        lambda = value;
        double h = STEP * Math.max(1.0, Math.abs(value));
        parameters.fill(value + h, pPlus);
        parameters.fill(value - h, pMinus);
    }

    static int dimensionFor(int n) {
        return n + n * n + n;
    }

    @Override
    public int dimension() {
        return dimensionFor(n);
    }

    @Override
    public void rates(double t, double[] y, double[] p, double[] dydt) {
        model.rates(t, y, p, dydt); // reads the first n entries of y, writes the first n of dydt
        model.jacobian(t, y, p, jac);
        model.rates(t, y, pPlus, fPlus);
        model.rates(t, y, pMinus, fMinus);
        double h = (pPlus[parameters.index()] - pMinus[parameters.index()]) / 2;
        int w = n + n * n;
        for (int i = 0; i < n; i++) {
            int row = i * n;
            for (int k = 0; k < n; k++) {
                double sum = 0;
                for (int j = 0; j < n; j++) {
                    sum += jac[row + j] * y[n + j * n + k];
                }
                dydt[n + row + k] = sum;
            }
            double sum = 0;
            for (int j = 0; j < n; j++) {
                sum += jac[row + j] * y[w + j];
            }
            dydt[w + i] = sum + (fPlus[i] - fMinus[i]) / (2 * h);
        }
    }

    @Override
    public void jacobian(double t, double[] u, double[] p, double[] jacRowMajor) {
        throw new UnsupportedOperationException("the shooting system is integrated by explicit methods only");
    }

    double lambda() {
        return lambda;
    }
}
