package org.phasewright.runtime.equilibria;

import org.phasewright.runtime.compile.SparseJacobian;
import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.linalg.DenseLu;
import org.phasewright.runtime.linalg.SparseLu;
import org.phasewright.runtime.linalg.SparseMatrix;
import org.phasewright.runtime.linalg.Vectors;

/**
 * Damped Newton iteration for f(x) = 0 with the exact Jacobian. Each step is halved until ||f||_2 decreases enough
 * (Armijo backtracking); where the Jacobian is singular a Levenberg–Marquardt step is taken instead.
 * Converged means both a small residual and a small last step. Work arrays are reused between starts.
 * <p>
 * With {@link #deflate} roots, the iteration solves m(x)·f(x) = 0 instead, m(x) = Π_k (1/‖(x − r_k)/scale‖² + 1):
 * the deflation of Farrell, Birkisson &amp; Funke (SIAM J. Sci. Comput. 37, 2015), which makes known roots repel
 * the iteration so that it converges to a new one. The deflated Newton step is the plain one times
 * 1/(1 − ∇m·δ/m) (their Sherman–Morrison form), and the line search measures m(x)·‖f(x)‖.
 * <p>
 * Large models ({@link VectorField#large()}) use the field's sparse Jacobian and a sparse LU instead of n×n arrays;
 * where that Jacobian is singular the start is abandoned (the normal equations would be dense).
 */
final class NewtonSolver {
    private static final double ARMIJO = 1e-4;
    private static final double MIN_DAMPING = 1.0 / 1024;

    private final VectorField field;
    private final double[] p;
    private final int n;
    private final double[] scales;
    /** Absolute floor of the convergence tests, for coordinates near zero; a small fraction of the scale, so a
     * wide search box cannot make a poor root look converged. */
    private final double[] floor;
    private final EquilibriumSettings settings;
    private final double[] f, fTrial, xTrial, jac, delta, normal;
    private final DenseLu lu;
    /** Non-null on the sparse path (then jac, normal and lu are null). */
    private final SparseJacobian sparse;
    private final SparseMatrix sparseJac;
    private final SparseLu sparseLu;
    final double[] x;
    double residual;
    int iterations;
    /** Roots to deflate (scaled distances); empty for plain Newton. */
    private java.util.List<double[]> deflated = java.util.List.of();

    /** Known roots that the next {@link #solve} calls must avoid (no copy is made: do not change them). */
    void deflate(java.util.List<double[]> roots) {
        deflated = roots;
    }

    NewtonSolver(VectorField field, double[] parameters, double[] scales, EquilibriumSettings settings) {
        this.field = field;
        this.p = parameters;
        this.n = field.dimension();
        this.scales = scales;
        this.floor = new double[scales.length];
        for (int i = 0; i < scales.length; i++) {
            floor[i] = 1e-3 * scales[i];
        }
        this.settings = settings;
        x = new double[n];
        f = new double[n];
        fTrial = new double[n];
        xTrial = new double[n];
        delta = new double[n];
        sparse = field.large() ? field.sparseJacobian() : null;
        if (field.large() && sparse == null) {
            throw new IllegalArgumentException("a model of " + n + " states needs a sparse Jacobian for Newton");
        }
        if (sparse != null) {
            jac = null;
            normal = null;
            lu = null;
            sparseJac = sparse.newMatrix();
            sparseLu = new SparseLu(sparseJac.pattern());
        } else {
            jac = new double[n * n];
            normal = new double[n * n];
            lu = new DenseLu(n);
            sparseJac = null;
            sparseLu = null;
        }
    }

    /** True when this solver works with the sparse Jacobian. */
    boolean sparse() {
        return sparse != null;
    }

    /** Iterates from {@code start}; on success {@link #x} holds the root. At most {@code maxIterations} steps. */
    boolean solve(double[] start, int maxIterations) {
        System.arraycopy(start, 0, x, 0, n);
        iterations = 0;
        field.rates(0.0, x, p, f);
        double norm = deflation(x) * norm2(f);
        if (!Double.isFinite(norm)) {
            return false;
        }
        while (iterations < maxIterations) {
            iterations++;
            if (sparse != null) {
                sparse.values(0.0, x, p, sparseJac.values());
            } else {
                field.jacobian(0.0, x, p, jac);
            }
            if (!direction()) {
                return false;
            }
            if (!deflated.isEmpty() && !deflateStep()) {
                return false;
            }
            double lambda = 1.0;
            double trialNorm;
            while (true) {
                for (int i = 0; i < n; i++) {
                    xTrial[i] = x[i] + lambda * delta[i];
                }
                field.rates(0.0, xTrial, p, fTrial);
                trialNorm = deflation(xTrial) * norm2(fTrial);
                if (Double.isFinite(trialNorm) && trialNorm <= (1 - ARMIJO * lambda) * norm) {
                    break;
                }
                lambda *= 0.5;
                if (lambda < MIN_DAMPING) {
                    return converged(0.0) && snap();
                }
            }
            double step = 0;
            for (int i = 0; i < n; i++) {
                step = Math.max(step, Math.abs(lambda * delta[i]) / (Math.abs(xTrial[i]) + floor[i]));
            }
            System.arraycopy(xTrial, 0, x, 0, n);
            System.arraycopy(fTrial, 0, f, 0, n);
            norm = trialNorm;
            if (converged(step)) {
                return snap();
            }
            if (diverging()) {
                return false;
            }
        }
        return false;
    }

