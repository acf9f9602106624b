package org.phasewright.report;

import java.awt.Color;
import java.awt.Paint;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.LookupPaintScale;
import org.jfree.chart.renderer.PaintScale;
import org.jfree.chart.renderer.xy.XYBlockRenderer;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.DefaultXYZDataset;
import org.phasewright.runtime.ensemble.Axis;
import org.phasewright.runtime.study.BasinsResult;
import org.phasewright.runtime.study.LyapunovMapResult;

/**
 * Grids of an ensemble as coloured cells: the Lyapunov map on a diverging scale centred on zero (blue decaying,
 * white neutral, red chaotic), basins in one series colour per equilibrium (grey: none reached; paper: not run).
 */
final class HeatmapChart {
    static final Color NONE = new Color(0x9AA0A6);
    private static final Color COLD = new Color(0x2B5C8A);
    private static final Color HOT = new Color(0xB8342F);

    private HeatmapChart() {
    }

    static JFreeChart lyapunov(LyapunovMapResult map, String title, String subtitle) {
        Axis a = map.first(), b = map.second();
        double[][] xyz = new double[3][a.steps() * b.steps()];
        double bound = 0;
        for (int i = 0; i < a.steps(); i++) {
            for (int j = 0; j < b.steps(); j++) {
                int k = i * b.steps() + j;
                xyz[0][k] = a.value(i);
                xyz[1][k] = b.value(j);
                xyz[2][k] = map.exponent(i, j);
                if (Double.isFinite(xyz[2][k])) {
                    bound = Math.max(bound, Math.abs(xyz[2][k]));
                }
            }
        }
        bound = bound > 0 ? bound : 1;
        LookupPaintScale scale = new LookupPaintScale(-bound, bound, PlotStyle.PAPER);
        int shades = 64;
        for (int s = 0; s < shades; s++) {
            double f = s / (shades - 1.0); // 0 at -bound, 1 at +bound
            scale.add(-bound + 2 * bound * s / shades, f < 0.5 ? blend(COLD, Color.WHITE, f * 2)
                    : blend(Color.WHITE, HOT, (f - 0.5) * 2));
        }
        JFreeChart chart = PlotStyle.finish(new JFreeChart(title, PlotStyle.TITLE, grid(xyz, a, b, scale), false),
                subtitle);
        NumberAxis legendAxis = PlotStyle.axis("largest exponent");
        PaintScaleLegend legend = new PaintScaleLegend(scale, legendAxis);
        legend.setPosition(RectangleEdge.RIGHT);
        legend.setBackgroundPaint(PlotStyle.paper());
        legend.setMargin(4, 4, 4, 4);
        chart.addSubtitle(legend);
        return chart;
    }

    static JFreeChart basins(BasinsResult basins, String title, String subtitle) {
        Axis a = basins.first(), b = basins.second();
        double[][] xyz = new double[3][a.steps() * b.steps()];
        for (int i = 0; i < a.steps(); i++) {
            for (int j = 0; j < b.steps(); j++) {
                int k = i * b.steps() + j;
                xyz[0][k] = a.value(i);
                xyz[1][k] = b.value(j);
                xyz[2][k] = basins.label(i, j);
            }
        }
        LookupPaintScale scale = new LookupPaintScale(BasinsResult.NOT_RUN - 0.5, basins.equilibria().size(),
                PlotStyle.PAPER);
        scale.add(BasinsResult.NOT_RUN - 0.5, PlotStyle.PAPER);
        scale.add(-1.5, NONE);
        for (int e = 0; e < basins.equilibria().size(); e++) {
            scale.add(e - 0.5, PlotStyle.series(e));
        }
        XYPlot plot = grid(xyz, a, b, scale);
        LegendItemCollection items = new LegendItemCollection();
        for (int e = 0; e < basins.equilibria().size(); e++) {
            items.add(new LegendItem(basins.equilibria().get(e).name(), PlotStyle.series(e)));
        }
        items.add(new LegendItem("no equilibrium reached", NONE));
        plot.setFixedLegendItems(items);
        return PlotStyle.finish(new JFreeChart(title, PlotStyle.TITLE, plot, true), subtitle);
    }

    private static XYPlot grid(double[][] xyz, Axis a, Axis b, PaintScale scale) {
        DefaultXYZDataset data = new DefaultXYZDataset();
        data.addSeries("grid", xyz);
        XYBlockRenderer renderer = new XYBlockRenderer();
        renderer.setBlockWidth(a.steps() > 1 ? Math.abs(a.to() - a.from()) / (a.steps() - 1) : 1);
        renderer.setBlockHeight(b.steps() > 1 ? Math.abs(b.to() - b.from()) / (b.steps() - 1) : 1);
        renderer.setPaintScale(scale);
        NumberAxis x = PlotStyle.axis(a.name());
        NumberAxis y = PlotStyle.axis(b.name());
        x.setAutoRangeIncludesZero(false);
        y.setAutoRangeIncludesZero(false);
        return new XYPlot(data, x, y, renderer);
    }

    private static Paint blend(Color from, Color to, double f) {
        return new Color((int) Math.round(from.getRed() + (to.getRed() - from.getRed()) * f),
                (int) Math.round(from.getGreen() + (to.getGreen() - from.getGreen()) * f),
                (int) Math.round(from.getBlue() + (to.getBlue() - from.getBlue()) * f));
    }
}
