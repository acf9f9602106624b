package org.phasewright.runtime.symmetry;

import java.util.Arrays;
import java.util.List;

/** A product of variables with non-negative integer powers, e.g. x^2*z; the empty product is 1. */
final class Monomial implements Comparable<Monomial> {
    private final int[] powers;

    Monomial(int[] powers) {
        this.powers = powers;
    }

    static Monomial one(int variables) {
        return new Monomial(new int[variables]);
    }

    static Monomial variable(int index, int variables) {
        int[] p = new int[variables];
        p[index] = 1;
        return new Monomial(p);
    }

    Monomial times(Monomial other) {
        int[] p = powers.clone();
        for (int i = 0; i < p.length; i++) {
            p[i] += other.powers[i];
        }
        return new Monomial(p);
    }

    int power(int variable) {
        return powers[variable];
    }

    int degree() {
        return Arrays.stream(powers).sum();
    }

    boolean uses(int variable) {
        return powers[variable] > 0;
    }

    /** Higher degree first, then lexicographic in the variables' order, so normal forms print in a stable order. */
    @Override
    public int compareTo(Monomial other) {
        int byDegree = Integer.compare(other.degree(), degree());
        return byDegree != 0 ? byDegree : Arrays.compare(other.powers, powers);
    }

    String text(List<String> names) {
        StringBuilder out = new StringBuilder();
        for (int i = 0; i < powers.length; i++) {
            if (powers[i] > 0) {
                out.append(out.length() > 0 ? "*" : "").append(names.get(i))
                        .append(powers[i] > 1 ? "^" + powers[i] : "");
            }
        }
        return out.toString();
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof Monomial m && Arrays.equals(powers, m.powers);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(powers);
    }
}
