package org.phasewright.runtime.equilibria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.VectorField;

class DeflationTest {
    /** f(x) = sin x, roots kπ (closed form), with its derivative. */
    static final VectorField SINE = new VectorField() {
        @Override
        public int dimension() {
            return 1;
        }

        @Override
        public void rates(double t, double[] u, double[] p, double[] d) {
            d[0] = Math.sin(u[0]);
        }

        @Override
        public void jacobian(double t, double[] u, double[] p, double[] j) {
            j[0] = Math.cos(u[0]);
        }
    };

    @Test
    void deflatedRootsRepelNewtonSoEachRunFindsANewOne() {
        // Farrell, Birkisson & Funke (2015): with the roots found so far deflated, Newton from the same start
        // converges to a different root every time. Roots of sin x are the multiples of π (closed form).
        NewtonSolver newton = new NewtonSolver(SINE, new double[0], new double[] {1}, EquilibriumSettings.DEFAULT);
        List<double[]> known = new ArrayList<>();
        newton.deflate(known);
        for (int k = 0; k < 4; k++) {
            assertTrue(newton.solve(new double[] {0.1}, 100), "run " + k);
            double x = newton.x[0];
            double multiple = x / Math.PI;
            assertEquals(Math.rint(multiple), multiple, 1e-9, "a multiple of π: " + x);
            for (double[] r : known) {
                assertTrue(Math.abs(r[0] - x) > 1, "new root " + x + " vs known " + r[0]);
            }
            known.add(newton.x.clone());
        }
        // Without deflation the same start returns to the nearest root, 0.
        newton.deflate(List.of());
        assertTrue(newton.solve(new double[] {0.1}, 100));
        assertEquals(0.0, newton.x[0], 1e-12);
    }
}
