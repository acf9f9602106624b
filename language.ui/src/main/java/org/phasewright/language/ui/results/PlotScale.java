package org.phasewright.language.ui.results;

/** Maps a data interval onto a pixel interval, with round tick values for the axis labels. */
public record PlotScale(double low, double high, int fromPixel, int toPixel) {

    /** A scale covering {@code values} with 5% margin; a flat series gets a unit-wide interval around its value. */
    public static PlotScale covering(double[] values, int fromPixel, int toPixel) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            if (Double.isFinite(v)) {
                min = Math.min(min, v);
                max = Math.max(max, v);
            }
        }
        if (min > max) {
            return new PlotScale(0, 1, fromPixel, toPixel);
        }
        if (max - min < 1e-12 * Math.max(1, Math.abs(max))) {
            return new PlotScale(min - 0.5, max + 0.5, fromPixel, toPixel);
        }
        double margin = 0.05 * (max - min);
        return new PlotScale(min - margin, max + margin, fromPixel, toPixel);
    }

    public int toPixel(double value) {
        return (int) Math.round(fromPixel + (value - low) / (high - low) * (toPixel - fromPixel));
    }

    /** Tick values at a 1-2-5 step giving about {@code count} ticks inside the interval. */
    public double[] ticks(int count) {
        double raw = (high - low) / Math.max(1, count);
        double magnitude = Math.pow(10, Math.floor(Math.log10(raw)));
        double step = magnitude * (raw / magnitude < 2 ? 2 : raw / magnitude < 5 ? 5 : 10);
        if (raw / magnitude < 1.5) {
            step = magnitude;
        }
        double first = Math.ceil(low / step) * step;
        int n = (int) Math.floor((high - first) / step) + 1;
        double[] ticks = new double[Math.max(0, n)];
        for (int i = 0; i < ticks.length; i++) {
            ticks[i] = first + i * step;
            if (Math.abs(ticks[i]) < step * 1e-9) {
                ticks[i] = 0;
            }
        }
        return ticks;
    }
}
