package org.phasewright.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Sections, Lyapunov exponents and the stiff method, written in the notation and run through the command line. */
class DynamicsCommandLineTest {
    @TempDir
    Path dir;

    private static double[] lastRow(Path csv) throws Exception {
        List<String> lines = Files.readAllLines(csv);
        String[] cells = lines.get(lines.size() - 1).split(",");
        double[] row = new double[cells.length];
        for (int i = 0; i < cells.length; i++) {
            row[i] = Double.parseDouble(cells[i]);
        }
        return row;
    }

    @Test
    void lorenzLyapunovSpectrumThroughTheNotation() throws Exception {
        Path model = dir.resolve("lorenz.phase");
        Files.writeString(model, """
                model lorenz
                time tau
                param sigma = 10
                param r = 28
                param b = 8/3
                state x = 1
                state y = 1
                state z = 1
                rate x = sigma*(y - x)
                rate y = r*x - y - x*z
                rate z = x*y - b*z
                study spectrum {
                  lyapunov to tau = 1000
                }
                """);
        CommandLine run = CommandLine.run("run", model.toString(), "--out", dir.resolve("out").toString());
        assertEquals(0, run.exitCode(), run.out() + run.err());
        assertTrue(run.out().contains("Lyapunov exponents: COMPLETED"), run.out());
        assertTrue(run.out().contains("per unit tau"), run.out());
        Path csv = dir.resolve("out/spectrum/lyapunov.csv");
        assertEquals("tau,exponent_1,exponent_2,exponent_3", Files.readAllLines(csv).get(0));
        double[] last = lastRow(csv);
        assertEquals(1000, last[0], 1e-9);
        // Sprott, Chaos and Time-Series Analysis (2003): 0.9056, 0, -14.5723 for σ = 10, r = 28, b = 8/3.
        assertEquals(0.9056, last[1], 0.02);
        assertEquals(0.0, last[2], 0.01);
        assertEquals(-14.5723, last[3], 0.03);
        // Sum = -(σ + 1 + b) by the constant divergence (Lorenz 1963, eq. 29).
        assertEquals(-(10 + 1 + 8.0 / 3), last[1] + last[2] + last[3], 1e-6);
    }

    @Test
    void vanDerPolSectionGivesTheLimitCyclePeriod() throws Exception {
        Path model = dir.resolve("vdp.phase");
        Files.writeString(model, """
                model vanderpol
                param mu = 1
                state x = 2
                state y = 0
                rate x = y
                rate y = mu*(1 - x^2)*y - x
                study cycle {
                  section where x = 0 rising to t = 60 tolerance 1e-11 method high_order
                  section where x + 0*y = 0 falling to t = 60 tolerance 1e-11
                }
                """);
        CommandLine run = CommandLine.run("run", model.toString(), "--out", dir.resolve("out").toString());
        assertEquals(0, run.exitCode(), run.out() + run.err());
        List<String> rising = Files.readAllLines(dir.resolve("out/cycle/section.csv"));
        List<String> falling = Files.readAllLines(dir.resolve("out/cycle/section-2.csv"));
        assertEquals("t,x,y", rising.get(0));
        double[] t = rising.stream().skip(1).mapToDouble(l -> Double.parseDouble(l.split(",")[0])).toArray();
        double[] y = rising.stream().skip(1).mapToDouble(l -> Double.parseDouble(l.split(",")[2])).toArray();
        // Period of the μ = 1 limit cycle ≈ 6.6633 (from memory); the runtime tests confirm it with two methods.
        assertEquals(6.6633, t[t.length - 1] - t[t.length - 2], 1e-4);
        for (double v : y) {
            assertTrue(v > 0, "rising crossings of x = 0 have x' = y > 0");
        }
        for (String line : falling.subList(1, falling.size())) {
            assertTrue(Double.parseDouble(line.split(",")[2]) < 0, "falling crossings have y < 0: " + line);
        }
    }

    @Test
    void robertsonExampleRunsWithTheStiffMethodAndKeepsMass() throws Exception {
        CommandLine run = CommandLine.run("run", CommandLine.example("robertson1966.phase").toString(), "--out",
                dir.toString());
        assertEquals(0, run.exitCode(), run.out() + run.err());
        double[] last = lastRow(dir.resolve("kinetics/trajectory.csv"));
        assertEquals(1e5, last[0], 1e-6);
        // a + b + c = 1 is conserved by the reactions (HNW II, Sec. IV.1); the let 'total' reports it.
        assertEquals(1.0, last[1] + last[2] + last[3], 1e-10);
        assertEquals(1.0, last[4], 1e-10);
    }

    @Test
    void explicitMethodOnRobertsonNamesTheStiffness() throws Exception {
        Path model = dir.resolve("rob.phase");
        Files.writeString(model, Files.readString(CommandLine.example("robertson1966.phase"))
                .replace("simulate to t = 1e5 tolerance 1e-6 method stiff", "simulate to t = 20 tolerance 1e-6"));
        CommandLine run = CommandLine.run("run", model.toString(), "--out", dir.resolve("out").toString());
        assertEquals(0, run.exitCode(), run.out() + run.err());
        assertTrue(run.out().contains("stiff near t = "), run.out());
    }

    @Test
    void untilStopsTheSimulationAtTheFirstCrossing() throws Exception {
        // A ball thrown up at 10 m/s under g = 9.81 m/s² lands (h = 0, falling) at t = 2·10/9.81 (closed form).
        Path model = dir.resolve("ball.phase");
        Files.writeString(model, """
                model ball
                param g = 9.81
                state h = 0
                state v = 10
                let energy = v^2/2 + g*h
                rate h = v
                rate v = -g
                study flight {
                  simulate to t = 100 from (1e-9, 10) until h = 0 falling tolerance 1e-10
                }
                """);
        CommandLine run = CommandLine.run("run", model.toString(), "--out", dir.resolve("out").toString());
        assertEquals(0, run.exitCode(), run.out() + run.err());
        assertTrue(run.out().contains("STOPPED - stopped by the condition at t = 2.0387"), run.out());
        double[] last = lastRow(dir.resolve("out/flight/trajectory.csv"));
        assertEquals(2 * 10 / 9.81, last[0], 1e-8);
        assertEquals(0.0, last[1], 1e-8);
        assertEquals(-10.0, last[2], 1e-7);
    }

    @Test
    void wrongTimeNameInTheNewAnalysesIsAnError() throws Exception {
        Path model = dir.resolve("bad.phase");
        Files.writeString(model, """
                model bad
                time s
                state x = 1
                rate x = -x
                study one {
                  lyapunov to t = 10
                  section where x = 0.5 to t = 10
                }
                """);
        CommandLine check = CommandLine.run("check", model.toString());
        assertEquals(1, check.exitCode());
        assertTrue(check.out().contains("bad.phase:6:") && check.out().contains("lyapunov to s = ..."), check.out());
        assertTrue(check.out().contains("bad.phase:7:"), check.out());
    }
}
