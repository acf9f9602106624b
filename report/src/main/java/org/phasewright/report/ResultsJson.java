package org.phasewright.report;

import java.util.List;

import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.integrate.IntegrationOutcome;
import org.phasewright.runtime.lyapunov.LyapunovOutcome;
import org.phasewright.runtime.model.Analysis;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Parameter;
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

/**
 * results.json: every number of a study run for machines. Top level: format, tool, model, study, status, run
 * (finished, seconds), time, states, parameters (name, value, unit, description), analyses (kind, status, outcome,
 * message, settings, and per kind: integration counters, a trajectory summary, equilibria with eigenvalues, section
 * crossings count, Lyapunov exponents), plots (file names). Trajectories are summarised (samples, final time and
 * state), not listed: the samples are in trajectory.csv. Non-finite numbers are null.
 */
final class ResultsJson {
    static final String FORMAT = "phasewright-results";
    static final int FORMAT_VERSION = 1;
    /** Above this many states only the first {@link #LISTED_STATES} are listed, as in reduced trajectories. */
    static final int LISTED_STATES_LIMIT = 1000, LISTED_STATES = 16;

    private ResultsJson() {
    }

    static String render(StudyResult study, ReportContext context, List<Plot> plots) {
        DynamicalModel model = context.model();
        JsonWriter j = new JsonWriter().beginObject();
        j.field("format", FORMAT).field("formatVersion", FORMAT_VERSION);
        j.name("tool").beginObject().field("name", "phasewright").field("version", context.toolVersion()).endObject();
        j.field("model", study.modelName());
        j.field("modelTitle", model == null ? null : model.title());
        j.field("modelFile", context.modelFile());
        j.field("study", study.studyName());
        j.field("status", study.status().name());
        j.name("run").beginObject().field("finished", context.finished().toString())
                .field("seconds", context.runTime().toNanos() / 1e9).endObject();
        j.name("time").beginObject().field("name", study.timeName())
                .field("unit", model == null ? null : model.time().unit()).endObject();
        // models with many states list the first few (the trajectory keeps the same ones) and give the count
        int listed = study.stateNames().size() > LISTED_STATES_LIMIT ? LISTED_STATES : study.stateNames().size();
        if (listed < study.stateNames().size()) {
            j.field("stateCount", study.stateNames().size());
        }
        j.name("states").beginArray();
        for (int i = 0; i < listed; i++) {
            String name = study.stateNames().get(i);
            StateVariable v = model == null || i >= model.states().size() || !model.states().get(i).name()
                    .equals(name) ? null : model.states().get(i);
            j.beginObject().field("name", name).field("unit", v == null ? null : v.unit())
                    .field("description", v == null ? null : v.description()).endObject();
        }
        j.endArray();
        j.name("parameters").beginArray();
        double[] values = study.parameterValues();
        for (int i = 0; i < values.length; i++) {
            Parameter p = parameter(model, study.parameterNames().get(i));
            j.beginObject().field("name", study.parameterNames().get(i)).field("value", values[i])
                    .field("unit", p == null ? null : p.unit())
                    .field("description", p == null ? null : p.description());
            j.endObject();
        }
        j.endArray();
        j.name("analyses").beginArray();
        List<AnalysisResult> results = study.results();
        for (int a = 0; a < results.size(); a++) {
            analysis(j, results.get(a), Settings.declared(model, study.studyName(), a, results.size()), a, plots);
        }
        j.endArray();
        j.name("plots").beginArray();
        for (Plot p : plots) {
            j.beginObject().field("kind", p.kind()).field("title", p.title()).field("svg", p.svgName())
                    .field("png", p.pngName()).field("analysis", p.analysis());
            j.name("series").beginArray();
            for (String s : p.series()) {
                j.value(s);
            }
            j.endArray().endObject();
        }
        j.endArray();
        return j.endObject().finish();
    }

