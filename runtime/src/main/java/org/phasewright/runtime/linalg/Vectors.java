package org.phasewright.runtime.linalg;

/** Small checks on state vectors shared by the integrators. */
public final class Vectors {
    private Vectors() {
    }

    public static boolean allFinite(double[] v) {
        for (double x : v) {
            if (!Double.isFinite(x)) {
                return false;
            }
        }
        return true;
    }

    /** The largest absolute entry. */
    public static double normInf(double[] v) {
        double m = 0;
        for (double x : v) {
            m = Math.max(m, Math.abs(x));
        }
        return m;
    }
}
