package org.phasewright.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Orbit diagrams, Lyapunov maps and basins written in the notation, run through Spark (embedded local[2]) and with
 * --no-spark: the files must be byte for byte the same, and the numbers must match published values.
 */
class EnsembleCommandLineTest {
    @TempDir
    Path dir;

    /** Runs the model both ways and returns the named result file of each (Spark first). */
    private List<String> bothWays(String name, String text, String study, String file) throws Exception {
        Path model = dir.resolve(name + ".phase");
        Files.writeString(model, text);
        List<String> files = new ArrayList<>();
        for (List<String> how : List.of(List.of("--master", "local[2]"), List.of("--no-spark"))) {
            Path out = dir.resolve(name + "-" + how.size());
            List<String> args = new ArrayList<>(List.of("run", model.toString(), "--out", out.toString()));
            args.addAll(how);
            CommandLine r = CommandLine.run(args.toArray(String[]::new));
            assertEquals(0, r.exitCode(), r.out() + r.err());
            // users see no Spark log lines (common practice for a command-line tool)
            assertFalse(r.err().contains(" INFO ") || r.err().contains("org.apache.spark"), r.err());
            assertTrue(r.out().contains(how.size() == 2 ? "Spark local[2]" : "thread"), r.out());
            files.add(Files.readString(out.resolve(study).resolve(file)));
        }
        return files;
    }

    @Test
    void lorenzLyapunovMapIsTheSameThroughSparkAndMatchesSprott() throws Exception {
        List<String> csv = bothWays("lorenz", """
                model lorenz
                param sigma = 10
                param r = 28
                param b = 8/3
                state x = 1
                state y = 1
                state z = 1
                rate x = sigma*(y - x)
                rate y = r*x - y - x*z
                rate z = x*y - b*z
                study grid {
                  lyapunov map over r from 10 to 28 steps 2 and sigma from 9 to 10 steps 2 until t = 600
                }
                """, "grid", "lyapunov-map.csv");
        assertEquals(csv.get(0), csv.get(1));
        String[] lines = csv.get(0).split("\n");
        assertEquals("r,sigma,largest_exponent,converged,ending", lines[0]);
        assertEquals(5, lines.length);
        // r = 10: C± are stable (Lorenz 1963), so the largest exponent is negative
        assertTrue(Double.parseDouble(lines[1].split(",")[2]) < 0, lines[1]);
        // Sprott, Chaos and Time-Series Analysis (2003): 0.9056 at σ = 10, r = 28 (finite-time estimate, T = 600)
        assertEquals("28.0,10.0", lines[4].substring(0, 9));
        assertEquals(0.9056, Double.parseDouble(lines[4].split(",")[2]), 0.05);
    }

    @Test
    void duffingBasinsAreTheSameThroughSparkAndMirrorSymmetric() throws Exception {
        List<String> csv = bothWays("wells", """
                model wells
                param delta = 0.5
                state x = 0.5
                state v = 0
                rate x = v
                rate v = x - x^3 - delta*v
                study grid {
                  basins over x from -1.5 to 1.5 steps 5 and v from -1.5 to 1.5 steps 5 until t = 60
                }
                """, "grid", "basins.csv");
        assertEquals(csv.get(0), csv.get(1));
        String[] lines = csv.get(0).split("\n");
        assertEquals(26, lines.length);
        // (x, v) ↦ (−x, −v) maps solutions to solutions (odd rates), so row k and row 26 − k name mirrored wells;
        // each well x = ±1 attracts the start (±1.5, 0) next to it (closed form: both wells are stable)
        for (int k = 1; k <= 25; k++) {
            String[] a = lines[k].split(","), m = lines[26 - k].split(",");
            double xa = Double.parseDouble(a[0]);
            assertEquals(-xa, Double.parseDouble(m[0]), 0.0);
            assertEquals(a[3].isEmpty(), m[3].isEmpty(), lines[k]);
            boolean origin = a[0].equals("0.0") && a[1].equals("0.0"); // the saddle is its own mirror
            assertEquals(origin, a[3].equals(m[3]), lines[k] + " / " + lines[26 - k]);
        }
    }

    @Test
    void brusselatorOrbitDiagramIsTheSameThroughSpark() throws Exception {
        Path example = CommandLine.example("brusselator.phase");
        List<String> csv = bothWays("brusselator", Files.readString(example), "onset", "sweep.csv");
        assertEquals(csv.get(0), csv.get(1));
        assertTrue(csv.get(0).lines().count() > 100);
    }

    @Test
    void masterAndNoSparkAreCheckedAsUsage() throws Exception {
        Path model = dir.resolve("tiny.phase");
        Files.writeString(model, "model tiny\nstate x = 1\nrate x = -x\n");
        // exit code 2 for usage errors, as documented in `phasewright help` (common practice)
        assertEquals(2, CommandLine.run("run", model.toString(), "--master", "local[2]", "--no-spark").exitCode());
        assertEquals(2, CommandLine.run("run", model.toString(), "--master", "not a url").exitCode());
    }
}
