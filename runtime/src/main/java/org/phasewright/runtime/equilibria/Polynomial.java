package org.phasewright.runtime.equilibria;

import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.symbolic.Arithmetic;

/**
 * A polynomial in the states with real coefficients, as a sparse map from exponent vectors to coefficients.
 * {@link #of} recognises rate laws that are polynomials once parameter values are put in: sums, products, division
 * by constants, whole non-negative powers, lets (inlined) and functions of constants only.
 */
final class Polynomial {
    /** Highest power expanded; beyond it the rates are treated as not polynomial. */
    private static final int MAX_EXPONENT = 32;
    /** Most terms kept in one expansion, so a large power of a long sum cannot exhaust memory. */
    private static final int MAX_TERMS = 20_000;

    private final int n;
    private final Map<Key, Double> terms;

    private Polynomial(int n, Map<Key, Double> terms) {
        this.n = n;
        this.terms = terms;
    }

    private record Key(int[] exponents) {
        @Override
        public boolean equals(Object o) {
            return o instanceof Key k && Arrays.equals(exponents, k.exponents);
        }

        @Override
        public int hashCode() {
            return Arrays.hashCode(exponents);
        }
    }

    static Polynomial constant(int n, double c) {
        Map<Key, Double> t = new HashMap<>();
        if (c != 0) {
            t.put(new Key(new int[n]), c);
        }
        return new Polynomial(n, t);
    }

    static Polynomial variable(int n, int i) {
        int[] e = new int[n];
        e[i] = 1;
        Map<Key, Double> t = new HashMap<>();
        t.put(new Key(e), 1.0);
        return new Polynomial(n, t);
    }

    /** The rates of {@code model} as polynomials at the parameter values {@code p}, or empty if any is not one. */
    static Optional<Polynomial[]> of(DynamicalModel model, double[] p) {
        int n = model.dimension();
        Polynomial[] out = new Polynomial[n];
        Map<Integer, Polynomial> lets = new HashMap<>();
        for (int i = 0; i < n; i++) {
            Polynomial q = convert(model.rates().get(i), model, p, lets);
            if (q == null) {
                return Optional.empty();
            }
            out[i] = q;
        }
        return Optional.of(out);
    }

    private static Polynomial convert(Expr e, DynamicalModel model, double[] p, Map<Integer, Polynomial> lets) {
        int n = model.dimension();
        switch (e) {
            case Constant c -> {
                return constant(n, c.value());
            }
            case Variable v -> {
                return switch (v.kind()) {
                    case STATE -> variable(n, v.index());
                    case PARAMETER -> constant(n, p[v.index()]);
                    case DERIVED -> {
                        Polynomial known = lets.get(v.index());
                        if (known == null) {
                            known = convert(model.derived().get(v.index()).definition(), model, p, lets);
                            if (known != null) {
                                lets.put(v.index(), known);
                            }
                        }
                        yield known;
                    }
                    case TIME -> null;
                };
            }
            case Negation neg -> {
                Polynomial a = convert(neg.operand(), model, p, lets);
                return a == null ? null : a.times(constant(n, -1));
            }
            case Binary b -> {
                Polynomial l = convert(b.left(), model, p, lets);
                Polynomial r = convert(b.right(), model, p, lets);
                if (l == null || r == null) {
                    return null;
                }
                return switch (b.operator()) {
                    case ADD -> l.plus(r, 1);
                    case SUBTRACT -> l.plus(r, -1);
                    case MULTIPLY -> l.times(r);
                    case DIVIDE -> r.isConstant() && r.constantValue() != 0
                            ? l.times(constant(n, 1 / r.constantValue())) : null;
                    case POWER -> power(l, r);
                };
            }
            case Call call -> {
                Polynomial a = convert(call.arguments().get(0), model, p, lets);
                Polynomial b = call.arguments().size() > 1 ? convert(call.arguments().get(1), model, p, lets)
                        : constant(n, 0);
                if (a == null || b == null || !a.isConstant() || !b.isConstant()) {
                    return null;
                }
                return constant(n, Arithmetic.apply(call.function(), a.constantValue(), b.constantValue()));
            }
            case IndexValue i -> {
                return null; // flat rates are expanded (IndexExpansion); an indexed form is not a polynomial here
            }
            case Element el -> {
                return null;
            }
            case Sum sum -> {
                return null;
            }
        }
    }

    private static Polynomial power(Polynomial base, Polynomial exponent) {
        if (!exponent.isConstant()) {
            return null;
        }
        double k = exponent.constantValue();
        if (base.isConstant()) {
            return constant(base.n, Arithmetic.power(base.constantValue(), k));
        }
        if (k != Math.rint(k) || k < 0 || k > MAX_EXPONENT) {
            return null;
        }
        Polynomial result = constant(base.n, 1);
        for (int i = 0; i < (int) k && result != null; i++) {
            result = result.times(base);
        }
        return result;
    }

    boolean isConstant() {
        return terms.keySet().stream().allMatch(k -> Arrays.stream(k.exponents).allMatch(x -> x == 0));
    }

    double constantValue() {
        return terms.getOrDefault(new Key(new int[n]), 0.0);
    }

    Polynomial plus(Polynomial o, double sign) {
        Map<Key, Double> t = new HashMap<>(terms);
        o.terms.forEach((k, c) -> t.merge(k, sign * c, Double::sum));
        t.values().removeIf(c -> c == 0);
        return new Polynomial(n, t);
    }

    /** The product, or null when it would have more than {@link #MAX_TERMS} terms. */
    Polynomial times(Polynomial o) {
        if ((long) terms.size() * o.terms.size() > MAX_TERMS) {
            return null;
        }
        Map<Key, Double> t = new HashMap<>();
        terms.forEach((ka, ca) -> o.terms.forEach((kb, cb) -> {
            int[] e = new int[n];
            for (int i = 0; i < n; i++) {
                e[i] = ka.exponents[i] + kb.exponents[i];
            }
            t.merge(new Key(e), ca * cb, Double::sum);
        }));
        t.values().removeIf(c -> c == 0);
        return new Polynomial(n, t);
    }

    /** Total degree (0 for the zero polynomial). */
    int degree() {
        int d = 0;
        for (Key k : terms.keySet()) {
            d = Math.max(d, Arrays.stream(k.exponents).sum());
        }
        return d;
    }

    /** Coefficients and exponents in a fixed order, for fast evaluation. */
    double[] coefficients() {
        return terms.entrySet().stream().sorted(Map.Entry.comparingByKey(Polynomial::compare))
                .mapToDouble(Map.Entry::getValue).toArray();
    }

    int[][] exponents() {
        return terms.keySet().stream().sorted(Polynomial::compare).map(k -> k.exponents.clone())
                .toArray(int[][]::new);
    }

    private static int compare(Key a, Key b) {
        return Arrays.compare(a.exponents, b.exponents);
    }
}
