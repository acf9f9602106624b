package org.phasewright.runtime.study;

import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.continuation.ParameterVector;
import org.phasewright.runtime.ensemble.Axis;
import org.phasewright.runtime.ensemble.EnsembleFailure;
import org.phasewright.runtime.ensemble.EnsembleRun;
import org.phasewright.runtime.ensemble.IntegrationRecipe;
import org.phasewright.runtime.ensemble.OrbitColumn;
import org.phasewright.runtime.ensemble.OrbitPoints;
import org.phasewright.runtime.model.ParameterSweep;
import org.phasewright.runtime.symbolic.InitialValues;
import org.phasewright.runtime.symbolic.ModelEvaluationException;
import org.phasewright.runtime.sweep.SweepColumn;
import org.phasewright.runtime.sweep.SweepOutcome;

/** Runs one {@link ParameterSweep} (orbit diagram) on the ensemble executor of the run settings. */
final class SweepRunner {
    /** Keeps a typo such as `steps 1000000` from tying up a machine; the wall-time limit still applies. */
    static final int MAX_STEPS = 100_000;

    private SweepRunner() {
    }

    static SweepResult run(CompiledModel model, ParameterSweep request, RunSettings settings, Budget budget) {
        double[] base = model.parameters();
        double from, to, endTime;
        ParameterVector parameters;
        try {
            from = InitialValues.evaluate(request.from(), base, "start value");
            to = InitialValues.evaluate(request.to(), base, "end value");
            endTime = Ensembles.positive(request.endTime(), base, "end time");
            if (request.steps() < 1 || request.steps() > MAX_STEPS) {
                throw new ModelEvaluationException("steps must lie in 1 .. " + MAX_STEPS + ", got "
                        + request.steps());
            }
            parameters = new ParameterVector(model.model(), base, request.parameter().index());
        } catch (ModelEvaluationException e) {
            return new SweepResult(null, Status.FAILED, "INVALID_INPUT", e.getMessage());
        }
        IntegrationRecipe integration = new IntegrationRecipe(SimulationRunner.DEFAULT_RTOL,
                SimulationRunner.DEFAULT_RTOL * SimulationRunner.ATOL_PER_RTOL, settings.maxSteps(),
                settings.blowUpBound());
        String task = "sweep " + parameters.name() + " from " + SectionRunner.plain(from) + " to "
                + SectionRunner.plain(to);
        OrbitPoints points = OrbitPoints.of(model, new Axis(parameters.name(), parameters.index(), from, to,
                request.steps()), endTime, integration);
        EnsembleRun<OrbitColumn> run;
        try {
            run = settings.ensembles().run(points, model, Ensembles.control(settings, budget, task));
        } catch (EnsembleFailure e) {
            return new SweepResult(null, Status.FAILED, Ensembles.EXECUTOR_FAILED, e.getMessage());
        }
        List<SweepColumn> columns = new ArrayList<>();
        List<String> endings = new ArrayList<>();
        for (OrbitColumn c : run.rows()) {
            if (c != null) {
                columns.add(c.column());
                endings.add(c.ending());
            }
        }
        String ending = Ensembles.ending(endings, request.steps(), run.cancelled(), budget);
        SweepOutcome outcome = new SweepOutcome(parameters.name(), from, to, endTime, columns, request.steps(),
                run.workers(), SweepOutcome.Ending.valueOf(ending));
        Status status = Ensembles.status(ending);
        String message = outcome.message();
        if (!message.contains(run.executor())) { // e.g. Spark: the threads alone would not say where it ran
            message += " (" + run.executor() + ")";
        }
        return new SweepResult(outcome, status, outcome.ending().name(), message);
    }
}
