package org.phasewright.report;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.LinkedHashMap;
import java.util.Map;

import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CrosshairState;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYItemRendererState;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYDataset;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.SVGHints;

/**
 * A line-and-shape renderer that, when drawing SVG, wraps each series of each pass in a group
 * {@code <g class="series" data-series="NAME">} with a {@code <title>}, so the series can be found in the file.
 */
final class SeriesGroupRenderer extends XYLineAndShapeRenderer {
    private static final long serialVersionUID = 1L;

    SeriesGroupRenderer(boolean lines, boolean shapes) {
        super(lines, shapes);
        setDrawSeriesLineAsPath(lines); // one path element per series instead of one per segment
    }

    @Override
    public void drawItem(Graphics2D g2, XYItemRendererState state, Rectangle2D dataArea, PlotRenderingInfo info,
            XYPlot plot, ValueAxis domainAxis, ValueAxis rangeAxis, XYDataset dataset, int series, int item,
            CrosshairState crosshairState, int pass) {
        boolean svg = g2 instanceof SVGGraphics2D;
        int count = dataset.getItemCount(series);
        if (svg && item == 0) {
            String name = String.valueOf(dataset.getSeriesKey(series));
            Map<String, String> group = new LinkedHashMap<>();
            group.put("id", "d" + plot.getIndexOf(this) + "-s" + series + "-pass" + pass);
            group.put("class", "series");
            group.put("data-series", name);
            g2.setRenderingHint(SVGHints.KEY_BEGIN_GROUP, group);
            g2.setRenderingHint(SVGHints.KEY_ELEMENT_TITLE, name);
        }
        super.drawItem(g2, state, dataArea, info, plot, domainAxis, rangeAxis, dataset, series, item,
                crosshairState, pass);
        if (svg && item == count - 1) {
            g2.setRenderingHint(SVGHints.KEY_END_GROUP, Boolean.TRUE);
        }
    }
}
