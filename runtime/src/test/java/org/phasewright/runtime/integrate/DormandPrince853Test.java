package org.phasewright.runtime.integrate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.integrate.DormandPrince54Test.field;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.VectorField;

class DormandPrince853Test {
    static final VectorField OSCILLATOR = DormandPrince54Test.OSCILLATOR;

    /** Lorenz (1963) with σ = 10, r = 28, b = 8/3. */
    static final VectorField LORENZ = field(3, (t, u, d) -> {
        d[0] = 10 * (u[1] - u[0]);
        d[1] = u[0] * (28 - u[2]) - u[1];
        d[2] = u[0] * u[1] - 8.0 / 3 * u[2];
    });

    static IntegrationOutcome run(VectorField f, double[] u0, double tEnd, IntegratorSettings s, StepObserver o) {
        return new DormandPrince853(f, new double[0]).integrate(0, u0, tEnd, s, o);
    }

    @Test
    void fixedStepErrorShrinksWithTheEighthPowerOfTheStep() {
        // DOP853 advances an 8th-order solution (HNW I, Sec. II.10): halving a fixed step divides the global error
        // by about 2^8 = 256. Loose tolerances with initialStep = maxStep = h force every step at exactly h.
        double[] steps = {1.0, 0.5, 0.25};
        double[] errors = new double[steps.length];
        for (int k = 0; k < steps.length; k++) {
            IntegratorSettings fixed = IntegratorSettings.DEFAULT.withTolerances(1, 1).withSteps(steps[k], steps[k]);
            IntegrationOutcome o = run(OSCILLATOR, new double[] {1, 0}, 8, fixed, null);
            assertEquals(0, o.rejectedSteps());
            assertEquals(Math.round(8 / steps[k]), o.acceptedSteps());
            // 12 evaluations per step, the first reused from the previous step: 12 per step plus the first one.
            assertEquals(12 * o.acceptedSteps() + 1, o.rhsEvaluations());
            errors[k] = Math.hypot(o.state()[0] - Math.cos(8), o.state()[1] + Math.sin(8));
        }
        for (int k = 1; k < steps.length; k++) {
            double order = Math.log(errors[k - 1] / errors[k]) / Math.log(2);
            assertEquals(8.0, order, 0.5, "observed order between h = " + steps[k - 1] + " and " + steps[k]);
        }
    }

    @Test
    void tightToleranceReachesTheClosedForm() {
        // x = cos t, v = -sin t (closed form); error within a small multiple of rtol per unit time (common practice).
        IntegrationOutcome o = run(OSCILLATOR, new double[] {1, 0}, 20,
                IntegratorSettings.DEFAULT.withTolerances(1e-12, 1e-14), null);
        assertEquals(IntegrationOutcome.Ending.COMPLETED, o.ending());
        assertEquals(Math.cos(20), o.state()[0], 20 * 1e-12);
        assertEquals(-Math.sin(20), o.state()[1], 20 * 1e-12);
    }

    @Test
    void denseOutputOfOrderSevenIsAsAccurateAsTheStepEnds() {
        // The continuous extension of DOP853 has order 7 (HNW I, Sec. II.10): between steps its error stays of the
        // size of the global error at the step ends.
        double[] worst = {0}, worstAtEnds = {0};
        double[] u = new double[2];
        StepObserver observer = step -> {
            double[] end = step.endState();
            worstAtEnds[0] = Math.max(worstAtEnds[0], Math.hypot(end[0] - Math.cos(step.endTime()),
                    end[1] + Math.sin(step.endTime())));
            for (int k = 1; k < 10; k++) {
                double t = step.startTime() + (step.endTime() - step.startTime()) * k / 10;
                step.stateAt(t, u);
                worst[0] = Math.max(worst[0], Math.hypot(u[0] - Math.cos(t), u[1] + Math.sin(t)));
            }
        };
        IntegrationOutcome o = run(OSCILLATOR, new double[] {1, 0}, 10,
                IntegratorSettings.DEFAULT.withTolerances(1e-10, 1e-12), observer);
        assertEquals(IntegrationOutcome.Ending.COMPLETED, o.ending());
        assertTrue(worst[0] <= 3 * worstAtEnds[0] + 1e-13, "dense " + worst[0] + " vs ends " + worstAtEnds[0]);
        assertTrue(worst[0] < 10 * 1e-10, "worst dense-output error " + worst[0]);
    }

