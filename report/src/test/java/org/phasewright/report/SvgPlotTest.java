package org.phasewright.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** The SVG plots parse as XML and hold the expected series; the PNGs decode. */
@TestInstance(TestInstance.Lifecycle.PER_CLASS) // render once for all checks
class SvgPlotTest {
    private final Map<String, byte[]> files;

    SvgPlotTest() throws IOException {
        files = StudyReport.render(Fixtures.study(500), Fixtures.context());
    }

    static Document parse(byte[] svg) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return f.newDocumentBuilder().parse(new ByteArrayInputStream(svg));
    }

    /** data-series name → number of drawn elements (paths, shapes) in that series' groups. */
    static Map<String, Integer> series(Document svg) {
        Map<String, Integer> found = new LinkedHashMap<>();
        NodeList groups = svg.getElementsByTagNameNS("http://www.w3.org/2000/svg", "g");
        for (int i = 0; i < groups.getLength(); i++) {
            Element g = (Element) groups.item(i);
            if ("series".equals(g.getAttribute("class"))) {
                int drawn = g.getElementsByTagNameNS("http://www.w3.org/2000/svg", "path").getLength()
                        + g.getElementsByTagNameNS("http://www.w3.org/2000/svg", "ellipse").getLength()
                        + g.getElementsByTagNameNS("http://www.w3.org/2000/svg", "circle").getLength()
                        + g.getElementsByTagNameNS("http://www.w3.org/2000/svg", "rect").getLength()
                        + g.getElementsByTagNameNS("http://www.w3.org/2000/svg", "polygon").getLength();
                found.merge(g.getAttribute("data-series"), drawn, Integer::sum);
            }
        }
        return found;
    }

    @Test
    void timeSeriesHasOneCurvePerState() throws Exception {
        Map<String, Integer> s = series(parse(files.get("time-series.svg")));
        assertEquals(List.of("x", "y", "z"), sorted(s.keySet()));
        s.values().forEach(n -> assertEquals(1, n, "one path per state"));
    }

    @Test
    void projectionMarksEquilibriaByStability() throws Exception {
        Map<String, Integer> s = series(parse(files.get("phase-x-y.svg")));
        assertEquals(1, s.get("trajectory"));
        assertEquals(1, s.get("start"));
        // One stable, one unstable, one non-hyperbolic equilibrium in the fixture, each its own legend entry;
        // a marker is two elements, its fill (ink when stable, white when not) and its outline.
        assertEquals(2, s.get("stable equilibrium (filled)"));
        assertEquals(2, s.get("unstable equilibrium (hollow)"));
        assertEquals(2, s.get("non-hyperbolic equilibrium (diamond)"));
        assertEquals(null, s.get("unclassified equilibrium (square)"), "no legend entry for what is absent");
        String text = new String(files.get("phase-x-y.svg"), java.nio.charset.StandardCharsets.UTF_8);
        assertTrue(text.contains(">stable equilibrium (filled)</text>"), "the legend says it in words");
    }

    @Test
    void stableMarkersAreFilledAndUnstableOnesHollow() throws Exception {
        Document svg = parse(files.get("phase-x-z.svg"));
        String ink = "fill:rgb(38,48,58)", white = "fill:rgb(255,255,255)";
        List<String> stable = styles(svg, "stable equilibrium (filled)");
        List<String> unstable = styles(svg, "unstable equilibrium (hollow)");
        assertTrue(stable.stream().anyMatch(st -> st.contains(ink)), stable.toString());
        assertTrue(stable.stream().noneMatch(st -> st.contains(white)), stable.toString());
        assertTrue(unstable.stream().anyMatch(st -> st.contains(white)), unstable.toString());
        assertTrue(unstable.stream().noneMatch(st -> st.contains(ink)), "outline only: " + unstable);
    }

    /** Style attributes of a series group and everything in it. */
    private static List<String> styles(Document svg, String series) {
        List<String> found = new ArrayList<>();
        NodeList groups = svg.getElementsByTagNameNS("http://www.w3.org/2000/svg", "g");
        for (int i = 0; i < groups.getLength(); i++) {
            Element g = (Element) groups.item(i);
            if (series.equals(g.getAttribute("data-series"))) {
                NodeList all = g.getElementsByTagName("*");
                for (int k = 0; k < all.getLength(); k++) {
                    String style = ((Element) all.item(k)).getAttribute("style").replace(" ", "");
                    if (!style.isEmpty()) {
                        found.add(style);
                    }
                }
            }
        }
        return found;
    }

    @Test
    void sectionAndLyapunovSeries() throws Exception {
        assertEquals(Map.of("crossings", 3), series(parse(files.get("section.svg"))));
        Map<String, Integer> l = series(parse(files.get("lyapunov.svg")));
        assertEquals(List.of("λ₁", "λ₂", "λ₃"), sorted(l.keySet()));
    }

    @Test
    void pngsDecodeAtTwiceTheNominalSize() throws Exception {
        BufferedImage image = ImageIO.read(new ByteArrayInputStream(files.get("phase-x-z.png")));
        assertEquals(2 * Charts.WIDTH, image.getWidth());
        assertEquals(2 * Charts.HEIGHT, image.getHeight());
    }

    @Test
    void longTrajectoriesStaySmall() throws Exception {
        Map<String, byte[]> big = StudyReport.render(Fixtures.study(200_000), Fixtures.context());
        Document svg = parse(big.get("phase-x-y.svg"));
        String d = firstPath(svg, "trajectory");
        int points = d.split("[ML]").length - 1;
        assertTrue(points <= Decimation.MAX_POINTS, points + " points");
        assertTrue(big.get("time-series.svg").length < 600_000, big.get("time-series.svg").length + " bytes");
    }

    private static String firstPath(Document svg, String series) {
        NodeList groups = svg.getElementsByTagNameNS("http://www.w3.org/2000/svg", "g");
        for (int i = 0; i < groups.getLength(); i++) {
            Element g = (Element) groups.item(i);
            if (series.equals(g.getAttribute("data-series"))) {
                NodeList paths = g.getElementsByTagNameNS("http://www.w3.org/2000/svg", "path");
                if (paths.getLength() > 0) {
                    return ((Element) paths.item(0)).getAttribute("d");
                }
            }
        }
        throw new AssertionError("no series " + series);
    }

    private static List<String> sorted(java.util.Collection<String> c) {
        List<String> l = new ArrayList<>(c);
        l.sort(null);
        return l;
    }
}
