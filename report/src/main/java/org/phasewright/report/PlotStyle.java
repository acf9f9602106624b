package org.phasewright.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Stroke;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.HorizontalAlignment;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;

/**
 * Phasewright's look for plots: warm paper background, a quiet dotted grid, no plot frame but a baseline on each
 * axis, titles left-aligned, the legend above the plot, and a palette of ink colours that stay apart in print and
 * for the common colour-vision deficiencies.
 */
final class PlotStyle {
    static final Color PAPER = new Color(0xFAF8F3);
    static final Color PLOT = new Color(0xFFFFFF);
    static final Color INK = new Color(0x26303A);
    static final Color MUTED = new Color(0x6B7280);
    static final Color GRID = new Color(0xDCD7CC);
    static final Color ZERO = new Color(0x9AA0A6);

    /** Series colours, in order of use. */
    static final Color[] SERIES = {
        new Color(0x1B6E7A), // deep teal
        new Color(0xD1603D), // terracotta
        new Color(0x5B4B8A), // indigo violet
        new Color(0x8A9A2B), // moss
        new Color(0xC99A2E), // ochre
        new Color(0x2F5C9E), // cobalt
        new Color(0x9C3D6B), // mulberry
        new Color(0x4F6D50), // pine
    };

    static final String FONT_FAMILY = "DejaVu Sans";
    static final Font TITLE = new Font(FONT_FAMILY, Font.BOLD, 15);
    static final Font SUBTITLE = new Font(FONT_FAMILY, Font.PLAIN, 11);
    static final Font LABEL = new Font(FONT_FAMILY, Font.PLAIN, 12);
    static final Font TICK = new Font(FONT_FAMILY, Font.PLAIN, 10);
    static final Font LEGEND = new Font(FONT_FAMILY, Font.PLAIN, 11);

    static final Stroke LINE = new BasicStroke(1.3f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    static final Stroke THIN_LINE = new BasicStroke(0.9f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
    static final Stroke GRID_STROKE = new BasicStroke(0.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f,
            new float[] {1.5f, 3f}, 0f);
    static final Stroke MARKER_OUTLINE = new BasicStroke(1.8f);
    static final Stroke ZERO_LINE = new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f,
            new float[] {5f, 4f}, 0f);

    private PlotStyle() {
    }

    static Color series(int index) {
        return SERIES[index % SERIES.length];
    }

    static Color translucent(Color c, int alpha) {
        return new Color(c.getRed(), c.getGreen(), c.getBlue(), alpha);
    }

    static NumberAxis axis(String label) {
        NumberAxis axis = new NumberAxis(label);
        axis.setAutoRangeIncludesZero(false);
        axis.setAutoRangeStickyZero(false);
        style(axis);
        return axis;
    }

    static void style(ValueAxis axis) {
        axis.setLabelFont(LABEL);
        axis.setLabelPaint(INK);
        axis.setTickLabelFont(TICK);
        axis.setTickLabelPaint(MUTED);
        axis.setAxisLinePaint(MUTED);
        axis.setAxisLineStroke(new BasicStroke(1f));
        axis.setTickMarkPaint(MUTED);
        axis.setTickMarkOutsideLength(4f);
        axis.setTickMarkInsideLength(0f);
        axis.setLowerMargin(0.03);
        axis.setUpperMargin(0.03);
    }

    /** Applies the look to a finished chart; {@code subtitle} may be null. */
    static JFreeChart finish(JFreeChart chart, String subtitle) {
        chart.setBackgroundPaint(PAPER);
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(true);
        chart.setPadding(new RectangleInsets(12, 14, 10, 18));
        TextTitle title = chart.getTitle();
        if (title != null) {
            title.setFont(TITLE);
            title.setPaint(INK);
            title.setHorizontalAlignment(HorizontalAlignment.LEFT);
            title.setPadding(new RectangleInsets(0, 4, 2, 0));
        }
        if (subtitle != null) {
            TextTitle sub = new TextTitle(subtitle, SUBTITLE);
            sub.setPaint(MUTED);
            sub.setHorizontalAlignment(HorizontalAlignment.LEFT);
            sub.setPadding(new RectangleInsets(0, 4, 6, 0));
            chart.addSubtitle(0, sub); // directly under the title, above the legend
        }
        LegendTitle legend = chart.getLegend();
        if (legend != null) {
            legend.setItemFont(LEGEND);
            legend.setItemPaint(INK);
            legend.setBackgroundPaint(PAPER);
            legend.setFrame(BlockBorder.NONE);
            legend.setPosition(RectangleEdge.TOP);
            legend.setHorizontalAlignment(HorizontalAlignment.LEFT);
            legend.setPadding(new RectangleInsets(2, 0, 6, 0));
            legend.setItemLabelPadding(new RectangleInsets(2, 4, 2, 12));
        }
        if (chart.getPlot() instanceof XYPlot plot) {
            plot.setBackgroundPaint(PLOT);
            plot.setOutlineVisible(false);
            plot.setDomainGridlinePaint(GRID);
            plot.setRangeGridlinePaint(GRID);
            plot.setDomainGridlineStroke(GRID_STROKE);
            plot.setRangeGridlineStroke(GRID_STROKE);
            plot.setAxisOffset(new RectangleInsets(4, 4, 4, 4));
            plot.setInsets(new RectangleInsets(4, 2, 2, 6));
        }
        return chart;
    }

    static Paint paper() {
        return PAPER;
    }
}
