package org.phasewright.runtime.integrate;

import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.linalg.Vectors;

/**
 * The bookkeeping that every adaptive one-step method here shares around its own stages and error norm: the checks
 * at the start, the budgets before each attempt (step limit, cancellation, deadline, step-size underflow), rejection
 * and acceptance, the observer and dense-output hand-over, the step-size limits after an accepted step, the counters
 * and the outcome. One instance per integration; methods are called once per step, never per component.
 */
final class AdaptiveStepDriver {
    private static final double UROUND = 2.3e-16;
    // Stiffness test of DOPRI5 and DOP853 (HNW II, Section IV.2, from memory): how often to test, and how many
    // tests decide.
    private static final int STIFF_TEST_EVERY = 1000, STIFF_CONFIRMATIONS = 15, NONSTIFF_RESET = 6;

    long evaluations, accepted, rejected;
    double stiffAt = Double.NaN;
    /** Set by {@link #begin}: sign of tEnd − t0 and the largest step. */
    double direction, hMax;
    private double timeScale;
    private long attempts;
    private boolean rejectedLast, nonFiniteLast;
    private int stiffCount, nonStiffCount;
    private final IntegratorSettings s;
    private final StepObserver observer;
    private final View view;

    AdaptiveStepDriver(IntegratorSettings s, StepObserver observer, View view) {
        this.s = s;
        this.observer = observer;
        this.view = view;
    }

    IntegrationOutcome outcome(IntegrationOutcome.Ending ending, double t, double[] y, double h) {
        return new IntegrationOutcome(ending, t, y, evaluations, accepted, rejected, h, s.blowUpBound(), stiffAt);
    }

    /**
     * Checks the arguments (caller errors throw), copies u0 into y, evaluates f0 = f(t0, y) when f0 is not null (the
     * first stage of an explicit method), and shows the start to the observer. Returns how the integration ends
     * right there (not finite, blown up, nothing to integrate) or null to go on.
     */
    IntegrationOutcome begin(double t0, double[] u0, double tEnd, double[] y, VectorField field, double[] p,
            double[] f0) {
        int n = y.length;
        if (u0.length != n) {
            throw new IllegalArgumentException("start vector has " + u0.length + " entries, model has " + n);
        }
        if (!Double.isFinite(t0) || !Double.isFinite(tEnd)) {
            throw new IllegalArgumentException("times must be finite: " + t0 + ", " + tEnd);
        }
        System.arraycopy(u0, 0, y, 0, n);
        if (!Vectors.allFinite(y)) {
            return outcome(IntegrationOutcome.Ending.NOT_FINITE, t0, y, 0);
        }
        if (f0 != null) {
            field.rates(t0, y, p, f0);
            evaluations++;
            if (!Vectors.allFinite(f0)) {
                return outcome(IntegrationOutcome.Ending.NOT_FINITE, t0, y, 0);
            }
        }
        if (observer != null) {
            observer.start(t0, y);
        }
        if (Vectors.normInf(y) > s.blowUpBound()) {
            return outcome(IntegrationOutcome.Ending.BLEW_UP, t0, y, 0);
        }
        if (t0 == tEnd || n == 0) { // a model without states is trivially done
            return outcome(IntegrationOutcome.Ending.COMPLETED, tEnd, y, 0);
        }
        direction = Math.signum(tEnd - t0);
        hMax = Math.min(s.maxStep(), Math.abs(tEnd - t0));
        timeScale = Math.max(Math.abs(t0), Math.abs(tEnd));
        return null;
    }

    /** The budgets, checked before each attempt; null when the attempt may go ahead (and is counted). */
    IntegrationOutcome beforeAttempt(double t, double[] y, double h) {
        if (attempts >= s.maxSteps()) {
            return outcome(IntegrationOutcome.Ending.STEP_LIMIT, t, y, h);
        }
        if (s.cancelled().getAsBoolean()) {
            return outcome(IntegrationOutcome.Ending.CANCELLED, t, y, h);
        }
        if (s.deadlineNanos() != Long.MAX_VALUE && System.nanoTime() - s.deadlineNanos() > 0) {
            return outcome(IntegrationOutcome.Ending.TIME_LIMIT, t, y, h);
        }
        if (0.1 * Math.abs(h) <= UROUND * Math.max(Math.abs(t), timeScale * 1e-3)) {
            // shrinking after overflow or NaN down to nothing means the rates themselves are not finite there
            return outcome(nonFiniteLast ? IntegrationOutcome.Ending.NOT_FINITE
                    : IntegrationOutcome.Ending.STEP_SIZE_UNDERFLOW, t, y, h);
        }
        attempts++;
        return null;
    }

