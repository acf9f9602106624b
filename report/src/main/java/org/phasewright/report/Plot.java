package org.phasewright.report;

import java.util.List;

import org.jfree.chart.JFreeChart;

/**
 * One plot of a report.
 *
 * @param stem     file name without extension; the plot is written as stem.svg and stem.png
 * @param kind     time-series, phase-projection, equilibria, section, lyapunov, bifurcation or orbit-diagram
 * @param title    the chart's title
 * @param caption  a sentence for the HTML report
 * @param series   names of the series drawn
 * @param analysis index of the analysis (in the study's order) the plot shows
 */
record Plot(String stem, String kind, String title, String caption, List<String> series, int analysis,
        JFreeChart chart) {
    Plot {
        series = List.copyOf(series);
    }

    String svgName() {
        return stem + ".svg";
    }

    String pngName() {
        return stem + ".png";
    }
}
