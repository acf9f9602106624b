package org.phasewright.runtime.units;

/**
 * A unit: how many coherent SI units it is ({@code factor}, e.g. 1000 for km, 3600 for h) and its dimension.
 * Only dimensions are compared by the checks; the factor is kept so a value can later be converted.
 */
public record Unit(double factor, Dimension dimension) {
    public static final Unit ONE = new Unit(1, Dimension.NONE);

    public Unit times(Unit other) {
        return new Unit(factor * other.factor, dimension.times(other.dimension));
    }

    public Unit dividedBy(Unit other) {
        return new Unit(factor / other.factor, dimension.dividedBy(other.dimension));
    }

    public Unit power(int power) {
        return new Unit(Math.pow(factor, power), dimension.power(Rational.of(power)));
    }

    public Unit scaled(double by) {
        return new Unit(factor * by, dimension);
    }
}