    /**
     * Records whether a trial step was finite. Overflow or NaN in a trial step usually means the step was too bold:
     * it is rejected (true), and the caller shrinks the step hard and retries.
     */
    boolean rejectedAsNotFinite(boolean notFinite) {
        if (notFinite) {
            rejected++;
            rejectedLast = true;
            nonFiniteLast = true;
            return true;
        }
        nonFiniteLast = false;
        return false;
    }

    /** A rejected attempt with a finite (or no) error estimate. */
    void reject() {
        rejected++;
        rejectedLast = true;
    }

    /**
     * Stiffness test of DOPRI5/DOP853 after an accepted step, on the two last stages, both evaluated at t+h:
     * |h|·‖kLast−kPrev‖/‖yLast−yPrev‖ estimates |hλ|; beyond the method's stability boundary for
     * 15 tested steps it records tNew.
     */
    void testStiffness(double h, double tNew, double[] kLast, double[] kPrev, double[] yLast, double[] yPrev,
            double boundary) {
        if (stiffnessTestDue()) {
            double num = 0, den = 0;
            for (int i = 0; i < kLast.length; i++) {
                double dk = kLast[i] - kPrev[i], dy = yLast[i] - yPrev[i];
                num += dk * dk;
                den += dy * dy;
            }
            testStiffness(h, tNew, num, den, boundary);
        }
    }

    /** True when the next step, if accepted, is one the stiffness test looks at (rejections change nothing). */
    boolean stiffnessTestDueNext() {
        return Double.isNaN(stiffAt) && ((accepted + 1) % STIFF_TEST_EVERY == 0 || stiffCount > 0);
    }

    /** True when the step being accepted is one the stiffness test looks at. */
    boolean stiffnessTestDue() {
        return Double.isNaN(stiffAt) && (accepted % STIFF_TEST_EVERY == 0 || stiffCount > 0);
    }

    /** The stiffness test with the two squared norms ‖kLast−kPrev‖² and ‖yLast−yPrev‖² already summed. */
    void testStiffness(double h, double tNew, double num, double den, double boundary) {
        if (den > 0 && Math.abs(h) * Math.sqrt(num / den) > boundary) {
            nonStiffCount = 0;
            if (++stiffCount == STIFF_CONFIRMATIONS) {
                stiffAt = tNew;
            }
        } else if (++nonStiffCount == NONSTIFF_RESET) {
            stiffCount = 0;
        }
    }

    /** After an accepted step to (t, y): shows it to the observer, then ends on a stop, a blow-up or at tEnd. */
    IntegrationOutcome accept(double tOld, double t, double h, double[] y, boolean last) {
        return accept(tOld, t, h, y, last, Double.NaN);
    }

    /** As {@link #accept(double, double, double, double[], boolean)}, with |y|_inf already measured (or NaN). */
    IntegrationOutcome accept(double tOld, double t, double h, double[] y, boolean last, double largest) {
        if (observer != null) {
            view.set(tOld, t, h, y);
            observer.step(view);
            if (observer.stopRequested()) {
                return outcome(IntegrationOutcome.Ending.STOPPED, t, y, h);
            }
        }
        if ((Double.isNaN(largest) ? Vectors.normInf(y) : largest) > s.blowUpBound()) {
            return outcome(IntegrationOutcome.Ending.BLEW_UP, t, y, h);
        }
        if (last) {
            return outcome(IntegrationOutcome.Ending.COMPLETED, t, y, h);
        }
        return null;
    }

    /**
     * The first step of an explicit method of the given order: the settings' initial step (at most hMax) or
     * {@link #initialStep}, signed by the direction of integration.
     */
    double firstExplicitStep(IntegratorSettings settings, VectorField field, double[] p, double t, double[] y,
            double[] f0, double[] yStage, double[] f1, double[] rtol, double[] atol, int order) {
        return direction * (settings.initialStep() > 0 ? Math.min(settings.initialStep(), hMax)
                : initialStep(field, p, t, y, f0, yStage, f1, rtol, atol, order));
    }

    /**
     * True when a step of h from t would end within {@code slack}·h of tEnd or beyond it: the caller then steps to
     * tEnd exactly (a last sliver much shorter than h would only waste an attempt).
     */
    boolean reachesEnd(double t, double h, double tEnd, double slack) {
        return (t + slack * h - tEnd) * direction >= 0;
    }

    /** One embedded explicit Runge–Kutta pair as {@link #run} drives it: its stages, error norm and state. */
    interface EmbeddedPair {
        /** The state at the current point (a different array after each accepted step). */
        double[] state();

        /**
         * Attempts the step of size h from (t, {@link #state()}) to tNew, keeping the new point aside, and counts
         * its rate evaluations. Returns the error norm (the step is accepted when it is at most 1), NaN or infinite
         * when the new point or its error is not finite.
         */
        double attempt(double t, double h, double tNew);

        /** Makes the attempt the current point: stiffness test, continuous extension, first same as last. */
        void accept(double t, double h, double tNew);

