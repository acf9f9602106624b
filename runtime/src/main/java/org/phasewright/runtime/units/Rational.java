package org.phasewright.runtime.units;

/** An exact fraction in lowest terms with a positive denominator; exponents of dimensions (sqrt gives halves). */
public record Rational(long numerator, long denominator) implements Comparable<Rational> {
    public static final Rational ZERO = new Rational(0, 1);
    public static final Rational ONE = new Rational(1, 1);

    public Rational {
        if (denominator == 0) {
            throw new ArithmeticException("zero denominator");
        }
        long g = gcd(Math.abs(numerator), Math.abs(denominator));
        if (g > 1) {
            numerator /= g;
            denominator /= g;
        }
        if (denominator < 0) {
            numerator = -numerator;
            denominator = -denominator;
        }
    }

    public static Rational of(long whole) {
        return new Rational(whole, 1);
    }

    /**
     * The fraction with denominator at most {@code maxDenominator} that equals {@code value} to 1e-9, found by trying
     * each denominator in turn; null when there is none (e.g. an exponent such as 0.3712 or pi).
     */
    public static Rational approximate(double value, int maxDenominator) {
        if (!Double.isFinite(value) || Math.abs(value) > 1e6) {
            return null;
        }
        for (long q = 1; q <= maxDenominator; q++) {
            long p = Math.round(value * q);
            if (Math.abs(value - (double) p / q) <= 1e-9 * Math.max(1, Math.abs(value))) {
                return new Rational(p, q);
            }
        }
        return null;
    }

    public Rational plus(Rational other) {
        return new Rational(Math.addExact(Math.multiplyExact(numerator, other.denominator),
                Math.multiplyExact(other.numerator, denominator)), Math.multiplyExact(denominator, other.denominator));
    }

    public Rational times(Rational other) {
        return new Rational(Math.multiplyExact(numerator, other.numerator),
                Math.multiplyExact(denominator, other.denominator));
    }

    public Rational negate() {
        return new Rational(-numerator, denominator);
    }

    public boolean isZero() {
        return numerator == 0;
    }

    public int signum() {
        return Long.signum(numerator);
    }

    public double doubleValue() {
        return (double) numerator / denominator;
    }

    @Override
    public int compareTo(Rational other) {
        return Long.compare(numerator * other.denominator, other.numerator * denominator);
    }

    @Override
    public String toString() {
        return denominator == 1 ? Long.toString(numerator) : numerator + "/" + denominator;
    }

    private static long gcd(long a, long b) {
        while (b != 0) {
            long t = a % b;
            a = b;
            b = t;
        }
        return a == 0 ? 1 : a;
    }
}
