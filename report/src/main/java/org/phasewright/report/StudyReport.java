package org.phasewright.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.phasewright.runtime.study.StudyResult;

/**
 * Writes the report of one study into {@code <study folder>/report/}: report.html (self-contained), results.json,
 * and each plot as SVG and PNG. Everything is rendered in memory first and the folder is replaced as a whole, so a
 * run that fails leaves the previous report as it was.
 */
public final class StudyReport {
    public static final String FOLDER = "report";
    public static final String HTML = "report.html";
    public static final String JSON = "results.json";
    /** PNGs are drawn at twice the nominal size, crisp on high-density screens and in documents. */
    static final double PNG_SCALE = 2;

    private StudyReport() {
    }

    /** @return the report's HTML file */
    public static Path write(StudyResult study, Path studyFolder, ReportContext context) throws IOException {
        return write(study, studyFolder, context, ReportFolder.DISK);
    }

    static Path write(StudyResult study, Path studyFolder, ReportContext context, ReportFolder.FileSink sink)
            throws IOException {
        Map<String, byte[]> files = render(study, context);
        Path folder = studyFolder.resolve(FOLDER);
        ReportFolder.replace(folder, files, sink);
        return folder.resolve(HTML);
    }

    /** Every file of the report by name, HTML last. */
    static Map<String, byte[]> render(StudyResult study, ReportContext context) throws IOException {
        List<Plot> plots = StudyPlots.of(study, context);
        Map<String, byte[]> files = new LinkedHashMap<>();
        List<String> svgs = new ArrayList<>();
        for (int k = 0; k < plots.size(); k++) {
            Plot p = plots.get(k);
            String svg = ChartImages.svg(p.chart(), Charts.WIDTH, Charts.HEIGHT, "p" + k + "-");
            svgs.add(svg);
            files.put(p.svgName(), svg.getBytes(StandardCharsets.UTF_8));
            files.put(p.pngName(), ChartImages.png(p.chart(), Charts.WIDTH, Charts.HEIGHT, PNG_SCALE));
        }
        files.put(JSON, ResultsJson.render(study, context, plots).getBytes(StandardCharsets.UTF_8));
        files.put(HTML, HtmlReport.render(study, context, plots, svgs).getBytes(StandardCharsets.UTF_8));
        return files;
    }
}
