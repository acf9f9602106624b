package org.phasewright.runtime.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.equilibria;
import static org.phasewright.runtime.TestModels.model;
import static org.phasewright.runtime.TestModels.mul;
import static org.phasewright.runtime.TestModels.param;
import static org.phasewright.runtime.TestModels.parameter;
import static org.phasewright.runtime.TestModels.simulation;
import static org.phasewright.runtime.TestModels.state;
import static org.phasewright.runtime.TestModels.stateVar;
import static org.phasewright.runtime.TestModels.study;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.phasewright.runtime.TestModels;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.model.DerivedQuantity;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.study.RunSettings;
import org.phasewright.runtime.study.StudyResult;
import org.phasewright.runtime.study.StudyRunner;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import com.google.gson.Strictness;
import com.google.gson.stream.JsonReader;

class ReportTest {
    static final String TRICKY_X = "x, \"the\" state";
    static final String TRICKY_LET = "e\"q\\\n\u2028\ud800";

    /** A damped oscillator whose names need escaping in CSV and JSON. */
    static StudyResult trickyStudy() {
        Study s = study("st,\"udy\"", simulation(5), equilibria());
        DynamicalModel m = model("mo\"del", List.of(stateVar(TRICKY_X, 1), stateVar("v", 0)),
                List.of(parameter("k,\"k\"", c(4))),
                List.of(new DerivedQuantity(TRICKY_LET, mul(c(2), state(0, TRICKY_X)), null)),
                List.of(state(1, "v"), TestModels.sub(TestModels.neg(mul(param(0, "k"), state(0, TRICKY_X))),
                        mul(c(0.4), state(1, "v")))),
                s);
        return StudyRunner.run(ModelCompiler.compile(m), s, RunSettings.DEFAULT);
    }

    @Test
    void trajectoryCsvHasEscapedHeaderAndOneRowPerSample() {
        StudyResult r = trickyStudy();
        List<List<String>> rows = parseCsv(TrajectoryCsv.render(r.simulations().get(0).trajectory()));
        // RFC 4180: fields with commas or quotes are quoted and quotes doubled; our parser undoes exactly that.
        assertEquals(List.of("t", TRICKY_X, "v", TRICKY_LET), rows.get(0));
        assertEquals(1 + RunSettings.MIN_OUTPUT_SAMPLES, rows.size());
        assertEquals(List.of("0.0", "1.0", "0.0", "2.0"), rows.get(1));
        assertEquals("5.0", rows.get(rows.size() - 1).get(0));
    }

    @Test
    void equilibriaCsvListsCoordinatesEigenvaluesAndType() {
        StudyResult r = trickyStudy();
        List<List<String>> rows = parseCsv(EquilibriaCsv.render(r.stateNames(), r.equilibriumSearches().get(0)));
        assertEquals(List.of("name", TRICKY_X, "v", "lambda1_re", "lambda1_im", "lambda2_re", "lambda2_im", "type",
                "stable_dim", "unstable_dim", "centre_dim"), rows.get(0));
        assertEquals(2, rows.size());
        // x'' + 0.4x' + 4x = 0: eigenvalues -0.2 ± i sqrt(4 - 0.04) (closed form), a stable focus.
        List<String> e1 = rows.get(1);
        assertEquals("E1", e1.get(0));
        assertEquals(-0.2, Double.parseDouble(e1.get(3)), 1e-12);
        assertEquals(Math.sqrt(3.96), Double.parseDouble(e1.get(4)), 1e-12);
        assertEquals(List.of("stable focus", "2", "0", "0"), e1.subList(7, 11));
    }

