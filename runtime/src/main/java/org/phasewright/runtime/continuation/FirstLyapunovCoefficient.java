package org.phasewright.runtime.continuation;

import java.util.Arrays;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.SingularValueDecomposition;
import org.phasewright.runtime.compile.SparseJacobian;
import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.linalg.SparseLu;
import org.phasewright.runtime.linalg.SparseMatrix;
import org.phasewright.runtime.linalg.SparsePattern;
import org.phasewright.runtime.linalg.Vectors;

/**
 * The first Lyapunov coefficient l1 at a Hopf point, by the invariant formula of Kuznetsov, Elements of Applied
 * Bifurcation Theory (3rd ed., 2004), (3.20):
 * <pre>
 * l1 = Re( ⟨p, C(q,q,q̄)⟩ − 2⟨p, B(q, A⁻¹B(q,q̄))⟩ + ⟨p, B(q̄, (2iωI − A)⁻¹B(q,q))⟩ ) / (2ω)
 * </pre>
 * with Aq = iωq, Aᵀp = −iωp, ⟨q,q⟩ = ⟨p,q⟩ = 1. l1 &lt; 0: supercritical (a stable cycle is born); l1 &gt; 0:
 * subcritical. The multilinear forms B and C come from central differences of the exact Jacobian (first and
 * second differences, errors O(h²)); complex arguments are split into real and imaginary parts. The eigenvectors
 * are kernel vectors of the real 2n×2n forms of A − iωI and Aᵀ + iωI: from a singular value decomposition for a
 * dense Jacobian, by inverse iteration with a sparse LU of those forms for a large model (whose Jacobian is sparse).
 */
public final class FirstLyapunovCoefficient {
    private final double[] u;
    private final int n;
    private final double scale;
    private final Operations ops;

    private FirstLyapunovCoefficient(VectorField field, double[] parameters, double[] equilibrium) {
        this.u = equilibrium.clone();
        this.n = field.dimension();
        double s = 1;
        for (double v : u) {
            s = Math.max(s, Math.abs(v));
        }
        this.scale = s;
        this.ops = field.large() ? new SparseOperations(field, parameters.clone(), u)
                : new DenseOperations(field, parameters.clone(), u);
    }

    /**
     * @param omega the imaginary part of the critical eigenvalue pair (positive)
     * @return l1, or NaN when A is singular or the eigenvectors cannot be found
     */
    public static double at(VectorField field, double[] parameters, double[] equilibrium, double omega) {
        if (field.large() && field.sparseJacobian() == null) {
            return Double.NaN;
        }
        return new FirstLyapunovCoefficient(field, parameters, equilibrium).compute(Math.abs(omega));
    }

    private double compute(double omega) {
        double[][] q = ops.kernel(omega, false);
        double[][] pv = ops.kernel(omega, true);
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
        double[] r = ops.solve(bqqBar[0]);
        if (r == null) {
            return Double.NaN;
        }
        double[] term2 = inner(pv, bilinear(q, new double[][] {r, new double[n]}));

        double[][] wc = ops.solveShifted(omega, bilinear(q, q));
        if (wc == null) {
            return Double.NaN;
        }
        double[] term3 = inner(pv, bilinear(qBar, wc));

        return (term1[0] - 2 * term2[0] + term3[0]) / (2 * omega);
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
        double[] plus = ops.jacobianTimes(shifted(x, h, null, 0), y);
        double[] minus = ops.jacobianTimes(shifted(x, -h, null, 0), y);
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            out[i] = (plus[i] - minus[i]) / (2 * h);
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
        int[][] signs = {{1, 1}, {1, -1}, {-1, 1}, {-1, -1}};
        for (int[] s : signs) {
            double[] jz = ops.jacobianTimes(shifted(x, s[0] * h, y, s[1] * h), z);
            double w = s[0] * s[1];
            for (int i = 0; i < n; i++) {
                out[i] += w * jz[i];
            }
        }
        for (int i = 0; i < n; i++) {
            out[i] /= 4 * h * h;
        }
        return out;
    }

