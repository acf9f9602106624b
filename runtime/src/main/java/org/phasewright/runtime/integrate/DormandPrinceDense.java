package org.phasewright.runtime.integrate;

/**
 * The last accepted Dormand–Prince 5(4) step with Shampine's 4th-order continuous extension (HNW I, Section II.6,
 * as in DOPRI5's CONTD5): the integrators fill r1..r5 per component after accepting a step.
 */
final class DormandPrinceDense extends AdaptiveStepDriver.View {
    final double[] r1, r2, r3, r4, r5;

    DormandPrinceDense(int n) {
        r1 = new double[n];
        r2 = new double[n];
        r3 = new double[n];
        r4 = new double[n];
        r5 = new double[n];
    }

    @Override
    public void stateAt(double t, double[] out) {
        double theta = (t - tOld) / h;
        double theta1 = 1 - theta;
        for (int i = 0; i < r1.length; i++) {
            out[i] = r1[i] + theta * (r2[i] + theta1 * (r3[i] + theta * (r4[i] + theta1 * r5[i])));
        }
    }
}
