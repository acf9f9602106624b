package org.phasewright.runtime.equilibria;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;

import org.phasewright.runtime.linalg.Vectors;

/**
 * All isolated complex roots of a square polynomial system f(x) = 0 by total-degree homotopy continuation
 * (Sommese &amp; Wampler, The Numerical Solution of Systems of Polynomials, 2005, Ch. 8): the start system
 * g_i = x_i^{d_i} − 1 has Π d_i known roots (the Bézout number), and each is followed along
 * H(x, s) = γ(1 − s)·g(x) + s·f(x) from s = 0 to 1 with a random complex γ (the "gamma trick", which keeps every
 * path away from singularities with probability one). Paths are tracked in complex arithmetic with a fourth-order
 * Runge–Kutta predictor on dx/ds = −H_x⁻¹H_s and a Newton corrector, with step-size adaptation; a path whose |x|
 * exceeds {@link #INFINITY} goes to a root at infinity. γ is fixed, so results are reproducible.
 */
final class TotalDegreeHomotopy {
    static final double INFINITY = 1e8;
    private static final double GAMMA_ANGLE = 2 * Math.PI * 0.3173791; // any angle not a rational multiple of π
    private static final double MIN_STEP = 1e-13, MAX_STEP = 0.05;
    /** Predictor–corrector steps allowed per path; a path needing more is given up (counted as not finite). */
    private static final int MAX_STEPS_PER_PATH = 20_000;
    /** The predictor must land this close (relative to |x|) for the corrector's first step: no path jumping. */
    private static final double FIRST_CORRECTION = 1e-3;

    /** Paths followed, how many ended at finite roots, how many of those are real, and the real roots. */
    record Result(int paths, int finite, int real, List<double[]> realRoots, boolean complete) {
    }

    private final int n;
    private final double[][] coefficients;
    private final int[][][] exponents;
    private final int[] degrees;
    private final int maxDegree;
    private final double gammaRe = Math.cos(GAMMA_ANGLE), gammaIm = Math.sin(GAMMA_ANGLE);
    // Work arrays (complex values interleaved: re at 2k, im at 2k+1).
    private final double[] powers, f, g, h, hs, jac, tangent, k1, k2, k3, k4, xt, dx;
    private final ComplexLu lu;

    TotalDegreeHomotopy(Polynomial[] system) {
        n = system.length;
        coefficients = new double[n][];
        exponents = new int[n][][];
        degrees = new int[n];
        int maxD = 1;
        for (int i = 0; i < n; i++) {
            coefficients[i] = system[i].coefficients();
            exponents[i] = system[i].exponents();
            degrees[i] = Math.max(1, system[i].degree());
            maxD = Math.max(maxD, degrees[i]);
        }
        maxDegree = maxD;
        powers = new double[2 * n * (maxD + 1)];
        f = new double[2 * n];
        g = new double[2 * n];
        h = new double[2 * n];
        hs = new double[2 * n];
        jac = new double[2 * n * n];
        tangent = new double[2 * n];
        k1 = new double[2 * n];
        k2 = new double[2 * n];
        k3 = new double[2 * n];
        k4 = new double[2 * n];
        xt = new double[2 * n];
        dx = new double[2 * n];
        lu = new ComplexLu(n);
    }

    /** The Bézout number Π d_i, or Long.MAX_VALUE when it overflows. */
    static long bezout(Polynomial[] system) {
        long b = 1;
        for (Polynomial p : system) {
            b = Math.multiplyExact(b, Math.max(1, p.degree()));
            if (b > Integer.MAX_VALUE) {
                return Long.MAX_VALUE;
            }
        }
        return b;
    }

