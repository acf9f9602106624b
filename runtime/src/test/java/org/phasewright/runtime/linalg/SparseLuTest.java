package org.phasewright.runtime.linalg;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import java.util.TreeSet;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.junit.jupiter.api.Test;

class SparseLuTest {

    /** A matrix with the given entries per row (column offsets, wrapped when cyclic, dropped when outside). */
    static SparseMatrix stencil(int n, int[] offsets, boolean cyclic, Random random) {
        int[] start = new int[n + 1];
        int[] cols = new int[n * offsets.length];
        int nnz = 0;
        for (int i = 0; i < n; i++) {
            TreeSet<Integer> row = new TreeSet<>();
            for (int o : offsets) {
                int j = i + o;
                if (cyclic) {
                    row.add(Math.floorMod(j, n));
                } else if (j >= 0 && j < n) {
                    row.add(j);
                }
            }
            start[i] = nnz;
            for (int j : row) {
                cols[nnz++] = j;
            }
        }
        start[n] = nnz;
        SparseMatrix a = new SparseMatrix(new SparsePattern(n, start, java.util.Arrays.copyOf(cols, nnz)));
        for (int k = 0; k < nnz; k++) {
            a.values()[k] = random.nextDouble() * 2 - 1;
        }
        return a;
    }

    static SparseMatrix randomSparse(int n, double density, Random random) {
        int[] start = new int[n + 1];
        int[] cols = new int[n * n];
        int nnz = 0;
        for (int i = 0; i < n; i++) {
            start[i] = nnz;
            for (int j = 0; j < n; j++) {
                if (random.nextDouble() < density) {
                    cols[nnz++] = j;
                }
            }
        }
        start[n] = nnz;
        SparseMatrix a = new SparseMatrix(new SparsePattern(n, start, java.util.Arrays.copyOf(cols, nnz)));
        for (int k = 0; k < nnz; k++) {
            a.values()[k] = random.nextGaussian();
        }
        return a;
    }

    static double[][] dense(SparseMatrix a) {
        int n = a.dimension();
        double[][] d = new double[n][n];
        for (int i = 0; i < n; i++) {
            for (int k = a.pattern().rowStart(i); k < a.pattern().rowEnd(i); k++) {
                d[i][a.pattern().column(k)] = a.values()[k];
            }
        }
        return d;
    }

    /** Solves with the sparse LU and compares with Commons Math's dense LUDecomposition (partial pivoting). */
    private static void agreesWithCommonsMath(SparseMatrix a, Random random) {
        int n = a.dimension();
        double[] b = random.doubles(n, -1, 1).toArray();
        SparseLu lu = new SparseLu(a.pattern());
        assertTrue(lu.factor(a));
        double[] x = b.clone();
        lu.solve(x);
        LUDecomposition reference = new LUDecomposition(new Array2DRowRealMatrix(dense(a)));
        double[] expected = reference.getSolver().solve(new ArrayRealVector(b)).toArray();
        assertEquals((int) Math.signum(reference.getDeterminant()), lu.determinantSign(), "sign of det A");
        double scale = 0;
        for (double v : expected) {
            scale = Math.max(scale, Math.abs(v));
        }
        for (int i = 0; i < n; i++) {
            // both are backward stable; the solutions agree to roughly cond(A)·eps (common practice)
            assertEquals(expected[i], x[i], 1e-8 * scale, "entry " + i);
        }
        // and the residual of our own solution is at rounding level
        double[] ax = new double[n];
        a.multiply(x, ax);
        for (int i = 0; i < n; i++) {
            assertEquals(b[i], ax[i], 1e-9 * (1 + scale));
        }
    }

    @Test
    void randomSparseMatricesAgreeWithCommonsMath() {
        Random random = new Random(11);
        for (int trial = 0; trial < 20; trial++) {
            int n = 5 + random.nextInt(60);
            SparseMatrix a = randomSparse(n, 0.15, random);
            for (int i = 0; i < n; i++) { // keep it comfortably non-singular: a strong but not dominant diagonal
                if (a.pattern().find(i, i) < 0) {
                    continue;
                }
                a.values()[a.pattern().find(i, i)] += 3 * Math.signum(random.nextGaussian());
            }
            if (new LUDecomposition(new Array2DRowRealMatrix(dense(a))).getSolver().isNonSingular()) {
                agreesWithCommonsMath(a, random);
            }
        }
    }

    @Test
    void bandedAndRingMatricesAgreeWithCommonsMath() {
        Random random = new Random(3);
        // Lorenz-96-like stencil (offsets -2..1) plus the diagonal, bounded and cyclic
        agreesWithCommonsMath(stencil(97, new int[] {-2, -1, 0, 1}, false, random), random);
        agreesWithCommonsMath(stencil(97, new int[] {-2, -1, 0, 1}, true, random), random);
        agreesWithCommonsMath(stencil(150, new int[] {-5, 0, 3, 7}, true, random), random);
    }

