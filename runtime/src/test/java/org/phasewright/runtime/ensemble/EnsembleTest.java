package org.phasewright.runtime.ensemble;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

import org.apache.commons.math3.analysis.solvers.LaguerreSolver;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;
import org.phasewright.runtime.TestModels;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.continuation.NormalForms;
import org.phasewright.runtime.continuation.ParameterVector;
import org.phasewright.runtime.integrate.IntegratorSettings;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.sweep.OrbitDiagram;
import org.phasewright.runtime.sweep.SweepColumn;

class EnsembleTest {
    private static final IntegrationRecipe LYAPUNOV = new IntegrationRecipe(1e-9, 1e-12, 10_000_000L, 1e12);
    private static final IntegrationRecipe BASINS = new IntegrationRecipe(1e-8, 1e-11, 10_000_000L, 1e12);

    @Test
    void orbitPointsGiveTheOrbitDiagramsOwnColumns() {
        DynamicalModel m = NormalForms.radial(-1, 0, 0.1);
        CompiledModel cm = ModelCompiler.compile(m);
        IntegratorSettings s = IntegratorSettings.DEFAULT.withTolerances(1e-10, 1e-12);
        ParameterVector mu = new ParameterVector(m, cm.parameters(), 0);
        EnsembleRun<OrbitColumn> run = new LocalEnsembleExecutor(3).run(OrbitPoints.of(cm, new Axis("mu", 0, 0.25,
                1, 5), 120, new IntegrationRecipe(1e-10, 1e-12, s.maxSteps(), s.blowUpBound())), cm,
                EnsembleControl.NONE);
        assertEquals(5, run.rows().size());
        for (int k = 0; k < 5; k++) {
            OrbitColumn c = run.rows().get(k);
            // bit for bit: the same function on the same inputs (common practice for a refactoring)
            SweepColumn direct = OrbitDiagram.column(cm, mu, 0.25 + (1 - 0.25) * k / (5 - 1), 120, s, () -> false);
            assertEquals(direct.parameter(), c.parameter(), 0.0);
            assertArrayEquals(direct.maxima(0), c.maxima()[0], 0.0);
            // Strogatz, Nonlinear Dynamics and Chaos, §8.2: the stable cycle of r' = μr − r³ has r = √μ
            for (double v : c.maxima()[0]) {
                assertEquals(Math.sqrt(c.parameter()), v, 1e-6);
            }
        }
    }

    @Test
    void lorenzMapIsChaoticAtR28AndDecaysAsTheStableFocusAtR10() {
        CompiledModel cm = ModelCompiler.compile(TestModels.lorenz());
        Axis r = new Axis("r", 1, 10, 28, 2);
        Axis sigma = new Axis("sigma", 0, 10, 10, 1);
        EnsembleRun<LyapunovPoint> run = LocalEnsembleExecutor.DEFAULT.run(LyapunovPoints.of(cm, r, sigma, 1000,
                LYAPUNOV), cm, EnsembleControl.NONE);
        LyapunovPoint stable = run.rows().get(0), chaotic = run.rows().get(1);
        // Sprott, Chaos and Time-Series Analysis (2003): 0.9056 at σ = 10, r = 28, b = 8/3; a finite-time
        // estimate over T = 1000 fluctuates by about 0.02 (common practice)
        assertEquals(0.9056, chaotic.exponent(), 0.03);
        // At r = 10 the orbit settles on C±; the exponents become the real parts of the eigenvalues there, roots of
        // λ³ + (σ + b + 1)λ² + b(σ + r)λ + 2bσ(r − 1) = 0 (Lorenz 1963, closed form); the transient adds O(1/T).
        double b = 8.0 / 3, s = 10, rho = 10;
        Complex[] roots = new LaguerreSolver().solveAllComplex(new double[] {2 * b * s * (rho - 1), b * (s + rho),
            s + b + 1, 1}, 0);
        double largest = Arrays.stream(roots).map(Complex::getReal).max(Comparator.naturalOrder()).orElseThrow();
        assertTrue(largest < 0);
        assertEquals(largest, stable.exponent(), 0.02);
    }

