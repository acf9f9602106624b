package org.phasewright.runtime.equilibria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.compile.SparseJacobian;
import org.phasewright.runtime.linalg.LatticeModels;
import org.phasewright.runtime.linalg.SparseMatrix;
import org.phasewright.runtime.model.EquilibriumSearch;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.study.EquilibriumResult;
import org.phasewright.runtime.study.RunSettings;
import org.phasewright.runtime.study.StudyRunner;

/** Stability of equilibria of models above the dense limit, from their sparse Jacobians. */
class LargeEquilibriumStabilityTest {

    @Test
    void pipeAtRestIsStableWithTheSlowestHeatModeRightmost() {
        // du_i/dt = D (u_{i-1} - 2u_i + u_{i+1}), zero beyond both ends: rest u = 0 with eigenvalues
        // -4D sin²(kπ / (2(n+1))), k = 1..n (the Dirichlet second difference, e.g. LeVeque, Finite Difference
        // Methods for ODEs and PDEs, 2007, Section 2.10). Not circulant, so Arnoldi decides.
        int n = 400;
        double d = 0.5;
        CompiledModel pipe = ModelCompiler.compile(LatticeModels.pipeHeat(n, d));
        EquilibriumResult search = StudyRunner.run(pipe, new Study("rest", List.of(new EquilibriumSearch())),
                RunSettings.DEFAULT).equilibriumSearches().get(0);
        Equilibrium rest = search.equilibria().get(0);
        assertEquals(0.0, java.util.Arrays.stream(rest.coordinates()).map(Math::abs).max().orElseThrow(), 1e-12);
        assertEquals("stable", rest.type(), search.message());
        assertEquals(n, rest.classification().stableDimension());
        double[] re = rest.eigenvaluesReal();
        for (int k = 1; k <= re.length; k++) {
            double s = Math.sin(k * Math.PI / (2 * (n + 1)));
            assertEquals(-4 * d * s * s, re[k - 1], 1e-9, "eigenvalue " + k);
        }
    }

    @Test
    void reactorChainAgreesWithTheDenseEigenSolver() {
        // A bounded, non-uniform, non-normal case: the bioreactor chain's equilibria classified from the sparse
        // Jacobian against commons-math's dense EigenDecomposition of the same matrix (LinearStability.of).
        CompiledModel chain = ModelCompiler.compile(LatticeModels.reactorChain(300));
        EquilibriumResult search = StudyRunner.run(chain, new Study("tanks", List.of(new EquilibriumSearch())),
                RunSettings.DEFAULT).equilibriumSearches().get(0);
        assertTrue(!search.equilibria().isEmpty(), search.message());
        SparseJacobian sparse = chain.field().sparseJacobian();
        int n = chain.dimension();
        for (Equilibrium e : search.equilibria()) {
            SparseMatrix j = sparse.newMatrix();
            sparse.values(0.0, e.coordinates(), chain.parameters(), j.values());
            double[] dense = new double[n * n];
            for (int i = 0; i < n; i++) {
                for (int k = j.pattern().rowStart(i); k < j.pattern().rowEnd(i); k++) {
                    dense[i * n + j.pattern().column(k)] = j.values()[k];
                }
            }
            LinearStability reference = LinearStability.of(dense, n, 1e-7);
            Classification c = e.classification();
            if (c.type().startsWith("unstable, at least")) {
                assertTrue(reference.classification().unstableDimension() >= c.unstableDimension(), c.type());
            } else {
                assertEquals(reference.classification().unstableDimension(), c.unstableDimension(), c.type());
                assertEquals(reference.classification().centreDimension(), c.centreDimension(), c.type());
            }
            double[] re = e.eigenvaluesReal();
            for (int k = 0; k < re.length; k++) {
                assertEquals(reference.real()[k], re[k], 1e-7 * (1 + Math.abs(re[k])), e.name() + " eigenvalue " + k);
            }
        }
    }
}
