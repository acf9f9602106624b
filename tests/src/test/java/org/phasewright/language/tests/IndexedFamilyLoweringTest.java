package org.phasewright.language.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Random;

import org.eclipse.xtext.testing.InjectWith;
import org.eclipse.xtext.testing.extensions.InjectionExtension;
import org.eclipse.xtext.testing.util.ParseHelper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.ExtendWith;
import org.phasewright.language.lowering.ModelLowering;
import org.phasewright.language.phase.PhaseModel;
import org.phasewright.runtime.model.Basins;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.EquilibriumContinuation;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.LyapunovExponents;
import org.phasewright.runtime.model.LyapunovMap;
import org.phasewright.runtime.model.Simulation;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;
import org.phasewright.runtime.symbolic.ExprEvaluator;
import org.phasewright.runtime.symbolic.InitialValues;
import org.phasewright.runtime.symbolic.ParameterValues;

import com.google.inject.Inject;

/** Indexed families lower to runtime families whose flat expansion is the model written element by element. */
@ExtendWith(InjectionExtension.class)
@InjectWith(PhaseInjectorProvider.class)
class IndexedFamilyLoweringTest {

    @Inject
    private ParseHelper<PhaseModel> parser;

    private DynamicalModel lower(String text) throws Exception {
        return new ModelLowering().lower(parser.parse(text));
    }

    /** Every rate at state u, with params at their values and lets evaluated in order. */
    private static double[] rates(DynamicalModel model, double[] u) {
        double[] p = ParameterValues.resolve(model);
        double[] d = derived(model, u, p);
        double[] f = new double[model.dimension()];
        for (int k = 0; k < f.length; k++) {
            f[k] = ExprEvaluator.evaluate(model.rates().get(k), 0, u, p, d);
        }
        return f;
    }

    private static double[] derived(DynamicalModel model, double[] u, double[] p) {
        double[] d = new double[model.derived().size()];
        for (int k = 0; k < d.length; k++) {
            d[k] = ExprEvaluator.evaluate(model.derived().get(k).definition(), 0, u, p, d);
        }
        return d;
    }

    @Test
    void ringExampleIsLorenz96() throws Exception {
        DynamicalModel model = lower(Files.readString(Path.of(System.getProperty("phasewright.examples"),
                "ring-lattice.phase")));
        int n = 40;
        assertEquals(n, model.dimension());
        assertEquals("x[1]", model.states().get(0).name());
        assertEquals("x[40]", model.states().get(n - 1).name());
        Random random = new Random(96);
        double[] u = new double[n];
        for (int k = 0; k < n; k++) {
            u[k] = 8 + 4 * random.nextGaussian();
        }
        double forcing = 8;
        double[] f = rates(model, u);
        for (int k = 0; k < n; k++) {
            // Lorenz (1996), "Predictability - a problem partly solved":
            // dx_i/dt = (x_{i+1} - x_{i-2}) x_{i-1} - x_i + F, indices cyclic.
            double expected = (u[(k + 1) % n] - u[(k - 2 + n) % n]) * u[(k - 1 + n) % n] - u[k] + forcing;
            assertEquals(expected, f[k], 1e-12 * Math.max(1, Math.abs(expected)), "rate of x[" + (k + 1) + "]");
        }
        // Initial values by formula of the index: forcing + 0.01 sin(i) (closed form).
        double[] initial = InitialValues.resolve(model, ParameterValues.resolve(model));
        assertEquals(8 + 0.01 * Math.sin(7), initial[6], 1e-15);
        // The family keeps the law over the index for compilers; the let `energy` is sum(j, x[j]^2)/2 (closed form).
        Family x = model.families(VariableKind.STATE).get(0);
        assertEquals("x", x.name());
        assertEquals(n, x.size());
        assertTrue(x.range().cyclic());
        double energy = 0;
        for (double v : u) {
            energy += v * v / 2;
        }
        assertEquals(energy, derived(model, u, ParameterValues.resolve(model))[0], 1e-9 * energy);
        // The shift x[i] -> x[i+1] sends x[40] to x[1] on the cyclic ring.
        assertEquals(new Variable(VariableKind.STATE, 0, "x[1]"), model.symmetries().get(0).images().get(n - 1));
        // lyapunov to t = 50 leading 3
        LyapunovExponents lyapunov = assertInstanceOf(LyapunovExponents.class,
                model.studies().get(0).analyses().get(1));
        assertEquals(3, lyapunov.leading());
    }

