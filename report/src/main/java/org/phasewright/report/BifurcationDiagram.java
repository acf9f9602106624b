package org.phasewright.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import java.util.ArrayList;
import java.util.List;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.Range;
import org.jfree.data.general.DatasetUtils;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.phasewright.runtime.continuation.Branch;
import org.phasewright.runtime.continuation.ContinuationOutcome;
import org.phasewright.runtime.continuation.ContinuationPoint;
import org.phasewright.runtime.continuation.SpecialPoint;
import org.phasewright.runtime.periodic.CycleBranch;
import org.phasewright.runtime.periodic.CyclePoint;
import org.phasewright.runtime.study.ContinuationResult;

/**
 * The bifurcation diagram of a continuation: one state against the parameter for every branch of equilibria, and
 * the largest value of that state along each periodic orbit; stable parts solid, unstable parts dashed; special
 * points marked and labelled in full words (fold, Hopf, branch point, period doubling, fold of cycles).
 */
final class BifurcationDiagram {
    private static final Stroke SOLID = new BasicStroke(1.8f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    private static final Stroke DASHED = new BasicStroke(1.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f,
            new float[] {6f, 4f}, 0f);
    private static final Shape POINT = new Ellipse2D.Double(-4, -4, 8, 8);
    private static final Font LABEL = new Font(PlotStyle.FONT_FAMILY, Font.PLAIN, 11);

    private BifurcationDiagram() {
    }

    /** The state whose values vary most over all branches: usually the one that shows the branches apart. */
    static int widestState(ContinuationOutcome o, int states) {
        int best = 0;
        double bestRange = -1;
        // state() copies its array: take each point's once
        List<double[]> points = o.branches().stream().flatMap(b -> b.points().stream())
                .map(ContinuationPoint::state).toList();
        for (int i = 0; i < states; i++) {
            double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
            for (double[] x : points) {
                lo = Math.min(lo, x[i]);
                hi = Math.max(hi, x[i]);
            }
            if (hi - lo > bestRange) {
                bestRange = hi - lo;
                best = i;
            }
        }
        return best;
    }

    static JFreeChart chart(ContinuationResult result, int state, String xLabel, String yLabel, String title,
            String subtitle) {
        ContinuationOutcome o = result.continuation();
        XYSeriesCollection data = new XYSeriesCollection();
        SeriesGroupRenderer lines = new SeriesGroupRenderer(true, false);
        Color equilibria = PlotStyle.series(0), cycles = PlotStyle.series(1);
        int series = 0;
        for (Branch b : o.branches()) {
            List<ContinuationPoint> run = new ArrayList<>();
            for (ContinuationPoint p : b.points()) {
                if (!run.isEmpty() && run.get(run.size() - 1).stable() != p.stable()) {
                    run.add(p); // join the runs so the curve has no gap at the change of stability
                    series = addRun(data, lines, series, "branch " + b.number(), run, state, equilibria);
                    run = new ArrayList<>();
                }
                run.add(p);
            }
            series = addRun(data, lines, series, "branch " + b.number(), run, state, equilibria);
        }
        for (CycleBranch c : result.cycles()) {
            List<CyclePoint> run = new ArrayList<>();
            for (CyclePoint p : c.points()) {
                if (!run.isEmpty() && run.get(run.size() - 1).stable() != p.stable()) {
                    series = addCycleRun(data, lines, series, c.number(), run, state, cycles);
                    run = new ArrayList<>();
                }
                run.add(p);
            }
            series = addCycleRun(data, lines, series, c.number(), run, state, cycles);
        }
        XYSeries marks = new XYSeries("special points", false, true);
        List<XYTextAnnotation> labels = new ArrayList<>();
        for (SpecialPoint s : o.specialPoints()) {
            marks.add(s.parameter(), s.state()[state], false);
            labels.add(label(s.kind() == SpecialPoint.Kind.HOPF ? "Hopf (" + s.criticality() + ")" : s.kind().word(),
                    s.parameter(), s.state()[state]));
        }
        for (CycleBranch c : result.cycles()) {
            for (CyclePoint p : c.specialPoints()) {
                marks.add(p.parameter(), p.maximum()[state], false);
                labels.add(label(p.special().word(), p.parameter(), p.maximum()[state]));
            }
        }
        data.addSeries(marks);
        lines.setSeriesLinesVisible(series, false);
        lines.setSeriesShapesVisible(series, true);
        lines.setSeriesShape(series, POINT);
        lines.setSeriesPaint(series, PlotStyle.INK);

        XYPlot plot = new XYPlot(data, PlotStyle.axis(xLabel), PlotStyle.axis(yLabel), lines);
        List<XYTextAnnotation> shown = legible(labels, DatasetUtils.findDomainBounds(data, false),
                DatasetUtils.findRangeBounds(data, false)); // the values' own ranges, not widened by bar widths
        shown.forEach(plot::addAnnotation);
        if (shown.size() < labels.size()) {
            String note = "labels on " + shown.size() + " of " + labels.size() + " special points (all are listed in "
                    + "summary.txt)";
            subtitle = subtitle == null ? note : subtitle + "; " + note;
        }
        LegendItemCollection legend = new LegendItemCollection();
        legend.add(item("stable equilibria (solid)", equilibria, SOLID));
        // a point that could not be classified (a large model whose eigenvalues did not converge) is not called
        // stable, so it is drawn dashed too: the legend says so when there is one
        boolean unclassified = result.continuation().branches().stream().flatMap(b -> b.points().stream())
                .map(ContinuationPoint::classification)
                .anyMatch(c -> !c.classified());
        legend.add(item(unclassified ? "unstable or unclassified equilibria (dashed)" : "unstable equilibria (dashed)",
                equilibria, DASHED));
        if (!result.cycles().isEmpty()) {
            legend.add(item("stable periodic orbits, largest value (solid)", cycles, SOLID));
            legend.add(item("unstable periodic orbits, largest value (dashed)", cycles, DASHED));
        }
        plot.setFixedLegendItems(legend);
        return PlotStyle.finish(new JFreeChart(title, PlotStyle.TITLE, plot, true), subtitle);
    }

    private static int addRun(XYSeriesCollection data, SeriesGroupRenderer lines, int series, String name,
            List<ContinuationPoint> run, int state, Color color) {
        if (run.size() < 2) {
            return series;
        }
        boolean stable = run.get(0).stable();
        XYSeries s = new XYSeries(name + (stable ? " stable" : " unstable") + " " + series, false, true);
        for (ContinuationPoint p : run) {
            s.add(p.parameter(), p.state()[state], false);
        }
        return style(data, lines, series, s, stable, color);
    }

    private static int addCycleRun(XYSeriesCollection data, SeriesGroupRenderer lines, int series, int family,
            List<CyclePoint> run, int state, Color color) {
        if (run.size() < 2) {
            return series;
        }
        boolean stable = run.get(0).stable();
        XYSeries s = new XYSeries("periodic orbits " + family + (stable ? " stable" : " unstable") + " " + series,
                false, true);
        for (CyclePoint p : run) {
            s.add(p.parameter(), p.maximum()[state], false);
        }
        return style(data, lines, series, s, stable, color);
    }

    private static int style(XYSeriesCollection data, SeriesGroupRenderer lines, int series, XYSeries s,
            boolean stable, Color color) {
        data.addSeries(s);
        lines.setSeriesPaint(series, color);
        lines.setSeriesStroke(series, stable ? SOLID : DASHED);
        lines.setSeriesShapesVisible(series, false);
        return series + 1;
    }

    /**
     * The labels that can be read: in order of the parameter, a label is kept when it lies at least 8% of the
     * parameter range or 4% of the state range (about a label's length and height on the report's chart) from every
     * label kept before it. The points themselves stay marked. Labels in the right quarter read leftwards, so the
     * plot's edge does not cut them.
     */
    static List<XYTextAnnotation> legible(List<XYTextAnnotation> labels, Range x, Range y) {
        if (x == null || y == null) {
            return labels;
        }
        double width = 0.08 * x.getLength(), height = 0.04 * y.getLength();
        List<XYTextAnnotation> sorted = new ArrayList<>(labels);
        sorted.sort(java.util.Comparator.comparingDouble(XYTextAnnotation::getX));
        List<XYTextAnnotation> kept = new ArrayList<>();
        for (XYTextAnnotation a : sorted) {
            boolean clear = true;
            for (XYTextAnnotation k : kept) {
                if (Math.abs(a.getX() - k.getX()) < width && Math.abs(a.getY() - k.getY()) < height) {
                    clear = false;
                    break;
                }
            }
            if (clear) {
                if (a.getX() > x.getUpperBound() - 0.25 * x.getLength()) { // read leftwards near the right edge
                    a.setText(a.getText().strip() + "  ");
                    a.setTextAnchor(TextAnchor.BOTTOM_RIGHT);
                }
                kept.add(a);
            }
        }
        return kept;
    }

    private static XYTextAnnotation label(String text, double x, double y) {
        XYTextAnnotation a = new XYTextAnnotation("  " + text, x, y);
        a.setFont(LABEL);
        a.setPaint(PlotStyle.INK);
        a.setTextAnchor(TextAnchor.BOTTOM_LEFT);
        return a;
    }

    private static LegendItem item(String text, Color color, Stroke stroke) {
        LegendItem item = new LegendItem(text, null, null, null, new java.awt.geom.Line2D.Double(-10, 0, 10, 0),
                stroke, color);
        item.setShapeVisible(false);
        item.setLineVisible(true);
        return item;
    }
}
