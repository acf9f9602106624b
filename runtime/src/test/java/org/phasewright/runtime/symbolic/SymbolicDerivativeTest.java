package org.phasewright.runtime.symbolic;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.let;
import static org.phasewright.runtime.TestModels.model;
import static org.phasewright.runtime.TestModels.mul;
import static org.phasewright.runtime.TestModels.pow;
import static org.phasewright.runtime.TestModels.state;
import static org.phasewright.runtime.TestModels.stateVar;

import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.TestModels;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DerivedQuantity;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.VariableKind;

class SymbolicDerivativeTest {

    @Test
    void lorenzDivergenceIsTheConstantMinusSigmaPlusOnePlusB() {
        // Lorenz (1963), J. Atmos. Sci. 20:130: the volume contraction rate is -(σ + b + 1), independent of state.
        DynamicalModel lorenz = TestModels.lorenz();
        Expr divergence = Divergence.of(lorenz);
        assertFalse(References.uses(divergence, VariableKind.STATE), divergence.toString());
        Expr value = Substitution.parameters(divergence, ParameterValues.resolve(lorenz));
        Constant constant = assertInstanceOf(Constant.class, value);
        assertEquals(-(10 + 1 + 8.0 / 3), constant.value(), 1e-14);
    }

    @Test
    void lorenzJacobianEntriesAreCompact() {
        // Hand differentiation of the Lorenz rates (common practice, no source needed):
        // df1/dx = -σ, df2/dz = -x, df3/dy = x, df1/dz = 0.
        SymbolicJacobian j = SymbolicJacobian.of(TestModels.lorenz());
        assertEquals(new Negation(TestModels.param(0, "sigma")), j.entry(0, 0));
        assertEquals(new Negation(state(0, "x")), j.entry(1, 2));
        assertEquals(state(0, "x"), j.entry(2, 1));
        assertEquals(Constant.ZERO, j.entry(0, 2));
        assertEquals(new Constant(-1), j.entry(1, 1));
    }

    @Test
    void simplifierRules() {
        Expr x = state(0, "x");
        // Identities of arithmetic (common practice).
        assertEquals(x, Simplifier.simplify(TestModels.add(x, c(0))));
        assertEquals(x, Simplifier.simplify(mul(c(1), x)));
        assertEquals(Constant.ZERO, Simplifier.simplify(mul(x, c(0))));
        assertEquals(x, Simplifier.simplify(pow(x, c(1))));
        assertEquals(Constant.ONE, Simplifier.simplify(pow(x, c(0))));
        assertEquals(x, Simplifier.simplify(TestModels.neg(TestModels.neg(x))));
        assertEquals(new Constant(7), Simplifier.simplify(TestModels.add(c(3), mul(c(2), c(2)))));
        assertEquals(Constant.ZERO, Simplifier.simplify(TestModels.sub(x, x)));
        assertEquals(TestModels.sub(state(1, "y"), x),
                Simplifier.simplify(TestModels.add(TestModels.neg(x), state(1, "y"))));
        // 1/0 is not folded into a constant that code generation could not print faithfully.
        assertInstanceOf(org.phasewright.runtime.model.Binary.class, Simplifier.simplify(TestModels.div(c(1), c(0))));
    }

