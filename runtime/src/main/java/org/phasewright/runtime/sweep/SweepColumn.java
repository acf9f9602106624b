package org.phasewright.runtime.sweep;

/**
 * The local maxima of every state at one parameter value, after transients.
 *
 * @param maxima  {@code maxima[i]} are the maxima of state i in time order
 * @param ending  how the integration ended (COMPLETED, BLEW_UP, ...)
 */
public record SweepColumn(double parameter, double[][] maxima, String ending) {
    public SweepColumn {
        double[][] copy = new double[maxima.length][];
        for (int i = 0; i < maxima.length; i++) {
            copy[i] = maxima[i].clone();
        }
        maxima = copy;
    }

    public double[] maxima(int state) {
        return maxima[state].clone();
    }

    public int states() {
        return maxima.length;
    }
}
