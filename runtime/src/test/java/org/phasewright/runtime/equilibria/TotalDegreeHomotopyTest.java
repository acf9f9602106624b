package org.phasewright.runtime.equilibria;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.add;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.call;
import static org.phasewright.runtime.TestModels.mul;
import static org.phasewright.runtime.TestModels.pow;
import static org.phasewright.runtime.TestModels.state;
import static org.phasewright.runtime.TestModels.stateVar;
import static org.phasewright.runtime.TestModels.sub;

import java.util.Comparator;
import java.util.List;
import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.TestModels;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.MathFunction;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.symbolic.ParameterValues;

class TotalDegreeHomotopyTest {

    static TotalDegreeHomotopy.Result solve(DynamicalModel model) {
        Polynomial[] system = Polynomial.of(model, ParameterValues.resolve(model)).orElseThrow();
        return new TotalDegreeHomotopy(system).solve(Long.MAX_VALUE, () -> false);
    }

    @Test
    void lorenzHasFourPathsThreeFiniteAndThreeRealRoots() {
        // Rates of degrees 1, 2, 2: Bézout number 4. Lorenz (1963), Sec. 5: exactly three equilibria, the origin
        // and C± = (±√(b(r−1)), ±√(b(r−1)), r−1); the fourth path goes to infinity.
        TotalDegreeHomotopy.Result r = solve(TestModels.lorenz());
        assertEquals(4, r.paths());
        assertEquals(3, r.finite());
        assertEquals(3, r.real());
        double c = Math.sqrt(8.0 / 3 * 27);
        List<double[]> roots = r.realRoots().stream().sorted(Comparator.comparingDouble(x -> x[0])).toList();
        assertEquals(-c, roots.get(0)[0], 1e-8);
        assertEquals(0, roots.get(1)[0], 1e-8);
        assertEquals(c, roots.get(2)[1], 1e-8);
        assertEquals(27, roots.get(2)[2], 1e-8);
    }

    @Test
    void competitionModelReachesItsBezoutNumberWithRealRoots() {
        // Lotka–Volterra competition, Strogatz, Nonlinear Dynamics and Chaos (1994), Sec. 6.4:
        // x' = x(3 − x − 2y), y' = y(2 − x − y) has the four equilibria (0,0), (0,2), (3,0), (1,1) —
        // the Bézout number 2·2 = 4 is reached with real roots only.
        Variable x = state(0, "x"), y = state(1, "y");
        DynamicalModel m = TestModels.model("competition", List.of(stateVar("x", 1), stateVar("y", 1)), List.of(),
                List.of(), List.of(mul(x, sub(sub(c(3), x), mul(c(2), y))), mul(y, sub(sub(c(2), x), y))));
        TotalDegreeHomotopy.Result r = solve(m);
        assertEquals(4, r.paths());
        assertEquals(4, r.finite());
        assertEquals(4, r.real());
        double[][] expected = {{0, 0}, {0, 2}, {1, 1}, {3, 0}};
        List<double[]> roots = r.realRoots().stream()
                .sorted(Comparator.<double[]>comparingDouble(v -> Math.round(v[0] * 1e6))
                        .thenComparingDouble(v -> v[1]))
                .toList();
        for (int k = 0; k < 4; k++) {
            assertEquals(expected[k][0], roots.get(k)[0], 1e-9);
            assertEquals(expected[k][1], roots.get(k)[1], 1e-9);
        }
    }

    @Test
    void complexRootsAreCountedButNotReal() {
        // x' = x² + 1, y' = y − x: roots x = ±i (closed form), so 2 paths, 2 finite, 0 real.
        Variable x = state(0, "x"), y = state(1, "y");
        DynamicalModel m = TestModels.model("complex", List.of(stateVar("x", 1), stateVar("y", 1)), List.of(),
                List.of(), List.of(add(pow(x, c(2)), c(1)), sub(y, x)));
        TotalDegreeHomotopy.Result r = solve(m);
        assertEquals(2, r.paths());
        assertEquals(2, r.finite());
        assertEquals(0, r.real());
    }

    @Test
    void nonPolynomialRatesAreRecognised() {
        Variable x = state(0, "x");
        DynamicalModel m = TestModels.model("sine", List.of(stateVar("x", 1)), List.of(), List.of(),
                List.of(call(MathFunction.SIN, x)));
        Optional<Polynomial[]> p = Polynomial.of(m, new double[0]);
        assertTrue(p.isEmpty());
        // Functions of constants and division by constants keep a rate polynomial: sqrt(4)·x/2 = x.
        DynamicalModel poly = TestModels.model("scaled", List.of(stateVar("x", 1)), List.of(), List.of(),
                List.of(TestModels.div(mul(call(MathFunction.SQRT, c(4)), x), c(2))));
        assertEquals(1, Polynomial.of(poly, new double[0]).orElseThrow()[0].degree());
    }
}
