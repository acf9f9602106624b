package org.phasewright.runtime.compile;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;

/**
 * A model's derived quantities and rates cut into units in flat order: single scalars, and families (one loop
 * each, or one statement with sums for the one-element families of scalars whose formulas have sums). Built without
 * expanding any family element, so a family of 10^6 elements costs one unit.
 */
final class ModelLayout {
    /** A scalar at flat {@code index} of its kind, or a family starting at {@code index}. */
    record Unit(int index, Expr formula, String name, Family family) {
        boolean loop() {
            return family != null;
        }

        /** A one-element family made for a scalar whose formula has sums or elements (no loop variable). */
        boolean single() {
            return family != null && family.scalar();
        }
    }

    private final List<Unit> derived;
    private final List<Unit> rates;

    private ModelLayout(List<Unit> derived, List<Unit> rates) {
        this.derived = List.copyOf(derived);
        this.rates = List.copyOf(rates);
    }

    static ModelLayout of(DynamicalModel model) {
        return new ModelLayout(
                units(model, VariableKind.DERIVED, model.derived().size(),
                        k -> model.derived().get(k).definition(), k -> model.derived().get(k).name()),
                units(model, VariableKind.STATE, model.dimension(),
                        k -> model.rates().get(k), k -> "d/dt " + model.states().get(k).name()));
    }

    private static List<Unit> units(DynamicalModel model, VariableKind kind, int count,
            java.util.function.IntFunction<Expr> scalarFormula, java.util.function.IntFunction<String> scalarName) {
        List<Family> families = new ArrayList<>(model.families(kind));
        families.sort(java.util.Comparator.comparingInt(Family::offset));
        List<Unit> out = new ArrayList<>();
        int next = 0;
        for (Family f : families) {
            for (; next < f.offset(); next++) {
                out.add(new Unit(next, scalarFormula.apply(next), scalarName.apply(next), null));
            }
            if (f.formula() == null) {
                throw new IllegalArgumentException("family " + f.name() + " has no formula");
            }
            out.add(new Unit(f.offset(), f.formula(), f.name(), f));
            next = f.offset() + f.size();
        }
        for (; next < count; next++) {
            out.add(new Unit(next, scalarFormula.apply(next), scalarName.apply(next), null));
        }
        return out;
    }

    List<Unit> derived() {
        return derived;
    }

    List<Unit> rates() {
        return rates;
    }

    /** Which derived units the rates need, directly or through other derived quantities. */
    boolean[] derivedNeededByRates() {
        boolean[] needed = new boolean[derived.size()];
        for (Unit r : rates) {
            markUses(r.formula(), needed);
        }
        return needed;
    }

    private void markUses(Expr e, boolean[] needed) {
        leaves(e, leaf -> {
            int flat = switch (leaf) {
                case Variable v when v.kind() == VariableKind.DERIVED -> v.index();
                case Element el when el.kind() == VariableKind.DERIVED -> el.offset();
                default -> -1;
            };
            if (flat >= 0) {
                int u = derivedUnitOf(flat);
                if (!needed[u]) {
                    needed[u] = true;
                    markUses(derived.get(u).formula(), needed);
                }
            }
        });
    }

    /** The derived unit holding flat derived index {@code flat}. */
    int derivedUnitOf(int flat) {
        int lo = 0, hi = derived.size() - 1;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (derived.get(mid).index() <= flat) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return lo;
    }

    /** True when some rate uses time, directly or through derived quantities. */
    boolean usesTime() {
        boolean[] needed = derivedNeededByRates();
        for (int u = 0; u < derived.size(); u++) {
            if (needed[u] && refersToTime(derived.get(u).formula())) {
                return true;
            }
        }
        return rates.stream().anyMatch(r -> refersToTime(r.formula()));
    }

    private static boolean refersToTime(Expr e) {
        boolean[] found = {false};
        leaves(e, leaf -> found[0] |= leaf instanceof Variable v && v.kind() == VariableKind.TIME);
        return found[0];
    }

    /** Visits every variable and family element of {@code e}, including those inside sums. */
    static void leaves(Expr e, Consumer<Expr> action) {
        switch (e) {
            case Constant c -> { }
            case IndexValue i -> { }
            case Variable v -> action.accept(v);
            case Element el -> action.accept(el);
            case Sum s -> leaves(s.body(), action);
            case Negation n -> leaves(n.operand(), action);
            case Binary b -> {
                leaves(b.left(), action);
                leaves(b.right(), action);
            }
            case Call c -> c.arguments().forEach(a -> leaves(a, action));
        }
    }
}
