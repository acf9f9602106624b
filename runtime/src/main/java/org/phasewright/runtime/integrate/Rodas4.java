package org.phasewright.runtime.integrate;

import java.util.Arrays;

import org.phasewright.runtime.compile.SparseJacobian;
import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.linalg.DenseLu;
import org.phasewright.runtime.linalg.SparseLu;
import org.phasewright.runtime.linalg.SparseMatrix;
import org.phasewright.runtime.linalg.SparsePattern;
import org.phasewright.runtime.linalg.Vectors;

/**
 * Stiffly accurate Rosenbrock method RODAS4 of Hairer and Wanner: six stages, order 4 with an embedded order-3
 * solution, L-stable, with a 3rd-order continuous extension. The coefficients (transformed form a_ij, c_ij, γ_i,
 * coefficient set METH = 1) and the step-size control are those of Hairer's code RODAS that accompanies Hairer &amp;
 * Wanner, Solving Ordinary Differential Equations II (2nd ed., 1996), where Rosenbrock methods are treated in
 * Sections IV.7 and VI.4.
 * <p>
 * Each step uses the exact Jacobian of the compiled model, one LU factorisation of I/(hγ) − J and six linear solves.
 * The time derivative of non-autonomous rates is taken by a forward difference. The step loop allocates nothing.
 * <p>
 * Large models ({@link VectorField#large()}) form I/(hγ) − J from the sparse Jacobian and factor it with a sparse
 * LU, so memory grows with the nonzeros rather than with n².
 */
public final class Rodas4 implements Integrator {
    private static final double GAMMA = 0.25;
    private static final double C2 = 0.386, C3 = 0.21, C4 = 0.63;
    private static final double D1 = 0.25, D2 = -0.1043, D3 = 0.1035, D4 = -0.3620000000000023e-01;
    private static final double A21 = 0.1544000000000000e+01;
    private static final double A31 = 0.9466785280815826e+00, A32 = 0.2557011698983284e+00;
    private static final double A41 = 0.3314825187068521e+01, A42 = 0.2896124015972201e+01,
            A43 = 0.9986419139977817e+00;
    private static final double A51 = 0.1221224509226641e+01, A52 = 0.6019134481288629e+01,
            A53 = 0.1253708332932087e+02, A54 = -0.6878860361058950e+00;
    private static final double C21 = -0.5668800000000000e+01;
    private static final double C31 = -0.2430093356833875e+01, C32 = -0.2063599157091915e+00;
    private static final double C41 = -0.1073529058151375e+00, C42 = -0.9594562251023355e+01,
            C43 = -0.2047028614809616e+02;
    private static final double C51 = 0.7496443313967647e+01, C52 = -0.1024680431464352e+02,
            C53 = -0.3399990352819905e+02, C54 = 0.1170890893206160e+02;
    private static final double C61 = 0.8083246795921522e+01, C62 = -0.7981132988064893e+01,
            C63 = -0.3152159432874371e+02, C64 = 0.1631930543123136e+02, C65 = -0.6058818238834054e+01;
    // Dense output: y(θ) = (1−θ)·y0 + θ·(y1 + (1−θ)·(q1 + θ·q2)), q1 = Σ D2j k_j, q2 = Σ D3j k_j.
    private static final double E21 = 0.1012623508344586e+02, E22 = -0.7487995877610167e+01,
            E23 = -0.3480091861555747e+02, E24 = -0.7992771707568823e+01, E25 = 0.1025137723295662e+01;
    private static final double E31 = -0.6762803392801253e+00, E32 = 0.6087714651680015e+01,
            E33 = 0.1643084320892478e+02, E34 = 0.2476722511418386e+02, E35 = -0.6594389125716872e+01;

    // Step-size control of RODAS: the step ratio stays within [1/6, 5], safety factor 0.9, exponent 1/4, with
    // Gustafsson's predictive correction.
    private static final double SAFETY = 0.9, RATIO_MIN = 0.2, RATIO_MAX = 6.0;
    private static final double UROUND = 2.3e-16;

    private final VectorField field;
    private final double[] p;
    private final int n;
    private final boolean autonomous;
    private double[] y, yNew;
    private final double[] f0, ft, fs, yStage, k1, k2, k3, k4, k5, k6, jac, matrix, q1, q2, yOld;
    private final DenseLu lu;
    /** Sparse path (null on the dense one): J, the iteration matrix W = I/(hγ) − J and where J's slots go in W. */
    private final SparseJacobian sparse;
    private final SparseMatrix sparseJac, sparseW;
    private final int[] jacobianSlots, diagonalSlots;
    private final SparseLu sparseLu;
    private final Dense dense = new Dense();

