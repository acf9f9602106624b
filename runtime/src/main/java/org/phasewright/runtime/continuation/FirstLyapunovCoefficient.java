package org.phasewright.runtime.continuation;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.phasewright.runtime.compile.VectorField;

/**
 * The first Lyapunov coefficient l1 at a Hopf point, by the invariant formula of Kuznetsov, Elements of Applied
 * Bifurcation Theory (3rd ed., 2004), (3.20):
 * <pre>
 * l1 = Re( ⟨p, C(q,q,q̄)⟩ − 2⟨p, B(q, A⁻¹B(q,q̄))⟩ + ⟨p, B(q̄, (2iωI − A)⁻¹B(q,q))⟩ ) / (2ω)
 * </pre>
 * with Aq = iωq, Aᵀp = −iωp, ⟨q,q⟩ = ⟨p,q⟩ = 1. l1 &lt; 0: supercritical (a stable cycle is born); l1 &gt; 0:
 * subcritical. The multilinear forms B and C come from central differences of the exact Jacobian (first and
 * second differences, errors O(h²)); complex arguments are split into real and imaginary parts. The eigenvectors
 * are kernel vectors of the real 2n×2n forms of A − iωI and Aᵀ + iωI, from a singular value decomposition.
 */
public final class FirstLyapunovCoefficient {
    private final VectorField field;
    private final double[] p;
    private final double[] u;
    private final int n;
    private final double scale;
    private final double[] jacPlus, jacMinus, shifted;

    private FirstLyapunovCoefficient(VectorField field, double[] parameters, double[] equilibrium) {
        this.field = field;
        this.p = parameters.clone();
        this.u = equilibrium.clone();
        this.n = field.dimension();
        double s = 1;
        for (double v : u) {
            s = Math.max(s, Math.abs(v));
        }
        this.scale = s;
        this.jacPlus = new double[n * n];
        this.jacMinus = new double[n * n];
        this.shifted = new double[n];
    }

    /**
     * @param omega the imaginary part of the critical eigenvalue pair (positive)
     * @return l1, or NaN when A is singular or the eigenvectors cannot be found
     */
    public static double at(VectorField field, double[] parameters, double[] equilibrium, double omega) {
        return new FirstLyapunovCoefficient(field, parameters, equilibrium).compute(Math.abs(omega));
    }

