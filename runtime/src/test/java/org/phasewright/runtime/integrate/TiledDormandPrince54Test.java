package org.phasewright.runtime.integrate;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.add;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.call;
import static org.phasewright.runtime.TestModels.mul;
import static org.phasewright.runtime.TestModels.sub;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.assemble.ModelAssembler;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.LatticeRates;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.linalg.LatticeModels;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.MathFunction;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;

/**
 * The tile-by-tile Dormand–Prince 5(4) for lattice models, checked against two kinds of reference:
 * <ul>
 * <li>the whole-state {@link DormandPrince54} on the same compiled model (itself checked against closed forms and
 * DOPRI5 in DormandPrince54Test): step counts, final states, dense output, per-component tolerances, blow-up
 * endings and the stiffness report; with fixed steps the stage values, hence states and dense output, must be equal
 * bit for bit;</li>
 * <li>closed-form solutions of linear lattices: the diffusion ring (eigenvalues of a circulant matrix), a rotating
 * two-component diffusion ring, independently forced cells that read their index value and time (integrating
 * factor), and the blow-up time of x' = x².</li>
 * </ul>
 * It also checks that results are bitwise independent of the number of workers. Small tiles (64 cells, and down to
 * one cell) are used so that rings have many tiles, a partial last tile, and halos that wrap around the ring.
 */
class TiledDormandPrince54Test {
    /** Tile size for the tests: 1000 = 15 * 64 + 40 cells, so the last tile is partial. */
    private static final int TILE = 64;

    // ---------------------------------------------------------------- model building

    private static IndexValue i() {
        return new IndexValue("i");
    }

    /** Element x[i + shift] of a family over the index "i". */
    private static Expr at(Family x, int shift) {
        return ModelAssembler.element(x, shift == 0 ? i() : shift > 0 ? add(i(), c(shift)) : sub(i(), c(-shift)));
    }

    /** x[i-1] - 2 x[i] + x[i+1]. */
    private static Expr secondDifference(Family x) {
        return add(sub(at(x, -1), mul(c(2), at(x, 0))), at(x, 1));
    }

    private static Expr time() {
        return new Variable(VariableKind.TIME, 0, "t");
    }

    /** dx_i/dt = D (x_{i+1} - 2 x_i + x_{i-1}) on the cyclic i = 0..n-1, x_i(0) = cos(2 pi k i / n). */
    private static DynamicalModel diffusionRing(int n, int k, double diffusivity) {
        ModelAssembler a = new ModelAssembler("diffusion", null, new TimeAxis("t", null));
        Variable d = a.parameter("D", c(diffusivity), null, null, null);
        IndexRange range = new IndexRange("i", 0, n - 1, true);
        Family x = a.stateFamily("x", range, call(MathFunction.COS, mul(c(2 * Math.PI * k / n), i())), null, null);
        a.familyRate(x, mul(d, secondDifference(x)));
        return a.build(List.of(), List.of());
    }

    /**
     * Two families on the cyclic i = 0..n-1: u' = w v + D Δu, v' = -w u + D Δv (Δ the second difference), with
     * u_i(0) = cos(θ i), v_i(0) = sin(θ i), θ = 2 pi k / n.
     */
    private static DynamicalModel rotatingDiffusionRing(int n, int k, double diffusivity, double omega) {
        ModelAssembler a = new ModelAssembler("rotating", null, new TimeAxis("t", null));
        Variable d = a.parameter("D", c(diffusivity), null, null, null);
        Variable w = a.parameter("w", c(omega), null, null, null);
        IndexRange range = new IndexRange("i", 0, n - 1, true);
        double theta = 2 * Math.PI * k / n;
        Family u = a.stateFamily("u", range, call(MathFunction.COS, mul(c(theta), i())), null, null);
        Family v = a.stateFamily("v", range, call(MathFunction.SIN, mul(c(theta), i())), null, null);
        a.familyRate(u, add(mul(w, at(v, 0)), mul(d, secondDifference(u))));
        a.familyRate(v, sub(mul(d, secondDifference(v)), mul(w, at(u, 0))));
        return a.build(List.of(), List.of());
    }

