package org.phasewright.runtime.equilibria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.linalg.Forced;
import org.phasewright.runtime.linalg.LatticeModels;

class SparseNewtonTest {
    private static final EquilibriumSettings FEW_STARTS = new EquilibriumSettings(0, 0, 100, 2000, 1e-10, 1e-9,
            1e-6, 1e-7);


    /** Bratu's problem u'' + λ e^u = 0 on (0, 1), u(0) = u(1) = 0, by central differences on n interior points. */
    private static EquilibriumSearchOutcome search(VectorField field, CompiledModel m) {
        StartPoints starts = StartPoints.build(m.parameters(), m.initialState(), List.of(), FEW_STARTS);
        return new EquilibriumFinder(field, m.parameters(), FEW_STARTS).find(starts, Long.MAX_VALUE, () -> false);
    }

    @Test
    void bratuLowerSolutionMatchesTheClosedForm() {
        int n = 250;
        CompiledModel m = ModelCompiler.compile(LatticeModels.bratu(n, 1));
        assertTrue(m.field().large());
        EquilibriumSearchOutcome sparse = search(m.field(), m);
        // closed form (Bratu 1914; e.g. Ascher, Mattheij & Russell 1995): u(x) = -2 ln(cosh((x - 1/2) θ/2) /
        // cosh(θ/4)) with θ = sqrt(2λ) cosh(θ/4); for λ = 1 the lower root θ = 1.517164... gives u(1/2) = 0.14050...
        double theta = 1.5;
        for (int k = 0; k < 100; k++) {
            theta = Math.sqrt(2) * Math.cosh(theta / 4);
        }
        Equilibrium lower = sparse.equilibria().stream()
                .filter(e -> java.util.Arrays.stream(e.coordinates()).max().orElseThrow() < 1).findFirst()
                .orElseThrow();
        double[] u = lower.coordinates();
        for (int i = 1; i <= n; i++) {
            double x = i / (n + 1.0);
            double exact = -2 * Math.log(Math.cosh((x - 0.5) * theta / 2) / Math.cosh(theta / 4));
            assertEquals(exact, u[i - 1], 1e-5, "point " + i); // O(h²) discretisation error, h = 1/251
        }
        // the lower (minimal) solution of u_t = u'' + λ e^u is stable (from memory: Bebernes & Eberly, Mathematical
        // Problems from Combustion Theory, 1989, Ch. 2); classified from the sparse Jacobian's rightmost eigenvalues
        assertEquals("stable", lower.type());
        assertEquals(n, lower.classification().stableDimension());

        // The dense path on the same problem finds the same roots (Newton is the same up to LU rounding).
        EquilibriumSearchOutcome dense = search(Forced.dense(m.field()), m);
        assertEquals(dense.equilibria().size(), sparse.equilibria().size());
        for (int k = 0; k < dense.equilibria().size(); k++) {
            double[] a = dense.equilibria().get(k).coordinates(), b = sparse.equilibria().get(k).coordinates();
            for (int i = 0; i < n; i++) {
                assertEquals(a[i], b[i], 1e-9 * (1 + Math.abs(a[i])));
            }
        }
    }

    @Test
    void sparseFieldsWithinTheDenseLimitAreClassifiedFromTheSparseJacobian() {
        // 150 states, worked sparse (as indexed models without a dense Jacobian are): the eigenvalues come from
        // the dense matrix assembled from the sparse one
        CompiledModel m = ModelCompiler.compile(LatticeModels.bratu(150, 1));
        EquilibriumSearchOutcome sparse = search(Forced.sparse(m.model(), m.field()), m);
        Equilibrium lower = sparse.equilibria().get(0);
        // the lower Bratu solution is linearly stable: J = D² + λ diag(e^u) is negative definite there (closed
        // form: its largest eigenvalue is near -π² + λ e^{u} < 0, Bratu 1914)
        assertEquals("stable node", lower.type());
        assertEquals(150, lower.eigenvaluesReal().length);
        assertTrue(lower.eigenvaluesReal()[0] < -5, "largest " + lower.eigenvaluesReal()[0]);
        // the same eigenvalues as from the compiled dense Jacobian (same matrix, common practice)
        Equilibrium dense = search(Forced.dense(m.field()), m).equilibria().get(0);
        assertEquals(dense.eigenvaluesReal()[0], lower.eigenvaluesReal()[0], 1e-8);
    }

    @Test
    void uniformStateOfTheLorenz96RingIsFoundWithoutDenseMatrices() {
        // x_i = F is an equilibrium of Lorenz-96 for every N (closed form: x_{i+1} - x_{i-2} = 0, -F + F = 0)
        CompiledModel m = ModelCompiler.compile(LatticeModels.lorenz96(5000, 8, true));
        EquilibriumSearchOutcome o = search(m.field(), m);
        assertTrue(o.equilibria().stream().anyMatch(e -> java.util.Arrays.stream(e.coordinates())
                .allMatch(x -> Math.abs(x - 8) < 1e-10)), o.message());
    }
}
