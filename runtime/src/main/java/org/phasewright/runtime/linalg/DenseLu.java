package org.phasewright.runtime.linalg;

/**
 * LU factorisation with partial pivoting on a preallocated row-major matrix, so Newton loops and implicit integrator
 * stages allocate nothing.
 */
public final class DenseLu {
    private final int n;
    private final double[] lu;
    private final int[] pivot;
    private double determinant;

    public DenseLu(int n) {
        this.n = n;
        this.lu = new double[n * n];
        this.pivot = new int[n];
    }

    /** Factors a copy of {@code m}; false when a pivot is negligible against the largest entry (singular). */
    public boolean factor(double[] m) {
        determinant = 0;
        System.arraycopy(m, 0, lu, 0, n * n);
        double scale = 0;
        for (int i = 0; i < n * n; i++) {
            if (!Double.isFinite(lu[i])) {
                return false;
            }
            scale = Math.max(scale, Math.abs(lu[i]));
        }
        if (scale == 0) {
            return false;
        }
        double det = 1;
        for (int k = 0; k < n; k++) {
            int best = k;
            for (int i = k + 1; i < n; i++) {
                if (Math.abs(lu[i * n + k]) > Math.abs(lu[best * n + k])) {
                    best = i;
                }
            }
            pivot[k] = best;
            if (best != k) {
                det = -det;
                for (int j = 0; j < n; j++) {
                    double tmp = lu[k * n + j];
                    lu[k * n + j] = lu[best * n + j];
                    lu[best * n + j] = tmp;
                }
            }
            double d = lu[k * n + k];
            if (Math.abs(d) <= 1e-14 * scale) {
                return false;
            }
            det *= d;
            for (int i = k + 1; i < n; i++) {
                double f = lu[i * n + k] / d;
                lu[i * n + k] = f;
                if (f != 0) {
                    for (int j = k + 1; j < n; j++) {
                        lu[i * n + j] -= f * lu[k * n + j];
                    }
                }
            }
        }
        determinant = det;
        return true;
    }

    /** The determinant of the last factored matrix: the signed product of the pivots, 0 when it was singular. */
    public double determinant() {
        return determinant;
    }

    /** Solves A x = b in place (b becomes x). */
    public void solve(double[] b) {
        for (int k = 0; k < n; k++) {
            int pk = pivot[k];
            if (pk != k) {
                double tmp = b[k];
                b[k] = b[pk];
                b[pk] = tmp;
            }
        }
        for (int i = 1; i < n; i++) {
            double s = b[i];
            for (int j = 0; j < i; j++) {
                s -= lu[i * n + j] * b[j];
            }
            b[i] = s;
        }
        for (int i = n - 1; i >= 0; i--) {
            double s = b[i];
            for (int j = i + 1; j < n; j++) {
                s -= lu[i * n + j] * b[j];
            }
            b[i] = s / lu[i * n + i];
        }
    }
}
