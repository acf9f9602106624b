package org.phasewright.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.phasewright.language.lowering.ModelLowering;
import org.phasewright.language.standalone.PhaseFiles;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.symbolic.Divergence;
import org.phasewright.runtime.symbolic.ExprEvaluator;
import org.phasewright.runtime.symbolic.ParameterValues;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

/**
 * The main job end to end, through the command line, on the three-mode convection model of E. N. Lorenz,
 * "Deterministic nonperiodic flow", J. Atmos. Sci. 20:130-141 (1963), with sigma = 10, r = 28, b = 8/3.
 */
class LorenzCommandLineTest {
    private static final double SIGMA = 10;
    private static final double R = 28;
    private static final double B = 8.0 / 3.0;

    @TempDir
    static Path results;
    static CommandLine run;
    static List<JsonObject> equilibria;

    @BeforeAll
    static void runTheExample() throws Exception {
        run = CommandLine.run("run", CommandLine.example("lorenz1963.phase").toString(), "--out", results.toString());
        JsonObject json = JsonParser.parseString(Files.readString(results.resolve("reference/equilibria.json")))
                .getAsJsonObject();
        equilibria = new ArrayList<>();
        json.getAsJsonArray("equilibria").forEach(e -> equilibria.add(e.getAsJsonObject()));
        equilibria.sort(Comparator.comparingDouble(e -> coordinate(e, 0)));
    }

    private static double coordinate(JsonObject equilibrium, int i) {
        return equilibrium.getAsJsonArray("coordinates").get(i).getAsDouble();
    }

    @Test
    void runSucceedsAndPrintsTheEquilibriaTable() {
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("saddle with 1 unstable direction"), run.out());
        assertTrue(run.out().contains("saddle-focus with 2 unstable directions"), run.out());
        assertTrue(Files.isRegularFile(results.resolve("reference/trajectory.csv")));
        assertTrue(Files.isRegularFile(results.resolve("reference/equilibria.csv")));
        assertTrue(run.out().contains("describe the model, not the equipment"), "the usual caution is printed");
    }

    @Test
    void exactlyTheThreePublishedEquilibria() {
        // Lorenz (1963), section 5: the origin and C± = (±sqrt(b(r-1)), ±sqrt(b(r-1)), r-1).
        assertEquals(3, equilibria.size());
        double c = Math.sqrt(B * (R - 1));
        double[][] expected = { { -c, -c, R - 1 }, { 0, 0, 0 }, { c, c, R - 1 } };
        for (int k = 0; k < 3; k++) {
            for (int i = 0; i < 3; i++) {
                assertEquals(expected[k][i], coordinate(equilibria.get(k), i), 1e-9, "equilibrium " + k + " axis " + i);
            }
        }
    }

    @Test
    void originIsASaddleWithOneUnstableDirection() {
        // At the origin the Jacobian splits: -b, and the roots of l^2 + (sigma+1) l - sigma (r-1) = 0
        // (closed form from the linearisation, Lorenz 1963 section 5).
        JsonObject origin = equilibria.get(1);
        assertEquals("saddle with 1 unstable direction", origin.get("type").getAsString());
        assertEquals(1, origin.get("unstableDimension").getAsInt());
        double root = Math.sqrt((SIGMA + 1) * (SIGMA + 1) + 4 * SIGMA * (R - 1));
        double[] expected = { (-(SIGMA + 1) + root) / 2, -B, (-(SIGMA + 1) - root) / 2 };
        JsonArray eigenvalues = origin.getAsJsonArray("eigenvalues");
        for (int i = 0; i < 3; i++) {
            assertEquals(expected[i], eigenvalues.get(i).getAsJsonObject().get("re").getAsDouble(), 1e-9);
            assertEquals(0.0, eigenvalues.get(i).getAsJsonObject().get("im").getAsDouble(), 1e-12);
        }
    }

    @Test
    void nonTrivialPairAreSaddleFociWithTwoUnstableDirections() {
        // At C± the eigenvalues are the roots of l^3 + (sigma+b+1) l^2 + b(sigma+r) l + 2 sigma b (r-1) = 0
        // (Lorenz 1963; Sparrow, The Lorenz Equations, 1982, ch. 2). For r above the Hopf value 24.74 two of them
        // form a complex pair with positive real part.
        for (JsonObject pair : List.of(equilibria.get(0), equilibria.get(2))) {
            assertEquals("saddle-focus with 2 unstable directions", pair.get("type").getAsString());
            assertEquals(2, pair.get("unstableDimension").getAsInt());
            int complexWithPositiveRealPart = 0;
            for (var element : pair.getAsJsonArray("eigenvalues")) {
                double re = element.getAsJsonObject().get("re").getAsDouble();
                double im = element.getAsJsonObject().get("im").getAsDouble();
                // |p(l)| for complex l = re + i im
                double[] p = characteristic(re, im);
                assertEquals(0.0, Math.hypot(p[0], p[1]), 1e-7, "eigenvalue is a root of the published polynomial");
                if (im != 0 && re > 0) {
                    complexWithPositiveRealPart++;
                }
            }
            assertEquals(2, complexWithPositiveRealPart);
        }
    }

    /** l^3 + (sigma+b+1) l^2 + b(sigma+r) l + 2 sigma b (r-1) at the complex point (re, im). */
    private static double[] characteristic(double re, double im) {
        double[] l2 = { re * re - im * im, 2 * re * im };
        double[] l3 = { l2[0] * re - l2[1] * im, l2[0] * im + l2[1] * re };
        double a2 = SIGMA + B + 1;
        double a1 = B * (SIGMA + R);
        double a0 = 2 * SIGMA * B * (R - 1);
        return new double[] { l3[0] + a2 * l2[0] + a1 * re + a0, l3[1] + a2 * l2[1] + a1 * im };
    }

    @Test
    void divergenceIsTheConstantMinusSigmaPlusOnePlusB() throws Exception {
        // Lorenz (1963): the flow contracts volumes at the constant rate -(sigma + 1 + b).
        DynamicalModel model = new ModelLowering()
                .lower(new PhaseFiles().check(CommandLine.example("lorenz1963.phase")).ast());
        double divergence = ExprEvaluator.evaluate(Divergence.of(model), Double.NaN, null,
                ParameterValues.resolve(model), null);
        assertEquals(-(SIGMA + 1 + B), divergence, 1e-12);
    }
}
