package org.phasewright.runtime.equilibria;

/**
 * One equilibrium: where it is, the eigenvalues of the Jacobian there (sorted by real part, descending), and its type.
 *
 * @param residual |f|_inf at {@code coordinates}, to show how exact the root is
 */
public record Equilibrium(String name, double[] coordinates, double[] eigenvaluesReal, double[] eigenvaluesImag,
        Classification classification, double residual) {

    public Equilibrium {
        coordinates = coordinates.clone();
        eigenvaluesReal = eigenvaluesReal.clone();
        eigenvaluesImag = eigenvaluesImag.clone();
    }

    @Override
    public double[] coordinates() {
        return coordinates.clone();
    }

    @Override
    public double[] eigenvaluesReal() {
        return eigenvaluesReal.clone();
    }

    @Override
    public double[] eigenvaluesImag() {
        return eigenvaluesImag.clone();
    }

    public String type() {
        return classification.type();
    }
}
