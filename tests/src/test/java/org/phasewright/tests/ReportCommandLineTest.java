package org.phasewright.tests;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

import javax.xml.parsers.DocumentBuilderFactory;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;

/** `phasewright run` writes an HTML report, results.json and plots per study, with the numbers of the run. */
class ReportCommandLineTest {
    private static final String SVG = "http://www.w3.org/2000/svg";

    @TempDir
    Path folder;

    private static JsonObject json(Path file) throws Exception {
        return JsonParser.parseString(Files.readString(file)).getAsJsonObject();
    }

    private static Document svg(Path file) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return f.newDocumentBuilder().parse(new ByteArrayInputStream(Files.readAllBytes(file)));
    }

    private static List<String> series(Document svg) {
        NodeList groups = svg.getElementsByTagNameNS(SVG, "g");
        java.util.TreeSet<String> names = new java.util.TreeSet<>();
        for (int i = 0; i < groups.getLength(); i++) {
            Element g = (Element) groups.item(i);
            if ("series".equals(g.getAttribute("class"))) {
                names.add(g.getAttribute("data-series"));
            }
        }
        return List.copyOf(names);
    }

    @Test
    void thermosyphonReportCarriesTheNumbersOfTheRun() throws Exception {
        CommandLine run = CommandLine.run("run", CommandLine.example("thermosyphon.phase").toString(), "--out",
                folder.toString());
        assertEquals(0, run.exitCode(), run.err());
        Path study = folder.resolve("first_look");
        Path report = study.resolve("report");
        assertTrue(run.out().contains("Report: " + report.resolve("report.html")), run.out());
        assertFalse(run.err().contains("%]"), "no progress line when not on a terminal");

        JsonObject results = json(report.resolve("results.json"));
        assertEquals("thermosyphon", results.get("model").getAsString());
        assertEquals("s", results.getAsJsonObject("time").get("unit").getAsString());
        JsonArray parameters = results.getAsJsonArray("parameters");
        assertEquals(8.0 / 3, parameters.get(2).getAsJsonObject().get("value").getAsDouble()); // k = 8/3
        assertEquals("loop friction over thermal relaxation",
                parameters.get(0).getAsJsonObject().get("description").getAsString());

        // Equilibria: the same numbers as the runtime's own equilibria.json, to the last digit.
        JsonArray expected = json(study.resolve("equilibria.json")).getAsJsonArray("equilibria");
        JsonArray actual = results.getAsJsonArray("analyses").get(1).getAsJsonObject().getAsJsonArray("equilibria");
        assertEquals(3, actual.size());
        for (int k = 0; k < 3; k++) {
            JsonObject e = expected.get(k).getAsJsonObject(), a = actual.get(k).getAsJsonObject();
            assertEquals(e.get("coordinates"), a.get("coordinates"));
            assertEquals(e.get("eigenvalues"), a.get("eigenvalues"));
            assertEquals(e.get("type"), a.get("type"));
            assertEquals("unstable", a.get("stability").getAsString()); // Lorenz-type at ra = 28: all unstable
        }

        // Trajectory summary: the last row of trajectory.csv.
        List<String> rows = Files.readAllLines(study.resolve("trajectory.csv"));
        String[] last = rows.get(rows.size() - 1).split(",");
        JsonObject trajectory = results.getAsJsonArray("analyses").get(0).getAsJsonObject()
                .getAsJsonObject("trajectory");
        assertEquals(rows.size() - 1, trajectory.get("samples").getAsInt());
        assertEquals(Double.parseDouble(last[0]), trajectory.get("finalTime").getAsDouble());
        for (int i = 0; i < 3; i++) {
            assertEquals(Double.parseDouble(last[i + 1]), trajectory.getAsJsonArray("finalState").get(i)
                    .getAsDouble());
        }

        // Plots: SVGs that parse, with the expected series; PNGs beside them.
        assertEquals(List.of("h", "q", "v"), series(svg(report.resolve("time-series.svg"))));
        assertEquals(List.of("start", "trajectory", "unstable equilibrium (hollow)"),
                series(svg(report.resolve("phase-q-v.svg"))));
        for (var plot : results.getAsJsonArray("plots")) {
            assertTrue(Files.size(report.resolve(plot.getAsJsonObject().get("png").getAsString())) > 10_000);
        }

        String html = Files.readString(report.resolve("report.html"));
        assertTrue(html.contains("rate q = p*(h - q)"), "model text");
        assertTrue(html.contains("scaled heating"), "parameter descriptions");
        assertTrue(html.contains("saddle with 1 unstable direction"), "equilibria table");
        assertTrue(html.contains("phasewright <b>0.1.0</b>"), "tool version");
    }

    @Test
    void axesOptionChoosesTheProjection() throws Exception {
        CommandLine run = CommandLine.run("run", CommandLine.example("thermosyphon.phase").toString(), "--out",
                folder.toString(), "--axes", "h,v", "--quiet");
        assertEquals(0, run.exitCode(), run.err());
        assertEquals("", run.out());
        try (Stream<Path> files = Files.list(folder.resolve("first_look").resolve("report"))) {
            assertEquals(List.of("phase-h-v.png", "phase-h-v.svg"), files.map(p -> p.getFileName().toString())
                    .filter(n -> n.startsWith("phase")).sorted().toList());
        }
        CommandLine wrong = CommandLine.run("run", CommandLine.example("thermosyphon.phase").toString(), "--out",
                folder.toString(), "--axes", "h,w");
        assertEquals(2, wrong.exitCode());
        assertTrue(wrong.err().contains("--axes: the model has no state 'w'; its states: q, h, v"), wrong.err());
    }

    @Test
    void modelTextCannotInjectMarkupIntoTheReport() throws Exception {
        Path model = folder.resolve("evil.phase");
        Files.writeString(model, """
                model evil "<script>alert('title')</script>"
                param a = 1 "</td><img src=x onerror=alert(1)>"
                state x = 1 "<b>bold</b> & more"
                rate x = -a*x
                // </pre><script>alert('comment')</script>
                study s {
                  simulate to t = 1
                  equilibria
                }
                """);
        CommandLine run = CommandLine.run("run", model.toString(), "--out", folder.resolve("out").toString());
        assertEquals(0, run.exitCode(), run.err() + run.out());
        String html = Files.readString(folder.resolve("out").resolve("s").resolve("report").resolve("report.html"));
        String lower = html.toLowerCase(Locale.ROOT);
        assertFalse(lower.contains("<script"), "no script element");
        assertFalse(lower.contains("<img src=x"), "no injected image");
        assertFalse(lower.contains("<b>bold"), "no injected formatting");
        assertTrue(html.contains("&lt;script&gt;alert(&#39;title&#39;)&lt;/script&gt;"), "title shown as text");
        assertTrue(html.contains("&lt;/pre&gt;&lt;script&gt;alert(&#39;comment&#39;)"), "model text shown as text");
        assertTrue(html.contains("&lt;b&gt;bold&lt;/b&gt; &amp; more"));
    }
}
