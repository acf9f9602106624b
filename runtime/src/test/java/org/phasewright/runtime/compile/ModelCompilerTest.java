package org.phasewright.runtime.compile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.model;
import static org.phasewright.runtime.TestModels.mul;
import static org.phasewright.runtime.TestModels.param;
import static org.phasewright.runtime.TestModels.parameter;
import static org.phasewright.runtime.TestModels.pow;
import static org.phasewright.runtime.TestModels.state;

import java.util.List;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.TestModels;
import org.phasewright.runtime.model.DerivedQuantity;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.StateVariable;

class ModelCompilerTest {

    @Test
    void generatedCodeAgreesWithTheInterpreterOnRandomPoints() {
        // The interpreter is the reference (same expression trees, tree-walking); both use the same Math functions
        // and operation order, so agreement should be to rounding (common practice for code generators).
        for (DynamicalModel m : List.of(TestModels.kitchenSink(), TestModels.lorenz(), TestModels.cubic(0.5),
                TestModels.dampedOscillator(0.2, 3))) {
            CompiledModel compiled = ModelCompiler.compile(m);
            CompiledModel interpreted = ModelCompiler.interpret(m);
            assertEquals(CompiledModel.Backend.GENERATED_CODE, compiled.backend(), String.valueOf(compiled.note()));
            int n = m.dimension();
            int nd = m.derived().size();
            double[] p = compiled.parameters();
            SplittableRandom random = new SplittableRandom(11);
            for (int trial = 0; trial < 200; trial++) {
                double[] u = new double[n];
                for (int i = 0; i < n; i++) {
                    u[i] = random.nextDouble(-2, 2);
                }
                double t = random.nextDouble(0, 10);
                assertClose(eval(compiled, t, u, p, 0), eval(interpreted, t, u, p, 0), m.name() + " rates");
                assertClose(eval(compiled, t, u, p, 1), eval(interpreted, t, u, p, 1), m.name() + " jacobian");
                double[] d1 = new double[nd], d2 = new double[nd];
                compiled.derivedValues().derived(t, u, p, d1);
                interpreted.derivedValues().derived(t, u, p, d2);
                assertClose(d1, d2, m.name() + " derived");
            }
        }
    }

    private static double[] eval(CompiledModel m, double t, double[] u, double[] p, int what) {
        int n = m.dimension();
        double[] out = new double[what == 0 ? n : n * n];
        java.util.Arrays.fill(out, Double.NaN); // the Jacobian must overwrite zeros too
        if (what == 0) {
            m.field().rates(t, u, p, out);
        } else {
            m.field().jacobian(t, u, p, out);
        }
        return out;
    }

    private static void assertClose(double[] a, double[] b, String what) {
        for (int i = 0; i < a.length; i++) {
            if (Double.isNaN(b[i])) {
                assertTrue(Double.isNaN(a[i]), what + "[" + i + "]");
            } else {
                assertEquals(b[i], a[i], 1e-13 * Math.max(1, Math.abs(b[i])), what + "[" + i + "]");
            }
        }
    }

    @Test
    void smallIntegerPowersBecomeMultiplications() {
        DynamicalModel m = model("powers", List.of(TestModels.stateVar("x", 1)), List.of(parameter("a", c(2.5))),
                List.of(), List.of(TestModels.add(pow(state(0, "x"), c(3)), pow(state(0, "x"), param(0, "a")))));
        String source = ModelCompiler.compile(m).generatedSource();
        assertTrue(source.contains("pw3(u[0])"), source);
        assertTrue(source.contains("return x * x * x;"), source);
        // A parameter exponent is not known at compile time, so it keeps the general power function.
        assertTrue(source.contains("Arithmetic.power(u[0], p[0])"), source);
    }

    @Test
    void modelTextCannotInjectCode() {
        String evil = "x */ } static { System.exit(3); } /* \\u000a System.exit(4); \n System.exit(5);";
        DynamicalModel m = new DynamicalModel(evil, evil, org.phasewright.runtime.model.TimeAxis.DEFAULT,
                List.of(new StateVariable(evil, c(1), null, null)), List.of(parameter(evil, c(2))),
                List.of(new DerivedQuantity(evil, mul(param(0, evil), state(0, evil)), null)),
                List.of(TestModels.neg(TestModels.let(0, evil))), List.of(), List.of());
        CompiledModel compiled = ModelCompiler.compile(m);
        assertEquals(CompiledModel.Backend.GENERATED_CODE, compiled.backend(), String.valueOf(compiled.note()));
        // Names may only appear inside line comments, sanitised; no code outside comments may mention them.
        for (String line : compiled.generatedSource().split("\n")) {
            int comment = line.indexOf("//");
            String code = comment < 0 ? line : line.substring(0, comment);
            assertFalse(code.contains("System") || code.contains("static {"), line);
        }
        assertFalse(compiled.generatedSource().contains("\\"), compiled.generatedSource());
        double[] dudt = new double[1];
        compiled.field().rates(0, new double[] {3}, compiled.parameters(), dudt);
        assertEquals(-6, dudt[0]);
    }

    @Test
    void timeDependenceIsDetectedThroughDerivedQuantities() {
        DynamicalModel forced = model("forced", List.of(TestModels.stateVar("x", 0)), List.of(),
                List.of(new DerivedQuantity("drive", TestModels.call(org.phasewright.runtime.model.MathFunction.SIN,
                        TestModels.time()), null)),
                List.of(TestModels.sub(TestModels.let(0, "drive"), state(0, "x"))));
        assertFalse(ModelCompiler.compile(forced).autonomous());
        assertTrue(ModelCompiler.compile(TestModels.lorenz()).autonomous());
    }
}
