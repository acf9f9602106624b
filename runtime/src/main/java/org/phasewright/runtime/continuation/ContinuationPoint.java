package org.phasewright.runtime.continuation;

import org.phasewright.runtime.equilibria.Classification;

/**
 * One equilibrium on a branch: the parameter value, the state, the eigenvalues of the Jacobian (largest real part
 * first) and its type. {@code special} is the kind of bifurcation located exactly here, or null.
 */
public record ContinuationPoint(double parameter, double[] state, double[] eigenvaluesReal, double[] eigenvaluesImag,
        Classification classification, SpecialPoint.Kind special) {

    public ContinuationPoint {
        state = state.clone();
        eigenvaluesReal = eigenvaluesReal.clone();
        eigenvaluesImag = eigenvaluesImag.clone();
    }

    @Override
    public double[] state() {
        return state.clone();
    }

    @Override
    public double[] eigenvaluesReal() {
        return eigenvaluesReal.clone();
    }

    @Override
    public double[] eigenvaluesImag() {
        return eigenvaluesImag.clone();
    }

    /**
     * No eigenvalue with positive real part (drawn solid in a bifurcation diagram); false when the point could not
     * be classified (no dimensions known).
     */
    public boolean stable() {
        return classification.classified() && classification.unstableDimension() == 0;
    }
}
