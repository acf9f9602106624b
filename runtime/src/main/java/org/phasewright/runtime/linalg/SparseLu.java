package org.phasewright.runtime.linalg;

import java.util.Arrays;

/**
 * Sparse LU factorisation P A Q = L U, left-looking column by column with partial pivoting (Gilbert &amp; Peierls,
 * SIAM J. Sci. Stat. Comput. 9, 1988): each column of L and U comes from a sparse triangular solve whose nonzero
 * set is found by a depth-first search in the graph of L, so the work is proportional to the arithmetic done.
 * Columns are taken in reverse Cuthill–McKee order and the diagonal is kept as pivot while it is at least
 * {@link #DIAGONAL_PREFERENCE} of the largest candidate (threshold pivoting), so the band stays narrow.
 * <p>
 * One instance serves one pattern; {@link #factor} can be called again with new values (Newton, implicit steps) and
 * reuses its storage. A repeated factorisation first tries the previous pivot order and fill pattern, numbers only
 * (no graph search), and keeps it while every pivot stays within the threshold; otherwise it pivots afresh.
 */
public final class SparseLu {
    /** Keep the diagonal pivot while |a_jj| ≥ this times the largest entry of the column (common practice: 0.1). */
    public static final double DIAGONAL_PREFERENCE = 0.1;
    /** A pivot below this times the largest |a_ij| counts as zero: the matrix is numerically singular. */
    private static final double SINGULAR = 1e-14;

    private final int n;
    private final SparsePattern pattern;
    private final SparsePattern.Transposed columns;
    private final int[] q; // column order: position k takes original column q[k]
    private final int[] rowOf; // pinv: original row -> pivot position
    private int[] lp, li, up, ui;
    private double[] lx, ux;
    private final double[] x;
    private final int[] xi, stack, mark;
    private int stamp;
    private final double[] work;
    private boolean factored;
    /** True when lp/li/up/ui hold the structure of a previous factorisation, U columns sorted by row. */
    private boolean structure;

    public SparseLu(SparsePattern pattern) {
        this(pattern, SparseOrdering.reverseCuthillMcKee(pattern));
    }

    /**
     * With a given column order ({@code columnOrder[k]} is the column taken k-th), e.g. a bordered matrix whose
     * dense last row and column must come last: reverse Cuthill–McKee would put them first and fill everything.
     */
    public SparseLu(SparsePattern pattern, int[] columnOrder) {
        this.n = pattern.dimension();
        this.pattern = pattern;
        this.columns = pattern.transpose();
        if (columnOrder.length != n) {
            throw new IllegalArgumentException("column order of " + columnOrder.length + " for " + n + " columns");
        }
        this.q = columnOrder.clone();
        this.rowOf = new int[n];
        int guess = Math.max(16, 2 * pattern.nonZeros() + n);
        lp = new int[n + 1];
        up = new int[n + 1];
        li = new int[guess];
        lx = new double[guess];
        ui = new int[guess];
        ux = new double[guess];
        x = new double[n];
        xi = new int[n];
        stack = new int[2 * n];
        mark = new int[n];
        work = new double[n];
    }

    public int dimension() {
        return n;
    }

    /** Nonzeros of L and U together (including both diagonals) after the last factorisation. */
    public long factorNonZeros() {
        return (long) lp[n] + up[n];
    }

