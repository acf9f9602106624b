package org.phasewright.runtime.symmetry;

import java.util.List;
import java.util.Optional;

import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Variable;

/**
 * A rational function numerator/denominator of the states (and time, as the last variable). Built only from
 * expressions whose parameters are already numbers and lets inlined; anything else (a function call, a
 * non-integer power) has no such form and yields empty.
 */
record RationalForm(Polynomial numerator, Polynomial denominator) {
    /** Integer powers larger than this are expanded no further. */
    private static final int MAX_POWER = 12;

    /** The normal form of {@code e} over {@code states} states plus time, or empty. */
    static Optional<RationalForm> of(Expr e, int states) {
        try {
            return Optional.ofNullable(convert(e, states + 1, states));
        } catch (Polynomial.TooLarge tooLarge) {
            return Optional.empty();
        }
    }

    private static RationalForm convert(Expr e, int variables, int timeIndex) {
        return switch (e) {
            case Constant c -> Double.isFinite(c.value()) ? polynomial(Polynomial.constant(c.value(), variables))
                    : null;
            case Variable v -> switch (v.kind()) {
                case STATE -> polynomial(Polynomial.variable(v.index(), variables));
                case TIME -> polynomial(Polynomial.variable(timeIndex, variables));
                default -> null; // parameters and lets must be substituted first
            };
            case Negation n -> {
                RationalForm inner = convert(n.operand(), variables, timeIndex);
                yield inner == null ? null : new RationalForm(inner.numerator.negate(), inner.denominator);
            }
            case Binary b -> binary(b, variables, timeIndex);
            case Call c -> null;
            case IndexValue i -> null; // indexed forms are not rational forms until expanded
            case Element el -> null;
            case Sum s -> null;
        };
    }

    private static RationalForm binary(Binary b, int variables, int timeIndex) {
        RationalForm l = convert(b.left(), variables, timeIndex);
        if (l == null) {
            return null;
        }
        if (b.operator() == org.phasewright.runtime.model.BinaryOperator.POWER) {
            if (!(b.right() instanceof Constant c) || c.value() != Math.rint(c.value())
                    || Math.abs(c.value()) > MAX_POWER) {
                return null;
            }
            int k = (int) c.value();
            RationalForm raised = new RationalForm(l.numerator.power(Math.abs(k)), l.denominator.power(Math.abs(k)));
            return k >= 0 ? raised : raised.inverse();
        }
        RationalForm r = convert(b.right(), variables, timeIndex);
        if (r == null) {
            return null;
        }
        return switch (b.operator()) {
            case ADD -> l.plus(r);
            case SUBTRACT -> l.plus(new RationalForm(r.numerator.negate(), r.denominator));
            case MULTIPLY -> new RationalForm(l.numerator.times(r.numerator), l.denominator.times(r.denominator));
            case DIVIDE -> r.numerator.isZero() ? null
                    : new RationalForm(l.numerator.times(r.denominator), l.denominator.times(r.numerator));
            case POWER -> null;
        };
    }

    private static RationalForm polynomial(Polynomial p) {
        return new RationalForm(p, Polynomial.constant(1, p.variableCount()));
    }

    /** a/b + c/d; a common constant denominator is kept as it is, so polynomials stay polynomials. */
    RationalForm plus(RationalForm other) {
        if (denominator.approximatelyEquals(other.denominator, 0)) {
            return new RationalForm(numerator.plus(other.numerator), denominator);
        }
        return new RationalForm(numerator.times(other.denominator).plus(other.numerator.times(denominator)),
                denominator.times(other.denominator));
    }

    private RationalForm inverse() {
        return numerator.isZero() ? null : new RationalForm(denominator, numerator);
    }

    /** a/b = c/d exactly when a*d = c*b; coefficients are compared to {@code relative} of the largest. */
    boolean sameAs(RationalForm other, double relative) {
        return numerator.times(other.denominator).approximatelyEquals(other.numerator.times(denominator), relative);
    }

    /** True when the form is c1*u1 + ... + cn*un: a polynomial of degree at most one without constant term. */
    boolean isLinearForm() {
        double d = denominator.constantValue();
        return !Double.isNaN(d) && d != 0 && numerator.degree() <= 1 && numerator.constantTerm() == 0;
    }

    /** The coefficient of a variable in a linear form. */
    double linearCoefficient(int variable) {
        return numerator.linearCoefficient(variable) / denominator.constantValue();
    }

    String text(List<String> names) {
        double d = denominator.constantValue();
        if (!Double.isNaN(d)) {
            return numerator.scale(1 / d).text(names);
        }
        return "(" + numerator.text(names) + ")/(" + denominator.text(names) + ")";
    }
}
