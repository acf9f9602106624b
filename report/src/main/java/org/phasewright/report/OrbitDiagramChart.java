package org.phasewright.report;

import java.awt.geom.Ellipse2D;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.phasewright.runtime.sweep.SweepColumn;
import org.phasewright.runtime.sweep.SweepOutcome;

/** The orbit diagram of a sweep: every local maximum of one state as a small dot over its parameter value. */
final class OrbitDiagramChart {
    /** Dots are drawn at most this many per column, so a long chaotic run does not swamp the file. */
    static final int MAX_PER_COLUMN = 400;

    private OrbitDiagramChart() {
    }

    /** The state whose maxima spread most. */
    static int widestState(SweepOutcome sweep) {
        int n = sweep.columns().get(0).states();
        int best = 0;
        double bestRange = -1;
        for (int i = 0; i < n; i++) {
            double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
            for (SweepColumn c : sweep.columns()) {
                for (double m : c.maxima(i)) {
                    lo = Math.min(lo, m);
                    hi = Math.max(hi, m);
                }
            }
            if (hi - lo > bestRange) {
                bestRange = hi - lo;
                best = i;
            }
        }
        return best;
    }

    static JFreeChart chart(SweepOutcome sweep, int state, String xLabel, String yLabel, String title,
            String subtitle) {
        XYSeries dots = new XYSeries("local maxima", false, true);
        for (SweepColumn c : sweep.columns()) {
            double[] maxima = c.maxima(state);
            int start = Math.max(0, maxima.length - MAX_PER_COLUMN); // the latest: furthest from transients
            for (int k = start; k < maxima.length; k++) {
                dots.add(c.parameter(), maxima[k], false);
            }
        }
        SeriesGroupRenderer renderer = new SeriesGroupRenderer(false, true);
        renderer.setSeriesShape(0, new Ellipse2D.Double(-1.2, -1.2, 2.4, 2.4));
        renderer.setDrawOutlines(false);
        renderer.setSeriesPaint(0, PlotStyle.translucent(PlotStyle.INK, 150));
        XYPlot plot = new XYPlot(new XYSeriesCollection(dots), PlotStyle.axis(xLabel), PlotStyle.axis(yLabel),
                renderer);
        return PlotStyle.finish(new JFreeChart(title, PlotStyle.TITLE, plot, false), subtitle);
    }
}
