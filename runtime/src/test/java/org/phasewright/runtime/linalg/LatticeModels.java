package org.phasewright.runtime.linalg;

import static org.phasewright.runtime.TestModels.add;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.call;
import static org.phasewright.runtime.TestModels.div;
import static org.phasewright.runtime.TestModels.mul;
import static org.phasewright.runtime.TestModels.sub;

import java.util.List;

import org.phasewright.runtime.assemble.ModelAssembler;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.MathFunction;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.model.Variable;

/** Indexed test models built with the assembler: rings, chains and a mean-field lattice. */
public final class LatticeModels {
    private LatticeModels() {
    }

    /** {@code i + offset}. */
    static Expr at(int offset) {
        return add(new IndexValue("i"), c(offset));
    }

    /**
     * The Lorenz (1996) ring dx_i/dt = (x_{i+1} − x_{i−2}) x_{i−1} − x_i + F, i = 1..n; x_i(0) = F plus a small
     * bump on element 1 (or zero padding at the ends when not cyclic).
     */
    public static DynamicalModel lorenz96(int n, double forcing, boolean cyclic) {
        ModelAssembler a = new ModelAssembler("ring", null, new TimeAxis("t", null));
        Variable f = a.parameter("F", c(forcing), null, null, null);
        IndexRange range = new IndexRange("i", 1, n, cyclic);
        // F + 0.01 sin(i): a generic start near the unstable uniform state
        Family x = a.stateFamily("x", range, add(c(forcing), mul(c(0.01), call(MathFunction.SIN,
                new IndexValue("i")))), null, null);
        Expr law = add(sub(mul(sub(ModelAssembler.element(x, at(1)), ModelAssembler.element(x, at(-2))),
                ModelAssembler.element(x, at(-1))), ModelAssembler.element(x, at(0))), f);
        a.familyRate(x, law);
        return a.build(List.of(), List.of());
    }

    /**
     * A chain of bioreactor tanks (our scenario): biomass x_i flows down a bounded chain at rates c_i = 1 + i/10,
     * grows on the shared substrate S with a saturating uptake d_i = x_i² / (1 + x_i) (a derived family), and is
     * grazed by sin(x_{i+1}); S is fed, washed out and consumed by the first and last tanks.
     */
    public static DynamicalModel reactorChain(int n) {
        ModelAssembler a = new ModelAssembler("chain", null, new TimeAxis("t", null));
        IndexRange range = new IndexRange("i", 1, n, false);
        Family rate = a.parameterFamily("c", range, add(c(1), div(new IndexValue("i"), c(10))), null, null);
        Family x = a.stateFamily("x", range, add(c(0.5), div(new IndexValue("i"), c(n))), null, null);
        Variable s = a.state("S", c(2), null, null);
        Family uptake = a.derivedFamily("d", range, div(mul(ModelAssembler.element(x, at(0)),
                ModelAssembler.element(x, at(0))), add(c(1), ModelAssembler.element(x, at(0)))), null);
        Expr law = sub(add(mul(ModelAssembler.element(rate, at(0)), sub(ModelAssembler.element(x, at(-1)),
                ModelAssembler.element(x, at(0)))), mul(ModelAssembler.element(uptake, at(0)), s)),
                call(MathFunction.SIN, ModelAssembler.element(x, at(1))));
        a.familyRate(x, law);
        a.rate(s, sub(sub(c(3), s), mul(s, add(ModelAssembler.element(x, c(1)), ModelAssembler.element(x, c(n))))));
        return a.build(List.of(), List.of());
    }

    /** A mean-field lattice dx_i/dt = −x_i + tanh(Σ_j x_j / n + i/n): every rate depends on every state. */
    public static DynamicalModel meanField(int n) {
        ModelAssembler a = new ModelAssembler("mean", null, new TimeAxis("t", null));
        IndexRange range = new IndexRange("i", 1, n, false);
        Family x = a.stateFamily("x", range, div(new IndexValue("i"), c(n)), null, null);
        Expr mean = div(new Sum(new IndexRange("j", 1, n, false), ModelAssembler.element(x, new IndexValue("j"))),
                c(n));
        a.familyRate(x, sub(call(MathFunction.TANH, add(mean, div(new IndexValue("i"), c(n)))),
                ModelAssembler.element(x, at(0))));
        return a.build(List.of(), List.of());
    }

    /**
     * Heat along a solar-collector pipe (our scenario), discretised: du_i/dt = D (u_{i−1} − 2u_i + u_{i+1}),
     * i = 1..n, zero beyond the ends, starting from the slowest mode u_i = sin(π i / (n + 1)).
     */
    public static DynamicalModel pipeHeat(int n, double diffusivity) {
        ModelAssembler a = new ModelAssembler("pipe", null, new TimeAxis("t", null));
        Variable d = a.parameter("D", c(diffusivity), null, null, null);
        IndexRange range = new IndexRange("i", 1, n, false);
        Family u = a.stateFamily("u", range, call(MathFunction.SIN, mul(c(Math.PI / (n + 1)), new IndexValue("i"))),
                null, null);
        a.familyRate(u, mul(d, add(sub(ModelAssembler.element(u, at(-1)), mul(c(2), ModelAssembler.element(u,
                at(0)))), ModelAssembler.element(u, at(1)))));
        return a.build(List.of(), List.of());
    }

