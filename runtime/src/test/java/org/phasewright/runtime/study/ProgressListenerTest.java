package org.phasewright.runtime.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.simulation;
import static org.phasewright.runtime.TestModels.study;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.TestModels;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.model.LyapunovExponents;

/** Long analyses tell a listener how much of the simulated time is done, without changing their results. */
class ProgressListenerTest {
    record Heard(String task, double fraction) {
    }

    @Test
    void simulationAndLyapunovReportRisingFractionsUpToOne() {
        List<Heard> heard = new ArrayList<>();
        var model = ModelCompiler.compile(TestModels.lorenz());
        var s = study("long", simulation(30), new LyapunovExponents(c(50), null));
        StudyResult with = StudyRunner.run(model, s, RunSettings.DEFAULT.withProgress(
                (task, fraction) -> heard.add(new Heard(task, fraction))));

        List<Heard> simulate = heard.stream().filter(h -> h.task().equals("simulate to t = 30")).toList();
        List<Heard> lyapunov = heard.stream().filter(h -> h.task().equals("lyapunov to t = 50")).toList();
        assertEquals(heard.size(), simulate.size() + lyapunov.size(), heard.toString());
        for (List<Heard> run : List.of(simulate, lyapunov)) {
            assertTrue(run.size() > 10, "heard " + run.size() + " times");
            assertTrue(run.size() <= 1001, "throttled to about a thousand calls, got " + run.size());
            for (int k = 1; k < run.size(); k++) {
                assertTrue(run.get(k).fraction() > run.get(k - 1).fraction(), "rising");
            }
            assertEquals(1.0, run.get(run.size() - 1).fraction());
        }

        // Listening changes nothing in the numbers.
        StudyResult without = StudyRunner.run(model, s, RunSettings.DEFAULT);
        assertEquals(without.simulations().get(0).integration().acceptedSteps(),
                with.simulations().get(0).integration().acceptedSteps());
        assertEquals(without.lyapunovSpectra().get(0).spectrum().exponents()[0],
                with.lyapunovSpectra().get(0).spectrum().exponents()[0]);
    }
}
