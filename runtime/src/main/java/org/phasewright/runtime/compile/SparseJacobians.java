package org.phasewright.runtime.compile;

import org.phasewright.runtime.linalg.SparsePattern;
import org.phasewright.runtime.model.DynamicalModel;

/**
 * Makes the sparse Jacobian of a model: the pattern from its declarations, the values from generated code when every
 * law reduces to blocks and compiles, else by grouped finite differences of the rates. Compiled models of large or
 * indexed systems carry one (made on first use) through {@link VectorField#sparseJacobian()}.
 */
public final class SparseJacobians {
    private SparseJacobians() {
    }

    /**
     * The sparse Jacobian of {@code model}, whose rates {@code field} evaluates; null when the pattern has more
     * than {@link SparseJacobianStructure#MAX_NONZEROS} entries.
     */
    public static SparseJacobian of(DynamicalModel model, VectorField field) {
        SparseJacobianStructure structure = SparseJacobianStructure.of(model);
        if (structure == null) {
            return null;
        }
        if (structure.blocks != null) {
            try {
                SparseJacobianKernel kernel = SparseJacobianGenerator.compile(
                        new SparseJacobianGenerator(structure).generate());
                return new GeneratedSparseJacobian(structure.pattern, structure.slots, kernel);
            } catch (Exception | LinkageError | StackOverflowError e) {
                // fall through to finite differences: same pattern, approximate values
            }
        }
        return new FiniteDifferenceJacobian(field, structure.pattern);
    }

    /** Grouped finite differences on a given pattern (for the interpreter and for tests). */
    public static SparseJacobian finiteDifferences(VectorField field, SparsePattern pattern) {
        return new FiniteDifferenceJacobian(field, pattern);
    }

    /** The pattern alone (null when too large). */
    public static SparsePattern pattern(DynamicalModel model) {
        SparseJacobianStructure structure = SparseJacobianStructure.of(model);
        return structure == null ? null : structure.pattern;
    }

    /**
     * {@code field} itself for small scalar models; otherwise a field that also offers a sparse Jacobian, built
     * the first time it is asked for.
     */
    static VectorField attach(DynamicalModel model, VectorField field) {
        if (field.sparseJacobian() != null
                || (model.dimension() <= SparseJacobian.DENSE_LIMIT && !model.indexed())) {
            return field;
        }
        // the compiler builds a dense Jacobian only up to its limits; beyond them the sparse one is the only one
        boolean dense = model.dimension() <= (model.indexed() ? ModelCompiler.INDEXED_DENSE_JACOBIAN_LIMIT
                : ModelCompiler.DENSE_JACOBIAN_LIMIT);
        return new WithSparseJacobian(model, field, model.dimension() > SparseJacobian.DENSE_LIMIT || !dense);
    }

    /** Delegates the rates and the dense Jacobian; adds the sparse one. */
    private static final class WithSparseJacobian extends ForwardingVectorField {
        private final DynamicalModel model;
        private final boolean large;
        private volatile SparseJacobian sparse;
        private volatile boolean made;

        WithSparseJacobian(DynamicalModel model, VectorField field, boolean large) {
            super(field);
            this.model = model;
            this.large = large;
        }

        @Override
        public boolean large() {
            return large;
        }

        @Override
        public SparseJacobian sparseJacobian() {
            if (!made) {
                synchronized (this) {
                    if (!made) {
                        sparse = of(model, delegate);
                        made = true;
                    }
                }
            }
            return sparse;
        }
    }
}
