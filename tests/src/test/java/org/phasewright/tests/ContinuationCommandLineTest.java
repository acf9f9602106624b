package org.phasewright.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** `follow equilibria in PARAM from A to B` written in the notation and run through the command line. */
class ContinuationCommandLineTest {
    @TempDir
    Path dir;

    @Test
    void brusselatorHopfAtOnePlusASquared() throws Exception {
        Path model = dir.resolve("brusselator.phase");
        Files.writeString(model, """
                model brusselator
                param a = 1
                param b = 1
                param top = 2*a + 2
                state x = 1
                state y = 1
                rate x = a - (b + 1)*x + x^2*y
                rate y = b*x - x^2*y
                study branches {
                  follow equilibria in b from 1 to top
                }
                """);
        CommandLine run = CommandLine.run("run", model.toString(), "--out", dir.resolve("out").toString());
        assertEquals(0, run.exitCode(), run.out() + run.err());
        assertTrue(run.out().contains("Continuation in b from 1 to 4: COMPLETED"), run.out());
        assertTrue(run.out().contains("Hopf"), run.out());
        List<String> csv = Files.readAllLines(dir.resolve("out/branches/branches.csv"));
        assertEquals("branch,point,b,x,y,stable,unstable_dimension,type,special", csv.get(0));
        String hopf = csv.stream().filter(l -> l.endsWith(",Hopf")).findFirst().orElseThrow();
        String[] cells = hopf.split(",");
        // Strogatz, Nonlinear Dynamics and Chaos, Exercise 8.3.1: the fixed point (a, b/a) loses stability in a
        // Hopf bifurcation at b = 1 + a² (here a = 1, so b = 2, at x = 1, y = 2).
        assertEquals(2.0, Double.parseDouble(cells[2]), 1e-9);
        assertEquals(1.0, Double.parseDouble(cells[3]), 1e-9);
        assertEquals(2.0, Double.parseDouble(cells[4]), 1e-8);
        // stable before, unstable after (same source: the trace a² + 1 − b changes sign there)
        String first = csv.get(1), last = csv.get(csv.size() - 1);
        assertTrue(first.contains(",true,0,"), first);
        assertTrue(last.contains(",false,2,"), last);
        String json = Files.readString(dir.resolve("out/branches/branches.json"));
        assertTrue(json.contains("\"kind\": \"Hopf\""), json);
        assertTrue(json.contains("\"firstLyapunovCoefficient\": "), json);
        // The cycles born there: their period tends to 2π/ω = 2π at the Hopf point (Kuznetsov, Elements of Applied
        // Bifurcation Theory, Theorem 3.3), and they are stable since the bifurcation is supercritical.
        List<String> cycles = Files.readAllLines(dir.resolve("out/branches/cycles.csv"));
        assertEquals("family,point,b,period,x,y,min_x,min_y,max_x,max_y,stable,largest_multiplier,special",
                cycles.get(0));
        String[] orbit = cycles.get(1).split(",");
        assertEquals(2 * Math.PI, Double.parseDouble(orbit[3]), 1e-2);
        assertEquals("true", orbit[10]);
        assertTrue(run.out().contains("supercritical"), run.out());
    }

    @Test
    void sweepRecordsTheMaximaOfTheHopfCycle() throws Exception {
        Path model = dir.resolve("hopf.phase");
        Files.writeString(model, """
                model hopf
                param mu = 0.5
                state x = 0.1
                state y = 0
                rate x = mu*x - y - x*(x^2 + y^2)
                rate y = x + mu*y - y*(x^2 + y^2)
                study diagram {
                  sweep mu from 0.25 to 1 steps 4 until t = 120
                }
                """);
        CommandLine run = CommandLine.run("run", model.toString(), "--out", dir.resolve("out").toString());
        assertEquals(0, run.exitCode(), run.out() + run.err());
        assertTrue(run.out().contains("Orbit diagram in mu from 0.25 to 1: COMPLETED - 4 of 4 parameter values"),
                run.out());
        List<String> csv = Files.readAllLines(dir.resolve("out/diagram/sweep.csv"));
        assertEquals("mu,state,maximum", csv.get(0));
        int checked = 0;
        for (String line : csv.subList(1, csv.size())) {
            String[] cells = line.split(",");
            if (cells[1].equals("x")) {
                // Strogatz, Nonlinear Dynamics and Chaos, §8.2: the stable cycle r = √μ (x peaks at √μ)
                assertEquals(Math.sqrt(Double.parseDouble(cells[0])), Double.parseDouble(cells[2]), 1e-5, line);
                checked++;
            }
        }
        assertTrue(checked >= 4 * 9, checked + " maxima of x");
    }

    @Test
    void followMustVaryAParam() throws Exception {
        Path model = dir.resolve("bad.phase");
        Files.writeString(model, """
                model bad
                param r = 1
                state x = 0
                rate x = r + x^2
                study s {
                  follow equilibria in x from -1 to 1
                }
                """);
        CommandLine check = CommandLine.run("check", model.toString());
        assertEquals(1, check.exitCode(), check.out() + check.err());
        String all = check.out() + check.err();
        // common practice (our rule): the named thing must be a param, marked where it is written
        assertTrue(all.contains("bad.phase:6:24: error: `follow equilibria in NAME` varies a param; 'x' is a state"),
                all);
    }
}