    @Test
    void boundedIndexReadsZeroOutsideItsRange() throws Exception {
        DynamicalModel model = lower("""
                model chain
                index k in 1 .. 4 bounded
                state a[k] = 0
                rate a[k] = a[k-1] + 10 * a[k+1]
                """);
        double[] u = { 1, 2, 3, 4 };
        double[] f = rates(model, u);
        // a[0] and a[5] read as 0 (the bounded convention of the notation): rates 0 + 20, 1 + 30, 2 + 40, 3 + 0.
        assertEquals(20, f[0], 0);
        assertEquals(31, f[1], 0);
        assertEquals(42, f[2], 0);
        assertEquals(3, f[3], 0);
    }

    @Test
    void sumsAndTablesByFormulaAndByList() throws Exception {
        DynamicalModel model = lower("""
                model tables
                param N = 4
                index i in 1 .. N cyclic
                index j in 1 .. N cyclic
                param gain[i] = 1 + 0.1 * i
                param weight[i] = [0.5, 1, 2, 1]
                state x[i] = i
                let flux[i] = x[i+1] - x[i]
                let total = sum(j, weight[j] * x[j])
                rate x[i] = gain[i] * flux[i] - total
                """);
        assertEquals(List.of("N", "gain[1]", "gain[2]", "gain[3]", "gain[4]", "weight[1]", "weight[2]", "weight[3]",
                "weight[4]"), model.parameters().stream().map(p -> p.name()).toList());
        double[] p = ParameterValues.resolve(model);
        assertEquals(1.3, p[3], 1e-15); // gain[3] = 1 + 0.1*3 (closed form)
        assertEquals(2.0, p[7], 0); // weight[3], listed
        double[] u = InitialValues.resolve(model, p);
        assertEquals(List.of(1.0, 2.0, 3.0, 4.0), List.of(u[0], u[1], u[2], u[3]));
        double[] f = rates(model, u);
        double total = 0.5 * 1 + 1 * 2 + 2 * 3 + 1 * 4; // sum over j of weight[j] x[j] (closed form)
        double[] flux = { 1, 1, 1, 1 - 4 }; // cyclic: x[5] is x[1]
        for (int k = 0; k < 4; k++) {
            assertEquals((1 + 0.1 * (k + 1)) * flux[k] - total, f[k], 1e-12, "rate of x[" + (k + 1) + "]");
        }
        assertNull(model.families(VariableKind.PARAMETER).get(1).formula(), "a listed table has no formula");
    }

