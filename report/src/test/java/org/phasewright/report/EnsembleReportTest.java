package org.phasewright.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.ensemble.Axis;
import org.phasewright.runtime.ensemble.BasinPoint;
import org.phasewright.runtime.ensemble.LyapunovPoint;
import org.phasewright.runtime.study.AnalysisResult;
import org.phasewright.runtime.study.BasinsResult;
import org.phasewright.runtime.study.LyapunovMapResult;
import org.phasewright.runtime.study.Status;
import org.phasewright.runtime.study.StudyResult;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

/** Lyapunov maps and basins in results.json and as heatmaps, read back with an independent JSON parser. */
class EnsembleReportTest {
    private static final Axis A = new Axis("a", 0, 1, 2, 3), B = new Axis("b", 1, -1, 1, 2);

    private static Map<String, byte[]> render(AnalysisResult... results) throws Exception {
        StudyResult study = new StudyResult("spiral", "grid", "t", Fixtures.STATES, List.of("r2"), List.of("a",
                "b"), new double[] {1, 0}, List.of(results));
        return StudyReport.render(study, Fixtures.context());
    }

    private static JsonObject analysis(Map<String, byte[]> files, int index) {
        return JsonParser.parseString(new String(files.get(StudyReport.JSON), StandardCharsets.UTF_8))
                .getAsJsonObject().getAsJsonArray("analyses").get(index).getAsJsonObject();
    }

    @Test
    void gridsAreWrittenRowByRowAndDrawn() throws Exception {
        List<LyapunovPoint> exponents = new ArrayList<>();
        List<BasinPoint> labels = new ArrayList<>();
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 2; j++) {
                exponents.add(i == 2 && j == 1 ? null : new LyapunovPoint(A.value(i) * B.value(j), true,
                        "COMPLETED"));
                labels.add(new BasinPoint(j == 0 ? 0 : -1, "COMPLETED"));
            }
        }
        Map<String, byte[]> files = render(
                new LyapunovMapResult(A, B, 50, exponents, "2 threads", Status.INCOMPLETE, "TIME_LIMIT", "5 of 6"),
                new BasinsResult(A, B, 50, List.of(Fixtures.STABLE), labels, "2 threads", Status.COMPLETED,
                        "COMPLETED", "6 of 6"));
        JsonObject map = analysis(files, 0);
        JsonArray rows = map.getAsJsonArray("largestExponent");
        assertEquals(3, rows.size());
        // a·b at (a, b) = (1.5, 1): the value put in (closed form of the fixture)
        assertEquals(1.5, rows.get(1).getAsJsonArray().get(1).getAsDouble(), 0.0);
        assertTrue(rows.get(2).getAsJsonArray().get(1).isJsonNull()); // not run (common practice: null, not NaN)
        assertEquals("b", map.getAsJsonObject("second").get("name").getAsString());
        JsonObject basins = analysis(files, 1);
        assertEquals(-1, basins.getAsJsonArray("labels").get(2).getAsJsonArray().get(1).getAsInt());
        assertEquals("E1", basins.getAsJsonArray("equilibria").get(0).getAsJsonObject().get("name").getAsString());
        assertTrue(files.containsKey("lyapunov-map.svg") && files.containsKey("basins.svg"), files.keySet()
                .toString());
    }

    @Test
    void failedGridsLeaveNoPlotAndStillReport() throws Exception {
        Map<String, byte[]> files = render(
                new BasinsResult(A, B, 50, List.of(), null, null, Status.FAILED, "EXECUTOR_FAILED", "no cluster"),
                new LyapunovMapResult(null, null, Double.NaN, null, null, Status.FAILED, "INVALID_INPUT", "bad"));
        assertEquals("EXECUTOR_FAILED", analysis(files, 0).get("outcome").getAsString());
        assertTrue(files.keySet().stream().noneMatch(f -> f.startsWith("basins") || f.startsWith("lyapunov-map")));
    }
}
