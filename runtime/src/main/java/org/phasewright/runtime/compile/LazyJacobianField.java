package org.phasewright.runtime.compile;

import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.symbolic.SymbolicJacobian;

/**
 * Rates and derived values from code compiled now; the dense Jacobian (symbolic, n^2 entries, costly to build and
 * compile for indexed models with sums) only the first time an analysis asks for it. Simulations of large models
 * never pay for it. Thread-safe like the generated code it wraps.
 */
final class LazyJacobianField extends ForwardingVectorField implements DerivedValues {
    private final DynamicalModel model;
    private final DerivedValues derived;
    private volatile VectorField dense;

    LazyJacobianField(DynamicalModel model, VectorField rates, DerivedValues derived) {
        super(rates);
        this.model = model;
        this.derived = derived;
    }

    @Override
    public int derivedCount() {
        return derived.derivedCount();
    }

    @Override
    public void derived(double t, double[] u, double[] p, double[] out) {
        derived.derived(t, u, p, out);
    }

    @Override
    public void jacobian(double t, double[] u, double[] p, double[] jacRowMajor) {
        VectorField d = dense;
        if (d == null) {
            synchronized (this) {
                if (dense == null) {
                    dense = build();
                }
                d = dense;
            }
        }
        d.jacobian(t, u, p, jacRowMajor);
    }

    /** Generated code with the symbolic Jacobian, or the (synchronised) interpreter if that does not compile. */
    private VectorField build() {
        ModelCompiler.requireDenseJacobian(model);
        SymbolicJacobian jacobian = SymbolicJacobian.of(model);
        try {
            return (VectorField) ModelCompiler.load(new JavaSourceGenerator(model, jacobian).generate());
        } catch (Exception | LinkageError | StackOverflowError e) {
            InterpretedVectorField interpreter = new InterpretedVectorField(model, jacobian);
            return new ForwardingVectorField(interpreter) { // only jacobian() is called on the dense field
                @Override
                public synchronized void jacobian(double t, double[] u, double[] p, double[] jacRowMajor) {
                    super.jacobian(t, u, p, jacRowMajor);
                }
            };
        }
    }
}
