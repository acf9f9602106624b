package org.phasewright.runtime.compile;

import java.util.BitSet;

import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.symbolic.Arithmetic;

/**
 * Prints an expression as Java. Only indices reach the output (u[i], p[i], d{k}, t), never a model name, so model
 * text cannot inject code. Everything is parenthesised so operator precedence never depends on the printer.
 */
final class JavaExpressionWriter {
    /** Exponents n for which a helper {@code pw<n>} is needed. */
    private final BitSet powersUsed = new BitSet();

    String write(Expr e) {
        StringBuilder out = new StringBuilder();
        write(e, out);
        return out.toString();
    }

    BitSet powersUsed() {
        return powersUsed;
    }

    private void write(Expr e, StringBuilder out) {
        switch (e) {
            case Constant c -> out.append(literal(c.value()));
            case Variable v -> {
                switch (v.kind()) {
                    case STATE -> out.append("u[").append(v.index()).append(']');
                    case PARAMETER -> out.append("p[").append(v.index()).append(']');
                    case DERIVED -> out.append('d').append(v.index());
                    case TIME -> out.append('t');
                }
            }
            case Negation n -> {
                out.append("(-");
                write(n.operand(), out);
                out.append(')');
            }
            case Binary b when b.operator() == BinaryOperator.POWER -> power(b, out);
            case Binary b -> {
                out.append('(');
                write(b.left(), out);
                out.append(' ').append(b.operator().symbol()).append(' ');
                write(b.right(), out);
                out.append(')');
            }
            case Call c -> {
                out.append(Arithmetic.javaName(c.function())).append('(');
                for (int i = 0; i < c.arguments().size(); i++) {
                    if (i > 0) {
                        out.append(", ");
                    }
                    write(c.arguments().get(i), out);
                }
                out.append(')');
            }
            case IndexValue i -> throw unexpanded(i);
            case Element el -> throw unexpanded(el);
            case Sum sum -> throw unexpanded(sum);
        }
    }

    private static IllegalArgumentException unexpanded(Expr e) {
        return new IllegalArgumentException("indexed form reaches the scalar code writer: " + e);
    }

    /** Mirrors {@link Arithmetic#power}: small integer exponents multiply out, others call Math.pow. */
    private void power(Binary b, StringBuilder out) {
        if (b.right() instanceof Constant c) {
            int n = Arithmetic.smallIntegerExponent(c.value());
            if (n != 0) {
                powersUsed.set(Math.abs(n));
                out.append(n > 0 ? "pw" : "(1.0 / pw").append(Math.abs(n)).append('(');
                write(b.left(), out);
                out.append(n > 0 ? ")" : "))");
                return;
            }
            out.append("Math.pow(");
        } else {
            out.append("org.phasewright.runtime.symbolic.Arithmetic.power(");
        }
        write(b.left(), out);
        out.append(", ");
        write(b.right(), out);
        out.append(')');
    }

    static String literal(double v) {
        if (Double.isNaN(v)) {
            return "Double.NaN";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "Double.POSITIVE_INFINITY" : "Double.NEGATIVE_INFINITY";
        }
        String s = Double.toString(v); // shortest text that reads back to the same double
        return v < 0 || (v == 0 && 1 / v < 0) ? "(" + s + ")" : s;
    }
}