    @Test
    void agreesWithDormandPrince54OnLorenzAndTakesFarFewerSteps() {
        // Two independent methods at tight tolerances must agree on a chaotic orbit over a few Lyapunov times
        // (λ1 ≈ 0.906, Sprott 2003: an error of 1e-12 grows by about e^9 by t = 10). Common practice.
        IntegratorSettings tight = IntegratorSettings.DEFAULT.withTolerances(1e-12, 1e-12);
        IntegrationOutcome high = run(LORENZ, new double[] {1, 1, 1}, 10, tight, null);
        IntegrationOutcome low = new DormandPrince54(LORENZ, new double[0]).integrate(0, new double[] {1, 1, 1}, 10,
                tight, null);
        for (int i = 0; i < 3; i++) {
            assertEquals(low.state()[i], high.state()[i], 1e-5);
        }
        assertTrue(high.acceptedSteps() * 3 < low.acceptedSteps(),
                high.acceptedSteps() + " vs " + low.acceptedSteps());
    }

    @Test
    void perComponentTolerancesControlEachComponent() {
        // Two copies of y' = -y (closed form exp(-t)). The error norm is a mean over components, so whichever copy
        // has the tight tolerance is integrated to it, and loosening both costs far fewer steps. Common practice.
        VectorField twoDecays = field(2, (t, u, d) -> {
            d[0] = -u[0];
            d[1] = -u[1];
        });
        double[] tight = {1e-12, 1e-14}, loose = {1e-4, 1e-6};
        for (int k = 0; k < 2; k++) {
            double[] rtol = {k == 0 ? tight[0] : loose[0], k == 0 ? loose[0] : tight[0]};
            double[] atol = {k == 0 ? tight[1] : loose[1], k == 0 ? loose[1] : tight[1]};
            IntegrationOutcome o = run(twoDecays, new double[] {1, 1}, 5,
                    IntegratorSettings.DEFAULT.withComponentTolerances(rtol, atol), null);
            assertEquals(Math.exp(-5), o.state()[k], 1e-11);
        }
        IntegrationOutcome both = run(twoDecays, new double[] {1, 1}, 5,
                IntegratorSettings.DEFAULT.withComponentTolerances(new double[] {1e-4, 1e-4}, null), null);
        IntegrationOutcome first = run(twoDecays, new double[] {1, 1}, 5,
                IntegratorSettings.DEFAULT.withComponentTolerances(new double[] {1e-12, 1e-4}, null), null);
        assertTrue(2 * both.acceptedSteps() < first.acceptedSteps(), both.acceptedSteps() + " vs "
                + first.acceptedSteps());
        assertThrows(IllegalArgumentException.class, () -> run(twoDecays, new double[] {1, 1}, 5,
                IntegratorSettings.DEFAULT.withComponentTolerances(new double[] {1e-6}, null), null));
    }

    @Test
    void explicitMethodsReportStiffnessWithTheTime() {
        // Robertson's chemical kinetics (Robertson 1966; HNW II, Sec. IV.1, eq. (1.4)) turns stiff after the
        // initial transient: Hairer's stiffness test (HNW II, Sec. IV.2, from memory; codes DOPRI5/DOP853) must flag it.
        VectorField robertson = field(3, (t, y, d) -> {
            d[0] = -0.04 * y[0] + 1e4 * y[1] * y[2];
            d[2] = 3e7 * y[1] * y[1];
            d[1] = -d[0] - d[2];
        });
        IntegratorSettings s = IntegratorSettings.DEFAULT.withTolerances(1e-6, 1e-10);
        for (Integrator method : new Integrator[] {new DormandPrince54(robertson, new double[0]),
                new DormandPrince853(robertson, new double[0])}) {
            IntegrationOutcome o = method.integrate(0, new double[] {1, 0, 0}, 10, s, null);
            assertEquals(IntegrationOutcome.Ending.COMPLETED, o.ending());
            assertTrue(o.stiffnessDetected(), method.getClass().getSimpleName());
            assertTrue(o.stiffnessDetectedAt() > 0 && o.stiffnessDetectedAt() < 10);
            assertTrue(o.message("tau").contains("stiff near tau = "), o.message("tau"));
        }
        // The non-stiff oscillator is never flagged.
        assertFalse(run(OSCILLATOR, new double[] {1, 0}, 1000, IntegratorSettings.DEFAULT, null).stiffnessDetected());
    }
}
