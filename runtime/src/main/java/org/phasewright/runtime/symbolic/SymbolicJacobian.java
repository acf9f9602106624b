package org.phasewright.runtime.symbolic;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DerivedQuantity;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;

/**
 * The Jacobian J[i][j] = d(rate i)/d(state j) as simplified expressions.
 * <p>
 * In the {@link #of compact} form, a non-trivial derivative of a derived quantity is not copied into every entry
 * that uses it; it becomes an auxiliary quantity, referred to as {@code Variable(DERIVED, derivedCount + m)} and
 * listed in {@link #auxiliary()} in an order where each only uses earlier ones. The {@link #inlined} form has no
 * auxiliaries and is what symbolic checks such as the divergence use. Entries may refer to derived values.
 */
public final class SymbolicJacobian {
    private final Expr[][] entries;
    private final List<DerivedQuantity> auxiliary;
    private final int derivedCount;

    private SymbolicJacobian(Expr[][] entries, List<DerivedQuantity> auxiliary, int derivedCount) {
        this.entries = entries;
        this.auxiliary = Collections.unmodifiableList(auxiliary);
        this.derivedCount = derivedCount;
    }

    public static SymbolicJacobian of(DynamicalModel model) {
        return build(model, true);
    }

    public static SymbolicJacobian inlined(DynamicalModel model) {
        return build(model, false);
    }

    private static SymbolicJacobian build(DynamicalModel model, boolean compact) {
        ModelChecks.check(model);
        int n = model.dimension();
        List<DerivedQuantity> derived = model.derived();
        int nd = derived.size();
        Expr[][] dDerived = new Expr[nd][n];
        List<DerivedQuantity> aux = new ArrayList<>();
        Differentiator diff = new Differentiator((k, j) -> dDerived[k][j]);
        Expr[][] entries = new Expr[n][n];
        for (int j = 0; j < n; j++) {
            String state = model.states().get(j).name();
            for (int k = 0; k < nd; k++) {
                Expr d = Simplifier.simplify(diff.partial(derived.get(k).definition(), j));
                if (compact && !trivial(d)) {
                    String name = "d(" + derived.get(k).name() + ")/d(" + state + ")";
                    aux.add(new DerivedQuantity(name, d, null));
                    d = new Variable(VariableKind.DERIVED, nd + aux.size() - 1, name);
                }
                dDerived[k][j] = d;
            }
            for (int i = 0; i < n; i++) {
                entries[i][j] = Simplifier.simplify(diff.partial(model.rates().get(i), j));
            }
        }
        return new SymbolicJacobian(entries, aux, nd);
    }

    private static boolean trivial(Expr e) {
        return e instanceof Constant || e instanceof Variable
                || (e instanceof Negation n && (n.operand() instanceof Constant || n.operand() instanceof Variable));
    }

    public int dimension() {
        return entries.length;
    }

    /** d(rate i)/d(state j). */
    public Expr entry(int i, int j) {
        return entries[i][j];
    }

    /** Derivatives of derived quantities, indexed from {@link #derivedCount()} on. Empty in the inlined form. */
    public List<DerivedQuantity> auxiliary() {
        return auxiliary;
    }

    /** The model's number of derived quantities; auxiliary m has derived index derivedCount + m. */
    public int derivedCount() {
        return derivedCount;
    }

    /** Model derived quantities followed by the auxiliaries: the list the entries' DERIVED indices point into. */
    public List<DerivedQuantity> extendedDerived(DynamicalModel model) {
        List<DerivedQuantity> all = new ArrayList<>(model.derived());
        all.addAll(auxiliary);
        return all;
    }
}
