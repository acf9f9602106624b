package org.phasewright.report;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;

import javax.imageio.ImageIO;

import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;

/** Renders a chart as an SVG document or PNG bytes, without a display. */
final class ChartImages {
    static {
        // PNGs are drawn off-screen; never ask for a display (the CLI may run on a server or in CI).
        if (System.getProperty("java.awt.headless") == null) {
            System.setProperty("java.awt.headless", "true");
        }
    }

    private ChartImages() {
    }

    /** A standalone SVG document; {@code idPrefix} keeps clip-path ids unique when several SVGs share a page. */
    static String svg(JFreeChart chart, int width, int height, String idPrefix) {
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        g.setDefsKeyPrefix(idPrefix);
        // Viewers without the plot font fall back to a similar sans-serif instead of a serif default.
        g.setFontFunction(family -> "\"" + family + "\", \"Segoe UI\", Helvetica, Arial, sans-serif");
        boolean hinting = chart.getElementHinting();
        chart.setElementHinting(true); // groups per series in the SVG, so tools (and tests) can find them
        try {
            chart.draw(g, new Rectangle2D.Double(0, 0, width, height));
        } finally {
            chart.setElementHinting(hinting);
        }
        return g.getSVGDocument();
    }

    /** PNG at {@code scale} times the nominal size (2 gives crisp images on high-density screens). */
    static byte[] png(JFreeChart chart, int width, int height, double scale) throws IOException {
        BufferedImage image = new BufferedImage((int) Math.round(width * scale), (int) Math.round(height * scale),
                BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g.scale(scale, scale);
            chart.draw(g, new Rectangle2D.Double(0, 0, width, height));
        } finally {
            g.dispose();
        }
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ImageIO.write(image, "png", out);
        return out.toByteArray();
    }
}