    /** dx_i/dt = -x_i + sin(t + i) on the cyclic i = 1..n, x_i(0) = cos(i) / 2: cells read their index and time. */
    private static DynamicalModel forcedCells(int n) {
        ModelAssembler a = new ModelAssembler("forced", null, new TimeAxis("t", null));
        IndexRange range = new IndexRange("i", 1, n, true);
        Family x = a.stateFamily("x", range, mul(c(0.5), call(MathFunction.COS, i())), null, null);
        a.familyRate(x, add(mul(c(-1), at(x, 0)), call(MathFunction.SIN, add(time(), i()))));
        return a.build(List.of(), List.of());
    }

    /** dx_i/dt = x_i^2 + 0.1 (x_{i+1} - x_i) on the cyclic i = 1..n, x_i(0) = 1. */
    private static DynamicalModel blowUpRing(int n) {
        ModelAssembler a = new ModelAssembler("blowup", null, new TimeAxis("t", null));
        IndexRange range = new IndexRange("i", 1, n, true);
        Family x = a.stateFamily("x", range, c(1), null, null);
        a.familyRate(x, add(mul(at(x, 0), at(x, 0)), mul(c(0.1), sub(at(x, 1), at(x, 0)))));
        return a.build(List.of(), List.of());
    }

    /**
     * Robertson's kinetics in every cell of the cyclic i = 1..n, the first species leaking to the next cell:
     * a' = -0.04 a + 1e4 b c + 0.01 (a_{i+1} - a_i), b' = 0.04 a - 1e4 b c - 3e7 b^2, c' = 3e7 b^2, starting
     * from a_i = 1 + sin(i) / 100, b_i = c_i = 0.
     */
    private static DynamicalModel robertsonRing(int n) {
        ModelAssembler a = new ModelAssembler("robertson", null, new TimeAxis("t", null));
        IndexRange range = new IndexRange("i", 1, n, true);
        Family x = a.stateFamily("a", range, add(c(1), mul(c(0.01), call(MathFunction.SIN, i()))), null, null);
        Family y = a.stateFamily("b", range, c(0), null, null);
        Family z = a.stateFamily("c", range, c(0), null, null);
        Expr slow = mul(c(0.04), at(x, 0));
        Expr middle = mul(c(1e4), mul(at(y, 0), at(z, 0)));
        Expr fast = mul(c(3e7), mul(at(y, 0), at(y, 0)));
        a.familyRate(x, add(sub(middle, slow), mul(c(0.01), sub(at(x, 1), at(x, 0)))));
        a.familyRate(y, sub(sub(slow, middle), fast));
        a.familyRate(z, fast);
        return a.build(List.of(), List.of());
    }

    private static CompiledModel compile(DynamicalModel model) {
        CompiledModel m = ModelCompiler.compile(model);
        assertNotNull(m.lattice(), "the test model must compile to a lattice");
        return m;
    }

    private static TiledDormandPrince54 tiled(CompiledModel m, int workers, int tile) {
        return new TiledDormandPrince54(m.field(), m.lattice(), m.parameters(), workers, tile);
    }

    private static DormandPrince54 whole(CompiledModel m) {
        return new DormandPrince54(m.field(), m.parameters());
    }

    private static IntegratorSettings tolerances(double rtol, double atol) {
        return IntegratorSettings.DEFAULT.withTolerances(rtol, atol);
    }

    private static double maxDifference(double[] a, double[] b) {
        assertEquals(a.length, b.length);
        double m = 0;
        for (int k = 0; k < a.length; k++) {
            m = Math.max(m, Math.abs(a[k] - b[k]));
        }
        return m;
    }

    private static void assertSameCounts(IntegrationOutcome expected, IntegrationOutcome actual) {
        assertEquals(expected.ending(), actual.ending(), "ending");
        assertEquals(expected.acceptedSteps(), actual.acceptedSteps(), "accepted steps");
        assertEquals(expected.rejectedSteps(), actual.rejectedSteps(), "rejected steps");
        assertEquals(expected.rhsEvaluations(), actual.rhsEvaluations(), "rate evaluations");
    }

    /** Samples the dense output at the midpoint of every accepted step. */
    private static final class MidpointSampler implements StepObserver {
        final List<double[]> samples = new ArrayList<>();
        final List<Double> times = new ArrayList<>();
        private final int n;

