package org.phasewright.runtime.compile;

/**
 * A field that forwards every method to another, so wrappers override only what they add or change. Holds nothing
 * mutable and allocates nothing, so it is as thread-safe as its delegate.
 */
public abstract class ForwardingVectorField implements VectorField {
    protected final VectorField delegate;

    protected ForwardingVectorField(VectorField delegate) {
        this.delegate = delegate;
    }

    @Override
    public int dimension() {
        return delegate.dimension();
    }

    @Override
    public void rates(double t, double[] u, double[] p, double[] dudt) {
        delegate.rates(t, u, p, dudt);
    }

    @Override
    public void jacobian(double t, double[] u, double[] p, double[] jacRowMajor) {
        delegate.jacobian(t, u, p, jacRowMajor);
    }

    @Override
    public SparseJacobian sparseJacobian() {
        return delegate.sparseJacobian();
    }

    @Override
    public boolean large() {
        return delegate.large();
    }
}