    @Test
    void pivotsWhenTheDiagonalIsZero() {
        // the 2-cycle permutation matrix [[0, 1], [1, 0]] needs row exchanges (closed form: its own inverse)
        SparsePattern p = new SparsePattern(2, new int[] {0, 1, 2}, new int[] {1, 0});
        SparseMatrix a = new SparseMatrix(p, new double[] {1, 1});
        SparseLu lu = new SparseLu(p);
        assertTrue(lu.factor(a));
        double[] b = {3, 5};
        lu.solve(b);
        assertArrayEquals(new double[] {5, 3}, b, 0);
    }

    @Test
    void agreesWithDenseLuOnADenseMatrix() {
        Random random = new Random(8);
        int n = 12;
        SparseMatrix a = new SparseMatrix(SparsePattern.dense(n));
        for (int k = 0; k < n * n; k++) {
            a.values()[k] = random.nextGaussian();
        }
        DenseLu dense = new DenseLu(n);
        assertTrue(dense.factor(a.values()));
        SparseLu sparse = new SparseLu(a.pattern());
        assertTrue(sparse.factor(a));
        double[] b1 = random.doubles(n).toArray();
        double[] b2 = b1.clone();
        dense.solve(b1);
        sparse.solve(b2);
        assertArrayEquals(b1, b2, 1e-9);
    }

    @Test
    void detectsSingularMatrices() {
        Random random = new Random(4);
        // a ring stencil with two equal rows is singular (closed form: rank deficient)
        SparseMatrix a = stencil(30, new int[] {-1, 0, 1}, true, random);
        SparsePattern p = a.pattern();
        for (int k = p.rowStart(5); k < p.rowEnd(5); k++) {
            a.values()[k] = 1;
        }
        for (int k = p.rowStart(6); k < p.rowEnd(6); k++) {
            a.values()[k] = 0;
        }
        // row 6 becomes a multiple of row 5 only where their columns agree; zero it instead: exactly singular
        assertFalse(new SparseLu(p).factor(a));
        SparseMatrix b = stencil(30, new int[] {-1, 0, 1}, true, random);
        b.values()[0] = Double.NaN;
        assertFalse(new SparseLu(b.pattern()).factor(b));
        // the discrete Laplacian of a ring, all rows summing to zero, is singular (closed form: constant kernel)
        SparseMatrix lap = stencil(40, new int[] {-1, 0, 1}, true, random);
        for (int i = 0; i < 40; i++) {
            for (int k = lap.pattern().rowStart(i); k < lap.pattern().rowEnd(i); k++) {
                lap.values()[k] = lap.pattern().column(k) == i ? -2 : 1;
            }
        }
        assertFalse(new SparseLu(lap.pattern()).factor(lap));
    }

    @Test
    void refactoringWithNewValuesReusesThePattern() {
        Random random = new Random(5);
        SparseMatrix a = stencil(200, new int[] {-2, -1, 0, 1}, true, random);
        SparseLu lu = new SparseLu(a.pattern());
        for (int round = 0; round < 3; round++) {
            for (int k = 0; k < a.values().length; k++) {
                a.values()[k] = random.nextGaussian();
            }
            agreesAfterFactor(a, lu, random);
        }
    }

    private static void agreesAfterFactor(SparseMatrix a, SparseLu lu, Random random) {
        assertTrue(lu.factor(a));
        if (a.dimension() <= 500) { // the sign of det A, also after a refactorisation (commons-math reference)
            assertEquals((int) Math.signum(new LUDecomposition(new Array2DRowRealMatrix(dense(a)))
                    .getDeterminant()), lu.determinantSign());
        }
        double[] x = random.doubles(a.dimension()).toArray();
        double[] b = new double[x.length];
        a.multiply(x, b);
        lu.solve(b);
        // b = A x solved back gives x (closed form), up to cond(A)·eps
        assertArrayEquals(x, b, 1e-7);
    }

