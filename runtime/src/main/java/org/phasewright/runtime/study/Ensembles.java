package org.phasewright.runtime.study;

import java.util.List;

import org.phasewright.runtime.ensemble.Axis;
import org.phasewright.runtime.ensemble.EnsembleControl;
import org.phasewright.runtime.model.GridAxis;
import org.phasewright.runtime.symbolic.InitialValues;
import org.phasewright.runtime.symbolic.ModelEvaluationException;

/** What the ensemble runners share: grid checks, budgets and the ending of a run. */
final class Ensembles {
    /** Grids larger than this are almost certainly a typo; the wall-time limit still applies below it. */
    static final long MAX_POINTS = 4_000_000L;
    /** Outcome of an analysis whose executor failed as a whole (e.g. an unreachable cluster). */
    static final String EXECUTOR_FAILED = "EXECUTOR_FAILED";

    private Ensembles() {
    }

    static EnsembleControl control(RunSettings settings, Budget budget, String task) {
        return new EnsembleControl(budget.deadlineNanos(), budget.cancelled(),
                settings.progress() == ProgressListener.NONE ? null
                        : fraction -> settings.progress().progress(task, fraction));
    }

    static Axis axis(GridAxis axis, double[] parameters) {
        double from = InitialValues.evaluate(axis.from(), parameters, "start value of " + axis.variable().name());
        double to = InitialValues.evaluate(axis.to(), parameters, "end value of " + axis.variable().name());
        return new Axis(axis.variable().name(), axis.variable().index(), from, to, axis.steps());
    }

    static void checkGrid(Axis first, Axis second) {
        if (first.index() == second.index()) {
            throw new ModelEvaluationException("the two axes must vary different variables, both vary "
                    + first.name());
        }
        if ((long) first.steps() * second.steps() > MAX_POINTS) {
            throw new ModelEvaluationException("the grid has " + (long) first.steps() * second.steps()
                    + " points; at most " + MAX_POINTS + " are allowed");
        }
    }

    static double positive(org.phasewright.runtime.model.Expr e, double[] parameters, String what) {
        double v = InitialValues.evaluate(e, parameters, what);
        if (!(v > 0)) {
            throw new ModelEvaluationException(what + " must be positive, got " + v);
        }
        return v;
    }

    /** Relative tolerance of a request, or the default. */
    static double tolerance(org.phasewright.runtime.model.Expr e, double[] parameters, double fallback) {
        if (e == null) {
            return fallback;
        }
        double rtol = InitialValues.evaluate(e, parameters, "tolerance");
        if (!(rtol >= 1e-14 && rtol < 1)) {
            throw new ModelEvaluationException("tolerance must lie in [1e-14, 1), got " + rtol);
        }
        return rtol;
    }

    /** COMPLETED, SOME_FAILED, TIME_LIMIT or CANCELLED, as for orbit diagrams. */
    static String ending(List<String> endings, int points, boolean cancelled, Budget budget) {
        if (cancelled || budget.cancelled().getAsBoolean()) {
            return "CANCELLED";
        }
        if (endings.size() < points || budget.expired()) {
            return "TIME_LIMIT";
        }
        return endings.stream().allMatch("COMPLETED"::equals) ? "COMPLETED" : "SOME_FAILED";
    }

    /** What a run's message adds for its ending (nothing when it completed). */
    static String endingNote(String ending) {
        return switch (ending) {
            case "SOME_FAILED" -> "; some integrations ended early";
            case "TIME_LIMIT" -> "; stopped at the wall-time limit";
            case "CANCELLED" -> "; cancelled";
            default -> "";
        };
    }

    static Status status(String ending) {
        return ending.equals("COMPLETED") ? Status.COMPLETED : Status.INCOMPLETE;
    }
}