    /** @param autonomous true when the rates do not depend on time (saves the time-derivative evaluation) */
    public Rodas4(VectorField field, double[] parameters, boolean autonomous) {
        this.field = field;
        this.p = parameters.clone();
        this.n = field.dimension();
        this.autonomous = autonomous;
        y = new double[n];
        yNew = new double[n];
        yOld = new double[n];
        f0 = new double[n];
        ft = new double[n];
        fs = new double[n];
        yStage = new double[n];
        k1 = new double[n];
        k2 = new double[n];
        k3 = new double[n];
        k4 = new double[n];
        k5 = new double[n];
        k6 = new double[n];
        q1 = new double[n];
        q2 = new double[n];
        if (field.large()) {
            sparse = field.sparseJacobian();
            if (sparse == null) {
                throw new IllegalArgumentException("the stiff solver needs a sparse Jacobian for a model of " + n
                        + " states");
            }
            sparseJac = sparse.newMatrix();
            SparsePattern w = sparseJac.pattern().withDiagonal();
            sparseW = new SparseMatrix(w);
            jacobianSlots = w.slotsOf(sparseJac.pattern());
            diagonalSlots = new int[n];
            for (int i = 0; i < n; i++) {
                diagonalSlots[i] = w.find(i, i);
            }
            sparseLu = new SparseLu(w);
            jac = null;
            matrix = null;
            lu = null;
        } else {
            sparse = null;
            sparseJac = null;
            sparseW = null;
            jacobianSlots = null;
            diagonalSlots = null;
            sparseLu = null;
            jac = new double[n * n];
            matrix = new double[n * n];
            lu = new DenseLu(n);
        }
    }

    /** Evaluates J at (t, y) into the dense or sparse buffer; false when it is not finite. */
    private boolean evaluateJacobian(double t) {
        if (sparse != null) {
            sparse.values(t, y, p, sparseJac.values());
            return sparseJac.allFinite();
        }
        field.jacobian(t, y, p, jac);
        return Vectors.allFinite(jac);
    }

    /** Factors I·fac − J; false when singular. */
    private boolean factor(double fac) {
        if (sparse != null) {
            double[] w = sparseW.values();
            double[] j = sparseJac.values();
            Arrays.fill(w, 0.0);
            for (int s = 0; s < j.length; s++) {
                w[jacobianSlots[s]] = -j[s];
            }
            for (int i = 0; i < n; i++) {
                w[diagonalSlots[i]] += fac;
            }
            return sparseLu.factor(sparseW);
        }
        for (int i = 0; i < n * n; i++) {
            matrix[i] = -jac[i];
        }
        for (int i = 0; i < n; i++) {
            matrix[i * n + i] += fac;
        }
        return lu.factor(matrix);
    }

    private void solve(double[] b) {
        if (sparse != null) {
            sparseLu.solve(b);
        } else {
            lu.solve(b);
        }
    }

