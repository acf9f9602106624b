package org.phasewright.runtime.linalg;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;

class BlockCirculantSpectrumTest {

    /** Both lists sorted the same way and compared pairwise. */
    static void assertSameSpectrum(List<double[]> expected, double[][] actual, double tol) {
        assertEquals(expected.size(), actual[0].length);
        List<double[]> got = new ArrayList<>();
        for (int k = 0; k < actual[0].length; k++) {
            got.add(new double[] {actual[0][k], actual[1][k]});
        }
        Comparator<double[]> order = Comparator.<double[]>comparingDouble(l -> Math.round(l[0] / tol))
                .thenComparingDouble(l -> l[1]);
        expected.sort(order);
        got.sort(order);
        for (int k = 0; k < got.size(); k++) {
            assertEquals(expected.get(k)[0], got.get(k)[0], tol, "re of eigenvalue " + k);
            assertEquals(expected.get(k)[1], got.get(k)[1], tol, "im of eigenvalue " + k);
        }
    }

    @Test
    void forcedRingAtItsUniformStateMatchesTheCirculantClosedForm() {
        // Lorenz (1996) ring at x_i = F = 8: circulant with -F at i-2, -1 at i, F at i+1 (x_{i+1} - x_{i-2} = 0 at
        // i-1); eigenvalues from the DFT of the first row (Gray 2006, Section 3.1).
        int n = 20000;
        int[] offsets = {-2, -1, 0, 1};
        double[] coefficients = {-8, 0, -1, 8};
        SparseMatrix j = RightmostEigenvaluesTest.circulant(n, offsets, coefficients);
        double[][] spectrum = BlockCirculantSpectrum.of(j, 1e-12, () -> false);
        assertNotNull(spectrum);
        assertSameSpectrum(RightmostEigenvaluesTest.circulantEigenvalues(n, offsets, coefficients), spectrum, 1e-9);
    }

    @Test
    void brusselatorRingMatchesTheTwoByTwoTuringBlocks() {
        brusselatorRing(301); // odd: no wavenumber N/2
        brusselatorRing(300); // even: the real block at k = N/2
    }

    private static void brusselatorRing(int cells) {
        // The Brusselator (Prigogine & Lefever, J. Chem. Phys. 48, 1968) u' = A - (B+1) u + u² v, v' = B u - u² v
        // with diffusion Du, Dv between neighbours of a ring, at its uniform state u = A, v = B/A. Mode θ has the
        // 2×2 matrix [[B-1 - 2Du(1-cos θ), A²], [-B, -A² - 2Dv(1-cos θ)]] (the standard Turing analysis, e.g.
        // Murray, Mathematical Biology II, 3rd ed., 2003, Section 2.3); its eigenvalues by the quadratic formula.
        double a = 2, b = 4.2, du = 0.4, dv = 3;
        int n = 2 * cells;
        int[] start = new int[n + 1];
        List<Integer> cols = new ArrayList<>();
        List<Double> vals = new ArrayList<>();
        for (int row = 0; row < n; row++) {
            int f = row / cells, i = row % cells;
            java.util.TreeMap<Integer, Double> entries = new java.util.TreeMap<>();
            double d = f == 0 ? du : dv;
            entries.merge(f * cells + Math.floorMod(i - 1, cells), d, Double::sum);
            entries.merge(f * cells + Math.floorMod(i + 1, cells), d, Double::sum);
            entries.merge(f * cells + i, -2 * d + (f == 0 ? b - 1 : -a * a), Double::sum);
            entries.merge((1 - f) * cells + i, f == 0 ? a * a : -b, Double::sum);
            start[row] = cols.size();
            entries.forEach((c, v) -> {
                cols.add(c);
                vals.add(v);
            });
        }
        start[n] = cols.size();
        SparseMatrix j = new SparseMatrix(new SparsePattern(n, start, cols.stream().mapToInt(x -> x).toArray()),
                vals.stream().mapToDouble(x -> x).toArray());
        List<double[]> expected = new ArrayList<>();
        for (int k = 0; k < cells; k++) {
            double c = 2 * (1 - Math.cos(2 * Math.PI * k / cells));
            double p = b - 1 - du * c, q = a * a, r = -b, s = -a * a - dv * c;
            double trace = p + s, det = p * s - q * r, disc = trace * trace / 4 - det;
            if (disc >= 0) {
                expected.add(new double[] {trace / 2 + Math.sqrt(disc), 0});
                expected.add(new double[] {trace / 2 - Math.sqrt(disc), 0});
            } else {
                expected.add(new double[] {trace / 2, Math.sqrt(-disc)});
                expected.add(new double[] {trace / 2, -Math.sqrt(-disc)});
            }
        }
        double[][] spectrum = BlockCirculantSpectrum.of(j, 1e-12, () -> false);
        assertNotNull(spectrum);
        assertSameSpectrum(expected, spectrum, 1e-9);
    }

    @Test
    void aMatrixThatIsNotShiftInvariantIsLeftToTheCaller() {
        assertNull(BlockCirculantSpectrum.of(SparseLuTest.stencil(300, new int[] {-1, 0, 1}, true, new Random(3)),
                1e-12, () -> false));
        SparseMatrix ring = RightmostEigenvaluesTest.circulant(300, new int[] {-1, 0, 1}, new double[] {1, -2, 1});
        ring.values()[ring.pattern().find(150, 151)] += 1e-6; // one cell differs: no longer circulant
        assertNull(BlockCirculantSpectrum.of(ring, 1e-9, () -> false));
        assertNotNull(BlockCirculantSpectrum.of(ring, 1e-5, () -> false)); // within the tolerance it still counts
        // a coupling that one cell lacks altogether (a structural zero, not a small value)
        SparseMatrix gap = RightmostEigenvaluesTest.circulant(300, new int[] {-1, 0, 1}, new double[] {1, -2, 1});
        gap.values()[gap.pattern().find(40, 41)] = 0;
        assertNull(BlockCirculantSpectrum.of(gap, 1e-9, () -> false));
    }
}
