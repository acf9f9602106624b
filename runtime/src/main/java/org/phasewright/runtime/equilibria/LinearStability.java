package org.phasewright.runtime.equilibria;

import java.util.Arrays;
import java.util.Comparator;
import java.util.function.BooleanSupplier;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;
import org.phasewright.runtime.linalg.BlockCirculantSpectrum;
import org.phasewright.runtime.linalg.RightmostEigenvalues;
import org.phasewright.runtime.linalg.SparseMatrix;

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
        return sorted(eig[0], eig[1], relativeTolerance * norm);
    }

    /**
     * For a model too large for a dense eigen-solver and without a sparse Jacobian: no eigenvalues, and a type that
     * says why, naming the limit ({@link org.phasewright.runtime.compile.SparseJacobian#DENSE_LIMIT}).
     */
    public static LinearStability notClassified(int n) {
        return new LinearStability(new double[0], new double[0], new Classification("not classified: dimension "
                + n + " > " + org.phasewright.runtime.compile.SparseJacobian.DENSE_LIMIT, 0, 0, 0));
    }

    /**
     * For a large model, from its sparse Jacobian. A Jacobian that commutes with the cyclic shift of a lattice (a
     * ring at a state that is the same in every cell) gets its whole spectrum from {@link BlockCirculantSpectrum}
     * and the same classification as a dense one. Any other gets its rightmost eigenvalues from
     * {@link RightmostEigenvalues}: then the unstable dimension is exact when a stable eigenvalue was reached, and a
     * lower bound ("at least") when every eigenvalue found is unstable. Either way only the
     * {@link RightmostEigenvalues#WANTED} rightmost eigenvalues are kept (unless the variant below asks for all).
     * Zero means below {@code relativeTolerance} times the Gershgorin bound of J (its largest absolute row sum; the
     * Frobenius norm the dense case uses grows with the dimension). {@code stop} (a deadline or a cancel) is checked
     * between the pieces of work; when it fires the equilibrium is left "not classified".
     */
    public static LinearStability ofSparse(SparseMatrix j, double relativeTolerance, BooleanSupplier stop) {
        return ofSparse(j, relativeTolerance, stop, null, false);
    }

    /**
     * The same, with a {@link RightmostEigenvalues.Memory} kept along a sequence of similar Jacobians; with
     * {@code wholeCirculantSpectrum} a block-circulant Jacobian keeps all its eigenvalues (a continuation's Hopf test
     * then sees every pair, as in a dense model).
     */
    public static LinearStability ofSparse(SparseMatrix j, double relativeTolerance, BooleanSupplier stop,
            RightmostEigenvalues.Memory memory, boolean wholeCirculantSpectrum) {
        int n = j.dimension();
        if (!j.allFinite()) {
            double[] nan = {Double.NaN};
            return new LinearStability(nan, nan.clone(), Classification.of(nan, nan, 0));
        }
        double tolerance = relativeTolerance * j.weightedRowNorm(null); // the Gershgorin bound of J
        // cells must agree far below the zero threshold, so that what is called circulant has cell 0's spectrum
        double[][] all = BlockCirculantSpectrum.of(j, 1e-3 * tolerance, stop);
        if (all != null) {
            LinearStability full = sorted(all[0], all[1], tolerance);
            if (wholeCirculantSpectrum) {
                return full;
            }
            int keep = Math.min(n, RightmostEigenvalues.WANTED);
            return new LinearStability(Arrays.copyOf(full.re, keep), Arrays.copyOf(full.im, keep),
                    full.classification);
        }
        RightmostEigenvalues.Result r = stop.getAsBoolean() ? null
                : RightmostEigenvalues.of(j, tolerance, stop, memory);
        Classification c = r == null || r.real().length == 0 ? null
                : Classification.ofRightmost(r.real(), r.imaginary(), n, r.allUnstable(), tolerance);
        if (c == null) {
            String why = stop.getAsBoolean() ? "stopped before its eigenvalues were found"
                    : r == null || r.real().length == 0 ? "the rightmost of its " + n + " eigenvalues did not converge"
                    : "the " + r.real().length + " rightmost eigenvalues found lie on the imaginary axis (to the "
                            + "tolerance) and more may";
            return new LinearStability(new double[0], new double[0], new Classification("not classified: " + why, 0,
                    0, 0));
        }
        return new LinearStability(r.real(), r.imaginary(), c);
    }

    private static LinearStability sorted(double[] r, double[] m, double tolerance) {
        int n = r.length;
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        Arrays.sort(order, Comparator.<Integer>comparingDouble(i -> -r[i]).thenComparingDouble(i -> -m[i]));
        double[] re = new double[n];
        double[] im = new double[n];
        for (int k = 0; k < n; k++) {
            re[k] = r[order[k]];
            im[k] = m[order[k]];
        }
        return new LinearStability(re, im, Classification.of(re, im, tolerance));
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
