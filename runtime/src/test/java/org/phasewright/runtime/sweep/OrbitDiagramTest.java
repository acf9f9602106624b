package org.phasewright.runtime.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.continuation.NormalForms;
import org.phasewright.runtime.continuation.ParameterVector;
import org.phasewright.runtime.integrate.IntegratorSettings;
import org.phasewright.runtime.model.DynamicalModel;

class OrbitDiagramTest {

    @Test
    void maximaOfTheHopfNormalFormCycleAreSqrtMu() {
        // x' = μx − y − x(x²+y²), y' = x + μy − y(x²+y²) from (0.1, 0)
        DynamicalModel started = NormalForms.radial(-1, 0, 0.1);
        CompiledModel cm = ModelCompiler.compile(started);
        SweepOutcome o = OrbitDiagram.run(cm, new ParameterVector(started, cm.parameters(), 0), 0.25, 1, 4, 120,
                IntegratorSettings.DEFAULT.withTolerances(1e-10, 1e-12), () -> false, null);
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
        SweepOutcome o = OrbitDiagram.run(cm, new ParameterVector(m, cm.parameters(), 0), 0.25, 1, 50, 100,
                IntegratorSettings.DEFAULT, () -> true, null);
        assertEquals(SweepOutcome.Ending.CANCELLED, o.ending());
        assertTrue(o.columns().isEmpty()); // no column starts once cancelled (common practice)
    }
}
