package org.phasewright.runtime.integrate;

import org.phasewright.runtime.linalg.Vectors;

import org.phasewright.runtime.compile.VectorField;

/**
 * Explicit Runge–Kutta method of Dormand and Prince, order 5 with an embedded order-4 error estimate, following
 * Hairer, Nørsett &amp; Wanner, Solving Ordinary Differential Equations I (2nd ed., 1993), Section II.5 and their
 * code DOPRI5: first-same-as-last stages, the PI ("Lund-stabilised") step-size controller, the automatic initial step
 * of Section II.4, and the 4th-order continuous extension (dense output) of Section II.6.
 * <p>
 * An instance owns its work arrays, so the step loop allocates nothing; it is not thread-safe but can be reused.
 * <p>
 * Stiffness detection follows DOPRI5 (HNW I, Section II.10 and IV.2): stages 6 and 7 are both evaluated at t+h, so
 * |h|·‖k7−k6‖/‖y7−y6‖ estimates |h·λ| for the dominant eigenvalue; when it stays beyond the method's stability
 * boundary (3.25) for 15 tested steps the outcome reports the time.
 */
public final class DormandPrince54 implements Integrator {
    // Butcher tableau, HNW Table 5.2.
    private static final double C2 = 1.0 / 5, C3 = 3.0 / 10, C4 = 4.0 / 5, C5 = 8.0 / 9;
    private static final double A21 = 1.0 / 5;
    private static final double A31 = 3.0 / 40, A32 = 9.0 / 40;
    private static final double A41 = 44.0 / 45, A42 = -56.0 / 15, A43 = 32.0 / 9;
    private static final double A51 = 19372.0 / 6561, A52 = -25360.0 / 2187, A53 = 64448.0 / 6561,
            A54 = -212.0 / 729;
    private static final double A61 = 9017.0 / 3168, A62 = -355.0 / 33, A63 = 46732.0 / 5247, A64 = 49.0 / 176,
            A65 = -5103.0 / 18656;
    private static final double A71 = 35.0 / 384, A73 = 500.0 / 1113, A74 = 125.0 / 192, A75 = -2187.0 / 6784,
            A76 = 11.0 / 84;
    // Difference between the 5th- and 4th-order weights (DOPRI5's E1..E7).
    private static final double E1 = 71.0 / 57600, E3 = -71.0 / 16695, E4 = 71.0 / 1920, E5 = -17253.0 / 339200,
            E6 = 22.0 / 525, E7 = -1.0 / 40;
    // Dense output (DOPRI5's D1..D7, Shampine's continuous extension).
    private static final double D1 = -12715105075.0 / 11282082432.0, D3 = 87487479700.0 / 32700410799.0,
            D4 = -10690763975.0 / 1880347072.0, D5 = 701980252875.0 / 199316789632.0,
            D6 = -1453857185.0 / 822651844.0, D7 = 69997945.0 / 29380423.0;

    // Step-size control constants of DOPRI5.
    private static final double SAFETY = 0.9, FAC_MIN = 0.2, FAC_MAX = 10.0, BETA = 0.04;
    private static final double EXPO = 0.2 - BETA * 0.75;
    private static final double UROUND = 2.3e-16;
    // Stiffness test of DOPRI5: boundary of the stability region along the negative axis, and how often to test.
    private static final double STIFF_BOUNDARY = 3.25;
    private static final int STIFF_TEST_EVERY = 1000, STIFF_CONFIRMATIONS = 15, NONSTIFF_RESET = 6;

    private final VectorField field;
    private final double[] p;
    private final int n;
    private double[] y, yNew, k1, k7;
    private final double[] k2, k3, k4, k5, k6, yStage, errPart;
    private final double[] r1, r2, r3, r4, r5; // continuous-extension coefficients of the last step
    private final Dense dense = new Dense();

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
        r1 = new double[n];
        r2 = new double[n];
        r3 = new double[n];
        r4 = new double[n];
        r5 = new double[n];
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
        if (u0.length != n) {
            throw new IllegalArgumentException("start vector has " + u0.length + " entries, model has " + n);
        }
        if (!Double.isFinite(t0) || !Double.isFinite(tEnd)) {
            throw new IllegalArgumentException("times must be finite: " + t0 + ", " + tEnd);
        }
        Counters c = new Counters();
        System.arraycopy(u0, 0, y, 0, n);
        double t = t0;
        if (!Vectors.allFinite(y)) {
            return c.outcome(IntegrationOutcome.Ending.NOT_FINITE, t, y, 0, s);
        }
        field.rates(t, y, p, k1);
        c.evaluations++;
        if (!Vectors.allFinite(k1)) {
            return c.outcome(IntegrationOutcome.Ending.NOT_FINITE, t, y, 0, s);
        }
        if (observer != null) {
            observer.start(t, y);
        }
        if (Vectors.normInf(y) > s.blowUpBound()) {
            return c.outcome(IntegrationOutcome.Ending.BLEW_UP, t, y, 0, s);
        }
        if (t0 == tEnd || n == 0) { // nothing to integrate (a model without states is trivially done)
            return c.outcome(IntegrationOutcome.Ending.COMPLETED, tEnd, y, 0, s);
        }
        double[] rtol = s.relativeTolerances(n);
        double[] atol = s.absoluteTolerances(n);
        boolean uniformTolerances = s.componentRelativeTolerances() == null
                && s.componentAbsoluteTolerances() == null;
        double direction = Math.signum(tEnd - t0);
        double hMax = Math.min(s.maxStep(), Math.abs(tEnd - t0));
        double h = direction * (s.initialStep() > 0 ? Math.min(s.initialStep(), hMax) : initialStep(t, hMax,
                direction, rtol, atol, c));
        double timeScale = Math.max(Math.abs(t0), Math.abs(tEnd));
        double facOld = 1e-4;
        boolean rejectedLast = false;
        boolean nonFiniteLast = false;
        long attempts = 0;
        int stiffCount = 0, nonStiffCount = 0;

