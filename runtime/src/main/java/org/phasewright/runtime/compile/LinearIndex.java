package org.phasewright.runtime.compile;

import java.util.LinkedHashMap;
import java.util.Map;

import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Negation;

/**
 * An index expression as {@code constant + sum of coefficient * index}, when it is linear. Lets the code generator
 * recognise the common {@code i + c} stencil reads, which index an array directly away from the edges.
 */
record LinearIndex(Map<String, Long> coefficients, long constant) {

    /** The linear form of {@code e}, or null when it multiplies two indices. */
    static LinearIndex of(Expr e) {
        return switch (e) {
            case Constant c -> new LinearIndex(Map.of(), (long) c.value());
            case IndexValue i -> new LinearIndex(Map.of(i.name(), 1L), 0);
            case Negation n -> scale(of(n.operand()), -1);
            case Binary b -> switch (b.operator()) {
                case ADD -> add(of(b.left()), of(b.right()), 1);
                case SUBTRACT -> add(of(b.left()), of(b.right()), -1);
                case MULTIPLY -> {
                    LinearIndex l = of(b.left()), r = of(b.right());
                    if (l == null || r == null) {
                        yield null;
                    }
                    if (l.coefficients.isEmpty()) {
                        yield scale(r, l.constant);
                    }
                    yield r.coefficients.isEmpty() ? scale(l, r.constant) : null;
                }
                default -> null;
            };
            default -> null;
        };
    }

    /** The index {@code name} when this is exactly {@code name + constant}, else null. */
    String unitShiftOf() {
        if (coefficients.size() != 1) {
            return null;
        }
        Map.Entry<String, Long> only = coefficients.entrySet().iterator().next();
        return only.getValue() == 1L ? only.getKey() : null;
    }

    private static LinearIndex scale(LinearIndex a, long factor) {
        if (a == null) {
            return null;
        }
        Map<String, Long> c = new LinkedHashMap<>();
        a.coefficients.forEach((k, v) -> {
            if (v * factor != 0) {
                c.put(k, v * factor);
            }
        });
        return new LinearIndex(c, a.constant * factor);
    }

    private static LinearIndex add(LinearIndex a, LinearIndex b, long sign) {
        if (a == null || b == null) {
            return null;
        }
        Map<String, Long> c = new LinkedHashMap<>(a.coefficients);
        b.coefficients.forEach((k, v) -> c.merge(k, sign * v, Long::sum));
        c.values().removeIf(v -> v == 0);
        return new LinearIndex(c, a.constant + sign * b.constant);
    }
}
