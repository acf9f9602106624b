package org.phasewright.report;

import java.awt.Color;
import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.ArrayList;
import java.util.Locale;
import java.util.List;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;

import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.lyapunov.LyapunovOutcome;
import org.phasewright.runtime.study.Trajectory;

/** Builds the charts of a report from result data. Knows nothing about files. */
final class Charts {
    /** Width of the plotting area in pixels, which sets how finely time series are thinned. */
    static final int WIDTH = 880;
    static final int HEIGHT = 520;
    private static final int PIXEL_COLUMNS = 800;

    private static final double MARKER = 11;
    private static final Shape CIRCLE = new Ellipse2D.Double(-MARKER / 2, -MARKER / 2, MARKER, MARKER);
    private static final Shape DIAMOND = diamond(MARKER * 1.25);
    private static final Shape SQUARE = new Rectangle2D.Double(-4, -4, 8, 8);
    private static final Shape DOT = new Ellipse2D.Double(-2.2, -2.2, 4.4, 4.4);

    /** Kinds of equilibrium marker, in legend order, with the words the legend uses. */
    enum Stability {
        STABLE("stable equilibrium (filled)"),
        UNSTABLE("unstable equilibrium (hollow)"),
        NON_HYPERBOLIC("non-hyperbolic equilibrium (diamond)"),
        UNCLASSIFIED("unclassified equilibrium (square)");

        final String legend;

        Stability(String legend) {
            this.legend = legend;
        }

        /** Stable: every eigenvalue has negative real part; non-hyperbolic: some real part is zero. */
        static Stability of(Equilibrium e) {
            var c = e.classification();
            if (!c.classified() && e.coordinates().length > 0) {
                return UNCLASSIFIED;
            }
            if (c.centreDimension() > 0) {
                return NON_HYPERBOLIC;
            }
            return c.unstableDimension() == 0 ? STABLE : UNSTABLE;
        }

        String word() {
            return switch (this) {
                case STABLE -> "stable";
                case UNSTABLE -> "unstable";
                case NON_HYPERBOLIC -> "non-hyperbolic";
                case UNCLASSIFIED -> "unclassified";
            };
        }
    }

    private Charts() {
    }

    /** Every state against time, thinned per pixel column. */
    static JFreeChart timeSeries(Trajectory t, String timeLabel, List<String> stateLabels, String title,
            String subtitle) {
        XYSeriesCollection data = new XYSeriesCollection();
        double[] times = t.times();
        for (int s = 0; s < t.stateNames().size(); s++) {
            double[] y = column(t, s);
            XYSeries series = new XYSeries(stateLabels.get(s), false, true);
            for (int k : Decimation.timeSeries(times, y, PIXEL_COLUMNS, Decimation.MAX_POINTS)) {
                series.add(times[k], y[k], false);
            }
            data.addSeries(series);
        }
        SeriesGroupRenderer lines = new SeriesGroupRenderer(true, false);
        for (int s = 0; s < data.getSeriesCount(); s++) {
            lines.setSeriesPaint(s, PlotStyle.series(s));
            lines.setSeriesStroke(s, PlotStyle.LINE);
        }
        XYPlot plot = new XYPlot(data, PlotStyle.axis(timeLabel), PlotStyle.axis("value"), lines);
        return PlotStyle.finish(new JFreeChart(title, PlotStyle.TITLE, plot, data.getSeriesCount() > 1), subtitle);
    }

