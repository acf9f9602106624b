package org.phasewright.runtime.compile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.phasewright.runtime.TestModels.add;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.div;
import static org.phasewright.runtime.TestModels.mul;
import static org.phasewright.runtime.TestModels.sub;
import static org.phasewright.runtime.compile.IndexedModels.at;
import static org.phasewright.runtime.compile.IndexedModels.idx;
import static org.phasewright.runtime.compile.IndexedModels.pow;
import static org.phasewright.runtime.compile.IndexedModels.shift;
import static org.phasewright.runtime.compile.IndexedModels.sin;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.function.Function;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.assemble.ModelAssembler;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;

/**
 * Which models are lattices, and the generated window rates against the whole-state rates of the same model (the
 * reference: the generated field, itself checked against the interpreter and Lorenz (1996)). Values must be equal bit
 * for bit: both are written by the same expression writer.
 */
class LatticeRatesTest {
    private static final double T = 0.37;

    @Test
    void lorenz96RingIsALatticeReachingTwoBelowAndOneAbove() {
        // x[i+1], x[i-2], x[i-1], x[i]: Lorenz (1996) reads two cells below and one above
        LatticeShape shape = LatticeShape.of(IndexedModels.lorenz96(50, true, 8));
        assertNotNull(shape);
        assertEquals(2, shape.reachBelow());
        assertEquals(1, shape.reachAbove());
        assertEquals(1, shape.components().size());
    }

    @Test
    void boundedChainsSumsDerivedQuantitiesAndScalarStatesAreNotLattices() {
        assertNull(LatticeShape.of(IndexedModels.lorenz96(50, false, 8)), "bounded edges read 0, not a wrap");
        assertNull(LatticeShape.of(IndexedModels.ringWithDerived(50)), "derived family and a mean over all cells");
        assertNull(LatticeShape.of(IndexedModels.kitchenSink(12, true)), "sums, a scalar state, reversal");
        assertNull(ModelCompiler.compile(IndexedModels.lorenz96(50, false, 8)).lattice());
    }

    @Test
    void stencilsWiderThanTheLimitAreNotLattices() {
        ModelAssembler a = new ModelAssembler("wide", null, new TimeAxis("t", null));
        Family x = a.stateFamily("x", new IndexRange("i", 1, 200, true), c(1), null, null);
        a.familyRate(x, sub(at(x, shift("i", LatticeShape.MAX_REACH + 1)), at(x, idx("i"))));
        assertNull(LatticeShape.of(a.build(List.of(), List.of())));
    }

    @Test
    void ringWindowRatesEqualWholeStateRates() {
        checkWindows(IndexedModels.lorenz96(97, true, 8));
    }

    @Test
    void twoComponentLatticeWithTablesTimeAndIndexValuesEqualsWholeStateRates() {
        checkWindows(twoComponents(61));
    }

    /** One model per reason a model is not a lattice, each otherwise a plain ring (common practice, no source). */
    @Test
    void eachReasonAloneMakesAModelNotALattice() {
        int n = 40;
        IndexRange ring = new IndexRange("i", 1, n, true);
        Map<String, Function<ModelAssembler, Family>> reasons = new LinkedHashMap<>();
        reasons.put("derived family", a -> {
            Family x = a.stateFamily("x", ring, c(1), null, null);
            Family e = a.derivedFamily("e", ring, pow(at(x, idx("i")), 2), null);
            a.familyRate(x, sub(at(e, shift("i", 1)), at(x, idx("i"))));
            return x;
        });
        reasons.put("scalar derived quantity", a -> {
            Family x = a.stateFamily("x", ring, c(1), null, null);
            Variable s = a.derived("s", mul(c(2), c(3)), null);
            a.familyRate(x, sub(s, at(x, idx("i"))));
            return x;
        });
        reasons.put("reversed index", a -> {
            Family x = a.stateFamily("x", ring, c(1), null, null);
            a.familyRate(x, sub(at(x, sub(c(n + 1), idx("i"))), at(x, idx("i"))));
            return x;
        });
        reasons.put("doubled index", a -> {
            Family x = a.stateFamily("x", ring, c(1), null, null);
            a.familyRate(x, sub(at(x, mul(c(2), idx("i"))), at(x, idx("i"))));
            return x;
        });
        reasons.put("fixed element", a -> {
            Family x = a.stateFamily("x", ring, c(1), null, null);
            a.familyRate(x, sub(at(x, c(3)), at(x, idx("i"))));
            return x;
        });
        reasons.put("table over another range", a -> {
            Family w = a.parameterFamily("w", new IndexRange("j", 1, 2 * n, true), idx("j"), null, null);
            Family x = a.stateFamily("x", ring, c(1), null, null);
            a.familyRate(x, sub(at(w, idx("i")), at(x, idx("i"))));
            return x;
        });
        reasons.put("families over shifted ranges", a -> {
            Family x = a.stateFamily("x", ring, c(1), null, null);
            Family y = a.stateFamily("y", new IndexRange("i", 0, n - 1, true), c(1), null, null);
            a.familyRate(x, at(x, idx("i")));
            a.familyRate(y, at(y, idx("i")));
            return x;
        });
        reasons.put("a bounded family", a -> {
            Family x = a.stateFamily("x", ring, c(1), null, null);
            Family y = a.stateFamily("y", new IndexRange("i", 1, n, false), c(1), null, null);
            a.familyRate(x, at(x, idx("i")));
            a.familyRate(y, at(y, shift("i", 1)));
            return x;
        });
        reasons.forEach((reason, build) -> {
            ModelAssembler a = new ModelAssembler("not", null, new TimeAxis("t", null));
            build.apply(a);
            DynamicalModel model = a.build(List.of(), List.of());
            assertNull(LatticeShape.of(model), reason);
            assertNull(ModelCompiler.compile(model).lattice(), reason);
        });
        // and the plain ring that each of them changes is one
        ModelAssembler a = new ModelAssembler("plain", null, new TimeAxis("t", null));
        Family x = a.stateFamily("x", ring, c(1), null, null);
        a.familyRate(x, sub(at(x, shift("i", 1)), at(x, idx("i"))));
        assertNotNull(LatticeShape.of(a.build(List.of(), List.of())));
    }

