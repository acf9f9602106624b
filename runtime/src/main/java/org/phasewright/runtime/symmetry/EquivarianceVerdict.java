package org.phasewright.runtime.symmetry;

/**
 * The outcome of checking f(g·u) = g·f(u) (or = −g·f(u) for a time-reversing g).
 *
 * @param brokenRate the first rate where the two sides differ, or -1
 * @param leftSide   that rate's f_i(g·u), as a normal form or a sampled value; null when it holds
 * @param rightSide  (g·f(u))_i likewise
 * @param samples    points compared when sampling (for a broken one: the number of the point that differs), 0 for
 *                   the exact method
 */
public record EquivarianceVerdict(Outcome outcome, Method method, int brokenRate, String leftSide, String rightSide,
        int samples) {

    public enum Outcome { HOLDS, BROKEN, UNDECIDED }

    public enum Method {
        /** Both sides expanded to the canonical normal form of rational functions and compared term by term. */
        NORMAL_FORM,
        /** Both sides evaluated at seeded random points and compared to a relative tolerance. */
        SAMPLED
    }

    public boolean holds() {
        return outcome == Outcome.HOLDS;
    }

    /** How it was decided, in words for a message. */
    public String methodText() {
        return method == Method.NORMAL_FORM
                ? "exactly on the polynomial normal form of the rates, coefficients agreeing to 1e-9 relative"
                : "by sampling " + (outcome == Outcome.BROKEN ? "seeded random points to 1e-9 relative (point "
                        + samples + " of " + EquivarianceCheck.SAMPLES + " differs)"
                        : samples + " seeded random points to 1e-9 relative")
                        + ", since some rate is not a rational function of the states";
    }
}