    private double[] shifted(double[] x, double hx, double[] y, double hy) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = u[i] + hx * x[i] + (y == null ? 0 : hy * y[i]);
        }
        return v;
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

    /** The real form (re, im) of a complex vector {re, im}, of length 2n. */
    private static double[] realForm(double[][] b) {
        int n = b[0].length;
        double[] x = new double[2 * n];
        System.arraycopy(b[0], 0, x, 0, n);
        System.arraycopy(b[1], 0, x, n, n);
        return x;
    }

    /** The complex vector {re, im} of a real form (re, im). */
    private static double[][] complex(double[] x) {
        int n = x.length / 2;
        return new double[][] {Arrays.copyOfRange(x, 0, n), Arrays.copyOfRange(x, n, 2 * n)};
    }

    /** The linear algebra l1 needs at one equilibrium u. */
    private interface Operations {
        /** J(v) y, the Jacobian at state v times y. */
        double[] jacobianTimes(double[] v, double[] y);

        /** A kernel vector {re, im} of A − iωI, or of Aᵀ + iωI when {@code adjoint}; null if none is found. */
        double[][] kernel(double omega, boolean adjoint);

        /** A⁻¹ b; null when A is singular. */
        double[] solve(double[] b);

        /** (2iωI − A)⁻¹ b for complex b = {re, im}; null when singular. */
        double[][] solveShifted(double omega, double[][] b);
    }

    /** Dense Jacobians, commons-math LU and SVD. */
    private static final class DenseOperations implements Operations {
        private final VectorField field;
        private final double[] p;
        private final int n;
        private final double[] a, jac;

        DenseOperations(VectorField field, double[] p, double[] u) {
            this.field = field;
            this.p = p;
            this.n = field.dimension();
            this.a = new double[n * n];
            this.jac = new double[n * n];
            field.jacobian(0.0, u, p, a);
        }

        @Override
        public double[] jacobianTimes(double[] v, double[] y) {
            field.jacobian(0.0, v, p, jac);
            double[] out = new double[n];
            for (int i = 0; i < n; i++) {
                double s = 0;
                for (int j = 0; j < n; j++) {
                    s += jac[i * n + j] * y[j];
                }
                out[i] = s;
            }
            return out;
        }

        @Override
        public double[][] kernel(double omega, boolean adjoint) {
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

        @Override
        public double[] solve(double[] b) {
            double[][] m = new double[n][n];
            for (int i = 0; i < n; i++) {
                System.arraycopy(a, i * n, m[i], 0, n);
            }
            LUDecomposition lu = new LUDecomposition(new Array2DRowRealMatrix(m, false));
            if (!lu.getSolver().isNonSingular()) {
                return null;
            }
            return lu.getSolver().solve(new ArrayRealVector(b)).toArray();
        }

        @Override
        public double[][] solveShifted(double omega, double[][] b) {
            double[][] big = new double[2 * n][2 * n]; // real form of 2iωI − A
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    big[i][j] = -a[i * n + j];
                    big[n + i][n + j] = -a[i * n + j];
                }
                big[i][n + i] = -2 * omega;
                big[n + i][i] = 2 * omega;
            }
            LUDecomposition lu = new LUDecomposition(new Array2DRowRealMatrix(big, false));
            if (!lu.getSolver().isNonSingular()) {
                return null;
            }
            return complex(lu.getSolver().solve(new ArrayRealVector(realForm(b))).toArray());
        }
    }

    /**
     * A sparse Jacobian and sparse LU: complex systems in their real 2n×2n form [[M, cI], [−cI, M]], kernel
     * vectors by inverse iteration (the form is singular up to the accuracy of ω).
     */
    private static final class SparseOperations implements Operations {
        private final SparseJacobian sparse;
        private final double[] p;
        private final int n;
        private final SparseMatrix a, scratch;

        SparseOperations(VectorField field, double[] p, double[] u) {
            this.sparse = field.sparseJacobian();
            this.p = p;
            this.n = field.dimension();
            this.a = sparse.newMatrix();
            this.scratch = sparse.newMatrix();
            sparse.values(0.0, u, p, a.values());
        }

        @Override
        public double[] jacobianTimes(double[] v, double[] y) {
            sparse.values(0.0, v, p, scratch.values());
            double[] out = new double[n];
            scratch.multiply(y, out);
            return out;
        }

        @Override
        public double[][] kernel(double omega, boolean adjoint) {
            // (M − iwI)(x + iy) = (Mx + wy) + i(My − wx), w = ω for A, −ω for Aᵀ
            double w = adjoint ? -omega : omega;
            SparseMatrix m = adjoint ? a.transpose() : a;
            SparseMatrix form = complexForm(m, 1, w);
            SparseLu lu = new SparseLu(form.pattern());
            if (!lu.factor(form)) {
                form = complexForm(m, 1, w * (1 + 1e-12)); // singular to working precision: a hair off
                lu = new SparseLu(form.pattern());
                if (!lu.factor(form)) {
                    return null;
                }
            }
            java.util.SplittableRandom random = new java.util.SplittableRandom(adjoint ? 41 : 43);
            double[] z = new double[2 * n];
            for (int i = 0; i < 2 * n; i++) {
                z[i] = random.nextDouble() - 0.5;
            }
            for (int iteration = 0; iteration < 3; iteration++) {
                lu.solve(z);
                double norm = Math.sqrt(Vectors.dot(z, z));
                if (!(norm > 0) || !Double.isFinite(norm)) {
                    return null;
                }
                for (int i = 0; i < 2 * n; i++) {
                    z[i] /= norm;
                }
            }
            return complex(z);
        }

        @Override
        public double[] solve(double[] b) {
            SparseLu lu = new SparseLu(a.pattern());
            if (!lu.factor(a)) {
                return null;
            }
            double[] x = b.clone();
            lu.solve(x);
            return x;
        }

        @Override
        public double[][] solveShifted(double omega, double[][] b) {
            // 2iωI − A = −(A − 2iωI), whose real form is −[[A, 2ωI], [−2ωI, A]]
            SparseMatrix form = complexForm(a, -1, 2 * omega);
            SparseLu lu = new SparseLu(form.pattern());
            if (!lu.factor(form)) {
                return null;
            }
            double[] x = realForm(b);
            lu.solve(x);
            return complex(x);
        }

        /** sign · [[M, cI], [−cI, M]] (2n×2n): the real form of sign · (M − icI). */
        private static SparseMatrix complexForm(SparseMatrix m, double sign, double c) {
            SparsePattern pm = m.pattern();
            int n = pm.dimension(), nnz = pm.nonZeros();
            int[] start = new int[2 * n + 1];
            int[] cols = new int[2 * nnz + 2 * n];
            double[] values = new double[cols.length];
            int next = 0;
            for (int i = 0; i < n; i++) { // rows of the real part: M, then cI
                start[i] = next;
                for (int k = pm.rowStart(i); k < pm.rowEnd(i); k++) {
                    cols[next] = pm.column(k);
                    values[next++] = sign * m.values()[k];
                }
                cols[next] = n + i;
                values[next++] = sign * c;
            }
            for (int i = 0; i < n; i++) { // rows of the imaginary part: −cI, then M
                start[n + i] = next;
                cols[next] = i;
                values[next++] = -sign * c;
                for (int k = pm.rowStart(i); k < pm.rowEnd(i); k++) {
                    cols[next] = n + pm.column(k);
                    values[next++] = sign * m.values()[k];
                }
            }
            start[2 * n] = next;
            return new SparseMatrix(new SparsePattern(2 * n, start, cols), values);
        }
    }
}