    @Test
    void chainRuleThroughDerivedQuantities() {
        // let q = x^2; let r = q * y; x' = r, y' = q. By hand: d(x')/dx = 2xy, d(x')/dy = x^2, d(y')/dx = 2x.
        DynamicalModel m = model("m", List.of(stateVar("x", 1), stateVar("y", 1)), List.of(),
                List.of(new DerivedQuantity("q", pow(state(0, "x"), c(2)), null),
                        new DerivedQuantity("r", mul(let(0, "q"), state(1, "y")), null)),
                List.of(let(1, "r"), let(0, "q")));
        for (SymbolicJacobian j : List.of(SymbolicJacobian.of(m), SymbolicJacobian.inlined(m))) {
            List<DerivedQuantity> ext = j.extendedDerived(m);
            double x = 1.7, y = -0.4;
            double[] u = {x, y};
            double[] d = new double[ext.size()];
            for (int k = 0; k < d.length; k++) {
                d[k] = ExprEvaluator.evaluate(ext.get(k).definition(), 0, u, new double[0], d);
            }
            assertEquals(2 * x * y, ExprEvaluator.evaluate(j.entry(0, 0), 0, u, new double[0], d), 1e-14);
            assertEquals(x * x, ExprEvaluator.evaluate(j.entry(0, 1), 0, u, new double[0], d), 1e-14);
            assertEquals(2 * x, ExprEvaluator.evaluate(j.entry(1, 0), 0, u, new double[0], d), 1e-14);
            assertEquals(Constant.ZERO, j.entry(1, 1));
        }
        // The compact form names d(q)/d(x) = 2x and d(r)/d(x) = d(q)/d(x) * y once each instead of copying them;
        // d(r)/d(y) = q is a plain reference and needs no name.
        assertEquals(List.of("d(q)/d(x)", "d(r)/d(x)"),
                SymbolicJacobian.of(m).auxiliary().stream().map(DerivedQuantity::name).toList());
    }

    @Test
    void jacobianMatchesCentralDifferences() {
        // Central differences have error O(h^2) (common practice); with h ~ 1e-5 relative, agreement to ~1e-7.
        DynamicalModel m = TestModels.kitchenSink();
        double[] p = ParameterValues.resolve(m);
        SymbolicJacobian jac = SymbolicJacobian.of(m);
        List<DerivedQuantity> ext = jac.extendedDerived(m);
        int n = m.dimension();
        SplittableRandom random = new SplittableRandom(7);
        for (int trial = 0; trial < 50; trial++) {
            double[] u = new double[n];
            for (int i = 0; i < n; i++) {
                u[i] = random.nextDouble(0.2, 1.5) * (random.nextBoolean() ? 1 : -1);
            }
            double[] d = derived(ext, u, p);
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    double exact = ExprEvaluator.evaluate(jac.entry(i, j), 0, u, p, d);
                    double h = 1e-5 * Math.max(1, Math.abs(u[j]));
                    double[] up = u.clone();
                    double[] down = u.clone();
                    up[j] += h;
                    down[j] -= h;
                    double fd = (rate(m, i, up, p, ext) - rate(m, i, down, p, ext)) / (2 * h);
                    assertEquals(fd, exact, 1e-6 * Math.max(1, Math.abs(fd)),
                            "entry " + i + "," + j + " at trial " + trial + ": " + jac.entry(i, j));
                }
            }
        }
    }

    @Test
    void absAndMinMaxDerivativesAreFiniteAtTheirKinks() {
        // Subgradient convention at the kink: d|x|/dx = 0 at x = 0; min/max give the mean of both sides (common
        // practice in automatic differentiation tools, no single source).
        DynamicalModel m = model("m", List.of(stateVar("x", 0)), List.of(), List.of(),
                List.of(TestModels.call(org.phasewright.runtime.model.MathFunction.ABS, state(0, "x"))));
        Expr d = SymbolicJacobian.of(m).entry(0, 0);
        assertEquals(0.0, ExprEvaluator.evaluate(d, 0, new double[] {0}, new double[0], new double[0]));
        assertEquals(1.0, ExprEvaluator.evaluate(d, 0, new double[] {3e-300}, new double[0], new double[0]));
        assertEquals(-1.0, ExprEvaluator.evaluate(d, 0, new double[] {-2}, new double[0], new double[0]));
    }

    private static double[] derived(List<DerivedQuantity> ext, double[] u, double[] p) {
        double[] d = new double[ext.size()];
        for (int k = 0; k < d.length; k++) {
            d[k] = ExprEvaluator.evaluate(ext.get(k).definition(), 0, u, p, d);
        }
        return d;
    }

    private static double rate(DynamicalModel m, int i, double[] u, double[] p, List<DerivedQuantity> ext) {
        return ExprEvaluator.evaluate(m.rates().get(i), 0, u, p, derived(ext, u, p));
    }

    @Test
    void derivativeOfStateFreeExpressionIsZero() {
        assertTrue(Simplifier.isZero(new Differentiator((k, j) -> Constant.ZERO).partial(
                mul(TestModels.param(0, "a"), TestModels.time()), 0)));
    }
}
