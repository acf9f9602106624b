package org.phasewright.runtime.symmetry;

import java.util.List;
import java.util.Optional;

import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Symmetry;
import org.phasewright.runtime.model.VariableKind;
import org.phasewright.runtime.symbolic.References;

/**
 * A symmetry as a matrix: (g·u)_i = sum_j matrix[i][j] u_j, read off the declared images, which must be linear
 * forms of the states.
 */
public record LinearMap(String name, double[][] matrix, boolean reversesTime) {

    /** Why an image is not a linear form: the index of the offending state, or empty when the map is linear. */
    public static Optional<Integer> nonlinearImage(Symmetry symmetry, int states) {
        for (int i = 0; i < symmetry.images().size(); i++) {
            if (linearRow(symmetry.images().get(i), states) == null) {
                return Optional.of(i);
            }
        }
        return Optional.empty();
    }

    /** The matrix of a declared symmetry, or empty when some image is not linear. */
    public static Optional<LinearMap> of(Symmetry symmetry, int states) {
        double[][] m = new double[states][];
        for (int i = 0; i < states; i++) {
            m[i] = linearRow(symmetry.images().get(i), states);
            if (m[i] == null) {
                return Optional.empty();
            }
        }
        return Optional.of(new LinearMap(symmetry.name(), m, symmetry.reversesTime()));
    }

    private static double[] linearRow(Expr image, int states) {
        if (References.uses(image, VariableKind.TIME) || References.uses(image, VariableKind.PARAMETER)
                || References.uses(image, VariableKind.DERIVED)) {
            return null;
        }
        Optional<RationalForm> form = RationalForm.of(image, states);
        if (form.isEmpty() || !form.get().isLinearForm()) {
            return null;
        }
        double[] row = new double[states];
        for (int j = 0; j < states; j++) {
            row[j] = form.get().linearCoefficient(j);
        }
        return row;
    }

    public int dimension() {
        return matrix.length;
    }

    public double[] apply(double[] u) {
        double[] out = new double[u.length];
        for (int i = 0; i < out.length; i++) {
            for (int j = 0; j < u.length; j++) {
                out[i] += matrix[i][j] * u[j];
            }
        }
        return out;
    }

    /** True when the matrix is invertible: Gaussian elimination finds no negligible pivot. */
    public boolean invertible() {
        return Subspaces.rank(matrix) == matrix.length;
    }

    /** The images of the states, as expressions over the states. */
    List<Expr> images() {
        return PreparedField.linearImages(matrix);
    }

    /** The identity map, which every model has and nobody needs told about. */
    public boolean isIdentity() {
        for (int i = 0; i < matrix.length; i++) {
            for (int j = 0; j < matrix.length; j++) {
                if (matrix[i][j] != (i == j ? 1 : 0)) {
                    return false;
                }
            }
        }
        return !reversesTime;
    }
}
