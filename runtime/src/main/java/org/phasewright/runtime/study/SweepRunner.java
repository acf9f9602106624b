package org.phasewright.runtime.study;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.continuation.ParameterVector;
import org.phasewright.runtime.integrate.IntegratorSettings;
import org.phasewright.runtime.model.ParameterSweep;
import org.phasewright.runtime.symbolic.InitialValues;
import org.phasewright.runtime.symbolic.ModelEvaluationException;
import org.phasewright.runtime.sweep.OrbitDiagram;
import org.phasewright.runtime.sweep.SweepOutcome;

/** Runs one {@link ParameterSweep} (orbit diagram) on all cores. */
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
            endTime = InitialValues.evaluate(request.endTime(), base, "end time");
            if (!(endTime > 0)) {
                throw new ModelEvaluationException("end time must be positive, got " + endTime);
            }
            if (request.steps() < 1 || request.steps() > MAX_STEPS) {
                throw new ModelEvaluationException("steps must lie in 1 .. " + MAX_STEPS + ", got "
                        + request.steps());
            }
            parameters = new ParameterVector(model.model(), base, request.parameter().index());
        } catch (ModelEvaluationException e) {
            return new SweepResult(null, Status.FAILED, "INVALID_INPUT", e.getMessage());
        }
        IntegratorSettings s = IntegratorSettings.DEFAULT
                .withTolerances(SimulationRunner.DEFAULT_RTOL, SimulationRunner.DEFAULT_RTOL
                        * SimulationRunner.ATOL_PER_RTOL)
                .withMaxSteps(settings.maxSteps())
                .withBlowUpBound(settings.blowUpBound())
                .withDeadline(budget.deadlineNanos())
                .withCancellation(budget.cancelled());
        String task = "sweep " + parameters.name() + " from " + SectionRunner.plain(from) + " to "
                + SectionRunner.plain(to);
        SweepOutcome outcome = OrbitDiagram.run(model, parameters, from, to, request.steps(), endTime, s,
                budget.cancelled(), settings.progress() == ProgressListener.NONE ? null
                        : fraction -> settings.progress().progress(task, fraction));
        Status status = switch (outcome.ending()) {
            case COMPLETED -> Status.COMPLETED;
            case SOME_FAILED, TIME_LIMIT, CANCELLED -> Status.INCOMPLETE;
        };
        return new SweepResult(outcome, status, outcome.ending().name(), outcome.message());
    }
}
