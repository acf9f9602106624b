package org.phasewright.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.phasewright.runtime.equilibria.Equilibrium;
import org.phasewright.runtime.study.StudyResult;
import org.phasewright.runtime.study.Trajectory;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

/** results.json carries exactly the numbers of the study result (read back with an independent parser). */
@TestInstance(TestInstance.Lifecycle.PER_CLASS) // render once for all checks
class ResultsJsonTest {
    private final StudyResult study = Fixtures.study(500);

    private Map<String, byte[]> files;

    private JsonObject json() throws IOException {
        if (files == null) {
            files = StudyReport.render(study, Fixtures.context());
        }
        return JsonParser.parseString(new String(files.get(StudyReport.JSON), StandardCharsets.UTF_8))
                .getAsJsonObject();
    }

    @Test
    void parametersAndRunFacts() throws IOException {
        JsonObject j = json();
        assertEquals("phasewright-results", j.get("format").getAsString());
        assertEquals("9.9.9", j.getAsJsonObject("tool").get("version").getAsString());
        assertEquals("spiral", j.get("model").getAsString());
        assertEquals("everything", j.get("study").getAsString());
        assertEquals(1.5, j.getAsJsonObject("run").get("seconds").getAsDouble());
        JsonArray p = j.getAsJsonArray("parameters");
        assertEquals(0.1, p.get(0).getAsJsonObject().get("value").getAsDouble());
        assertEquals(8.0 / 3, p.get(1).getAsJsonObject().get("value").getAsDouble()); // every digit survives
    }

    @Test
    void simulationSummaryNotEverySample() throws IOException {
        JsonObject sim = json().getAsJsonArray("analyses").get(0).getAsJsonObject();
        assertEquals("simulation", sim.get("kind").getAsString());
        Trajectory t = study.simulations().get(0).trajectory();
        JsonObject summary = sim.getAsJsonObject("trajectory");
        assertEquals(500, summary.get("samples").getAsInt());
        assertEquals(20.0, summary.get("finalTime").getAsDouble());
        JsonArray last = summary.getAsJsonArray("finalState");
        for (int i = 0; i < 3; i++) {
            assertEquals(t.state(499, i), last.get(i).getAsDouble());
        }
        assertEquals(200, sim.getAsJsonObject("integration").get("acceptedSteps").getAsLong());
        assertEquals(1e-8, sim.getAsJsonObject("settings").get("relativeTolerance").getAsDouble());
        assertFalse(sim.has("samples"), "samples belong in trajectory.csv");
    }

    @Test
    void equilibriaWithEigenvaluesAndStability() throws IOException {
        JsonObject search = json().getAsJsonArray("analyses").get(1).getAsJsonObject();
        assertEquals(3, search.get("count").getAsInt());
        JsonArray list = search.getAsJsonArray("equilibria");
        Equilibrium[] expected = {Fixtures.STABLE, Fixtures.SADDLE, Fixtures.CENTRE};
        String[] stability = {"stable", "unstable", "non-hyperbolic"};
        for (int k = 0; k < 3; k++) {
            JsonObject e = list.get(k).getAsJsonObject();
            assertEquals(expected[k].name(), e.get("name").getAsString());
            assertEquals(expected[k].type(), e.get("type").getAsString());
            assertEquals(stability[k], e.get("stability").getAsString());
            for (int i = 0; i < 3; i++) {
                assertEquals(expected[k].coordinates()[i], e.getAsJsonArray("coordinates").get(i).getAsDouble());
                JsonObject ev = e.getAsJsonArray("eigenvalues").get(i).getAsJsonObject();
                assertEquals(expected[k].eigenvaluesReal()[i], ev.get("re").getAsDouble());
                assertEquals(expected[k].eigenvaluesImag()[i], ev.get("im").getAsDouble());
            }
        }
    }

    @Test
    void sectionAndLyapunov() throws IOException {
        JsonArray analyses = json().getAsJsonArray("analyses");
        JsonObject section = analyses.get(2).getAsJsonObject();
        assertEquals(3, section.get("crossings").getAsInt());
        assertEquals(14.1, section.get("lastCrossingTime").getAsDouble());
        JsonObject lyapunov = analyses.get(3).getAsJsonObject();
        double[] exponents = study.lyapunovSpectra().get(0).spectrum().exponents();
        for (int i = 0; i < 3; i++) {
            assertEquals(exponents[i], lyapunov.getAsJsonArray("exponents").get(i).getAsDouble());
        }
        assertEquals(study.lyapunovSpectra().get(0).spectrum().sum(), lyapunov.get("sum").getAsDouble());
        assertEquals(4321, lyapunov.get("reorthonormalisations").getAsLong());
    }

    @Test
    void plotFilesAreListedAndWritten() throws IOException {
        JsonObject j = json();
        JsonArray plots = j.getAsJsonArray("plots");
        // time series + three projections for the simulation, the section, the Lyapunov convergence
        assertEquals(6, plots.size());
        for (var p : plots) {
            assertTrue(files.containsKey(p.getAsJsonObject().get("svg").getAsString()));
            assertTrue(files.containsKey(p.getAsJsonObject().get("png").getAsString()));
        }
        assertEquals("lyapunov.svg", j.getAsJsonArray("analyses").get(3).getAsJsonObject().getAsJsonArray("plots")
                .get(0).getAsString());
    }

    @Test
    void nonFiniteNumbersAreNull() {
        String out = new JsonWriter().beginObject().field("a", Double.NaN).field("b", Double.NEGATIVE_INFINITY)
                .endObject().finish();
        JsonObject j = JsonParser.parseString(out).getAsJsonObject();
        assertTrue(j.get("a").isJsonNull());
        assertTrue(j.get("b").isJsonNull());
    }
}
