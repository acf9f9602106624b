package org.phasewright.runtime.integrate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.VectorField;

class Rodas4Test {

    /** Robertson (1966) chemical kinetics, HNW II Sec. IV.1 eq. (1.4), with its exact Jacobian. */
    static final VectorField ROBERTSON = new VectorField() {
        @Override
        public int dimension() {
            return 3;
        }

        @Override
        public void rates(double t, double[] y, double[] p, double[] d) {
            d[0] = -0.04 * y[0] + 1e4 * y[1] * y[2];
            d[2] = 3e7 * y[1] * y[1];
            d[1] = -d[0] - d[2];
        }

        @Override
        public void jacobian(double t, double[] y, double[] p, double[] j) {
            j[0] = -0.04;
            j[1] = 1e4 * y[2];
            j[2] = 1e4 * y[1];
            j[3] = 0.04;
            j[4] = -1e4 * y[2] - 6e7 * y[1];
            j[5] = -1e4 * y[1];
            j[6] = 0;
            j[7] = 6e7 * y[1];
            j[8] = 0;
        }
    };

    /** x' = v, v' = -x with its Jacobian. */
    static final VectorField OSCILLATOR = new VectorField() {
        @Override
        public int dimension() {
            return 2;
        }

        @Override
        public void rates(double t, double[] u, double[] p, double[] d) {
            d[0] = u[1];
            d[1] = -u[0];
        }

        @Override
        public void jacobian(double t, double[] u, double[] p, double[] j) {
            j[0] = 0;
            j[1] = 1;
            j[2] = -1;
            j[3] = 0;
        }
    };

    @Test
    void robertsonToTenToTheFiveConservesMassInFarFewerStepsThanAnExplicitMethod() {
        IntegratorSettings s = IntegratorSettings.DEFAULT.withTolerances(1e-6, 1e-10);
        IntegrationOutcome stiff = new Rodas4(ROBERTSON, new double[0], true).integrate(0, new double[] {1, 0, 0},
                1e5, s, null);
        assertEquals(IntegrationOutcome.Ending.COMPLETED, stiff.ending());
        double[] y = stiff.state();
        // y1 + y2 + y3 = 1 is a linear invariant of the equations (HNW II, Sec. IV.1), kept by Rosenbrock methods
        // up to round-off.
        assertEquals(1.0, y[0] + y[1] + y[2], 1e-12);
        assertTrue(stiff.acceptedSteps() < 500, "steps " + stiff.acceptedSteps());
        // Dormand–Prince 5(4) with 100 times the stiff method's step count does not even get near t = 1e5.
        IntegrationOutcome explicit = new DormandPrince54(ROBERTSON, new double[0]).integrate(0,
                new double[] {1, 0, 0}, 1e5, s.withMaxSteps(100 * stiff.acceptedSteps()), null);
        assertEquals(IntegrationOutcome.Ending.STEP_LIMIT, explicit.ending());
        assertTrue(explicit.time() < 1e3, "explicit reached " + explicit.time());
        assertTrue(explicit.stiffnessDetected());
    }

    @Test
    void robertsonAgreesWithAnIndependentExplicitMethod() {
        // Cross-check of two independent methods (common practice): DOP853 at a tight tolerance on the short
        // initial transient, where the explicit method is still affordable.
        IntegrationOutcome stiff = new Rodas4(ROBERTSON, new double[0], true).integrate(0, new double[] {1, 0, 0},
                0.4, IntegratorSettings.DEFAULT.withTolerances(1e-10, 1e-16), null);
        IntegrationOutcome explicit = new DormandPrince853(ROBERTSON, new double[0]).integrate(0,
                new double[] {1, 0, 0}, 0.4, IntegratorSettings.DEFAULT.withTolerances(1e-12, 1e-18), null);
        for (int i = 0; i < 3; i++) {
            double scale = Math.abs(explicit.state()[i]);
            assertEquals(explicit.state()[i], stiff.state()[i], 1e-8 * scale, "component " + i);
        }
    }

