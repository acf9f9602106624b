package org.phasewright.runtime.compile;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;

/**
 * Whether a model is a lattice in the sense of {@link LatticeRates}, and its reaches: all states in families over
 * one cyclic range, rates that read states only at {@code i + c} of their own index, parameters as scalars or as
 * tables over the same range read at {@code i + c}, the index value and time; no sums, no derived quantities.
 * Anything else (scalar states, couplings through sums, bounded edges) is left to the whole-state integrators.
 */
record LatticeShape(IndexRange range, List<Family> components, int reachBelow, int reachAbove) {
    /** Widest stencil (cells below plus above) taken as a lattice. */
    static final int MAX_REACH = 32;

    /** The shape of {@code model}, or null when it is not such a lattice. */
    static LatticeShape of(DynamicalModel model) {
        List<Family> states = new ArrayList<>(model.families(VariableKind.STATE));
        if (states.isEmpty() || states.stream().anyMatch(Family::scalar)) {
            return null;
        }
        states.sort(Comparator.comparingInt(Family::offset));
        IndexRange range = states.get(0).range();
        if (!range.cyclic()) {
            return null;
        }
        long total = 0;
        for (Family f : states) {
            if (!sameRange(f.range(), range) || f.formula() == null || f.offset() != total) {
                return null;
            }
            total += f.size();
        }
        if (total != model.dimension()) {
            return null;
        }
        int[] reach = {0, 0};
        for (Family f : states) {
            if (!local(f.formula(), f.range().name(), range, reach)) {
                return null;
            }
        }
        if (reach[0] + reach[1] > MAX_REACH) { // halos would outgrow the tiles
            return null;
        }
        return new LatticeShape(range, List.copyOf(states), reach[0], reach[1]);
    }

    static boolean sameRange(IndexRange a, IndexRange b) {
        return a.lower() == b.lower() && a.upper() == b.upper() && a.cyclic() == b.cyclic();
    }

    /** True when {@code e} reads only shifts of {@code index}; widens reach = {below, above} by its state reads. */
    private static boolean local(Expr e, String index, IndexRange range, int[] reach) {
        return switch (e) {
            case Constant c -> true;
            case IndexValue i -> i.name().equals(index);
            case Variable v -> v.kind() == VariableKind.PARAMETER || v.kind() == VariableKind.TIME;
            case Element el -> {
                LinearIndex li = LinearIndex.of(el.index());
                if (li == null || !index.equals(li.unitShiftOf()) || !sameRange(el.range(), range)
                        || li.constant() < -MAX_REACH || li.constant() > MAX_REACH) {
                    yield false;
                }
                if (el.kind() == VariableKind.STATE) {
                    reach[0] = (int) Math.max(reach[0], -li.constant());
                    reach[1] = (int) Math.max(reach[1], li.constant());
                    yield true;
                }
                yield el.kind() == VariableKind.PARAMETER;
            }
            case Sum s -> false;
            case Negation n -> local(n.operand(), index, range, reach);
            case Binary b -> local(b.left(), index, range, reach) && local(b.right(), index, range, reach);
            case Call c -> c.arguments().stream().allMatch(a -> local(a, index, range, reach));
        };
    }
}
