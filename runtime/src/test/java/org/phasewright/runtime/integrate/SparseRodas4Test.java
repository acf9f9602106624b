package org.phasewright.runtime.integrate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.linalg.Forced;
import org.phasewright.runtime.linalg.LatticeModels;

class SparseRodas4Test {

    @Test
    void stiffPipeOfFourHundredCellsDecaysLikeItsSlowestMode() {
        int n = 400;
        double d = 1000;
        CompiledModel pipe = ModelCompiler.compile(LatticeModels.pipeHeat(n, d));
        assertTrue(pipe.field().large());
        IntegratorSettings s = IntegratorSettings.DEFAULT.withTolerances(1e-8, 1e-10);
        double end = 10;
        IntegrationOutcome sparse = new Rodas4(pipe.field(), pipe.parameters(), true).integrate(0, pipe.initialState(),
                end, s, null);
        assertTrue(sparse.completed());
        // closed form: sin(π i/(n+1)) is an eigenvector of the discrete Laplacian with eigenvalue
        // -4 D sin²(π / (2(n+1))), so it decays as a pure exponential
        double rate = -4 * d * Math.pow(Math.sin(Math.PI / (2 * (n + 1))), 2);
        double[] u = sparse.state();
        for (int i = 1; i <= n; i++) {
            assertEquals(Math.exp(rate * end) * Math.sin(Math.PI * i / (n + 1)), u[i - 1], 1e-6, "cell " + i);
        }
        // the stiff modes (|λ| up to 4D = 4000) do not limit an L-stable method's step (Hairer & Wanner II, IV.7)
        assertTrue(sparse.acceptedSteps() < 200, "steps " + sparse.acceptedSteps());

        IntegrationOutcome dense = new Rodas4(Forced.dense(pipe.field()), pipe.parameters(), true).integrate(0,
                pipe.initialState(), end, s, null);
        // same method, same steps up to rounding in the two LU factorisations (common practice)
        assertEquals(dense.acceptedSteps(), sparse.acceptedSteps());
        for (int i = 0; i < n; i++) {
            assertEquals(dense.state()[i], u[i], 1e-10);
        }
    }
}