    @Test
    void equilibriaJsonParsesStrictlyAndKeepsNamesIntact() {
        StudyResult r = trickyStudy();
        String json = EquilibriaJson.render(r, r.equilibriumSearches().get(0));
        // An independent, strict parser (Gson) is the check; a lone surrogate must arrive as the same char.
        JsonReader reader = new JsonReader(new java.io.StringReader(json));
        reader.setStrictness(Strictness.STRICT);
        JsonObject root = JsonParser.parseReader(reader).getAsJsonObject();
        assertEquals("mo\"del", root.get("model").getAsString());
        assertEquals("st,\"udy\"", root.get("study").getAsString());
        assertEquals(TRICKY_X, root.getAsJsonArray("states").get(0).getAsString());
        assertEquals("k,\"k\"", root.getAsJsonArray("parameters").get(0).getAsJsonObject().get("name").getAsString());
        JsonArray eq = root.getAsJsonArray("equilibria");
        assertEquals(1, eq.size());
        JsonObject e1 = eq.get(0).getAsJsonObject();
        assertEquals("stable focus", e1.get("type").getAsString());
        assertEquals(-0.2, e1.getAsJsonArray("eigenvalues").get(0).getAsJsonObject().get("re").getAsDouble(), 1e-12);
        assertEquals(2, e1.get("stableDimension").getAsInt());
        assertEquals("\"e\\\"q\\\\\\n\\u2028\\ud800\"", Json.string(TRICKY_LET));
    }

    @Test
    void summaryShowsComplexPairsOnceAndTheFinalState() {
        StudyResult r = trickyStudy();
        String text = TextSummary.render(r);
        assertTrue(text.contains("-0.2 ± 1.98997i"), text); // sqrt(3.96) = 1.98997...
        assertTrue(text.contains("stable focus"), text);
        assertTrue(text.contains("Simulation 1: COMPLETED"), text);
        assertTrue(text.contains("state at t = 5: "), text);
        assertEquals("1 ± 2i, -3", TextSummary.eigenvalues(new double[] {1, 1, -3}, new double[] {2, -2, 0}));
    }

    @Test
    void writeAllWritesEveryFileAtomically(@TempDir Path dir) throws IOException {
        StudyResult r = trickyStudy();
        Path out = dir.resolve("results");
        List<Path> written = ReportWriter.writeAll(r, out);
        assertEquals(List.of("trajectory.csv", "equilibria.csv", "equilibria.json", "summary.txt"),
                written.stream().map(p -> p.getFileName().toString()).toList());
        for (Path p : written) {
            assertTrue(Files.size(p) > 0);
        }
        // Writing again replaces the files and leaves no temporary files behind.
        ReportWriter.writeAll(r, out);
        try (Stream<Path> files = Files.list(out)) {
            assertEquals(4, files.count());
        }
        // Text files are UTF-8; the one unencodable char (a lone surrogate in a name) becomes '?'.
        // summary.txt ends with the usual caution that results describe the model (common practice for design models).
        assertEquals((TextSummary.render(r) + "\n" + TextSummary.CAUTION + "\n").replace('\ud800', '?'),
                Files.readString(out.resolve("summary.txt"), StandardCharsets.UTF_8));
    }

    @Test
    void numbersForPeople() {
        assertEquals("0.0939556", Numbers.compact(0.09395563));
        assertEquals("27", Numbers.compact(27.0000000001));
        assertEquals("1.5e-07", Numbers.compact(1.5e-7));
        assertEquals("-1.23457e+09", Numbers.compact(-1234567890));
        assertEquals("0", Numbers.compact(-0.0));
    }

    /** Minimal RFC 4180 reader for the checks: quoted fields, doubled quotes, embedded commas and newlines. */
    static List<List<String>> parseCsv(String text) {
        List<List<String>> rows = new ArrayList<>();
        List<String> row = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < text.length(); i++) {
            char ch = text.charAt(i);
            if (quoted) {
                if (ch == '"' && i + 1 < text.length() && text.charAt(i + 1) == '"') {
                    field.append('"');
                    i++;
                } else if (ch == '"') {
                    quoted = false;
                } else {
                    field.append(ch);
                }
            } else if (ch == '"') {
                quoted = true;
            } else if (ch == ',') {
                row.add(field.toString());
                field.setLength(0);
            } else if (ch == '\n') {
                row.add(field.toString());
                field.setLength(0);
                rows.add(row);
                row = new ArrayList<>();
            } else {
                field.append(ch);
            }
        }
        return rows;
    }
}
