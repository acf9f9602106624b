package org.phasewright.runtime.compile;

import static org.phasewright.runtime.TestModels.add;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.div;
import static org.phasewright.runtime.TestModels.mul;
import static org.phasewright.runtime.TestModels.sub;

import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.assemble.ModelAssembler;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Element;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.MathFunction;
import org.phasewright.runtime.model.Negation;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.model.Variable;

/** Indexed test models built with the assembler (the notation for them is being added to the language). */
final class IndexedModels {
    private IndexedModels() {
    }

    static Expr pow(Expr a, double n) {
        return new Binary(BinaryOperator.POWER, a, new Constant(n));
    }

    static Expr sin(Expr a) {
        return new Call(MathFunction.SIN, List.of(a));
    }

    static IndexValue idx(String name) {
        return new IndexValue(name);
    }

    /** {@code name + offset} as an index expression. */
    static Expr shift(String name, int offset) {
        return offset == 0 ? idx(name) : offset > 0 ? add(idx(name), c(offset)) : sub(idx(name), c(-offset));
    }

    static Element at(Family f, Expr index) {
        return ModelAssembler.element(f, index);
    }

    /** Lorenz (1996): dx_i/dt = (x_{i+1} - x_{i-2}) x_{i-1} - x_i + F over i = 1..n; initial x_i = F + 0.01 sin(i). */
    static DynamicalModel lorenz96(int n, boolean cyclic, double forcing) {
        ModelAssembler a = new ModelAssembler("ring", null, new TimeAxis("t", null));
        Variable f = a.parameter("F", c(forcing), null, null, null);
        Family x = a.stateFamily("x", new IndexRange("i", 1, n, cyclic), add(f, mul(c(0.01), sin(idx("i")))),
                null, null);
        a.familyRate(x, add(sub(mul(sub(at(x, shift("i", 1)), at(x, shift("i", -2))), at(x, shift("i", -1))),
                at(x, idx("i"))), f));
        return a.build(List.of(), List.of());
    }

    /**
     * The Lorenz (1996) ring plus a derived family and a scalar sum, so that rates use the per-thread scratch array:
     * let e[i] = x[i]^2 / 2, let mean = sum_j x[j] / n, dx_i/dt = Lorenz-96 + 0.001 (e[i-1] - e[i+1]) + 0.0001 mean.
     */
    static DynamicalModel ringWithDerived(int n) {
        ModelAssembler a = new ModelAssembler("ring2", null, new TimeAxis("t", null));
        Variable f = a.parameter("F", c(8), null, null, null);
        IndexRange i = new IndexRange("i", 1, n, true);
        Family x = a.stateFamily("x", i, add(f, mul(c(0.01), sin(idx("i")))), null, null);
        Family e = a.derivedFamily("e", i, div(pow(at(x, idx("i")), 2), c(2)), null);
        Variable mean = a.derived("mean", div(new Sum(new IndexRange("j", 1, n, true), at(x, idx("j"))), c(n)),
                null);
        Expr lorenz = add(sub(mul(sub(at(x, shift("i", 1)), at(x, shift("i", -2))), at(x, shift("i", -1))),
                at(x, idx("i"))), f);
        a.familyRate(x, add(add(lorenz, mul(c(0.001), sub(at(e, shift("i", -1)), at(e, shift("i", 1))))),
                mul(c(0.0001), mean)));
        return a.build(List.of(), List.of());
    }

    /**
     * Sums, nested sums, derived families, parameter tables and formulas, time, index values as numbers, and index
     * expressions that are not a shift (reversal and doubling), on a bounded or cyclic index of size n.
     */
    static DynamicalModel kitchenSink(int n, boolean cyclic) {
        ModelAssembler a = new ModelAssembler("sink", null, new TimeAxis("t", null));
        IndexRange i = new IndexRange("i", 0, n - 1, cyclic);
        IndexRange j = new IndexRange("j", 0, n - 1, cyclic);
        IndexRange k = new IndexRange("k", 0, n - 1, cyclic);
        Variable coupling = a.parameter("K", c(0.7), null, null, null);
        List<Expr> listed = new ArrayList<>();
        for (int m = 0; m < n; m++) {
            listed.add(c(1.0 + 0.25 * m));
        }
        Family w = a.parameterTable("w", i, listed, null, null);
        Family g = a.parameterFamily("g", i, add(c(0.5), mul(c(0.1), idx("i"))), null, null);
        Family x = a.stateFamily("x", i, sin(idx("i")), null, null);
        Variable y = a.state("y", c(0.3), null, null);
        // let v[i] = w[i] * x[i]^2 + x[i-1] * g[i+1]
        Family v = a.derivedFamily("v", i, add(mul(at(w, idx("i")), pow(at(x, idx("i")), 2)),
                mul(at(x, shift("i", -1)), at(g, shift("i", 1)))), null);
        // let total = sum_j v[j] (a scalar with a sum: a one-element family)
        Variable total = a.derived("total", new Sum(j, at(v, idx("j"))), null);
        // let h[i] = v[i+1] - v[i] + total / 10 (a derived family reading another and a scalar)
        Family h = a.derivedFamily("h", i, add(sub(at(v, shift("i", 1)), at(v, idx("i"))), div(total, c(10))),
                null);
        // dx_i/dt = -x_i + K/n sum_j sin(x_j - x_i)          (body uses the outer index: stays in the loop)
        //           + 0.01 sum_j sum_k w[j] x[k] x[j+k]      (independent of i: computed once, nested)
        //           + h[i] - x[n-1-i] * x[2i] + sin(i + t)   (reversal and doubling: general index path)
        Expr meanField = mul(div(coupling, c(n)), new Sum(j, sin(sub(at(x, idx("j")), at(x, idx("i"))))));
        Expr nested = mul(c(0.01), new Sum(j, new Sum(k, mul(mul(at(w, idx("j")), at(x, idx("k"))),
                at(x, add(idx("j"), idx("k")))))));
        Expr irregular = sub(at(h, idx("i")), mul(at(x, sub(c(n - 1), idx("i"))), at(x, mul(c(2), idx("i")))));
        Expr forced = sin(add(idx("i"), new Variable(org.phasewright.runtime.model.VariableKind.TIME, 0, "t")));
        a.familyRate(x, add(add(add(new Negation(at(x, idx("i"))), meanField), nested), add(irregular, forced)));
        // dy/dt = total - y + sum_j (x[j] - x[j+1])^2 * x[0]  (a scalar rate with a sum and a fixed element)
        a.rate(y, add(sub(total, y), new Sum(j, mul(pow(sub(at(x, idx("j")), at(x, shift("j", 1))), 2),
                at(x, c(0))))));
        return a.build(List.of(), List.of());
    }
}
