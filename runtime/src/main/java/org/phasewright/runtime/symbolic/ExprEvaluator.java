package org.phasewright.runtime.symbolic;

import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;

/**
 * Tree-walking evaluation of an {@link Expr}. A null array (or NaN time) means that kind of variable is not
 * available in this context, e.g. states inside a parameter value; referring to it raises
 * {@link ModelEvaluationException}.
 */
public final class ExprEvaluator {
    private ExprEvaluator() {
    }

    /** Evaluates with nothing but constants available. */
    public static double constant(Expr e) {
        return evaluate(e, Double.NaN, null, null, null);
    }

    public static double evaluate(Expr e, double t, double[] states, double[] parameters, double[] derived) {
        return switch (e) {
            case Constant c -> c.value();
            case Variable v -> lookup(v, t, states, parameters, derived);
            case Negation n -> -evaluate(n.operand(), t, states, parameters, derived);
            case Binary b -> {
                double l = evaluate(b.left(), t, states, parameters, derived);
                double r = evaluate(b.right(), t, states, parameters, derived);
                yield Arithmetic.binary(b.operator(), l, r);
            }
            case Call c -> {
                double a = evaluate(c.arguments().get(0), t, states, parameters, derived);
                double b = c.arguments().size() > 1
                        ? evaluate(c.arguments().get(1), t, states, parameters, derived) : 0.0;
                yield Arithmetic.apply(c.function(), a, b);
            }
            case IndexValue i -> throw IndexedForms.unexpanded("evaluation", i);
            case Element el -> throw IndexedForms.unexpanded("evaluation", el);
            case Sum s -> throw IndexedForms.unexpanded("evaluation", s);
        };
    }

    private static double lookup(Variable v, double t, double[] states, double[] parameters, double[] derived) {
        if (v.kind() == VariableKind.TIME) {
            if (Double.isNaN(t)) { // NaN time marks contexts without time, such as parameter values
                throw new ModelEvaluationException("time '" + v.name() + "' cannot be used here");
            }
            return t;
        }
        double[] source = switch (v.kind()) {
            case STATE -> states;
            case PARAMETER -> parameters;
            default -> derived;
        };
        if (source == null) {
            throw new ModelEvaluationException(kindWord(v) + " '" + v.name() + "' cannot be used here");
        }
        if (v.index() >= source.length) {
            throw new ModelEvaluationException(kindWord(v) + " '" + v.name() + "' has index " + v.index()
                    + " but only " + source.length + " exist");
        }
        return source[v.index()];
    }

    static String kindWord(Variable v) {
        return switch (v.kind()) {
            case STATE -> "state";
            case PARAMETER -> "parameter";
            case DERIVED -> "derived quantity";
            case TIME -> "time";
        };
    }
}
