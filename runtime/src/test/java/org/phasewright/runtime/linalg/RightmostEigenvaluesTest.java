package org.phasewright.runtime.linalg;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.junit.jupiter.api.Test;

class RightmostEigenvaluesTest {

    /** A cyclic stencil: row i holds {@code coefficients[k]} at column i + offsets[k] (wrapped). */
    static SparseMatrix circulant(int n, int[] offsets, double[] coefficients) {
        SparseMatrix pattern = SparseLuTest.stencil(n, offsets, true, new Random(1));
        SparseMatrix m = new SparseMatrix(pattern.pattern());
        for (int i = 0; i < n; i++) {
            for (int k = 0; k < offsets.length; k++) {
                int slot = m.pattern().find(i, Math.floorMod(i + offsets[k], n));
                m.values()[slot] += coefficients[k];
            }
        }
        return m;
    }

    /**
     * Eigenvalues of a circulant matrix are the discrete Fourier transform of its first row, λ_k = Σ c_j ω^{j·k}
     * with ω = exp(2πi/n) (Gray, "Toeplitz and Circulant Matrices: A Review", Found. Trends Commun. Inf. Theory 2,
     * 2006, Section 3.1).
     */
    static List<double[]> circulantEigenvalues(int n, int[] offsets, double[] coefficients) {
        List<double[]> out = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            double re = 0, im = 0;
            for (int j = 0; j < offsets.length; j++) {
                double angle = 2 * Math.PI * offsets[j] * k / n;
                re += coefficients[j] * Math.cos(angle);
                im += coefficients[j] * Math.sin(angle);
            }
            out.add(new double[] {re, im});
        }
        out.sort(Comparator.<double[]>comparingDouble(l -> -l[0]));
        return out;
    }

    /**
     * Every eigenvalue found is one of the expected (to tol), and each expected unstable one was found when the result
     * says it holds them all.
     */
    static void assertMatches(RightmostEigenvalues.Result r, List<double[]> expected, double tol) {
        for (int k = 0; k < r.real().length; k++) {
            double re = r.real()[k], im = r.imaginary()[k];
            double nearest = expected.stream().mapToDouble(l -> Math.hypot(l[0] - re, l[1] - im)).min()
                    .orElseThrow();
            assertTrue(nearest < tol, "eigenvalue " + re + " + " + im + "i is off by " + nearest);
        }
        for (double[] l : expected) {
            if (r.allUnstable() && l[0] > tol) {
                boolean found = false;
                for (int k = 0; k < r.real().length; k++) {
                    found |= Math.hypot(r.real()[k] - l[0], r.imaginary()[k] - l[1]) < tol;
                }
                assertTrue(found, "unstable eigenvalue " + l[0] + " + " + l[1] + "i not found");
            }
        }
    }

    static long unstable(RightmostEigenvalues.Result r, double tol) {
        return java.util.Arrays.stream(r.real()).filter(re -> re > tol).count();
    }

    @Test
    void advectionDiffusionRingWithGrowthHasSevenUnstableModes() {
        // x_i' = D (x_{i+1} - 2 x_i + x_{i-1}) - c (x_{i+1} - x_{i-1}) / 2 + r x_i on a ring of 300 cells:
        // λ_k = r - 2D (1 - cos θ_k) - i c sin θ_k, θ_k = 2πk/300; with D = 1, r = 0.005 the modes k = 0, ±1, ±2, ±3
        // grow (Re λ = 0.005, 0.00456, 0.00325, 0.00106) and k = ±4 decays (-0.00201). Non-normal once c ≠ 0.
        int n = 300;
        int[] offsets = {-1, 0, 1};
        double d = 1, c = 0.8, r = 0.005;
        double[] coefficients = {d + c / 2, -2 * d + r, d - c / 2};
        RightmostEigenvalues.Result result = RightmostEigenvalues.of(circulant(n, offsets, coefficients));
        assertNotNull(result);
        assertTrue(result.converged());
        assertTrue(result.allUnstable());
        assertMatches(result, circulantEigenvalues(n, offsets, coefficients), 1e-8);
        assertEquals(7, unstable(result, 1e-8));
        assertEquals(0.005, result.real()[0], 1e-10);
    }

    @Test
    void moreUnstableModesThanSoughtGiveALowerBound() {
        // The ring above with r = 0.05: modes |k| <= 10 grow (2(1 - cos θ_10) = 0.0437 < 0.05), 21 of them, more than
        // are sought, so the result must not claim to hold all unstable eigenvalues.
        int n = 300;
        int[] offsets = {-1, 0, 1};
        double d = 1, c = 0.8, r = 0.05;
        double[] coefficients = {d + c / 2, -2 * d + r, d - c / 2};
        RightmostEigenvalues.Result result = RightmostEigenvalues.of(circulant(n, offsets, coefficients));
        assertNotNull(result);
        assertTrue(result.converged());
        assertFalse(result.allUnstable());
        assertTrue(result.real().length >= RightmostEigenvalues.WANTED);
        assertMatches(result, circulantEigenvalues(n, offsets, coefficients), 1e-8);
        assertEquals(result.real().length, unstable(result, 1e-8));
    }

    @Test
    void dampedDiffusionRingIsStableWithItsSlowestModeFirst() {
        // x_i' = x_{i+1} - 2 x_i + x_{i-1} - 0.3 x_i: λ_k = -0.3 - 4 sin²(πk/n), all real, the slowest -0.3.
        int n = 500;
        int[] offsets = {-1, 0, 1};
        double[] coefficients = {1, -2.3, 1};
        RightmostEigenvalues.Result result = RightmostEigenvalues.of(circulant(n, offsets, coefficients));
        assertNotNull(result);
        assertTrue(result.converged());
        assertTrue(result.allUnstable());
        assertEquals(0, unstable(result, 1e-8));
        assertEquals(-0.3, result.real()[0], 1e-9);
        assertMatches(result, circulantEigenvalues(n, offsets, coefficients), 1e-8);
    }

    @Test
    void agreesWithTheDenseEigenSolverOnRandomBandedMatrices() {
        // Reference: commons-math's EigenDecomposition (Hessenberg QR) of the same matrix, dense.
        int complete = 0;
        for (int seed = 1; seed <= 4; seed++) {
            Random random = new Random(seed);
            int n = 250;
            SparseMatrix a = SparseLuTest.stencil(n, new int[] {-3, -1, 0, 2, 5}, false, random);
            for (int i = 0; i < n; i++) { // shift so that only a few eigenvalues lie right of the axis
                a.values()[a.pattern().find(i, i)] -= 1.5;
            }
            double[][] dense = new double[n][n];
            for (int i = 0; i < n; i++) {
                for (int k = a.pattern().rowStart(i); k < a.pattern().rowEnd(i); k++) {
                    dense[i][a.pattern().column(k)] = a.values()[k];
                }
            }
            EigenDecomposition d = new EigenDecomposition(new Array2DRowRealMatrix(dense, false));
            List<double[]> expected = new ArrayList<>();
            for (int k = 0; k < n; k++) {
                expected.add(new double[] {d.getRealEigenvalues()[k], d.getImagEigenvalues()[k]});
            }
            RightmostEigenvalues.Result result = RightmostEigenvalues.of(a);
            assertNotNull(result);
            long expectedUnstable = expected.stream().filter(l -> l[0] > 1e-8).count();
            assertTrue(result.converged(), "seed " + seed);
            if (result.allUnstable()) {
                complete++;
                assertEquals(expectedUnstable, unstable(result, 1e-8), "seed " + seed);
            }
            assertMatches(result, expected, 1e-7);
        }
        assertTrue(complete >= 2, "exact unstable counts checked on " + complete + " of 4 matrices");
    }
}
