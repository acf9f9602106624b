package org.phasewright.runtime.symbolic;

import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.MathFunction;

/**
 * The numerical meaning of operators and functions, shared by the interpreter, constant folding and (by
 * construction) the generated code, so that all three give bit-identical results.
 */
public final class Arithmetic {
    /** Integer exponents with |n| up to this become repeated multiplication instead of Math.pow. */
    public static final int SMALL_POWER_LIMIT = 8;

    private Arithmetic() {
    }

    /** The exponent as an integer n (2 ≤ |n| ≤ limit) when {@code x^exponent} is multiplied out, else 0. */
    public static int smallIntegerExponent(double exponent) {
        if (exponent == Math.rint(exponent) && Math.abs(exponent) >= 2 && Math.abs(exponent) <= SMALL_POWER_LIMIT) {
            return (int) exponent;
        }
        return 0;
    }

    /** x^y; small integer exponents use a left-to-right product, exactly as the generated code does. */
    public static double power(double x, double y) {
        int n = smallIntegerExponent(y);
        if (n == 0) {
            return Math.pow(x, y);
        }
        double product = x;
        for (int i = 1; i < Math.abs(n); i++) {
            product = product * x;
        }
        return n > 0 ? product : 1.0 / product;
    }

    /** {@code l op r}; the one step both tree-walking evaluators share, so they cannot drift apart. */
    public static double binary(BinaryOperator op, double l, double r) {
        return switch (op) {
            case ADD -> l + r;
            case SUBTRACT -> l - r;
            case MULTIPLY -> l * r;
            case DIVIDE -> l / r;
            case POWER -> power(l, r);
        };
    }

    public static double apply(MathFunction f, double a, double b) {
        return switch (f) {
            case SIN -> Math.sin(a);
            case COS -> Math.cos(a);
            case TAN -> Math.tan(a);
            case EXP -> Math.exp(a);
            case LOG -> Math.log(a);
            case SQRT -> Math.sqrt(a);
            case ABS -> Math.abs(a);
            case TANH -> Math.tanh(a);
            case SINH -> Math.sinh(a);
            case COSH -> Math.cosh(a);
            case ATAN -> Math.atan(a);
            case MIN -> Math.min(a, b);
            case MAX -> Math.max(a, b);
        };
    }

    /** The java.lang.Math method implementing {@code f}; used by the code generator. */
    public static String javaName(MathFunction f) {
        return switch (f) {
            case SIN -> "Math.sin";
            case COS -> "Math.cos";
            case TAN -> "Math.tan";
            case EXP -> "Math.exp";
            case LOG -> "Math.log";
            case SQRT -> "Math.sqrt";
            case ABS -> "Math.abs";
            case TANH -> "Math.tanh";
            case SINH -> "Math.sinh";
            case COSH -> "Math.cosh";
            case ATAN -> "Math.atan";
            case MIN -> "Math.min";
            case MAX -> "Math.max";
        };
    }
}
