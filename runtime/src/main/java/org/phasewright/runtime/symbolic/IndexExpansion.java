package org.phasewright.runtime.symbolic;

import java.util.HashMap;
import java.util.Map;

import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.Variable;

/**
 * Turns an expression over indices into a scalar one for given index values: {@link IndexValue}s become constants,
 * {@link Element}s the flat {@link Variable}s they denote (or 0 outside a bounded range) and {@link Sum}s chains of
 * additions. Analyses that work on scalar expressions (symbolic Jacobians, polynomial systems, symmetry checks) see
 * only the result.
 */
public final class IndexExpansion {
    private IndexExpansion() {
    }

    /** Expands {@code e} with the index named {@code index} set to {@code value}. */
    public static Expr expand(Expr e, String index, long value) {
        Map<String, Long> env = new HashMap<>();
        env.put(index, value);
        return expand(e, env);
    }

    /** Expands {@code e} with the given index values; an index not bound here is an error. */
    public static Expr expand(Expr e, Map<String, Long> indices) {
        return switch (e) {
            case Constant c -> c;
            case Variable v -> v;
            case IndexValue i -> new Constant(bound(i, indices));
            case Element el -> element(el, indexValue(el.index(), indices));
            case Sum s -> {
                Map<String, Long> inner = new HashMap<>(indices);
                yield pairwise(s, inner, 0, s.range().size());
            }
            case Negation n -> new Negation(expand(n.operand(), indices));
            case Binary b -> new Binary(b.operator(), expand(b.left(), indices), expand(b.right(), indices));
            case Call c -> new Call(c.function(), c.arguments().stream().map(a -> expand(a, indices)).toList());
        };
    }

    /** Sums positions [from, to) as a balanced tree, so a sum of 10^6 terms is 20 levels deep, not 10^6. */
    private static Expr pairwise(Sum s, Map<String, Long> inner, int from, int to) {
        if (to - from == 1) {
            inner.put(s.range().name(), (long) s.range().valueAt(from));
            return expand(s.body(), inner);
        }
        int middle = (from + to) >>> 1;
        Expr left = pairwise(s, inner, from, middle);
        Expr right = pairwise(s, inner, middle, to);
        return new Binary(BinaryOperator.ADD, left, right);
    }

    /** True when {@code e} has index values, family elements or sums, i.e. needs expanding. */
    public static boolean indexed(Expr e) {
        return switch (e) {
            case Constant c -> false;
            case Variable v -> false;
            case IndexValue i -> true;
            case Element el -> true;
            case Sum s -> true;
            case Negation n -> indexed(n.operand());
            case Binary b -> indexed(b.left()) || indexed(b.right());
            case Call c -> c.arguments().stream().anyMatch(IndexExpansion::indexed);
        };
    }

    /** The flat variable of {@code el} at index value {@code value}, or the constant 0 outside a bounded range. */
    public static Expr element(Element el, long value) {
        int position = el.range().position(value);
        if (position < 0) {
            return new Constant(0.0);
        }
        return new Variable(el.kind(), el.offset() + position,
                Element.elementName(el.family(), el.range().valueAt(position)));
    }

    /**
     * The integer value of an index expression: index values and integer constants combined with +, - and *.
     * Anything else (a state, a fraction, a function) is rejected by the language before it gets here.
     */
    public static long indexValue(Expr index, Map<String, Long> indices) {
        return switch (index) {
            case Constant c -> {
                double v = c.value();
                if (v != Math.rint(v) || Math.abs(v) > 1e15) {
                    throw new IllegalArgumentException("index " + v + " is not an integer");
                }
                yield (long) v;
            }
            case IndexValue i -> bound(i, indices);
            case Negation n -> -indexValue(n.operand(), indices);
            case Binary b -> switch (b.operator()) {
                case ADD -> indexValue(b.left(), indices) + indexValue(b.right(), indices);
                case SUBTRACT -> indexValue(b.left(), indices) - indexValue(b.right(), indices);
                case MULTIPLY -> indexValue(b.left(), indices) * indexValue(b.right(), indices);
                default -> throw new IllegalArgumentException("index arithmetic allows +, - and * only");
            };
            default -> throw new IllegalArgumentException("not an index expression: " + index);
        };
    }

    private static long bound(IndexValue i, Map<String, Long> indices) {
        Long v = indices.get(i.name());
        if (v == null) {
            throw new IllegalArgumentException("index " + i.name() + " is not bound here");
        }
        return v;
    }
}
