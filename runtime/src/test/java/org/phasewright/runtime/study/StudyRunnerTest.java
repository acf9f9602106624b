package org.phasewright.runtime.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.equilibria;
import static org.phasewright.runtime.TestModels.let;
import static org.phasewright.runtime.TestModels.model;
import static org.phasewright.runtime.TestModels.mul;
import static org.phasewright.runtime.TestModels.simulation;
import static org.phasewright.runtime.TestModels.state;
import static org.phasewright.runtime.TestModels.stateVar;
import static org.phasewright.runtime.TestModels.study;

import java.time.Duration;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.TestModels;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.model.DerivedQuantity;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Simulation;
import org.phasewright.runtime.model.Study;

class StudyRunnerTest {

    @Test
    void lorenzStudySimulatesThenFindsEquilibriaFromTheTrajectory() {
        Study s = study("chaos", simulation(20), equilibria());
        CompiledModel m = ModelCompiler.compile(TestModels.lorenz(s));
        StudyResult result = StudyRunner.run(m, s, RunSettings.DEFAULT);
        assertEquals(Status.COMPLETED, result.status());

        SimulationResult sim = result.simulations().get(0);
        assertEquals("COMPLETED", sim.outcome());
        Trajectory traj = sim.trajectory();
        assertEquals(RunSettings.MIN_OUTPUT_SAMPLES, traj.size());
        assertEquals(0.0, traj.time(0));
        assertEquals(20.0, traj.time(traj.size() - 1));
        assertEquals(20.0 / 999, traj.time(1), 1e-15);
        assertEquals(1.0, traj.state(0, 0)); // the declared initial state (1, 1, 1)
        assertEquals(List.of("x", "y", "z"), traj.stateNames());
        // Bounded attractor: Lorenz (1963) trajectories stay in a bounded region, |z| < ~50 for these parameters.
        for (int k = 0; k < traj.size(); k++) {
            assertTrue(Math.abs(traj.state(k, 2)) < 60);
        }

        EquilibriumResult eq = result.equilibriumSearches().get(0);
        assertEquals("COMPLETED", eq.outcome());
        assertEquals(3, eq.equilibria().size()); // Lorenz (1963): origin and C±
        // Polynomial rates of degrees 1, 2, 2: four homotopy paths, one of them to infinity (Lorenz 1963, Sec. 5).
        assertEquals("found 3 equilibria from " + eq.search().startsTried() + " starts; homotopy: 4 paths, 3 finite,"
                + " 3 real", eq.message());
    }

    @Test
    void searchWithoutASimulationRunsItsOwnShortTrajectory() {
        Study s = study("eq", equilibria());
        StudyResult result = StudyRunner.run(ModelCompiler.compile(TestModels.cubic(0.5)), s, RunSettings.DEFAULT);
        assertEquals(3, result.equilibriumSearches().get(0).equilibria().size()); // x - x³: -1, 0, 1
    }

    @Test
    void derivedQuantitiesAreSampledAlongTheTrajectory() {
        // x' = -x from 1 with let e = 2x: x = exp(-t), e = 2 exp(-t) (closed form).
        DynamicalModel m = model("decay", List.of(stateVar("x", 1)), List.of(),
                List.of(new DerivedQuantity("e", mul(c(2), state(0, "x")), null)),
                List.of(TestModels.neg(state(0, "x"))));
        StudyResult r = StudyRunner.run(ModelCompiler.compile(m), study("s", simulation(2)), RunSettings.DEFAULT);
        Trajectory t = r.simulations().get(0).trajectory();
        for (int k = 0; k < t.size(); k += 97) {
            assertEquals(2 * Math.exp(-t.time(k)), t.derived(k, 0), 1e-8);
        }
        assertEquals(List.of("e"), t.derivedNames());
        assertNotNull(let(0, "e"));
    }

    @Test
    void blowUpIsAResultWithAMessageNotAnException() {
        // y' = y², y(0) = 1: y = 1/(1 - t) blows up at t = 1.
        DynamicalModel m = model("blow", List.of(stateVar("y", 1)), List.of(), List.of(),
                List.of(mul(state(0, "y"), state(0, "y"))));
        StudyResult r = StudyRunner.run(ModelCompiler.compile(m), study("s", simulation(2)), RunSettings.DEFAULT);
        SimulationResult sim = r.simulations().get(0);
        assertEquals(Status.FAILED, sim.status());
        assertEquals("BLEW_UP", sim.outcome());
        assertEquals("integration blew up at t = 1.0e+00: |u| exceeded 1e12", sim.message());
        // Samples up to t = 1 plus the point where it stopped.
        Trajectory t = sim.trajectory();
        assertEquals(1.0, t.time(t.size() - 1), 1e-6);
        assertTrue(t.time(t.size() - 2) <= 1.0);
    }

