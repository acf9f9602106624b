package org.phasewright.runtime.lyapunov;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.TestModels;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ForwardingVectorField;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.compile.SparseJacobian;
import org.phasewright.runtime.compile.SparseJacobians;
import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.integrate.IntegratorSettings;
import org.phasewright.runtime.linalg.LatticeModels;
import org.phasewright.runtime.model.DynamicalModel;

class LeadingLyapunovTest {
    private static final IntegratorSettings TIGHT = IntegratorSettings.DEFAULT.withTolerances(1e-9, 1e-11);

    /** A small model's field that also offers its sparse Jacobian, so both tangent paths can be compared. */
    static final class WithSparse extends ForwardingVectorField {
        private final SparseJacobian sparse;

        private WithSparse(VectorField field, SparseJacobian sparse) {
            super(field);
            this.sparse = sparse;
        }

        static WithSparse of(DynamicalModel model) {
            VectorField field = ModelCompiler.compile(model).field();
            return new WithSparse(field, SparseJacobians.of(model, field));
        }

        @Override
        public SparseJacobian sparseJacobian() {
            return sparse;
        }
    }

    private static LyapunovOutcome run(DynamicalModel model, int leading, boolean sparse, double endTime) {
        CompiledModel compiled = ModelCompiler.compile(model);
        VectorField field = sparse ? WithSparse.of(model) : compiled.field();
        return new LyapunovSpectrum(field, compiled.parameters(), leading, sparse).compute(compiled.initialState(),
                endTime, TIGHT);
    }

    @Test
    void lorenzLeadingExponentAloneMatchesSprott() {
        LyapunovOutcome o = run(TestModels.lorenz(), 1, false, 5000);
        assertEquals(1, o.exponents().length);
        // Sprott, Chaos and Time-Series Analysis (Oxford 2003): 0.9056 for σ = 10, r = 28, b = 8/3; a finite-time
        // estimate over T = 5000 fluctuates by about 0.005 (common practice)
        assertEquals(0.9056, o.exponents()[0], 0.015);
        assertTrue(o.converged(), "largest change " + o.largestChange());
    }

    @Test
    void leadingTwoOfLorenzAreTheChaoticAndTheFlowExponent() {
        LyapunovOutcome o = run(TestModels.lorenz(), 2, true, 1000);
        // Sprott 2003: 0.9056 and 0 (the flow direction of an autonomous system, closed form)
        assertEquals(0.9056, o.exponents()[0], 0.02);
        assertEquals(0.0, o.exponents()[1], 0.01);
    }

    @Test
    void sparseTangentsGiveTheDenseSpectrumOnLorenzAndRossler() {
        // Same method, J·V from the sparse matrix instead of the dense one: over a horizon short enough that
        // rounding differences stay small (e^{0.9·20} · 1e-16 ≈ 1e-8), the spectra agree (closed form argument).
        for (DynamicalModel model : new DynamicalModel[] {TestModels.lorenz(),
                LyapunovSpectrumTest.rossler(0.2, 0.2, 5.7)}) {
            double[] dense = run(model, 0, false, 20).exponents();
            double[] sparse = run(model, 3, true, 20).exponents();
            assertEquals(3, sparse.length);
            for (int i = 0; i < 3; i++) {
                assertEquals(dense[i], sparse[i], 1e-6, model.name() + " exponent " + i);
            }
        }
    }

    @Test
    void fullSparseSpectrumSumsToTheDivergence() {
        LyapunovOutcome o = run(TestModels.lorenz(), 3, true, 200);
        // Lorenz 1963: tr J = -(σ + 1 + b) = -41/3 everywhere; Liouville's formula makes the sum equal it up to
        // integration error (closed form)
        assertEquals(-41.0 / 3, o.meanDivergence(), 1e-9);
        assertEquals(-41.0 / 3, o.sum(), 1e-6);
    }

    @Test
    void lorenz96RingOfFortyHasLeadingExponentNearOnePointSeven() {
        DynamicalModel ring = LatticeModels.lorenz96(40, 8, true);
        LyapunovOutcome o = run(ring, 3, true, 1000);
        // Karimi & Paul 2010, Chaos 20, 043105 (from memory): λ1 ≈ 1.7 for N = 40, F = 8; Lorenz & Emanuel 1998
        // report an error-doubling time near 0.4 (ln 2 / 0.4 ≈ 1.7). Loose band for a finite-time estimate.
        assertEquals(1.7, o.exponents()[0], 0.15);
        assertTrue(o.exponents()[0] >= o.exponents()[1] && o.exponents()[1] >= o.exponents()[2]);
        // the sum of only three exponents is not the divergence; the divergence of Lorenz-96 is -N (closed form)
        assertEquals(-40.0, o.meanDivergence(), 1e-9);
    }

    @Test
    void negativeLeadingIsRejected() {
        CompiledModel compiled = ModelCompiler.compile(TestModels.lorenz());
        assertThrows(IllegalArgumentException.class,
                () -> new LyapunovSpectrum(compiled.field(), compiled.parameters(), -1));
    }
}
