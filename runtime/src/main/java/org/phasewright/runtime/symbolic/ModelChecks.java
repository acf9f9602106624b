package org.phasewright.runtime.symbolic;

import java.util.List;

import org.phasewright.runtime.model.DerivedQuantity;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;

/**
 * Structural checks the runtime relies on: every reference is in range and derived quantities only use earlier ones
 * (so one pass in declaration order computes them). The language should already guarantee this; the runtime checks
 * again because generated code would otherwise fail with an index error far from the cause.
 */
public final class ModelChecks {
    private ModelChecks() {
    }

    /** @throws ModelEvaluationException naming the first problem found */
    public static void check(DynamicalModel model) {
        List<DerivedQuantity> derived = model.derived();
        for (int k = 0; k < derived.size(); k++) {
            checkExpr(model, derived.get(k).definition(), k, "derived quantity '" + derived.get(k).name() + "'");
        }
        for (int i = 0; i < model.rates().size(); i++) {
            checkExpr(model, model.rates().get(i), derived.size(), "rate of '" + model.states().get(i).name() + "'");
        }
    }

    private static void checkExpr(DynamicalModel model, Expr e, int derivedLimit, String where) {
        for (Variable v : References.of(e)) {
            int size = switch (v.kind()) {
                case STATE -> model.states().size();
                case PARAMETER -> model.parameters().size();
                case DERIVED -> derivedLimit;
                case TIME -> 1;
            };
            if (v.index() >= size) {
                String why = v.kind() == VariableKind.DERIVED && v.index() < model.derived().size()
                        ? " which is not defined before it" : " which does not exist";
                throw new ModelEvaluationException(where + " refers to " + ExprEvaluator.kindWord(v) + " '" + v.name()
                        + "'" + why);
            }
        }
    }
}
