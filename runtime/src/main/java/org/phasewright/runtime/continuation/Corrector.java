package org.phasewright.runtime.continuation;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.phasewright.runtime.linalg.Vectors;

/**
 * The geometry of the solution curve H(x) = 0 in (u, λ) space: unit tangents from the bordered system
 * [H_x; r^T] v = e_(n+1) (Keller's pseudo-arclength), Newton correction onto the curve in the hyperplane through a
 * predicted point orthogonal to a direction, the branch-point test function det [H_x; t^T] (Kuznetsov, Elements of
 * Applied Bifurcation Theory, 3rd ed., §10.2), and the second tangent at a branch point.
 */
final class Corrector {
    static final int MAX_ITERATIONS = 10;
    static final double STEP_TOLERANCE = 1e-10;

    private final AugmentedSystem system;
    private final BorderedSolver bordered;
    private final int n;
    private final double[] h, rhs;
    /** Newton iterations of the last {@link #correct} call. */
    int iterations;

    Corrector(AugmentedSystem system) {
        this.system = system;
        this.n = system.dimension();
        this.bordered = BorderedSolver.of(system);
        this.h = new double[n];
        this.rhs = new double[n + 1];
    }

    /** The unit tangent at x oriented like {@code reference} (t·reference > 0); null if it cannot be found. */
    double[] tangent(double[] x, double[] reference) {
        double[] v;
        if (bordered.factor(x, reference)) {
            v = new double[n + 1];
            v[n] = 1;
            bordered.solve(v);
        } else if (system.sparse()) {
            return null; // no dense SVD for a large model: the caller shortens the step
        } else {
            v = nullVectors(x, 1)[0];
        }
        double norm = norm(v);
        if (!(norm > 0) || !Double.isFinite(norm)) {
            return null;
        }
        double sign = dot(v, reference) < 0 ? -1 : 1;
        for (int i = 0; i <= n; i++) {
            v[i] *= sign / norm;
        }
        return v;
    }

    /**
     * Newton's method on H(X) = 0, direction·(X − predicted) = 0, from {@code predicted}; the result goes to
     * {@code out}. False when it does not converge within {@link #MAX_ITERATIONS}.
     */
    boolean correct(double[] predicted, double[] direction, double[] out) {
        System.arraycopy(predicted, 0, out, 0, n + 1);
        iterations = 0;
        while (iterations < MAX_ITERATIONS) {
            iterations++;
            system.value(out, h);
            if (!bordered.factor(out, direction)) {
                return false;
            }
            double constraint = 0;
            for (int i = 0; i <= n; i++) {
                constraint += direction[i] * (out[i] - predicted[i]);
            }
            for (int i = 0; i < n; i++) {
                rhs[i] = -h[i];
            }
            rhs[n] = -constraint;
            bordered.solve(rhs);
            double step = 0, size = 0;
            for (int i = 0; i <= n; i++) {
                out[i] += rhs[i];
                step = Math.max(step, Math.abs(rhs[i]));
                size = Math.max(size, Math.abs(out[i]));
            }
            if (!Double.isFinite(step)) {
                return false;
            }
            if (step <= STEP_TOLERANCE * (1 + size)) {
                system.value(out, h);
                return finite(h);
            }
        }
        return false;
    }

    /**
     * det [H_x; t^T], or for a large model only its sign: changes sign at a simple branch point, keeps its sign
     * through a fold.
     */
    double branchTest(double[] x, double[] t) {
        if (bordered.factor(x, t)) {
            return bordered.determinantTest();
        }
        // singular to working precision: the sign a hair along the branch, so a sign change is not hidden by a 0
        return bordered.factor(hairAlong(x, t), t) ? bordered.determinantTest() : 0;
    }

    /**
     * At a branch point the kernel of H_x is two-dimensional: the unit vector of it orthogonal to the tangent
     * {@code t} of the branch we came along is the tangent of the other branch (to first order).
     */
    double[] secondTangent(double[] x, double[] t) {
        if (system.sparse()) {
            return secondTangentByInverseIteration(x, t);
        }
        double[][] kernel = nullVectors(x, 2);
        double[] best = null;
        double bestNorm = 0;
        for (double[] v : kernel) {
            double c = dot(v, t);
            double[] w = new double[n + 1];
            for (int i = 0; i <= n; i++) {
                w[i] = v[i] - c * t[i];
            }
            double norm = norm(w);
            if (norm > bestNorm) {
                bestNorm = norm;
                best = w;
            }
        }
        if (best == null || bestNorm < 1e-6) {
            return null;
        }
        for (int i = 0; i <= n; i++) {
            best[i] /= bestNorm;
        }
        return best;
    }

    /**
     * The same for a large model, without an SVD: near a branch point [H_x; tᵀ] is nearly singular and its null
     * vector is the kernel vector of H_x orthogonal to t, so two steps of inverse iteration with it (from a fixed
     * pseudo-random vector whose last entry is 0) give that vector. If the matrix is singular to working precision
     * at x, a point a hair along t is used. Null when no clearly new direction results.
     */
    private double[] secondTangentByInverseIteration(double[] x, double[] t) {
        if (!bordered.factor(x, t) && !bordered.factor(hairAlong(x, t), t)) {
            return null;
        }
        java.util.SplittableRandom random = new java.util.SplittableRandom(20_011L);
        double[] z = new double[n + 1];
        for (int i = 0; i < n; i++) {
            z[i] = random.nextDouble() - 0.5;
        }
        for (int iteration = 0; iteration < 2; iteration++) {
            bordered.solve(z);
            double c = dot(z, t);
            for (int i = 0; i <= n; i++) {
                z[i] -= c * t[i];
            }
            double norm = norm(z);
            if (!(norm > 0) || !Double.isFinite(norm)) {
                return null;
            }
            for (int i = 0; i <= n; i++) {
                z[i] /= norm;
            }
            if (iteration == 0) {
                z[n] = 0; // the next right-hand side: in the rows of H_x only, like the first
                if (Vectors.normInf(z) == 0) {
                    return null;
                }
            }
        }
        return z;
    }

    /** x moved a hair (1e-9 of its size) along t: off a point where the bordered matrix is singular. */
    private double[] hairAlong(double[] x, double[] t) {
        double[] y = x.clone();
        double hair = 1e-9 * (1 + Vectors.normInf(x));
        for (int i = 0; i <= n; i++) {
            y[i] += hair * t[i];
        }
        return y;
    }

    /** The right singular vectors of H_x (padded to square with a zero row) for the smallest singular values. */
    private double[][] nullVectors(double[] x, int count) {
        double[] hx = new double[n * (n + 1)];
        system.jacobian(x, hx);
        double[][] a = new double[n + 1][n + 1];
        for (int i = 0; i < n; i++) {
            System.arraycopy(hx, i * (n + 1), a[i], 0, n + 1);
        }
        SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(a, false));
        double[][] v = svd.getV().getData();
        double[][] out = new double[count][n + 1];
        for (int k = 0; k < count; k++) {
            int column = n - k; // singular values come in decreasing order
            for (int i = 0; i <= n; i++) {
                out[k][i] = v[i][column];
            }
        }
        return out;
    }

    static double dot(double[] a, double[] b) {
        return Vectors.dot(a, b);
    }

    static double norm(double[] a) {
        return Math.sqrt(dot(a, a));
    }

    private static boolean finite(double[] a) {
        for (double v : a) {
            if (!Double.isFinite(v)) {
                return false;
            }
        }
        return true;
    }
}
