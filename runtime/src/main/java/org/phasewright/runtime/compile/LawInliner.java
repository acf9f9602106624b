package org.phasewright.runtime.compile;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
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

/** Replaces derived quantities by their definitions, so a law refers to states, parameters and time only. */
final class LawInliner {
    private final DynamicalModel model;
    private final Map<String, Family> derivedFamilies = new HashMap<>();
    private final Map<Integer, Family> scalarFamilies = new HashMap<>();

    LawInliner(DynamicalModel model) {
        this.model = model;
        for (Family f : model.families(VariableKind.DERIVED)) {
            derivedFamilies.put(f.name(), f);
            if (f.scalar()) {
                scalarFamilies.put(f.offset(), f);
            }
        }
    }

    /** @param range the index bound in {@code e}, or null for a scalar law */
    Expr inline(Expr e, IndexRange range) throws SparseJacobianStructure.NotReducible {
        return switch (e) {
            case Constant c -> c;
            case IndexValue i -> i;
            case Variable v -> {
                if (v.kind() != VariableKind.DERIVED) {
                    yield v;
                }
                Family indexed = scalarFamilies.get(v.index());
                yield inline(indexed != null ? indexed.formula() : model.derived().get(v.index()).definition(),
                        null);
            }
            case Element el -> {
                if (el.kind() != VariableKind.DERIVED) {
                    yield el;
                }
                Family d = derivedFamilies.get(el.family());
                if (d == null) {
                    throw new SparseJacobianStructure.NotReducible("unknown derived family " + el.family());
                }
                boolean sameRange = range != null && range.lower() == d.range().lower()
                        && range.upper() == d.range().upper() && identity(el.index(), range);
                if (!d.range().cyclic() && !sameRange) {
                    throw new SparseJacobianStructure.NotReducible("element of bounded derived family " + d.name());
                }
                yield inline(replaceIndex(d.formula(), d.range().name(), el.index()), range);
            }
            case Sum s -> new Sum(s.range(), inline(s.body(), null)); // bounded derived elements stay out of sums
            case Negation n -> new Negation(inline(n.operand(), range));
            case Binary b -> new Binary(b.operator(), inline(b.left(), range), inline(b.right(), range));
            case Call c -> {
                List<Expr> args = new ArrayList<>();
                for (Expr a : c.arguments()) {
                    args.add(inline(a, range));
                }
                yield new Call(c.function(), args);
            }
        };
    }

    /** True when the index expression is the range's own index (as in d[i + 0]): linear, i with coefficient 1. */
    private static boolean identity(Expr index, IndexRange range) {
        LinearIndex linear = LinearIndex.of(index);
        return linear != null && linear.constant() == 0 && linear.coefficients().equals(Map.of(range.name(), 1L));
    }

    /** {@code e} with the index {@code name} replaced by the index expression {@code by}. */
    static Expr replaceIndex(Expr e, String name, Expr by) {
        return switch (e) {
            case IndexValue i -> i.name().equals(name) ? by : i;
            case Constant c -> c;
            case Variable v -> v;
            case Element el -> new Element(el.kind(), el.family(), el.range(), el.offset(),
                    replaceIndex(el.index(), name, by));
            case Sum s -> s.range().name().equals(name) ? s : new Sum(s.range(), replaceIndex(s.body(), name, by));
            case Negation n -> new Negation(replaceIndex(n.operand(), name, by));
            case Binary b -> new Binary(b.operator(), replaceIndex(b.left(), name, by),
                    replaceIndex(b.right(), name, by));
            case Call c -> new Call(c.function(), c.arguments().stream().map(a -> replaceIndex(a, name, by)).toList());
        };
    }
}