    /**
     * Factors {@code a} (whose pattern must be the one given at construction). False when it is numerically
     * singular or has entries that are not finite; then {@link #solve} must not be called.
     */
    public boolean factor(SparseMatrix a) {
        if (a.pattern() != pattern) {
            throw new IllegalArgumentException("matrix has a different pattern");
        }
        factored = false;
        double[] av = a.values();
        double scale = 0;
        for (double v : av) {
            if (!Double.isFinite(v)) {
                return false;
            }
            scale = Math.max(scale, Math.abs(v));
        }
        if (scale == 0 && n > 0) {
            return false;
        }
        if (structure && refactor(av, scale)) {
            factored = true;
            return true;
        }
        structure = false;
        Arrays.fill(rowOf, -1);
        int lnz = 0, unz = 0;
        for (int k = 0; k < n; k++) {
            lp[k] = lnz;
            up[k] = unz;
            if (lnz + n > li.length) {
                li = Arrays.copyOf(li, Math.max(2 * li.length, lnz + n));
                lx = Arrays.copyOf(lx, li.length);
            }
            if (unz + n > ui.length) {
                ui = Arrays.copyOf(ui, Math.max(2 * ui.length, unz + n));
                ux = Arrays.copyOf(ux, ui.length);
            }
            int col = q[k];
            int top = solveColumn(col, av);
            int pivotRow = -1;
            double largest = -1;
            for (int p = top; p < n; p++) {
                int i = xi[p];
                if (rowOf[i] < 0) {
                    double v = Math.abs(x[i]);
                    if (v > largest) {
                        largest = v;
                        pivotRow = i;
                    }
                } else {
                    ui[unz] = rowOf[i];
                    ux[unz++] = x[i];
                }
            }
            if (pivotRow < 0 || !(largest > SINGULAR * scale)) {
                clear(top);
                return false;
            }
            if (rowOf[col] < 0 && Math.abs(x[col]) >= DIAGONAL_PREFERENCE * largest) {
                pivotRow = col;
            }
            double pivot = x[pivotRow];
            ui[unz] = k;
            ux[unz++] = pivot;
            rowOf[pivotRow] = k;
            li[lnz] = pivotRow;
            lx[lnz++] = 1;
            for (int p = top; p < n; p++) {
                int i = xi[p];
                if (rowOf[i] < 0) {
                    li[lnz] = i;
                    lx[lnz++] = x[i] / pivot;
                }
                x[i] = 0;
            }
        }
        lp[n] = lnz;
        up[n] = unz;
        for (int p = 0; p < lnz; p++) {
            li[p] = rowOf[li[p]];
        }
        sortUpperColumns();
        factored = true;
        structure = true;
        return true;
    }

    /** Orders each column of U by row (diagonal stays last): a topological order for {@link #refactor}. */
    private void sortUpperColumns() {
        for (int k = 0; k < n; k++) {
            int from = up[k], to = up[k + 1] - 1; // [from, to) off-diagonal
            for (int p = from + 1; p < to; p++) {
                int r = ui[p];
                double v = ux[p];
                int q = p - 1;
                while (q >= from && ui[q] > r) {
                    ui[q + 1] = ui[q];
                    ux[q + 1] = ux[q];
                    q--;
                }
                ui[q + 1] = r;
                ux[q + 1] = v;
            }
        }
    }

    /**
     * New values on the old pivot order and structure (left-looking, in pivot numbering). False when a pivot falls
     * below the threshold against its column or against the matrix scale, so a fresh factorisation must pivot.
     */
    private boolean refactor(double[] av, double scale) {
        int[] cs = columns.start(), rows = columns.rows(), slot = columns.slot();
        for (int k = 0; k < n; k++) {
            int col = q[k];
            for (int p = cs[col]; p < cs[col + 1]; p++) {
                work[rowOf[rows[p]]] = av[slot[p]];
            }
            int diag = up[k + 1] - 1;
            for (int p = up[k]; p < diag; p++) {
                int j = ui[p];
                double xj = work[j];
                ux[p] = xj;
                work[j] = 0;
                if (xj != 0) {
                    for (int r = lp[j] + 1; r < lp[j + 1]; r++) {
                        work[li[r]] -= lx[r] * xj;
                    }
                }
            }
            double pivot = work[k];
            work[k] = 0;
            double largest = Math.abs(pivot);
            for (int r = lp[k] + 1; r < lp[k + 1]; r++) {
                largest = Math.max(largest, Math.abs(work[li[r]]));
            }
            boolean ok = Math.abs(pivot) > SINGULAR * scale && Math.abs(pivot) >= DIAGONAL_PREFERENCE * largest;
            ux[diag] = pivot;
            for (int r = lp[k] + 1; r < lp[k + 1]; r++) {
                lx[r] = work[li[r]] / pivot;
                work[li[r]] = 0;
            }
            if (!ok) {
                Arrays.fill(work, 0.0);
                return false;
            }
        }
        return true;
    }

    private void clear(int top) {
        for (int p = top; p < n; p++) {
            x[xi[p]] = 0;
        }
    }

