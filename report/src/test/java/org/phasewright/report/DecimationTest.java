package org.phasewright.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Thinning keeps first, last and the extremes of every column (common practice for line plots). */
class DecimationTest {
    @Test
    void shortSeriesAreKeptWhole() {
        double[] x = {0, 1, 2}, y = {5, 4, 3};
        assertArrayEquals(new int[] {0, 1, 2}, Decimation.timeSeries(x, y, 800, 4000));
        assertArrayEquals(new int[] {0, 1, 2}, Decimation.curve(x, y, 4000));
    }

    @Test
    void timeSeriesKeepsEveryColumnsExtremes() {
        int n = 1_000_000, columns = 500;
        double[] x = new double[n], y = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = i * 1e-3;
            y[i] = Math.sin(x[i] * 7) + (i % 9973 == 0 ? 3 : 0); // narrow spikes a plain stride would miss
        }
        int[] keep = Decimation.timeSeries(x, y, columns, 4000);
        assertTrue(keep.length <= 2 * columns + 2, keep.length + " points");
        assertEquals(0, keep[0]);
        assertEquals(n - 1, keep[keep.length - 1]);
        for (int k = 1; k < keep.length; k++) {
            assertTrue(keep[k] > keep[k - 1], "in order");
        }
        // Per column, the largest and smallest kept value equal the true ones.
        double span = x[n - 1];
        double[] lo = filled(columns, Double.POSITIVE_INFINITY), hi = filled(columns, Double.NEGATIVE_INFINITY);
        double[] keptLo = lo.clone(), keptHi = hi.clone();
        for (int i = 1; i < n - 1; i++) {
            int c = column(x[i], span, columns);
            lo[c] = Math.min(lo[c], y[i]);
            hi[c] = Math.max(hi[c], y[i]);
        }
        for (int i : keep) {
            if (i > 0 && i < n - 1) {
                int c = column(x[i], span, columns);
                keptLo[c] = Math.min(keptLo[c], y[i]);
                keptHi[c] = Math.max(keptHi[c], y[i]);
            }
        }
        assertArrayEquals(lo, keptLo);
        assertArrayEquals(hi, keptHi);
    }

    private static double[] filled(int n, double v) {
        double[] a = new double[n];
        java.util.Arrays.fill(a, v);
        return a;
    }

    private static int column(double x, double span, int columns) {
        return (int) Math.max(0, Math.min(columns - 1, Math.floor(x / span * columns)));
    }

    @Test
    void curveKeepsItsBoundingBoxAndCap() {
        int n = 300_000;
        double[] x = new double[n], y = new double[n];
        for (int i = 0; i < n; i++) {
            double t = i * 1e-3;
            x[i] = Math.cos(t) * (1 + 0.001 * t);
            y[i] = Math.sin(3 * t);
        }
        int[] keep = Decimation.curve(x, y, 4000);
        assertTrue(keep.length <= 4000, keep.length + " points");
        assertEquals(0, keep[0]);
        assertEquals(n - 1, keep[keep.length - 1]);
        double maxX = Double.NEGATIVE_INFINITY, keptMaxX = Double.NEGATIVE_INFINITY;
        double minY = Double.POSITIVE_INFINITY, keptMinY = Double.POSITIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            maxX = Math.max(maxX, x[i]);
            minY = Math.min(minY, y[i]);
        }
        for (int i : keep) {
            keptMaxX = Math.max(keptMaxX, x[i]);
            keptMinY = Math.min(keptMinY, y[i]);
        }
        assertEquals(maxX, keptMaxX);
        assertEquals(minY, keptMinY);
    }
}