        MidpointSampler(int n) {
            this.n = n;
        }

        @Override
        public void step(DenseStep step) {
            double t = 0.5 * (step.startTime() + step.endTime());
            double[] out = new double[n];
            step.stateAt(t, out);
            samples.add(out);
            times.add(t);
        }
    }

    // ---------------------------------------------------------------- agreement with the whole-state method

    @Test
    void lorenzRingAgreesWithWholeStateMethodWithAPartialLastTile() {
        // Lorenz (1996) ring, N = 1000, F = 8 (E. N. Lorenz, "Predictability: a problem partly solved", ECMWF
        // seminar 1996). Reference: DormandPrince54 on the same compiled model.
        CompiledModel m = compile(LatticeModels.lorenz96(1000, 8, true));
        assertNotEquals(0, 1000 % TILE, "premise: the last tile is partial");
        IntegratorSettings s = tolerances(1e-8, 1e-8);
        IntegrationOutcome ref = whole(m).integrate(0, m.initialState(), 2, s, null);
        IntegrationOutcome out = tiled(m, 1, TILE).integrate(0, m.initialState(), 2, s, null);
        assertEquals(IntegrationOutcome.Ending.COMPLETED, ref.ending());
        assertEquals(2.0, out.time());
        // Same tableau and controller; only the error sum's rounding order differs, so the accept/reject decisions
        // and hence all counts are the same (claim of the class; common practice, no source).
        assertSameCounts(ref, out);
        // States differ only by rounding in the step sizes, amplified by the chaotic flow over t = 2 (leading
        // Lyapunov exponent of order 1 for F = 8, Lorenz 1996; from memory): 1e-9 is far above that.
        assertTrue(maxDifference(ref.state(), out.state()) < 1e-9,
                "max |tiled - whole| = " + maxDifference(ref.state(), out.state()));
        // The solution did move: rules out comparing two unchanged start vectors (common practice, no source).
        assertTrue(maxDifference(m.initialState(), out.state()) > 0.1);
    }

    @Test
    void resultsAreBitwiseIndependentOfTheNumberOfWorkers() {
        // The error sum is formed in tile order whatever the workers (claim of the class), so 1, 2 and 3 workers
        // must give identical bits (common practice for deterministic parallel reductions, no source).
        CompiledModel m = compile(LatticeModels.lorenz96(1000, 8, true));
        IntegratorSettings s = tolerances(1e-8, 1e-8);
        IntegrationOutcome one = tiled(m, 1, TILE).integrate(0, m.initialState(), 2, s, null);
        for (int workers : new int[] {2, 3}) {
            TiledDormandPrince54 integrator = tiled(m, workers, TILE);
            IntegrationOutcome out = integrator.integrate(0, m.initialState(), 2, s, null);
            assertSameCounts(one, out);
            assertTrue(Arrays.equals(one.state(), out.state()), workers + " workers differ from 1");
            assertEquals(one.time(), out.time());
            // the same instance again (threads of the first run are gone, windows are reused): same bits
            IntegrationOutcome again = integrator.integrate(0, m.initialState(), 2, s, null);
            assertTrue(Arrays.equals(one.state(), again.state()), "second run with " + workers + " workers");
        }
        // More workers than tiles: 250 cells make 4 tiles, 6 workers are cut down to 4 (same bits as 1 worker).
        CompiledModel small = compile(LatticeModels.lorenz96(250, 8, true));
        IntegrationOutcome smallOne = tiled(small, 1, TILE).integrate(0, small.initialState(), 1, s, null);
        IntegrationOutcome smallMany = tiled(small, 6, TILE).integrate(0, small.initialState(), 1, s, null);
        assertSameCounts(smallOne, smallMany);
        assertTrue(Arrays.equals(smallOne.state(), smallMany.state()), "6 workers on 4 tiles differ from 1");
    }

