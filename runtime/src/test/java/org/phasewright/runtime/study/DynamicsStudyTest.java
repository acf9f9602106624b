package org.phasewright.runtime.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.equilibria;
import static org.phasewright.runtime.TestModels.state;
import static org.phasewright.runtime.TestModels.study;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.phasewright.runtime.TestModels;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.lyapunov.LyapunovSpectrumTest;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.IntegrationMethod;
import org.phasewright.runtime.model.LyapunovExponents;
import org.phasewright.runtime.model.Section;
import org.phasewright.runtime.model.Simulation;
import org.phasewright.runtime.model.StopCondition;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.report.ReportWriter;

/** Sections, Lyapunov exponents, methods and polynomial equilibria through the study runner and report writer. */
class DynamicsStudyTest {
    @TempDir
    Path folder;

    @Test
    void rosslerEquilibriaMatchTheClosedFormAndComeFromTheHomotopy() {
        // Rössler (1976), a = b = 0.2, c = 5.7: equilibria x = (c ± √(c² − 4ab))/2, y = −x/a, z = x/a.
        double a = 0.2, b = 0.2, cc = 5.7;
        Study s = study("eq", equilibria());
        DynamicalModel rossler = LyapunovSpectrumTest.rossler(a, b, cc);
        StudyResult r = StudyRunner.run(ModelCompiler.compile(rossler), s, RunSettings.DEFAULT);
        EquilibriumResult eq = r.equilibriumSearches().get(0);
        assertTrue(eq.message().endsWith("homotopy: 2 paths, 2 finite, 2 real"), eq.message());
        List<Equilibrium> list = eq.equilibria().stream()
                .sorted(Comparator.comparingDouble(e -> e.coordinates()[0])).toList();
        assertEquals(2, list.size());
        double root = Math.sqrt(cc * cc - 4 * a * b);
        double[] xs = {(cc - root) / 2, (cc + root) / 2};
        for (int k = 0; k < 2; k++) {
            double[] q = list.get(k).coordinates();
            assertEquals(xs[k], q[0], 1e-10);
            assertEquals(-xs[k] / a, q[1], 1e-9);
            assertEquals(xs[k] / a, q[2], 1e-9);
            Equilibrium e = list.get(k);
            assertEquals(3, e.classification().stableDimension() + e.classification().unstableDimension());
        }
    }

    @Test
    void sectionAndLyapunovWriteTheirFiles() throws Exception {
        Section section = new Section(state(0, "x"), Section.Crossing.FALLING, c(50), c(1e-10),
                IntegrationMethod.HIGH_ORDER);
        Study s = study("all", section, new LyapunovExponents(c(200), null),
                new Simulation(c(5), List.of(), null, IntegrationMethod.STIFF));
        CompiledModel m = ModelCompiler.compile(TestModels.lorenz(s));
        StudyResult r = StudyRunner.run(m, s, RunSettings.DEFAULT);
        SectionResult x = r.sections().get(0);
        assertEquals(Status.COMPLETED, x.status(), x.message());
        assertTrue(x.points().size() > 5, x.message());
        for (int k = 0; k < x.points().size(); k++) {
            assertEquals(0.0, x.points().state(k, 0), 1e-8); // on the section x = 0
        }
        assertTrue(x.message().startsWith(x.points().size() + " falling crossings up to t = 50"), x.message());
        LyapunovResult l = r.lyapunovSpectra().get(0);
        assertNotNull(l.spectrum());
        assertTrue(l.message().startsWith("exponents "), l.message());
        assertEquals("COMPLETED", r.simulations().get(0).outcome(), r.simulations().get(0).message());

        List<Path> files = ReportWriter.writeAll(r, folder);
        assertTrue(files.contains(folder.resolve("section.csv")));
        assertTrue(files.contains(folder.resolve("lyapunov.csv")));
        assertEquals("t,x,y,z", Files.readAllLines(folder.resolve("section.csv")).get(0));
        assertEquals("t,exponent_1,exponent_2,exponent_3", Files.readAllLines(folder.resolve("lyapunov.csv")).get(0));
        String summary = Files.readString(folder.resolve("summary.txt"));
        assertTrue(summary.contains("Section: COMPLETED") && summary.contains("Lyapunov exponents: "), summary);
    }

    @Test
    void aStopConditionEndsTheSimulationAtTheEvent() {
        // Undamped oscillator x = cos(ωt) with ω = 1 (closed form): the first falling zero of x is at t = π/2,
        // long before the requested end time 100.
        Simulation until = new Simulation(c(100), List.of(), c(1e-10), IntegrationMethod.HIGH_ORDER,
                new StopCondition(state(0, "x"), Section.Crossing.FALLING));
        Study s = study("stop", until);
        DynamicalModel oscillator = TestModels.dampedOscillator(0, 1);
        StudyResult r = StudyRunner.run(ModelCompiler.compile(oscillator), s, RunSettings.DEFAULT);
        SimulationResult sim = r.simulations().get(0);
        assertEquals("STOPPED", sim.outcome(), sim.message());
        assertEquals(Status.COMPLETED, sim.status());
        assertEquals(Math.PI / 2, sim.integration().time(), 1e-9);
        assertTrue(sim.message().startsWith("stopped by the condition at t = 1.5707963"), sim.message());
        Trajectory t = sim.trajectory();
        assertEquals(Math.PI / 2, t.time(t.size() - 1), 1e-9);
        assertEquals(0.0, t.state(t.size() - 1, 0), 1e-9);
        assertEquals(-1.0, t.state(t.size() - 1, 1), 1e-9); // v = -sin t
        for (int k = 1; k < t.size(); k++) {
            assertTrue(t.time(k) > t.time(k - 1), "times increase up to the event, which is the last row");
        }
    }

    @Test
    void aSurfaceThatCannotBeEvaluatedIsInvalidInput() {
        Section section = new Section(state(0, "x"), Section.Crossing.BOTH, state(1, "y"), null, null);
        Study s = study("bad", section);
        StudyResult r = StudyRunner.run(ModelCompiler.compile(TestModels.lorenz(s)), s, RunSettings.DEFAULT);
        assertEquals("INVALID_INPUT", r.sections().get(0).outcome());
        assertEquals(Status.FAILED, r.status());
    }
}