    Result solve(long deadlineNanos, BooleanSupplier cancelled) {
        long total = 1;
        for (int d : degrees) {
            total *= d;
        }
        int finite = 0, real = 0, paths = 0;
        List<double[]> realRoots = new ArrayList<>();
        int[] index = new int[n];
        double[] x = new double[2 * n];
        for (long path = 0; path < total; path++) {
            if (cancelled.getAsBoolean()
                    || (deadlineNanos != Long.MAX_VALUE && System.nanoTime() - deadlineNanos > 0)) {
                return new Result(paths, finite, real, realRoots, false);
            }
            long rest = path;
            for (int i = 0; i < n; i++) { // the path-th root of the start system: x_i = exp(2πi k_i / d_i)
                index[i] = (int) (rest % degrees[i]);
                rest /= degrees[i];
                double angle = 2 * Math.PI * index[i] / degrees[i];
                x[2 * i] = Math.cos(angle);
                x[2 * i + 1] = Math.sin(angle);
            }
            paths++;
            int end = track(x);
            if (end != DIVERGED && polish(x, end == STALLED)) {
                finite++;
                double norm = 0, imag = 0;
                for (int i = 0; i < n; i++) {
                    norm = Math.max(norm, Math.hypot(x[2 * i], x[2 * i + 1]));
                    imag = Math.max(imag, Math.abs(x[2 * i + 1]));
                }
                if (imag <= 1e-6 * (1 + norm)) {
                    real++;
                    double[] root = new double[n];
                    for (int i = 0; i < n; i++) {
                        root[i] = x[2 * i];
                    }
                    realRoots.add(root);
                }
            }
        }
        return new Result(paths, finite, real, realRoots, true);
    }

    private static final int REACHED = 0, STALLED = 1, DIVERGED = 2;

    /**
     * Follows one path from s = 0 to 1: REACHED s = 1, STALLED near it (a multiple root, or a slow path to
     * infinity), or DIVERGED (|x| beyond {@link #INFINITY}, or the tracker failed early).
     */
    private int track(double[] x) {
        double s = 0, ds = 0.01;
        int successes = 0, steps = 0;
        double[] saved = new double[2 * n];
        while (s < 1) {
            if (++steps > MAX_STEPS_PER_PATH) {
                return DIVERGED;
            }
            ds = Math.min(ds, 1 - s);
            System.arraycopy(x, 0, saved, 0, 2 * n);
            boolean ok = predict(x, s, ds) && correct(x, s + ds, 4, 1e-10);
            if (ok) {
                s = s + ds >= 1 - 1e-15 ? 1 : s + ds;
                if (++successes >= 3) {
                    ds = Math.min(MAX_STEP, 2 * ds);
                    successes = 0;
                }
                if (norm(x) > INFINITY) {
                    return DIVERGED;
                }
            } else {
                System.arraycopy(saved, 0, x, 0, 2 * n);
                ds *= 0.5;
                successes = 0;
                if (ds < MIN_STEP) {
                    // Near s = 1 a singular (multiple) root or a path to infinity stalls the tracker: let the
                    // end-point Newton polish decide whether x is close to a finite root.
                    return s > 0.9 && norm(x) < INFINITY ? STALLED : DIVERGED;
                }
            }
        }
        return REACHED;
    }

    /**
     * Newton on f itself at the end of a path; true if it settles on a root of moderate size. A stalled path counts
     * only if Newton stays near where the path stopped: a path on its way to infinity would jump to another root.
     */
    private boolean polish(double[] x, boolean stalled) {
        double[] before = x.clone();
        boolean converged = correct(x, 1.0, 30, 1e-13);
        if (stalled) {
            double moved = 0;
            for (int i = 0; i < n; i++) {
                moved = Math.max(moved, Math.hypot(x[2 * i] - before[2 * i], x[2 * i + 1] - before[2 * i + 1]));
            }
            if (!converged || moved > 1e-3 * (1 + norm(before))) {
                return false;
            }
        }
        homotopy(x, 1.0, true);
        double residual = 0, scale = 1;
        for (int i = 0; i < n; i++) {
            residual = Math.max(residual, Math.hypot(h[2 * i], h[2 * i + 1]));
        }
        for (double[] row : coefficients) {
            for (double v : row) {
                scale = Math.max(scale, Math.abs(v));
            }
        }
        double size = norm(x);
        return size < INFINITY && residual <= 1e-6 * scale * Math.pow(1 + size, maxDegree);
    }

    /** Classical RK4 step of dx/ds = −H_x⁻¹ H_s. */
    private boolean predict(double[] x, double s, double ds) {
        if (!tangent(x, s, k1)) {
            return false;
        }
        axpy(x, 0.5 * ds, k1, xt);
        if (!tangent(xt, s + 0.5 * ds, k2)) {
            return false;
        }
        axpy(x, 0.5 * ds, k2, xt);
        if (!tangent(xt, s + 0.5 * ds, k3)) {
            return false;
        }
        axpy(x, ds, k3, xt);
        if (!tangent(xt, s + ds, k4)) {
            return false;
        }
        for (int i = 0; i < 2 * n; i++) {
            x[i] += ds / 6 * (k1[i] + 2 * k2[i] + 2 * k3[i] + k4[i]);
        }
        return true;
    }

