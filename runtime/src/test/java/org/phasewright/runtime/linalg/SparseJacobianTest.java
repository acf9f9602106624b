package org.phasewright.runtime.linalg;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.compile.SparseJacobian;
import org.phasewright.runtime.compile.SparseJacobians;
import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.model.DynamicalModel;

class SparseJacobianTest {

    /** Every dense entry appears in the sparse matrix with the same value, and nothing else does. */
    private static void matchesDense(DynamicalModel model, boolean exactValues) {
        matchesDense(model, exactValues, 0.0);
    }

    private static void matchesDense(DynamicalModel model, boolean exactValues, double t) {
        CompiledModel compiled = ModelCompiler.compile(model);
        VectorField field = compiled.field();
        SparseJacobian sparse = SparseJacobians.of(model, field);
        if (exactValues) {
            assertEquals("generated code", sparse.method());
        }
        int n = model.dimension();
        Random random = new Random(n);
        double[] u = compiled.initialState();
        for (int i = 0; i < n; i++) {
            u[i] += 0.3 * random.nextGaussian();
        }
        double[] p = compiled.parameters();
        double[] dense = new double[n * n];
        field.jacobian(t, u, p, dense); // the exact symbolic Jacobian of the compiled model
        SparseMatrix m = sparse.newMatrix();
        sparse.values(t, u, p, m.values());
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                double expected = dense[i * n + j];
                if (expected != 0) {
                    assertTrue(m.pattern().find(i, j) >= 0, "entry (" + i + ", " + j + ") missing from pattern");
                }
                // exact code agrees to rounding; forward differences to about sqrt(eps) (common practice)
                double tolerance = exactValues ? 1e-12 * (1 + Math.abs(expected)) : 1e-6 * (1 + Math.abs(expected));
                assertEquals(expected, m.get(i, j), tolerance, "entry (" + i + ", " + j + ")");
            }
        }
    }

    @Test
    void lorenz96RingMatchesTheDenseJacobian() {
        matchesDense(LatticeModels.lorenz96(12, 8, true), true);
        // 4 neighbours per row: x_{i-2}, x_{i-1}, x_i, x_{i+1} (Lorenz 1996)
        assertEquals(4 * 12, SparseJacobians.pattern(LatticeModels.lorenz96(12, 8, true)).nonZeros());
    }

    @Test
    void boundedRingDropsTheMissingNeighbours() {
        matchesDense(LatticeModels.lorenz96(9, 8, false), true);
        // zero padding: row 1 lacks x_{-1}, x_0; row 2 lacks x_0; row n lacks x_{n+1} (closed form count)
        assertEquals(4 * 9 - 4, SparseJacobians.pattern(LatticeModels.lorenz96(9, 8, false)).nonZeros());
    }

    @Test
    void shortRingWhereNeighboursCoincideAddsTheirDerivatives() {
        // n = 3: x_{i+1} and x_{i-2} are the same element, so its entry is x_{i-1} - x_{i-1} = 0 structurally
        // but both derivative terms must land in one slot (closed form)
        matchesDense(LatticeModels.lorenz96(3, 8, true), true);
    }

    @Test
    void chainWithDerivedFamilyParameterTableAndScalarStateMatches() {
        matchesDense(LatticeModels.reactorChain(15), true);
    }

    @Test
    void timePowersParameterTablesAndAFarCouplingMatch() {
        // x_{2i} on a ring of 12 wraps: rows 7..12 reach back to x_2..x_12 (general index expression)
        matchesDense(LatticeModels.forcedRing(12), true, 0.7);
        // 4 stencil neighbours + x_{2i}, which coincides with x_{i+1}, x_{i-1}, x_i or x_{i-2} in a few rows
        // (2i ≡ i + 1 at i = 1; 2i ≡ i (mod 12) at i = 12; 2i ≡ i - 1 at i = 11; 2i ≡ i - 2 at i = 10)
        assertEquals(5 * 12 - 4, SparseJacobians.pattern(LatticeModels.forcedRing(12)).nonZeros());
    }

    @Test
    void sumsOverAFamilyBecomeLoopsInTheGeneratedCode() {
        DynamicalModel model = LatticeModels.meanField(10);
        matchesDense(model, true);
        assertEquals(100, SparseJacobians.pattern(model).nonZeros()); // all-to-all through the sum (closed form)
    }

    @Test
    void anObserverSumAddsOneDenseRowToTheRing() {
        DynamicalModel model = LatticeModels.ringWithObserver(20);
        matchesDense(model, true);
        // 4 per ring row (Lorenz 1996), and the observer row: all 20 cells and E itself (closed form count)
        assertEquals(4 * 20 + 21, SparseJacobians.pattern(model).nonZeros());
    }

    @Test
    void nestedSumsFallBackToGroupedFiniteDifferences() {
        DynamicalModel model = LatticeModels.doubleSum(8);
        CompiledModel compiled = ModelCompiler.compile(model);
        SparseJacobian sparse = SparseJacobians.of(model, compiled.field());
        assertTrue(sparse.method().startsWith("finite differences"), sparse.method());
        assertEquals(64, sparse.pattern().nonZeros());
        matchesDense(model, false);
    }

    @Test
    void groupedFiniteDifferencesAgreeWithGeneratedCode() {
        DynamicalModel model = LatticeModels.lorenz96(500, 8, true);
        CompiledModel compiled = ModelCompiler.compile(model);
        SparseJacobian exact = compiled.field().sparseJacobian();
        assertEquals("generated code", exact.method());
        SparseJacobian differences = SparseJacobians.finiteDifferences(compiled.field(), exact.pattern());
        // a ring stencil of width 4 needs 4 or 5 colours whatever n (Curtis, Powell & Reid 1974)
        assertTrue(differences.method().matches("finite differences \\([45] column groups\\)"),
                differences.method());
        double[] u = compiled.initialState();
        double[] a = new double[exact.pattern().nonZeros()], b = a.clone();
        exact.values(0, u, compiled.parameters(), a);
        differences.values(0, u, compiled.parameters(), b);
        for (int k = 0; k < a.length; k++) {
            assertEquals(a[k], b[k], 1e-6 * (1 + Math.abs(a[k])));
        }
    }

    @Test
    void interpretedLargeModelsCarryTheSameSparseJacobian() {
        DynamicalModel model = LatticeModels.lorenz96(300, 8, false);
        VectorField interpreted = ModelCompiler.interpret(model).field();
        VectorField compiled = ModelCompiler.compile(model).field();
        assertTrue(interpreted.large() && compiled.large());
        double[] u = ModelCompiler.compile(model).initialState();
        double[] p = {8};
        double[] a = new double[interpreted.sparseJacobian().pattern().nonZeros()], b = a.clone();
        interpreted.sparseJacobian().values(0, u, p, a);
        compiled.sparseJacobian().values(0, u, p, b);
        // one pattern and one set of derivative formulas, whichever backend evaluates the rates (closed form)
        assertEquals(b.length, a.length);
        for (int k = 0; k < a.length; k++) {
            assertEquals(b[k], a[k], 1e-12 * (1 + Math.abs(b[k])));
        }
    }
}
