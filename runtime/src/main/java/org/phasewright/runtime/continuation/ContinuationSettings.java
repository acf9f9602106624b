package org.phasewright.runtime.continuation;

/**
 * Knobs of equilibrium continuation. Step lengths are arclength in (states, parameter) space, as fractions of the
 * parameter interval's width (or of 1 when that is smaller), so a study sees similar point counts on any scale.
 *
 * @param maxPointsPerBranch accepted points before a branch is stopped ("point limit")
 * @param maxBranches        branches in total, starts and branch switches together
 * @param maxStepFraction    largest arclength step
 * @param minStepFraction    smallest step before giving up ("step size too small")
 * @param minTangentCosine   a step whose tangent turns more than this allows is retried shorter
 * @param blowUpBound        |u|_inf beyond which a branch is stopped ("unbounded")
 * @param eigenTolerance     real or imaginary parts below this times |J|_F count as zero
 */
public record ContinuationSettings(int maxPointsPerBranch, int maxBranches, double maxStepFraction,
        double minStepFraction, double minTangentCosine, double blowUpBound, double eigenTolerance) {

    public static final ContinuationSettings DEFAULT = new ContinuationSettings(5000, 64, 0.02, 1e-10, 0.95, 1e12,
            1e-7);

    public ContinuationSettings withBlowUpBound(double bound) {
        return new ContinuationSettings(maxPointsPerBranch, maxBranches, maxStepFraction, minStepFraction,
                minTangentCosine, bound, eigenTolerance);
    }

    public ContinuationSettings {
        if (maxPointsPerBranch < 2 || maxBranches < 1 || !(maxStepFraction > minStepFraction)
                || !(minStepFraction > 0)) {
            throw new IllegalArgumentException("invalid continuation settings");
        }
    }
}