    @Override
    public IntegrationOutcome integrate(double t0, double[] u0, double tEnd, IntegratorSettings s,
            StepObserver observer) {
        AdaptiveStepDriver b = new AdaptiveStepDriver(s, observer, dense);
        IntegrationOutcome early = b.begin(t0, u0, tEnd, y, field, p, null);
        if (early != null) {
            return early;
        }
        double t = t0;
        double[] rtol = s.relativeTolerances(n);
        double[] atol = s.absoluteTolerances(n);
        double direction = b.direction;
        // RODAS starts with 1e-6 unless told otherwise; the controller grows it quickly.
        double h = direction * Math.min(s.initialStep() > 0 ? s.initialStep() : 1e-6, b.hMax);
        boolean needJacobian = true;
        double hAccepted = h, errAccepted = 1e-2;

        while (true) {
            IntegrationOutcome budget = b.beforeAttempt(t, y, h);
            if (budget != null) {
                return budget;
            }
            boolean last = false;
            if (b.reachesEnd(t, h, tEnd, 1.0001)) {
                h = tEnd - t;
                last = true;
            }
            if (needJacobian) { // once per accepted point: a rejected step retries with the same J and f
                field.rates(t, y, p, f0);
                boolean finiteJacobian = evaluateJacobian(t);
                b.evaluations++;
                if (!autonomous) {
                    double delta = Math.sqrt(UROUND * Math.max(1e-5, Math.abs(t)));
                    field.rates(t + delta, y, p, ft);
                    b.evaluations++;
                    for (int i = 0; i < n; i++) {
                        ft[i] = (ft[i] - f0[i]) / delta;
                    }
                }
                if (!Vectors.allFinite(f0) || !finiteJacobian) {
                    return b.outcome(IntegrationOutcome.Ending.NOT_FINITE, t, y, h);
                }
                needJacobian = false;
            }
            double fac = 1 / (h * GAMMA);
            if (!factor(fac)) { // singular: retry with a smaller step
                b.reject();
                h *= 0.5;
                continue;
            }
            double hd1 = h * D1, hd2 = h * D2, hd3 = h * D3, hd4 = h * D4;
            // Stage 1
            for (int i = 0; i < n; i++) {
                k1[i] = f0[i] + (autonomous ? 0 : hd1 * ft[i]);
            }
            solve(k1);
            // Stage 2
            for (int i = 0; i < n; i++) {
                yStage[i] = y[i] + A21 * k1[i];
            }
            field.rates(t + C2 * h, yStage, p, fs);
            for (int i = 0; i < n; i++) {
                k2[i] = fs[i] + C21 * k1[i] / h + (autonomous ? 0 : hd2 * ft[i]);
            }
            solve(k2);
            // Stage 3
            for (int i = 0; i < n; i++) {
                yStage[i] = y[i] + A31 * k1[i] + A32 * k2[i];
            }
            field.rates(t + C3 * h, yStage, p, fs);
            for (int i = 0; i < n; i++) {
                k3[i] = fs[i] + (C31 * k1[i] + C32 * k2[i]) / h + (autonomous ? 0 : hd3 * ft[i]);
            }
            solve(k3);
            // Stage 4
            for (int i = 0; i < n; i++) {
                yStage[i] = y[i] + A41 * k1[i] + A42 * k2[i] + A43 * k3[i];
            }
            field.rates(t + C4 * h, yStage, p, fs);
            for (int i = 0; i < n; i++) {
                k4[i] = fs[i] + (C41 * k1[i] + C42 * k2[i] + C43 * k3[i]) / h + (autonomous ? 0 : hd4 * ft[i]);
            }
            solve(k4);
            // Stage 5 at t + h
            for (int i = 0; i < n; i++) {
                yStage[i] = y[i] + A51 * k1[i] + A52 * k2[i] + A53 * k3[i] + A54 * k4[i];
            }
            double tNew = last ? tEnd : t + h;
            field.rates(tNew, yStage, p, fs);
            for (int i = 0; i < n; i++) {
                k5[i] = fs[i] + (C51 * k1[i] + C52 * k2[i] + C53 * k3[i] + C54 * k4[i]) / h;
            }
            solve(k5);
            // Stage 6 (embedded): its correction k6 is the error estimate
            for (int i = 0; i < n; i++) {
                yStage[i] += k5[i];
            }
            field.rates(tNew, yStage, p, fs);
            for (int i = 0; i < n; i++) {
                k6[i] = fs[i] + (C61 * k1[i] + C62 * k2[i] + C63 * k3[i] + C64 * k4[i] + C65 * k5[i]) / h;
            }
            solve(k6);
            b.evaluations += 5;
            double err = 0;
            for (int i = 0; i < n; i++) {
                yNew[i] = yStage[i] + k6[i];
                double sk = atol[i] + rtol[i] * Math.max(Math.abs(y[i]), Math.abs(yNew[i]));
                double e = k6[i] / sk;
                err += e * e;
            }
            err = Math.sqrt(err / n);
            if (b.rejectedAsNotFinite(!Double.isFinite(err) || !Vectors.allFinite(yNew))) {
                h *= 0.2;
                continue;
            }
            double ratio = Math.max(1 / RATIO_MAX, Math.min(1 / RATIO_MIN, Math.pow(err, 0.25) / SAFETY));
            double hNew = h / ratio;
            if (err <= 1.0) {
                b.accepted++;
                // Predictive controller of Gustafsson (1994), as in RODAS: also look at the previous step's error.
                if (b.accepted > 1) {
                    double predicted = (hAccepted / h) * Math.pow(err * err / errAccepted, 0.25) / SAFETY;
                    predicted = Math.max(1 / RATIO_MAX, Math.min(1 / RATIO_MIN, predicted));
                    hNew = h / Math.max(ratio, predicted);
                }
                hAccepted = h;
                errAccepted = Math.max(1e-2, err);
                if (observer != null) {
                    for (int i = 0; i < n; i++) {
                        q1[i] = E21 * k1[i] + E22 * k2[i] + E23 * k3[i] + E24 * k4[i] + E25 * k5[i];
                        q2[i] = E31 * k1[i] + E32 * k2[i] + E33 * k3[i] + E34 * k4[i] + E35 * k5[i];
                        yOld[i] = y[i];
                    }
                }
                double tOld = t;
                t = tNew;
                double[] swap = y;
                y = yNew;
                yNew = swap;
                needJacobian = true;
                IntegrationOutcome end = b.accept(tOld, t, h, y, last);
                if (end != null) {
                    return end;
                }
                hNew = b.nextStep(hNew, h);
            } else {
                b.reject();
            }
            h = hNew;
        }
    }

    /** The last accepted step with the 3rd-order continuous extension (q1, q2, yOld set before the swap). */
    private final class Dense extends AdaptiveStepDriver.View {
        @Override
        public void stateAt(double t, double[] out) {
            double s = (t - tOld) / h;
            double s1 = 1 - s;
            for (int i = 0; i < n; i++) {
                out[i] = yOld[i] * s1 + s * (y[i] + s1 * (q1[i] + s * q2[i]));
            }
        }
    }
}
