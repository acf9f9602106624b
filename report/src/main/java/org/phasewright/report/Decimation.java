package org.phasewright.report;

import java.util.Arrays;

/**
 * Thins long sampled curves before plotting, keeping what the eye sees (common practice for line plots): the first
 * and last sample, and in every pixel column (or, for a curve in the plane, every run of consecutive samples) the
 * extreme values, in their original order. A curve drawn through the kept points covers the same pixels as the full
 * one.
 */
public final class Decimation {
    /** Most points a plotted series keeps. */
    public static final int MAX_POINTS = 4000;

    private Decimation() {
    }

    /**
     * Indices to keep of y(x) with x non-decreasing (a time series): first, last, and per column of equal width in
     * x the samples with the smallest and largest y. Returns every index when there are at most {@code maxPoints}.
     */
    public static int[] timeSeries(double[] x, double[] y, int columns, int maxPoints) {
        int n = x.length;
        if (n <= maxPoints) {
            return identity(n);
        }
        int buckets = Math.max(1, Math.min(columns, (maxPoints - 2) / 2));
        double x0 = x[0], span = x[n - 1] - x[0];
        int[] keep = new int[2 * buckets + 2];
        int count = 0;
        keep[count++] = 0;
        int bucket = -1, lo = -1, hi = -1;
        for (int i = 1; i < n - 1; i++) {
            int b = span > 0 && Double.isFinite(x[i])
                    ? (int) Math.max(0, Math.min(buckets - 1, Math.floor((x[i] - x0) / span * buckets)))
                    : (int) ((long) (i - 1) * buckets / (n - 2));
            if (b != bucket) {
                count = flush(keep, count, lo, hi);
                bucket = b;
                lo = hi = i;
            }
            if (compare(y[i], y[lo]) < 0) {
                lo = i;
            }
            if (compare(y[i], y[hi]) > 0) {
                hi = i;
            }
        }
        count = flush(keep, count, lo, hi);
        keep[count++] = n - 1;
        return Arrays.copyOf(keep, count);
    }

    /**
     * Indices to keep of a curve (x(k), y(k)) in the plane (a phase projection): first, last, and per run of
     * consecutive samples the ones with the smallest and largest x and y, so at most {@code maxPoints} in all.
     */
    public static int[] curve(double[] x, double[] y, int maxPoints) {
        int n = x.length;
        if (n <= maxPoints) {
            return identity(n);
        }
        int runs = Math.max(1, (maxPoints - 2) / 4);
        int[] keep = new int[4 * runs + 2];
        int count = 0;
        keep[count++] = 0;
        int[] extremes = new int[4];
        for (int r = 0; r < runs; r++) {
            int from = 1 + (int) ((long) r * (n - 2) / runs);
            int to = 1 + (int) ((long) (r + 1) * (n - 2) / runs); // exclusive
            if (from >= to) {
                continue;
            }
            Arrays.fill(extremes, from);
            for (int k = from; k < to; k++) {
                if (compare(x[k], x[extremes[0]]) < 0) {
                    extremes[0] = k;
                }
                if (compare(x[k], x[extremes[1]]) > 0) {
                    extremes[1] = k;
                }
                if (compare(y[k], y[extremes[2]]) < 0) {
                    extremes[2] = k;
                }
                if (compare(y[k], y[extremes[3]]) > 0) {
                    extremes[3] = k;
                }
            }
            int[] sorted = extremes.clone();
            Arrays.sort(sorted);
            for (int j = 0; j < sorted.length; j++) {
                if (j == 0 || sorted[j] != sorted[j - 1]) {
                    keep[count++] = sorted[j];
                }
            }
        }
        keep[count++] = n - 1;
        return Arrays.copyOf(keep, count);
    }

    private static int flush(int[] keep, int count, int lo, int hi) {
        if (lo < 0 || count + 2 > keep.length - 1) {
            return count;
        }
        keep[count++] = Math.min(lo, hi);
        if (hi != lo) {
            keep[count++] = Math.max(lo, hi);
        }
        return count;
    }

    /** NaN sorts as neither smallest nor largest, so it is kept only when a column holds nothing else. */
    private static int compare(double a, double b) {
        if (Double.isNaN(a)) {
            return 0;
        }
        if (Double.isNaN(b)) {
            return a < 0 ? -1 : 1;
        }
        return Double.compare(a, b);
    }

    private static int[] identity(int n) {
        int[] all = new int[n];
        for (int i = 0; i < n; i++) {
            all[i] = i;
        }
        return all;
    }
}
