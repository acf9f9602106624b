package org.phasewright.runtime.compile;

import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.symbolic.Arithmetic;

/**
 * Tree-walking evaluation of a family formula at bound index values, without expanding it: the interpreter's
 * counterpart of {@link FamilyLoopWriter}, with the same arithmetic (sums add left to right from 0.0), so the two
 * agree bit for bit. Not thread-safe: it keeps the bound indices in small arrays it reuses.
 */
final class IndexedEvaluator {
    private String[] names = new String[4];
    private long[] values = new long[4];
    private int depth;

    /** Binds {@code index} to {@code value} for the following evaluations (until {@link #unbind}). */
    void bind(String index, long value) {
        if (depth == names.length) {
            names = java.util.Arrays.copyOf(names, depth * 2);
            values = java.util.Arrays.copyOf(values, depth * 2);
        }
        names[depth] = index;
        values[depth++] = value;
    }

    void unbind() {
        depth--;
    }

    double evaluate(Expr e, double t, double[] u, double[] p, double[] dv) {
        return switch (e) {
            case Constant c -> c.value();
            case Variable v -> switch (v.kind()) {
                case STATE -> u[v.index()];
                case PARAMETER -> p[v.index()];
                case DERIVED -> dv[v.index()];
                case TIME -> t;
            };
            case Negation n -> -evaluate(n.operand(), t, u, p, dv);
            case Binary b -> {
                double l = evaluate(b.left(), t, u, p, dv);
                double r = evaluate(b.right(), t, u, p, dv);
                yield Arithmetic.binary(b.operator(), l, r);
            }
            case Call c -> {
                double a = evaluate(c.arguments().get(0), t, u, p, dv);
                double b = c.arguments().size() > 1 ? evaluate(c.arguments().get(1), t, u, p, dv) : 0.0;
                yield Arithmetic.apply(c.function(), a, b);
            }
            case IndexValue i -> (double) lookup(i.name());
            case Element el -> {
                int position = el.range().position(index(el.index()));
                if (position < 0) {
                    yield 0.0;
                }
                double[] source = switch (el.kind()) {
                    case STATE -> u;
                    case PARAMETER -> p;
                    default -> dv;
                };
                yield source[el.offset() + position];
            }
            case Sum s -> {
                double total = 0.0;
                for (int k = s.range().lower(); k <= s.range().upper(); k++) {
                    bind(s.range().name(), k);
                    total += evaluate(s.body(), t, u, p, dv);
                    unbind();
                }
                yield total;
            }
        };
    }

    /** Integer value of an index expression (+, - and * on long, as IndexExpansion computes it). */
    long index(Expr e) {
        return switch (e) {
            case Constant c -> (long) c.value();
            case IndexValue i -> lookup(i.name());
            case Negation n -> -index(n.operand());
            case Binary b -> switch (b.operator()) {
                case ADD -> index(b.left()) + index(b.right());
                case SUBTRACT -> index(b.left()) - index(b.right());
                case MULTIPLY -> index(b.left()) * index(b.right());
                default -> throw new IllegalArgumentException("index arithmetic allows +, - and * only");
            };
            default -> throw new IllegalArgumentException("not an index expression: " + e);
        };
    }

    private long lookup(String name) {
        for (int k = depth - 1; k >= 0; k--) {
            if (names[k].equals(name)) {
                return values[k];
            }
        }
        throw new IllegalArgumentException("index " + name + " is not bound here");
    }
}
