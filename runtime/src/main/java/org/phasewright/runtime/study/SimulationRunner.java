package org.phasewright.runtime.study;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.DerivedValues;
import org.phasewright.runtime.integrate.EventStop;
import org.phasewright.runtime.integrate.IntegrationOutcome;
import org.phasewright.runtime.integrate.IntegratorSettings;
import org.phasewright.runtime.integrate.OutputSampler;
import org.phasewright.runtime.integrate.StepObserver;
import org.phasewright.runtime.integrate.SwitchingFunction;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Simulation;
import org.phasewright.runtime.symbolic.InitialValues;
import org.phasewright.runtime.symbolic.ModelEvaluationException;

/**
 * Runs one {@link Simulation}: evaluates its settings, integrates, and samples a trajectory by dense output. Models
 * with more than {@link ReducedSampler#LIMIT} states keep a few columns and summaries per sample
 * ({@link ReducedSampler}).
 */
final class SimulationRunner {
    static final double DEFAULT_RTOL = 1e-8;
    /** atol = rtol / 100, which gives the default pair rtol 1e-8, atol 1e-10. */
    static final double ATOL_PER_RTOL = 1e-2;

    private SimulationRunner() {
    }

    static SimulationResult run(CompiledModel model, Simulation simulation, RunSettings settings, Budget budget) {
        double[] p = model.parameters();
        double endTime = Double.NaN;
        double rtol = DEFAULT_RTOL;
        double[] start;
        SwitchingFunction stopSurface = null;
        try {
            endTime = InitialValues.evaluate(simulation.endTime(), p, "end time");
            if (!(endTime > 0)) {
                throw new ModelEvaluationException("end time must be positive, got " + endTime);
            }
            if (simulation.tolerance() != null) {
                rtol = InitialValues.evaluate(simulation.tolerance(), p, "tolerance");
                if (!(rtol >= 1e-14 && rtol < 1)) {
                    throw new ModelEvaluationException("tolerance must lie in [1e-14, 1), got " + rtol);
                }
            }
            start = startVector(model, simulation.start(), p);
            if (simulation.stop() != null) {
                stopSurface = Surfaces.of(model, simulation.stop().surface(), p);
                stopSurface.value(0.0, start); // fail here, not inside the integrator, if it cannot be evaluated
            }
        } catch (ModelEvaluationException e) {
            return new SimulationResult(null, null, endTime, rtol, Status.FAILED, "INVALID_INPUT", e.getMessage());
        }

        String unavailable = IntegratorChoice.unavailable(simulation.method(), model);
        if (unavailable != null) {
            return new SimulationResult(null, null, endTime, rtol, Status.FAILED, "MODEL_TOO_LARGE", unavailable);
        }
        IntegratorSettings integratorSettings = IntegratorSettings.DEFAULT
                .withTolerances(rtol, rtol * ATOL_PER_RTOL)
                .withMaxSteps(settings.maxSteps())
                .withBlowUpBound(settings.blowUpBound())
                .withDeadline(budget.deadlineNanos())
                .withCancellation(budget.cancelled());
        double[] outputTimes = OutputSampler.evenlySpaced(0.0, endTime, settings.samples());
        boolean reduced = ReducedSampler.needed(model);
        OutputSampler sampler = reduced ? null : new OutputSampler(outputTimes, model.dimension());
        ReducedSampler reducedSampler = reduced ? new ReducedSampler(model, p, outputTimes) : null;
        StepObserver output = reduced ? reducedSampler : sampler;
        EventStop stop = stopSurface == null ? null : new EventStop(stopSurface,
                Surfaces.direction(simulation.stop().direction()), model.dimension(), output);
        IntegrationOutcome outcome = IntegratorChoice.create(simulation.method(), model, p)
                .integrate(0.0, start, endTime, integratorSettings, ProgressObserver.wrap(stop == null ? output : stop,
                        settings, ProgressObserver.task("simulate", model.timeName(), endTime), 0.0, endTime));
        if (outcome.ending() == IntegrationOutcome.Ending.STOPPED) { // report the event, not the step's end
            outcome = new IntegrationOutcome(outcome.ending(), stop.time(), stop.state(), outcome.rhsEvaluations(),
                    outcome.acceptedSteps(), outcome.rejectedSteps(), outcome.lastStepSize(), outcome.blowUpBound(),
                    outcome.stiffnessDetectedAt());
        }

        Trajectory trajectory = reduced
                ? reducedSampler.trajectory(outcome.completed(), outcome.time(), outcome.state())
                : trajectory(model, p, sampler, outcome);
        String message = outcome.message(model.timeName());
        if (outcome.ending() == IntegrationOutcome.Ending.STOPPED) {
            message = "stopped by the condition at " + model.timeName() + " = "
                    + SectionRunner.plain(stop.time()) + " after " + outcome.acceptedSteps() + " steps ("
                    + outcome.rejectedSteps() + " rejected, " + outcome.rhsEvaluations() + " evaluations)";
        }
        if (trajectory.kept() != null) {
            message += "; output keeps the " + trajectory.kept();
        }
        return new SimulationResult(trajectory, outcome, endTime, rtol, IntegratorChoice.status(outcome),
                outcome.ending().name(), message);
    }

    private static double[] startVector(CompiledModel model, List<Expr> start, double[] p) {
        if (start.isEmpty()) {
            return model.initialState();
        }
        if (start.size() != model.dimension()) {
            throw new ModelEvaluationException("start lists " + start.size() + " values but the model has "
                    + model.dimension() + " states");
        }
        double[] u = new double[start.size()];
        for (int i = 0; i < u.length; i++) {
            u[i] = InitialValues.evaluate(start.get(i), p,
                    String.format(Locale.ROOT, "start value of '%s'", model.stateNames().get(i)));
        }
        return u;
    }

    /** Samples, plus the point where a failed integration stopped, with derived quantities at each row. */
    private static Trajectory trajectory(CompiledModel model, double[] p, OutputSampler sampler,
            IntegrationOutcome outcome) {
        double[] times = sampler.times();
        double[][] states = sampler.states();
        int rows = times.length;
        double lastTime = outcome.time();
        if (!outcome.completed() && (rows == 0 || lastTime > times[rows - 1])) {
            times = Arrays.copyOf(times, rows + 1);
            states = Arrays.copyOf(states, rows + 1);
            times[rows] = lastTime;
            states[rows] = outcome.state();
            rows++;
        }
        DerivedValues dv = model.derivedValues();
        double[][] derived = new double[rows][dv.derivedCount()];
        for (int k = 0; k < rows; k++) {
            dv.derived(times[k], states[k], p, derived[k]);
        }
        return new Trajectory(model.timeName(), model.stateNames(), model.derivedNames(), times, states, derived);
    }
}
