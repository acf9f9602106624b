package org.phasewright.runtime.symmetry;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * A polynomial with double coefficients in a fixed number of variables, kept as a sparse map monomial → coefficient
 * (the canonical normal form: two polynomials are equal exactly when their maps are). Immutable.
 */
final class Polynomial {
    /** Normal forms larger than this are not worth expanding; callers fall back to sampling. */
    static final int MAX_TERMS = 4000;

    private final int variables;
    private final Map<Monomial, Double> terms;

    private Polynomial(int variables, Map<Monomial, Double> terms) {
        this.variables = variables;
        this.terms = terms;
    }

    static Polynomial constant(double value, int variables) {
        Map<Monomial, Double> t = new HashMap<>();
        if (value != 0) {
            t.put(Monomial.one(variables), value);
        }
        return new Polynomial(variables, t);
    }

    static Polynomial variable(int index, int variables) {
        Map<Monomial, Double> t = new HashMap<>();
        t.put(Monomial.variable(index, variables), 1.0);
        return new Polynomial(variables, t);
    }

    Polynomial plus(Polynomial other) {
        Map<Monomial, Double> t = new HashMap<>(terms);
        other.terms.forEach((m, c) -> t.merge(m, c, Double::sum));
        t.values().removeIf(c -> c == 0.0);
        return new Polynomial(variables, t);
    }

    Polynomial negate() {
        return scale(-1);
    }

    Polynomial minus(Polynomial other) {
        return plus(other.negate());
    }

    Polynomial scale(double by) {
        Map<Monomial, Double> t = new HashMap<>();
        terms.forEach((m, c) -> t.put(m, c * by));
        t.values().removeIf(c -> c == 0.0);
        return new Polynomial(variables, t);
    }

    /** @throws TooLarge when the product would exceed {@link #MAX_TERMS} terms */
    Polynomial times(Polynomial other) {
        if ((long) terms.size() * other.terms.size() > 50L * MAX_TERMS) {
            throw new TooLarge();
        }
        Map<Monomial, Double> t = new HashMap<>();
        terms.forEach((m1, c1) -> other.terms.forEach((m2, c2) -> t.merge(m1.times(m2), c1 * c2, Double::sum)));
        t.values().removeIf(c -> c == 0.0);
        if (t.size() > MAX_TERMS) {
            throw new TooLarge();
        }
        return new Polynomial(variables, t);
    }

    Polynomial power(int exponent) {
        Polynomial result = constant(1, variables);
        for (int k = 0; k < exponent; k++) {
            result = result.times(this);
        }
        return result;
    }

    boolean isZero() {
        return terms.isEmpty();
    }

    /** The value when the polynomial is a constant, else NaN. */
    double constantValue() {
        if (terms.isEmpty()) {
            return 0;
        }
        if (terms.size() == 1) {
            Map.Entry<Monomial, Double> only = terms.entrySet().iterator().next();
            return only.getKey().degree() == 0 ? only.getValue() : Double.NaN;
        }
        return Double.NaN;
    }

    int variableCount() {
        return variables;
    }

    double constantTerm() {
        return terms.getOrDefault(Monomial.one(variables), 0.0);
    }

    int degree() {
        return terms.keySet().stream().mapToInt(Monomial::degree).max().orElse(0);
    }

    /** The coefficient of the first-degree term in {@code variable}. */
    double linearCoefficient(int variable) {
        return terms.getOrDefault(Monomial.variable(variable, variables), 0.0);
    }

    boolean uses(int variable) {
        return terms.keySet().stream().anyMatch(m -> m.uses(variable));
    }

    double largestCoefficient() {
        return terms.values().stream().mapToDouble(Math::abs).max().orElse(0);
    }

    /** True when every coefficient of this − other is at most {@code relative} times the largest coefficient. */
    boolean approximatelyEquals(Polynomial other, double relative) {
        double scale = Math.max(largestCoefficient(), other.largestCoefficient());
        Polynomial difference = minus(other);
        return difference.terms.values().stream().allMatch(c -> Math.abs(c) <= relative * scale);
    }

    /** E.g. "x*z - 2.66667*y + 1"; "0" for the zero polynomial. */
    String text(List<String> names) {
        if (terms.isEmpty()) {
            return "0";
        }
        StringBuilder out = new StringBuilder();
        for (Map.Entry<Monomial, Double> term : new TreeMap<>(terms).entrySet()) {
            double c = term.getValue();
            String monomial = term.getKey().text(names);
            out.append(out.length() == 0 ? (c < 0 ? "-" : "") : (c < 0 ? " - " : " + "));
            double size = Math.abs(c);
            if (monomial.isEmpty()) {
                out.append(number(size));
            } else {
                out.append(size == 1 ? "" : number(size) + "*").append(monomial);
            }
        }
        return out.toString();
    }

    private static String number(double value) {
        return value == Math.rint(value) && Math.abs(value) < 1e15 ? Long.toString((long) value)
                : String.format(java.util.Locale.ROOT, "%.6g", value).replaceAll("\\.?0+(e|$)", "$1");
    }

    /** The expansion grew beyond {@link #MAX_TERMS}. */
    static final class TooLarge extends RuntimeException {
        private static final long serialVersionUID = 1L;

        TooLarge() {
            super("normal form too large", null, false, false);
        }
    }
}
