package org.phasewright.runtime.study;

/**
 * How results of models with very many states are cut down so that rows stay readable: above {@link #LIMIT} states a
 * row keeps the first {@link #KEPT} states plus the mean and root mean square over all of them, and the full states go
 * to files with one row per state. Trajectories, sections and equilibrium tables follow it.
 */
public final class ReducedOutput {
    /** Models with more states than this get reduced rows. */
    public static final int LIMIT = 1000;
    /** States a reduced row keeps, from the first. */
    public static final int KEPT = 16;
    /** Column names of the summaries over all states. */
    public static final String MEAN = "mean(states)", RMS = "rms(states)";

    private ReducedOutput() {
    }

    /** True when rows of a model with {@code states} states are reduced. */
    public static boolean reduced(int states) {
        return states > LIMIT;
    }

    /** {mean, root mean square} of {@code u}, summed left to right. */
    public static double[] meanAndRms(double[] u) {
        double sum = 0, squares = 0;
        for (double x : u) {
            sum += x;
            squares += x * x;
        }
        return new double[] {sum / u.length, Math.sqrt(squares / u.length)};
    }
}
