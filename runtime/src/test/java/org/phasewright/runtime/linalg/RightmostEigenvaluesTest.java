package org.phasewright.runtime.linalg;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
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

    /** The advection–diffusion ring below with D = 1, c = 0.8 and growth r: converged, eigenvalues as found. */
    static RightmostEigenvalues.Result advectionDiffusion(double r) {
        int n = 300;
        int[] offsets = {-1, 0, 1};
        double d = 1, c = 0.8;
        double[] coefficients = {d + c / 2, -2 * d + r, d - c / 2};
        RightmostEigenvalues.Result result = RightmostEigenvalues.of(circulant(n, offsets, coefficients), 1e-12,
                () -> false);
        assertNotNull(result);
        assertTrue(result.converged());
        assertMatches(result, circulantEigenvalues(n, offsets, coefficients), 1e-8);
        return result;
    }

    @Test
    void advectionDiffusionRingWithGrowthHasSevenUnstableModes() {
        // x_i' = D (x_{i+1} - 2 x_i + x_{i-1}) - c (x_{i+1} - x_{i-1}) / 2 + r x_i on a ring of 300 cells:
        // λ_k = r - 2D (1 - cos θ_k) - i c sin θ_k, θ_k = 2πk/300; with D = 1, r = 0.005 the modes k = 0, ±1, ±2, ±3
        // grow (Re λ = 0.005, 0.00456, 0.00325, 0.00106) and k = ±4 decays (-0.00201). Non-normal once c ≠ 0.
        RightmostEigenvalues.Result result = advectionDiffusion(0.005);
        assertTrue(result.allUnstable());
        assertEquals(7, unstable(result, 1e-8));
        assertEquals(0.005, result.real()[0], 1e-10);
    }

    @Test
    void moreUnstableModesThanSoughtGiveALowerBound() {
        // The ring above with r = 0.05: modes |k| <= 10 grow (2(1 - cos θ_10) = 0.0437 < 0.05), 21 of them, more than
        // are sought, so the result must not claim to hold all unstable eigenvalues.
        RightmostEigenvalues.Result result = advectionDiffusion(0.05);
        assertFalse(result.allUnstable());
        assertTrue(result.real().length >= RightmostEigenvalues.WANTED);
        assertEquals(result.real().length, unstable(result, 1e-8));
    }

    @Test
    void dampedDiffusionRingIsStableWithItsSlowestModeFirst() {
        // x_i' = x_{i+1} - 2 x_i + x_{i-1} - 0.3 x_i: λ_k = -0.3 - 4 sin²(πk/n), all real, the slowest -0.3.
        int n = 500;
        int[] offsets = {-1, 0, 1};
        double[] coefficients = {1, -2.3, 1};
        RightmostEigenvalues.Result result = RightmostEigenvalues.of(circulant(n, offsets, coefficients), 1e-12,
                () -> false);
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
            RightmostEigenvalues.Result result = RightmostEigenvalues.of(a, 1e-12, () -> false);
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
    /** A tridiagonal matrix: {@code diagonal} on the diagonal, {@code off} beside it, nothing wraps. */
    static SparseMatrix tridiagonal(int n, double diagonal, double off) {
        SparseMatrix m = SparseLuTest.stencil(n, new int[] {-1, 0, 1}, false, new Random(1));
        for (int i = 0; i < n; i++) {
            for (int k = m.pattern().rowStart(i); k < m.pattern().rowEnd(i); k++) {
                m.values()[k] = m.pattern().column(k) == i ? diagonal : off;
            }
        }
        return m;
    }

    @Test
    void repeatedEigenvaluesOfUncoupledUnitsAreNotTakenForSingleOnes() {
        // 300 uncoupled units, 86 growing at rate 1 and 214 decaying at rate 1, in a scrambled order: the Krylov space
        // of one start vector is 2-dimensional, so without fresh directions only one +1 and one -1 would be found
        // (and the count "1 unstable direction" claimed). The exact spectrum is the diagonal (common practice: no
        // source needed).
        int n = 300;
        SparseMatrix d = SparseLuTest.stencil(n, new int[] {0}, false, new Random(1));
        Random random = new Random(7);
        int growing = 0;
        for (int i = 0; i < n; i++) {
            boolean up = growing < 86 && (random.nextDouble() < 0.3 || n - i <= 86 - growing);
            d.values()[i] = up ? 1 : -1;
            growing += up ? 1 : 0;
        }
        assertEquals(86, growing);
        RightmostEigenvalues.Result result = RightmostEigenvalues.of(d, 1e-12, () -> false);
        assertNotNull(result);
        assertFalse(result.allUnstable());
        assertTrue(result.real().length >= RightmostEigenvalues.WANTED);
        for (int k = 0; k < result.real().length; k++) {
            assertEquals(1.0, result.real()[k], 1e-9);
            assertEquals(0.0, result.imaginary()[k], 1e-9);
        }
    }

    @Test
    void aClusterOnTheAxisLargerThanTheListIsNotCountedAsComplete() {
        // 20 uncoupled modes with real parts in (-tol, 0) (zero to the tolerance) ahead of a damped pipe whose
        // eigenvalues are -0.3 - 4 sin²(kπ/(2(n+1))) (LeVeque 2007, Section 2.10): more centre directions than the
        // 12 eigenvalues sought, so the result must not claim to hold every eigenvalue of real part >= -tol.
        int n = 300;
        double tol = 1e-7;
        SparseMatrix m = tridiagonal(n, -2.3, 1);
        for (int i = 0; i < 20; i++) {
            for (int k = m.pattern().rowStart(i); k < m.pattern().rowEnd(i); k++) {
                m.values()[k] = m.pattern().column(k) == i ? -tol * (i + 1) / 21 : 0;
            }
        }
        for (int i = 20; i < 22; i++) { // cut the pipe off from the modes
            int slot = m.pattern().find(i, i - 1);
            if (slot >= 0) {
                m.values()[slot] = 0;
            }
        }
        RightmostEigenvalues.Result result = RightmostEigenvalues.of(m, tol, () -> false);
        assertNotNull(result);
        assertFalse(result.allUnstable());
    }

    @Test
    void longPipeListsItsSlowestModesInOrderWithoutGaps() {
        // du_i/dt = D (u_{i-1} - 2u_i + u_{i+1}), Dirichlet ends, n = 2000: λ_k = -4D sin²(kπ/(2(n+1))) spans six
        // orders of magnitude (LeVeque 2007, Section 2.10). The first pole (1.5 times the Gershgorin bound) packs
        // the slow modes within 1e-6 of μ = -1; a smaller pole separates them.
        int n = 2000;
        double d = 0.5;
        RightmostEigenvalues.Result result = RightmostEigenvalues.of(tridiagonal(n, -2 * d, d), 1e-7 * 4 * d,
                () -> false);
        assertNotNull(result);
        assertTrue(result.converged());
        assertTrue(result.allUnstable());
        assertTrue(result.real().length >= 6, "found " + result.real().length);
        for (int k = 1; k <= result.real().length; k++) {
            double s = Math.sin(k * Math.PI / (2 * (n + 1)));
            assertEquals(-4 * d * s * s, result.real()[k - 1], 1e-10, "eigenvalue " + k);
        }
    }

    @Test
    void stopsWhenAskedTo() {
        assertNull(RightmostEigenvalues.of(tridiagonal(2000, -1, 0.5), 1e-9, () -> true));
    }
}
