package org.phasewright.runtime.study;

import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.model.Analysis;
import org.phasewright.runtime.model.Basins;
import org.phasewright.runtime.model.LyapunovMap;
import org.phasewright.runtime.model.EquilibriumContinuation;
import org.phasewright.runtime.model.ParameterSweep;
import org.phasewright.runtime.model.EquilibriumSearch;
import org.phasewright.runtime.model.LyapunovExponents;
import org.phasewright.runtime.model.Section;
import org.phasewright.runtime.model.Simulation;
import org.phasewright.runtime.model.Study;

/**
 * Executes the analyses of a study in order. Numerical trouble becomes a result with a named outcome and a message;
 * an equilibrium search seeds Newton's method from the latest trajectory of the same study when there is one, and
 * basins are labelled by the equilibria of the latest completed search before them.
 */
public final class StudyRunner {
    private StudyRunner() {
    }

    public static StudyResult run(CompiledModel model, Study study, RunSettings settings) {
        Budget budget = Budget.start(settings);
        List<AnalysisResult> results = new ArrayList<>();
        Trajectory latest = null;
        EquilibriumResult equilibria = null; // the latest completed search, which labels later basins
        for (Analysis analysis : study.analyses()) {
            AnalysisResult result;
            if (budget.cancelled().getAsBoolean() || budget.expired()) {
                result = skipped(analysis, budget.cancelled().getAsBoolean() ? "CANCELLED" : "TIME_LIMIT");
            } else {
                try {
                    result = switch (analysis) {
                        case Simulation s -> SimulationRunner.run(model, s, settings, budget);
                        case EquilibriumSearch e -> EquilibriumSearchRunner.run(model, latest, settings, budget);
                        case Section x -> SectionRunner.run(model, x, settings, budget);
                        case LyapunovExponents l -> LyapunovRunner.run(model, l, settings, budget);
                        case EquilibriumContinuation c -> ContinuationRunner.run(model, c, settings, budget);
                        case ParameterSweep w -> SweepRunner.run(model, w, settings, budget);
                        case LyapunovMap m -> LyapunovMapRunner.run(model, m, settings, budget);
                        case Basins b -> BasinsRunner.run(model, b, settings, budget, equilibria);
                    };
                } catch (RuntimeException e) { // a bug must not surface as a stack trace in a user's terminal
                    result = failed(analysis, "internal error: " + e);
                }
            }
            if (result instanceof SimulationResult s && s.trajectory() != null && s.trajectory().size() > 0
                    && s.trajectory().kept() == null) { // a reduced trajectory has too few columns to seed Newton
                latest = s.trajectory();
            }
            if (result instanceof EquilibriumResult e && e.status() == Status.COMPLETED && !e.equilibria().isEmpty()) {
                equilibria = e;
            }
            results.add(result);
        }
        return new StudyResult(model.name(), study.name(), model.timeName(), model.stateNames(), model.derivedNames(),
                model.parameterNames(), model.parameters(), results);
    }

    /** Runs every study declared in the model. */
    public static List<StudyResult> runAll(CompiledModel model, RunSettings settings) {
        return model.model().studies().stream().map(s -> run(model, s, settings)).toList();
    }

    private static AnalysisResult skipped(Analysis analysis, String why) {
        String message = "not run: "
                + (why.equals("CANCELLED") ? "the run was cancelled" : "the wall-time limit was reached");
        return switch (analysis) {
            case Simulation s -> new SimulationResult(null, null, Double.NaN, Double.NaN, Status.INCOMPLETE, why,
                    message);
            case EquilibriumSearch e -> new EquilibriumResult(List.of(), null, Status.INCOMPLETE, why, message);
            case Section x -> new SectionResult(null, null, Double.NaN, Status.INCOMPLETE, why, message);
            case LyapunovExponents l -> new LyapunovResult(null, Double.NaN, Status.INCOMPLETE, why, message);
            case EquilibriumContinuation c -> new ContinuationResult(null, Status.INCOMPLETE, why, message);
            case ParameterSweep w -> new SweepResult(null, Status.INCOMPLETE, why, message);
            case LyapunovMap m -> new LyapunovMapResult(null, null, Double.NaN, null, null, Status.INCOMPLETE, why,
                    message);
            case Basins b -> new BasinsResult(null, null, Double.NaN, null, null, null, Status.INCOMPLETE, why,
                    message);
        };
    }

    private static AnalysisResult failed(Analysis analysis, String message) {
        return switch (analysis) {
            case Simulation s -> new SimulationResult(null, null, Double.NaN, Double.NaN, Status.FAILED,
                    "INTERNAL_ERROR", message);
            case EquilibriumSearch e -> new EquilibriumResult(List.of(), null, Status.FAILED, "INTERNAL_ERROR",
                    message);
            case Section x -> new SectionResult(null, null, Double.NaN, Status.FAILED, "INTERNAL_ERROR", message);
            case LyapunovExponents l -> new LyapunovResult(null, Double.NaN, Status.FAILED, "INTERNAL_ERROR",
                    message);
            case EquilibriumContinuation c -> new ContinuationResult(null, Status.FAILED, "INTERNAL_ERROR", message);
            case ParameterSweep w -> new SweepResult(null, Status.FAILED, "INTERNAL_ERROR", message);
            case LyapunovMap m -> new LyapunovMapResult(null, null, Double.NaN, null, null, Status.FAILED,
                    "INTERNAL_ERROR", message);
            case Basins b -> new BasinsResult(null, null, Double.NaN, null, null, null, Status.FAILED,
                    "INTERNAL_ERROR", message);
        };
    }
}
