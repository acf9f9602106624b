package org.phasewright.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.phasewright.language.lowering.ModelLowering;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.standalone.PhaseFiles;
import org.phasewright.runtime.model.DynamicalModel;

/** The ring of the benchmarks: from a `.phase` file with {@code param N} replaced, or built with the assembler. */
final class RingModels {
    private RingModels() {
    }

    /**
     * @param source a `.phase` file (its {@code param N = ...} line is replaced by {@code n}), or "assembler"
     */
    static DynamicalModel load(String source, int n) throws IOException {
        if (source.equals("assembler")) {
            return RingBenchmark.ring(n, 8.0);
        }
        String text = Files.readString(Path.of(source)).replaceFirst("(?m)^param N = [0-9]+", "param N = " + n);
        Path copy = Files.createTempFile("ring-" + n + "-", ".phase");
        try {
            Files.writeString(copy, text);
            CheckedModel checked = new PhaseFiles().check(copy);
            if (checked.hasErrors()) {
                checked.problems().forEach(System.err::println);
                throw new IllegalArgumentException(source + " has errors");
            }
            return new ModelLowering().lower(checked.ast());
        } finally {
            Files.deleteIfExists(copy);
        }
    }
}
