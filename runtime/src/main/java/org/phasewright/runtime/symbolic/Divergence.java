package org.phasewright.runtime.symbolic;

import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;

/**
 * The divergence of the vector field, the trace of its Jacobian: the rate at which phase-space volume grows.
 * A constant negative divergence (as for Lorenz) means the system is dissipative everywhere.
 */
public final class Divergence {
    private Divergence() {
    }

    /** Simplified trace; derived quantities are inlined so the result only mentions states, parameters and time. */
    public static Expr of(DynamicalModel model) {
        SymbolicJacobian jacobian = SymbolicJacobian.inlined(model);
        Expr trace = org.phasewright.runtime.model.Constant.ZERO;
        for (int i = 0; i < jacobian.dimension(); i++) {
            trace = Simplifier.add(trace, jacobian.entry(i, i));
        }
        return Substitution.inlineDerived(trace, model.derived());
    }
}