    /** x = L \ A(:, col) over the rows reached; returns top: the nonzero rows are xi[top..n-1] in solve order. */
    private int solveColumn(int col, double[] av) {
        int top = reach(col);
        int[] cs = columns.start(), rows = columns.rows(), slot = columns.slot();
        for (int p = cs[col]; p < cs[col + 1]; p++) {
            x[rows[p]] = av[slot[p]];
        }
        for (int px = top; px < n; px++) {
            int j = xi[px];
            int jj = rowOf[j];
            if (jj < 0) {
                continue;
            }
            double xj = x[j]; // unit diagonal of L is stored first
            for (int p = lp[jj] + 1; p < lp[jj + 1]; p++) {
                x[li[p]] -= lx[p] * xj;
            }
        }
        return top;
    }

    /** Rows reachable in the graph of L from the nonzeros of column col, in topological order xi[top..n-1]. */
    private int reach(int col) {
        if (++stamp == Integer.MAX_VALUE) {
            Arrays.fill(mark, 0);
            stamp = 1;
        }
        int top = n;
        int[] cs = columns.start(), rows = columns.rows();
        for (int p = cs[col]; p < cs[col + 1]; p++) {
            int r = rows[p];
            if (mark[r] != stamp) {
                top = depthFirst(r, top);
            }
        }
        return top;
    }

    /** Non-recursive DFS (a Jacobian's L graph can be 10^6 deep); stack[0..] holds nodes, stack[n..] positions. */
    private int depthFirst(int start, int top) {
        int head = 0;
        stack[0] = start;
        while (head >= 0) {
            int j = stack[head];
            int jj = rowOf[j];
            if (mark[j] != stamp) {
                mark[j] = stamp;
                stack[n + head] = jj < 0 ? 0 : lp[jj] + 1;
            }
            boolean done = true;
            int end = jj < 0 ? 0 : lp[jj + 1];
            for (int p = stack[n + head]; p < end; p++) {
                int i = li[p];
                if (mark[i] == stamp) {
                    continue;
                }
                stack[n + head] = p + 1;
                stack[++head] = i;
                done = false;
                break;
            }
            if (done) {
                head--;
                xi[--top] = j;
            }
        }
        return top;
    }

    /**
     * The sign of det A after a successful {@link #factor}: the signs of U's pivots times the parities of the row and
     * column permutations (det P A Q = det L det U with L unit lower triangular). The value itself would over- or
     * underflow for large n.
     */
    public int determinantSign() {
        if (!factored) {
            throw new IllegalStateException("no factorisation");
        }
        int sign = 1;
        for (int j = 0; j < n; j++) {
            if (ux[up[j + 1] - 1] < 0) {
                sign = -sign;
            }
        }
        return sign * parity(rowOf) * parity(q);
    }

    /** +1 for an even permutation, -1 for an odd one (by its cycles). */
    private static int parity(int[] permutation) {
        boolean[] seen = new boolean[permutation.length];
        int sign = 1;
        for (int i = 0; i < permutation.length; i++) {
            if (!seen[i]) {
                int length = 0;
                for (int j = i; !seen[j]; j = permutation[j]) {
                    seen[j] = true;
                    length++;
                }
                if (length % 2 == 0) {
                    sign = -sign;
                }
            }
        }
        return sign;
    }

    /** Solves A x = b in place (b becomes x), after a successful {@link #factor}. */
    public void solve(double[] b) {
        if (!factored) {
            throw new IllegalStateException("no factorisation");
        }
        for (int i = 0; i < n; i++) {
            work[rowOf[i]] = b[i];
        }
        for (int j = 0; j < n; j++) { // L y = P b, unit diagonal first in each column
            double wj = work[j];
            if (wj != 0) {
                for (int p = lp[j] + 1; p < lp[j + 1]; p++) {
                    work[li[p]] -= lx[p] * wj;
                }
            }
        }
        for (int j = n - 1; j >= 0; j--) { // U z = y, diagonal last in each column
            double zj = work[j] / ux[up[j + 1] - 1];
            work[j] = zj;
            if (zj != 0) {
                for (int p = up[j]; p < up[j + 1] - 1; p++) {
                    work[ui[p]] -= ux[p] * zj;
                }
            }
        }
        for (int k = 0; k < n; k++) {
            b[q[k]] = work[k];
        }
    }
}
