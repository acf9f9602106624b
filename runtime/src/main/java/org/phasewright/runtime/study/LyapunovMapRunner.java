package org.phasewright.runtime.study;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.ensemble.Axis;
import org.phasewright.runtime.ensemble.EnsembleFailure;
import org.phasewright.runtime.ensemble.EnsembleRun;
import org.phasewright.runtime.ensemble.LyapunovPoint;
import org.phasewright.runtime.ensemble.LyapunovPoints;
import org.phasewright.runtime.model.LyapunovMap;
import org.phasewright.runtime.symbolic.ModelEvaluationException;

/** Runs one {@link LyapunovMap} on the ensemble executor of the run settings. */
final class LyapunovMapRunner {
    private LyapunovMapRunner() {
    }

    static LyapunovMapResult run(CompiledModel model, LyapunovMap request, RunSettings settings, Budget budget) {
        EnsembleGrid grid;
        try {
            grid = EnsembleGrid.of(request.first(), request.second(), request.endTime(), request.tolerance(),
                    LyapunovRunner.DEFAULT_RTOL, model.parameters(), settings);
        } catch (ModelEvaluationException e) {
            return new LyapunovMapResult(null, null, Double.NaN, null, null, Status.FAILED, "INVALID_INPUT",
                    e.getMessage());
        }
        Axis first = grid.first(), second = grid.second();
        double endTime = grid.endTime();
        LyapunovPoints task = LyapunovPoints.of(model, first, second, endTime, grid.recipe());
        String name = "lyapunov map " + first.name() + " x " + second.name();
        EnsembleRun<LyapunovPoint> run;
        try {
            run = settings.ensembles().run(task, model, Ensembles.control(settings, budget, name));
        } catch (EnsembleFailure e) {
            return new LyapunovMapResult(first, second, endTime, null, null, Status.FAILED,
                    Ensembles.EXECUTOR_FAILED, e.getMessage());
        }
        List<String> endings = new ArrayList<>();
        int unconverged = 0;
        double largest = Double.NEGATIVE_INFINITY, smallest = Double.POSITIVE_INFINITY;
        for (LyapunovPoint point : run.rows()) {
            if (point != null) {
                endings.add(point.ending());
                unconverged += point.converged() ? 0 : 1;
                if (!Double.isNaN(point.exponent())) {
                    largest = Math.max(largest, point.exponent());
                    smallest = Math.min(smallest, point.exponent());
                }
            }
        }
        String ending = Ensembles.ending(endings, task.points(), run.cancelled(), budget);
        String message = String.format(Locale.ROOT, "%d of %d points on %s; largest exponent from %.4g to %.4g",
                endings.size(), task.points(), run.executor(), smallest, largest)
                + (unconverged > 0 ? "; " + unconverged + " not converged (integrate longer)" : "")
                + Ensembles.endingNote(ending);
        return new LyapunovMapResult(first, second, endTime, run.rows(), run.executor(), Ensembles.status(ending),
                ending, message);
    }
}
