package org.phasewright.runtime.compile;

/** The values of a model's derived (`let`) quantities at a point, for output alongside the states. */
public interface DerivedValues {
    int derivedCount();

    /** Writes every derived quantity, in declaration order, into {@code out}. */
    void derived(double t, double[] u, double[] p, double[] out);
}
