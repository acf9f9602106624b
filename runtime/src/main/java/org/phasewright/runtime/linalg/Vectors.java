package org.phasewright.runtime.linalg;

/** Small operations on vectors shared by the integrators, continuation and eigen-solvers. */
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

    /**
     * The dot product a·b over a's length, in eight interleaved partial sums: a single running sum is one chain of
     * dependent additions, which the JIT does not vectorise (it keeps the order) and which waits on each addition's
     * latency; eight chains run side by side (Arnoldi's Gram–Schmidt spends most of its time here: following 500
     * Bratu points took 56 s with one sum, 39 s with four, 38 s with eight).
     */
    public static double dot(double[] a, double[] b) {
        int n = a.length, i = 0;
        double s0 = 0, s1 = 0, s2 = 0, s3 = 0, s4 = 0, s5 = 0, s6 = 0, s7 = 0;
        for (; i + 7 < n; i += 8) {
            s0 += a[i] * b[i];
            s1 += a[i + 1] * b[i + 1];
            s2 += a[i + 2] * b[i + 2];
            s3 += a[i + 3] * b[i + 3];
            s4 += a[i + 4] * b[i + 4];
            s5 += a[i + 5] * b[i + 5];
            s6 += a[i + 6] * b[i + 6];
            s7 += a[i + 7] * b[i + 7];
        }
        for (; i < n; i++) {
            s0 += a[i] * b[i];
        }
        return ((s0 + s1) + (s2 + s3)) + ((s4 + s5) + (s6 + s7));
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
