package org.phasewright.runtime.equilibria;

import java.util.Arrays;
import java.util.Comparator;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;

/** Eigenvalues of a Jacobian, sorted by real part (descending), and the classification they imply. */
public final class LinearStability {
    private final double[] re;
    private final double[] im;
    private final Classification classification;

    private LinearStability(double[] re, double[] im, Classification classification) {
        this.re = re;
        this.im = im;
        this.classification = classification;
    }

    /**
     * @param jacobian          row-major n×n
     * @param relativeTolerance zero threshold for real/imaginary parts, relative to the Frobenius norm of J
     */
    public static LinearStability of(double[] jacobian, int n, double relativeTolerance) {
        double norm = 0;
        boolean finite = true;
        for (double a : jacobian) {
            norm += a * a;
            finite &= Double.isFinite(a);
        }
        norm = Math.sqrt(norm);
        double[][] eig = finite ? eigenvalues(jacobian, n, norm) : null;
        if (eig == null) {
            double[] nan = new double[n];
            Arrays.fill(nan, Double.NaN);
            return new LinearStability(nan, nan.clone(), Classification.of(nan, nan, 0));
        }
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        double[] r = eig[0], m = eig[1];
        Arrays.sort(order, Comparator.<Integer>comparingDouble(i -> -r[i]).thenComparingDouble(i -> -m[i]));
        double[] re = new double[n];
        double[] im = new double[n];
        for (int k = 0; k < n; k++) {
            re[k] = r[order[k]];
            im[k] = m[order[k]];
        }
        double tolerance = relativeTolerance * norm;
        return new LinearStability(re, im, Classification.of(re, im, tolerance));
    }

    /**
     * For a model too large for a dense eigen-solver: no eigenvalues, and a type that says why, naming the limit
     * ({@link org.phasewright.runtime.compile.SparseJacobian#DENSE_LIMIT}).
     */
    public static LinearStability notClassified(int n) {
        return new LinearStability(new double[0], new double[0], new Classification("not classified: dimension "
                + n + " > " + org.phasewright.runtime.compile.SparseJacobian.DENSE_LIMIT, 0, 0, 0));
    }

    /** {re, im}, or null if the QR iteration fails (reported as "unclassified"). */
    private static double[][] eigenvalues(double[] jacobian, int n, double norm) {
        if (norm == 0) { // commons-math refuses the zero matrix; its eigenvalues are all zero
            return new double[][] {new double[n], new double[n]};
        }
        double[][] a = new double[n][n];
        for (int i = 0; i < n; i++) {
            System.arraycopy(jacobian, i * n, a[i], 0, n);
        }
        try {
            EigenDecomposition d = new EigenDecomposition(new Array2DRowRealMatrix(a, false));
            return new double[][] {d.getRealEigenvalues(), d.getImagEigenvalues()};
        } catch (RuntimeException e) {
            return null;
        }
    }

    /** Real parts, largest first. */
    public double[] real() {
        return re.clone();
    }

    /** Imaginary parts, matching {@link #real()}; a complex pair appears as +b then -b. */
    public double[] imaginary() {
        return im.clone();
    }

    public Classification classification() {
        return classification;
    }
}