    private static void analysis(JsonWriter j, AnalysisResult result, Analysis declared, int index,
            List<Plot> plots) {
        j.beginObject();
        j.field("index", index);
        j.field("kind", Settings.kind(result));
        j.field("status", result.status().name()).field("outcome", result.outcome()).field("message",
                result.message());
        j.name("settings").beginObject();
        for (var entry : Settings.of(result, declared).entrySet()) {
            if (entry.getValue() instanceof Double d) {
                j.field(entry.getKey(), d);
            } else {
                j.field(entry.getKey(), String.valueOf(entry.getValue()));
            }
        }
        j.endObject();
        switch (result) {
            case SimulationResult s -> {
                integration(j, s.integration());
                Trajectory t = s.trajectory();
                if (t != null) {
                    j.name("trajectory").beginObject().field("samples", t.size());
                    if (t.kept() != null) {
                        j.field("kept", t.kept());
                    }
                    if (t.size() > 0) {
                        j.field("firstTime", t.time(0)).field("finalTime", t.time(t.size() - 1))
                                .numbers("finalState", t.stateRow(t.size() - 1));
                        if (!t.derivedNames().isEmpty()) {
                            j.numbers("finalDerived", t.derivedRow(t.size() - 1));
                        }
                    }
                    j.endObject();
                }
            }
            case EquilibriumResult e -> {
                j.field("count", e.equilibria().size());
                if (e.search() != null) {
                    j.name("search").beginObject().field("ending", e.search().ending().name())
                            .field("startsTried", e.search().startsTried())
                            .field("startsConverged", e.search().startsConverged())
                            .field("newtonIterations", e.search().totalIterations()).endObject();
                }
                j.name("equilibria").beginArray();
                for (Equilibrium q : e.equilibria()) {
                    equilibrium(j, q);
                }
                j.endArray();
            }
            case SectionResult x -> {
                integration(j, x.integration());
                j.field("crossings", x.points() == null ? 0 : x.points().size());
                if (x.points() != null && x.points().size() > 0) {
                    Trajectory p = x.points();
                    j.field("firstCrossingTime", p.time(0)).field("lastCrossingTime", p.time(p.size() - 1))
                            .numbers("lastCrossing", p.stateRow(p.size() - 1));
                }
            }
            case LyapunovResult l -> {
                LyapunovOutcome o = l.spectrum();
                if (o != null) {
                    integration(j, o.integration());
                    j.numbers("exponents", o.exponents()).numbers("halfwayExponents", o.halfwayExponents())
                            .field("sum", o.sum()).field("meanDivergence", o.meanDivergence())
                            .field("largestChange", o.largestChange()).field("converged", o.converged())
                            .field("averagedOver", o.time()).field("reorthonormalisations",
                                    o.reorthonormalisations())
                            .field("historyRows", o.historyTimes().length);
                }
            }
            case ContinuationResult c -> {
                if (c.continuation() != null) {
                    j.field("branches", c.continuation().branches().size())
                            .field("points", c.continuation().pointCount())
                            .field("specialPoints", c.continuation().specialPoints().size());
                }
            }
            case SweepResult w -> {
                if (w.sweep() != null) {
                    j.field("parameterValues", w.sweep().columns().size()).field("threads", w.sweep().threads());
                }
            }
            case LyapunovMapResult m -> {
                if (m.first() != null) {
                    axes(j, m.first(), m.second());
                    j.field("executor", m.executor());
                    j.name("largestExponent").beginArray(); // row i (first axis), column j (second axis)
                    for (int i = 0; i < m.first().steps(); i++) {
                        j.beginArray();
                        for (int k = 0; k < m.second().steps(); k++) {
                            j.value(m.exponent(i, k)); // NaN (not run) is written as null
                        }
                        j.endArray();
                    }
                    j.endArray();
                }
            }
            case BasinsResult b -> {
                if (b.first() != null) {
                    axes(j, b.first(), b.second());
                    j.field("executor", b.executor());
                    j.name("equilibria").beginArray();
                    for (Equilibrium q : b.equilibria()) {
                        j.beginObject().field("name", q.name()).numbers("coordinates", q.coordinates()).endObject();
                    }
                    j.endArray();
                    // row i (first axis), column j (second axis): index into equilibria, -1 none, -2 not run
                    j.name("labels").beginArray();
                    for (int i = 0; i < b.first().steps(); i++) {
                        j.beginArray();
                        for (int k = 0; k < b.second().steps(); k++) {
                            j.value(b.label(i, k));
                        }
                        j.endArray();
                    }
                    j.endArray();
                }
            }
        }
        j.name("plots").beginArray();
        for (Plot p : plots) {
            if (p.analysis() == index) {
                j.value(p.svgName());
            }
        }
        j.endArray();
        j.endObject();
    }

    private static void axes(JsonWriter j, org.phasewright.runtime.ensemble.Axis first,
            org.phasewright.runtime.ensemble.Axis second) {
        for (var a : List.of(first, second)) {
            j.name(a == first ? "first" : "second").beginObject().field("name", a.name()).field("from", a.from())
                    .field("to", a.to()).field("steps", a.steps()).endObject();
        }
    }

    private static void equilibrium(JsonWriter j, Equilibrium q) {
        j.beginObject().field("name", q.name()).numbers("coordinates", q.coordinates());
        double[] re = q.eigenvaluesReal(), im = q.eigenvaluesImag();
        j.name("eigenvalues").beginArray();
        for (int k = 0; k < re.length; k++) {
            j.beginObject().field("re", re[k]).field("im", im[k]).endObject();
        }
        j.endArray();
        j.field("type", q.type()).field("stability", Charts.Stability.of(q).word())
                .field("stableDimension", q.classification().stableDimension())
                .field("unstableDimension", q.classification().unstableDimension())
                .field("centreDimension", q.classification().centreDimension())
                .field("residual", q.residual());
        j.endObject();
    }

    private static void integration(JsonWriter j, IntegrationOutcome o) {
        if (o == null) {
            return;
        }
        j.name("integration").beginObject().field("ending", o.ending().name()).field("timeReached", o.time())
                .field("acceptedSteps", o.acceptedSteps()).field("rejectedSteps", o.rejectedSteps())
                .field("rhsEvaluations", o.rhsEvaluations()).field("lastStepSize", o.lastStepSize())
                .field("stiffnessDetectedAt", o.stiffnessDetectedAt()).endObject();
    }

    static Parameter parameter(DynamicalModel model, String name) {
        if (model == null) {
            return null;
        }
        return model.parameters().stream().filter(p -> p.name().equals(name)).findFirst().orElse(null);
    }
}
