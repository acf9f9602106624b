package org.phasewright.tests.reliability;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A share of the fuzz campaign through the command line in-process: `check` on mutated and generated files and
 * `run` on generated models (short horizons, so the default budgets stay small). Exit codes are 0 to 3 only (never
 * the internal-error code 70), and nothing printed is a stack trace. Sizes: {@code phasewright.fuzz.cliChecks}
 * (default 300) and {@code phasewright.fuzz.cliRuns} (default 12).
 */
class CommandLineFuzzTest {
    @TempDir
    Path folder;

    @Test
    void everyCommandEndsWithADocumentedExitCodeAndNoTrace() throws Exception {
        int checks = Integer.getInteger("phasewright.fuzz.cliChecks", 300);
        int runs = Integer.getInteger("phasewright.fuzz.cliRuns", 12);
        long seed = Long.getLong("phasewright.fuzz.seed", 20261202L) + 1;
        PhaseTextFuzzer fuzzer = new PhaseTextFuzzer(seed, PhaseTextFuzzer.exampleTexts());
        List<String> findings = new ArrayList<>();
        for (int i = 0; i < checks + runs; i++) {
            boolean run = i >= checks;
            String text = run ? shortHorizon(fuzzer.generate()) : fuzzer.next();
            Path file = folder.resolve("m" + i + ".phase");
            Files.write(file, text.getBytes(StandardCharsets.UTF_8)); // a lone surrogate becomes '?'
            CliRun result = run ? CliRun.of("run", file.toString(), "--quiet", "--out", folder.resolve("out" + i)
                    .toString()) : CliRun.of("check", file.toString());
            boolean fine = result.exitCode() >= 0 && result.exitCode() <= 3;
            try {
                result.assertNoTrace();
            } catch (AssertionError e) {
                fine = false;
            }
            if (!fine) {
                Path kept = FuzzOracle.save(Path.of("target", "fuzz-findings"), "cli-seed" + seed + "-" + i, text);
                findings.add("text " + i + " (kept as " + kept + "): " + result);
            }
        }
        assertTrue(findings.isEmpty(), findings.size() + " findings:\n"
                + String.join("\n", findings.subList(0, Math.min(5, findings.size()))));
    }

    /** Keeps `run` quick under the default budgets: horizons of at most 20 time units. */
    private static String shortHorizon(String text) {
        return text.replaceAll("(to [A-Za-z_][A-Za-z_0-9]* = )[^ \\n]+", "$15");
    }
}