    /** Rates of every cell of windows placed across the wrap-around, compared with the whole-state rates. */
    private static void checkWindows(DynamicalModel model) {
        CompiledModel compiled = ModelCompiler.compile(model);
        LatticeRates lattice = compiled.lattice();
        assertNotNull(lattice, "a cyclic lattice gets window rates");
        int cells = lattice.cells(), components = lattice.components(), below = lattice.reachBelow();
        int span = below + lattice.reachAbove();
        Random random = new Random(11);
        double[] u = new double[compiled.dimension()];
        for (int k = 0; k < u.length; k++) {
            u[k] = random.nextDouble() * 4 - 2;
        }
        double[] p = compiled.parameters();
        double[] whole = new double[u.length];
        compiled.field().rates(T, u, p, whole);
        for (long origin : new long[] {-7, 0, cells - 5, 3L * cells + 2}) {
            int width = 40;
            double[][] in = new double[components][width];
            double[][] out = new double[components][width];
            for (int f = 0; f < components; f++) {
                for (int j = 0; j < width; j++) {
                    in[f][j] = u[f * cells + (int) Math.floorMod(origin + j, (long) cells)];
                }
            }
            int from = 3, to = width - span;
            lattice.rates(T, in, p, out, origin + below, from, to);
            for (int f = 0; f < components; f++) {
                for (int q = from; q < to; q++) {
                    int cell = (int) Math.floorMod(origin + below + q, (long) cells);
                    assertEquals(whole[f * cells + cell], out[f][q], 0.0,
                            "component " + f + ", cell " + cell + ", window at " + origin);
                }
            }
        }
    }

    /**
     * Two coupled rings (a made-up predator–prey lattice): prey u and predator v with a table of growth rates
     * g[i] read one cell up, a time-dependent forcing with the index value, powers and parameters:
     * du_i/dt = g[i+1] u_i (1 - u_i) - a u_i v_i + D (u_{i+1} - 2 u_i + u_{i-1}) + 0.1 sin(t + i),
     * dv_i/dt = a u_i v_i / (1 + u_i^2) - m v_i + D (v_{i-1} - v_i).
     */
    static DynamicalModel twoComponents(int n) {
        ModelAssembler a = new ModelAssembler("prey", null, new TimeAxis("t", null));
        IndexRange range = new IndexRange("i", 1, n, true);
        Variable attack = a.parameter("a", c(1.3), null, null, null);
        Variable death = a.parameter("m", c(0.4), null, null, null);
        Variable diffusion = a.parameter("D", c(0.05), null, null, null);
        Family g = a.parameterFamily("g", range, add(c(1), mul(c(0.01), idx("i"))), null, null);
        Family u = a.stateFamily("u", range, add(c(0.5), mul(c(0.1), sin(idx("i")))), null, null);
        Family v = a.stateFamily("v", range, c(0.2), null, null);
        Variable t = new Variable(VariableKind.TIME, 0, "t");
        a.familyRate(u, add(add(sub(mul(at(g, shift("i", 1)), mul(at(u, idx("i")), sub(c(1), at(u, idx("i"))))),
                mul(attack, mul(at(u, idx("i")), at(v, idx("i"))))),
                mul(diffusion, add(sub(at(u, shift("i", 1)), mul(c(2), at(u, idx("i")))), at(u, shift("i", -1))))),
                mul(c(0.1), sin(add(t, idx("i"))))));
        a.familyRate(v, add(sub(div(mul(attack, mul(at(u, idx("i")), at(v, idx("i")))),
                add(c(1), pow(at(u, idx("i")), 2))), mul(death, at(v, idx("i")))),
                mul(diffusion, sub(at(v, shift("i", -1)), at(v, idx("i"))))));
        return a.build(List.of(), List.of());
    }
}
