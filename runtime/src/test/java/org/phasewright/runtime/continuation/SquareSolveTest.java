package org.phasewright.runtime.continuation;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Random;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.junit.jupiter.api.Test;

/**
 * The bordered solves of the continuation against Commons Math's LUDecomposition (a general-purpose library), on
 * matrices that swap rows after the first column (an earlier solve went wrong exactly there).
 */
class SquareSolveTest {

    @Test
    void solvesAndDeterminantsAgreeWithCommonsMathWhenRowsSwapLate() {
        Random random = new Random(3);
        for (int trial = 0; trial < 200; trial++) {
            int n = 3 + trial % 5;
            double[][] rows = new double[n][n];
            double[] flat = new double[n * n];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    rows[i][j] = random.nextGaussian();
                    flat[i * n + j] = rows[i][j];
                }
            }
            rows[0][0] = flat[0] = 10; // column 0 keeps its row, so every swap happens in a later column
            LUDecomposition reference = new LUDecomposition(new Array2DRowRealMatrix(rows));
            double[] b = random.doubles(n, -1, 1).toArray();
            double[] expected = reference.getSolver().solve(new ArrayRealVector(b)).toArray();
            SquareSolve lu = new SquareSolve(flat, n);
            lu.solve(b);
            for (int i = 0; i < n; i++) {
                assertEquals(expected[i], b[i], 1e-9 * Math.max(1, Math.abs(expected[i])), "trial " + trial);
            }
            assertEquals(reference.getDeterminant(), lu.determinant(),
                    1e-10 * Math.max(1, Math.abs(reference.getDeterminant())));
        }
    }
}
