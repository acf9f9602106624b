package org.phasewright.runtime.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.continuation.NormalForms;
import org.phasewright.runtime.ensemble.Axis;
import org.phasewright.runtime.ensemble.EnsembleControl;
import org.phasewright.runtime.ensemble.EnsembleRun;
import org.phasewright.runtime.ensemble.IntegrationRecipe;
import org.phasewright.runtime.ensemble.LocalEnsembleExecutor;
import org.phasewright.runtime.ensemble.OrbitColumn;
import org.phasewright.runtime.ensemble.OrbitPoints;
import org.phasewright.runtime.integrate.IntegratorSettings;
import org.phasewright.runtime.model.DynamicalModel;

class OrbitDiagramTest {

    /** The orbit diagram as the study runners compute it: the columns on the local ensemble executor. */
    private static SweepOutcome sweep(CompiledModel cm, double from, double to, int steps, double endTime,
            IntegratorSettings s, EnsembleControl control) {
        EnsembleRun<OrbitColumn> run = LocalEnsembleExecutor.DEFAULT.run(OrbitPoints.of(cm, new Axis("mu", 0, from,
                to, steps), endTime, new IntegrationRecipe(s.relativeTolerance(), s.absoluteTolerance(),
                        s.maxSteps(), s.blowUpBound())), cm, control);
        List<SweepColumn> columns = new ArrayList<>();
        boolean failed = false;
        for (OrbitColumn c : run.rows()) {
            if (c != null) {
                columns.add(c.column());
                failed |= !c.ending().equals("COMPLETED");
            }
        }
        SweepOutcome.Ending ending = run.cancelled() ? SweepOutcome.Ending.CANCELLED
                : columns.size() < steps ? SweepOutcome.Ending.TIME_LIMIT
                        : failed ? SweepOutcome.Ending.SOME_FAILED : SweepOutcome.Ending.COMPLETED;
        return new SweepOutcome("mu", from, to, endTime, columns, steps, run.workers(), ending);
    }

    @Test
    void maximaOfTheHopfNormalFormCycleAreSqrtMu() {
        // x' = μx − y − x(x²+y²), y' = x + μy − y(x²+y²) from (0.1, 0)
        DynamicalModel started = NormalForms.radial(-1, 0, 0.1);
        CompiledModel cm = ModelCompiler.compile(started);
        SweepOutcome o = sweep(cm, 0.25, 1, 4, 120, IntegratorSettings.DEFAULT.withTolerances(1e-10, 1e-12),
                EnsembleControl.NONE);
        assertEquals(SweepOutcome.Ending.COMPLETED, o.ending(), o.message());
        assertEquals(4, o.columns().size());
        for (SweepColumn c : o.columns()) {
            double[] maxima = c.maxima(0);
            // θ' = 1: one maximum of x per period 2π over the second half of t in [0, 120] (9 or 10 of them)
            assertTrue(maxima.length >= 9 && maxima.length <= 10, maxima.length + " maxima");
            for (double v : maxima) {
                // Strogatz, Nonlinear Dynamics and Chaos, §8.2: the stable cycle of r' = μr − r³ is r = √μ, so x
                // peaks at √μ once transients have died out (they decay like exp(−2μt), below 1e-6 by t = 60).
                assertEquals(Math.sqrt(c.parameter()), v, 1e-6, "mu = " + c.parameter());
            }
        }
        assertEquals(0.25, o.columns().get(0).parameter(), 0.0);
        assertEquals(1.0, o.columns().get(3).parameter(), 0.0);
    }

    @Test
    void cancellationStopsTheSweep() {
        DynamicalModel m = NormalForms.radial(-1, 0, 0.1);
        CompiledModel cm = ModelCompiler.compile(m);
        SweepOutcome o = sweep(cm, 0.25, 1, 50, 100, IntegratorSettings.DEFAULT,
                new EnsembleControl(Long.MAX_VALUE, () -> true, null));
        assertEquals(SweepOutcome.Ending.CANCELLED, o.ending());
        assertTrue(o.columns().isEmpty()); // no column starts once cancelled (common practice)
    }
}
