package org.phasewright.report;

import java.nio.charset.StandardCharsets;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Base64;
import java.util.List;
import java.util.Map;

import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.lyapunov.LyapunovOutcome;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Parameter;
import org.phasewright.runtime.model.StateVariable;
import org.phasewright.runtime.report.TextSummary;
import org.phasewright.runtime.study.AnalysisResult;
import org.phasewright.runtime.study.EquilibriumResult;
import org.phasewright.runtime.study.ReducedOutput;
import org.phasewright.runtime.study.LyapunovResult;
import org.phasewright.runtime.study.SectionResult;
import org.phasewright.runtime.study.SimulationResult;
import org.phasewright.runtime.study.Status;
import org.phasewright.runtime.study.StudyResult;
import org.phasewright.runtime.study.Trajectory;

/**
 * report.html: one self-contained page per study (styles inline, plots embedded as SVG images), readable offline
 * and safe to open: every piece of user text is escaped, and the page forbids scripts and outside resources.
 */
final class HtmlReport {
    private static final DateTimeFormatter WHEN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'")
            .withZone(ZoneOffset.UTC);

    private static final String CSS = """
            :root { --paper: #faf8f3; --ink: #26303a; --muted: #6b7280; --rule: #dcd7cc; --accent: #1b6e7a;
                    --ok: #2f6b3a; --warn: #9a6a12; --bad: #a33a2a; }
            * { box-sizing: border-box; }
            body { margin: 0; background: var(--paper); color: var(--ink);
                   font: 15px/1.5 "DejaVu Sans", "Segoe UI", Helvetica, Arial, sans-serif; }
            main { max-width: 960px; margin: 0 auto; padding: 28px 24px 48px; }
            header { border-bottom: 3px solid var(--accent); padding-bottom: 12px; margin-bottom: 20px; }
            h1 { font-size: 26px; margin: 0 0 2px; letter-spacing: 0.2px; }
            h1 .study { color: var(--accent); font-weight: normal; }
            h2 { font-size: 18px; margin: 30px 0 10px; padding-bottom: 4px; border-bottom: 1px solid var(--rule); }
            h3 { font-size: 15px; margin: 18px 0 6px; }
            .lede { color: var(--muted); margin: 0; }
            .facts { display: flex; flex-wrap: wrap; gap: 6px 22px; margin-top: 10px; color: var(--muted);
                     font-size: 13px; }
            .facts b { color: var(--ink); font-weight: 600; }
            .status { display: inline-block; padding: 1px 9px; border-radius: 10px; color: #fff; font-size: 12px;
                      font-weight: 600; letter-spacing: 0.4px; vertical-align: 3px; }
            .status.COMPLETED { background: var(--ok); } .status.INCOMPLETE { background: var(--warn); }
            .status.FAILED { background: var(--bad); }
            table { border-collapse: collapse; width: 100%; font-size: 13.5px; margin: 6px 0 10px; }
            th, td { text-align: left; padding: 5px 10px 5px 0; border-bottom: 1px solid var(--rule);
                     vertical-align: top; }
            th { color: var(--muted); font-weight: 600; font-size: 12px; text-transform: uppercase;
                 letter-spacing: 0.5px; }
            td.num { font-family: "DejaVu Sans Mono", Consolas, monospace; font-size: 12.5px; white-space: nowrap; }
            .marker { display: inline-block; width: 11px; height: 11px; border: 2px solid var(--ink);
                      border-radius: 50%; margin-right: 6px; vertical-align: -1px; }
            .marker.stable { background: var(--ink); } .marker.unstable { background: #fff; }
            .marker.non-hyperbolic { border-radius: 0; transform: rotate(45deg) scale(0.85); background: #fff; }
            .marker.unclassified { border-radius: 0; background: #fff; }
            .analysis { border-left: 3px solid var(--rule); padding: 2px 0 2px 14px; margin: 12px 0; }
            .analysis.FAILED { border-color: var(--bad); } .analysis.INCOMPLETE { border-color: var(--warn); }
            .analysis.COMPLETED { border-color: var(--ok); }
            .message { margin: 2px 0 6px; }
            dl.settings { display: grid; grid-template-columns: max-content 1fr; gap: 2px 14px; margin: 4px 0;
                          font-size: 13px; color: var(--muted); }
            dl.settings dt { font-weight: 600; } dl.settings dd { margin: 0; color: var(--ink); }
            figure { margin: 18px 0 26px; }
            figure img { width: 100%; height: auto; border: 1px solid var(--rule); border-radius: 4px;
                         background: #fff; }
            figcaption { color: var(--muted); font-size: 13px; margin-top: 4px; }
            figcaption a { color: var(--accent); }
            pre { background: #fff; border: 1px solid var(--rule); border-radius: 4px; padding: 12px 14px;
                  overflow-x: auto; font: 12.5px/1.45 "DejaVu Sans Mono", Consolas, monospace; }
            .caution { margin-top: 34px; padding: 10px 14px; background: #fff; border: 1px solid var(--rule);
                       border-radius: 4px; color: var(--muted); font-size: 13px; }
            footer { margin-top: 18px; color: var(--muted); font-size: 12px; }
            """;

