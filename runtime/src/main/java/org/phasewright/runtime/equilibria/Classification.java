package org.phasewright.runtime.equilibria;

/**
 * The local type of an equilibrium in words, and the dimensions of its stable, unstable and centre manifolds
 * (counts of eigenvalues with negative, positive and zero real part).
 */
public record Classification(String type, int stableDimension, int unstableDimension, int centreDimension) {

    /**
     * False for an equilibrium that could not be classified ("unclassified", "not classified: ..."): no dimension is
     * known then.
     */
    public boolean classified() {
        return stableDimension + unstableDimension + centreDimension > 0;
    }

    /** True when no eigenvalue has (numerically) zero real part, so linearisation decides the local picture. */
    public boolean hyperbolic() {
        return centreDimension == 0;
    }

    /**
     * Classifies from eigenvalues. A real part within {@code tolerance} of zero counts as zero, and so does an
     * imaginary part (a double real eigenvalue is often computed as a tiny complex pair).
     */
    public static Classification of(double[] re, double[] im, double tolerance) {
        int stable = 0, unstable = 0, centre = 0;
        boolean complexStable = false, complexUnstable = false, allOscillatory = true;
        for (int k = 0; k < re.length; k++) {
            if (Double.isNaN(re[k]) || Double.isNaN(im[k])) {
                return new Classification("unclassified", 0, 0, 0);
            }
            boolean complex = Math.abs(im[k]) > tolerance;
            if (re[k] < -tolerance) {
                stable++;
                complexStable |= complex;
            } else if (re[k] > tolerance) {
                unstable++;
                complexUnstable |= complex;
            } else {
                centre++;
            }
            allOscillatory &= complex && Math.abs(re[k]) <= tolerance;
        }
        String type;
        if (centre > 0) {
            type = allOscillatory && re.length > 0 ? "centre" : "non-hyperbolic";
        } else if (unstable == 0) {
            type = complexStable ? "stable focus" : "stable node";
        } else if (stable == 0) {
            type = complexUnstable ? "unstable focus" : "unstable node";
        } else {
            type = (complexStable || complexUnstable ? "saddle-focus" : "saddle") + " with " + unstable
                    + (unstable == 1 ? " unstable direction" : " unstable directions");
        }
        return new Classification(type, stable, unstable, centre);
    }

    /**
     * Classifies from the rightmost eigenvalues of an n-dimensional system (not all of them). With
     * {@code allUnstable} the eigenvalues given include every one of positive real part, so the unstable and centre
     * counts are exact; node or focus is not decided (that needs the rest). Without it every eigenvalue given may be
     * followed by more unstable ones: the unstable count is a lower bound, and the type says so; with none among
     * them nothing is known, and the result is null.
     */
    public static Classification ofRightmost(double[] re, double[] im, int n, boolean allUnstable, double tolerance) {
        int unstable = 0, centre = 0;
        for (int k = 0; k < re.length; k++) {
            if (Double.isNaN(re[k]) || Double.isNaN(im[k])) {
                return new Classification("unclassified", 0, 0, 0);
            }
            if (re[k] > tolerance) {
                unstable++;
            } else if (re[k] >= -tolerance) {
                centre++;
            }
        }
        if (!allUnstable) {
            // more unstable eigenvalues may follow those found: only a lower bound, and none at all says nothing
            return unstable == 0 ? null
                    : new Classification("unstable, at least " + unstable + " unstable direction"
                            + (unstable == 1 ? "" : "s"), 0, unstable, 0);
        }
        String type;
        if (centre > 0) {
            type = "non-hyperbolic";
        } else if (unstable == 0) {
            type = "stable";
        } else {
            type = "saddle with " + unstable + (unstable == 1 ? " unstable direction" : " unstable directions");
        }
        return new Classification(type, n - unstable - centre, unstable, centre);
    }
}
