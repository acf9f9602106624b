package org.phasewright.runtime.equilibria;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.model;
import static org.phasewright.runtime.TestModels.neg;
import static org.phasewright.runtime.TestModels.pow;
import static org.phasewright.runtime.TestModels.state;
import static org.phasewright.runtime.TestModels.stateVar;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.TestModels;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;

class EquilibriumFinderTest {

    static EquilibriumSearchOutcome search(DynamicalModel model) {
        CompiledModel m = ModelCompiler.compile(model);
        StartPoints starts = StartPoints.build(m.parameters(), m.initialState(), List.of(),
                EquilibriumSettings.DEFAULT);
        return new EquilibriumFinder(m.field(), m.parameters(), EquilibriumSettings.DEFAULT)
                .find(starts, Long.MAX_VALUE, () -> false);
    }

    @Test
    void lorenzHasExactlyThreeEquilibriaOfTheKnownTypes() {
        double sigma = 10, r = 28, b = 8.0 / 3;
        EquilibriumSearchOutcome outcome = search(TestModels.lorenz());
        assertEquals(EquilibriumSearchOutcome.Ending.COMPLETED, outcome.ending());
        List<Equilibrium> eq = outcome.equilibria();
        assertEquals(3, eq.size(), () -> eq.toString());

        // Lorenz (1963): the origin and C± = (±sqrt(b(r-1)), ±sqrt(b(r-1)), r-1).
        double s = Math.sqrt(b * (r - 1));
        assertArrayEquals(new double[] {-s, -s, r - 1}, eq.get(0).coordinates(), 1e-10);
        assertArrayEquals(new double[] {0, 0, 0}, eq.get(1).coordinates(), 1e-12);
        assertArrayEquals(new double[] {s, s, r - 1}, eq.get(2).coordinates(), 1e-10);

        // Origin: the Jacobian is block diagonal, so its eigenvalues are -b and the roots of
        // λ² + (σ+1)λ + σ(1-r) = 0, i.e. (-11 ± sqrt(1201))/2 (closed form of the characteristic polynomial).
        Equilibrium origin = eq.get(1);
        assertArrayEquals(new double[] {(-11 + Math.sqrt(1201)) / 2, -b, (-11 - Math.sqrt(1201)) / 2},
                origin.eigenvaluesReal(), 1e-9);
        assertArrayEquals(new double[3], origin.eigenvaluesImag(), 1e-9);
        assertEquals("saddle with 1 unstable direction", origin.type());
        assertEquals(new Classification("saddle with 1 unstable direction", 2, 1, 0), origin.classification());

        // C±: eigenvalues are the roots of λ³ + (σ+b+1)λ² + b(σ+r)λ + 2σb(r-1) = 0 (Lorenz 1963's characteristic
        // equation of the steady convection states; textbook closed form, e.g. Strogatz, Nonlinear Dynamics and
        // Chaos, Exercise 9.2.1). Checked through that polynomial, not through remembered digits.
        for (Equilibrium c : List.of(eq.get(0), eq.get(2))) {
            double[] re = c.eigenvaluesReal(), im = c.eigenvaluesImag();
            for (int k = 0; k < 3; k++) {
                double[] p = characteristic(re[k], im[k], sigma, r, b);
                double size = Math.pow(Math.hypot(re[k], im[k]), 3) + 2 * sigma * b * (r - 1);
                assertTrue(Math.hypot(p[0], p[1]) < 1e-11 * size, "residual of eigenvalue " + k);
            }
            // Sorted by real part: the complex pair with positive real part first, then the negative real root.
            assertTrue(re[0] > 0 && re[0] == re[1] && im[0] > 0 && im[1] == -im[0]);
            assertTrue(re[2] < 0 && im[2] == 0);
            assertEquals("saddle-focus with 2 unstable directions", c.type());
            assertEquals(1, c.classification().stableDimension());
            assertEquals(2, c.classification().unstableDimension());
        }
    }

    /** p(λ) = λ³ + (σ+b+1)λ² + b(σ+r)λ + 2σb(r-1) for complex λ = x + iy, as {re, im}. */
    private static double[] characteristic(double x, double y, double sigma, double r, double b) {
        double x2 = x * x - y * y, y2 = 2 * x * y;         // λ²
        double x3 = x2 * x - y2 * y, y3 = x2 * y + y2 * x; // λ³
        double a2 = sigma + b + 1, a1 = b * (sigma + r), a0 = 2 * sigma * b * (r - 1);
        return new double[] {x3 + a2 * x2 + a1 * x + a0, y3 + a2 * y2 + a1 * y};
    }

    @Test
    void searchIsDeterministic() {
        List<Equilibrium> first = search(TestModels.lorenz()).equilibria();
        List<Equilibrium> second = search(TestModels.lorenz()).equilibria();
        for (int k = 0; k < first.size(); k++) {
            assertArrayEquals(first.get(k).coordinates(), second.get(k).coordinates(), 0.0);
        }
    }