    @Test
    void duffingBasinsLabelEachWellAndRespectTheOddSymmetry() {
        CompiledModel cm = ModelCompiler.compile(EnsembleModels.duffing(0.5));
        // Equilibria of x' = v, v' = x − x³ − δv: (−1, 0), (0, 0), (1, 0) (closed form); two stable wells
        double[][] equilibria = {{-1, 0}, {0, 0}, {1, 0}};
        int n = 9;
        BasinPoints task = BasinPoints.of(cm, new Axis("x", 0, -2, 2, n), new Axis("v", 1, -2, 2, n), 60, BASINS,
                equilibria);
        EnsembleRun<BasinPoint> run = new LocalEnsembleExecutor(2).run(task, cm, EnsembleControl.NONE);
        assertEquals(n * n, run.completed());
        // starts next to a well stay in it: the wells are asymptotically stable (linearisation, closed form)
        assertEquals(2, label(run, n, 7, 4)); // (1.5, 0)
        assertEquals(0, label(run, n, 1, 4)); // (−1.5, 0)
        assertEquals(2, label(run, n, 6, 4)); // (1, 0) itself
        assertEquals(1, label(run, n, 4, 4)); // the saddle (0, 0) is an equilibrium and stays there
        int[] mirror = {2, 1, 0};
        int labelled = 0;
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                int l = label(run, n, i, j);
                labelled += l >= 0 ? 1 : 0;
                // (x, v) ↦ (−x, −v) maps solutions to solutions (the model's odd symmetry), so the basins are
                // mirror images; the grid is symmetric about 0
                int m = label(run, n, n - 1 - i, n - 1 - j);
                assertEquals(l < 0 ? l : mirror[l], m, "start " + i + ", " + j);
            }
        }
        assertEquals(n * n, labelled); // with damping every start settles (LaSalle: energy decreases)
    }

    @Test
    void rowsAreInGridOrderWhateverTheNumberOfThreads() {
        CompiledModel cm = ModelCompiler.compile(EnsembleModels.duffing(0.3));
        BasinPoints task = BasinPoints.of(cm, new Axis("x", 0, -1.7, 1.9, 7), new Axis("v", 1, -1.3, 1.1, 6), 40,
                BASINS, new double[][] {{-1, 0}, {0, 0}, {1, 0}});
        List<BasinPoint> one = new LocalEnsembleExecutor(1).run(task, cm, EnsembleControl.NONE).rows();
        List<BasinPoint> four = new LocalEnsembleExecutor(4).run(task, cm, EnsembleControl.NONE).rows();
        // the same pure function per point, so the order of completion must not matter (common practice)
        assertEquals(one, four);
        assertTrue(one.stream().map(BasinPoint::label).distinct().count() >= 2);
    }

    @Test
    void aCancelledRunStartsNoPoint() {
        CompiledModel cm = ModelCompiler.compile(EnsembleModels.duffing(0.3));
        BasinPoints task = BasinPoints.of(cm, new Axis("x", 0, -1, 1, 5), new Axis("v", 1, -1, 1, 5), 40, BASINS,
                new double[][] {{1, 0}});
        EnsembleRun<BasinPoint> run = new LocalEnsembleExecutor(2).run(task, cm, new EnsembleControl(Long.MAX_VALUE,
                () -> true, null));
        assertTrue(run.cancelled());
        assertEquals(0, run.completed()); // common practice: nothing starts once cancelled
        assertEquals(25, run.rows().size());
        assertNotNull(run.executor());
    }

    private static int label(EnsembleRun<BasinPoint> run, int n, int i, int j) {
        return run.rows().get(i * n + j).label();
    }
}
