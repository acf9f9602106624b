package org.phasewright.runtime.periodic;

/**
 * Knobs of the continuation of periodic orbits by shooting.
 *
 * @param maxPoints          orbits per family before it is stopped ("point limit")
 * @param maxStepFraction    largest arclength step, as a fraction of the parameter interval (or of 1 if smaller)
 * @param periodLimit        a family is stopped when the period exceeds this multiple of the Hopf period (the orbit
 *                           is then usually close to a homoclinic orbit, where the period grows without bound)
 * @param relativeTolerance  of each shot (the absolute tolerance is a hundredth of it)
 * @param maxStepsPerShot    integration steps of one shot
 */
public record CycleSettings(int maxPoints, double maxStepFraction, double periodLimit, double relativeTolerance,
        long maxStepsPerShot) {

    public static final CycleSettings DEFAULT = new CycleSettings(150, 0.02, 50, 1e-10, 200_000);
}
