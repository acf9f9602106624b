package org.phasewright.runtime.compile;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.management.ManagementFactory;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DerivedQuantity;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Parameter;
import org.phasewright.runtime.model.StateVariable;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;
import org.phasewright.runtime.symbolic.ExprEvaluator;

class IndexedCodeGenerationTest {
    private static final int[] SIZES = {1, 2, 3, 4, 5, 7, 16, 40, 101};

    @Test
    void cyclicRingMatchesTheLorenz1996FormulaForEverySize() {
        for (int n : SIZES) {
            CompiledModel m = compiled(IndexedModels.lorenz96(n, true, 8));
            assertTrue(m.generatedSource().contains("for (int"), "compiled to a loop");
            double[] u = random(n, n);
            double[] rates = rates(m, 0, u);
            for (int k = 0; k < n; k++) {
                // Lorenz 1996, with 0-based wrap-around; for n < 4 several offsets fold onto one element
                double expected = (u[Math.floorMod(k + 1, n)] - u[Math.floorMod(k - 2, n)]) * u[Math.floorMod(k - 1, n)]
                        - u[k] + 8;
                assertEquals(expected, rates[k], 0.0, "n = " + n + ", element " + k);
            }
            assertArrayEquals(expandedRates(m.model(), 0, u), rates, "n = " + n + " against the expanded rates");
        }
    }

    @Test
    void boundedChainReadsZeroBeyondItsEndsForEverySize() {
        for (int n : SIZES) {
            CompiledModel m = compiled(IndexedModels.lorenz96(n, false, 8));
            double[] u = random(n, 100 + n);
            double[] rates = rates(m, 0, u);
            for (int k = 0; k < n; k++) {
                // the same formula with zero padding outside 1..n (common practice for fixed zero ends)
                double expected = (padded(u, k + 1) - padded(u, k - 2)) * padded(u, k - 1) - u[k] + 8;
                assertEquals(expected, rates[k], 0.0, "n = " + n + ", element " + k);
            }
            assertArrayEquals(expandedRates(m.model(), 0, u), rates);
        }
    }

    @Test
    void sumsDerivedFamiliesAndTablesAgreeWithTheExpandedModel() {
        for (boolean cyclic : new boolean[] {true, false}) {
            for (int n : SIZES) {
                DynamicalModel model = IndexedModels.kitchenSink(n, cyclic);
                CompiledModel m = compiled(model);
                InterpretedVectorField interpreter = new InterpretedVectorField(model);
                for (int trial = 0; trial < 5; trial++) {
                    double[] u = random(n + 1, 31 * n + trial);
                    double t = 0.37 * trial;
                    double[] generated = rates(m, t, u);
                    double[] expanded = expandedRates(model, t, u);
                    String what = (cyclic ? "cyclic" : "bounded") + " n = " + n;
                    // sums add left to right in loops, pairwise in the expansion: equal to rounding (closed form
                    // of the same sums; relative 1e-12 is common practice for reordered sums of a few hundred terms)
                    for (int k = 0; k < generated.length; k++) {
                        assertEquals(expanded[k], generated[k], 1e-12 * (1 + Math.abs(expanded[k])), what + " " + k);
                    }
                    // the interpreter walks the family formulas with the same order of operations: bit for bit
                    double[] interpreted = new double[n + 1];
                    interpreter.rates(t, u, m.parameters(), interpreted);
                    assertArrayEquals(generated, interpreted, what);
                    double[] d1 = new double[model.derived().size()], d2 = new double[d1.length];
                    m.derivedValues().derived(t, u, m.parameters(), d1);
                    interpreter.derived(t, u, m.parameters(), d2);
                    assertArrayEquals(d1, d2, what + " derived");
                    double[] d3 = expandedDerived(model, t, u, m.parameters());
                    for (int k = 0; k < d1.length; k++) {
                        assertEquals(d3[k], d1[k], 1e-12 * (1 + Math.abs(d3[k])), what + " derived " + k);
                    }
                }
            }
        }
    }

