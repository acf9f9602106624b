package org.phasewright.runtime.periodic;

/**
 * One periodic orbit of a family: the parameter, the period, a point on the orbit (where the shooting starts), the
 * smallest and largest value of each state along it, and its Floquet multipliers (eigenvalues of the monodromy
 * matrix, the trivial one included). {@code special} names a bifurcation located here, or is null.
 */
public record CyclePoint(double parameter, double period, double[] state, double[] minimum, double[] maximum,
        double[] multipliersReal, double[] multipliersImag, boolean stable, CycleBranch.Special special) {

    public CyclePoint {
        state = state.clone();
        minimum = minimum.clone();
        maximum = maximum.clone();
        multipliersReal = multipliersReal.clone();
        multipliersImag = multipliersImag.clone();
    }

    @Override
    public double[] state() {
        return state.clone();
    }

    @Override
    public double[] minimum() {
        return minimum.clone();
    }

    @Override
    public double[] maximum() {
        return maximum.clone();
    }

    @Override
    public double[] multipliersReal() {
        return multipliersReal.clone();
    }

    @Override
    public double[] multipliersImag() {
        return multipliersImag.clone();
    }
}
