package org.phasewright.runtime.lyapunov;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.add;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.mul;
import static org.phasewright.runtime.TestModels.neg;
import static org.phasewright.runtime.TestModels.param;
import static org.phasewright.runtime.TestModels.parameter;
import static org.phasewright.runtime.TestModels.state;
import static org.phasewright.runtime.TestModels.stateVar;
import static org.phasewright.runtime.TestModels.sub;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.TestModels;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.integrate.IntegratorSettings;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Variable;

public class LyapunovSpectrumTest {

    /** Rössler (1976), Phys. Lett. A 57:397: x' = -y - z, y' = x + a y, z' = b + z (x - c). */
    public static DynamicalModel rossler(double a, double b, double cc) {
        Variable x = state(0, "x"), y = state(1, "y"), z = state(2, "z");
        Variable pa = param(0, "a"), pb = param(1, "b"), pc = param(2, "c");
        return TestModels.model("rossler", List.of(stateVar("x", 1), stateVar("y", 1), stateVar("z", 1)),
                List.of(parameter("a", c(a)), parameter("b", c(b)), parameter("c", c(cc))), List.of(),
                List.of(sub(neg(y), z), add(x, mul(pa, y)), add(pb, mul(z, sub(x, pc)))));
    }

    static LyapunovOutcome spectrum(DynamicalModel model, double endTime, double rtol) {
        CompiledModel compiled = ModelCompiler.compile(model);
        return new LyapunovSpectrum(compiled.field(), compiled.parameters()).compute(compiled.initialState(),
                endTime, IntegratorSettings.DEFAULT.withTolerances(rtol, rtol * 1e-2));
    }

    @Test
    void lorenzSpectrumMatchesPublishedValues() {
        LyapunovOutcome o = spectrum(TestModels.lorenz(), 1000, 1e-9);
        assertTrue(o.integration().completed());
        double[] l = o.exponents();
        // Sprott, Chaos and Time-Series Analysis (Oxford 2003), Lorenz σ = 10, r = 28, b = 8/3:
        // 0.9056, 0, -14.5723. A finite-time estimate over T = 1000 fluctuates by about 0.01 (common practice).
        assertEquals(0.9056, l[0], 0.02);
        assertEquals(0.0, l[1], 0.01);
        assertEquals(-14.5723, l[2], 0.03);
        // The exponents sum to the mean divergence, here the constant -(σ + 1 + b) = -41/3 (Lorenz 1963, eq. 29),
        // exactly up to integration error: log det Φ(T) = ∫ tr J dt (Liouville's formula).
        assertEquals(-41.0 / 3, o.sum(), 1e-6);
        assertEquals(-41.0 / 3, o.meanDivergence(), 1e-9);
        assertTrue(o.converged(), "largest change " + o.largestChange());
        assertTrue(o.historyTimes().length > 100);
    }

    @Test
    void rosslerLeadingExponentMatchesPublishedValue() {
        LyapunovOutcome o = spectrum(rossler(0.2, 0.2, 5.7), 20000, 1e-9);
        double[] l = o.exponents();
        // Sprott 2003, Rössler a = b = 0.2, c = 5.7: exponents 0.0714, 0, -5.3943.
        assertEquals(0.0714, l[0], 0.004);
        assertEquals(0.0, l[1], 0.003);
        assertEquals(-5.3943, l[2], 0.02);
        // Sum = mean of tr J = a + (x - c) along the orbit (Liouville's formula), up to the integration error
        // of two different quantities over 20000 time units (observed 1e-6).
        assertEquals(o.meanDivergence(), o.sum(), 1e-5);
        assertTrue(o.converged(), "largest change " + o.largestChange());
    }

    @Test
    void linearSystemHasItsEigenvaluesAsExponents() {
        // x' = -x, y' = -3y: the exponents of a linear system are the real parts of its eigenvalues
        // (closed form: Φ(t) = diag(e^-t, e^-3t)).
        Variable x = state(0, "x"), y = state(1, "y");
        DynamicalModel linear = TestModels.model("linear", List.of(stateVar("x", 1), stateVar("y", 1)), List.of(),
                List.of(), List.of(neg(x), mul(c(-3), y)));
        LyapunovOutcome o = spectrum(linear, 50, 1e-10);
        assertEquals(-1.0, o.exponents()[0], 1e-7);
        assertEquals(-3.0, o.exponents()[1], 1e-7);
    }

    @Test
    void convergenceCheckFlagsARunTooShortForItsTransient() {
        // x' = -2x, y' = 100x - y: Φ(t)e1 = (e^-2t, 100(e^-t - e^-2t)), so the leading estimate is
        // -1 + ln(100)/t to leading order (closed form): it has moved by about ln(100)/10 ≈ 0.46 between t = 5 and
        // t = 10, but only by ln(100)/4000 ≈ 0.001 between t = 2000 and 4000.
        Variable x = state(0, "x"), y = state(1, "y");
        DynamicalModel sheared = TestModels.model("sheared", List.of(stateVar("x", 1), stateVar("y", 0)), List.of(),
                List.of(), List.of(mul(c(-2), x), sub(mul(c(100), x), y)));
        LyapunovOutcome shortRun = spectrum(sheared, 10, 1e-10);
        assertTrue(!shortRun.converged(), "change " + shortRun.largestChange());
        assertEquals(-1 + Math.log(100) / 10, shortRun.exponents()[0], 0.01);
        LyapunovOutcome longRun = spectrum(sheared, 4000, 1e-10);
        assertTrue(longRun.converged(), "change " + longRun.largestChange());
        assertEquals(-1 + Math.log(100) / 4000, longRun.exponents()[0], 1e-3);
        assertEquals(-3.0, longRun.sum(), 1e-8); // trace of the constant Jacobian
    }
}