    @Test
    void aGivenColumnOrderSolvesAndSignsLikeTheDefault() {
        // a bordered matrix (band plus a dense last row and column) factored with the border last, the order the
        // continuation uses: solution and determinant sign against commons-math (common practice: no source)
        Random random = new Random(9);
        int n = 120;
        for (int trial = 0; trial < 10; trial++) {
            int[] start = new int[n + 1];
            int[] cols = new int[4 * n + 2 * n];
            int nnz = 0;
            for (int i = 0; i < n - 1; i++) { // a band, and the last column
                start[i] = nnz;
                for (int j = Math.max(0, i - 1); j <= Math.min(n - 2, i + 1); j++) {
                    cols[nnz++] = j;
                }
                cols[nnz++] = n - 1;
            }
            start[n - 1] = nnz; // the last row: every column
            for (int j = 0; j < n; j++) {
                cols[nnz++] = j;
            }
            start[n] = nnz;
            SparseMatrix a = new SparseMatrix(new SparsePattern(n, start, java.util.Arrays.copyOf(cols, nnz)));
            for (int k = 0; k < nnz; k++) {
                a.values()[k] = random.nextGaussian();
            }
            int[] order = new int[n];
            for (int k = 0; k < n; k++) {
                order[k] = k;
            }
            SparseLu lu = new SparseLu(a.pattern(), order);
            assertTrue(lu.factor(a));
            LUDecomposition reference = new LUDecomposition(new Array2DRowRealMatrix(dense(a)));
            assertEquals((int) Math.signum(reference.getDeterminant()), lu.determinantSign(), "trial " + trial);
            double[] x = random.doubles(n).toArray();
            double[] b = new double[n];
            a.multiply(x, b);
            lu.solve(b);
            assertArrayEquals(x, b, 1e-7);
        }
    }

    @Test
    void reverseCuthillMcKeeNarrowsAShuffledBand() {
        // a tridiagonal matrix with its indices shuffled has bandwidth ~n; RCM restores bandwidth 1 (George & Liu
        // 1981, the method's defining property on a path graph)
        int n = 300;
        Random random = new Random(6);
        int[] shuffle = new int[n];
        for (int i = 0; i < n; i++) {
            shuffle[i] = i;
        }
        for (int i = n - 1; i > 0; i--) {
            int j = random.nextInt(i + 1);
            int t = shuffle[i];
            shuffle[i] = shuffle[j];
            shuffle[j] = t;
        }
        int[] start = new int[n + 1];
        int[] cols = new int[3 * n];
        int nnz = 0;
        int[] inverse = new int[n];
        for (int i = 0; i < n; i++) {
            inverse[shuffle[i]] = i;
        }
        for (int r = 0; r < n; r++) {
            int i = inverse[r]; // row r is path vertex i
            TreeSet<Integer> row = new TreeSet<>();
            for (int o = -1; o <= 1; o++) {
                if (i + o >= 0 && i + o < n) {
                    row.add(shuffle[i + o]);
                }
            }
            start[r] = nnz;
            for (int c : row) {
                cols[nnz++] = c;
            }
        }
        start[n] = nnz;
        int[] perm = SparseOrdering.reverseCuthillMcKee(new SparsePattern(n, start, java.util.Arrays.copyOf(cols,
                nnz)));
        int[] position = new int[n];
        for (int k = 0; k < n; k++) {
            position[perm[k]] = k;
        }
        int band = 0;
        for (int r = 0; r < n; r++) {
            for (int k = start[r]; k < start[r + 1]; k++) {
                band = Math.max(band, Math.abs(position[r] - position[cols[k]]));
            }
        }
        assertEquals(1, band);
    }

    @Test
    void ringFactorsStayBanded() {
        // A cyclic 4-point stencil folds into a band of a few diagonals under RCM, so the factors grow linearly
        // with n (common practice for ring lattices): at most ~12 entries per row here.
        Random random = new Random(9);
        int n = 20_000;
        SparseMatrix a = stencil(n, new int[] {-2, -1, 0, 1}, true, random);
        for (int i = 0; i < n; i++) {
            a.values()[a.pattern().find(i, i)] += 4;
        }
        SparseLu lu = new SparseLu(a.pattern());
        agreesAfterFactor(a, lu, random);
        assertTrue(lu.factorNonZeros() < 12L * n, "factor nonzeros " + lu.factorNonZeros());
    }

    @Test
    void addingTheDiagonalKeepsEveryEntryAndMapsItsSlot() {
        // rows {1}, {0, 2}, {} of a 3×3 pattern: the diagonal is missing everywhere (hand-checked layout)
        SparsePattern p = new SparsePattern(3, new int[] {0, 1, 3, 3}, new int[] {1, 0, 2});
        SparsePattern w = p.withDiagonal();
        assertEquals(6, w.nonZeros());
        assertTrue(w.hasDiagonal());
        int[] map = w.slotsOf(p);
        for (int i = 0; i < 3; i++) {
            for (int k = p.rowStart(i); k < p.rowEnd(i); k++) {
                assertEquals(i, rowOf(w, map[k]));
                assertEquals(p.column(k), w.column(map[k]));
            }
        }
        assertEquals(w, w.withDiagonal() == w ? w : null);
    }

    private static int rowOf(SparsePattern p, int slot) {
        int i = 0;
        while (p.rowEnd(i) <= slot) {
            i++;
        }
        return i;
    }
}
