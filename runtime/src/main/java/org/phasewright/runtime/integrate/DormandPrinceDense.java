package org.phasewright.runtime.integrate;

/**
 * The last accepted Dormand–Prince 5(4) step with Shampine's 4th-order continuous extension (HNW I, Section II.6,
 * as in DOPRI5's CONTD5): the integrators fill the coefficients per component with {@link #set} after a step.
 */
final class DormandPrinceDense extends AdaptiveStepDriver.View {
    // DOPRI5's D1..D7.
    private static final double D1 = -12715105075.0 / 11282082432.0, D3 = 87487479700.0 / 32700410799.0,
            D4 = -10690763975.0 / 1880347072.0, D5 = 701980252875.0 / 199316789632.0,
            D6 = -1453857185.0 / 822651844.0, D7 = 69997945.0 / 29380423.0;

    /** r[0..4][i]: component i's coefficients; one array of arrays, so two sets swap by one reference. */
    private double[][] r;

    DormandPrinceDense(int n) {
        r = new double[5][n];
    }

    /** Component i's coefficients from the step y0 → y1 of size h and its stages. */
    void set(int i, double y0, double y1, double h, double k1, double k3, double k4, double k5, double k6,
            double k7) {
        double yDiff = y1 - y0;
        double bSpl = h * k1 - yDiff;
        r[0][i] = y0;
        r[1][i] = yDiff;
        r[2][i] = bSpl;
        r[3][i] = yDiff - h * k7 - bSpl;
        r[4][i] = h * (D1 * k1 + D3 * k3 + D4 * k4 + D5 * k5 + D6 * k6 + D7 * k7);
    }

    /** Exchanges coefficients with {@code other}: a step's are prepared aside and become this one's on acceptance. */
    void swapCoefficients(DormandPrinceDense other) {
        double[][] mine = r;
        r = other.r;
        other.r = mine;
    }

    @Override
    public void stateAt(double t, double[] out) {
        double theta = (t - tOld) / h;
        double theta1 = 1 - theta;
        double[] r1 = r[0], r2 = r[1], r3 = r[2], r4 = r[3], r5 = r[4];
        for (int i = 0; i < r1.length; i++) {
            out[i] = r1[i] + theta * (r2[i] + theta1 * (r3[i] + theta * (r4[i] + theta1 * r5[i])));
        }
    }
}
