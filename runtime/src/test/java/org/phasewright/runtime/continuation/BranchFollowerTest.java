package org.phasewright.runtime.continuation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.add;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.mul;
import static org.phasewright.runtime.TestModels.model;
import static org.phasewright.runtime.TestModels.param;
import static org.phasewright.runtime.TestModels.parameter;
import static org.phasewright.runtime.TestModels.pow;
import static org.phasewright.runtime.TestModels.state;
import static org.phasewright.runtime.TestModels.stateVar;
import static org.phasewright.runtime.TestModels.sub;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.TestModels;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Variable;

class BranchFollowerTest {

    static ContinuationOutcome follow(DynamicalModel model, int parameter, double from, double to,
            List<double[]> starts) {
        CompiledModel m = ModelCompiler.compile(model);
        ParameterVector pv = new ParameterVector(model, m.parameters(), parameter);
        return new BranchFollower(m.field(), pv, m.parameters().length, from, to, ContinuationSettings.DEFAULT,
                Long.MAX_VALUE, () -> false).follow(starts);
    }

    static List<SpecialPoint> of(ContinuationOutcome o, SpecialPoint.Kind kind) {
        return o.specialPoints().stream().filter(s -> s.kind() == kind).toList();
    }

    /** x' = r + x²: the saddle-node normal form (Strogatz, Nonlinear Dynamics and Chaos, §3.1). */
    static DynamicalModel saddleNode() {
        Variable x = state(0, "x");
        return model("saddle_node", List.of(stateVar("x", -1)), List.of(parameter("r", c(-1))), List.of(),
                List.of(add(param(0, "r"), pow(x, c(2)))));
    }

    @Test
    void saddleNodeFoldAtZeroAndTheBranchTurnsBack() {
        ContinuationOutcome o = follow(saddleNode(), 0, -1, 1, List.of(new double[] {-1}, new double[] {1}));
        assertEquals(ContinuationOutcome.Ending.COMPLETED, o.ending());
        // One branch through both equilibria at r = -1 (x = ±sqrt(-r)), turning at the fold r = 0, x = 0
        // (Strogatz §3.1: the fixed points x* = ±sqrt(-r) collide at r = 0).
        assertEquals(1, o.branches().size(), o.message());
        List<SpecialPoint> folds = of(o, SpecialPoint.Kind.FOLD);
        assertEquals(1, folds.size(), o.message());
        assertEquals(0.0, folds.get(0).parameter(), 1e-10);
        assertEquals(0.0, folds.get(0).state()[0], 1e-5); // |x| ~ sqrt(error in r) at a fold
        Branch b = o.branches().get(0);
        ContinuationPoint last = b.points().get(b.points().size() - 1);
        assertEquals(-1.0, last.parameter(), 1e-12);
        assertEquals(1.0, last.state()[0], 1e-9);
        assertTrue(b.points().get(0).stable() && !last.stable()); // f'(x) = 2x: x = -1 stable, x = 1 unstable
        assertTrue(of(o, SpecialPoint.Kind.BRANCH_POINT).isEmpty() && of(o, SpecialPoint.Kind.HOPF).isEmpty());
    }

    @Test
    void lorenzPitchforkAtOneAndSubcriticalHopfOnBothConvectionBranches() {
        double sigma = 10, b = 8.0 / 3;
        ContinuationOutcome o = follow(TestModels.lorenz(), 1, 0, 30, List.of(new double[3]));
        assertEquals(ContinuationOutcome.Ending.COMPLETED, o.ending(), o.message());
        // Sparrow, The Lorenz Equations (1982), §1.2: the origin loses stability in a pitchfork at r = 1, where
        // the pair C± = (±sqrt(b(r-1)), ±sqrt(b(r-1)), r-1) is born.
        List<SpecialPoint> bps = of(o, SpecialPoint.Kind.BRANCH_POINT);
        assertEquals(1, bps.size(), o.message());
        assertEquals(1.0, bps.get(0).parameter(), 1e-9);
        assertEquals(3, o.branches().size(), o.message()); // the origin and C+ and C-
        for (Branch branch : o.branches().subList(1, 3)) {
            ContinuationPoint end = branch.points().get(branch.points().size() - 1);
            assertEquals(30.0, end.parameter(), 1e-12);
            assertEquals(Math.sqrt(b * 29), Math.abs(end.state()[0]), 1e-8); // Sparrow §1.2 closed form
        }
        // Sparrow (1982) §1.2: C± lose stability at r = σ(σ+b+3)/(σ-b-1) = 470/19 ≈ 24.7368 in a subcritical Hopf
        // bifurcation (unstable cycles shrink onto C± as r increases to it), so l1 > 0.
        List<SpecialPoint> hopf = of(o, SpecialPoint.Kind.HOPF);
        assertEquals(2, hopf.size(), o.message());
        double rH = sigma * (sigma + b + 3) / (sigma - b - 1);
        for (SpecialPoint h : hopf) {
            assertEquals(rH, h.parameter(), 1e-8);
            assertTrue(h.firstLyapunovCoefficient() > 0, h.description());
            assertEquals("subcritical", h.criticality());
            // at the Hopf point the characteristic polynomial λ³ + (σ+b+1)λ² + b(σ+r)λ + 2σb(r-1) has roots
            // ±iω with ω² = b(σ+r) (substitute λ = iω; Sparrow §1.2)
            assertEquals(Math.sqrt(b * (sigma + rH)), h.frequency(), 1e-7);
        }
        assertTrue(of(o, SpecialPoint.Kind.FOLD).isEmpty(), o.message());
    }

