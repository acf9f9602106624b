package org.phasewright.runtime.compile;

/**
 * The right-hand side du/dt = f(t, u; p) of a model, with its exact Jacobian.
 * Implementations write into caller-supplied arrays so that inner loops allocate nothing.
 */
public interface VectorField {
    int dimension();

    /** Writes f(t, u; p) into {@code dudt}. */
    void rates(double t, double[] u, double[] p, double[] dudt);

    /**
     * Writes df_i/du_j into {@code jacRowMajor[i * dimension() + j]}, every entry including zeros. Costs n² memory:
     * above {@link SparseJacobian#DENSE_LIMIT} analyses use {@link #sparseJacobian()} instead.
     */
    void jacobian(double t, double[] u, double[] p, double[] jacRowMajor);

    /** The Jacobian as a sparse matrix, or null when this field offers only the dense form. */
    default SparseJacobian sparseJacobian() {
        return null;
    }

    /**
     * True when analyses should work with {@link #sparseJacobian()} rather than the dense Jacobian: above
     * {@link SparseJacobian#DENSE_LIMIT} states, and for compiled models that have no dense Jacobian at all.
     */
    default boolean large() {
        return dimension() > SparseJacobian.DENSE_LIMIT;
    }
}
