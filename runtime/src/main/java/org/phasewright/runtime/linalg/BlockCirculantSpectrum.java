package org.phasewright.runtime.linalg;

import java.util.Arrays;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;

/**
 * All eigenvalues of a matrix that commutes with the cyclic shift of a lattice: N cells of m components (flat index
 * f·N + i), every cell coupled to the cells i + c exactly as cell 0 is. That is the Jacobian of a ring model at an
 * equilibrium that is the same in every cell. Such a matrix is block circulant. The discrete Fourier transform over
 * the cells splits it into N blocks B_k = Σ_c J_c e^{2πi·ck/N} of size m×m (Davis, "Circulant Matrices", 1979,
 * Section 5.6; Gray, Found. Trends Commun. Inf. Theory 2, 2006, Section 3.1). Its n eigenvalues then cost N small
 * eigen-problems instead of one of size n, and clustered spectra (where Krylov methods stall) are no obstacle.
 * <p>
 * The matrix is recognised from its entries alone: every row must match its cell-0 row, shifted, to a tolerance.
 */
public final class BlockCirculantSpectrum {
    /** Components per cell tried, smallest first. */
    static final int MAX_COMPONENTS = 8;

    private BlockCirculantSpectrum() {
    }

    /**
     * {re, im} of all eigenvalues of j, or null when j is not block circulant for any m up to
     * {@link #MAX_COMPONENTS} with at least 3 cells (or a block's eigen-solver fails, or {@code stop} fires).
     * Entries of different cells count as equal within {@code tolerance} (absolute).
     */
    public static double[][] of(SparseMatrix j, double tolerance, java.util.function.BooleanSupplier stop) {
        if (!j.allFinite()) {
            return null;
        }
        int n = j.dimension();
        for (int m = 1; m <= Math.min(MAX_COMPONENTS, n / 3); m++) {
            if (n % m == 0) {
                Couplings couplings = couplings(j, m, tolerance);
                if (couplings != null) {
                    return spectrum(couplings, m, n / m, stop);
                }
            }
        }
        return null;
    }

    /** Cell 0's entries: from component f to component g of the cell c ahead (0 ≤ c &lt; N). */
    private record Couplings(int[] from, int[] to, long[] ahead, double[] value) {
    }

    /** Cell 0's couplings when every row of j is its cell-0 row shifted; else null. */
    private static Couplings couplings(SparseMatrix j, int m, double tolerance) {
        int n = j.dimension(), cells = n / m;
        SparsePattern p = j.pattern();
        double[] values = j.values();
        // row f·N (cell 0 of component f): its entries keyed by g·N + c, sorted
        long[][] keys = new long[m][];
        double[][] expected = new double[m][];
        int[] significant = new int[m];
        int total = 0;
        for (int f = 0; f < m; f++) {
            int row = f * cells, start = p.rowStart(row), count = p.rowEnd(row) - start;
            long[] k = new long[count];
            double[] v = new double[count];
            Integer[] order = new Integer[count];
            for (int s = 0; s < count; s++) {
                order[s] = s;
            }
            long[] raw = new long[count];
            for (int s = 0; s < count; s++) {
                raw[s] = key(p.column(start + s), 0, cells);
            }
            Arrays.sort(order, (a, b) -> Long.compare(raw[a], raw[b]));
            for (int s = 0; s < count; s++) {
                k[s] = raw[order[s]];
                v[s] = values[start + order[s]];
                significant[f] += Math.abs(v[s]) > tolerance ? 1 : 0;
            }
            keys[f] = k;
            expected[f] = v;
            total += count;
        }
        for (int f = 0; f < m; f++) {
            for (int i = 1; i < cells; i++) {
                int row = f * cells + i, matched = 0;
                for (int s = p.rowStart(row); s < p.rowEnd(row); s++) {
                    int at = Arrays.binarySearch(keys[f], key(p.column(s), i, cells));
                    double want = at >= 0 ? expected[f][at] : 0;
                    if (!(Math.abs(values[s] - want) <= tolerance)) {
                        return null;
                    }
                    matched += at >= 0 && Math.abs(want) > tolerance ? 1 : 0;
                }
                if (matched != significant[f]) { // some coupling of cell 0 has no counterpart here
                    return null;
                }
            }
        }
        int[] from = new int[total], to = new int[total];
        long[] ahead = new long[total];
        double[] value = new double[total];
        int e = 0;
        for (int f = 0; f < m; f++) {
            for (int s = 0; s < keys[f].length; s++) {
                from[e] = f;
                to[e] = (int) (keys[f][s] / cells);
                ahead[e] = keys[f][s] % cells;
                value[e++] = expected[f][s];
            }
        }
        return new Couplings(from, to, ahead, value);
    }

    /** Column → g·N + c, where c is how far the column's cell lies ahead of {@code cell}, wrapped to [0, N). */
    private static long key(int column, int cell, int cells) {
        int g = column / cells;
        int c = Math.floorMod(column % cells - cell, cells);
        return (long) g * cells + c;
    }

    private static double[][] spectrum(Couplings k, int m, int cells, java.util.function.BooleanSupplier stop) {
        double[] re = new double[m * cells], im = new double[m * cells];
        int next = 0;
        for (int wave = 0; wave <= cells / 2; wave++) {
            if (m > 1 && wave % 1024 == 0 && stop.getAsBoolean()) {
                return null;
            }
            double[][] bRe = new double[m][m], bIm = new double[m][m];
            for (int e = 0; e < k.value.length; e++) {
                // the angle 2π·c·k/N reduced exactly first, so large rings keep full accuracy
                double angle = 2 * Math.PI * Math.floorMod(k.ahead[e] * wave, (long) cells) / cells;
                bRe[k.from[e]][k.to[e]] += k.value[e] * Math.cos(angle);
                bIm[k.from[e]][k.to[e]] += k.value[e] * Math.sin(angle);
            }
            boolean real = wave == 0 || 2 * wave == cells; // B_k is real; otherwise it also stands for B_{N-k}
            if (m == 1) {
                re[next] = bRe[0][0];
                im[next++] = real ? 0 : bIm[0][0];
                if (!real) {
                    re[next] = bRe[0][0];
                    im[next++] = -bIm[0][0];
                }
                continue;
            }
            double[][] a;
            if (real) {
                a = bRe;
            } else { // [[Re, -Im], [Im, Re]] has the eigenvalues of B_k and of its conjugate B_{N-k}
                a = new double[2 * m][2 * m];
                for (int r = 0; r < m; r++) {
                    for (int c = 0; c < m; c++) {
                        a[r][c] = bRe[r][c];
                        a[r][c + m] = -bIm[r][c];
                        a[r + m][c] = bIm[r][c];
                        a[r + m][c + m] = bRe[r][c];
                    }
                }
            }
            double[] r, i;
            if (Arrays.stream(a).allMatch(row -> Arrays.stream(row).allMatch(x -> x == 0))) {
                r = new double[a.length]; // commons-math refuses the zero matrix
                i = new double[a.length];
            } else {
                try {
                    EigenDecomposition d = new EigenDecomposition(new Array2DRowRealMatrix(a, false));
                    r = d.getRealEigenvalues();
                    i = d.getImagEigenvalues();
                } catch (RuntimeException e) { // the QR iteration did not converge: leave it to the caller's fallback
                    return null;
                }
            }
            System.arraycopy(r, 0, re, next, r.length);
            System.arraycopy(i, 0, im, next, i.length);
            next += r.length;
        }
        return new double[][] {re, im};
    }
}