    /**
     * A trajectory (may be null) projected on states {@code i} and {@code j}, its start marked, and the equilibria
     * marked by stability: filled circle stable, hollow circle unstable, diamond non-hyperbolic.
     */
    static JFreeChart projection(Trajectory t, int i, int j, List<Equilibrium> equilibria, String xLabel,
            String yLabel, String title, String subtitle) {
        XYPlot plot = new XYPlot();
        plot.setDomainAxis(PlotStyle.axis(xLabel));
        plot.setRangeAxis(PlotStyle.axis(yLabel));
        LegendItemCollection legend = new LegendItemCollection();
        int dataset = 0;
        List<Equilibrium> shown = t == null || t.size() == 0 ? equilibria : near(t, i, j, equilibria);
        if (shown.size() < equilibria.size()) {
            int hidden = equilibria.size() - shown.size();
            subtitle = (subtitle == null ? "" : subtitle + "; ") + hidden + (hidden == 1 ? " equilibrium lies"
                    : " equilibria lie") + " far outside the trajectory and " + (hidden == 1 ? "is" : "are")
                    + " not drawn (see the table)";
        }

        // Equilibria first so that they are drawn on top (JFreeChart draws higher dataset indices first by default).
        XYSeriesCollection marks = new XYSeriesCollection();
        SeriesGroupRenderer markRenderer = new SeriesGroupRenderer(false, true);
        markRenderer.setUseFillPaint(true);
        markRenderer.setUseOutlinePaint(true);
        markRenderer.setDrawOutlines(true);
        for (Stability kind : Stability.values()) {
            XYSeries series = new XYSeries(kind.legend, false, true);
            for (Equilibrium e : shown) {
                if (Stability.of(e) == kind) {
                    double[] c = e.coordinates();
                    series.add(c[i], c[j], false);
                }
            }
            if (series.getItemCount() == 0) {
                continue;
            }
            int s = marks.getSeriesCount();
            marks.addSeries(series);
            Shape shape = switch (kind) {
                case STABLE, UNSTABLE -> CIRCLE;
                case NON_HYPERBOLIC -> DIAMOND;
                case UNCLASSIFIED -> SQUARE;
            };
            Color fill = kind == Stability.STABLE ? PlotStyle.INK : PlotStyle.PLOT;
            markRenderer.setSeriesShape(s, shape);
            markRenderer.setSeriesPaint(s, PlotStyle.INK);
            markRenderer.setSeriesFillPaint(s, fill);
            markRenderer.setSeriesOutlinePaint(s, PlotStyle.INK);
            markRenderer.setSeriesOutlineStroke(s, PlotStyle.MARKER_OUTLINE);
            LegendItem item = new LegendItem(kind.legend, null, null, null, shape, fill, PlotStyle.MARKER_OUTLINE,
                    PlotStyle.INK);
            item.setLabelFont(PlotStyle.LEGEND);
            item.setLabelPaint(PlotStyle.INK);
            legend.add(item);
        }
        if (marks.getSeriesCount() > 0) {
            plot.setDataset(dataset, marks);
            plot.setRenderer(dataset, markRenderer);
            dataset++;
        }

        if (t != null && t.size() > 0) {
            double[] x = column(t, i), y = column(t, j);
            XYSeries orbit = new XYSeries("trajectory", false, true);
            for (int k : Decimation.curve(x, y, Decimation.MAX_POINTS)) {
                orbit.add(x[k], y[k], false);
            }
            XYSeries start = new XYSeries("start", false, true);
            start.add(x[0], y[0]);
            XYSeriesCollection curve = new XYSeriesCollection();
            curve.addSeries(orbit);
            curve.addSeries(start);
            SeriesGroupRenderer line = new SeriesGroupRenderer(true, false);
            Color teal = PlotStyle.series(0);
            line.setSeriesPaint(0, PlotStyle.translucent(teal, 215));
            line.setSeriesStroke(0, PlotStyle.THIN_LINE);
            line.setSeriesLinesVisible(1, false);
            line.setSeriesShapesVisible(1, true);
            line.setSeriesShape(1, SQUARE);
            line.setDrawOutlines(false);
            line.setSeriesPaint(1, PlotStyle.series(1));
            plot.setDataset(dataset, curve);
            plot.setRenderer(dataset, line);
            LegendItem orbitItem = new LegendItem("trajectory", null, null, null, new Rectangle2D.Double(-8, -1, 16, 2),
                    teal);
            LegendItem startItem = new LegendItem("start", null, null, null, SQUARE, PlotStyle.series(1));
            for (LegendItem item : List.of(orbitItem, startItem)) {
                item.setLabelFont(PlotStyle.LEGEND);
                item.setLabelPaint(PlotStyle.INK);
            }
            LegendItemCollection ordered = new LegendItemCollection();
            ordered.add(orbitItem);
            ordered.add(startItem);
            ordered.addAll(legend);
            legend = ordered;
        }
        if (t == null || t.size() == 0) { // a few markers alone: keep them off the plot's edges
            for (ValueAxis axis : new ValueAxis[] {plot.getDomainAxis(), plot.getRangeAxis()}) {
                axis.setLowerMargin(0.12);
                axis.setUpperMargin(0.12);
            }
        }
        plot.setFixedLegendItems(legend);
        return PlotStyle.finish(new JFreeChart(title, PlotStyle.TITLE, plot, legend.getItemCount() > 0), subtitle);
    }

    /** Crossings of a Poincaré section projected on states {@code i} and {@code j}. */
    static JFreeChart section(Trajectory points, int i, int j, String xLabel, String yLabel, String title,
            String subtitle) {
        XYSeries series = new XYSeries("crossings", false, true);
        for (int k = 0; k < points.size(); k++) {
            series.add(points.state(k, i), points.state(k, j), false);
        }
        XYSeriesCollection data = new XYSeriesCollection(series);
        SeriesGroupRenderer dots = new SeriesGroupRenderer(false, true);
        dots.setSeriesShape(0, DOT);
        dots.setDrawOutlines(false);
        dots.setSeriesPaint(0, PlotStyle.translucent(PlotStyle.series(2), 200));
        XYPlot plot = new XYPlot(data, PlotStyle.axis(xLabel), PlotStyle.axis(yLabel), dots);
        return PlotStyle.finish(new JFreeChart(title, PlotStyle.TITLE, plot, false), subtitle);
    }

