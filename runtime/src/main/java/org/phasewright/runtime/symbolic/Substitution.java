package org.phasewright.runtime.symbolic;

import java.util.List;

import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.DerivedQuantity;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;

/** Replacing variables by values or definitions, followed by simplification. */
public final class Substitution {
    private Substitution() {
    }

    /** Puts parameter values in and folds what becomes constant. */
    public static Expr parameters(Expr e, double[] values) {
        return Simplifier.simplify(
                map(e, v -> v.kind() == VariableKind.PARAMETER ? new Constant(values[v.index()]) : v));
    }

    /** Replaces every derived quantity by its definition (recursively), leaving states, parameters and time. */
    public static Expr inlineDerived(Expr e, List<DerivedQuantity> derived) {
        return Simplifier.simplify(map(e, v -> v.kind() == VariableKind.DERIVED
                ? inlineDerived(derived.get(v.index()).definition(), derived) : v));
    }

    private static Expr map(Expr e, java.util.function.Function<Variable, Expr> f) {
        return switch (e) {
            case Constant c -> c;
            case Variable v -> f.apply(v);
            case Negation n -> new Negation(map(n.operand(), f));
            case Binary b -> new Binary(b.operator(), map(b.left(), f), map(b.right(), f));
            case Call c -> new Call(c.function(), c.arguments().stream().map(a -> map(a, f)).toList());
            case IndexValue i -> i;
            case Element el -> el; // families are substituted element by element after IndexExpansion
            case Sum s -> new Sum(s.range(), map(s.body(), f));
        };
    }
}
