package org.phasewright.bench;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

import org.phasewright.runtime.assemble.ModelAssembler;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.integrate.ExplicitMethod;
import org.phasewright.runtime.integrate.IntegrationOutcome;
import org.phasewright.runtime.integrate.Integrator;
import org.phasewright.runtime.integrate.IntegratorSettings;
import org.phasewright.runtime.integrate.TiledDormandPrince54;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.MathFunction;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.model.Variable;

/**
 * The Lorenz (1996) ring of N forced cells, dx_i/dt = (x_{i+1} - x_{i-2}) x_{i-1} - x_i + F (cyclic, F = 8, x_i(0) =
 * F + 0.01 sin(i), i = 1..N), integrated over [0, END] by the runtime's Dormand–Prince 5(4) ("explicit") at the given
 * tolerances. Prints the compile time, the first (cold: JIT warm-up included) integration and the best and median of
 * REPEATS warm ones, then writes the final state as raw little-endian doubles to OUT for comparison. MODEL is the
 * `.phase` file of the ring (bench/ring/ring.phase, with N replaced) or "assembler" to build it in Java.
 * Usage: RingBenchmark MODEL N END RTOL ATOL REPEATS OUT
 */
public final class RingBenchmark {
    private RingBenchmark() {
    }

    public static void main(String[] args) throws IOException {
        String source = args[0];
        int n = Integer.parseInt(args[1]);
        double end = Double.parseDouble(args[2]);
        double rtol = Double.parseDouble(args[3]);
        double atol = Double.parseDouble(args[4]);
        int repeats = Integer.parseInt(args[5]);
        Path out = Path.of(args[6]);

        long start = System.nanoTime();
        CompiledModel model = ModelCompiler.compile(RingModels.load(source, n));
        double compileSeconds = (System.nanoTime() - start) * 1e-9;
        IntegratorSettings settings = IntegratorSettings.DEFAULT.withTolerances(rtol, atol).withMaxSteps(100_000_000L);
        // what a study's explicit method runs: tile by tile on all processors for a lattice this large
        int workers = Runtime.getRuntime().availableProcessors();
        Integrator integrator = ExplicitMethod.create(model, model.parameters(), workers);
        String method = integrator instanceof TiledDormandPrince54
                ? "tiled, " + workers + (workers == 1 ? " worker" : " workers")
                : "whole state";
        double[] u0 = model.initialState();

        start = System.nanoTime();
        IntegrationOutcome cold = integrator.integrate(0, u0, end, settings, null);
        double coldSeconds = (System.nanoTime() - start) * 1e-9;
        double[] seconds = new double[repeats];
        IntegrationOutcome last = cold;
        for (int k = 0; k < repeats; k++) {
            start = System.nanoTime();
            last = integrator.integrate(0, u0, end, settings, null);
            seconds[k] = (System.nanoTime() - start) * 1e-9;
        }
        Arrays.sort(seconds);
        System.out.printf(Locale.ROOT, "phasewright DP54 (%s, %s, %s, N = %d): %s; evaluations %d, steps %d (+%d rejected);"
                + " compile %.3f s, cold %.4f s (JIT warm-up included), warm best %.4f s, median %.4f s%n",
                source.equals("assembler") ? "assembled" : "notation", model.backend(), method, n, last.ending(), last.rhsEvaluations(), last.acceptedSteps(), last.rejectedSteps(),
                compileSeconds, coldSeconds, seconds[0], seconds[repeats / 2]);
        System.out.printf(Locale.ROOT, "phasewright-warm-median %.6f%n", seconds[repeats / 2]);
        System.out.printf(Locale.ROOT, "phasewright-cold %.6f%n", coldSeconds);
        ByteBuffer bytes = ByteBuffer.allocate(8 * n).order(ByteOrder.LITTLE_ENDIAN);
        bytes.asDoubleBuffer().put(last.state());
        Files.write(out, bytes.array());
    }

    /** The ring, built with the model assembler (the same model the notation's indexed declarations lower to). */
    static DynamicalModel ring(int n, double forcing) {
        ModelAssembler a = new ModelAssembler("ring", "Lorenz-96 ring of " + n + " cells", new TimeAxis("t", null));
        Variable f = a.parameter("F", new Constant(forcing), null, null, null);
        IndexValue i = new IndexValue("i");
        Expr initial = new Binary(BinaryOperator.ADD, f, new Binary(BinaryOperator.MULTIPLY, new Constant(0.01),
                new Call(MathFunction.SIN, List.of(i))));
        Family x = a.stateFamily("x", new IndexRange("i", 1, n, true), initial, null, null);
        Expr law = new Binary(BinaryOperator.ADD,
                new Binary(BinaryOperator.SUBTRACT,
                        new Binary(BinaryOperator.MULTIPLY,
                                new Binary(BinaryOperator.SUBTRACT, at(x, 1), at(x, -2)), at(x, -1)),
                        at(x, 0)),
                f);
        a.familyRate(x, law);
        return a.build(List.of(), List.of());
    }

    private static Expr at(Family x, int offset) {
        Expr index = offset == 0 ? new IndexValue("i")
                : new Binary(BinaryOperator.ADD, new IndexValue("i"), new Constant(offset));
        return ModelAssembler.element(x, index);
    }
}
