package org.phasewright.tests.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.phasewright.language.standalone.CheckedModel;
import org.phasewright.language.standalone.PhaseFiles;
import org.phasewright.language.standalone.Problem;
import org.phasewright.language.validation.ExpressionDepth;

/**
 * Texts that once crashed or hung a part of the tool chain, kept under {@code src/test/resources/crashers/}: each is
 * checked in-process (the fuzzing oracle, including a tiny-budget run when it has no errors) and through the command
 * line. Add a file there for every new finding. Also the nesting-depth rule at and around its limit.
 */
class CrasherCorpusTest {
    @TempDir
    Path scratch;

    static List<Path> corpus() throws IOException, URISyntaxException {
        Path folder = Path.of(CrasherCorpusTest.class.getResource("/crashers").toURI());
        try (Stream<Path> files = Files.list(folder)) {
            return files.filter(f -> f.toString().endsWith(".phase")).sorted().toList();
        }
    }

    @Test
    void everyPastCrasherEndsInPositionedProblemsOrANamedOutcome() throws Exception {
        List<Path> files = corpus();
        assertTrue(files.size() >= 10, "the corpus is missing: " + files);
        FuzzOracle oracle = new FuzzOracle(new PhaseFiles(), scratch).listen();
        try {
            for (Path f : files) {
                String text = Files.readString(f, StandardCharsets.UTF_8);
                List<String> wrong = oracle.judge(text, true, true);
                assertTrue(wrong.isEmpty(), f.getFileName() + ": " + wrong);
                CliRun check = CliRun.of("check", f.toString());
                assertTrue(check.exitCode() == 0 || check.exitCode() == 1, f.getFileName() + ": " + check);
                check.assertNoTrace();
            }
        } finally {
            oracle.stopListening();
        }
    }

    @Test
    void nestingUpToTheLimitRunsAndBeyondItIsAPositionedError() {
        // A sum of n terms is n - 1 additions deep, plus the rate law itself.
        String ok = "model m\nstate x = 1\nrate x = -(" + PhaseTextFuzzer.chain("x", ExpressionDepth.MAX_DEPTH - 3, "+")
                + ")/1000\nstudy s { simulate to t = 1 }\n";
        CheckedModel fine = Models.check(ok);
        assertFalse(fine.hasErrors(), fine.problems().toString());
        FuzzOracle oracle = new FuzzOracle(new PhaseFiles(), null);
        assertEquals(List.of(), oracle.judge(ok, true, false));
        assertEquals(1, oracle.studiesRun.get());

        String deep = "model m\nstate x = 1\nrate x = 2*x\nrate x = " + PhaseTextFuzzer.chain("x",
                ExpressionDepth.MAX_DEPTH + 5, "*") + "\n";
        CheckedModel rejected = Models.check(deep);
        Problem p = rejected.problems().stream().filter(q -> ExpressionDepth.TOO_DEEP.equals(q.code())).findFirst()
                .orElseThrow(() -> new AssertionError(rejected.problems().toString()));
        assertTrue(p.isError());
        assertEquals(4, p.line());
        assertEquals(10, p.column());
    }

    @Test
    void emfGenericConstraintsAreOffBecauseTheyAreQuadraticOnDeepNesting() {
        // EMF's EObjectValidator looks up the resource from every object by walking up its containers: 100,000
        // nested minus signs took 33 s to check with it (measured); the parser and linking report what it would.
        new org.phasewright.language.PhaseStandaloneSetup().createInjectorAndDoEMFRegistration();
        org.eclipse.emf.ecore.EValidator validator = org.eclipse.emf.ecore.EValidator.Registry.INSTANCE
                .getEValidator(org.phasewright.language.phase.PhasePackage.eINSTANCE);
        assertTrue(validator instanceof org.eclipse.xtext.validation.CompositeEValidator composite
                && !composite.isUseEObjectValidator(), String.valueOf(validator));
    }

    @Test
    void absurdNestingIsAnErrorNotACrash() {
        // Far beyond the depth limit; parentheses alone add no depth to the model (the parser, on its large stack,
        // reads them), while minuses and calls do and are reported at a position.
        int[] depths = { 100_000, 100_000, 20_000 };
        for (int style = 0; style < 3; style++) {
            long start = System.nanoTime();
            String text = "model m\nstate x = 1\nrate x = " + PhaseTextFuzzer.nested("x", depths[style], style) + "\n";
            CheckedModel checked = Models.check(text);
            assertTrue(style == 0 || checked.hasErrors(), "style " + style);
            for (Problem p : checked.problems()) {
                assertTrue(p.line() >= 1 && p.column() >= 1, p.toString());
            }
            System.out.printf("nesting style %d, depth %d: %d ms%n", style, depths[style],
                    (System.nanoTime() - start) / 1_000_000);
        }
    }
}