        while (true) {
            if (attempts >= s.maxSteps()) {
                return c.outcome(IntegrationOutcome.Ending.STEP_LIMIT, t, y, h, s);
            }
            if (s.cancelled().getAsBoolean()) {
                return c.outcome(IntegrationOutcome.Ending.CANCELLED, t, y, h, s);
            }
            if (s.deadlineNanos() != Long.MAX_VALUE && System.nanoTime() - s.deadlineNanos() > 0) {
                return c.outcome(IntegrationOutcome.Ending.TIME_LIMIT, t, y, h, s);
            }
            if (0.1 * Math.abs(h) <= UROUND * Math.max(Math.abs(t), timeScale * 1e-3)) {
                return c.outcome(nonFiniteLast ? IntegrationOutcome.Ending.NOT_FINITE
                        : IntegrationOutcome.Ending.STEP_SIZE_UNDERFLOW, t, y, h, s);
            }
            boolean last = false;
            if ((t + 1.01 * h - tEnd) * direction >= 0) {
                h = tEnd - t;
                last = true;
            }
            attempts++;

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
            double tNew = last ? tEnd : t + h;
            field.rates(tNew, yStage, p, k6);
            // One pass for the new point and the part of the error sum that does not need k7: the sum is still
            // formed left to right (E1 k1 + ... + E6 k6, then + E7 k7), so results are unchanged.
            for (int i = 0; i < n; i++) {
                double k1i = k1[i], k3i = k3[i], k4i = k4[i], k5i = k5[i], k6i = k6[i];
                yNew[i] = y[i] + h * (A71 * k1i + A73 * k3i + A74 * k4i + A75 * k5i + A76 * k6i);
                errPart[i] = E1 * k1i + E3 * k3i + E4 * k4i + E5 * k5i + E6 * k6i;
            }
            field.rates(tNew, yNew, p, k7);
            c.evaluations += 6;

            double err = 0;
            double finite = 0; // x - x is 0 for finite x and NaN otherwise, so this is NaN if some yNew[i] is not
            double largest = 0; // |yNew|_inf, the blow-up test after acceptance
            if (uniformTolerances) {
                double a = atol[0], r = rtol[0];
                for (int i = 0; i < n; i++) {
                    double yi = yNew[i];
                    double sk = a + r * Math.max(Math.abs(y[i]), Math.abs(yi));
                    double e = h * (errPart[i] + E7 * k7[i]) / sk;
                    err += e * e;
                    finite += yi - yi;
                    largest = Math.max(largest, Math.abs(yi));
                }
            } else {
                for (int i = 0; i < n; i++) {
                    double yi = yNew[i];
                    double sk = atol[i] + rtol[i] * Math.max(Math.abs(y[i]), Math.abs(yi));
                    double e = h * (errPart[i] + E7 * k7[i]) / sk;
                    err += e * e;
                    finite += yi - yi;
                    largest = Math.max(largest, Math.abs(yi));
                }
            }
            err = Math.sqrt(err / n);
            if (!Double.isFinite(err) || finite != 0) {
                // Overflow or NaN in a trial step: often the step was too bold, so shrink hard and retry.
                c.rejected++;
                rejectedLast = true;
                nonFiniteLast = true;
                h *= 0.1;
                continue;
            }
            nonFiniteLast = false;

            double fac11 = Math.pow(err, EXPO);
            double fac = fac11 / Math.pow(facOld, BETA);
            fac = Math.max(1 / FAC_MAX, Math.min(1 / FAC_MIN, fac / SAFETY));
            double hNew = h / fac;
            if (err <= 1.0) {
                facOld = Math.max(err, 1e-4);
                c.accepted++;
                if (Double.isNaN(c.stiffAt) && (c.accepted % STIFF_TEST_EVERY == 0 || stiffCount > 0)) {
                    double num = 0, den = 0;
                    for (int i = 0; i < n; i++) {
                        double dk = k7[i] - k6[i], dy = yNew[i] - yStage[i];
                        num += dk * dk;
                        den += dy * dy;
                    }
                    if (den > 0 && Math.abs(h) * Math.sqrt(num / den) > STIFF_BOUNDARY) {
                        nonStiffCount = 0;
                        if (++stiffCount == STIFF_CONFIRMATIONS) {
                            c.stiffAt = tNew;
                        }
                    } else if (++nonStiffCount == NONSTIFF_RESET) {
                        stiffCount = 0;
                    }
                }
                if (observer != null) {
                    prepareDense(h);
                }
                double tOld = t;
                t = tNew;
                double[] swap = y;
                y = yNew;
                yNew = swap;
                swap = k1; // first same as last: f(t_new, y_new) is the next step's first stage
                k1 = k7;
                k7 = swap;
                if (observer != null) {
                    dense.set(tOld, t, h);
                    observer.step(dense);
                    if (observer.stopRequested()) {
                        return c.outcome(IntegrationOutcome.Ending.STOPPED, t, y, h, s);
                    }
                }
                if (largest > s.blowUpBound()) { // |y|_inf of the accepted point, measured in the error pass
                    return c.outcome(IntegrationOutcome.Ending.BLEW_UP, t, y, h, s);
                }
                if (last) {
                    return c.outcome(IntegrationOutcome.Ending.COMPLETED, t, y, h, s);
                }
                if (Math.abs(hNew) > hMax) {
                    hNew = direction * hMax;
                }
                if (rejectedLast) { // do not grow straight after a rejection
                    hNew = direction * Math.min(Math.abs(hNew), Math.abs(h));
                }
                rejectedLast = false;
            } else {
                hNew = h / Math.min(1 / FAC_MIN, fac11 / SAFETY);
                rejectedLast = true;
                c.rejected++;
            }
            h = hNew;
        }
    }

    /** Coefficients of the continuous extension, computed before the FSAL swap (uses y, yNew, k1, k3..k7). */
    private void prepareDense(double h) {
        for (int i = 0; i < n; i++) {
            double yDiff = yNew[i] - y[i];
            double bSpl = h * k1[i] - yDiff;
            r1[i] = y[i];
            r2[i] = yDiff;
            r3[i] = bSpl;
            r4[i] = yDiff - h * k7[i] - bSpl;
            r5[i] = h * (D1 * k1[i] + D3 * k3[i] + D4 * k4[i] + D5 * k5[i] + D6 * k6[i] + D7 * k7[i]);
        }
    }

    /** Starting step size, HNW Section II.4 as coded in DOPRI5's HINIT. */
    private double initialStep(double t, double hMax, double direction, double[] rtol, double[] atol, Counters c) {
        double dnf = 0, dny = 0;
        for (int i = 0; i < n; i++) {
            double sk = atol[i] + rtol[i] * Math.abs(y[i]);
            dnf += (k1[i] / sk) * (k1[i] / sk);
            dny += (y[i] / sk) * (y[i] / sk);
        }
        double h = (dnf <= 1e-10 || dny <= 1e-10) ? 1e-6 : Math.sqrt(dny / dnf) * 0.01;
        h = Math.min(h, hMax);
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + direction * h * k1[i];
        }
        field.rates(t + direction * h, yStage, p, k2);
        c.evaluations++;
        double der2 = 0;
        for (int i = 0; i < n; i++) {
            double sk = atol[i] + rtol[i] * Math.abs(y[i]);
            double d = (k2[i] - k1[i]) / sk;
            der2 += d * d;
        }
        der2 = Math.sqrt(der2) / h;
        if (!Double.isFinite(der2)) {
            return h;
        }
        double der12 = Math.max(der2, Math.sqrt(dnf));
        double h1 = der12 <= 1e-15 ? Math.max(1e-6, h * 1e-3) : Math.pow(0.01 / der12, 1.0 / 5);
        return Math.min(Math.min(100 * h, h1), hMax);
    }

    /** The last accepted step, seen by observers. */
    private final class Dense implements DenseStep {
        private double tOld, tNew, h;

        void set(double tOld, double tNew, double h) {
            this.tOld = tOld;
            this.tNew = tNew;
            this.h = h;
        }

        @Override
        public double startTime() {
            return tOld;
        }

        @Override
        public double endTime() {
            return tNew;
        }

        @Override
        public void stateAt(double t, double[] out) {
            double theta = (t - tOld) / h;
            double theta1 = 1 - theta;
            for (int i = 0; i < n; i++) {
                out[i] = r1[i] + theta * (r2[i] + theta1 * (r3[i] + theta * (r4[i] + theta1 * r5[i])));
            }
        }

        @Override
        public double[] endState() {
            return y;
        }
    }

    private static final class Counters {
        long evaluations, accepted, rejected;
        double stiffAt = Double.NaN;

        IntegrationOutcome outcome(IntegrationOutcome.Ending ending, double t, double[] state, double h,
                IntegratorSettings s) {
            return new IntegrationOutcome(ending, t, state, evaluations, accepted, rejected, h, s.blowUpBound(),
                    stiffAt);
        }
    }
}
