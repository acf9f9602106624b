package org.phasewright.runtime.study;

import org.phasewright.runtime.ensemble.Axis;
import org.phasewright.runtime.ensemble.IntegrationRecipe;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.GridAxis;
import org.phasewright.runtime.symbolic.ModelEvaluationException;

/**
 * The two axes, end time and integration recipe of a two-axis ensemble request (Lyapunov map, basins), evaluated
 * and checked in one place so both runners reject the same inputs with the same messages.
 */
record EnsembleGrid(Axis first, Axis second, double endTime, IntegrationRecipe recipe) {

    /** @throws ModelEvaluationException when an axis, the end time or the tolerance is invalid */
    static EnsembleGrid of(GridAxis first, GridAxis second, Expr endTime, Expr tolerance, double defaultRtol,
            double[] p, RunSettings settings) {
        Axis a = Ensembles.axis(first, p);
        Axis b = Ensembles.axis(second, p);
        Ensembles.checkGrid(a, b);
        double end = Ensembles.positive(endTime, p, "end time");
        double rtol = Ensembles.tolerance(tolerance, p, defaultRtol);
        return new EnsembleGrid(a, b, end, new IntegrationRecipe(rtol, rtol * SimulationRunner.ATOL_PER_RTOL,
                settings.maxSteps(), settings.blowUpBound()));
    }
}