        /** |state|_inf of the point just accepted when the attempt measured it, else NaN. */
        double largest();
    }

    /** What an {@link EmbeddedPair} needs of its integration: the driver (counters, stiffness test), tolerances. */
    abstract static class PairAttempts implements EmbeddedPair {
        final AdaptiveStepDriver b;
        final double[] rtol, atol;
        /** Whether an observer wants the continuous extension of each accepted step. */
        final boolean denseOutput;

        PairAttempts(AdaptiveStepDriver b, double[] rtol, double[] atol, boolean denseOutput) {
            this.b = b;
            this.rtol = rtol;
            this.atol = atol;
            this.denseOutput = denseOutput;
        }
    }

    double blowUpBound() {
        return s.blowUpBound();
    }

    /**
     * The adaptive loop of an explicit pair from t with first step h to tEnd, or to the first other ending: the
     * budgets, the step that lands on tEnd, rejections (a step that is not finite shrinks tenfold), the controller,
     * the observer and the step-size limits.
     */
    IntegrationOutcome run(EmbeddedPair pair, StepSizeControl control, double t, double h, double tEnd) {
        while (true) {
            IntegrationOutcome budget = beforeAttempt(t, pair.state(), h);
            if (budget != null) {
                return budget;
            }
            boolean last = false;
            if (reachesEnd(t, h, tEnd, 1.01)) {
                h = tEnd - t;
                last = true;
            }
            double tNew = last ? tEnd : t + h;
            double err = pair.attempt(t, h, tNew);
            if (rejectedAsNotFinite(!Double.isFinite(err))) {
                h *= 0.1;
                continue;
            }
            double hNew;
            if (err <= 1.0) {
                hNew = control.accepted(err, h);
                accepted++;
                pair.accept(t, h, tNew);
                double tOld = t;
                t = tNew;
                IntegrationOutcome end = accept(tOld, t, h, pair.state(), last, pair.largest());
                if (end != null) {
                    return end;
                }
                hNew = nextStep(hNew, h);
            } else {
                hNew = control.rejected(err, h);
                reject();
            }
            h = hNew;
        }
    }

    /** The step after an accepted one: at most hMax, and no growth straight after a rejection. */
    double nextStep(double hNew, double h) {
        if (Math.abs(hNew) > hMax) {
            hNew = direction * hMax;
        }
        if (rejectedLast) {
            hNew = direction * Math.min(Math.abs(hNew), Math.abs(h));
        }
        rejectedLast = false;
        return hNew;
    }

    /**
     * Starting step size of an explicit method of the given order, HNW I Section II.4 as coded in HINIT of DOPRI5
     * and DOP853, from f0 = f(t, y); evaluates f once more into f1 (using yStage as scratch).
     */
    double initialStep(VectorField field, double[] p, double t, double[] y, double[] f0, double[] yStage,
            double[] f1, double[] rtol, double[] atol, int order) {
        int n = y.length;
        double dnf = 0, dny = 0;
        for (int i = 0; i < n; i++) {
            double sk = atol[i] + rtol[i] * Math.abs(y[i]);
            dnf += (f0[i] / sk) * (f0[i] / sk);
            dny += (y[i] / sk) * (y[i] / sk);
        }
        double h = (dnf <= 1e-10 || dny <= 1e-10) ? 1e-6 : Math.sqrt(dny / dnf) * 0.01;
        h = Math.min(h, hMax);
        for (int i = 0; i < n; i++) {
            yStage[i] = y[i] + direction * h * f0[i];
        }
        field.rates(t + direction * h, yStage, p, f1);
        evaluations++;
        double der2 = 0;
        for (int i = 0; i < n; i++) {
            double sk = atol[i] + rtol[i] * Math.abs(y[i]);
            double d = (f1[i] - f0[i]) / sk;
            der2 += d * d;
        }
        der2 = Math.sqrt(der2) / h;
        if (!Double.isFinite(der2)) {
            return h;
        }
        double der12 = Math.max(der2, Math.sqrt(dnf));
        double h1 = der12 <= 1e-15 ? Math.max(1e-6, h * 1e-3) : Math.pow(0.01 / der12, 1.0 / order);
        return Math.min(Math.min(100 * h, h1), hMax);
    }

    /** The last accepted step as observers see it; subclasses add the method's continuous extension. */
    abstract static class View implements DenseStep {
        double tOld, tNew, h;
        private double[] endState;

        final void set(double tOld, double tNew, double h, double[] endState) {
            this.tOld = tOld;
            this.tNew = tNew;
            this.h = h;
            this.endState = endState;
        }

        @Override
        public final double startTime() {
            return tOld;
        }

        @Override
        public final double endTime() {
            return tNew;
        }

        @Override
        public final double[] endState() {
            return endState;
        }
    }
}
