package org.phasewright.runtime.symbolic;

import static org.phasewright.runtime.symbolic.Simplifier.add;
import static org.phasewright.runtime.symbolic.Simplifier.call;
import static org.phasewright.runtime.symbolic.Simplifier.constant;
import static org.phasewright.runtime.symbolic.Simplifier.divide;
import static org.phasewright.runtime.symbolic.Simplifier.isZero;
import static org.phasewright.runtime.symbolic.Simplifier.multiply;
import static org.phasewright.runtime.symbolic.Simplifier.negate;
import static org.phasewright.runtime.symbolic.Simplifier.power;
import static org.phasewright.runtime.symbolic.Simplifier.subtract;

import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.MathFunction;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Variable;

/**
 * Partial derivatives with respect to one state. A derived quantity contributes through the chain rule: its own
 * derivative is supplied by the caller, which either inlines it or names it as an auxiliary quantity.
 */
public final class Differentiator {
    /** d(derived k)/d(state j), already simplified. */
    @FunctionalInterface
    public interface DerivedDerivatives {
        Expr of(int derivedIndex, int stateIndex);
    }

    private final DerivedDerivatives derived;

    public Differentiator(DerivedDerivatives derived) {
        this.derived = derived;
    }

    /** d(e)/d(state j), simplified as it is built. */
    public Expr partial(Expr e, int j) {
        return switch (e) {
            case Constant c -> Constant.ZERO;
            case Variable v -> switch (v.kind()) {
                case STATE -> v.index() == j ? Constant.ONE : Constant.ZERO;
                case DERIVED -> derived.of(v.index(), j);
                case PARAMETER, TIME -> Constant.ZERO;
            };
            case Negation n -> negate(partial(n.operand(), j));
            case Binary b -> ofBinary(b, j);
            case Call c -> ofCall(c, j);
            case IndexValue i -> Constant.ZERO;
            case Element el -> throw IndexedForms.unexpanded("differentiation", el);
            case Sum s -> throw IndexedForms.unexpanded("differentiation", s);
        };
    }

    private Expr ofBinary(Binary b, int j) {
        Expr f = b.left();
        Expr g = b.right();
        Expr df = partial(f, j);
        Expr dg = partial(g, j);
        return switch (b.operator()) {
            case ADD -> add(df, dg);
            case SUBTRACT -> subtract(df, dg);
            case MULTIPLY -> add(multiply(df, g), multiply(f, dg));
            case DIVIDE -> isZero(dg) ? divide(df, g)
                    : divide(subtract(multiply(df, g), multiply(f, dg)), power(g, constant(2)));
            case POWER -> {
                if (isZero(dg)) { // exponent independent of this state: g * f^(g-1) * f'
                    yield multiply(multiply(g, power(f, subtract(g, Constant.ONE))), df);
                }
                Expr logF = call(MathFunction.LOG, f);
                if (isZero(df)) { // base independent: f^g * log(f) * g'
                    yield multiply(multiply(power(f, g), logF), dg);
                }
                yield multiply(power(f, g), add(multiply(dg, logF), divide(multiply(g, df), f)));
            }
        };
    }

    private Expr ofCall(Call c, int j) {
        Expr a = c.arguments().get(0);
        Expr da = partial(a, j);
        if (c.function().arity() == 2) {
            return minMax(c.function(), a, c.arguments().get(1), da, partial(c.arguments().get(1), j));
        }
        if (isZero(da)) {
            return Constant.ZERO;
        }
        Expr outer = switch (c.function()) {
            case SIN -> call(MathFunction.COS, a);
            case COS -> negate(call(MathFunction.SIN, a));
            case TAN -> divide(Constant.ONE, power(call(MathFunction.COS, a), constant(2)));
            case EXP -> c;
            case LOG -> divide(Constant.ONE, a);
            case SQRT -> divide(constant(0.5), c);
            case ABS -> sign(a);
            case TANH -> subtract(Constant.ONE, power(c, constant(2)));
            case SINH -> call(MathFunction.COSH, a);
            case COSH -> call(MathFunction.SINH, a);
            case ATAN -> divide(Constant.ONE, add(Constant.ONE, power(a, constant(2))));
            case MIN, MAX -> throw new IllegalStateException("binary function");
        };
        return multiply(outer, da);
    }

    /**
     * min/max select one branch: with s = sign(b - a), min' = (a'+b')/2 + s(a'-b')/2 and max' = (a'+b')/2 - s(a'-b')/2.
     * At a tie this gives the mean of both one-sided derivatives.
     */
    private Expr minMax(MathFunction f, Expr a, Expr b, Expr da, Expr db) {
        if (da.equals(db)) {
            return da;
        }
        Expr mean = multiply(constant(0.5), add(da, db));
        Expr half = multiply(multiply(constant(0.5), subtract(da, db)), sign(subtract(b, a)));
        return f == MathFunction.MIN ? add(mean, half) : subtract(mean, half);
    }

    /**
     * sign(x) without a sign function in the notation: x / max(|x|, MIN_NORMAL) is exactly ±1 for every normal x and
     * 0 at x = 0 (a valid subgradient of |x|), and never divides by zero.
     */
    private static Expr sign(Expr x) {
        return divide(x, call(MathFunction.MAX, call(MathFunction.ABS, x), new Constant(Double.MIN_NORMAL)));
    }
}