    @Test
    void fixedStepsGiveBitwiseTheWholeStateStatesAndDenseOutput() {
        // With every step forced to h = 1/128 (initial = largest step, loose tolerance so nothing is rejected) both
        // methods take the very same steps, so the claimed bit-for-bit equal stage values must give bit-for-bit
        // equal states and continuous extensions (claim of the class; common practice, no source). 1/128 is a
        // power of two, so the step times are exact in both.
        CompiledModel m = compile(LatticeModels.lorenz96(1000, 8, true));
        double h = 1.0 / 128;
        IntegratorSettings s = tolerances(1e-3, 1e-3).withSteps(h, h);
        MidpointSampler refSamples = new MidpointSampler(1000);
        MidpointSampler outSamples = new MidpointSampler(1000);
        IntegrationOutcome ref = whole(m).integrate(0, m.initialState(), 1, s, refSamples);
        IntegrationOutcome out = tiled(m, 2, TILE).integrate(0, m.initialState(), 1, s, outSamples);
        assertEquals(IntegrationOutcome.Ending.COMPLETED, ref.ending());
        assertEquals(0, ref.rejectedSteps(), "premise: no rejected step");
        assertEquals(128, ref.acceptedSteps(), "premise: every step is 1/128");
        assertSameCounts(ref, out);
        assertArrayEquals(ref.state(), out.state(), 0.0);
        assertEquals(refSamples.samples.size(), outSamples.samples.size());
        for (int k = 0; k < refSamples.samples.size(); k++) {
            assertEquals(refSamples.times.get(k), outSamples.times.get(k));
            assertArrayEquals(refSamples.samples.get(k), outSamples.samples.get(k), 0.0, "dense sample " + k);
        }
    }

    @Test
    void tilesFromOneCellToMoreThanTheRingAgreeWithWholeStateMethod() {
        // Lorenz (1996) ring reads 2 cells below and 1 above, so a window holds the tile and 18 halo cells. With 37
        // cells, tiles of 1 and 5 cells (many tiles, partial last one), 37 and 100 (one tile whose window wraps
        // around the ring); with 7 cells the window (7 + 18) wraps around three times. Reference: DormandPrince54.
        IntegratorSettings s = tolerances(1e-9, 1e-9);
        for (int cells : new int[] {37, 7}) {
            CompiledModel m = compile(LatticeModels.lorenz96(cells, 8, true));
            IntegrationOutcome ref = whole(m).integrate(0, m.initialState(), 2, s, null);
            for (int tile : new int[] {1, 5, 37, 100}) {
                for (int workers : new int[] {1, 2}) {
                    IntegrationOutcome out = tiled(m, workers, tile).integrate(0, m.initialState(), 2, s, null);
                    String what = cells + " cells, tiles of " + tile + ", " + workers + " workers";
                    assertSameCounts(ref, out);
                    // rounding only (see the 1000-cell ring); common practice, no source
                    assertTrue(maxDifference(ref.state(), out.state()) < 1e-10, what + ": "
                            + maxDifference(ref.state(), out.state()));
                }
            }
        }
    }

    @Test
    void denseOutputAtStepMidpointsAgreesWithWholeStateMethod() {
        // Shampine's continuous extension of DOPRI5 (HNW I, Sec. II.6) written tile by tile; reference: the
        // whole-state method's dense output at the midpoint of every accepted step, Lorenz (1996) ring with a
        // partial last tile.
        CompiledModel m = compile(LatticeModels.lorenz96(1000, 8, true));
        IntegratorSettings s = tolerances(1e-8, 1e-8);
        MidpointSampler refSamples = new MidpointSampler(1000);
        MidpointSampler outSamples = new MidpointSampler(1000);
        MidpointSampler crewSamples = new MidpointSampler(1000);
        IntegrationOutcome ref = whole(m).integrate(0, m.initialState(), 2, s, refSamples);
        IntegrationOutcome out = tiled(m, 1, TILE).integrate(0, m.initialState(), 2, s, outSamples);
        tiled(m, 3, TILE).integrate(0, m.initialState(), 2, s, crewSamples);
        assertSameCounts(ref, out);
        assertEquals(ref.acceptedSteps(), refSamples.samples.size());
        assertEquals(refSamples.samples.size(), outSamples.samples.size());
        for (int k = 0; k < refSamples.samples.size(); k++) {
            assertEquals(refSamples.times.get(k), outSamples.times.get(k), 1e-12, "sample time " + k);
            // rounding in the step sizes only (common practice, no source)
            double diff = maxDifference(refSamples.samples.get(k), outSamples.samples.get(k));
            assertTrue(diff < 1e-9, "dense sample " + k + " differs by " + diff);
            // and the crew writes the same extension as one worker (claim of the class)
            assertTrue(Arrays.equals(outSamples.samples.get(k), crewSamples.samples.get(k)), "3 workers, sample " + k);
        }
        // The interpolant is not just the end point: the midpoint differs from the step's end state.
        assertTrue(maxDifference(outSamples.samples.get(outSamples.samples.size() - 1), out.state()) > 1e-6);
    }

