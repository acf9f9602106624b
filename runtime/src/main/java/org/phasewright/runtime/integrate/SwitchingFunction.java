package org.phasewright.runtime.integrate;

/** A scalar function g(t, u) whose zeros are events, e.g. the surface of a Poincaré section. */
@FunctionalInterface
public interface SwitchingFunction {
    double value(double t, double[] u);
}
