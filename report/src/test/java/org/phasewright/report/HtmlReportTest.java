package org.phasewright.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.time.Instant;
import java.util.Base64;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Parameter;
import org.phasewright.runtime.model.StateVariable;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.study.EquilibriumResult;
import org.phasewright.runtime.study.Status;
import org.phasewright.runtime.study.StudyResult;

import com.google.gson.JsonParser;

/** The HTML report shows the study and lets no user text become markup. */
class HtmlReportTest {
    static final String EVIL = "</pre><script>alert('x')</script><img src=x onerror=\"alert(1)\"> & done";

    private static DynamicalModel evilModel() {
        List<StateVariable> states = List.of(new StateVariable("x", new Constant(1), "m", EVIL),
                new StateVariable("y", new Constant(0), null, null), new StateVariable("z", new Constant(0), null, null));
        List<Parameter> parameters = List.of(new Parameter("a", new Constant(0.1), "1/s", null, EVIL),
                new Parameter("b", new Constant(8.0 / 3), "<b>kg</b>", null, null));
        return new DynamicalModel("spiral", EVIL, new TimeAxis("t", "s"), states, parameters, List.of(),
                List.of(new Constant(0), new Constant(0), new Constant(0)), List.of(), List.of());
    }

    private static String html(Map<String, byte[]> files) {
        return new String(files.get(StudyReport.HTML), StandardCharsets.UTF_8);
    }

    @Test
    void userTextCannotInjectMarkup() throws Exception {
        ReportContext context = new ReportContext("<evil>.phase", "model spiral " + EVIL + "\n", evilModel(),
                "1.0", Duration.ofSeconds(2), Instant.now(), List.of());
        Map<String, byte[]> files = StudyReport.render(Fixtures.study(300), context);
        String html = html(files);
        String lower = html.toLowerCase(Locale.ROOT);
        assertFalse(lower.contains("<script"), "no script element");
        assertFalse(lower.contains("<img src=x"), "no injected image");
        assertFalse(lower.contains("onerror=\""), "no event handler attribute");
        assertFalse(lower.contains("<b>kg"), "units are text");
        assertTrue(html.contains("&lt;/pre&gt;&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt;"), "shown as text");
        assertTrue(html.contains("&lt;evil&gt;.phase"));
        assertTrue(html.contains("&lt;b&gt;kg&lt;/b&gt;"));
        // Exactly the tags the report writes itself, and a policy that forbids scripts in any case.
        assertTrue(html.contains("Content-Security-Policy\" content=\"default-src 'none'"));
        Matcher tags = Pattern.compile("<([a-zA-Z][a-zA-Z0-9]*)").matcher(html);
        List<String> allowed = List.of("html", "head", "meta", "title", "style", "body", "main", "header", "h1",
                "h2", "h3", "span", "p", "div", "b", "table", "tr", "th", "td", "dl", "dt", "dd", "figure", "img",
                "figcaption", "a", "pre", "footer");
        while (tags.find()) {
            assertTrue(allowed.contains(tags.group(1).toLowerCase(Locale.ROOT)), "unexpected tag " + tags.group());
        }
        // results.json keeps the text as it is, escaped so that it is inert even inside HTML.
        String json = new String(files.get(StudyReport.JSON), StandardCharsets.UTF_8);
        assertFalse(json.contains("<"));
        assertEquals(EVIL, JsonParser.parseString(json).getAsJsonObject().getAsJsonArray("parameters").get(0)
                .getAsJsonObject().get("description").getAsString());
    }

    @Test
    void plotsAreEmbeddedSoThePageIsSelfContained() throws Exception {
        Map<String, byte[]> files = StudyReport.render(Fixtures.study(300), Fixtures.context());
        String html = html(files);
        assertFalse(html.contains("src=\"http"), "nothing fetched from outside");
        Matcher images = Pattern.compile("src=\"data:image/svg\\+xml;base64,([A-Za-z0-9+/=]+)\"").matcher(html);
        int count = 0;
        while (images.find()) {
            byte[] svg = Base64.getDecoder().decode(images.group(1));
            SvgPlotTest.parse(svg); // each embedded plot is a whole SVG document
            count++;
        }
        assertEquals(6, count);
        assertTrue(html.contains("<td>E2</td>") || html.contains("</span>E2</td>"));
        assertTrue(html.contains("saddle with 1 unstable direction"));
        assertTrue(html.contains("phasewright <b>9.9.9</b>"), "tool version");
        assertTrue(html.contains("run time <b>1.50 s</b>"), "run time");
    }

    @Test
    void escapeCoversAttributesAndControlCharacters() {
        assertEquals("&lt;a href=&quot;x&quot; title=&#39;y&#39;&gt;&amp;", Html.escape("<a href=\"x\" title='y'>&"));
        assertEquals("a\uFFFDb", Html.escape("a\u0000b"));
        assertEquals("\uFFFD", Html.escape("\uD800"));
    }

    /** Equilibria of a model with many states show the first 16 coordinates, as summary.txt does (our rule). */
    @Test
    void equilibriaOfLargeModelsShowTheFirstCoordinatesOnly() throws Exception {
        int n = 1500;
        List<String> names = new java.util.ArrayList<>();
        double[] at = new double[n];
        for (int i = 0; i < n; i++) {
            names.add("x[" + (i + 1) + "]");
            at[i] = 0.001 * i;
        }
        EquilibriumResult search = new EquilibriumResult(List.of(Fixtures.equilibrium("E1", at, new double[0],
                new double[0])), null, Status.COMPLETED, "COMPLETED", "found 1 equilibrium");
        StudyResult study = new StudyResult("ring", "eq", "t", names, List.of(), List.of(), new double[0],
                List.of(search));
        String html = html(StudyReport.render(study, Fixtures.context()));
        assertTrue(html.contains("<th>x[16]</th>"), "the first 16 states are columns");
        assertFalse(html.contains("<th>x[17]</th>"), "no more");
        assertFalse(html.contains(">" + Formats.number(at[16]) + "<"), "nor their values");
        assertTrue(html.contains("The first 16 of 1500 states; every coordinate is in equilibria-states.csv."));
    }
}
