package org.phasewright.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.StateVariable;
import org.phasewright.runtime.study.AnalysisResult;
import org.phasewright.runtime.study.ContinuationResult;
import org.phasewright.runtime.study.EquilibriumResult;
import org.phasewright.runtime.study.LyapunovResult;
import org.phasewright.runtime.study.SectionResult;
import org.phasewright.runtime.study.SimulationResult;
import org.phasewright.runtime.study.SweepResult;
import org.phasewright.runtime.study.LyapunovMapResult;
import org.phasewright.runtime.study.BasinsResult;
import org.phasewright.runtime.study.StudyResult;
import org.phasewright.runtime.study.Trajectory;

/** Decides which plots a study gets, names their files, and builds them. */
final class StudyPlots {
    private StudyPlots() {
    }

    static List<Plot> of(StudyResult study, ReportContext context) {
        List<int[]> pairs = pairs(study.stateNames(), context.projections());
        List<Equilibrium> equilibria = new ArrayList<>();
        for (EquilibriumResult e : study.equilibriumSearches()) {
            equilibria.addAll(e.equilibria());
        }
        String head = study.modelName() + " · " + study.studyName();
        String time = timeLabel(study, context.model());
        List<Plot> plots = new ArrayList<>();
        int simulation = 0, section = 0, lyapunov = 0, continuation = 0, sweep = 0, map = 0, basins = 0;
        boolean projected = false;
        List<AnalysisResult> results = study.results();
        for (int a = 0; a < results.size(); a++) {
            switch (results.get(a)) {
                case SimulationResult s -> {
                    simulation++;
                    Trajectory t = s.trajectory();
                    if (t == null || t.size() == 0) {
                        break;
                    }
                    String suffix = simulation > 1 ? "-" + simulation : "";
                    String setting = study.timeName() + " from 0 to " + Formats.plain(t.time(t.size() - 1)) + ", "
                            + t.size() + " samples" + (t.size() > Decimation.MAX_POINTS
                                    ? ", thinned to at most " + Decimation.MAX_POINTS + " points per curve" : "")
                            + (s.integration() != null && !s.integration().completed() ? "; ended early: "
                                    + s.outcome().toLowerCase(Locale.ROOT).replace('_', ' ') : "");
                    var chart = Charts.timeSeries(t, time, labels(study, context.model()),
                            head + ": states against " + study.timeName(), setting);
                    plots.add(new Plot("time-series" + suffix, "time-series", chart.getTitle().getText(),
                            "Every state against " + study.timeName() + ".", Charts.seriesNames(chart), a, chart));
                    for (int[] p : pairs) {
                        plots.add(projection(study, context, t, p, equilibria, "phase" + suffix, head, a, setting));
                    }
                    projected = true;
                }
                case SectionResult x -> {
                    section++;
                    Trajectory points = x.points();
                    if (points == null || points.size() == 0 || study.stateNames().size() < 2) {
                        break;
                    }
                    int[] p = context.projections().isEmpty() ? widestPair(points) : pairs.get(0);
                    List<String> labels = labels(study, context.model());
                    var chart = Charts.section(points, p[0], p[1], labels.get(p[0]), labels.get(p[1]),
                            head + ": Poincaré section", points.size() + " crossings up to " + study.timeName()
                                    + " = " + Formats.plain(x.integration() == null ? x.endTime()
                                            : x.integration().time()));
                    plots.add(new Plot("section" + (section > 1 ? "-" + section : ""), "section",
                            chart.getTitle().getText(), "Crossings of the section, projected on "
                                    + study.stateNames().get(p[0]) + " and " + study.stateNames().get(p[1]) + ".",
                            Charts.seriesNames(chart), a, chart));
                }
                case LyapunovResult l -> {
                    lyapunov++;
                    if (l.spectrum() == null || l.spectrum().historyTimes().length == 0) {
                        break;
                    }
                    var chart = Charts.lyapunov(l.spectrum(), time, head + ": Lyapunov exponents",
                            "running estimates over " + study.timeName() + " from 0 to "
                                    + Formats.plain(l.spectrum().time()) + "; they should level off");
                    plots.add(new Plot("lyapunov" + (lyapunov > 1 ? "-" + lyapunov : ""), "lyapunov",
                            chart.getTitle().getText(), "Running estimates of each exponent; converged estimates "
                                    + "level off.", Charts.seriesNames(chart), a, chart));
                }
                case SweepResult w -> {
                    if (w.sweep() == null || w.sweep().columns().isEmpty()) {
                        break;
                    }
                    sweep++;
                    int state = OrbitDiagramChart.widestState(w.sweep());
                    var chart = OrbitDiagramChart.chart(w.sweep(), state, w.sweep().parameterName(),
                            labels(study, context.model()).get(state), head + ": orbit diagram in "
                                    + w.sweep().parameterName(), w.message());
                    plots.add(new Plot("orbit-diagram" + (sweep > 1 ? "-" + sweep : ""), "orbit-diagram",
                            chart.getTitle().getText(), "Local maxima of " + study.stateNames().get(state)
                                    + " after transients, for each value of " + w.sweep().parameterName() + ".",
                            Charts.seriesNames(chart), a, chart));
                }
                case LyapunovMapResult m -> {
                    if (m.first() == null || m.points().isEmpty()) {
                        break;
                    }
                    map++;
                    var chart = HeatmapChart.lyapunov(m, head + ": Lyapunov map over " + m.first().name() + " and "
                            + m.second().name(), m.message());
                    plots.add(new Plot("lyapunov-map" + (map > 1 ? "-" + map : ""), "lyapunov-map",
                            chart.getTitle().getText(), "Largest Lyapunov exponent at each pair of "
                                    + m.first().name() + " and " + m.second().name()
                                    + "; red chaotic (positive), white neutral, blue settling (negative).",
                            List.of("largest exponent"), a, chart));
                }
                case BasinsResult b -> {
                    if (b.first() == null || b.points().isEmpty()) {
                        break;
                    }
                    basins++;
                    var chart = HeatmapChart.basins(b, head + ": basins over " + b.first().name() + " and "
                            + b.second().name(), b.message());
                    plots.add(new Plot("basins" + (basins > 1 ? "-" + basins : ""), "basins",
                            chart.getTitle().getText(), "Each start of " + b.first().name() + " and "
                                    + b.second().name() + " coloured by the equilibrium it settles on.",
                            basinSeries(b), a, chart));
                }
                case EquilibriumResult e -> {
                    // Marked on the phase projections; drawn alone below when the study has no trajectory.
                }
                case ContinuationResult c -> {
                    if (c.continuation() == null || c.continuation().branches().isEmpty()) {
                        break;
                    }
                    continuation++;
                    int state = BifurcationDiagram.widestState(c.continuation(), study.stateNames().size());
                    String parameter = c.continuation().parameterName();
                    var chart = BifurcationDiagram.chart(c, state, parameter,
                            labels(study, context.model()).get(state), head + ": bifurcation diagram in " + parameter,
                            count(c.continuation().branches().size(), "branch", "branches") + " of equilibria, "
                                    + count(c.cycles().size(), "family", "families") + " of periodic orbits");
                    plots.add(new Plot("bifurcation" + (continuation > 1 ? "-" + continuation : ""),
                            "bifurcation", chart.getTitle().getText(), study.stateNames().get(state)
                                    + " against " + parameter + " on every branch; solid stable, dashed unstable,"
                                    + " special points labelled.", Charts.seriesNames(chart), a, chart));
                }
            }
        }
        if (!projected && !equilibria.isEmpty()) {
            int search = 0;
            for (int a = 0; a < results.size() && search == 0; a++) {
                if (results.get(a) instanceof EquilibriumResult) {
                    search = a + 1;
                }
            }
            for (int[] p : pairs) {
                plots.add(projection(study, context, null, p, equilibria, "equilibria", head, search - 1,
                        equilibria.size() + " equilibria"));
            }
        }
        return plots;
    }

