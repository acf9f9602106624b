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
    /** Writes the indexed forms, which need the enclosing loops; see {@link FamilyLoopWriter}. */
    interface Indexed {
        void indexValue(IndexValue i, StringBuilder out);

        void element(Element el, StringBuilder out);

        void sum(Sum s, StringBuilder out);

        /** Writes {@code v} and returns true, or returns false to let the writer print it as usual. */
        default boolean variable(Variable v, StringBuilder out) {
            return false;
        }
    }

    /** Exponents n for which a helper {@code pw<n>} is needed. */
    private final BitSet powersUsed = new BitSet();
    /** Derived quantities as locals {@code d<k>} (scalar code) or as elements {@code dv[k]} of an array. */
    private final boolean derivedInArray;

    JavaExpressionWriter() {
        this(false);
    }

    JavaExpressionWriter(boolean derivedInArray) {
        this.derivedInArray = derivedInArray;
    }

    String write(Expr e) {
        return write(e, null);
    }

    /** @param indexed writes index values, elements and sums; null where only scalar expressions may appear */
    String write(Expr e, Indexed indexed) {
        StringBuilder out = new StringBuilder();
        write(e, out, indexed);
        return out.toString();
    }

    /** Appends the {@code pw<n>} helpers the written expressions call, one per exponent used. */
    void writePowerHelpers(StringBuilder body) {
        for (int m = powersUsed.nextSetBit(0); m >= 0; m = powersUsed.nextSetBit(m + 1)) {
            body.append("\n    private static double pw").append(m).append("(double x) { return x");
            for (int r = 1; r < m; r++) {
                body.append(" * x"); // left to right, exactly as Arithmetic.power multiplies
            }
            body.append("; }\n");
        }
    }

    private void write(Expr e, StringBuilder out, Indexed ix) {
        switch (e) {
            case Constant c -> out.append(literal(c.value()));
            case Variable v when ix != null && ix.variable(v, out) -> { }
            case Variable v -> {
                switch (v.kind()) {
                    case STATE -> out.append("u[").append(v.index()).append(']');
                    case PARAMETER -> out.append("p[").append(v.index()).append(']');
                    case DERIVED -> out.append(derivedInArray ? "dv[" : "d").append(v.index())
                            .append(derivedInArray ? "]" : "");
                    case TIME -> out.append('t');
                }
            }
            case Negation n -> {
                out.append("(-");
                write(n.operand(), out, ix);
                out.append(')');
            }
            case Binary b when b.operator() == BinaryOperator.POWER -> power(b, out, ix);
            case Binary b -> {
                out.append('(');
                write(b.left(), out, ix);
                out.append(' ').append(b.operator().symbol()).append(' ');
                write(b.right(), out, ix);
                out.append(')');
            }
            case Call c -> {
                out.append(Arithmetic.javaName(c.function())).append('(');
                for (int i = 0; i < c.arguments().size(); i++) {
                    if (i > 0) {
                        out.append(", ");
                    }
                    write(c.arguments().get(i), out, ix);
                }
                out.append(')');
            }
            case IndexValue i -> {
                if (ix == null) {
                    throw unexpanded(i);
                }
                ix.indexValue(i, out);
            }
            case Element el -> {
                if (ix == null) {
                    throw unexpanded(el);
                }
                ix.element(el, out);
            }
            case Sum sum -> {
                if (ix == null) {
                    throw unexpanded(sum);
                }
                ix.sum(sum, out);
            }
        }
    }

    private static IllegalArgumentException unexpanded(Expr e) {
        return new IllegalArgumentException("indexed form reaches the scalar code writer: " + e);
    }

    /** Mirrors {@link Arithmetic#power}: small integer exponents multiply out, others call Math.pow. */
    private void power(Binary b, StringBuilder out, Indexed ix) {
        if (b.right() instanceof Constant c) {
            int n = Arithmetic.smallIntegerExponent(c.value());
            if (n != 0) {
                powersUsed.set(Math.abs(n));
                out.append(n > 0 ? "pw" : "(1.0 / pw").append(Math.abs(n)).append('(');
                write(b.left(), out, ix);
                out.append(n > 0 ? ")" : "))");
                return;
            }
            out.append("Math.pow(");
        } else {
            out.append("org.phasewright.runtime.symbolic.Arithmetic.power(");
        }
        write(b.left(), out, ix);
        out.append(", ");
        write(b.right(), out, ix);
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