    @Test
    void parameterTablesAndFormulasResolveElementByElement() {
        CompiledModel m = compiled(IndexedModels.kitchenSink(4, false));
        double[] p = m.parameters();
        // K, then the listed table w = 1 + m/4, then g = 0.5 + 0.1 i (values written in kitchenSink)
        assertArrayEquals(new double[] {0.7, 1.0, 1.25, 1.5, 1.75, 0.5, 0.6, 0.7, 0.8}, p, 1e-15);
    }

    @Test
    void denseJacobianOfIndexedModelsIsBuiltOnFirstUseAndMatchesFiniteDifferences() {
        for (int n : new int[] {6, 60}) {
            DynamicalModel model = IndexedModels.lorenz96(n, true, 8);
            CompiledModel m = compiled(model);
            assertFalse(m.generatedSource().contains("jac["), "no Jacobian compiled up front");
            double[] u = random(n, 3);
            double[] jac = new double[n * n];
            m.field().jacobian(0, u, m.parameters(), jac);
            for (int j = 0; j < n; j++) {
                double h = 1e-6;
                double[] up = u.clone(), um = u.clone();
                up[j] += h;
                um[j] -= h;
                double[] fp = rates(m, 0, up), fm = rates(m, 0, um);
                for (int i = 0; i < n; i++) {
                    // central differences are exact for this quadratic field up to rounding (closed form)
                    assertEquals((fp[i] - fm[i]) / (2 * h), jac[i * n + j], 1e-7);
                }
            }
        }
    }

