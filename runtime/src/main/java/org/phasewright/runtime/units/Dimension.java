package org.phasewright.runtime.units;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A physical dimension: exact rational exponents of the seven SI base quantities (SI Brochure, 9th ed., 2.3.3).
 * Exponents are rational because a square root of a dimensioned quantity is legitimate (e.g. sqrt(g/L)).
 * Shown in base-unit symbols, kg*m/s^2 for a force, so that two dimensions in a message compare at a glance.
 */
public final class Dimension {
    /** Base units in the order used for display: mass, length, time, current, temperature, amount, luminosity. */
    static final String[] BASE_SYMBOLS = { "kg", "m", "s", "A", "K", "mol", "cd" };
    public static final int MASS = 0, LENGTH = 1, TIME = 2, CURRENT = 3, TEMPERATURE = 4, AMOUNT = 5, LUMINOSITY = 6;

    public static final Dimension NONE = new Dimension(new Rational[] { Rational.ZERO, Rational.ZERO, Rational.ZERO,
            Rational.ZERO, Rational.ZERO, Rational.ZERO, Rational.ZERO });

    private final Rational[] exponents;

    private Dimension(Rational[] exponents) {
        this.exponents = exponents;
    }

    /** The dimension of one base quantity, e.g. {@code base(LENGTH)} for m. */
    public static Dimension base(int index) {
        Rational[] e = NONE.exponents.clone();
        e[index] = Rational.ONE;
        return new Dimension(e);
    }

    /** Integer exponents in the order mass, length, time, current, temperature, amount, luminosity. */
    public static Dimension of(int... exponents) {
        Rational[] e = NONE.exponents.clone();
        for (int i = 0; i < exponents.length; i++) {
            e[i] = Rational.of(exponents[i]);
        }
        return new Dimension(e);
    }

    public Rational exponent(int index) {
        return exponents[index];
    }

    public Dimension times(Dimension other) {
        Rational[] e = new Rational[exponents.length];
        for (int i = 0; i < e.length; i++) {
            e[i] = exponents[i].plus(other.exponents[i]);
        }
        return new Dimension(e);
    }

    public Dimension dividedBy(Dimension other) {
        return times(other.power(Rational.of(-1)));
    }

    public Dimension power(Rational power) {
        Rational[] e = new Rational[exponents.length];
        for (int i = 0; i < e.length; i++) {
            e[i] = exponents[i].times(power);
        }
        return new Dimension(e);
    }

    public boolean isDimensionless() {
        return Arrays.stream(exponents).allMatch(Rational::isZero);
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof Dimension d && Arrays.equals(exponents, d.exponents);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(exponents);
    }

    /** E.g. "kg*m/s^2", "1/s", "mol/(m^3*s)", "m^(1/2)"; "1" when dimensionless. */
    @Override
    public String toString() {
        List<String> up = new ArrayList<>();
        List<String> down = new ArrayList<>();
        for (int i = 0; i < exponents.length; i++) {
            Rational e = exponents[i];
            if (!e.isZero()) {
                (e.signum() > 0 ? up : down).add(factor(BASE_SYMBOLS[i], e.signum() > 0 ? e : e.negate()));
            }
        }
        String numerator = up.isEmpty() ? "1" : String.join("*", up);
        if (down.isEmpty()) {
            return numerator;
        }
        String denominator = String.join("*", down);
        return numerator + "/" + (down.size() > 1 ? "(" + denominator + ")" : denominator);
    }

    private static String factor(String symbol, Rational power) {
        if (power.equals(Rational.ONE)) {
            return symbol;
        }
        return symbol + "^" + (power.denominator() == 1 ? power.toString() : "(" + power + ")");
    }
}
