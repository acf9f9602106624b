package org.phasewright.tests.reliability;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.phasewright.language.standalone.PhaseFiles;

/**
 * Fuzzes the checker (parser, linker, validator) in-process with generated and mutated texts, and sends the ones
 * without errors through lowering, compilation and a tiny-budget run of every study (common practice: property
 * checks with a seeded generator; the oracle is {@link FuzzOracle}). Sizes come from system properties so CI runs a
 * modest campaign and the {@code fuzz} profile a large one:
 * {@code phasewright.fuzz.texts} (default 100000, the per-CI-run budget; 400000 in the profile), {@code phasewright.fuzz.runEvery} (send
 * every n-th error-free text down the pipeline, default 6), {@code phasewright.fuzz.seed}. Failing texts are kept in
 * {@code target/fuzz-findings/} to be added to the crasher corpus.
 */
class CheckerFuzzTest {
    @TempDir
    Path scratch;

    @Test
    void everyTextEndsInPositionedProblemsOrANamedOutcome() {
        int count = Integer.getInteger("phasewright.fuzz.texts", 100_000);
        int runEvery = Integer.getInteger("phasewright.fuzz.runEvery", 6);
        long seed = Long.getLong("phasewright.fuzz.seed", 20261202L);
        PhaseTextFuzzer fuzzer = new PhaseTextFuzzer(seed, PhaseTextFuzzer.exampleTexts());
        FuzzOracle oracle = new FuzzOracle(new PhaseFiles(), scratch).listen();
        List<String> findings = new ArrayList<>();
        long start = System.nanoTime();
        int errorFree = 0;
        long slowest = 0;
        int slowestSize = 0;
        for (int i = 0; i < count; i++) {
            String text = fuzzer.next();
            if (i % 5000 == 0 && i > 0) {
                System.out.printf("checker fuzz: %d texts in %.1f s%n", i, (System.nanoTime() - start) / 1e9);
            }
            boolean run = errorFree % runEvery == 0;
            int before = oracle.withErrors.get();
            long t0 = System.nanoTime();
            List<String> wrong = oracle.judge(text, run, errorFree % (runEvery * 20) == 0);
            long took = (System.nanoTime() - t0) / 1_000_000;
            if (took > slowest) {
                slowest = took;
                slowestSize = text.length();
            }
            if (oracle.withErrors.get() == before) {
                errorFree++;
            }
            if (!wrong.isEmpty()) {
                Path kept = FuzzOracle.save(Path.of("target", "fuzz-findings"), "seed" + seed + "-" + i, text);
                findings.add("text " + i + " (kept as " + kept + "): " + wrong.get(0));
            }
        }
        oracle.stopListening();
        double seconds = (System.nanoTime() - start) / 1e9;
        System.out.printf("checker fuzz: seed %d, %.1f s, slowest text %d ms (%d chars), %s%n", seed, seconds,
                slowest, slowestSize, oracle.tally());
        assertTrue(oracle.compiled.get() > 0, "the generator must produce runnable models: " + oracle.tally());
        assertTrue(findings.isEmpty(), findings.size() + " findings, first ones:\n"
                + String.join("\n", findings.subList(0, Math.min(8, findings.size()))));
    }
}
