package org.phasewright.runtime.integrate;

import org.phasewright.runtime.compile.VectorField;

/**
 * Explicit Runge–Kutta method of Dormand and Prince, order 5 with an embedded order-4 error estimate, following
 * Hairer, Nørsett &amp; Wanner, Solving Ordinary Differential Equations I (2nd ed., 1993), Section II.5 and their
 * code DOPRI5: first-same-as-last stages, the PI ("Lund-stabilised") step-size controller, the automatic initial step
 * of Section II.4, and the 4th-order continuous extension (dense output) of Section II.6.
 * <p>
 * An instance owns its work arrays, so the step loop allocates nothing; it is not thread-safe but can be reused.
 * <p>
 * Stiffness detection follows DOPRI5 (HNW II, Section IV.2, from memory): stages 6 and 7 are both evaluated at
 * t+h, so |h|·‖k7−k6‖/‖y7−y6‖ estimates |h·λ| for the dominant eigenvalue; when it stays beyond the method's
 * stability boundary (3.25) for 15 tested steps the outcome reports the time.
 */
public final class DormandPrince54 implements Integrator {
    // Butcher tableau, HNW Table 5.2.
    static final double C2 = 1.0 / 5, C3 = 3.0 / 10, C4 = 4.0 / 5, C5 = 8.0 / 9;
    static final double A21 = 1.0 / 5;
    static final double A31 = 3.0 / 40, A32 = 9.0 / 40;
    static final double A41 = 44.0 / 45, A42 = -56.0 / 15, A43 = 32.0 / 9;
    static final double A51 = 19372.0 / 6561, A52 = -25360.0 / 2187, A53 = 64448.0 / 6561,
            A54 = -212.0 / 729;
    static final double A61 = 9017.0 / 3168, A62 = -355.0 / 33, A63 = 46732.0 / 5247, A64 = 49.0 / 176,
            A65 = -5103.0 / 18656;
    static final double A71 = 35.0 / 384, A73 = 500.0 / 1113, A74 = 125.0 / 192, A75 = -2187.0 / 6784,
            A76 = 11.0 / 84;
    // Difference between the 5th- and 4th-order weights (DOPRI5's E1..E7).
    static final double E1 = 71.0 / 57600, E3 = -71.0 / 16695, E4 = 71.0 / 1920, E5 = -17253.0 / 339200,
            E6 = 22.0 / 525, E7 = -1.0 / 40;
    // Step-size control constants of DOPRI5.
    private static final double SAFETY = 0.9, FAC_MIN = 0.2, FAC_MAX = 10.0, BETA = 0.04;
    private static final double EXPO = 0.2 - BETA * 0.75;
    // Stiffness test of DOPRI5: boundary of the stability region along the negative axis.
    static final double STIFF_BOUNDARY = 3.25;

    private final VectorField field;
    private final double[] p;
    private final int n;
    private double[] y, yNew, k1, k7;
    private final double[] k2, k3, k4, k5, k6, yStage, errPart;
    private final DormandPrinceDense dense;

    public DormandPrince54(VectorField field, double[] parameters) {
        this.field = field;
        this.p = parameters.clone();
        this.n = field.dimension();
        y = new double[n];
        yNew = new double[n];
        k1 = new double[n];
        k7 = new double[n];
        k2 = new double[n];
        k3 = new double[n];
        k4 = new double[n];
        k5 = new double[n];
        k6 = new double[n];
        yStage = new double[n];
        errPart = new double[n];
        dense = new DormandPrinceDense(n);
    }

    /**
     * Integrates from (t0, u0) to tEnd (which may lie before t0). Never throws for numerical trouble: the outcome
     * names how it ended.
     *
     * @param observer receives every accepted step, or null
     */
    @Override
    public IntegrationOutcome integrate(double t0, double[] u0, double tEnd, IntegratorSettings s,
            StepObserver observer) {
        AdaptiveStepDriver b = new AdaptiveStepDriver(s, observer, dense);
        IntegrationOutcome early = b.begin(t0, u0, tEnd, y, field, p, k1);
        if (early != null) {
            return early;
        }
        double[] rtol = s.relativeTolerances(n);
        double[] atol = s.absoluteTolerances(n);
        double h = b.firstExplicitStep(s, field, p, t0, y, k1, yStage, k2, rtol, atol, 5);
        boolean uniformTolerances = s.componentRelativeTolerances() == null
                && s.componentAbsoluteTolerances() == null;
        return b.run(new Attempts(b, rtol, atol, observer != null, uniformTolerances), control(), t0, h, tEnd);
    }

