package org.phasewright.runtime.compile;

/**
 * The right-hand side du/dt = f(t, u; p) of a model, with its exact Jacobian.
 * Implementations write into caller-supplied arrays so that inner loops allocate nothing.
 */
public interface VectorField {
    int dimension();

    /** Writes f(t, u; p) into {@code dudt}. */
    void rates(double t, double[] u, double[] p, double[] dudt);

    /** Writes df_i/du_j into {@code jacRowMajor[i * dimension() + j]}, every entry including zeros. */
    void jacobian(double t, double[] u, double[] p, double[] jacRowMajor);
}
