package org.phasewright.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Simulation;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.report.ReportWriter;
import org.phasewright.runtime.study.RunSettings;
import org.phasewright.runtime.study.StudyResult;
import org.phasewright.runtime.study.StudyRunner;

/**
 * The ring of {@link RingBenchmark} through the study pipeline: assemble, compile, run a study with one simulation
 * (default settings: 1000 output samples, rtol as given, atol = rtol / 100), write the result files. Prints the wall
 * time of each stage and the peak heap (sum of the peak usage of the heap pools), to be run with -Xmx2g for N = 10^6.
 * MODEL is the `.phase` file of the ring (its study is replaced by the one simulation) or "assembler".
 * Usage: RingPipeline MODEL N END RTOL OUTDIR
 */
public final class RingPipeline {
    private RingPipeline() {
    }

    public static void main(String[] args) throws Exception {
        String source = args[0];
        int n = Integer.parseInt(args[1]);
        double end = Double.parseDouble(args[2]);
        double rtol = Double.parseDouble(args[3]);
        Path folder = Path.of(args[4]);
        Files.createDirectories(folder);

        long t0 = System.nanoTime();
        DynamicalModel ring = RingModels.load(source, n);
        DynamicalModel model = new DynamicalModel(ring.name(), ring.title(), ring.time(), ring.states(),
                ring.parameters(), ring.derived(), ring.rates(), ring.symmetries(), List.of(new Study("pipeline",
                        List.of(new Simulation(new Constant(end), List.of(), new Constant(rtol))))),
                ring.families());
        CompiledModel compiled = ModelCompiler.compile(model);
        long t1 = System.nanoTime();
        StudyResult result = StudyRunner.run(compiled, model.studies().get(0), RunSettings.DEFAULT);
        long t2 = System.nanoTime();
        List<Path> files = ReportWriter.writeAll(result, folder);
        long t3 = System.nanoTime();

        long peak = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                peak += pool.getPeakUsage().getUsed();
            }
        }
        System.out.printf(Locale.ROOT, "pipeline %s N = %d (%s): %s - %s%n", source, n, compiled.backend(),
                result.simulations().get(0).outcome(), result.simulations().get(0).message());
        System.out.printf(Locale.ROOT, "assemble+compile %.2f s, study %.2f s, write %d files %.2f s, total %.2f s;"
                + " max heap %d MiB, peak heap pools %d MiB%n", (t1 - t0) * 1e-9, (t2 - t1) * 1e-9, files.size(),
                (t3 - t2) * 1e-9, (t3 - t0) * 1e-9, Runtime.getRuntime().maxMemory() >> 20, peak >> 20);
    }
}