    private HtmlReport() {
    }

    /** @param svgs the SVG document of each plot, in the order of {@code plots} */
    static String render(StudyResult study, ReportContext context, List<Plot> plots, List<String> svgs) {
        DynamicalModel model = context.model();
        StringBuilder h = new StringBuilder(64 * 1024);
        h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n");
        // Nothing runs and nothing is fetched: styles are inline and images are data: URLs.
        h.append("<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none'; "
                + "img-src data: 'self'; style-src 'unsafe-inline'\">\n");
        h.append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n");
        h.append("<meta name=\"generator\" content=\"phasewright ").append(e(context.toolVersion())).append("\">\n");
        h.append("<title>").append(e(study.modelName())).append(" · ").append(e(study.studyName()))
                .append(" — Phasewright report</title>\n");
        h.append("<style>\n").append(CSS).append("</style>\n</head>\n<body>\n<main>\n");

        // Heading and facts of the run.
        h.append("<header>\n<h1>").append(e(study.modelName())).append(" <span class=\"study\">· study ")
                .append(e(study.studyName())).append("</span> ").append(status(study.status())).append("</h1>\n");
        if (model != null && model.title() != null) {
            h.append("<p class=\"lede\">").append(e(model.title())).append("</p>\n");
        }
        h.append("<div class=\"facts\">");
        if (context.modelFile() != null) {
            h.append("<span>model file <b>").append(e(context.modelFile())).append("</b></span>");
        }
        h.append("<span>finished <b>").append(e(WHEN.format(context.finished()))).append("</b></span>");
        h.append("<span>run time <b>").append(e(Formats.seconds(context.runTime().toNanos() / 1e9)))
                .append("</b></span>");
        h.append("<span>phasewright <b>").append(e(context.toolVersion())).append("</b></span>");
        h.append("<span>numbers for machines <b>results.json</b></span>");
        h.append("</div>\n</header>\n");

        parameters(h, study, model);
        states(h, study, model);
        analyses(h, study, model);
        equilibria(h, study);
        lyapunov(h, study);
        figures(h, plots, svgs);

        if (context.modelText() != null) {
            h.append("<h2>Model text</h2>\n<pre>").append(e(context.modelText())).append("</pre>\n");
        }
        h.append("<p class=\"caution\">").append(e(TextSummary.CAUTION)).append("</p>\n");
        h.append("<footer>Written by phasewright ").append(e(context.toolVersion()))
                .append(". Every number shown here is also in results.json; the samples are in the CSV files of "
                        + "the study folder, one level up.</footer>\n");
        h.append("</main>\n</body>\n</html>\n");
        return h.toString();
    }

    private static void parameters(StringBuilder h, StudyResult study, DynamicalModel model) {
        h.append("<h2>Parameters</h2>\n");
        double[] values = study.parameterValues();
        if (values.length == 0) {
            h.append("<p>The model has no parameters.</p>\n");
            return;
        }
        h.append("<table>\n<tr><th>name</th><th>value</th><th>unit</th><th>description</th></tr>\n");
        for (int i = 0; i < values.length; i++) {
            Parameter p = ResultsJson.parameter(model, study.parameterNames().get(i));
            h.append("<tr><td>").append(e(study.parameterNames().get(i))).append("</td><td class=\"num\">")
                    .append(e(Formats.number(values[i]))).append("</td><td>")
                    .append(e(p == null ? null : p.unit())).append("</td><td>")
                    .append(e(p == null ? null : p.description())).append("</td></tr>\n");
        }
        h.append("</table>\n");
    }

