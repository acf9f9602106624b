package org.phasewright.runtime.compile;

import java.util.List;

import org.phasewright.runtime.model.DerivedQuantity;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.symbolic.ExprEvaluator;
import org.phasewright.runtime.symbolic.ModelChecks;
import org.phasewright.runtime.symbolic.SymbolicJacobian;

/**
 * Tree-walking implementation of the same interfaces as the generated code: the reference it is tested against,
 * and the fallback when a model is too large for the compiler. Not thread-safe (it reuses one scratch array).
 */
public final class InterpretedVectorField implements VectorField, DerivedValues {
    private final DynamicalModel model;
    private final SymbolicJacobian jacobian;
    private final List<DerivedQuantity> extended;
    private final double[] scratch;

    public InterpretedVectorField(DynamicalModel model) {
        this(model, SymbolicJacobian.of(model));
    }

    InterpretedVectorField(DynamicalModel model, SymbolicJacobian jacobian) {
        ModelChecks.check(model);
        this.model = model;
        this.jacobian = jacobian;
        this.extended = jacobian.extendedDerived(model);
        this.scratch = new double[extended.size()];
    }

    @Override
    public int dimension() {
        return model.dimension();
    }

    @Override
    public int derivedCount() {
        return model.derived().size();
    }

    @Override
    public void rates(double t, double[] u, double[] p, double[] dudt) {
        fill(t, u, p, model.derived().size());
        for (int i = 0; i < dudt.length && i < model.dimension(); i++) {
            dudt[i] = ExprEvaluator.evaluate(model.rates().get(i), t, u, p, scratch);
        }
    }

    @Override
    public void jacobian(double t, double[] u, double[] p, double[] jac) {
        fill(t, u, p, extended.size());
        int n = model.dimension();
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                jac[i * n + j] = ExprEvaluator.evaluate(jacobian.entry(i, j), t, u, p, scratch);
            }
        }
    }

    @Override
    public void derived(double t, double[] u, double[] p, double[] out) {
        int nd = model.derived().size();
        fill(t, u, p, nd);
        System.arraycopy(scratch, 0, out, 0, nd);
    }

    private void fill(double t, double[] u, double[] p, int count) {
        for (int k = 0; k < count; k++) {
            scratch[k] = ExprEvaluator.evaluate(extended.get(k).definition(), t, u, p, scratch);
        }
    }
}