    private static List<String> basinSeries(BasinsResult b) {
        List<String> names = new ArrayList<>(b.equilibria().stream().map(Equilibrium::name).toList());
        names.add("no equilibrium reached");
        return names;
    }

    private static Plot projection(StudyResult study, ReportContext context, Trajectory t, int[] p,
            List<Equilibrium> equilibria, String stem, String head, int analysis, String setting) {
        List<String> names = study.stateNames();
        List<String> labels = labels(study, context.model());
        String title = head + ": " + names.get(p[1]) + " against " + names.get(p[0]);
        var chart = Charts.projection(t, p[0], p[1], equilibria, labels.get(p[0]), labels.get(p[1]), title,
                setting);
        String caption = (t == null ? "Equilibria" : "The trajectory" + (equilibria.isEmpty() ? "" : " and the equilibria"))
                + " projected on " + names.get(p[0]) + " and " + names.get(p[1])
                + (equilibria.isEmpty() ? "." : "; filled circles are stable, hollow circles unstable, diamonds "
                        + "non-hyperbolic.");
        return new Plot(stem + "-" + FileNames.safe(names.get(p[0])) + "-" + FileNames.safe(names.get(p[1])),
                t == null ? "equilibria" : "phase-projection", title, caption, Charts.seriesNames(chart), analysis,
                chart);
    }

