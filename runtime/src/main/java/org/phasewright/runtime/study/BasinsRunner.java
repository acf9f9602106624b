package org.phasewright.runtime.study;

import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.ensemble.Axis;
import org.phasewright.runtime.ensemble.BasinPoint;
import org.phasewright.runtime.ensemble.BasinPoints;
import org.phasewright.runtime.ensemble.EnsembleFailure;
import org.phasewright.runtime.ensemble.EnsembleRun;
import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.model.Basins;
import org.phasewright.runtime.symbolic.ModelEvaluationException;

/**
 * Runs one {@link Basins} request: the equilibria are those of the study's equilibrium search before it, or found
 * here as such a search would, then every start of the grid runs on the ensemble executor and is labelled by the
 * equilibrium it settles on.
 */
final class BasinsRunner {
    private BasinsRunner() {
    }

    /**
     * @param earlier the study's latest completed equilibrium search before this request, whose equilibria label
     *                the basins (the same names as in its report); null to search here
     */
    static BasinsResult run(CompiledModel model, Basins request, RunSettings settings, Budget budget,
            EquilibriumResult earlier) {
        EnsembleGrid grid;
        try {
            grid = EnsembleGrid.of(request.first(), request.second(), request.endTime(), request.tolerance(),
                    SimulationRunner.DEFAULT_RTOL, model.parameters(), settings);
        } catch (ModelEvaluationException e) {
            return new BasinsResult(null, null, Double.NaN, null, null, null, Status.FAILED, "INVALID_INPUT",
                    e.getMessage());
        }
        Axis first = grid.first(), second = grid.second();
        double endTime = grid.endTime();
        EquilibriumResult search = earlier != null ? earlier : EquilibriumSearchRunner.run(model, null, settings,
                budget);
        if (search.status() == Status.FAILED) {
            return new BasinsResult(first, second, endTime, null, null, null, Status.FAILED, search.outcome(),
                    "no equilibria to label the basins by: " + search.message());
        }
        List<Equilibrium> equilibria = search.equilibria();
        double[][] coordinates = equilibria.stream().map(Equilibrium::coordinates).toArray(double[][]::new);
        BasinPoints task = BasinPoints.of(model, first, second, endTime, grid.recipe(), coordinates);
        EnsembleRun<BasinPoint> run;
        try {
            run = settings.ensembles().run(task, model, Ensembles.control(settings, budget, "basins " + first.name()
                    + " x " + second.name()));
        } catch (EnsembleFailure e) {
            return new BasinsResult(first, second, endTime, equilibria, null, null, Status.FAILED,
                    Ensembles.EXECUTOR_FAILED, e.getMessage());
        }
        List<String> endings = new ArrayList<>();
        int[] counts = new int[equilibria.size() + 1]; // the last counts starts that reached none
        for (BasinPoint point : run.rows()) {
            if (point != null) {
                endings.add(point.ending());
                counts[point.label() == BasinPoints.NONE ? equilibria.size() : point.label()]++;
            }
        }
        String ending = Ensembles.ending(endings, task.points(), run.cancelled(), budget);
        StringBuilder message = new StringBuilder(endings.size() + " of " + task.points() + " starts on "
                + run.executor() + ":");
        for (int e = 0; e < equilibria.size(); e++) {
            message.append(' ').append(equilibria.get(e).name()).append(' ').append(counts[e]).append(',');
        }
        message.append(" none ").append(counts[equilibria.size()]).append(Ensembles.endingNote(ending));
        return new BasinsResult(first, second, endTime, equilibria, run.rows(), run.executor(),
                Ensembles.status(ending), ending, message.toString());
    }
}