    @Test
    void thousandsOfScalarStatesCompileInSeveralMethods() {
        // a chain of 3000 scalar states: dx_k/dt = x_{k-1} - 2 x_k + x_{k+1} (discrete Laplacian, closed form)
        int n = 3000;
        List<StateVariable> states = new ArrayList<>();
        List<Expr> rates = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            states.add(new StateVariable("x" + k, new Constant(k), null, null));
        }
        for (int k = 0; k < n; k++) {
            Expr r = new Binary(BinaryOperator.MULTIPLY, new Constant(-2), state(k));
            if (k > 0) {
                r = new Binary(BinaryOperator.ADD, r, state(k - 1));
            }
            if (k < n - 1) {
                r = new Binary(BinaryOperator.ADD, r, state(k + 1));
            }
            rates.add(r);
        }
        DynamicalModel model = new DynamicalModel("chain", null, new TimeAxis("t", null), states,
                List.<Parameter>of(), List.<DerivedQuantity>of(), rates, List.of(), List.of());
        CompiledModel m = ModelCompiler.compile(model);
        assertEquals(CompiledModel.Backend.GENERATED_CODE, m.backend(), String.valueOf(m.note()));
        long methods = m.generatedSource().lines().filter(l -> l.contains("private static void m")).count();
        assertTrue(methods > 10, methods + " methods"); // each well under the JIT's 8000-byte limit
        double[] u = random(n, 9);
        double[] out = rates(m, 0, u);
        for (int k = 0; k < n; k++) {
            double expected = -2 * u[k] + (k > 0 ? u[k - 1] : 0) + (k < n - 1 ? u[k + 1] : 0);
            assertEquals(expected, out[k], 1e-14);
        }
        // above the dense limit the Jacobian is not built: a clear error, not an n^2 array
        assertThrows(UnsupportedOperationException.class, () -> m.field().jacobian(0, u, new double[0],
                new double[1]));
    }

    @Test
    void aHundredThousandCellRingAllocatesNothingPerCall() {
        int n = 100_000;
        assertAllocationFree(compiled(IndexedModels.lorenz96(n, true, 8)), n);
        assertAllocationFree(compiled(IndexedModels.ringWithDerived(n)), n); // derived values in a scratch array
    }

    @Test
    void ringWithDerivedQuantitiesAgreesWithTheExpandedModel() {
        for (int n : SIZES) {
            DynamicalModel model = IndexedModels.ringWithDerived(n);
            CompiledModel m = compiled(model);
            double[] u = random(n, 7 * n);
            double[] generated = rates(m, 0, u), expanded = expandedRates(model, 0, u);
            for (int k = 0; k < n; k++) {
                // the mean is a sum: equal to rounding (left to right against pairwise, common practice)
                assertEquals(expanded[k], generated[k], 1e-12 * (1 + Math.abs(expanded[k])), "n = " + n);
            }
        }
    }

    private static void assertAllocationFree(CompiledModel m, int n) {
        assertTrue(m.generatedSource().length() < 10_000, "a loop, not one line per element");
        VectorField f = m.field();
        double[] u = m.initialState(), p = m.parameters(), dudt = new double[n];
        for (int k = 0; k < 3000; k++) { // warm-up, so the JIT has compiled the loop
            f.rates(0, u, p, dudt);
        }
        com.sun.management.ThreadMXBean threads =
                (com.sun.management.ThreadMXBean) ManagementFactory.getThreadMXBean();
        long thread = Thread.currentThread().threadId();
        long before = threads.getThreadAllocatedBytes(thread);
        for (int k = 0; k < 1000; k++) {
            f.rates(0, u, p, dudt);
        }
        long allocated = threads.getThreadAllocatedBytes(thread) - before;
        // zero per call; a few hundred bytes of noise from the measurement itself (common practice)
        assertTrue(allocated < 1000, allocated + " bytes allocated over 1000 calls");
    }

    @Test
    void derivedScratchIsPerThread() throws Exception {
        DynamicalModel model = IndexedModels.kitchenSink(64, true);
        CompiledModel m = compiled(model);
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<Boolean>> results = new ArrayList<>();
            for (int task = 0; task < 8; task++) {
                double[] u = random(65, 1000 + task);
                double[] expected = rates(m, 0.5, u);
                results.add(pool.submit(() -> {
                    double[] out = new double[65];
                    for (int r = 0; r < 200; r++) {
                        m.field().rates(0.5, u, m.parameters(), out);
                        if (!java.util.Arrays.equals(out, expected)) {
                            return false;
                        }
                    }
                    return true;
                }));
            }
            for (Future<Boolean> f : results) {
                assertTrue(f.get(), "same rates on every thread");
            }
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    void indexedModelWithoutTimeIsAutonomous() {
        assertTrue(compiled(IndexedModels.lorenz96(10, true, 8)).autonomous());
        assertFalse(compiled(IndexedModels.kitchenSink(5, true)).autonomous()); // sin(i + t)
    }

    // ---- helpers

    private static CompiledModel compiled(DynamicalModel model) {
        CompiledModel m = ModelCompiler.compile(model);
        assertEquals(CompiledModel.Backend.GENERATED_CODE, m.backend(), String.valueOf(m.note()));
        return m;
    }

    private static Variable state(int k) {
        return new Variable(VariableKind.STATE, k, "x" + k);
    }

    private static double padded(double[] u, int k) {
        return k < 0 || k >= u.length ? 0.0 : u[k];
    }

    private static double[] rates(CompiledModel m, double t, double[] u) {
        double[] out = new double[m.dimension()];
        java.util.Arrays.fill(out, Double.NaN);
        m.field().rates(t, u, m.parameters(), out);
        return out;
    }

    /** The reference: the model's flat (expanded) rates, evaluated one by one with ExprEvaluator. */
    private static double[] expandedRates(DynamicalModel model, double t, double[] u) {
        double[] p = org.phasewright.runtime.symbolic.ParameterValues.resolve(model);
        double[] d = expandedDerived(model, t, u, p);
        double[] out = new double[model.dimension()];
        for (int k = 0; k < out.length; k++) {
            out[k] = ExprEvaluator.evaluate(model.rates().get(k), t, u, p, d);
        }
        return out;
    }

    private static double[] expandedDerived(DynamicalModel model, double t, double[] u, double[] p) {
        double[] d = new double[model.derived().size()];
        for (int k = 0; k < d.length; k++) {
            d[k] = ExprEvaluator.evaluate(model.derived().get(k).definition(), t, u, p, d);
        }
        return d;
    }

    private static double[] random(int n, long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        double[] u = new double[n];
        for (int k = 0; k < n; k++) {
            u[k] = r.nextDouble(-2, 2);
        }
        return u;
    }
}
