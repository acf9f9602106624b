package org.phasewright.runtime.study;

import java.util.List;

/**
 * A sampled solution: rows of (time, states, derived quantities). Immutable; accessors copy.
 * After a failed integration the last row is where it stopped, which may not be on the regular grid.
 */
public final class Trajectory {
    private final String timeName;
    private final List<String> stateNames;
    private final List<String> derivedNames;
    private final double[] times;
    private final double[][] states;
    private final double[][] derived;
    private final String kept;

    public Trajectory(String timeName, List<String> stateNames, List<String> derivedNames, double[] times,
            double[][] states, double[][] derived) {
        this(timeName, stateNames, derivedNames, times, states, derived, null);
    }

    /**
     * @param kept for models too large to keep every column: which columns were kept (the state columns are then
     *             the first few states, and summary columns follow the derived ones); null when all were kept
     */
    public Trajectory(String timeName, List<String> stateNames, List<String> derivedNames, double[] times,
            double[][] states, double[][] derived, String kept) {
        if (states.length != times.length || derived.length != times.length) {
            throw new IllegalArgumentException("rows of times, states and derived values differ");
        }
        this.timeName = timeName;
        this.stateNames = List.copyOf(stateNames);
        this.derivedNames = List.copyOf(derivedNames);
        this.times = times.clone();
        this.states = deepCopy(states);
        this.derived = deepCopy(derived);
        this.kept = kept;
    }

    /** Which columns a reduced trajectory kept, or null when it has every state and derived quantity. */
    public String kept() {
        return kept;
    }

    public String timeName() {
        return timeName;
    }

    public List<String> stateNames() {
        return stateNames;
    }

    public List<String> derivedNames() {
        return derivedNames;
    }

    public int size() {
        return times.length;
    }

    public double time(int row) {
        return times[row];
    }

    public double state(int row, int index) {
        return states[row][index];
    }

    public double derived(int row, int index) {
        return derived[row][index];
    }

    public double[] times() {
        return times.clone();
    }

    public double[] stateRow(int row) {
        return states[row].clone();
    }

    public double[] derivedRow(int row) {
        return derived[row].clone();
    }

    private static double[][] deepCopy(double[][] a) {
        double[][] c = new double[a.length][];
        for (int i = 0; i < a.length; i++) {
            c[i] = a[i].clone();
        }
        return c;
    }
}