    @Test
    void invalidSettingsAreReportedAsInvalidInput() {
        Study s = study("bad", new Simulation(c(-1), List.of(), null), new Simulation(c(1), List.of(c(1), c(2)), null),
                new Simulation(c(1), List.of(), c(0)));
        StudyResult r = StudyRunner.run(ModelCompiler.compile(TestModels.cubic(0.5)), s, RunSettings.DEFAULT);
        for (SimulationResult sim : r.simulations()) {
            assertEquals("INVALID_INPUT", sim.outcome());
            assertNull(sim.trajectory());
        }
        assertEquals("end time must be positive, got -1.0", r.simulations().get(0).message());
        assertEquals("start lists 2 values but the model has 1 states", r.simulations().get(1).message());
    }

    @Test
    void toleranceAndStartAreTakenFromTheSimulation() {
        Study s = study("s", new Simulation(c(1), List.of(c(2)), c(1e-6)));
        SimulationResult sim = StudyRunner.run(ModelCompiler.compile(TestModels.cubic(0.5)), s, RunSettings.DEFAULT)
                .simulations().get(0);
        assertEquals(1e-6, sim.relativeTolerance());
        assertEquals(2.0, sim.trajectory().state(0, 0));
    }

    @Test
    void forcedModelHasNoEquilibria() {
        DynamicalModel forced = model("forced", List.of(stateVar("x", 0)), List.of(), List.of(),
                List.of(TestModels.sub(TestModels.call(org.phasewright.runtime.model.MathFunction.SIN,
                        TestModels.time()), state(0, "x"))));
        EquilibriumResult r = StudyRunner.run(ModelCompiler.compile(forced), study("s", equilibria()),
                RunSettings.DEFAULT).equilibriumSearches().get(0);
        assertEquals("NOT_AUTONOMOUS", r.outcome());
        assertEquals(Status.FAILED, r.status());
    }

    @Test
    void cancellationAndWallTimeStopTheStudy() {
        Study s = study("long", simulation(1e7), equilibria());
        CompiledModel m = ModelCompiler.compile(TestModels.lorenz(s));
        StudyResult cancelled = StudyRunner.run(m, s, RunSettings.DEFAULT.withCancellation(() -> true));
        assertEquals("CANCELLED", cancelled.results().get(0).outcome());
        assertEquals("CANCELLED", cancelled.results().get(1).outcome());
        assertEquals(Status.INCOMPLETE, cancelled.status());

        StudyResult timed = StudyRunner.run(m, s, RunSettings.DEFAULT.withWallTimeLimit(Duration.ofMillis(200)));
        assertEquals("TIME_LIMIT", timed.results().get(0).outcome());
        assertTrue(timed.results().get(0).message().startsWith("wall-time limit reached at t = "));

        StudyResult steps = StudyRunner.run(m, study("short", simulation(1e7)), RunSettings.DEFAULT.withMaxSteps(500));
        assertEquals("STEP_LIMIT", steps.results().get(0).outcome());
    }

    @Test
    void aBlownUpTrajectoryDoesNotBlurTheEquilibria() {
        // x' = x² - 1 from x = 2 blows up (x = coth-type solution, singular near t = 0.55), yet its equilibria are
        // -1 (f' = -2, stable) and +1 (f' = 2, unstable) (closed form); the huge last row must not make them "equal".
        DynamicalModel m = model("riccati", List.of(stateVar("x", 2)), List.of(), List.of(),
                List.of(TestModels.sub(mul(state(0, "x"), state(0, "x")), c(1))));
        StudyResult r = StudyRunner.run(ModelCompiler.compile(m), study("s", simulation(2), equilibria()),
                RunSettings.DEFAULT);
        assertEquals("BLEW_UP", r.simulations().get(0).outcome());
        List<org.phasewright.runtime.equilibria.Equilibrium> eq = r.equilibriumSearches().get(0).equilibria();
        assertEquals(2, eq.size(), eq::toString);
        assertEquals(-1.0, eq.get(0).coordinates()[0], 1e-12);
        assertEquals("stable node", eq.get(0).type());
        assertEquals(1.0, eq.get(1).coordinates()[0], 1e-12);
        assertEquals("unstable node", eq.get(1).type());
    }
}