    @Test
    void perComponentTolerancesGiveTheWholeStateResultBitForBit() {
        // Per-component tolerances go to the whole-state method (claim of the class), so results are identical.
        CompiledModel m = compile(LatticeModels.lorenz96(300, 8, true));
        double[] rtol = new double[300], atol = new double[300];
        for (int k = 0; k < 300; k++) {
            rtol[k] = 1e-8 * (1 + k % 3);
            atol[k] = 1e-9 * (1 + k % 5);
        }
        IntegratorSettings s = IntegratorSettings.DEFAULT.withComponentTolerances(rtol, atol);
        MidpointSampler refSamples = new MidpointSampler(300);
        MidpointSampler outSamples = new MidpointSampler(300);
        IntegrationOutcome ref = whole(m).integrate(0, m.initialState(), 2, s, refSamples);
        IntegrationOutcome out = tiled(m, 2, TILE).integrate(0, m.initialState(), 2, s, outSamples);
        assertEquals(IntegrationOutcome.Ending.COMPLETED, ref.ending());
        assertSameCounts(ref, out);
        assertArrayEquals(ref.state(), out.state(), 0.0);
        assertEquals(refSamples.samples.size(), outSamples.samples.size());
        for (int k = 0; k < refSamples.samples.size(); k++) {
            assertArrayEquals(refSamples.samples.get(k), outSamples.samples.get(k), 0.0, "dense sample " + k);
        }
    }

    // ---------------------------------------------------------------- closed forms

    @Test
    void diffusionRingDecaysAsTheCirculantEigenvalueSays() {
        // The circulant second difference has eigenvectors cos(2 pi k i / N), sin(2 pi k i / N) with eigenvalue
        // -4 sin^2(pi k / N) (R. M. Gray, "Toeplitz and Circulant Matrices: A Review", 2006, Sec. 3.1), so
        // x_i(t) = exp(-4 D sin^2(pi k / N) t) cos(2 pi k i / N) exactly for the semi-discrete system.
        int n = 500, k = 3;
        double d = 500, tEnd = 1;
        CompiledModel m = compile(diffusionRing(n, k, d));
        IntegrationOutcome out = tiled(m, 2, TILE).integrate(0, m.initialState(), tEnd, tolerances(1e-10, 1e-10),
                null);
        assertEquals(IntegrationOutcome.Ending.COMPLETED, out.ending());
        double decay = Math.exp(-4 * d * Math.pow(Math.sin(Math.PI * k / n), 2) * tEnd);
        assertTrue(decay < 0.6 && decay > 0.3, "premise: the decay is visible, factor " + decay);
        double[] exact = new double[n];
        for (int q = 0; q < n; q++) {
            exact[q] = decay * Math.cos(2 * Math.PI * k * q / n);
        }
        // global error a modest multiple of the tolerance (HNW I, Sec. II.4; common practice)
        assertTrue(maxDifference(exact, out.state()) < 1e-7, "max error " + maxDifference(exact, out.state()));
    }