    /** Brusselator x' = a − (b+1)x + x²y, y' = bx − x²y (Strogatz §8.3, Exercise 8.3.1), varying b. */
    @Test
    void brusselatorHopfAtOnePlusASquared() {
        Variable x = state(0, "x"), y = state(1, "y"), a = param(0, "a"), bb = param(1, "b");
        DynamicalModel bruss = model("brusselator", List.of(stateVar("x", 1), stateVar("y", 1)),
                List.of(parameter("a", c(1.5)), parameter("b", c(1))), List.of(),
                List.of(add(sub(a, mul(add(bb, c(1)), x)), mul(pow(x, c(2)), y)),
                        sub(mul(bb, x), mul(pow(x, c(2)), y))));
        double aValue = 1.5;
        ContinuationOutcome o = follow(bruss, 1, 1, 5, List.of(new double[] {aValue, 1 / aValue}));
        List<SpecialPoint> hopf = of(o, SpecialPoint.Kind.HOPF);
        assertEquals(1, hopf.size(), o.message());
        // Strogatz, Nonlinear Dynamics and Chaos, Exercise 8.3.1: the fixed point (a, b/a) loses stability in a
        // Hopf bifurcation at b = 1 + a²; the trace of the Jacobian there is zero and its determinant a² = ω².
        assertEquals(1 + aValue * aValue, hopf.get(0).parameter(), 1e-9);
        assertEquals(aValue, hopf.get(0).frequency(), 1e-7);
        assertEquals(aValue, hopf.get(0).state()[0], 1e-9);
    }

    @Test
    void parametersDefinedFromTheVariedOneFollowIt() {
        // x' = k − x with k = 2a: the equilibrium is x = k = 2a for every a (closed form)
        Variable x = state(0, "x");
        DynamicalModel m = model("linear", List.of(stateVar("x", 0)),
                List.of(parameter("a", c(0)), parameter("k", mul(c(2), param(0, "a")))), List.of(),
                List.of(sub(param(1, "k"), x)));
        ContinuationOutcome o = follow(m, 0, 0, 1, List.of(new double[] {0}));
        assertEquals(1, o.branches().size(), o.message());
        List<ContinuationPoint> points = o.branches().get(0).points();
        assertEquals(1.0, points.get(points.size() - 1).parameter(), 1e-12);
        for (ContinuationPoint p : points) {
            assertEquals(2 * p.parameter(), p.state()[0], 1e-10);
            assertTrue(p.stable()); // f'(x) = −1
        }
        assertTrue(o.specialPoints().isEmpty());
    }

    @Test
    void firstLyapunovCoefficientOfTheHopfNormalForm() {
        // x' = μx − ωy + s·x(x²+y²), y' = ωx + μy + s·y(x²+y²). By hand from Kuznetsov, Elements of Applied
        // Bifurcation Theory, 3rd ed., (3.20) with ⟨q,q⟩ = ⟨p,q⟩ = 1: q = p = (1, −i)/√2, B = 0 and
        // C(a,b,c) = 2s[a(b·c) + b(a·c) + c(a·b)], so C(q,q,q̄) = 4s·q (q·q = 0, q·q̄ = 1) and l1 = 2s/ω; its sign
        // is that of s (s < 0: a stable cycle of radius sqrt(−μ/s) for μ > 0, Strogatz §8.2).
        for (double s : new double[] {-1, 0.5}) {
            double omega = 2;
            Variable x = state(0, "x"), y = state(1, "y");
            var r2 = add(pow(x, c(2)), pow(y, c(2)));
            DynamicalModel m = model("hopf", List.of(stateVar("x", 0), stateVar("y", 0)),
                    List.of(parameter("mu", c(0))), List.of(),
                    List.of(add(sub(mul(param(0, "mu"), x), mul(c(omega), y)), mul(c(s), mul(x, r2))),
                            add(add(mul(c(omega), x), mul(param(0, "mu"), y)), mul(c(s), mul(y, r2)))));
            CompiledModel cm = ModelCompiler.compile(m);
            double l1 = FirstLyapunovCoefficient.at(cm.field(), new double[] {0}, new double[2], omega);
            assertEquals(2 * s / omega, l1, 1e-6);
        }
    }
}
