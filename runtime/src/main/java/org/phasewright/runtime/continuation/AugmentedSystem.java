package org.phasewright.runtime.continuation;

import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.linalg.SparseMatrix;

/**
 * H(x) = f(u; p(λ)) for x = (u, λ) in R^(n+1), and its n×(n+1) Jacobian [f_u | f_λ]. f_u is the exact Jacobian of
 * the compiled field; f_λ is a central difference with step cbrt(machine epsilon)·max(1, |λ|), whose error is
 * O(h²) ≈ 1e-11 relative (the compiled field has no derivative in a parameter, and one column is cheap). Large
 * fields give f_u sparse only.
 * Not thread-safe: it owns work arrays.
 */
final class AugmentedSystem {
    private static final double STEP = Math.cbrt(2.220446049250313e-16);

    private final VectorField field;
    private final ParameterVector parameters;
    private final int n;
    private final double[] p, u, fPlus, fMinus, column, jac;

    AugmentedSystem(VectorField field, ParameterVector parameters, int parameterCount) {
        this.field = field;
        this.parameters = parameters;
        this.n = field.dimension();
        this.p = new double[parameterCount];
        this.u = new double[n];
        this.fPlus = new double[n];
        this.fMinus = new double[n];
        this.column = new double[n];
        this.jac = field.large() ? null : new double[n * n];
    }

    int dimension() {
        return n;
    }

    ParameterVector parameters() {
        return parameters;
    }

    VectorField field() {
        return field;
    }

    /** H(x) into {@code out} (length n). */
    void value(double[] x, double[] out) {
        System.arraycopy(x, 0, u, 0, n);
        parameters.fill(x[n], p);
        field.rates(0.0, u, p, out);
    }

    /** f_u at x, row-major n×n. */
    void stateJacobian(double[] x, double[] out) {
        System.arraycopy(x, 0, u, 0, n);
        parameters.fill(x[n], p);
        field.jacobian(0.0, u, p, out);
    }

    /** [f_u | f_λ] at x, row-major with n+1 columns. */
    void jacobian(double[] x, double[] out) {
        int m = n + 1;
        stateJacobian(x, jac);
        for (int i = 0; i < n; i++) {
            System.arraycopy(jac, i * n, out, i * m, n);
        }
        parameterColumn(x, column);
        for (int i = 0; i < n; i++) {
            out[i * m + n] = column[i];
        }
    }

    /** True when f_u is only available sparse (a model above the dense limit). */
    boolean sparse() {
        return field.large();
    }

    /** f_u at x into {@code out}, whose pattern is the field's sparse Jacobian's. */
    void sparseStateJacobian(double[] x, SparseMatrix out) {
        System.arraycopy(x, 0, u, 0, n);
        parameters.fill(x[n], p);
        field.sparseJacobian().values(0.0, u, p, out.values());
    }

    /** f_λ at x (length n) into {@code out}. */
    void parameterColumn(double[] x, double[] out) {
        System.arraycopy(x, 0, u, 0, n);
        double lambda = x[n];
        double h = STEP * Math.max(1.0, Math.abs(lambda));
        double up = lambda + h, down = lambda - h;
        h = (up - down) / 2; // the step actually represented in floating point
        parameters.fill(up, p);
        field.rates(0.0, u, p, fPlus);
        parameters.fill(down, p);
        field.rates(0.0, u, p, fMinus);
        for (int i = 0; i < n; i++) {
            out[i] = (fPlus[i] - fMinus[i]) / (2 * h);
        }
    }
}