    private static void states(StringBuilder h, StudyResult study, DynamicalModel model) {
        if (model == null) {
            return;
        }
        h.append("<h2>States</h2>\n<table>\n<tr><th>name</th><th>unit</th><th>description</th></tr>\n");
        int n = model.states().size();
        int listed = n > ResultsJson.LISTED_STATES_LIMIT ? ResultsJson.LISTED_STATES : n; // large models: a few rows
        for (StateVariable v : model.states().subList(0, listed)) {
            h.append("<tr><td>").append(e(v.name())).append("</td><td>").append(e(v.unit())).append("</td><td>")
                    .append(e(v.description())).append("</td></tr>\n");
        }
        if (listed < n) {
            h.append("<tr><td colspan=\"3\">... and ").append(n - listed).append(" more, up to ")
                    .append(e(model.states().get(n - 1).name())).append("</td></tr>\n");
        }
        h.append("</table>\n");
        h.append("<p class=\"lede\">Time is <b>").append(e(StudyPlots.timeLabel(study, model)))
                .append("</b>.</p>\n");
    }

    private static void analyses(StringBuilder h, StudyResult study, DynamicalModel model) {
        h.append("<h2>Analyses</h2>\n");
        List<AnalysisResult> results = study.results();
        if (results.isEmpty()) {
            h.append("<p>The study lists no analyses.</p>\n");
        }
        for (int a = 0; a < results.size(); a++) {
            AnalysisResult r = results.get(a);
            h.append("<div class=\"analysis ").append(r.status().name()).append("\">\n<h3>").append(a + 1)
                    .append(". ").append(e(Settings.title(r))).append(' ').append(status(r.status()))
                    .append("</h3>\n");
            h.append("<p class=\"message\">").append(e(r.message())).append("</p>\n<dl class=\"settings\">");
            h.append("<dt>outcome</dt><dd>").append(e(r.outcome())).append("</dd>");
            for (Map.Entry<String, Object> s : Settings.of(r, Settings.declared(model, study.studyName(), a,
                    results.size())).entrySet()) {
                String value = s.getValue() instanceof Double d ? Formats.plain(d) : String.valueOf(s.getValue());
                h.append("<dt>").append(e(words(s.getKey()))).append("</dt><dd>").append(e(value)).append("</dd>");
            }
            switch (r) {
                case SimulationResult s when s.trajectory() != null && s.trajectory().size() > 0 -> {
                    Trajectory t = s.trajectory();
                    h.append("<dt>samples</dt><dd>").append(t.size()).append("</dd>");
                    if (t.kept() != null) {
                        h.append("<dt>kept</dt><dd>").append(e(t.kept())).append("</dd>");
                    }
                    h.append("<dt>final state</dt><dd>").append(e(state(study.stateNames(),
                            t.stateRow(t.size() - 1)))).append(" at ").append(e(study.timeName())).append(" = ")
                            .append(e(Formats.plain(t.time(t.size() - 1)))).append("</dd>");
                }
                case SectionResult x when x.points() != null -> h.append("<dt>crossings</dt><dd>")
                        .append(x.points().size()).append("</dd>");
                default -> {
                }
            }
            h.append("</dl>\n</div>\n");
        }
    }

    private static void equilibria(StringBuilder h, StudyResult study) {
        List<EquilibriumResult> searches = study.equilibriumSearches();
        if (searches.isEmpty()) {
            return;
        }
        h.append("<h2>Equilibria</h2>\n");
        for (EquilibriumResult r : searches) {
            if (r.equilibria().isEmpty()) {
                h.append("<p>None found: ").append(e(r.message())).append("</p>\n");
                continue;
            }
            // large models: the first few coordinates, as in summary.txt; every one is in the CSV files
            List<String> names = study.stateNames();
            int shown = Math.min(names.size(), ReducedOutput.KEPT);
            boolean cut = shown < names.size();
            h.append("<table>\n<tr><th>name</th>");
            for (String s : names.subList(0, shown)) {
                h.append("<th>").append(e(s)).append("</th>");
            }
            if (cut) {
                h.append("<th>…</th>");
            }
            h.append("<th>eigenvalues</th><th>type</th></tr>\n");
            for (Equilibrium q : r.equilibria()) {
                Charts.Stability kind = Charts.Stability.of(q);
                h.append("<tr><td><span class=\"marker ").append(kind.word()).append("\" title=\"")
                        .append(e(kind.word())).append("\"></span>").append(e(q.name())).append("</td>");
                double[] coordinates = q.coordinates();
                for (int i = 0; i < shown; i++) {
                    h.append("<td class=\"num\">").append(e(Formats.number(coordinates[i]))).append("</td>");
                }
                if (cut) {
                    h.append("<td>…</td>");
                }
                h.append("<td class=\"num\">").append(e(eigenvalues(q))).append("</td><td>").append(e(q.type()))
                        .append("</td></tr>\n");
            }
            h.append("</table>\n");
            if (cut) {
                h.append("<p>The first ").append(shown).append(" of ").append(names.size())
                        .append(" states; every coordinate is in ")
                        .append(ReducedOutput.reduced(names.size()) ? "equilibria-states.csv" : "equilibria.csv")
                        .append(".</p>\n");
            }
        }
        h.append("<p class=\"lede\"><span class=\"marker stable\"></span>stable (every eigenvalue has negative real "
                + "part) &nbsp; <span class=\"marker unstable\"></span>unstable &nbsp; "
                + "<span class=\"marker non-hyperbolic\"></span>non-hyperbolic (an eigenvalue on the imaginary axis)"
                + "</p>\n");
    }