    @Test
    void cubicHasThreeEquilibria() {
        // x' = x - x³ = x(1 - x)(1 + x): roots -1, 0, 1; f'(x) = 1 - 3x² is -2, 1, -2 (closed form).
        List<Equilibrium> eq = search(TestModels.cubic(0.5)).equilibria();
        assertEquals(3, eq.size(), () -> eq.toString());
        double[] roots = {-1, 0, 1};
        double[] slopes = {-2, 1, -2};
        String[] types = {"stable node", "unstable node", "stable node"};
        for (int k = 0; k < 3; k++) {
            assertEquals(roots[k], eq.get(k).coordinates()[0], 1e-12);
            assertEquals(slopes[k], eq.get(k).eigenvaluesReal()[0], 1e-10);
            assertEquals(types[k], eq.get(k).type());
        }
    }

    @Test
    void dampedOscillatorTypesFollowTheDampingRatio() {
        // x'' + 2ζωx' + ω²x = 0: eigenvalues -ζω ± ω sqrt(ζ² - 1) (closed form). Trace/determinant classification
        // (Strogatz, Nonlinear Dynamics and Chaos, 2nd ed., Sec. 5.2): complex -> focus (spiral), real -> node,
        // purely imaginary -> centre.
        Equilibrium under = single(TestModels.dampedOscillator(0.2, 3));
        assertEquals("stable focus", under.type());
        assertEquals(-0.6, under.eigenvaluesReal()[0], 1e-12);
        assertEquals(3 * Math.sqrt(1 - 0.04), under.eigenvaluesImag()[0], 1e-12);

        Equilibrium over = single(TestModels.dampedOscillator(2, 1));
        assertEquals("stable node", over.type());
        assertArrayEquals(new double[] {-2 + Math.sqrt(3), -2 - Math.sqrt(3)}, over.eigenvaluesReal(), 1e-12);

        Equilibrium undamped = single(TestModels.dampedOscillator(0, 3));
        assertEquals("centre", undamped.type());
        assertEquals(2, undamped.classification().centreDimension());

        assertEquals("unstable focus", single(TestModels.dampedOscillator(-0.2, 3)).type());
        assertEquals("unstable node", single(TestModels.dampedOscillator(-2, 1)).type());
    }

    private static Equilibrium single(DynamicalModel model) {
        List<Equilibrium> eq = search(model).equilibria();
        assertEquals(1, eq.size(), () -> eq.toString());
        assertArrayEquals(new double[] {0, 0}, eq.get(0).coordinates(), 1e-12);
        return eq.get(0);
    }

    @Test
    void classificationInWords() {
        // Definitions as in Kuznetsov, Elements of Applied Bifurcation Theory (3rd ed.), Sec. 2.1: saddle-focus
        // when a complex pair lies on one side of the imaginary axis and a real eigenvalue on the other.
        double tol = 1e-9;
        assertEquals("saddle with 2 unstable directions",
                Classification.of(new double[] {2, 1, -1}, new double[3], tol).type());
        assertEquals("saddle-focus with 1 unstable direction",
                Classification.of(new double[] {1, -1, -1}, new double[] {0, 2, -2}, tol).type());
        assertEquals("non-hyperbolic", Classification.of(new double[] {0, -1}, new double[2], tol).type());
        assertEquals(new Classification("non-hyperbolic", 1, 1, 1),
                Classification.of(new double[] {1, 1e-12, -1}, new double[3], tol));
        // A tiny imaginary part (a computed double root) does not make a node a focus.
        assertEquals("stable node", Classification.of(new double[] {-1, -1}, new double[] {1e-12, -1e-12}, tol)
                .type());
    }

    @Test
    void nonHyperbolicAndSaddleEquilibria() {
        // x' = -x³: the only root is 0 with f'(0) = 0, so the linearisation cannot decide (non-hyperbolic, one
        // centre direction); Newton converges only linearly there (x -> 2x/3), which the iteration cap must allow.
        Expr x = state(0, "x");
        DynamicalModel flat = model("flat", List.of(stateVar("x", 1)), List.of(), List.of(),
                List.of(neg(pow(x, c(3)))));
        List<Equilibrium> eq = search(flat).equilibria();
        assertEquals(1, eq.size(), () -> eq.toString());
        assertEquals(0.0, eq.get(0).coordinates()[0], 1e-8);
        assertEquals(new Classification("non-hyperbolic", 0, 0, 1), eq.get(0).classification());

        // x' = x, y' = -y: determinant < 0, a saddle (Strogatz, Sec. 5.2).
        Expr y = state(1, "y");
        DynamicalModel saddle = model("saddle", List.of(stateVar("x", 1), stateVar("y", 1)), List.of(), List.of(),
                List.of(x, neg(y)));
        assertEquals(new Classification("saddle with 1 unstable direction", 1, 1, 0),
                single(saddle).classification());
    }
}
