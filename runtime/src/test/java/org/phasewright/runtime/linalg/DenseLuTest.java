package org.phasewright.runtime.linalg;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.util.Random;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.LUDecomposition;
import org.junit.jupiter.api.Test;

/** Determinant and solve of the dense LU against Commons Math's LUDecomposition (a general-purpose library). */
class DenseLuTest {

    @Test
    void determinantAndSolutionAgreeWithCommonsMath() {
        Random random = new Random(11);
        for (int n = 1; n <= 7; n++) {
            double[][] rows = new double[n][n];
            double[] flat = new double[n * n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    rows[i][j] = random.nextGaussian();
                    flat[i * n + j] = rows[i][j];
                }
            }
            LUDecomposition reference = new LUDecomposition(new Array2DRowRealMatrix(rows));
            DenseLu lu = new DenseLu(n);
            lu.factor(flat);
            assertEquals(reference.getDeterminant(), lu.determinant(), 1e-12 * Math.max(1, Math.abs(
                    reference.getDeterminant())));
            double[] b = random.doubles(n).toArray();
            double[] expected = reference.getSolver().solve(new org.apache.commons.math3.linear.ArrayRealVector(b))
                    .toArray();
            lu.solve(b);
            for (int i = 0; i < n; i++) {
                assertEquals(expected[i], b[i], 1e-10);
            }
        }
    }

    @Test
    void aSingularMatrixHasDeterminantZero() {
        DenseLu lu = new DenseLu(2);
        lu.factor(new double[] {1, 2, 2, 4}); // rows proportional (closed form: det = 0)
        assertFalse(lu.factor(new double[] {1, 2, 2, 4}));
        assertEquals(0.0, lu.determinant());
    }
}
