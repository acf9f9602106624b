package org.phasewright.report;

import java.time.Duration;
import java.time.Instant;
import java.util.List;

import org.phasewright.runtime.equilibria.Classification;
import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.integrate.IntegrationOutcome;
import org.phasewright.runtime.lyapunov.LyapunovOutcome;
import org.phasewright.runtime.study.EquilibriumResult;
import org.phasewright.runtime.study.LyapunovResult;
import org.phasewright.runtime.study.SectionResult;
import org.phasewright.runtime.study.SimulationResult;
import org.phasewright.runtime.study.Status;
import org.phasewright.runtime.study.StudyResult;
import org.phasewright.runtime.study.Trajectory;

/**
 * A study result with every kind of analysis, built from closed forms so that tests know each number: a damped
 * oscillation x = e^{-t/10} cos t, y = e^{-t/10} sin t, z = 1 - e^{-t} sampled at {@code rows} times on [0, 20].
 */
final class Fixtures {
    static final List<String> STATES = List.of("x", "y", "z");

    private Fixtures() {
    }

    static Trajectory spiral(int rows) {
        double[] t = new double[rows];
        double[][] u = new double[rows][];
        double[][] d = new double[rows][1];
        for (int k = 0; k < rows; k++) {
            t[k] = 20.0 * k / (rows - 1);
            double a = Math.exp(-t[k] / 10);
            u[k] = new double[] {a * Math.cos(t[k]), a * Math.sin(t[k]), 1 - Math.exp(-t[k])};
            d[k][0] = u[k][0] * u[k][0] + u[k][1] * u[k][1];
        }
        return new Trajectory("t", STATES, List.of("r2"), t, u, d);
    }

    static Equilibrium equilibrium(String name, double[] at, double[] re, double[] im) {
        return new Equilibrium(name, at, re, im, Classification.of(re, im, 1e-9), 1e-15);
    }

    static final Equilibrium STABLE = equilibrium("E1", new double[] {0, 0, 1},
            new double[] {-0.1, -0.1, -1}, new double[] {1, -1, 0});
    static final Equilibrium SADDLE = equilibrium("E2", new double[] {0.5, -0.25, 0.75},
            new double[] {2.5, -1, -3}, new double[] {0, 0, 0});
    static final Equilibrium CENTRE = equilibrium("E3", new double[] {-0.5, 0.125, 0.3},
            new double[] {0, 0, -2}, new double[] {1.5, -1.5, 0});

    static StudyResult study(int rows) {
        Trajectory t = spiral(rows);
        double[] last = t.stateRow(t.size() - 1);
        IntegrationOutcome done = new IntegrationOutcome(IntegrationOutcome.Ending.COMPLETED, 20, last, 1234, 200, 7,
                0.05, 1e12);
        SimulationResult simulation = new SimulationResult(t, done, 20, 1e-8, Status.COMPLETED, "COMPLETED",
                done.message());
        EquilibriumResult equilibria = new EquilibriumResult(List.of(STABLE, SADDLE, CENTRE), null,
                Status.COMPLETED, "COMPLETED", "found 3 equilibria");
        double[] crossingTimes = {1.5, 7.8, 14.1};
        double[][] crossings = {{0.8, 0, 0.7}, {0.45, 0, 0.9}, {0.24, 0, 0.95}};
        Trajectory points = new Trajectory("t", STATES, List.of("r2"), crossingTimes, crossings,
                new double[][] {{0.64}, {0.2025}, {0.0576}});
        SectionResult section = new SectionResult(points, done, 20, Status.COMPLETED, "COMPLETED",
                "3 rising crossings up to t = 20");
        double[] historyTimes = {1, 10, 100, 1000};
        double[][] history = {{0.5, 0.1, -9}, {0.2, 0.01, -10}, {0.1, 0.001, -10.5}, {0.0906, 0.0001, -14.57}};
        LyapunovOutcome spectrum = new LyapunovOutcome(new double[] {0.0906, 0.0001, -14.57},
                new double[] {0.0905, 0.0002, -14.56}, -14.479, 1000, historyTimes, history, 4321, done);
        LyapunovResult lyapunov = new LyapunovResult(spectrum, 1000, Status.COMPLETED, "COMPLETED",
                "exponents 0.0906, 0.0001, -14.57");
        return new StudyResult("spiral", "everything", "t", STATES, List.of("r2"), List.of("a", "b"),
                new double[] {0.1, 8.0 / 3}, List.of(simulation, equilibria, section, lyapunov));
    }

    static ReportContext context() {
        return new ReportContext("spiral.phase", "model spiral\n", null, "9.9.9", Duration.ofMillis(1500),
                Instant.parse("2026-01-02T03:04:05Z"), List.of());
    }
}
