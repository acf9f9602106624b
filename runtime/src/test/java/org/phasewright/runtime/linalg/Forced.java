package org.phasewright.runtime.linalg;

import org.phasewright.runtime.compile.ForwardingVectorField;
import org.phasewright.runtime.compile.SparseJacobian;
import org.phasewright.runtime.compile.SparseJacobians;
import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.model.DynamicalModel;

/**
 * A field that claims to be large (sparse path) or small (dense path) whatever its dimension, so tests can run the
 * same problem both ways.
 */
public final class Forced extends ForwardingVectorField {
    private final SparseJacobian sparse;
    private final boolean large;

    private Forced(VectorField field, SparseJacobian sparse, boolean large) {
        super(field);
        this.sparse = sparse;
        this.large = large;
    }

    public static Forced sparse(DynamicalModel model, VectorField field) {
        return new Forced(field, SparseJacobians.of(model, field), true);
    }

    /**
     * The dense path for a field of any size: its dense Jacobian is assembled from the sparse one (large compiled
     * models have no dense Jacobian of their own), so both paths see the same values.
     */
    public static Forced dense(VectorField field) {
        return new Forced(field, field.sparseJacobian(), false);
    }

    @Override
    public void jacobian(double t, double[] u, double[] p, double[] jac) {
        if (sparse == null) {
            super.jacobian(t, u, p, jac);
            return;
        }
        SparseMatrix m = sparse.newMatrix();
        sparse.values(t, u, p, m.values());
        int n = dimension();
        java.util.Arrays.fill(jac, 0, n * n, 0.0);
        for (int i = 0; i < n; i++) {
            for (int k = m.pattern().rowStart(i); k < m.pattern().rowEnd(i); k++) {
                jac[i * n + m.pattern().column(k)] = m.values()[k];
            }
        }
    }

    @Override
    public SparseJacobian sparseJacobian() {
        return sparse;
    }

    @Override
    public boolean large() {
        return large;
    }
}