    /** Running estimates of each Lyapunov exponent against time, with the zero line dashed. */
    static JFreeChart lyapunov(LyapunovOutcome outcome, String timeLabel, String title, String subtitle) {
        XYSeriesCollection data = new XYSeriesCollection();
        double[] times = outcome.historyTimes();
        double[][] history = outcome.history();
        int n = outcome.exponents().length;
        for (int e = 0; e < n; e++) {
            XYSeries series = new XYSeries("λ" + subscript(e + 1), false, true);
            double[] y = new double[times.length];
            for (int k = 0; k < times.length; k++) {
                y[k] = history[k][e];
            }
            for (int k : Decimation.timeSeries(times, y, PIXEL_COLUMNS, Decimation.MAX_POINTS)) {
                series.add(times[k], y[k], false);
            }
            data.addSeries(series);
        }
        SeriesGroupRenderer lines = new SeriesGroupRenderer(true, false);
        for (int s = 0; s < n; s++) {
            lines.setSeriesPaint(s, PlotStyle.series(s));
            lines.setSeriesStroke(s, PlotStyle.LINE);
        }
        NumberAxis y = PlotStyle.axis("running estimate (per unit time)");
        // Estimates settle like 1/t, so a logarithmic time axis shows the whole approach evenly.
        ValueAxis x;
        if (times.length > 1 && times[0] > 0) {
            LogAxis log = new LogAxis(timeLabel + " (logarithmic)");
            log.setBase(10);
            DecimalFormat format = new DecimalFormat("#,##0.###", DecimalFormatSymbols.getInstance(Locale.ROOT));
            log.setNumberFormatOverride(format);
            log.setAutoTickUnitSelection(false);
            log.setTickUnit(new NumberTickUnit(1, format), false, false); // one tick per decade
            log.setSmallestValue(times[0]);
            PlotStyle.style(log);
            x = log;
        } else {
            x = PlotStyle.axis(timeLabel);
        }
        XYPlot plot = new XYPlot(data, x, y, lines);
        ValueMarker zero = new ValueMarker(0, PlotStyle.ZERO, PlotStyle.ZERO_LINE);
        plot.addRangeMarker(zero);
        return PlotStyle.finish(new JFreeChart(title, PlotStyle.TITLE, plot, n > 1), subtitle);
    }

    /** Views reach this many trajectory widths beyond the trajectory on each side to show nearby equilibria. */
    static final double REACH = 1.5;

    /**
     * The equilibria near the trajectory: within {@link #REACH} times its extent beyond it on both axes. A model with
     * a periodic family of equilibria (a pendulum's θ = kπ) would otherwise shrink the trajectory to a dot.
     */
    static List<Equilibrium> near(Trajectory t, int i, int j, List<Equilibrium> equilibria) {
        double[] x = range(column(t, i)), y = range(column(t, j));
        List<Equilibrium> kept = new ArrayList<>();
        for (Equilibrium e : equilibria) {
            double[] c = e.coordinates();
            if (within(c[i], x) && within(c[j], y)) {
                kept.add(e);
            }
        }
        return kept;
    }

    private static boolean within(double v, double[] range) {
        if (!(range[1] >= range[0])) {
            return true; // no finite samples: nothing to compare with
        }
        double span = range[1] - range[0];
        double reach = REACH * Math.max(span, 1e-6 * Math.max(1, Math.max(Math.abs(range[0]), Math.abs(range[1]))));
        return v >= range[0] - reach && v <= range[1] + reach;
    }

    private static double[] range(double[] v) {
        double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
        for (double d : v) {
            if (Double.isFinite(d)) {
                lo = Math.min(lo, d);
                hi = Math.max(hi, d);
            }
        }
        return new double[] {lo, hi};
    }

    static String subscript(int k) {
        StringBuilder b = new StringBuilder();
        for (char c : Integer.toString(k).toCharArray()) {
            b.append((char) ('₀' + (c - '0')));
        }
        return b.toString();
    }

    private static double[] column(Trajectory t, int state) {
        double[] v = new double[t.size()];
        for (int k = 0; k < v.length; k++) {
            v[k] = t.state(k, state);
        }
        return v;
    }

    private static Shape diamond(double size) {
        double h = size / 2;
        Path2D.Double p = new Path2D.Double();
        p.moveTo(0, -h);
        p.lineTo(h, 0);
        p.lineTo(0, h);
        p.lineTo(-h, 0);
        p.closePath();
        return p;
    }

    /** Names of the series a chart draws, for tests and results.json. */
    static List<String> seriesNames(JFreeChart chart) {
        List<String> names = new ArrayList<>();
        XYPlot plot = chart.getXYPlot();
        for (int d = 0; d < plot.getDatasetCount(); d++) {
            if (plot.getDataset(d) != null) {
                for (int s = 0; s < plot.getDataset(d).getSeriesCount(); s++) {
                    names.add(plot.getDataset(d).getSeriesKey(s).toString());
                }
            }
        }
        return names;
    }
}
