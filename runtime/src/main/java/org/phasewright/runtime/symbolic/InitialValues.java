package org.phasewright.runtime.symbolic;

import java.util.List;

import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.StateVariable;

/** The declared initial state, evaluated with given parameter values. */
public final class InitialValues {
    private InitialValues() {
    }

    /** @throws ModelEvaluationException if an initial value uses a state, derived quantity or time, or is not finite */
    public static double[] resolve(DynamicalModel model, double[] parameters) {
        List<StateVariable> states = model.states();
        double[] u = new double[states.size()];
        for (int i = 0; i < u.length; i++) {
            u[i] = evaluate(states.get(i).initial(), parameters, "initial value of '" + states.get(i).name() + "'");
        }
        return u;
    }

    /** Evaluates a parameter-only expression such as an end time or a start value; {@code what} names it in errors. */
    public static double evaluate(Expr e, double[] parameters, String what) {
        double value;
        try {
            value = ExprEvaluator.evaluate(e, Double.NaN, null, parameters, null);
        } catch (ModelEvaluationException ex) {
            throw new ModelEvaluationException(what + ": " + ex.getMessage());
        }
        if (!Double.isFinite(value)) {
            throw new ModelEvaluationException(what + " evaluates to " + value);
        }
        return value;
    }
}
