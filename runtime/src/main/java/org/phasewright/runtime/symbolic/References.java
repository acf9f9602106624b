package org.phasewright.runtime.symbolic;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

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

/** Which variables an expression refers to. */
public final class References {
    private References() {
    }

    public static void forEach(Expr e, Consumer<Variable> action) {
        switch (e) {
            case Constant c -> { }
            case Variable v -> action.accept(v);
            case Negation n -> forEach(n.operand(), action);
            case Binary b -> {
                forEach(b.left(), action);
                forEach(b.right(), action);
            }
            case Call c -> c.arguments().forEach(a -> forEach(a, action));
            case IndexValue i -> { }
            case Element el -> throw IndexedForms.unexpanded("reference lookup", el);
            case Sum s -> throw IndexedForms.unexpanded("reference lookup", s);
        }
    }

    public static List<Variable> of(Expr e) {
        List<Variable> out = new ArrayList<>();
        forEach(e, out::add);
        return out;
    }

    public static boolean uses(Expr e, VariableKind kind) {
        return of(e).stream().anyMatch(v -> v.kind() == kind);
    }

    /** True when {@code e} refers to state {@code index}. */
    public static boolean usesState(Expr e, int index) {
        return of(e).stream().anyMatch(v -> v.kind() == VariableKind.STATE && v.index() == index);
    }
}