    /** The stages and error norm of one integration. */
    private final class Attempts extends AdaptiveStepDriver.PairAttempts {
        private final boolean uniformTolerances;
        private double largest;

        Attempts(AdaptiveStepDriver b, double[] rtol, double[] atol, boolean denseOutput, boolean uniformTolerances) {
            super(b, rtol, atol, denseOutput);
            this.uniformTolerances = uniformTolerances;
        }

        @Override
        public double[] state() {
            return y;
        }

        @Override
        public double attempt(double t, double h, double tNew) {
            for (int i = 0; i < n; i++) {
                yStage[i] = y[i] + h * A21 * k1[i];
            }
            field.rates(t + C2 * h, yStage, p, k2);
            for (int i = 0; i < n; i++) {
                yStage[i] = y[i] + h * (A31 * k1[i] + A32 * k2[i]);
            }
            field.rates(t + C3 * h, yStage, p, k3);
            for (int i = 0; i < n; i++) {
                yStage[i] = y[i] + h * (A41 * k1[i] + A42 * k2[i] + A43 * k3[i]);
            }
            field.rates(t + C4 * h, yStage, p, k4);
            for (int i = 0; i < n; i++) {
                yStage[i] = y[i] + h * (A51 * k1[i] + A52 * k2[i] + A53 * k3[i] + A54 * k4[i]);
            }
            field.rates(t + C5 * h, yStage, p, k5);
            for (int i = 0; i < n; i++) {
                yStage[i] = y[i] + h * (A61 * k1[i] + A62 * k2[i] + A63 * k3[i] + A64 * k4[i] + A65 * k5[i]);
            }
            field.rates(tNew, yStage, p, k6);
            // One pass for the new point and the part of the error sum that does not need k7: the sum is still
            // formed left to right (E1 k1 + ... + E6 k6, then + E7 k7), so results are unchanged.
            for (int i = 0; i < n; i++) {
                double k1i = k1[i], k3i = k3[i], k4i = k4[i], k5i = k5[i], k6i = k6[i];
                yNew[i] = y[i] + h * (A71 * k1i + A73 * k3i + A74 * k4i + A75 * k5i + A76 * k6i);
                errPart[i] = E1 * k1i + E3 * k3i + E4 * k4i + E5 * k5i + E6 * k6i;
            }
            field.rates(tNew, yNew, p, k7);
            b.evaluations += 6;

            double err = 0;
            double finite = 0; // x - x is 0 for finite x and NaN otherwise, so this is NaN if some yNew[i] is not
            double big = 0; // |yNew|_inf, the blow-up test after acceptance
            if (uniformTolerances) {
                double a = atol[0], r = rtol[0];
                for (int i = 0; i < n; i++) {
                    double yi = yNew[i];
                    double sk = a + r * Math.max(Math.abs(y[i]), Math.abs(yi));
                    double e = h * (errPart[i] + E7 * k7[i]) / sk;
                    err += e * e;
                    finite += yi - yi;
                    big = Math.max(big, Math.abs(yi));
                }
            } else {
                for (int i = 0; i < n; i++) {
                    double yi = yNew[i];
                    double sk = atol[i] + rtol[i] * Math.max(Math.abs(y[i]), Math.abs(yi));
                    double e = h * (errPart[i] + E7 * k7[i]) / sk;
                    err += e * e;
                    finite += yi - yi;
                    big = Math.max(big, Math.abs(yi));
                }
            }
            largest = big;
            return finite != 0 ? Double.NaN : Math.sqrt(err / n);
        }

        @Override
        public void accept(double t, double h, double tNew) {
            b.testStiffness(h, tNew, k7, k6, yNew, yStage, STIFF_BOUNDARY);
            if (denseOutput) {
                prepareDense(h);
            }
            double[] swap = y;
            y = yNew;
            yNew = swap;
            swap = k1; // first same as last: f(t_new, y_new) is the next step's first stage
            k1 = k7;
            k7 = swap;
        }

        @Override
        public double largest() {
            return largest; // measured in the error pass
        }
    }

    /** DOPRI5's PI controller. */
    static StepSizeControl control() {
        return new StepSizeControl(EXPO, BETA, SAFETY, FAC_MIN, FAC_MAX);
    }

    /** Coefficients of the continuous extension, computed before the FSAL swap (uses y, yNew, k1, k3..k7). */
    private void prepareDense(double h) {
        for (int i = 0; i < n; i++) {
            dense.set(i, y[i], yNew[i], h, k1[i], k3[i], k4[i], k5[i], k6[i], k7[i]);
        }
    }
}
