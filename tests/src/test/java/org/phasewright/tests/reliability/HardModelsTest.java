package org.phasewright.tests.reliability;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.study.AnalysisResult;
import org.phasewright.runtime.study.RunSettings;
import org.phasewright.runtime.study.Status;
import org.phasewright.runtime.study.StudyResult;
import org.phasewright.runtime.study.StudyRunner;

/**
 * Models that blow up in finite time, are stiff, or produce NaN, and runs that are cancelled or run out of steps or
 * wall time: each analysis ends with a named outcome and a message, never an exception or a hang. The closed forms
 * named beside each model say why the outcome is expected. Elapsed-time bounds are generous "no hang" limits only.
 */
class HardModelsTest {
    /** "No hang": far above what any of these runs needs, far below a stuck build. */
    private static final long NO_HANG_MILLIS = 60_000;

    private static StudyResult run(String text, RunSettings settings) {
        CompiledModel model = Models.compile(text);
        Study study = model.model().studies().get(0);
        long start = System.nanoTime();
        StudyResult result = StudyRunner.run(model, study, settings);
        long millis = (System.nanoTime() - start) / 1_000_000;
        assertTrue(millis < NO_HANG_MILLIS, "took " + millis + " ms");
        for (AnalysisResult r : result.results()) {
            assertTrue(r.outcome() != null && !r.outcome().isBlank(), "named outcome: " + r);
            assertTrue(r.message() != null && !r.message().isBlank(), "message: " + r);
            assertNotEquals("INTERNAL_ERROR", r.outcome(), r.message());
        }
        return result;
    }

    private static AnalysisResult only(StudyResult result) {
        assertEquals(1, result.results().size());
        return result.results().get(0);
    }

    @Test
    void finiteTimeBlowUpIsNamedWithItsTime() {
        // x' = x^2, x(0) = 1 has the closed form x = 1/(1 - t): it leaves every bound before t = 1.
        for (String method : List.of("explicit", "high_order", "stiff")) {
            AnalysisResult r = only(run("""
                    model blowup
                    state x = 1
                    rate x = x^2
                    study s { simulate to t = 5 method %s }
                    """.formatted(method), RunSettings.DEFAULT));
            assertEquals(Status.FAILED, r.status(), method + ": " + r.message());
            assertTrue(List.of("BLEW_UP", "STEP_SIZE_UNDERFLOW", "NOT_FINITE").contains(r.outcome()),
                    method + ": " + r.outcome());
            assertTrue(r.message().contains("t = "), "the message gives the time: " + r.message());
        }
    }

    @Test
    void notANumberIsNamed() {
        // x' = sqrt(x - 2) at x = 1: the square root of a negative number is NaN from the first evaluation.
        AnalysisResult r = only(run("""
                model nan
                state x = 1
                rate x = sqrt(x - 2)
                study s { simulate to t = 5 }
                """, RunSettings.DEFAULT));
        assertEquals(Status.FAILED, r.status(), r.message());
        assertTrue(List.of("NOT_FINITE", "STEP_SIZE_UNDERFLOW", "INVALID_INPUT").contains(r.outcome()), r.outcome());
    }

    @Test
    void stiffModelUnderAnExplicitMethodStopsAtTheStepBudget() {
        // Robertson's kinetics (Robertson 1966; Hairer & Wanner, Solving ODEs II, §IV.1): eigenvalues near -1e4
        // force an explicit method to steps of about 1e-4, so 2000 steps cannot reach t = 1e5.
        AnalysisResult r = only(run("""
                model robertson
                state a = 1
                state b = 0
                state c = 0
                rate a = -0.04*a + 1e4*b*c
                rate b = 0.04*a - 1e4*b*c - 3e7*b^2
                rate c = 3e7*b^2
                study s { simulate to t = 1e5 method explicit }
                """, RunSettings.DEFAULT.withMaxSteps(2_000)));
        assertEquals(Status.INCOMPLETE, r.status(), r.message());
        assertEquals("STEP_LIMIT", r.outcome(), r.message());
    }

    @Test
    void wallTimeLimitEndsEveryKindOfAnalysis() {
        // Lorenz (1963) is chaotic and never settles; a long horizon cannot finish within 200 ms.
        StudyResult result = run("""
                model lorenz
                param r = 28
                state x = 1
                state y = 1
                state z = 1
                rate x = 10*(y - x)
                rate y = r*x - y - x*z
                rate z = x*y - 8/3*z
                study s {
                  simulate to t = 1e7
                  section where z = 27 to t = 1e7
                  lyapunov to t = 1e7
                  equilibria
                  follow equilibria in r from 0 to 1e6
                }
                """, RunSettings.DEFAULT.withWallTimeLimit(Duration.ofMillis(200)));
        assertEquals(Status.INCOMPLETE, result.results().get(0).status());
        assertEquals("TIME_LIMIT", result.results().get(0).outcome());
        for (AnalysisResult r : result.results().subList(1, result.results().size())) {
            assertNotEquals(Status.COMPLETED, r.status(), r.toString());
        }
    }

    @Test
    void cancellationIsHonouredPromptly() {
        // The flag turns true after it has been polled 50 times: every analysis must stop by name, not finish.
        AtomicInteger polls = new AtomicInteger();
        StudyResult result = run("""
                model lorenz
                param r = 28
                state x = 1
                state y = 1
                state z = 1
                rate x = 10*(y - x)
                rate y = r*x - y - x*z
                rate z = x*y - 8/3*z
                study s {
                  simulate to t = 1e7
                  lyapunov to t = 1e7
                  equilibria
                }
                """, RunSettings.DEFAULT.withCancellation(() -> polls.incrementAndGet() > 50));
        for (AnalysisResult r : result.results()) {
            assertEquals(Status.INCOMPLETE, r.status(), r.toString());
            assertEquals("CANCELLED", r.outcome(), r.toString());
        }
    }

    @Test
    void hugeAndTinyNumbersDoNotBreakTheRun() {
        // Values at the edge of double range: 1e308 overflows to infinity when doubled.
        StudyResult result = run("""
                model edges
                param big = 1e308
                param tiny = 4.9e-324
                state x = 1e308
                state y = 1e-300
                rate x = big*x + tiny
                rate y = -y/tiny
                study s {
                  simulate to t = 1e300
                  equilibria
                }
                """, RunSettings.DEFAULT.withMaxSteps(10_000).withWallTimeLimit(Duration.ofSeconds(5)));
        assertNotEquals(Status.COMPLETED, result.results().get(0).status());
    }
}
