package org.phasewright.runtime.lyapunov;

import org.phasewright.runtime.integrate.IntegrationOutcome;

/**
 * Lyapunov exponents, largest first, with what is needed to judge them.
 *
 * @param exponents        estimates over [0, time], largest first (per unit of model time)
 * @param halfwayExponents the same estimates at about half that time, for the convergence check
 * @param meanDivergence   time average of tr J along the orbit, which the exponents must sum to
 * @param historyTimes     times of the running estimates in {@code history}
 * @param history          running estimates, one row per entry of {@code historyTimes}
 * @param reorthonormalisations number of QR steps
 * @param integration      how the integration of the variational system ended (time reached, counts)
 */
public record LyapunovOutcome(double[] exponents, double[] halfwayExponents, double meanDivergence, double time,
        double[] historyTimes, double[][] history, long reorthonormalisations, IntegrationOutcome integration) {

    /** The largest change of any exponent between half time and the end. */
    public double largestChange() {
        double worst = 0;
        for (int i = 0; i < exponents.length; i++) {
            worst = Math.max(worst, Math.abs(exponents[i] - halfwayExponents[i]));
        }
        return worst;
    }

    /**
     * Converged when no exponent moved by more than 1% of the largest magnitude (at least 0.01) over the second
     * half of the run: estimates of an ergodic average settle like 1/T, so a drift beyond that means T is too short.
     */
    public boolean converged() {
        double scale = 0.01;
        for (double l : exponents) {
            scale = Math.max(scale, 0.01 * Math.abs(l));
        }
        return integration.completed() && largestChange() <= scale;
    }

    public double sum() {
        double s = 0;
        for (double l : exponents) {
            s += l;
        }
        return s;
    }
}
