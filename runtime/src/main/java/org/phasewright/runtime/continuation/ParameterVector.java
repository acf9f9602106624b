package org.phasewright.runtime.continuation;

import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Parameter;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;
import org.phasewright.runtime.symbolic.ExprEvaluator;
import org.phasewright.runtime.symbolic.References;

/**
 * The full parameter vector for a value of the one parameter being varied. Parameters defined in terms of it
 * (`param c = 2*a` while `a` moves) are re-evaluated, in dependency order, so the model stays consistent.
 */
public final class ParameterVector {
    private final List<Parameter> parameters;
    private final double[] base;
    private final int index;
    /** Parameters depending on the varied one, each after those it uses. */
    private final int[] dependents;

    public ParameterVector(DynamicalModel model, double[] baseValues, int index) {
        this.parameters = model.parameters();
        this.base = baseValues.clone();
        this.index = index;
        List<Integer> order = new ArrayList<>();
        boolean[] done = new boolean[parameters.size()];
        for (int i = 0; i < parameters.size(); i++) {
            visit(i, done, order);
        }
        boolean[] depends = new boolean[parameters.size()];
        depends[index] = true;
        List<Integer> affected = new ArrayList<>();
        for (int i : order) { // every parameter comes after the ones it refers to
            for (Variable v : References.of(parameters.get(i).value())) {
                if (v.kind() == VariableKind.PARAMETER && depends[v.index()] && i != index) {
                    depends[i] = true;
                }
            }
            if (depends[i] && i != index) {
                affected.add(i);
            }
        }
        this.dependents = affected.stream().mapToInt(Integer::intValue).toArray();
    }

    private void visit(int i, boolean[] done, List<Integer> order) {
        if (done[i]) {
            return;
        }
        done[i] = true; // cycles were rejected when the base values were resolved
        for (Variable v : References.of(parameters.get(i).value())) {
            if (v.kind() == VariableKind.PARAMETER) {
                visit(v.index(), done, order);
            }
        }
        order.add(i);
    }

    public int index() {
        return index;
    }

    public String name() {
        return parameters.get(index).name();
    }

    /** Writes the parameter vector for {@code value} into {@code out}. */
    public void fill(double value, double[] out) {
        System.arraycopy(base, 0, out, 0, base.length);
        out[index] = value;
        for (int i : dependents) {
            out[i] = ExprEvaluator.evaluate(parameters.get(i).value(), Double.NaN, null, out, null);
        }
    }

    public double[] at(double value) {
        double[] out = new double[base.length];
        fill(value, out);
        return out;
    }
}
