package org.phasewright.runtime.lyapunov;

import org.phasewright.runtime.compile.SparseJacobian;
import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.linalg.SparseMatrix;

/**
 * The model together with the variational equations V' = J(t, u)·V of k tangent vectors (the n×k matrix V stored
 * row-major after the n states) and one more component that integrates the divergence tr J, so the sum of a full
 * spectrum can be checked against it. J·V comes from the dense Jacobian for small models and from the sparse one
 * for large models, which keeps memory at O(n·k). Allocation-free: the Jacobian is written into a buffer owned by
 * the instance (hence not thread-safe).
 */
final class VariationalField implements VectorField {
    private final VectorField model;
    private final int n;
    private final int k;
    private final double[] jac;
    private final SparseJacobian sparse;
    private final SparseMatrix sparseJac;
    private final int[] diagonal;

    /** @param useSparse take J·V from {@code model.sparseJacobian()} (which must exist) instead of the dense J */
    VariationalField(VectorField model, int k, boolean useSparse) {
        this.model = model;
        this.n = model.dimension();
        this.k = k;
        if (useSparse) {
            sparse = model.sparseJacobian();
            if (sparse == null) {
                throw new IllegalArgumentException("the model offers no sparse Jacobian");
            }
            sparseJac = sparse.newMatrix();
            diagonal = new int[n];
            for (int i = 0; i < n; i++) {
                diagonal[i] = sparseJac.pattern().find(i, i);
            }
            jac = null;
        } else {
            sparse = null;
            sparseJac = null;
            diagonal = null;
            jac = new double[n * n];
        }
    }

    static int dimensionFor(int n, int k) {
        return n + n * k + 1;
    }

    @Override
    public int dimension() {
        return dimensionFor(n, k);
    }

    @Override
    public void rates(double t, double[] y, double[] p, double[] dydt) {
        model.rates(t, y, p, dydt); // reads only the first n entries of y, writes the first n of dydt
        double trace = 0;
        if (sparse != null) {
            double[] values = sparseJac.values();
            sparse.values(t, y, p, values);
            sparseJac.multiplyBlock(y, n, k, dydt, n);
            for (int i = 0; i < n; i++) {
                trace += diagonal[i] < 0 ? 0 : values[diagonal[i]];
            }
        } else {
            model.jacobian(t, y, p, jac);
            for (int i = 0; i < n; i++) {
                int row = i * n;
                trace += jac[row + i];
                for (int c = 0; c < k; c++) {
                    double sum = 0;
                    for (int j = 0; j < n; j++) {
                        sum += jac[row + j] * y[n + j * k + c];
                    }
                    dydt[n + i * k + c] = sum;
                }
            }
        }
        dydt[n + n * k] = trace;
    }

    @Override
    public void jacobian(double t, double[] u, double[] p, double[] jacRowMajor) {
        throw new UnsupportedOperationException("the variational system is integrated by explicit methods only");
    }

    /** ‖J(u)‖∞, for the first re-orthonormalisation interval. */
    double jacobianNorm(double[] u, double[] p) {
        if (sparse != null) {
            sparse.values(0, u, p, sparseJac.values());
            return sparseJac.weightedRowNorm(null);
        }
        model.jacobian(0, u, p, jac);
        double norm = 0;
        for (int i = 0; i < n; i++) {
            double row = 0;
            for (int j = 0; j < n; j++) {
                row += Math.abs(jac[i * n + j]);
            }
            norm = Math.max(norm, row);
        }
        return norm;
    }
}