    private boolean tangent(double[] x, double s, double[] out) {
        homotopy(x, s, true);
        if (!lu.factor(jac)) {
            return false;
        }
        for (int i = 0; i < 2 * n; i++) {
            out[i] = -hs[i];
        }
        lu.solve(out);
        return Vectors.allFinite(out);
    }

    /** Newton iterations on H(·, s); true when the last step is below tol·(1 + |x|). */
    private boolean correct(double[] x, double s, int iterations, double tol) {
        double previous = Double.POSITIVE_INFINITY;
        for (int it = 0; it < iterations; it++) {
            homotopy(x, s, true);
            if (!lu.factor(jac)) {
                return false;
            }
            for (int i = 0; i < 2 * n; i++) {
                dx[i] = -h[i];
            }
            lu.solve(dx);
            double step = 0;
            for (int i = 0; i < n; i++) {
                x[2 * i] += dx[2 * i];
                x[2 * i + 1] += dx[2 * i + 1];
                step = Math.max(step, Math.hypot(dx[2 * i], dx[2 * i + 1]));
            }
            if (!Double.isFinite(step)) {
                return false;
            }
            if (it == 0 && iterations <= 4 && step > FIRST_CORRECTION * (1 + norm(x))) {
                return false; // the predictor went too far: shrink the step rather than risk jumping paths
            }
            if (step <= tol * (1 + norm(x))) {
                return true;
            }
            if (it > 0 && step > 0.5 * previous && iterations <= 4) {
                return false; // not contracting: the predictor went too far
            }
            previous = step;
        }
        return false;
    }

    /** H(x, s) into h, ∂H/∂s into hs and, if asked, ∂H/∂x into jac (row-major, complex). */
    private void homotopy(double[] x, double s, boolean withJacobian) {
        int stride = maxDegree + 1;
        for (int j = 0; j < n; j++) { // powers[j][k] = x_j^k
            int base = 2 * j * stride;
            powers[base] = 1;
            powers[base + 1] = 0;
            for (int k = 1; k <= maxDegree; k++) {
                double re = powers[base + 2 * (k - 1)], im = powers[base + 2 * (k - 1) + 1];
                powers[base + 2 * k] = re * x[2 * j] - im * x[2 * j + 1];
                powers[base + 2 * k + 1] = re * x[2 * j + 1] + im * x[2 * j];
            }
        }
        double a = 1 - s;
        java.util.Arrays.fill(jac, 0);
        for (int i = 0; i < n; i++) {
            double fr = 0, fi = 0;
            double[] c = coefficients[i];
            int[][] e = exponents[i];
            for (int t = 0; t < c.length; t++) {
                double mr = c[t], mi = 0;
                for (int j = 0; j < n; j++) {
                    int base = 2 * (j * stride + e[t][j]);
                    double pr = powers[base], pi = powers[base + 1];
                    double r = mr * pr - mi * pi;
                    mi = mr * pi + mi * pr;
                    mr = r;
                }
                fr += mr;
                fi += mi;
                if (withJacobian) {
                    for (int j = 0; j < n; j++) {
                        if (e[t][j] == 0) {
                            continue;
                        }
                        // d/dx_j of the monomial: c · e_j · x_j^{e_j − 1} · Π_{l≠j} x_l^{e_l}
                        double dr = c[t] * e[t][j], di = 0;
                        for (int l = 0; l < n; l++) {
                            int k = l == j ? e[t][l] - 1 : e[t][l];
                            int base = 2 * (l * stride + k);
                            double pr = powers[base], pi = powers[base + 1];
                            double r = dr * pr - di * pi;
                            di = dr * pi + di * pr;
                            dr = r;
                        }
                        jac[2 * (i * n + j)] += s * dr;
                        jac[2 * (i * n + j) + 1] += s * di;
                    }
                }
            }
            f[2 * i] = fr;
            f[2 * i + 1] = fi;
            // Start system g_i = x_i^{d_i} − 1 and its derivative d_i x_i^{d_i − 1}, scaled by γ(1 − s).
            int base = 2 * i * stride;
            double gr = powers[base + 2 * degrees[i]] - 1, gi = powers[base + 2 * degrees[i] + 1];
            g[2 * i] = gammaRe * gr - gammaIm * gi;
            g[2 * i + 1] = gammaRe * gi + gammaIm * gr;
            h[2 * i] = a * g[2 * i] + s * fr;
            h[2 * i + 1] = a * g[2 * i + 1] + s * fi;
            hs[2 * i] = fr - g[2 * i];
            hs[2 * i + 1] = fi - g[2 * i + 1];
            if (withJacobian) {
                double dr = degrees[i] * powers[base + 2 * (degrees[i] - 1)];
                double di = degrees[i] * powers[base + 2 * (degrees[i] - 1) + 1];
                jac[2 * (i * n + i)] += a * (gammaRe * dr - gammaIm * di);
                jac[2 * (i * n + i) + 1] += a * (gammaRe * di + gammaIm * dr);
            }
        }
    }

