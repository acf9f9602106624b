package org.phasewright.language.ui.results;

import java.util.Locale;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Rectangle;

/** Draws framed axes with tick labels and polylines on an SWT canvas. */
final class PlotPainter {
    static final Color[] SERIES = { new Color(0xb3, 0x4a, 0x00), new Color(0x1c, 0x5d, 0x99),
            new Color(0x2e, 0x7d, 0x32), new Color(0x7a, 0x1f, 0x5c), new Color(0x00, 0x69, 0x6b),
            new Color(0x8a, 0x6d, 0x00) };
    private static final int LEFT = 58;
    private static final int BOTTOM = 36;
    private static final int TOP = 22;
    private static final int RIGHT = 12;

    private final GC gc;
    private final PlotScale x;
    private final PlotScale y;

    PlotPainter(GC gc, Rectangle area, double[] xs, double[] ys) {
        this.gc = gc;
        this.x = PlotScale.covering(xs, area.x + LEFT, area.x + area.width - RIGHT);
        this.y = PlotScale.covering(ys, area.y + area.height - BOTTOM, area.y + TOP);
    }

    void axes(String title, String xLabel) {
        gc.setForeground(gc.getDevice().getSystemColor(SWT.COLOR_DARK_GRAY));
        gc.drawRectangle(x.fromPixel(), y.toPixel(), x.toPixel() - x.fromPixel(), y.fromPixel() - y.toPixel());
        for (double tick : x.ticks(5)) {
            int px = x.toPixel(tick);
            gc.drawLine(px, y.fromPixel(), px, y.fromPixel() + 4);
            String label = format(tick);
            gc.drawString(label, px - gc.textExtent(label).x / 2, y.fromPixel() + 5, true);
        }
        for (double tick : y.ticks(4)) {
            int py = y.toPixel(tick);
            gc.drawLine(x.fromPixel() - 4, py, x.fromPixel(), py);
            String label = format(tick);
            gc.drawString(label, x.fromPixel() - 6 - gc.textExtent(label).x, py - gc.textExtent(label).y / 2, true);
        }
        gc.drawString(title, x.fromPixel(), 2, true);
        gc.drawString(xLabel, (x.fromPixel() + x.toPixel() - gc.textExtent(xLabel).x) / 2, y.fromPixel() + 19, true);
    }

    /** Series names in their line colours, right-aligned along the top edge of the plot. */
    void legend(java.util.List<String> names) {
        int right = x.toPixel();
        for (int k = names.size() - 1; k >= 0; k--) {
            String name = names.get(k);
            right -= gc.textExtent(name).x + 10;
            gc.setForeground(SERIES[k % SERIES.length]);
            gc.drawString(name, right, 2, true);
        }
    }

    void line(double[] xs, double[] ys, Color color) {
        if (xs.length < 2) {
            return;
        }
        int stride = Math.max(1, xs.length / 4000); // enough points for a few thousand pixels
        int count = (xs.length + stride - 1) / stride;
        int[] points = new int[2 * count];
        for (int i = 0, p = 0; i < xs.length && p < points.length; i += stride, p += 2) {
            points[p] = x.toPixel(xs[i]);
            points[p + 1] = y.toPixel(ys[i]);
        }
        gc.setForeground(color);
        gc.setLineWidth(1);
        gc.drawPolyline(points);
    }

    void point(double px, double py, Color color) {
        gc.setBackground(color);
        gc.fillOval(x.toPixel(px) - 4, y.toPixel(py) - 4, 9, 9);
    }

    static String format(double value) {
        return Math.abs(value) >= 1e4 || (Math.abs(value) < 1e-3 && value != 0)
                ? String.format(Locale.ROOT, "%.1e", value) : String.format(Locale.ROOT, "%.4g", value)
                        .replaceAll("\\.?0+$", "");
    }
}
