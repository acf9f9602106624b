package org.phasewright.runtime.assemble;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Map;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.Sum;
import org.phasewright.runtime.model.Symmetry;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.symbolic.ExprEvaluator;

class ModelAssemblerTest {

    private static Expr plus(int offset) {
        return new Binary(BinaryOperator.ADD, new IndexValue("i"), new Constant(offset));
    }

    /** The Lorenz (1996) ring: dx_i/dt = (x_{i+1} - x_{i-2}) x_{i-1} - x_i + F, cyclic in i. */
    static DynamicalModel ring(int n, boolean cyclic) {
        ModelAssembler a = new ModelAssembler("ring", null, new TimeAxis("t", null));
        Variable forcing = a.parameter("F", new Constant(8), null, null, null);
        Family x = a.stateFamily("x", new IndexRange("i", 1, n, cyclic), new IndexValue("i"), null, null);
        Expr law = new Binary(BinaryOperator.ADD,
                new Binary(BinaryOperator.SUBTRACT,
                        new Binary(BinaryOperator.MULTIPLY,
                                new Binary(BinaryOperator.SUBTRACT, ModelAssembler.element(x, plus(1)),
                                        ModelAssembler.element(x, plus(-2))),
                                ModelAssembler.element(x, plus(-1))),
                        ModelAssembler.element(x, new IndexValue("i"))),
                forcing);
        a.familyRate(x, law);
        return a.build(List.of(), List.of());
    }

    @Test
    void cyclicRingExpandsToTheLorenz96Rates() {
        int n = 7;
        DynamicalModel m = ring(n, true);
        assertEquals(n, m.dimension());
        assertEquals("x[1]", m.states().get(0).name());
        assertEquals(3.0, ExprEvaluator.constant(m.states().get(2).initial()));
        double[] u = new Random(5).doubles(n, -2, 2).toArray();
        double[] p = {8};
        for (int k = 0; k < n; k++) {
            // the published formula with 0-based wrap-around (Lorenz 1996)
            double expected = (u[(k + 1) % n] - u[(k - 2 + n) % n]) * u[(k - 1 + n) % n] - u[k] + 8;
            assertEquals(expected, ExprEvaluator.evaluate(m.rates().get(k), 0, u, p, new double[0]), 1e-12);
        }
    }

    @Test
    void boundedRingReadsZeroBeyondItsEnds() {
        int n = 5;
        DynamicalModel m = ring(n, false);
        double[] u = {1, 2, 3, 4, 5};
        // element 1 has neither x[0] nor x[-1]: rate = (x2 - 0) * 0 - x1 + F (zero padding, common practice)
        assertEquals(-1 + 8, ExprEvaluator.evaluate(m.rates().get(0), 0, u, new double[] {8}, new double[0]));
        // element 5: x[6] is outside, rate = (0 - x3) * x4 - x5 + F
        assertEquals(-3 * 4 - 5 + 8, ExprEvaluator.evaluate(m.rates().get(4), 0, u, new double[] {8},
                new double[0]));
    }

    @Test
    void aMillionElementFamilyCostsNoPerElementMemory() {
        DynamicalModel m = ring(1_000_000, true);
        assertEquals(1_000_000, m.dimension());
        assertEquals("x[1000000]", m.states().get(999_999).name());
        assertEquals(1, m.families().size());
    }

    @Test
    void sumsExpandOverTheirRangeAndTablesKeepListedValues() {
        ModelAssembler a = new ModelAssembler("sums", null, new TimeAxis("t", null));
        IndexRange j = new IndexRange("j", 0, 3, false);
        Family c = a.parameterTable("c", j, List.of(new Constant(1), new Constant(2), new Constant(3),
                new Constant(4)), null, null);
        Family y = a.stateFamily("y", new IndexRange("i", 0, 3, false), new Constant(1), null, null);
        Variable total = a.state("total", new Constant(0), null, null);
        a.familyRate(y, new Binary(BinaryOperator.MULTIPLY, new Constant(-1), ModelAssembler.element(y,
                new IndexValue("i"))));
        a.rate(total, new Sum(j, new Binary(BinaryOperator.MULTIPLY, ModelAssembler.element(c, new IndexValue("j")),
                ModelAssembler.element(y, new IndexValue("j")))));
        DynamicalModel m = a.build(List.of(), List.of());
        double[] u = {1, 10, 100, 1000, 0};
        double[] p = {1, 2, 3, 4};
        assertEquals(1 + 20 + 300 + 4000, ExprEvaluator.evaluate(m.rates().get(4), 0, u, p, new double[0]));
        assertEquals("c[2]", m.parameters().get(2).name());
    }

    @Test
    void cyclicShiftSymmetryMapsEachElementToItsNeighbour() {
        ModelAssembler a = new ModelAssembler("shift", null, new TimeAxis("t", null));
        Family x = a.stateFamily("x", new IndexRange("i", 0, 4, true), new Constant(0), null, null);
        a.familyRate(x, ModelAssembler.element(x, plus(1)));
        Symmetry shift = a.symmetry("shift", Map.of(), Map.of("x", ModelAssembler.element(x, plus(1))), false);
        assertEquals("x[0]", ((Variable) shift.images().get(4)).name());
        assertEquals(2, ((Variable) shift.images().get(1)).index());
    }

    @Test
    void aFamilyWithoutARateIsRejected() {
        ModelAssembler a = new ModelAssembler("bad", null, new TimeAxis("t", null));
        a.stateFamily("x", new IndexRange("i", 0, 2, true), new Constant(0), null, null);
        assertThrows(IllegalArgumentException.class, () -> a.build(List.of(), List.of()));
    }
}
