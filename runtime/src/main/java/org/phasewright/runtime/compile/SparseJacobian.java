package org.phasewright.runtime.compile;

import org.phasewright.runtime.linalg.SparseMatrix;
import org.phasewright.runtime.linalg.SparsePattern;

/**
 * The Jacobian df_i/du_j of a vector field as a sparse matrix: a fixed pattern (from the model's structure) and
 * values written in place. Analyses use it instead of the dense {@link VectorField#jacobian} when the dimension
 * exceeds {@link #DENSE_LIMIT}, where n² entries would cost too much memory and time.
 */
public interface SparseJacobian {
    /** Above this dimension analyses must not ask for the dense Jacobian. */
    int DENSE_LIMIT = 200;

    SparsePattern pattern();

    /** Writes the Jacobian at (t, u) into {@code values}, one entry per slot of {@link #pattern()}. */
    void values(double t, double[] u, double[] p, double[] values);

    /** How the values are computed, for notes: "generated code" or "finite differences (k groups)". */
    String method();

    /** A matrix with this pattern and zero values, to be filled by {@link #values}. */
    default SparseMatrix newMatrix() {
        return new SparseMatrix(pattern());
    }
}