    private double compute(double omega) {
        double[] a = new double[n * n];
        field.jacobian(0.0, u, p, a);
        double[][] q = kernel(a, omega, false);
        double[][] pv = kernel(a, omega, true);
        if (q == null || pv == null) {
            return Double.NaN;
        }
        normalise(q);
        // scale p so that <p, q> = sum conj(p_i) q_i = 1
        double[] s = inner(pv, q);
        double d = s[0] * s[0] + s[1] * s[1];
        if (!(d > 0)) {
            return Double.NaN;
        }
        // p <- p / conj(s): (pr + i pi)(sr + i si)/|s|^2
        for (int i = 0; i < n; i++) {
            double re = (pv[0][i] * s[0] - pv[1][i] * s[1]) / d;
            double im = (pv[0][i] * s[1] + pv[1][i] * s[0]) / d;
            pv[0][i] = re;
            pv[1][i] = im;
        }
        double[][] qBar = {q[0].clone(), negate(q[1])};

        double[] term1 = inner(pv, trilinear(q, q, qBar));

        double[][] bqqBar = bilinear(q, qBar); // real up to rounding
        RealMatrix am = matrix(a, n);
        LUDecomposition luA = new LUDecomposition(am);
        if (!luA.getSolver().isNonSingular()) {
            return Double.NaN;
        }
        double[] r = luA.getSolver().solve(new ArrayRealVector(bqqBar[0])).toArray();
        double[] term2 = inner(pv, bilinear(q, new double[][] {r, new double[n]}));

        double[][] bqq = bilinear(q, q);
        double[][] big = new double[2 * n][2 * n]; // real form of 2iωI − A
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                big[i][j] = -a[i * n + j];
                big[n + i][n + j] = -a[i * n + j];
            }
            big[i][n + i] = -2 * omega;
            big[n + i][i] = 2 * omega;
        }
        double[] rhs = new double[2 * n];
        System.arraycopy(bqq[0], 0, rhs, 0, n);
        System.arraycopy(bqq[1], 0, rhs, n, n);
        LUDecomposition luBig = new LUDecomposition(new Array2DRowRealMatrix(big, false));
        if (!luBig.getSolver().isNonSingular()) {
            return Double.NaN;
        }
        double[] w = luBig.getSolver().solve(new ArrayRealVector(rhs)).toArray();
        double[][] wc = {java.util.Arrays.copyOfRange(w, 0, n), java.util.Arrays.copyOfRange(w, n, 2 * n)};
        double[] term3 = inner(pv, bilinear(qBar, wc));

        return (term1[0] - 2 * term2[0] + term3[0]) / (2 * omega);
    }

    /** A unit kernel vector {re, im} of A − iωI, or of Aᵀ + iωI when {@code adjoint}. */
    private double[][] kernel(double[] a, double omega, boolean adjoint) {
        double[][] m = new double[2 * n][2 * n];
        double w = adjoint ? -omega : omega;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double v = adjoint ? a[j * n + i] : a[i * n + j];
                m[i][j] = v;
                m[n + i][n + j] = v;
            }
            // (M − iwI)(x + iy) = (Mx + wy) + i(My − wx)
            m[i][n + i] = w;
            m[n + i][i] = -w;
        }
        try {
            SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(m, false));
            double[][] v = svd.getV().getData();
            int column = 2 * n - 1;
            double[][] out = new double[2][n];
            for (int i = 0; i < n; i++) {
                out[0][i] = v[i][column];
                out[1][i] = v[n + i][column];
            }
            return out;
        } catch (RuntimeException e) {
            return null;
        }
    }

    /** B(x, y) for complex x, y: d/dh [J(u + h x) y] by a central difference. */
    private double[][] bilinear(double[][] x, double[][] y) {
        double[] rr = realBilinear(x[0], y[0]), ii = realBilinear(x[1], y[1]);
        double[] ri = realBilinear(x[0], y[1]), ir = realBilinear(x[1], y[0]);
        double[][] out = new double[2][n];
        for (int i = 0; i < n; i++) {
            out[0][i] = rr[i] - ii[i];
            out[1][i] = ri[i] + ir[i];
        }
        return out;
    }

    private double[] realBilinear(double[] x, double[] y) {
        double h = 1e-5 * scale;
        jacobianAt(x, h, null, 0, jacPlus);
        jacobianAt(x, -h, null, 0, jacMinus);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            double s = 0;
            for (int j = 0; j < n; j++) {
                s += (jacPlus[i * n + j] - jacMinus[i * n + j]) * y[j];
            }
            out[i] = s / (2 * h);
        }
        return out;
    }

    /** C(x, y, z) for complex arguments: each real combination carries the factor i^(number of imaginary parts). */
    private double[][] trilinear(double[][] x, double[][] y, double[][] z) {
        double[][] out = new double[2][n];
        for (int a = 0; a < 2; a++) {
            for (int b = 0; b < 2; b++) {
                for (int c = 0; c < 2; c++) {
                    double[] t = realTrilinear(x[a], y[b], z[c]);
                    int k = a + b + c; // i^k: 1, i, -1, -i
                    int part = k % 2;
                    double sign = (k == 2 || k == 3) ? -1 : 1;
                    for (int i = 0; i < n; i++) {
                        out[part][i] += sign * t[i];
                    }
                }
            }
        }
        return out;
    }

    /** [J(u+hx+hy) − J(u+hx−hy) − J(u−hx+hy) + J(u−hx−hy)] z / (4h²). */
    private double[] realTrilinear(double[] x, double[] y, double[] z) {
        double h = 1e-3 * scale;
        double[] out = new double[n];
        double[] jac = new double[n * n];
        int[][] signs = {{1, 1}, {1, -1}, {-1, 1}, {-1, -1}};
        for (int[] s : signs) {
            jacobianAt(x, s[0] * h, y, s[1] * h, jac);
            double w = s[0] * s[1];
            for (int i = 0; i < n; i++) {
                double sum = 0;
                for (int j = 0; j < n; j++) {
                    sum += jac[i * n + j] * z[j];
                }
                out[i] += w * sum;
            }
        }
        for (int i = 0; i < n; i++) {
            out[i] /= 4 * h * h;
        }
        return out;
    }

    private void jacobianAt(double[] x, double hx, double[] y, double hy, double[] out) {
        for (int i = 0; i < n; i++) {
            shifted[i] = u[i] + hx * x[i] + (y == null ? 0 : hy * y[i]);
        }
        field.jacobian(0.0, shifted, p, out);
    }

    /** ⟨a, b⟩ = Σ conj(a_i) b_i as {re, im}. */
    private double[] inner(double[][] a, double[][] b) {
        double re = 0, im = 0;
        for (int i = 0; i < n; i++) {
            re += a[0][i] * b[0][i] + a[1][i] * b[1][i];
            im += a[0][i] * b[1][i] - a[1][i] * b[0][i];
        }
        return new double[] {re, im};
    }

    private void normalise(double[][] q) {
        double s = Math.sqrt(inner(q, q)[0]);
        for (int i = 0; i < n; i++) {
            q[0][i] /= s;
            q[1][i] /= s;
        }
    }

    private static double[] negate(double[] a) {
        double[] out = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            out[i] = -a[i];
        }
        return out;
    }

    private static RealMatrix matrix(double[] a, int n) {
        double[][] m = new double[n][n];
        for (int i = 0; i < n; i++) {
            System.arraycopy(a, i * n, m[i], 0, n);
        }
        return new Array2DRowRealMatrix(m, false);
    }
}
