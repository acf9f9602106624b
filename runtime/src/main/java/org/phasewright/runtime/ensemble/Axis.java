package org.phasewright.runtime.ensemble;

import java.io.Serializable;

/**
 * One evaluated axis of an ensemble grid: {@code steps} evenly spaced values of the variable with the given index
 * (a parameter or a state, by context) from {@code from} to {@code to} inclusive.
 */
public record Axis(String name, int index, double from, double to, int steps) implements Serializable {
    public Axis {
        if (steps < 1 || !Double.isFinite(from) || !Double.isFinite(to)) {
            throw new IllegalArgumentException("axis " + name + ": needs finite ends and at least one step");
        }
    }

    /** The k-th value; the same formula as the orbit diagram always used, so results stay identical. */
    public double value(int k) {
        return steps == 1 ? from : from + (to - from) * k / (steps - 1);
    }
}
