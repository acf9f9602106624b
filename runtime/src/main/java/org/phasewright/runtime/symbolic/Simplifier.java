package org.phasewright.runtime.symbolic;

import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.MathFunction;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Variable;

/**
 * Simplifying constructors. Derivatives built through these stay compact: constants fold, x*0, x*1, x+0, x^1,
 * x^0 and double negations vanish, and signs move outwards so that {@code a + (-b)} becomes {@code a - b}.
 * Rules such as {@code 0*x = 0} and {@code x - x = 0} assume finite operands, as computer algebra systems do.
 * A fold whose result would not be finite (e.g. 1/0) is left unevaluated so its meaning is unchanged.
 */
public final class Simplifier {
    private Simplifier() {
    }

    /** Rebuilds {@code e} bottom-up through the simplifying constructors. */
    public static Expr simplify(Expr e) {
        return switch (e) {
            case Constant c -> c;
            case Variable v -> v;
            case Negation n -> negate(simplify(n.operand()));
            case Binary b -> binary(b.operator(), simplify(b.left()), simplify(b.right()));
            case Call c -> {
                List<Expr> args = new ArrayList<>(c.arguments().size());
                c.arguments().forEach(a -> args.add(simplify(a)));
                yield call(c.function(), args);
            }
            case IndexValue i -> i;
            case Element el -> new Element(el.kind(), el.family(), el.range(), el.offset(), simplify(el.index()));
            case Sum s -> new Sum(s.range(), simplify(s.body()));
        };
    }

    public static Expr constant(double value) {
        if (value == 0.0) {
            return Constant.ZERO;
        }
        return value == 1.0 ? Constant.ONE : new Constant(value);
    }

    public static Expr binary(BinaryOperator op, Expr a, Expr b) {
        return switch (op) {
            case ADD -> add(a, b);
            case SUBTRACT -> subtract(a, b);
            case MULTIPLY -> multiply(a, b);
            case DIVIDE -> divide(a, b);
            case POWER -> power(a, b);
        };
    }

    public static Expr add(Expr a, Expr b) {
        if (a instanceof Constant x && b instanceof Constant y && Double.isFinite(x.value() + y.value())) {
            return constant(x.value() + y.value());
        }
        if (isZero(a)) {
            return b;
        }
        if (isZero(b)) {
            return a;
        }
        if (b instanceof Negation n) {
            return subtract(a, n.operand());
        }
        if (b instanceof Constant c && c.value() < 0) {
            return subtract(a, constant(-c.value()));
        }
        if (a instanceof Negation n) {
            return subtract(b, n.operand());
        }
        if (a.equals(b)) { // the product rule on x*x gives x + x
            return multiply(constant(2), a);
        }
        if (a instanceof Constant) { // constants last reads as "x + 1"; IEEE addition commutes exactly
            return new Binary(BinaryOperator.ADD, b, a);
        }
        return new Binary(BinaryOperator.ADD, a, b);
    }

    public static Expr subtract(Expr a, Expr b) {
        if (a instanceof Constant x && b instanceof Constant y && Double.isFinite(x.value() - y.value())) {
            return constant(x.value() - y.value());
        }
        if (isZero(b)) {
            return a;
        }
        if (isZero(a)) {
            return negate(b);
        }
        if (a.equals(b)) {
            return Constant.ZERO;
        }
        if (b instanceof Negation n) {
            return add(a, n.operand());
        }
        if (b instanceof Constant c && c.value() < 0) {
            return add(a, constant(-c.value()));
        }
        if (a instanceof Negation n) {
            return negate(add(n.operand(), b));
        }
        return new Binary(BinaryOperator.SUBTRACT, a, b);
    }

    public static Expr multiply(Expr a, Expr b) {
        if (a instanceof Constant x && b instanceof Constant y && Double.isFinite(x.value() * y.value())) {
            return constant(x.value() * y.value());
        }
        if (isZero(a) || isZero(b)) {
            return Constant.ZERO;
        }
        if (isOne(a)) {
            return b;
        }
        if (isOne(b)) {
            return a;
        }
        if (a instanceof Negation n) {
            return negate(multiply(n.operand(), b));
        }
        if (b instanceof Negation n) {
            return negate(multiply(a, n.operand()));
        }
        if (b instanceof Constant && !(a instanceof Constant)) { // constants first: "2 * x"
            return multiply(b, a);
        }
        if (a instanceof Constant c) {
            if (c.value() < 0) {
                return negate(multiply(constant(-c.value()), b));
            }
            if (b instanceof Binary inner && inner.operator() == BinaryOperator.MULTIPLY
                    && inner.left() instanceof Constant c2 && Double.isFinite(c.value() * c2.value())) {
                return multiply(constant(c.value() * c2.value()), inner.right());
            }
        }
        return new Binary(BinaryOperator.MULTIPLY, a, b);
    }

    public static Expr divide(Expr a, Expr b) {
        if (a instanceof Constant x && b instanceof Constant y && Double.isFinite(x.value() / y.value())) {
            return constant(x.value() / y.value());
        }
        if (isOne(b)) {
            return a;
        }
        if (b instanceof Constant c && c.value() == -1.0) {
            return negate(a);
        }
        if (isZero(a) && !isZero(b)) {
            return Constant.ZERO;
        }
        if (a instanceof Negation n) {
            return negate(divide(n.operand(), b));
        }
        if (b instanceof Negation n) {
            return negate(divide(a, n.operand()));
        }
        return new Binary(BinaryOperator.DIVIDE, a, b);
    }

    public static Expr power(Expr a, Expr b) {
        if (a instanceof Constant x && b instanceof Constant y) {
            double v = Arithmetic.power(x.value(), y.value());
            if (Double.isFinite(v)) {
                return constant(v);
            }
        }
        if (isOne(b)) {
            return a;
        }
        if (isZero(b) || isOne(a)) {
            return Constant.ONE; // Math.pow(x, 0) and Math.pow(1, y) are 1 for every x and y
        }
        return new Binary(BinaryOperator.POWER, a, b);
    }

    public static Expr negate(Expr a) {
        return switch (a) {
            case Constant c -> constant(-c.value());
            case Negation n -> n.operand();
            case Binary b when b.operator() == BinaryOperator.SUBTRACT -> subtract(b.right(), b.left());
            default -> new Negation(a);
        };
    }

    public static Expr call(MathFunction f, List<Expr> args) {
        if (args.stream().allMatch(x -> x instanceof Constant)) {
            double a = ((Constant) args.get(0)).value();
            double b = args.size() > 1 ? ((Constant) args.get(1)).value() : 0.0;
            double v = Arithmetic.apply(f, a, b);
            if (Double.isFinite(v)) {
                return constant(v);
            }
        }
        return new Call(f, args);
    }

    public static Expr call(MathFunction f, Expr... args) {
        return call(f, List.of(args));
    }

    public static boolean isZero(Expr e) {
        return e instanceof Constant c && c.value() == 0.0;
    }

    public static boolean isOne(Expr e) {
        return e instanceof Constant c && c.value() == 1.0;
    }
}
