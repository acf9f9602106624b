package org.phasewright.runtime.linalg;

import java.util.Arrays;

/**
 * The positions of the nonzeros of a square matrix in compressed sparse row form: row i holds the columns
 * {@code columns[rowStart[i]] .. columns[rowStart[i + 1] - 1]}, strictly increasing. Immutable; a matrix with this
 * pattern keeps its values in an array of {@link #nonZeros()} entries in the same order.
 */
public final class SparsePattern {
    private final int n;
    private final int[] rowStart;
    private final int[] columns;

    /** Takes the arrays as they are (no copy); columns within a row must be sorted and distinct. */
    public SparsePattern(int n, int[] rowStart, int[] columns) {
        if (rowStart.length != n + 1 || rowStart[0] != 0 || rowStart[n] > columns.length) {
            throw new IllegalArgumentException("inconsistent row starts");
        }
        for (int i = 0; i < n; i++) {
            for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
                int c = columns[k];
                if (c < 0 || c >= n || (k > rowStart[i] && c <= columns[k - 1])) {
                    throw new IllegalArgumentException("row " + i + ": columns must be in 0.." + (n - 1)
                            + ", increasing");
                }
            }
        }
        this.n = n;
        this.rowStart = rowStart;
        this.columns = columns;
    }

    /** Every entry of an n×n matrix (for small dense problems and tests). */
    public static SparsePattern dense(int n) {
        int[] start = new int[n + 1];
        int[] cols = new int[n * n];
        for (int i = 0; i < n; i++) {
            start[i + 1] = (i + 1) * n;
            for (int j = 0; j < n; j++) {
                cols[i * n + j] = j;
            }
        }
        return new SparsePattern(n, start, cols);
    }

    public int dimension() {
        return n;
    }

    public int nonZeros() {
        return rowStart[n];
    }

    public int rowStart(int row) {
        return rowStart[row];
    }

    public int rowEnd(int row) {
        return rowStart[row + 1];
    }

    public int column(int slot) {
        return columns[slot];
    }

    /** The slot of entry (row, column), or -1 when it is structurally zero. */
    public int find(int row, int column) {
        int k = Arrays.binarySearch(columns, rowStart[row], rowStart[row + 1], column);
        return k >= 0 ? k : -1;
    }

    /** True when every diagonal entry is in the pattern. */
    public boolean hasDiagonal() {
        for (int i = 0; i < n; i++) {
            if (find(i, i) < 0) {
                return false;
            }
        }
        return true;
    }

    /** This pattern with the diagonal added (this one itself when it has it already). */
    public SparsePattern withDiagonal() {
        if (hasDiagonal()) {
            return this;
        }
        int[] start = new int[n + 1];
        int[] cols = new int[nonZeros() + n];
        int next = 0;
        for (int i = 0; i < n; i++) {
            start[i] = next;
            boolean placed = false;
            for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
                int c = columns[k];
                if (!placed && c >= i) {
                    if (c != i) {
                        cols[next++] = i;
                    }
                    placed = true;
                }
                cols[next++] = c;
            }
            if (!placed) {
                cols[next++] = i;
            }
        }
        start[n] = next;
        return new SparsePattern(n, start, Arrays.copyOf(cols, next));
    }

    /**
     * For each slot of {@code sub} (whose entries must all be in this pattern) the slot of the same entry here, so
     * values can be scattered from one pattern into a larger one without searching.
     */
    public int[] slotsOf(SparsePattern sub) {
        int[] map = new int[sub.nonZeros()];
        for (int i = 0; i < n; i++) {
            int k = rowStart[i];
            for (int s = sub.rowStart[i]; s < sub.rowStart[i + 1]; s++) {
                while (k < rowStart[i + 1] && columns[k] < sub.columns[s]) {
                    k++;
                }
                if (k == rowStart[i + 1] || columns[k] != sub.columns[s]) {
                    throw new IllegalArgumentException("entry (" + i + ", " + sub.columns[s] + ") missing");
                }
                map[s] = k;
            }
        }
        return map;
    }

    /**
     * The transpose as compressed columns of this pattern: {@code start} (n + 1), {@code rows} and, per transposed
     * slot, the slot of the same entry here ({@code slot}). O(nonzeros).
     */
    public Transposed transpose() {
        int nnz = nonZeros();
        int[] start = new int[n + 1];
        for (int k = 0; k < nnz; k++) {
            start[columns[k] + 1]++;
        }
        for (int j = 0; j < n; j++) {
            start[j + 1] += start[j];
        }
        int[] next = Arrays.copyOf(start, n);
        int[] rows = new int[nnz];
        int[] slot = new int[nnz];
        for (int i = 0; i < n; i++) {
            for (int k = rowStart[i]; k < rowStart[i + 1]; k++) {
                int q = next[columns[k]]++;
                rows[q] = i;
                slot[q] = k;
            }
        }
        return new Transposed(start, rows, slot);
    }

    /** Compressed columns of a pattern, with the slot of each entry in the row-wise order. */
    public record Transposed(int[] start, int[] rows, int[] slot) {
    }
}