    @Test
    void fixedStepErrorShrinksWithTheFourthPowerOfTheStep() {
        // RODAS4 has order 4 (HNW II): halving a fixed step divides the global error by about 16.
        double[] steps = {0.2, 0.1, 0.05};
        double[] errors = new double[steps.length];
        for (int k = 0; k < steps.length; k++) {
            IntegratorSettings fixed = IntegratorSettings.DEFAULT.withTolerances(1, 1).withSteps(steps[k], steps[k]);
            IntegrationOutcome o = new Rodas4(OSCILLATOR, new double[0], true).integrate(0, new double[] {1, 0}, 4,
                    fixed, null);
            assertEquals(0, o.rejectedSteps());
            errors[k] = Math.hypot(o.state()[0] - Math.cos(4), o.state()[1] + Math.sin(4));
        }
        for (int k = 1; k < steps.length; k++) {
            double order = Math.log(errors[k - 1] / errors[k]) / Math.log(2);
            assertEquals(4.0, order, 0.3, "observed order between h = " + steps[k - 1] + " and " + steps[k]);
        }
    }

    @Test
    void denseOutputStaysNearTheStepEndAccuracy() {
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
        new Rodas4(OSCILLATOR, new double[0], true).integrate(0, new double[] {1, 0}, 10,
                IntegratorSettings.DEFAULT.withTolerances(1e-6, 1e-8), observer);
        // The continuous extension is of order 3 (code RODAS): its error is of the size of the step-end error.
        assertTrue(worst[0] < 5 * worstAtEnds[0], "dense " + worst[0] + " vs ends " + worstAtEnds[0]);
    }

    @Test
    void forcedStiffEquationFollowsItsClosedFormWithLargeSteps() {
        // y' = -λ (y - cos t), y(0) = 0, λ = 1e6: y = y_p(t) - y_p(0) e^{-λt}, y_p = λ(λ cos t + sin t)/(λ²+1)
        // (closed form). The time derivative of the rates enters the stages (non-autonomous Rosenbrock form).
        double lambda = 1e6;
        VectorField forced = new VectorField() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void rates(double t, double[] y, double[] p, double[] d) {
                d[0] = -lambda * (y[0] - Math.cos(t));
            }

            @Override
            public void jacobian(double t, double[] y, double[] p, double[] j) {
                j[0] = -lambda;
            }
        };
        IntegrationOutcome o = new Rodas4(forced, new double[0], false).integrate(0, new double[] {0}, 20,
                IntegratorSettings.DEFAULT.withTolerances(1e-8, 1e-10), null);
        double yp = lambda * (lambda * Math.cos(20) + Math.sin(20)) / (lambda * lambda + 1);
        assertEquals(yp, o.state()[0], 1e-8);
        // An explicit method would need about |λ|·20/3.3 ≈ 6e6 steps.
        assertTrue(o.acceptedSteps() < 1000, "steps " + o.acceptedSteps());
    }

    @Test
    void everyMethodNamesABlowUpWithItsTime() {
        // y' = y², y(0) = 1 has y = 1/(1 - t) (closed form), beyond 1e12 just before t = 1.
        VectorField square = new VectorField() {
            @Override
            public int dimension() {
                return 1;
            }

            @Override
            public void rates(double t, double[] y, double[] p, double[] d) {
                d[0] = y[0] * y[0];
            }

            @Override
            public void jacobian(double t, double[] y, double[] p, double[] j) {
                j[0] = 2 * y[0];
            }
        };
        for (Integrator method : new Integrator[] {new Rodas4(square, new double[0], true),
                new DormandPrince853(square, new double[0]), new DormandPrince54(square, new double[0])}) {
            IntegrationOutcome o = method.integrate(0, new double[] {1}, 2, IntegratorSettings.DEFAULT, null);
            String name = method.getClass().getSimpleName();
            assertEquals(IntegrationOutcome.Ending.BLEW_UP, o.ending(), name);
            assertEquals(1.0, o.time(), 1e-6, name);
            assertTrue(o.message("tau").startsWith("integration blew up at tau = 1.0e+00"), o.message("tau"));
        }
    }
}
