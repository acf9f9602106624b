package org.phasewright.runtime.lyapunov;

import org.phasewright.runtime.compile.VectorField;

/**
 * The model together with its variational equations Φ' = J(t, u)·Φ (n×n, row-major after the n states) and one
 * more component that integrates the divergence tr J, so the sum of the exponents can be checked against it.
 * Allocation-free: the Jacobian is written into a buffer owned by the instance (hence not thread-safe).
 */
final class VariationalField implements VectorField {
    private final VectorField model;
    private final int n;
    private final double[] jac;

    VariationalField(VectorField model) {
        this.model = model;
        this.n = model.dimension();
        this.jac = new double[n * n];
    }

    static int dimensionFor(int n) {
        return n + n * n + 1;
    }

    @Override
    public int dimension() {
        return dimensionFor(n);
    }

    @Override
    public void rates(double t, double[] y, double[] p, double[] dydt) {
        model.rates(t, y, p, dydt); // reads only the first n entries of y, writes the first n of dydt
        model.jacobian(t, y, p, jac);
        double trace = 0;
        for (int i = 0; i < n; i++) {
            int row = i * n;
            trace += jac[row + i];
            for (int k = 0; k < n; k++) {
                double sum = 0;
                for (int j = 0; j < n; j++) {
                    sum += jac[row + j] * y[n + j * n + k];
                }
                dydt[n + row + k] = sum;
            }
        }
        dydt[n + n * n] = trace;
    }

    @Override
    public void jacobian(double t, double[] u, double[] p, double[] jacRowMajor) {
        throw new UnsupportedOperationException("the variational system is integrated by explicit methods only");
    }
}