    @Test
    void newStudyRequestsLowerToTheirRecords() throws Exception {
        DynamicalModel model = lower("""
                model m
                param r = 1
                param c = 2
                state a = 0
                state b = 1
                rate a = r * b - a
                rate b = c - a * b
                study s {
                  lyapunov to t = 50 leading 1 tolerance 1e-8
                  lyapunov map over r from 4 to 10 steps 12 and c from 0 to 1 steps 6 until t = 40
                  basins over a from -2 to 2 steps 40 and b from -1 to 3 steps 20 until t = 30 tolerance 1e-6
                }
                """);
        Study study = model.studies().get(0);
        LyapunovExponents lyapunov = assertInstanceOf(LyapunovExponents.class, study.analyses().get(0));
        assertEquals(1, lyapunov.leading());
        assertEquals(1e-8, ExprEvaluator.constant(lyapunov.tolerance()), 0);
        LyapunovMap map = assertInstanceOf(LyapunovMap.class, study.analyses().get(1));
        assertEquals(new Variable(VariableKind.PARAMETER, 0, "r"), map.first().variable());
        assertEquals(new Variable(VariableKind.PARAMETER, 1, "c"), map.second().variable());
        assertEquals(12, map.first().steps());
        assertEquals(6, map.second().steps());
        assertEquals(40, ExprEvaluator.constant(map.endTime()), 0);
        assertNull(map.tolerance());
        Basins basins = assertInstanceOf(Basins.class, study.analyses().get(2));
        assertEquals(new Variable(VariableKind.STATE, 1, "b"), basins.second().variable());
        assertEquals(-1, ExprEvaluator.constant(basins.second().from()), 0);
        assertEquals(1e-6, ExprEvaluator.constant(basins.tolerance()), 0);
        // Without `leading` the whole spectrum (0).
        assertEquals(0, assertInstanceOf(LyapunovExponents.class,
                lower("model m\nstate x = 1\nrate x = -x\nstudy s { lyapunov to t = 5 }\n").studies().get(0)
                        .analyses().get(0)).leading());
    }

    @Test
    void scalarsAfterFamiliesLandAfterTheirElements() throws Exception {
        DynamicalModel model = lower("""
                model mixed
                index i in 1 .. 3 cyclic
                param k = 2
                state x[i] = 0
                state y = 5
                rate x[i] = y - x[i]
                rate y = -k * y + sum(i, x[i])
                study s {
                  follow equilibria in k from 1 to 3
                }
                """);
        assertEquals(List.of("x[1]", "x[2]", "x[3]", "y"), model.states().stream().map(s -> s.name()).toList());
        double[] f = rates(model, new double[] { 1, 2, 3, 4 });
        assertEquals(3, f[0], 0); // y - x[1]
        assertEquals(-2 * 4 + 6, f[3], 0); // -k y + (1 + 2 + 3)
        assertEquals(new Variable(VariableKind.PARAMETER, 0, "k"), assertInstanceOf(EquilibriumContinuation.class,
                model.studies().get(0).analyses().get(0)).parameter());
    }

    @Test
    void studySettingsReadElementsAsScalars() throws Exception {
        DynamicalModel model = lower("""
                model m
                index i in 1 .. 3 bounded
                state x[i] = i
                rate x[i] = -x[i]
                study s {
                  simulate to t = 5 until x[2] = 1
                }
                """);
        Simulation simulation = assertInstanceOf(Simulation.class, model.studies().get(0).analyses().get(0));
        // `until x[2] = 1` stops where x[2] - 1 changes sign; x[2] is flat state 1.
        assertEquals(new Binary(BinaryOperator.SUBTRACT, new Variable(VariableKind.STATE, 1, "x[2]"), new Constant(1)),
                simulation.stop().surface());
    }

    @Test
    void millionCellRingLowersWithoutExpanding() throws Exception {
        DynamicalModel model = lower("""
                model ring
                param N = 1000000
                param forcing = 8
                index i in 1 .. N cyclic
                state x[i] = forcing
                rate x[i] = (x[i+1] - x[i-2]) * x[i-1] - x[i] + forcing
                """);
        assertEquals(1_000_000, model.dimension());
        // One element, expanded on demand: x[1] reads x[2], x[1000000] and x[999999] on the cyclic ring.
        double[] u = new double[1_000_000];
        u[1] = 3;
        u[999_999] = 2;
        u[999_998] = 1;
        double rate = ExprEvaluator.evaluate(model.rates().get(0), 0, u, new double[] { 1_000_000, 8 }, new double[0]);
        assertEquals((3 - 1) * 2 - 0 + 8, rate, 0); // Lorenz (1996) form at i = 1
    }
}
