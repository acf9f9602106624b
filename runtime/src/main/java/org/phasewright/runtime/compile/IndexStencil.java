package org.phasewright.runtime.compile;

import java.util.Set;

import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Variable;

/** A reference x[a·i + b]: its column without walking the index expression (the common stencil case). */
record IndexStencil(long a, long b, IndexRange range, int offset) {
    static IndexStencil of(Expr ref, IndexRange blockRange) {
        if (!(ref instanceof Element el) || blockRange == null) {
            return null;
        }
        // a·i + b in the block's own index only (a = 0 for a constant); other indices (a sum's) are not stencils
        LinearIndex linear = LinearIndex.of(el.index());
        String name = blockRange.name();
        if (linear == null || !Set.of(name).containsAll(linear.coefficients().keySet())) {
            return null;
        }
        return new IndexStencil(linear.coefficients().getOrDefault(name, 0L), linear.constant(), el.range(),
                el.offset());
    }

    int column(long value) {
        int position = range.position(a * value + b);
        return position < 0 ? -1 : offset + position;
    }

    /**
     * The value of an integer index expression with the bound indices {@code name} and {@code inner} (an enclosing
     * sum's, which shadows the other; null when there is none). No allocation, unlike a map of bindings.
     */
    static long indexValue(Expr e, String name, long value, String inner, long innerValue) {
        return switch (e) {
            case Constant c -> (long) c.value();
            case IndexValue i -> {
                if (i.name().equals(inner)) {
                    yield innerValue;
                }
                if (!i.name().equals(name)) {
                    throw new IllegalArgumentException("index " + i.name() + " is not bound here");
                }
                yield value;
            }
            case Negation n -> -indexValue(n.operand(), name, value, inner, innerValue);
            case Binary b -> {
                long l = indexValue(b.left(), name, value, inner, innerValue);
                long r = indexValue(b.right(), name, value, inner, innerValue);
                yield switch (b.operator()) {
                    case ADD -> l + r;
                    case SUBTRACT -> l - r;
                    case MULTIPLY -> l * r;
                    default -> throw new IllegalArgumentException("index arithmetic allows +, - and * only");
                };
            }
            default -> throw new IllegalArgumentException("not an index expression: " + e);
        };
    }

    /** The same with one bound index. */
    static long indexValue(Expr e, String name, long value) {
        return indexValue(e, name, value, null, 0);
    }

    /**
     * The flat column of a state reference in a row whose index {@code name} has {@code value} (and, inside a sum,
     * whose sum index {@code inner} has {@code innerValue}), or -1 outside the referenced range.
     */
    static int column(Expr ref, String name, long value, String inner, long innerValue) {
        if (ref instanceof Variable v) {
            return v.index();
        }
        Element el = (Element) ref;
        int position = el.range().position(indexValue(el.index(), name, value, inner, innerValue));
        return position < 0 ? -1 : el.offset() + position;
    }
}
