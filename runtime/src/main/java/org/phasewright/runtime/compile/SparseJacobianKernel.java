package org.phasewright.runtime.compile;

/** The interface the generated sparse-Jacobian class implements (public so that Janino's class can see it). */
public interface SparseJacobianKernel {
    /** Adds each derivative into {@code values[slots[...]]}; {@code values} must be zero on entry. */
    void add(double t, double[] u, double[] p, double[] values, int[] slots);
}
