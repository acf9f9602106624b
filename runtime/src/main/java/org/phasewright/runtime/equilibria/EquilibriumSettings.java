package org.phasewright.runtime.equilibria;

/**
 * Knobs of the equilibrium search. Defaults suit models of a few to a few dozen states.
 *
 * @param quasiRandomStarts   Sobol points drawn in each search box
 * @param trajectoryStarts    points taken from the trajectory (evenly spread along it)
 * @param maxNewtonIterations per start
 * @param maxTotalIterations  over all starts; the search reports WORK_LIMIT when this runs out
 * @param residualTolerance   |f|_inf must fall below this times |J|·(|x| + scale/1000)
 * @param stepTolerance       the last Newton step must fall below this times (|x| + scale/1000), per coordinate
 * @param duplicateTolerance  two solutions closer than this (scaled) are the same equilibrium
 * @param eigenTolerance      real or imaginary parts below this times |J|_F count as zero
 */
public record EquilibriumSettings(int quasiRandomStarts, int trajectoryStarts, int maxNewtonIterations,
        long maxTotalIterations, double residualTolerance, double stepTolerance, double duplicateTolerance,
        double eigenTolerance) {

    public static final EquilibriumSettings DEFAULT = new EquilibriumSettings(200, 100, 100, 50_000, 1e-10, 1e-9,
            1e-6, 1e-7);

    public EquilibriumSettings {
        if (quasiRandomStarts < 0 || trajectoryStarts < 0 || maxNewtonIterations <= 0 || maxTotalIterations <= 0) {
            throw new IllegalArgumentException("counts must be positive");
        }
    }
}
