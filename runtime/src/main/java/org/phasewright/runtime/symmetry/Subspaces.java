package org.phasewright.runtime.symmetry;

import java.util.ArrayList;
import java.util.List;

/** Small dense linear algebra for symmetry matrices: rank and reduced row echelon form. */
final class Subspaces {
    /** Entries below this (relative to the largest) count as zero; symmetry matrices have entries of order one. */
    static final double EPS = 1e-9;

    private Subspaces() {
    }

    static int rank(double[][] m) {
        return reducedRows(m).size();
    }

    /**
     * The non-zero rows of the reduced row echelon form of {@code m}, each scaled so its pivot (first non-zero
     * entry) is 1. They are the equations of the null space of m, in a canonical form.
     */
    static List<double[]> reducedRows(double[][] m) {
        int rows = m.length;
        int cols = rows == 0 ? 0 : m[0].length;
        double[][] a = new double[rows][];
        double scale = 0;
        for (int i = 0; i < rows; i++) {
            a[i] = m[i].clone();
            for (double x : a[i]) {
                scale = Math.max(scale, Math.abs(x));
            }
        }
        double tiny = EPS * Math.max(scale, 1e-300);
        int r = 0;
        for (int c = 0; c < cols && r < rows; c++) {
            int best = r;
            for (int i = r + 1; i < rows; i++) {
                if (Math.abs(a[i][c]) > Math.abs(a[best][c])) {
                    best = i;
                }
            }
            if (Math.abs(a[best][c]) <= tiny) {
                continue;
            }
            double[] t = a[r];
            a[r] = a[best];
            a[best] = t;
            double pivot = a[r][c];
            for (int j = 0; j < cols; j++) {
                a[r][j] /= pivot;
            }
            for (int i = 0; i < rows; i++) {
                if (i != r && a[i][c] != 0) {
                    double f = a[i][c];
                    for (int j = 0; j < cols; j++) {
                        a[i][j] -= f * a[r][j];
                    }
                }
            }
            r++;
        }
        List<double[]> out = new ArrayList<>();
        for (int i = 0; i < r; i++) {
            for (int j = 0; j < cols; j++) {
                if (Math.abs(a[i][j]) <= tiny) {
                    a[i][j] = 0;
                }
            }
            out.add(a[i]);
        }
        return out;
    }
}
