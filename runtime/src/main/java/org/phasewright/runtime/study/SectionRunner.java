package org.phasewright.runtime.study;

import java.util.Locale;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.DerivedValues;
import org.phasewright.runtime.integrate.CrossingLocator;
import org.phasewright.runtime.integrate.IntegrationOutcome;
import org.phasewright.runtime.integrate.IntegratorSettings;
import org.phasewright.runtime.integrate.SwitchingFunction;
import org.phasewright.runtime.model.Section;
import org.phasewright.runtime.symbolic.InitialValues;
import org.phasewright.runtime.symbolic.ModelEvaluationException;

/** Runs one {@link Section}: integrates from the initial values and keeps the located crossings of the surface. */
final class SectionRunner {
    private SectionRunner() {
    }

    static SectionResult run(CompiledModel model, Section section, RunSettings settings, Budget budget) {
        double[] p = model.parameters();
        double endTime = Double.NaN;
        double rtol = SimulationRunner.DEFAULT_RTOL;
        SwitchingFunction g;
        try {
            // By hand, not Ensembles.positive: the FAILED result reports the rejected end time.
            endTime = InitialValues.evaluate(section.endTime(), p, "end time");
            if (!(endTime > 0)) {
                throw new ModelEvaluationException("end time must be positive, got " + endTime);
            }
            rtol = Ensembles.tolerance(section.tolerance(), p, rtol);
            g = Surfaces.of(model, section.surface(), p);
            g.value(0.0, model.initialState()); // fail here, not inside the integrator, if it cannot be evaluated
        } catch (ModelEvaluationException e) {
            return new SectionResult(null, null, endTime, Status.FAILED, "INVALID_INPUT", e.getMessage());
        }
        String unavailable = IntegratorChoice.unavailable(section.method(), model);
        if (unavailable != null) {
            return new SectionResult(null, null, endTime, Status.FAILED, "MODEL_TOO_LARGE", unavailable);
        }
        IntegratorSettings integratorSettings = IntegratorSettings.DEFAULT
                .withTolerances(rtol, rtol * SimulationRunner.ATOL_PER_RTOL)
                .withMaxSteps(settings.maxSteps())
                .withBlowUpBound(settings.blowUpBound())
                .withDeadline(budget.deadlineNanos())
                .withCancellation(budget.cancelled());
        boolean reduced = ReducedSampler.needed(model);
        int limit = reduced ? largeModelCrossings(model.dimension()) : RunSettings.MAX_OUTPUT_SAMPLES;
        CrossingLocator locator = new CrossingLocator(g, Surfaces.direction(section.direction()), model.dimension(),
                limit);
        IntegrationOutcome outcome = IntegratorChoice.create(section.method(), model, p)
                .integrate(0.0, model.initialState(), endTime, integratorSettings, ProgressObserver.wrap(locator,
                        settings, ProgressObserver.task("section", model.timeName(), endTime), 0.0, endTime));

        double[] times = locator.times();
        double[][] states = locator.states();
        Trajectory points;
        if (reduced) { // the same columns as a reduced simulation: a few states, derived values and summaries
            ReducedSampler rows = new ReducedSampler(model, p, times);
            for (int k = 0; k < times.length; k++) {
                rows.next(states[k]);
            }
            points = rows.trajectory(true, Double.NaN, null);
        } else {
            DerivedValues dv = model.derivedValues();
            double[][] derived = new double[times.length][dv.derivedCount()];
            for (int k = 0; k < times.length; k++) {
                dv.derived(times[k], states[k], p, derived[k]);
            }
            points = new Trajectory(model.timeName(), model.stateNames(), model.derivedNames(), times, states,
                    derived);
        }
        String what = String.format(Locale.ROOT, "%d %s crossing%s", times.length,
                section.direction().name().toLowerCase(Locale.ROOT).replace("both", "rising and falling"),
                times.length == 1 ? "" : "s");
        if (locator.truncated()) {
            what += " (more were found than the " + limit + " kept)";
        }
        if (points.kept() != null) {
            what += "; each keeps the " + points.kept().replace("; the final state in full", "");
        }
        String message = outcome.completed() ? what + " up to " + model.timeName() + " = "
                + plain(endTime)
                : outcome.message(model.timeName()) + "; " + what + " before that";
        if (outcome.completed() && outcome.stiffnessDetected()) {
            message += "; " + outcome.message(model.timeName()).replaceFirst("^.*; ", "");
        }
        return new SectionResult(points, outcome, endTime, IntegratorChoice.status(outcome), outcome.ending().name(),
                message);
    }

    /**
     * Crossings kept for a model with {@code n} states: the locator holds each in full, so at most about 400 MB of
     * them (50 for 10^6 states), and never fewer than 10.
     */
    static int largeModelCrossings(int n) {
        return (int) Math.max(10, Math.min(RunSettings.MAX_OUTPUT_SAMPLES, 400_000_000L / (8L * n)));
    }

    /** "1000" rather than "1000.0"; other values as Java prints them. */
    static String plain(double x) {
        return x == Math.rint(x) && Math.abs(x) < 1e15 ? Long.toString((long) x) : Double.toString(x);
    }
}
