package org.phasewright.runtime.symbolic;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;

import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Parameter;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;

/** Numerical values of a model's parameters, which may be defined in terms of each other. */
public final class ParameterValues {
    private ParameterValues() {
    }

    /**
     * Evaluates every parameter after the parameters it refers to (depth-first order).
     *
     * @throws ModelEvaluationException on a cyclic definition (the message names the cycle), a reference to a
     *         state, derived quantity or time, or a value that is not finite
     */
    public static double[] resolve(DynamicalModel model) {
        List<Parameter> parameters = model.parameters();
        int n = parameters.size();
        double[] values = new double[n];
        int[] mark = new int[n]; // 0 unvisited, 1 on the current path, 2 done
        for (int i = 0; i < n; i++) {
            visit(i, parameters, values, mark, new ArrayDeque<>());
        }
        return values;
    }

    private static void visit(int i, List<Parameter> parameters, double[] values, int[] mark, Deque<Integer> path) {
        if (mark[i] == 2) {
            return;
        }
        Parameter parameter = parameters.get(i);
        if (mark[i] == 1) {
            List<String> cycle = new ArrayList<>();
            boolean inCycle = false;
            for (var it = path.descendingIterator(); it.hasNext();) {
                int k = it.next();
                inCycle |= k == i;
                if (inCycle) {
                    cycle.add(parameters.get(k).name());
                }
            }
            cycle.add(parameter.name());
            throw new ModelEvaluationException("parameters are defined in a cycle: " + String.join(" -> ", cycle));
        }
        mark[i] = 1;
        path.push(i);
        for (Variable v : References.of(parameter.value())) {
            if (v.kind() != VariableKind.PARAMETER) {
                throw new ModelEvaluationException("parameter '" + parameter.name() + "' refers to "
                        + ExprEvaluator.kindWord(v) + " '" + v.name() + "'; a parameter value may only use numbers"
                        + " and other parameters");
            }
            if (v.index() >= parameters.size()) {
                throw new ModelEvaluationException("parameter '" + parameter.name() + "' refers to unknown parameter '"
                        + v.name() + "'");
            }
            visit(v.index(), parameters, values, mark, path);
        }
        path.pop();
        double value = ExprEvaluator.evaluate(parameter.value(), Double.NaN, null, values, null);
        if (!Double.isFinite(value)) {
            throw new ModelEvaluationException("parameter '" + parameter.name() + "' evaluates to " + value);
        }
        values[i] = value;
        mark[i] = 2;
    }
}
