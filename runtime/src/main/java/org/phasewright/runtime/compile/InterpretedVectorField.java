package org.phasewright.runtime.compile;

import java.util.List;

import org.phasewright.runtime.model.DerivedQuantity;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.symbolic.ExprEvaluator;
import org.phasewright.runtime.symbolic.ModelChecks;
import org.phasewright.runtime.symbolic.SymbolicJacobian;

/**
 * Tree-walking implementation of the same interfaces as the generated code: the reference it is tested against,
 * and the fallback when a model is too large for the compiler. Families are evaluated from their formula at each
 * index value ({@link IndexedEvaluator}), never by expanding an element per call. Not thread-safe (it reuses one
 * scratch array).
 */
public final class InterpretedVectorField implements VectorField, DerivedValues {
    private final DynamicalModel model;
    private final ModelLayout layout;
    private final IndexedEvaluator indexed = new IndexedEvaluator();
    private SymbolicJacobian jacobian;
    private List<DerivedQuantity> auxiliary;
    private double[] scratch;

    public InterpretedVectorField(DynamicalModel model) {
        this(model, null);
    }

    /** @param jacobian null to build it the first time {@link #jacobian} is called */
    InterpretedVectorField(DynamicalModel model, SymbolicJacobian jacobian) {
        ModelChecks.check(model);
        this.model = model;
        this.layout = ModelLayout.of(model);
        this.jacobian = jacobian;
        this.auxiliary = jacobian == null ? List.of() : jacobian.auxiliary();
        this.scratch = new double[model.derived().size() + auxiliary.size()];
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
        evaluate(layout.derived(), t, u, p, scratch);
        evaluate(layout.rates(), t, u, p, dudt);
    }

    @Override
    public void jacobian(double t, double[] u, double[] p, double[] jac) {
        if (jacobian == null) {
            ModelCompiler.requireDenseJacobian(model);
            jacobian = SymbolicJacobian.of(model);
            auxiliary = jacobian.auxiliary();
            scratch = new double[model.derived().size() + auxiliary.size()];
        }
        evaluate(layout.derived(), t, u, p, scratch);
        int nd = model.derived().size();
        for (int m = 0; m < auxiliary.size(); m++) {
            scratch[nd + m] = ExprEvaluator.evaluate(auxiliary.get(m).definition(), t, u, p, scratch);
        }
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
        evaluate(layout.derived(), t, u, p, scratch);
        System.arraycopy(scratch, 0, out, 0, nd);
    }

    /** Each unit in order into {@code out[index + position]}; derived units read earlier ones from scratch. */
    private void evaluate(List<ModelLayout.Unit> units, double t, double[] u, double[] p, double[] out) {
        for (ModelLayout.Unit unit : units) {
            if (!unit.loop()) {
                out[unit.index()] = ExprEvaluator.evaluate(unit.formula(), t, u, p, scratch);
            } else if (unit.single()) {
                out[unit.index()] = indexed.evaluate(unit.formula(), t, u, p, scratch);
            } else {
                var range = unit.family().range();
                for (int k = 0; k < range.size(); k++) {
                    indexed.bind(range.name(), range.valueAt(k));
                    out[unit.index() + k] = indexed.evaluate(unit.formula(), t, u, p, scratch);
                    indexed.unbind();
                }
            }
        }
    }
}
