package org.phasewright.runtime.continuation;

/**
 * Gaussian elimination with partial pivoting on a copy of a small dense matrix: the solve and the determinant that
 * the continuation needs (the bordered systems are (n+1)×(n+1), so one allocation per call is negligible).
 */
public final class SquareSolve {
    private final int n;
    private final double[] lu;
    private final int[] pivot;
    private final double determinant;
    private final boolean singular;

    /** Factors a copy of the row-major n×n matrix {@code a}. */
    public SquareSolve(double[] a, int n) {
        this.n = n;
        this.lu = a.clone();
        this.pivot = new int[n];
        double det = 1;
        double scale = 0;
        for (double v : a) {
            scale = Math.max(scale, Math.abs(v));
        }
        boolean sing = !(scale > 0) || !Double.isFinite(scale);
        for (int k = 0; k < n && !sing; k++) {
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
                    double t = lu[k * n + j];
                    lu[k * n + j] = lu[best * n + j];
                    lu[best * n + j] = t;
                }
            }
            double d = lu[k * n + k];
            if (Math.abs(d) <= 1e-14 * scale) {
                sing = true;
                det = 0;
                break;
            }
            det *= d;
            for (int i = k + 1; i < n; i++) {
                double factor = lu[i * n + k] / d;
                lu[i * n + k] = factor;
                for (int j = k + 1; j < n; j++) {
                    lu[i * n + j] -= factor * lu[k * n + j];
                }
            }
        }
        this.singular = sing;
        this.determinant = sing ? 0 : det;
    }

    public boolean singular() {
        return singular;
    }

    public double determinant() {
        return determinant;
    }

    /** Solves in place; only valid when not {@link #singular()}. */
    public void solve(double[] b) {
        for (int k = 0; k < n; k++) {
            int q = pivot[k];
            if (q != k) {
                double t = b[k];
                b[k] = b[q];
                b[q] = t;
            }
            for (int i = k + 1; i < n; i++) {
                b[i] -= lu[i * n + k] * b[k];
            }
        }
        for (int i = n - 1; i >= 0; i--) {
            double s = b[i];
            for (int j = i + 1; j < n; j++) {
                s -= lu[i * n + j] * b[j];
            }
            b[i] = s / lu[i * n + i];
        }
    }

    /** The bordered matrix [top (rows×(rows+1)); last] as a square row-major array. */
    static double[] bordered(double[] top, int rows, double[] last) {
        int m = rows + 1;
        double[] a = new double[m * m];
        System.arraycopy(top, 0, a, 0, rows * m);
        System.arraycopy(last, 0, a, rows * m, m);
        return a;
    }
}
