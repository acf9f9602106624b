package org.phasewright.runtime.integrate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.VectorField;

class DormandPrince54Test {

    /** A vector field from a lambda; Jacobian unused by the integrator. */
    interface Rates {
        void apply(double t, double[] u, double[] dudt);
    }

    static VectorField field(int n, Rates rates) {
        return new VectorField() {
            @Override
            public int dimension() {
                return n;
            }

            @Override
            public void rates(double t, double[] u, double[] p, double[] dudt) {
                rates.apply(t, u, dudt);
            }

            @Override
            public void jacobian(double t, double[] u, double[] p, double[] jac) {
                throw new UnsupportedOperationException();
            }
        };
    }

    static final VectorField DECAY = field(1, (t, u, d) -> d[0] = -u[0]);
    static final VectorField OSCILLATOR = field(2, (t, u, d) -> {
        d[0] = u[1];
        d[1] = -u[0];
    });

    static IntegrationOutcome run(VectorField f, double[] u0, double tEnd, IntegratorSettings s, StepObserver o) {
        return new DormandPrince54(f, new double[0]).integrate(0, u0, tEnd, s, o);
    }

    @Test
    void exponentialDecayMatchesClosedForm() {
        // y' = -y, y(0) = 1 has y = exp(-t). Global error of a tolerance-controlled method stays within a modest
        // multiple of the tolerance over a few time constants (common practice; HNW I, Sec. II.4, Fig. 4.4).
        IntegrationOutcome o = run(DECAY, new double[] {1}, 5, IntegratorSettings.DEFAULT, null);
        assertEquals(IntegrationOutcome.Ending.COMPLETED, o.ending());
        assertEquals(5.0, o.time());
        assertEquals(Math.exp(-5), o.state()[0], 10 * 1e-8 * Math.exp(-5) + 10 * 1e-10);
        assertTrue(o.acceptedSteps() > 5 && o.acceptedSteps() < 200, "steps " + o.acceptedSteps());
        // First same as last: 6 new evaluations per attempted step, plus the initial one and HINIT's one.
        assertEquals(6 * (o.acceptedSteps() + o.rejectedSteps()) + 2, o.rhsEvaluations());
    }

    @Test
    void harmonicOscillatorMatchesClosedForm() {
        // x' = v, v' = -x, (x, v)(0) = (1, 0) has x = cos t, v = -sin t; energy-like error grows ~ linearly in t.
        double tEnd = 20;
        IntegrationOutcome o = run(OSCILLATOR, new double[] {1, 0}, tEnd, IntegratorSettings.DEFAULT, null);
        assertEquals(IntegrationOutcome.Ending.COMPLETED, o.ending());
        double bound = tEnd * 1e-8; // tolerance-scaled, linear growth with time (common practice); observed 1.9e-8
        assertEquals(Math.cos(tEnd), o.state()[0], bound);
        assertEquals(-Math.sin(tEnd), o.state()[1], bound);
    }

    @Test
    void backwardIntegrationWorks() {
        IntegrationOutcome o = run(DECAY, new double[] {1}, -2, IntegratorSettings.DEFAULT, null);
        assertEquals(IntegrationOutcome.Ending.COMPLETED, o.ending());
        assertEquals(Math.exp(2), o.state()[0], 1e-6);
    }

    @Test
    void fixedStepErrorShrinksWithTheFifthPowerOfTheStep() {
        // DOPRI5 advances the 5th-order solution (Dormand & Prince 1980; HNW I, Sec. II.5, Table 5.2), so the
        // global error with a fixed step h is C h^5: halving h divides it by 2^5 = 32. Loose tolerances and
        // initialStep = maxStep = h force every step to be accepted at exactly h.
        double[] errors = new double[3];
        double[] steps = {0.2, 0.1, 0.05};
        for (int k = 0; k < steps.length; k++) {
            IntegratorSettings fixed = IntegratorSettings.DEFAULT.withTolerances(1, 1).withSteps(steps[k], steps[k]);
            IntegrationOutcome o = run(OSCILLATOR, new double[] {1, 0}, 4, fixed, null);
            assertEquals(0, o.rejectedSteps());
            assertEquals(Math.round(4 / steps[k]), o.acceptedSteps());
            errors[k] = Math.hypot(o.state()[0] - Math.cos(4), o.state()[1] + Math.sin(4));
        }
        for (int k = 1; k < steps.length; k++) {
            double order = Math.log(errors[k - 1] / errors[k]) / Math.log(2);
            assertEquals(5.0, order, 0.1, "observed order between h = " + steps[k - 1] + " and " + steps[k]);
        }
    }

    @Test
    void errorShrinksRoughlyInProportionToTheTolerance() {
        // With error-per-step control, the global error is roughly proportional to the tolerance (HNW I,
        // Sec. II.4 "tolerance proportionality"); a factor 100 tighter tolerance should give about 100x less error.
        double previous = Double.NaN;
        for (double rtol : new double[] {1e-6, 1e-8, 1e-10}) {
            IntegrationOutcome o = run(OSCILLATOR, new double[] {1, 0}, 10,
                    IntegratorSettings.DEFAULT.withTolerances(rtol, rtol * 1e-2), null);
            double error = Math.hypot(o.state()[0] - Math.cos(10), o.state()[1] + Math.sin(10));
            if (!Double.isNaN(previous)) {
                double ratio = previous / error;
                assertTrue(ratio > 50 && ratio < 200, "error ratio " + ratio + " at rtol " + rtol);
            }
            previous = error;
        }
    }