    @Test
    void rotatingTwoComponentRingMatchesTheTravellingDecayingWave() {
        // u' = w v + D Δu, v' = -w u + D Δv: the rotation (acting on the pair) and the circulant Δ (acting on the
        // cells) commute, so the flow is their product (matrix exponential of commuting generators; e.g. Hirsch,
        // Smale & Devaney, "Differential Equations, Dynamical Systems, and an Introduction to Chaos", Ch. 6; from
        // memory). With λ = -4 D sin^2(θ / 2) (Gray 2006, as above):
        // u_i = e^{λt} cos(θ i - w t), v_i = e^{λt} sin(θ i - w t).
        int n = 300, k = 5;
        double d = 20, w = 3, tEnd = 2;
        CompiledModel m = compile(rotatingDiffusionRing(n, k, d, w));
        LatticeRates lattice = m.lattice();
        assertEquals(2, lattice.components(), "premise: two state families");
        IntegrationOutcome out = tiled(m, 2, TILE).integrate(0, m.initialState(), tEnd, tolerances(1e-10, 1e-10),
                null);
        assertEquals(IntegrationOutcome.Ending.COMPLETED, out.ending());
        double theta = 2 * Math.PI * k / n;
        double decay = Math.exp(-4 * d * Math.pow(Math.sin(theta / 2), 2) * tEnd);
        double[] exact = new double[2 * n];
        for (int q = 0; q < n; q++) {
            exact[q] = decay * Math.cos(theta * q - w * tEnd);
            exact[n + q] = decay * Math.sin(theta * q - w * tEnd);
        }
        assertTrue(decay < 0.8, "premise: the decay is visible, factor " + decay);
        // global error a modest multiple of the tolerance (HNW I, Sec. II.4; common practice)
        assertTrue(maxDifference(exact, out.state()) < 1e-7, "max error " + maxDifference(exact, out.state()));
    }

    /** x_i(t) for dx_i/dt = -x_i + sin(t + i) from x_i(t0) = x0 (integrating factor e^t; any ODE textbook). */
    private static double forcedExact(double t, int index, double t0, double x0) {
        double p0 = (Math.sin(t0 + index) - Math.cos(t0 + index)) / 2; // particular solution at t0
        double p = (Math.sin(t + index) - Math.cos(t + index)) / 2;
        return Math.exp(-(t - t0)) * (x0 - p0) + p;
    }

    @Test
    void forcedCellsReadingTheirIndexAndTimeMatchTheClosedForm() {
        // dx_i/dt = -x_i + sin(t + i): linear first-order, solved by the integrating factor e^t:
        // x_i(t) = e^{-t} x_i(0) + [sin(t+i) - cos(t+i) - e^{-t} (sin i - cos i)] / 2 (textbook). The index runs
        // 1..300 (not from 0), so a wrong cell numbering inside tiles would show.
        int n = 300;
        CompiledModel m = compile(forcedCells(n));
        double[] start = m.initialState();
        IntegratorSettings s = tolerances(1e-10, 1e-10);
        IntegrationOutcome out = tiled(m, 2, TILE).integrate(0, start, 3, s, null);
        assertEquals(IntegrationOutcome.Ending.COMPLETED, out.ending());
        double[] exact = new double[n];
        for (int q = 0; q < n; q++) {
            assertEquals(0.5 * Math.cos(q + 1), start[q], 1e-15, "premise: initial state of cell " + (q + 1));
            exact[q] = forcedExact(3, q + 1, 0, start[q]);
        }
        assertTrue(maxDifference(exact, out.state()) < 1e-7, "max error " + maxDifference(exact, out.state()));

        // Backwards from t = 3 to t = 0.5, starting on the exact solution: the stage times t + c h with h < 0 and a
        // start time other than 0 (same closed form).
        double[] at3 = exact.clone();
        IntegrationOutcome back = tiled(m, 1, TILE).integrate(3, at3, 0.5, s, null);
        assertEquals(IntegrationOutcome.Ending.COMPLETED, back.ending());
        assertEquals(0.5, back.time());
        double[] exactBack = new double[n];
        for (int q = 0; q < n; q++) {
            exactBack[q] = forcedExact(0.5, q + 1, 3, at3[q]);
        }
        // errors grow like e^{2.5} backwards; still far below 1e-7 at tolerance 1e-10 (common practice, no source)
        assertTrue(maxDifference(exactBack, back.state()) < 1e-7,
                "max error backwards " + maxDifference(exactBack, back.state()));
    }

    // ---------------------------------------------------------------- endings and the stiffness report