    /** m(x) = Π_k (1/d_k² + 1) with d_k the scaled distance to the k-th deflated root; 1 without deflation. */
    private double deflation(double[] at) {
        double m = 1;
        for (double[] r : deflated) {
            double d2 = 0;
            for (int i = 0; i < n; i++) {
                double d = (at[i] - r[i]) / scales[i];
                d2 += d * d;
            }
            m *= 1 / d2 + 1;
        }
        return m;
    }

    /** Turns the plain Newton step into the step for m·f: δ ← δ / (1 − ∇m·δ / m). */
    private boolean deflateStep() {
        double slope = 0; // ∇(log m)·δ = Σ_k (∇m_k·δ)/m_k
        for (double[] r : deflated) {
            double d2 = 0, dot = 0;
            for (int i = 0; i < n; i++) {
                double d = (x[i] - r[i]) / scales[i];
                d2 += d * d;
                dot += d * delta[i] / scales[i];
            }
            double mk = 1 / d2 + 1;
            slope += (-2 / (d2 * d2)) * dot / mk;
        }
        double tau = 1 / (1 - slope);
        if (!Double.isFinite(tau)) {
            return false;
        }
        for (int i = 0; i < n; i++) {
            delta[i] *= tau;
        }
        return true;
    }

    /** Newton direction in {@link #delta}; Levenberg–Marquardt on (J^T J + mu I) when J is singular. */
    private boolean direction() {
        if (sparse != null) {
            if (!sparseLu.factor(sparseJac)) {
                return false;
            }
            for (int i = 0; i < n; i++) {
                delta[i] = -f[i];
            }
            sparseLu.solve(delta);
            return Vectors.allFinite(delta);
        }
        if (lu.factor(jac)) {
            for (int i = 0; i < n; i++) {
                delta[i] = -f[i];
            }
            lu.solve(delta);
            return Vectors.allFinite(delta);
        }
        double trace = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double s = 0;
                for (int k = 0; k < n; k++) {
                    s += jac[k * n + i] * jac[k * n + j];
                }
                normal[i * n + j] = s;
            }
            trace += normal[i * n + i];
        }
        if (!(trace > 0) || !Double.isFinite(trace)) {
            return false;
        }
        double mu = 1e-6 * trace / n;
        for (int i = 0; i < n; i++) {
            normal[i * n + i] += mu;
            double s = 0;
            for (int k = 0; k < n; k++) {
                s += jac[k * n + i] * f[k];
            }
            delta[i] = -s;
        }
        if (!lu.factor(normal)) {
            return false;
        }
        lu.solve(delta);
        return Vectors.allFinite(delta);
    }

    /** Residual small against what a relative perturbation of x would produce, and the last step small. */
    private boolean converged(double step) {
        residual = Vectors.normInf(f);
        double jNorm = 0;
        if (sparse != null) {
            for (int i = 0; i < n; i++) {
                xTrial[i] = Math.abs(x[i]) + floor[i]; // xTrial is free here: the step has been taken
            }
            jNorm = sparseJac.weightedRowNorm(xTrial);
        }
        for (int i = 0; sparse == null && i < n; i++) {
            double row = 0;
            for (int j = 0; j < n; j++) {
                row += Math.abs(jac[i * n + j]) * (Math.abs(x[j]) + floor[j]);
            }
            jNorm = Math.max(jNorm, row);
        }
        return residual <= settings.residualTolerance() * jNorm + Double.MIN_NORMAL
                && step <= settings.stepTolerance();
    }

    /** Rounds coordinates that are zero up to rounding noise to exactly zero, if that is no worse a root. */
    private boolean snap() {
        boolean changed = false;
        System.arraycopy(x, 0, xTrial, 0, n);
        for (int i = 0; i < n; i++) {
            if (x[i] != 0 && Math.abs(x[i]) <= 1e-12 * scales[i]) {
                xTrial[i] = 0;
                changed = true;
            }
        }
        if (changed) {
            field.rates(0.0, xTrial, p, fTrial);
            double r = Vectors.normInf(fTrial);
            if (r <= residual || r <= Double.MIN_NORMAL) {
                System.arraycopy(xTrial, 0, x, 0, n);
                System.arraycopy(fTrial, 0, f, 0, n);
                residual = r;
            }
        }
        return true;
    }

    private boolean diverging() {
        for (int i = 0; i < n; i++) {
            if (!(Math.abs(x[i]) <= 1e8 * scales[i])) {
                return true;
            }
        }
        return false;
    }

    private static double norm2(double[] v) {
        double s = 0;
        for (double a : v) {
            s += a * a;
        }
        return Math.sqrt(s);
    }

}
