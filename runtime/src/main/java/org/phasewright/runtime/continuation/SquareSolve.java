package org.phasewright.runtime.continuation;

import org.phasewright.runtime.linalg.DenseLu;

/**
 * The solve and the determinant that the continuation needs, on a fresh factorisation of a small dense matrix (the
 * bordered systems are (n+1)×(n+1), so one allocation per call is negligible).
 */
public final class SquareSolve {
    private final DenseLu lu;
    private final boolean singular;

    /** Factors a copy of the row-major n×n matrix {@code a}. */
    public SquareSolve(double[] a, int n) {
        this.lu = new DenseLu(n);
        this.singular = !lu.factor(a);
    }

    public boolean singular() {
        return singular;
    }

    public double determinant() {
        return lu.determinant();
    }

    /** Solves in place; only valid when not {@link #singular()}. */
    public void solve(double[] b) {
        lu.solve(b);
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
