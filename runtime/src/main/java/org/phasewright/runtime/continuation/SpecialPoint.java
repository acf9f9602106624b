package org.phasewright.runtime.continuation;

import java.util.Locale;

/**
 * A bifurcation located on a branch of equilibria.
 *
 * @param branch                   number of the branch it was found on (1-based)
 * @param frequency                imaginary part of the critical pair at a Hopf point (NaN otherwise)
 * @param firstLyapunovCoefficient l1 at a Hopf point (NaN otherwise or when it could not be computed)
 */
public record SpecialPoint(Kind kind, int branch, double parameter, double[] state, double frequency,
        double firstLyapunovCoefficient) {

    /** Kinds of special point, named in full words. */
    public enum Kind {
        FOLD("fold"), HOPF("Hopf"), BRANCH_POINT("branch point");

        private final String word;

        Kind(String word) {
            this.word = word;
        }

        public String word() {
            return word;
        }
    }

    public SpecialPoint {
        state = state.clone();
    }

    @Override
    public double[] state() {
        return state.clone();
    }

    /** "subcritical", "supercritical" or "degenerate" at a Hopf point by the sign of l1; null for other kinds. */
    public String criticality() {
        if (kind != Kind.HOPF) {
            return null;
        }
        if (Double.isNaN(firstLyapunovCoefficient)) {
            return "criticality not computed"; // its eigenvectors or solves failed, or two equal pairs cross together
        }
        if (Double.isInfinite(firstLyapunovCoefficient) || firstLyapunovCoefficient == 0) {
            return "degenerate";
        }
        return firstLyapunovCoefficient > 0 ? "subcritical" : "supercritical";
    }

    /** e.g. "Hopf, subcritical (first Lyapunov coefficient 0.0118)". */
    public String description() {
        if (kind != Kind.HOPF) {
            return kind.word();
        }
        return String.format(Locale.ROOT, "Hopf, %s (first Lyapunov coefficient %.6g, frequency %.6g)", criticality(),
                firstLyapunovCoefficient, frequency);
    }
}