    @Test
    void blowUpEndsAsTheWholeStateMethodNearTheClosedFormTime() {
        // From x_i(0) = 1 all cells stay equal, the coupling is exactly 0, and x' = x^2 gives x = 1 / (1 - t), which
        // blows up at t = 1 (separation of variables; textbook). Reference for the ending: DormandPrince54.
        CompiledModel m = compile(blowUpRing(200));
        IntegratorSettings s = tolerances(1e-8, 1e-8);
        IntegrationOutcome ref = whole(m).integrate(0, m.initialState(), 2, s, null);
        IntegrationOutcome out = tiled(m, 2, TILE).integrate(0, m.initialState(), 2, s, null);
        assertEquals(IntegrationOutcome.Ending.BLEW_UP, ref.ending(), "premise: |x| passes the default 1e12");
        assertEquals(ref.ending(), out.ending());
        assertEquals(ref.time(), out.time(), 1e-6);
        // the exact solution passes 1e12 at t = 1 - 1e-12 (closed form above); the computed one lands within its
        // global error of that, far below 1e-6 at tolerance 1e-8 (common practice, no source)
        assertEquals(1.0, out.time(), 1e-6);

        // With the bound out of reach the steps shrink towards the singularity until the rates overflow or the
        // step size underflows: whatever the whole-state method reports, the tiled one reports too.
        IntegratorSettings far = s.withBlowUpBound(1e300);
        IntegrationOutcome refFar = whole(m).integrate(0, m.initialState(), 2, far, null);
        IntegrationOutcome outFar = tiled(m, 2, TILE).integrate(0, m.initialState(), 2, far, null);
        assertFalse(refFar.completed(), "premise: the singularity stops the whole-state method");
        assertEquals(refFar.ending(), outFar.ending());
        assertEquals(refFar.time(), outFar.time(), 1e-6);
        assertEquals(1.0, outFar.time(), 1e-6);
    }

    @Test
    void stiffLatticeIsReportedStiffWhereTheWholeStateMethodReportsIt() {
        // Robertson's kinetics (Robertson 1966; HNW II, Sec. IV.1, eq. (1.4)) turns stiff after its initial
        // transient, and DOPRI5's stiffness test (HNW II, Sec. IV.2, from memory: tested every 1000 accepted steps, 15
        // confirmations; from memory) flags it (as DormandPrince853Test checks for one cell). Reference: the
        // whole-state method's report on the same three-family ring.
        CompiledModel m = compile(robertsonRing(100));
        IntegratorSettings s = tolerances(1e-6, 1e-10);
        IntegrationOutcome ref = whole(m).integrate(0, m.initialState(), 3, s, null);
        IntegrationOutcome out = tiled(m, 1, TILE).integrate(0, m.initialState(), 3, s, null);
        assertTrue(ref.stiffnessDetected(), "premise: the whole-state method finds the ring stiff");
        assertSameCounts(ref, out);
        assertTrue(out.stiffnessDetected(), "the tiled method finds the ring stiff too");
        assertEquals(ref.stiffnessDetectedAt(), out.stiffnessDetectedAt(), 1e-9);
        IntegrationOutcome crew = tiled(m, 2, TILE).integrate(0, m.initialState(), 3, s, null);
        assertEquals(out.stiffnessDetectedAt(), crew.stiffnessDetectedAt());
        // a + b + c is conserved by the kinetics (HNW II, Sec. IV.1) and the leak only moves a around the ring; every
        // Runge-Kutta method keeps linear invariants up to rounding (Hairer, Lubich & Wanner, Geometric Numerical
        // Integration, Sec. IV.1; from memory)
        double[] y = out.state();
        double total = 0, start = 0;
        double[] y0 = m.initialState();
        for (int k = 0; k < y.length; k++) {
            total += y[k];
            start += y0[k];
        }
        assertEquals(start, total, 1e-8);
    }

    // ---------------------------------------------------------------- one-sided stencils, tables, threads, failures

