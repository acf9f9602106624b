package org.phasewright.bench;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;

import org.phasewright.language.lowering.ModelLowering;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.standalone.PhaseFiles;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.integrate.DormandPrince853;
import org.phasewright.runtime.integrate.IntegrationOutcome;
import org.phasewright.runtime.integrate.IntegratorSettings;

/**
 * Integrates the Lorenz model, written in the notation and compiled by the runtime, over [0, 1000] with the
 * 8th-order method, warm and in-process, and prints one line: evaluations, steps and the best and median wall time.
 * Usage: LorenzBenchmark MODEL.phase [END] [RTOL] [ATOL] [REPEATS]
 */
public final class LorenzBenchmark {
    private LorenzBenchmark() {
    }

    public static void main(String[] args) {
        Path file = Path.of(args.length > 0 ? args[0] : "bench/lorenz.phase");
        double end = args.length > 1 ? Double.parseDouble(args[1]) : 1000;
        double rtol = args.length > 2 ? Double.parseDouble(args[2]) : 1e-10;
        double atol = args.length > 3 ? Double.parseDouble(args[3]) : 1e-10;
        int repeats = args.length > 4 ? Integer.parseInt(args[4]) : 20;

        CheckedModel checked = new PhaseFiles().check(file);
        if (checked.hasErrors()) {
            checked.problems().forEach(p -> System.err.println(p));
            System.exit(1);
        }
        CompiledModel model = ModelCompiler.compile(new ModelLowering().lower(checked.ast()));
        IntegratorSettings settings = IntegratorSettings.DEFAULT.withTolerances(rtol, atol)
                .withMaxSteps(100_000_000L);
        DormandPrince853 integrator = new DormandPrince853(model.field(), model.parameters());
        double[] u0 = model.initialState();

        for (int k = 0; k < 5; k++) { // warm-up: let the JIT compile the step loop and the generated rates
            integrator.integrate(0, u0, end, settings, null);
        }
        double[] seconds = new double[repeats];
        IntegrationOutcome last = null;
        for (int k = 0; k < repeats; k++) {
            long start = System.nanoTime();
            last = integrator.integrate(0, u0, end, settings, null);
            seconds[k] = (System.nanoTime() - start) * 1e-9;
        }
        Arrays.sort(seconds);
        double[] u = last.state();
        System.out.printf(Locale.ROOT,
                "phasewright DOP853 (%s backend)  evaluations %d  steps %d (+%d rejected)  best %.4f s  median %.4f s"
                        + "  x(%g) = %.10f%n",
                model.backend(), last.rhsEvaluations(), last.acceptedSteps(), last.rejectedSteps(), seconds[0],
                seconds[repeats / 2], end, u[0]);
    }
}