    private static void lyapunov(StringBuilder h, StudyResult study) {
        List<LyapunovResult> spectra = study.lyapunovSpectra();
        if (spectra.stream().allMatch(l -> l.spectrum() == null)) {
            return;
        }
        h.append("<h2>Lyapunov exponents</h2>\n");
        for (LyapunovResult l : spectra) {
            LyapunovOutcome o = l.spectrum();
            if (o == null) {
                continue;
            }
            h.append("<table>\n<tr><th>exponent</th><th>estimate</th><th>at half time</th></tr>\n");
            double[] x = o.exponents(), half = o.halfwayExponents();
            for (int k = 0; k < x.length; k++) {
                h.append("<tr><td>λ").append(Charts.subscript(k + 1)).append("</td><td class=\"num\">")
                        .append(e(Formats.number(x[k]))).append("</td><td class=\"num\">")
                        .append(e(Formats.number(half[k]))).append("</td></tr>\n");
            }
            h.append("</table>\n<p class=\"lede\">sum ").append(e(Formats.number(o.sum())))
                    .append(", mean divergence ").append(e(Formats.number(o.meanDivergence()))).append("; ")
                    .append(o.converged() ? "converged" : "not converged").append(" (largest change over the "
                            + "second half ").append(e(Formats.number(o.largestChange()))).append(").</p>\n");
        }
    }

    private static void figures(StringBuilder h, List<Plot> plots, List<String> svgs) {
        if (plots.isEmpty()) {
            return;
        }
        h.append("<h2>Plots</h2>\n");
        for (int k = 0; k < plots.size(); k++) {
            Plot p = plots.get(k);
            String data = Base64.getEncoder().encodeToString(svgs.get(k).getBytes(StandardCharsets.UTF_8));
            h.append("<figure id=\"").append(e(p.stem())).append("\">\n<img alt=\"").append(e(p.title()))
                    .append("\" src=\"data:image/svg+xml;base64,").append(data).append("\">\n<figcaption>")
                    .append(e(p.caption())).append(" Files: <a href=\"").append(e(p.svgName())).append("\">")
                    .append(e(p.svgName())).append("</a>, <a href=\"").append(e(p.pngName())).append("\">")
                    .append(e(p.pngName())).append("</a>.</figcaption>\n</figure>\n");
        }
    }

    private static String status(Status s) {
        String word = switch (s) {
            case COMPLETED -> "completed";
            case INCOMPLETE -> "incomplete";
            case FAILED -> "failed";
        };
        return "<span class=\"status " + s.name() + "\">" + word + "</span>";
    }

    private static String eigenvalues(Equilibrium q) {
        double[] re = q.eigenvaluesReal(), im = q.eigenvaluesImag();
        StringBuilder b = new StringBuilder();
        for (int k = 0; k < re.length; k++) {
            b.append(k > 0 ? ", " : "").append(Formats.number(re[k]));
            if (im[k] != 0) {
                b.append(im[k] > 0 ? " + " : " − ").append(Formats.number(Math.abs(im[k]))).append("i");
            }
        }
        return b.toString();
    }

    private static String state(List<String> names, double[] values) {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < values.length; i++) {
            b.append(i > 0 ? ", " : "").append(names.get(i)).append(" = ").append(Formats.number(values[i]));
        }
        return b.toString();
    }

    /** "relativeTolerance" → "relative tolerance". */
    private static String words(String camel) {
        return camel.replaceAll("([a-z])([A-Z])", "$1 $2").toLowerCase(java.util.Locale.ROOT);
    }

    private static String e(String s) {
        return Html.escape(s);
    }
}