    /**
     * Upwind advection dx_i/dt = -v (x_i - x_{i-1}) (reads only below: reach above 0) and its mirror (reads only
     * above: reach below 0), with a table of cell speeds v[i+1] read one cell up. Reference: DormandPrince54.
     */
    @Test
    void oneSidedStencilsAndParameterTablesAgreeWithWholeStateMethod() {
        for (int direction : new int[] {-1, 1}) {
            ModelAssembler a = new ModelAssembler("advection", null, new TimeAxis("t", null));
            IndexRange range = new IndexRange("i", 1, 300, true);
            Family v = a.parameterFamily("v", range, add(c(1), mul(c(0.5), call(MathFunction.SIN, i()))), null,
                    null);
            Family x = a.stateFamily("x", range, call(MathFunction.COS, mul(c(2 * Math.PI * 3 / 300), i())), null,
                    null);
            a.familyRate(x, mul(mul(c(-1), at(v, 1)), direction < 0 ? sub(at(x, 0), at(x, -1))
                    : sub(at(x, 1), at(x, 0))));
            CompiledModel m = compile(a.build(List.of(), List.of()));
            assertEquals(direction < 0 ? 1 : 0, m.lattice().reachBelow());
            assertEquals(direction < 0 ? 0 : 1, m.lattice().reachAbove());
            IntegratorSettings s = tolerances(1e-9, 1e-9);
            IntegrationOutcome reference = whole(m).integrate(0, m.initialState(), 3, s, null);
            IntegrationOutcome outcome = tiled(m, 2, 37).integrate(0, m.initialState(), 3, s, null);
            assertSameCounts(reference, outcome);
            assertTrue(maxDifference(reference.state(), outcome.state()) < 1e-10);
        }
    }

    /** Helper threads live for one integration only (common practice for per-call worker threads, no source). */
    @Test
    void noTileThreadOutlivesItsIntegration() {
        CompiledModel m = compile(diffusionRing(500, 3, 50));
        tiled(m, 3, TILE).integrate(0, m.initialState(), 0.5, tolerances(1e-8, 1e-8), null);
        assertEquals(0, tileThreads());
    }

    /**
     * A failure in any worker's share reaches the caller as the same exception whatever the number of workers, no
     * helper keeps running, and the instance integrates correctly afterwards (common practice, no source).
     */
    @Test
    void aFailingShareFailsTheIntegrationAndLeavesNothingBehind() {
        CompiledModel m = compile(diffusionRing(500, 3, 50));
        LatticeRates real = m.lattice();
        boolean[] armed = {true};
        boolean[] upper = {true}; // fail in a tile of the upper half (a helper's share) or the lower (the caller's)
        LatticeRates failing = new LatticeRates() {
            @Override
            public int cells() {
                return real.cells();
            }

            @Override
            public int components() {
                return real.components();
            }

            @Override
            public int reachBelow() {
                return real.reachBelow();
            }

            @Override
            public int reachAbove() {
                return real.reachAbove();
            }

            @Override
            public void rates(double t, double[][] in, double[] p, double[][] out, long first, int from, int to) {
                if (armed[0] && t > 0.1 && (upper[0] ? first > 300 : first < 100)) {
                    throw new ArithmeticException("cell " + first);
                }
                real.rates(t, in, p, out, first, from, to);
            }
        };
        IntegratorSettings s = tolerances(1e-8, 1e-8);
        double[] expected = whole(m).integrate(0, m.initialState(), 0.5, s, null).state();
        for (int run = 0; run < 4; run++) {
            int workers = run % 2 == 0 ? 1 : 3;
            upper[0] = run < 2;
            armed[0] = true;
            TiledDormandPrince54 integrator = new TiledDormandPrince54(m.field(), failing, m.parameters(), workers,
                    TILE);
            ArithmeticException e = org.junit.jupiter.api.Assertions.assertThrows(ArithmeticException.class,
                    () -> integrator.integrate(0, m.initialState(), 0.5, s, null));
            assertTrue(e.getMessage().startsWith("cell "));
            assertEquals(0, tileThreads(), "helpers stopped after the failure");
            armed[0] = false;
            double[] after = integrator.integrate(0, m.initialState(), 0.5, s, null).state();
            assertTrue(maxDifference(expected, after) < 1e-12, "the same instance works afterwards");
        }
    }

    private static long tileThreads() {
        return Thread.getAllStackTraces().keySet().stream()
                .filter(t -> t.getName().startsWith("phasewright-tiles-") && t.isAlive()).count();
    }
}
