package org.phasewright.runtime.linalg;

/**
 * A square matrix in compressed sparse row form: a {@link SparsePattern} and one value per slot. The values are
 * exposed so that Jacobian code can write them in place each evaluation.
 */
public final class SparseMatrix {
    private final SparsePattern pattern;
    private final double[] values;

    public SparseMatrix(SparsePattern pattern) {
        this(pattern, new double[pattern.nonZeros()]);
    }

    /** Uses {@code values} as the storage (no copy). */
    public SparseMatrix(SparsePattern pattern, double[] values) {
        if (values.length != pattern.nonZeros()) {
            throw new IllegalArgumentException(values.length + " values for " + pattern.nonZeros() + " slots");
        }
        this.pattern = pattern;
        this.values = values;
    }

    public SparsePattern pattern() {
        return pattern;
    }

    public int dimension() {
        return pattern.dimension();
    }

    /** The storage, in slot order. */
    public double[] values() {
        return values;
    }

    public double get(int row, int column) {
        int k = pattern.find(row, column);
        return k < 0 ? 0.0 : values[k];
    }

    /** y = A x. */
    public void multiply(double[] x, double[] y) {
        int n = pattern.dimension();
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (int k = pattern.rowStart(i), end = pattern.rowEnd(i); k < end; k++) {
                s += values[k] * x[pattern.column(k)];
            }
            y[i] = s;
        }
    }

    /**
     * Y = A X for an n×m block stored row-major from {@code xOffset} (X[i][c] = x[xOffset + i*m + c]), written to
     * y from {@code yOffset} in the same layout.
     */
    public void multiplyBlock(double[] x, int xOffset, int m, double[] y, int yOffset) {
        int n = pattern.dimension();
        for (int i = 0; i < n; i++) {
            int out = yOffset + i * m;
            for (int c = 0; c < m; c++) {
                y[out + c] = 0;
            }
            for (int k = pattern.rowStart(i), end = pattern.rowEnd(i); k < end; k++) {
                double a = values[k];
                int in = xOffset + pattern.column(k) * m;
                for (int c = 0; c < m; c++) {
                    y[out + c] += a * x[in + c];
                }
            }
        }
    }

    /** max_i Σ_j |a_ij| w_j: the ∞-norm of A·diag(w); w = null means all ones. */
    public double weightedRowNorm(double[] w) {
        double worst = 0;
        for (int i = 0; i < pattern.dimension(); i++) {
            double row = 0;
            for (int k = pattern.rowStart(i), end = pattern.rowEnd(i); k < end; k++) {
                row += Math.abs(values[k]) * (w == null ? 1 : w[pattern.column(k)]);
            }
            worst = Math.max(worst, row);
        }
        return worst;
    }

    /** The transpose, on the transposed pattern. */
    public SparseMatrix transpose() {
        SparsePattern.Transposed t = pattern.transpose();
        double[] values = new double[t.slot().length];
        for (int k = 0; k < values.length; k++) {
            values[k] = this.values[t.slot()[k]];
        }
        return new SparseMatrix(new SparsePattern(pattern.dimension(), t.start(), t.rows()), values);
    }

    public boolean allFinite() {
        return Vectors.allFinite(values);
    }
}