    @Test
    void denseOutputIsAccurateBetweenSteps() {
        // The continuous extension of DOPRI5 is of order 4 (HNW I, Sec. II.6): between steps its error is of the
        // same size as the global error at the step ends, so the same tolerance-scaled bound holds everywhere.
        double[] worst = {0};
        double[] worstAtEnds = {0};
        AtomicInteger checked = new AtomicInteger();
        double[] u = new double[2];
        StepObserver observer = step -> {
            double[] end = step.endState();
            worstAtEnds[0] = Math.max(worstAtEnds[0], Math.hypot(end[0] - Math.cos(step.endTime()),
                    end[1] + Math.sin(step.endTime())));
            for (int k = 1; k < 10; k++) {
                double t = step.startTime() + (step.endTime() - step.startTime()) * k / 10;
                step.stateAt(t, u);
                worst[0] = Math.max(worst[0], Math.hypot(u[0] - Math.cos(t), u[1] + Math.sin(t)));
                checked.incrementAndGet();
            }
        };
        IntegrationOutcome o = run(OSCILLATOR, new double[] {1, 0}, 10, IntegratorSettings.DEFAULT, observer);
        assertEquals(IntegrationOutcome.Ending.COMPLETED, o.ending());
        assertTrue(checked.get() > 100);
        assertTrue(worst[0] <= 2 * worstAtEnds[0], "dense " + worst[0] + " vs step ends " + worstAtEnds[0]);
        assertTrue(worst[0] < 1e-8 * 10, "worst dense-output error " + worst[0]); // rtol × interval, as above
    }

    @Test
    void samplerFillsEvenlySpacedTimesAndEndsExactlyAtTheEndState() {
        double[] times = OutputSampler.evenlySpaced(0, 3, 31);
        OutputSampler sampler = new OutputSampler(times, 1);
        IntegrationOutcome o = run(DECAY, new double[] {1}, 3, IntegratorSettings.DEFAULT, sampler);
        assertEquals(31, sampler.count());
        for (int k = 0; k < 31; k++) {
            assertEquals(Math.exp(-times[k]), sampler.states()[k][0], 1e-8);
        }
        assertEquals(o.state()[0], sampler.states()[30][0]);
    }

    @Test
    void blowUpOfYSquaredIsReportedNearTimeOne() {
        // y' = y^2, y(0) = 1 has y = 1/(1 - t), which exceeds 1e12 at t = 1 - 1e-12. The numerical solution's
        // singularity is displaced by the global error (observed 5e-10 with rtol 1e-8), hence the 1e-6 window.
        VectorField f = field(1, (t, u, d) -> d[0] = u[0] * u[0]);
        IntegrationOutcome o = run(f, new double[] {1}, 2, IntegratorSettings.DEFAULT, null);
        assertEquals(IntegrationOutcome.Ending.BLEW_UP, o.ending());
        assertEquals(1.0, o.time(), 1e-6);
        assertTrue(o.state()[0] > 1e12);
        assertEquals("integration blew up at t = 1.0e+00: |u| exceeded 1e12", o.message());
    }

    @Test
    void notANumberIsReportedWhereTheRatesStopBeingDefined() {
        // x' = -1, y' = sqrt(x) from (1, 0): x = 1 - t turns negative at t = 1, where sqrt is undefined.
        VectorField f = field(2, (t, u, d) -> {
            d[0] = -1;
            d[1] = Math.sqrt(u[0]);
        });
        IntegrationOutcome o = run(f, new double[] {1, 0}, 3, IntegratorSettings.DEFAULT, null);
        assertEquals(IntegrationOutcome.Ending.NOT_FINITE, o.ending());
        assertEquals(1.0, o.time(), 1e-6);
    }

    @Test
    void budgetsStopTheIntegration() {
        IntegrationOutcome limited = run(OSCILLATOR, new double[] {1, 0}, 1e6,
                IntegratorSettings.DEFAULT.withMaxSteps(100), null);
        assertEquals(IntegrationOutcome.Ending.STEP_LIMIT, limited.ending());
        assertEquals(100, limited.acceptedSteps() + limited.rejectedSteps());

        AtomicInteger polls = new AtomicInteger();
        IntegrationOutcome cancelled = run(OSCILLATOR, new double[] {1, 0}, 1e6,
                IntegratorSettings.DEFAULT.withCancellation(() -> polls.incrementAndGet() > 10), null);
        assertEquals(IntegrationOutcome.Ending.CANCELLED, cancelled.ending());

        IntegrationOutcome late = run(OSCILLATOR, new double[] {1, 0}, 1e6,
                IntegratorSettings.DEFAULT.withDeadline(System.nanoTime() - 1), null);
        assertEquals(IntegrationOutcome.Ending.TIME_LIMIT, late.ending());
    }

    @Test
    void nonFiniteStartIsReported() {
        IntegrationOutcome o = run(DECAY, new double[] {Double.NaN}, 1, IntegratorSettings.DEFAULT, null);
        assertEquals(IntegrationOutcome.Ending.NOT_FINITE, o.ending());
        assertEquals(0.0, o.time());
    }
}