    /** The requested pairs, or the default: the plane for two states, the three planes of the first three states. */
    static List<int[]> pairs(List<String> states, List<List<String>> requested) {
        List<int[]> pairs = new ArrayList<>();
        if (!requested.isEmpty()) {
            for (List<String> pair : requested) {
                int i = states.indexOf(pair.get(0)), j = states.indexOf(pair.get(1));
                if (i < 0 || j < 0) {
                    throw new IllegalArgumentException("no state named '" + (i < 0 ? pair.get(0) : pair.get(1))
                            + "'; the states are " + String.join(", ", states));
                }
                pairs.add(new int[] {i, j});
            }
            return pairs;
        }
        int n = Math.min(3, states.size());
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                pairs.add(new int[] {i, j});
            }
        }
        return pairs;
    }

    /** The two states that vary most over the crossings (a state fixed by the section would show nothing). */
    private static int[] widestPair(Trajectory points) {
        int n = points.stateNames().size();
        double[] spread = new double[n];
        for (int s = 0; s < n; s++) {
            double lo = Double.POSITIVE_INFINITY, hi = Double.NEGATIVE_INFINITY;
            for (int k = 0; k < points.size(); k++) {
                double v = points.state(k, s);
                if (Double.isFinite(v)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
            spread[s] = hi >= lo ? hi - lo : 0;
        }
        int first = -1, second = -1;
        for (int s = 0; s < n; s++) {
            if (first < 0 || spread[s] > spread[first]) {
                second = first;
                first = s;
            } else if (second < 0 || spread[s] > spread[second]) {
                second = s;
            }
        }
        return new int[] {Math.min(first, second), Math.max(first, second)};
    }

    private static String count(int n, String one, String many) {
        return n + " " + (n == 1 ? one : many);
    }

    static List<String> labels(StudyResult study, DynamicalModel model) {
        List<String> labels = new ArrayList<>();
        for (int s = 0; s < study.stateNames().size(); s++) {
            String name = study.stateNames().get(s);
            String unit = null;
            if (model != null && s < model.states().size() && model.states().get(s).name().equals(name)) {
                unit = model.states().get(s).unit(); // same order: no scan per state (10^6 states would be 10^12)
            } else if (model != null) {
                for (StateVariable v : model.states()) {
                    if (v.name().equals(name)) {
                        unit = v.unit();
                    }
                }
            }
            labels.add(withUnit(name, unit));
        }
        return labels;
    }

    static String timeLabel(StudyResult study, DynamicalModel model) {
        return withUnit(study.timeName(), model == null ? null : model.time().unit());
    }

    static String withUnit(String name, String unit) {
        return unit == null || unit.isBlank() ? name : String.format(Locale.ROOT, "%s [%s]", name, unit);
    }
}
