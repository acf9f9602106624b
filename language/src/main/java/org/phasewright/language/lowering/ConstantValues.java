package org.phasewright.language.lowering;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.phasewright.language.ast.DependencyOrder;
import org.phasewright.language.ast.PhaseModels;
import org.phasewright.language.phase.Expression;
import org.phasewright.language.phase.ParamDecl;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.language.phase.Symbol;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;
import org.phasewright.runtime.symbolic.ExprEvaluator;

/**
 * Values of params and of expressions that use only params, for checks that need numbers (ranges, end times)
 * while the rest of the model may still be broken. Anything that cannot be evaluated yields empty.
 */
public final class ConstantValues {
    private final ExpressionLowering lowering;
    private final double[] values;

    private ConstantValues(ExpressionLowering lowering, double[] values) {
        this.lowering = lowering;
        this.values = values;
    }

    public static ConstantValues of(PhaseModel model) {
        List<ParamDecl> params = PhaseModels.params(model);
        Map<Symbol, Variable> variables = new HashMap<>();
        double[] values = new double[params.size()];
        for (int i = 0; i < params.size(); i++) {
            variables.put(params.get(i), new Variable(VariableKind.PARAMETER, i, params.get(i).getName()));
            values[i] = Double.NaN;
        }
        ConstantValues constants = new ConstantValues(new ExpressionLowering(variables), values);
        DependencyOrder<ParamDecl> order = DependencyOrder.ofParams(model);
        for (ParamDecl param : order.ordered()) {
            int at = params.indexOf(param); // -1 for a param reached by a reference outside this model
            if (at >= 0 && !order.cycles().containsKey(param)) {
                values[at] = constants.evaluate(param.getValue()).orElse(Double.NaN);
            }
        }
        return constants;
    }

    /** The value of an expression over params, or empty when it uses anything else or a param is unknown. */
    public OptionalDouble evaluate(Expression expression) {
        try {
            double value = ExprEvaluator.evaluate(lowering.lower(expression), Double.NaN, null, values, null);
            return Double.isNaN(value) ? OptionalDouble.empty() : OptionalDouble.of(value);
        } catch (RuntimeException notConstant) {
            return OptionalDouble.empty();
        }
    }
}