    private void axpy(double[] x, double a, double[] v, double[] out) {
        for (int i = 0; i < 2 * n; i++) {
            out[i] = x[i] + a * v[i];
        }
    }

    private double norm(double[] x) {
        double m = 0;
        for (int i = 0; i < n; i++) {
            m = Math.max(m, Math.hypot(x[2 * i], x[2 * i + 1]));
        }
        return m;
    }

    /** Complex LU with partial pivoting (row-major, interleaved re/im). */
    private static final class ComplexLu {
        private final int n;
        private final double[] a;
        private final int[] pivot;

        ComplexLu(int n) {
            this.n = n;
            this.a = new double[2 * n * n];
            this.pivot = new int[n];
        }

        boolean factor(double[] m) {
            System.arraycopy(m, 0, a, 0, a.length);
            for (int k = 0; k < n; k++) {
                int best = k;
                double bestAbs = -1;
                for (int i = k; i < n; i++) {
                    double v = Math.hypot(a[2 * (i * n + k)], a[2 * (i * n + k) + 1]);
                    if (v > bestAbs) {
                        bestAbs = v;
                        best = i;
                    }
                }
                pivot[k] = best;
                if (!(bestAbs > 0) || !Double.isFinite(bestAbs)) {
                    return false;
                }
                if (best != k) {
                    for (int j = 0; j < 2 * n; j++) {
                        double t = a[2 * k * n + j];
                        a[2 * k * n + j] = a[2 * best * n + j];
                        a[2 * best * n + j] = t;
                    }
                }
                double pr = a[2 * (k * n + k)], pi = a[2 * (k * n + k) + 1];
                double den = pr * pr + pi * pi;
                for (int i = k + 1; i < n; i++) {
                    double br = a[2 * (i * n + k)], bi = a[2 * (i * n + k) + 1];
                    double fr = (br * pr + bi * pi) / den, fi = (bi * pr - br * pi) / den;
                    a[2 * (i * n + k)] = fr;
                    a[2 * (i * n + k) + 1] = fi;
                    for (int j = k + 1; j < n; j++) {
                        double ur = a[2 * (k * n + j)], ui = a[2 * (k * n + j) + 1];
                        a[2 * (i * n + j)] -= fr * ur - fi * ui;
                        a[2 * (i * n + j) + 1] -= fr * ui + fi * ur;
                    }
                }
            }
            return true;
        }

        void solve(double[] b) {
            for (int k = 0; k < n; k++) {
                int p = pivot[k];
                if (p != k) {
                    double tr = b[2 * k], ti = b[2 * k + 1];
                    b[2 * k] = b[2 * p];
                    b[2 * k + 1] = b[2 * p + 1];
                    b[2 * p] = tr;
                    b[2 * p + 1] = ti;
                }
            }
            for (int i = 1; i < n; i++) {
                double sr = b[2 * i], si = b[2 * i + 1];
                for (int j = 0; j < i; j++) {
                    double lr = a[2 * (i * n + j)], li = a[2 * (i * n + j) + 1];
                    sr -= lr * b[2 * j] - li * b[2 * j + 1];
                    si -= lr * b[2 * j + 1] + li * b[2 * j];
                }
                b[2 * i] = sr;
                b[2 * i + 1] = si;
            }
            for (int i = n - 1; i >= 0; i--) {
                double sr = b[2 * i], si = b[2 * i + 1];
                for (int j = i + 1; j < n; j++) {
                    double ur = a[2 * (i * n + j)], ui = a[2 * (i * n + j) + 1];
                    sr -= ur * b[2 * j] - ui * b[2 * j + 1];
                    si -= ur * b[2 * j + 1] + ui * b[2 * j];
                }
                double pr = a[2 * (i * n + i)], pi = a[2 * (i * n + i) + 1];
                double den = pr * pr + pi * pi;
                b[2 * i] = (sr * pr + si * pi) / den;
                b[2 * i + 1] = (si * pr - sr * pi) / den;
            }
        }
    }
}