    /**
     * A forced, damped ring (our scenario: a ring of coupled pendulum-like cells): dx_i/dt = (x_{i+1} − x_{i−2})
     * x_{i−1} − x_i³/10 + w_i sin(t) + x_{2i}/(1 + x_i²) with a weight table w_i = 1/i and a far coupling x_{2i}
     * (a general index expression, wrapped on the cycle).
     */
    public static DynamicalModel forcedRing(int n) {
        ModelAssembler a = new ModelAssembler("forced", null, new TimeAxis("t", null));
        IndexRange range = new IndexRange("i", 1, n, true);
        Family w = a.parameterFamily("w", range, div(c(1), new IndexValue("i")), null, null);
        Family x = a.stateFamily("x", range, call(MathFunction.COS, new IndexValue("i")), null, null);
        Expr cube = new Binary(BinaryOperator.POWER, ModelAssembler.element(x, at(0)), c(3));
        Expr far = ModelAssembler.element(x, mul(c(2), new IndexValue("i")));
        Expr law = add(add(sub(mul(sub(ModelAssembler.element(x, at(1)), ModelAssembler.element(x, at(-2))),
                ModelAssembler.element(x, at(-1))), div(cube, c(10))),
                mul(ModelAssembler.element(w, at(0)), call(MathFunction.SIN, new org.phasewright.runtime.model.Variable(
                        org.phasewright.runtime.model.VariableKind.TIME, 0, "t")))),
                div(far, add(c(1), mul(ModelAssembler.element(x, at(0)), ModelAssembler.element(x, at(0))))));
        a.familyRate(x, law);
        return a.build(List.of(), List.of());
    }

    /**
     * The Lorenz-96 ring with an observer state (our scenario: a ring of weather cells and the total energy a
     * sensor integrates): dE/dt = Σ_j w_j x_j² / 2 − E with listed weights w_j = 1 + j/n.
     */
    public static DynamicalModel ringWithObserver(int n) {
        ModelAssembler a = new ModelAssembler("observed", null, new TimeAxis("t", null));
        Variable f = a.parameter("F", c(8), null, null, null);
        IndexRange range = new IndexRange("i", 1, n, true);
        java.util.List<Expr> weights = new java.util.ArrayList<>();
        for (int j = 1; j <= n; j++) {
            weights.add(c(1 + (double) j / n));
        }
        Family w = a.parameterTable("w", new IndexRange("j", 1, n, false), weights, null, null);
        Family x = a.stateFamily("x", range, add(c(8), mul(c(0.01), call(MathFunction.SIN, new IndexValue("i")))),
                null, null);
        Variable energy = a.state("E", c(0), null, null);
        a.familyRate(x, add(sub(mul(sub(ModelAssembler.element(x, at(1)), ModelAssembler.element(x, at(-2))),
                ModelAssembler.element(x, at(-1))), ModelAssembler.element(x, at(0))), f));
        Expr xj = ModelAssembler.element(x, new IndexValue("j"));
        a.rate(energy, sub(new Sum(new IndexRange("j", 1, n, false), mul(ModelAssembler.element(w,
                new IndexValue("j")), div(mul(xj, xj), c(2)))), energy));
        return a.build(List.of(), List.of());
    }

    /** A lattice whose rates hold a double sum (Σ_j Σ_k x_j x_k / n²), which is not reduced to loops. */
    public static DynamicalModel doubleSum(int n) {
        ModelAssembler a = new ModelAssembler("double", null, new TimeAxis("t", null));
        IndexRange range = new IndexRange("i", 1, n, false);
        Family x = a.stateFamily("x", range, div(new IndexValue("i"), c(n)), null, null);
        Expr inner = new Sum(new IndexRange("k", 1, n, false), mul(ModelAssembler.element(x, new IndexValue("j")),
                ModelAssembler.element(x, new IndexValue("k"))));
        Expr outer = div(new Sum(new IndexRange("j", 1, n, false), inner), c((double) n * n));
        a.familyRate(x, sub(call(MathFunction.TANH, outer), ModelAssembler.element(x, at(0))));
        return a.build(List.of(), List.of());
    }
    /**
     * The Bratu problem u'' + λ e^u = 0 on (0, 1), u = 0 at both ends, by the second difference on n interior
     * points: du_i/dt = (n+1)² (u_{i−1} − 2u_i + u_{i+1}) + λ e^{u_i}, starting from u = 0.
     */
    public static DynamicalModel bratu(int n, double lambda) {
        ModelAssembler a = new ModelAssembler("bratu", null, new TimeAxis("t", null));
        Variable l = a.parameter("lambda", c(lambda), null, null, null);
        Family u = a.stateFamily("u", new IndexRange("i", 1, n, false), c(0), null, null);
        Expr laplacian = mul(c((n + 1.0) * (n + 1.0)), add(sub(ModelAssembler.element(u, at(-1)),
                mul(c(2), ModelAssembler.element(u, at(0)))), ModelAssembler.element(u, at(1))));
        a.familyRate(u, add(laplacian, mul(l, call(MathFunction.EXP, ModelAssembler.element(u, at(0))))));
        return a.build(List.of(), List.of());
    }
}
