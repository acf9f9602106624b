package org.phasewright.runtime.equilibria;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

import org.apache.commons.math3.random.SobolSequenceGenerator;
import org.phasewright.runtime.linalg.Vectors;

/**
 * Where Newton's method starts, and the per-coordinate scales used to judge convergence and sameness.
 * Starts are the initial state, the origin, points along a trajectory, and Sobol points in two boxes: one sized by
 * the magnitudes of parameters and initial values, and the trajectory's bounding box (0.5% to 99.5% quantiles per
 * coordinate) enlarged by half on each side.
 * The three families are interleaved so a work limit still samples all of them. Everything is deterministic.
 */
public final class StartPoints {
    private static final int SOBOL_MAX_DIMENSION = 1000; // size of commons-math's direction-number table

    private final List<double[]> points;
    private final double[] scales;

    private StartPoints(List<double[]> points, double[] scales) {
        this.points = points;
        this.scales = scales;
    }

    public List<double[]> points() {
        return points;
    }

    /** The same starts and scales with {@code first} tried before all others (e.g. roots found by homotopy). */
    public StartPoints withLeading(List<double[]> first) {
        List<double[]> all = new ArrayList<>(first.size() + points.size());
        first.forEach(x -> all.add(x.clone()));
        all.addAll(points);
        return new StartPoints(all, scales);
    }

    /** Typical magnitude of each coordinate (positive). */
    public double[] scales() {
        return scales.clone();
    }

    /**
     * @param trajectory states along a trajectory (rows), possibly empty; rows that are not finite are skipped
     */
    public static StartPoints build(double[] parameters, double[] initialState, List<double[]> trajectory,
            EquilibriumSettings settings) {
        int n = initialState.length;
        double magnitude = 0;
        for (double v : parameters) {
            magnitude = Math.max(magnitude, Math.abs(v));
        }
        for (double v : initialState) {
            magnitude = Math.max(magnitude, Math.abs(v));
        }
        if (magnitude == 0) {
            magnitude = 1;
        }
        double[] globalCentre = new double[n];
        double[] globalHalf = new double[n];
        java.util.Arrays.fill(globalHalf, 2 * magnitude);

        List<double[]> finite = trajectory.stream().filter(Vectors::allFinite).toList();
        // Quantiles rather than min/max: a trajectory that blows up ends with a huge point that would otherwise
        // inflate the box and, worse, the scales that decide convergence and sameness.
        double[] lo = initialState.clone();
        double[] hi = initialState.clone();
        if (!finite.isEmpty()) {
            double[] column = new double[finite.size()];
            for (int i = 0; i < n; i++) {
                for (int k = 0; k < column.length; k++) {
                    column[k] = finite.get(k)[i];
                }
                java.util.Arrays.sort(column);
                lo[i] = Math.min(lo[i], column[(int) Math.floor(0.005 * (column.length - 1))]);
                hi[i] = Math.max(hi[i], column[(int) Math.ceil(0.995 * (column.length - 1))]);
            }
        }
        double[] boxCentre = new double[n];
        double[] boxHalf = new double[n];
        double[] scales = new double[n];
        for (int i = 0; i < n; i++) {
            boxCentre[i] = 0.5 * (lo[i] + hi[i]);
            double half = 0.5 * (hi[i] - lo[i]);
            // A trajectory that barely moves in a coordinate still deserves a box of that coordinate's size.
            boxHalf[i] = half > 0 ? 1.5 * half : Math.max(0.5 * Math.abs(boxCentre[i]), 0.1 * magnitude);
            scales[i] = Math.max(Math.max(half, Math.abs(initialState[i])), 1e-6 * magnitude);
            if (!(scales[i] > 0)) {
                scales[i] = 1;
            }
        }

        List<double[]> global = quasiRandom(n, settings.quasiRandomStarts(), globalCentre, globalHalf, 1);
        List<double[]> local = quasiRandom(n, settings.quasiRandomStarts(), boxCentre, boxHalf,
                settings.quasiRandomStarts() + 1);
        List<double[]> along = new ArrayList<>();
        int m = Math.min(settings.trajectoryStarts(), finite.size());
        for (int k = 0; k < m; k++) {
            // From the end backwards: late points sit near attractors, which Newton reaches fastest.
            along.add(finite.get(finite.size() - 1 - (int) ((long) k * finite.size() / m)).clone());
        }

        List<double[]> points = new ArrayList<>();
        points.add(initialState.clone());
        points.add(new double[n]);
        int longest = Math.max(along.size(), Math.max(global.size(), local.size()));
        for (int k = 0; k < longest; k++) {
            if (k < along.size()) {
                points.add(along.get(k));
            }
            if (k < local.size()) {
                points.add(local.get(k));
            }
            if (k < global.size()) {
                points.add(global.get(k));
            }
        }
        return new StartPoints(points, scales);
    }

    /** Sobol points in centre ± half; skips the first {@code skip} points so two boxes use different points. */
    private static List<double[]> quasiRandom(int n, int count, double[] centre, double[] half, int skip) {
        List<double[]> out = new ArrayList<>(count);
        if (count == 0) {
            return out;
        }
        if (n <= SOBOL_MAX_DIMENSION) {
            SobolSequenceGenerator sobol = new SobolSequenceGenerator(n);
            sobol.skipTo(skip); // the first Sobol point is the corner (0, ..., 0)
            for (int k = 0; k < count; k++) {
                out.add(map(sobol.nextVector(), centre, half));
            }
        } else {
            SplittableRandom random = new SplittableRandom(20240601L + skip); // fixed seed: reproducible runs
            for (int k = 0; k < count; k++) {
                double[] q = new double[n];
                for (int i = 0; i < n; i++) {
                    q[i] = random.nextDouble();
                }
                out.add(map(q, centre, half));
            }
        }
        return out;
    }

    private static double[] map(double[] unit, double[] centre, double[] half) {
        double[] x = new double[unit.length];
        for (int i = 0; i < x.length; i++) {
            x[i] = centre[i] + half[i] * (2 * unit[i] - 1);
        }
        return x;
    }
}
