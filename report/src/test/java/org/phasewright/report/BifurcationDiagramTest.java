package org.phasewright.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.BasicStroke;
import java.util.ArrayList;
import java.util.List;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.plot.XYPlot;
import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.continuation.Branch;
import org.phasewright.runtime.continuation.BranchFollower;
import org.phasewright.runtime.continuation.ContinuationOutcome;
import org.phasewright.runtime.continuation.ContinuationPoint;
import org.phasewright.runtime.continuation.ContinuationSettings;
import org.phasewright.runtime.continuation.ParameterVector;
import org.phasewright.runtime.continuation.SpecialPoint;
import org.phasewright.runtime.equilibria.Classification;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Parameter;
import org.phasewright.runtime.model.StateVariable;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.model.VariableKind;
import org.phasewright.runtime.study.ContinuationResult;
import org.phasewright.runtime.study.Status;

class BifurcationDiagramTest {

    /** x' = r + x² from r = -1 to 1: one branch, stable (x < 0) then unstable (x > 0), a fold at r = 0. */
    private static ContinuationResult saddleNode() {
        Variable x = new Variable(VariableKind.STATE, 0, "x");
        Variable r = new Variable(VariableKind.PARAMETER, 0, "r");
        DynamicalModel m = new DynamicalModel("sn", null, TimeAxis.DEFAULT,
                List.of(new StateVariable("x", new Constant(-1), null, null)),
                List.of(new Parameter("r", new Constant(-1), null, null, null)), List.of(),
                List.of(new Binary(BinaryOperator.ADD, r,
                        new Binary(BinaryOperator.MULTIPLY, x, x))), List.of(), List.of());
        CompiledModel cm = ModelCompiler.compile(m);
        ContinuationOutcome o = new BranchFollower(cm.field(), new ParameterVector(m, cm.parameters(), 0), 1, -1, 1,
                ContinuationSettings.DEFAULT, Long.MAX_VALUE, () -> false).follow(List.of(new double[] {-1}));
        return new ContinuationResult(o, Status.COMPLETED, "COMPLETED", o.message());
    }

    @Test
    void stablePartsSolidUnstablePartsDashedAndTheFoldLabelledInWords() {
        JFreeChart chart = BifurcationDiagram.chart(saddleNode(), 0, "r", "x", "title", null);
        XYPlot plot = chart.getXYPlot();
        int solid = 0, dashed = 0;
        for (int s = 0; s < plot.getDataset().getSeriesCount(); s++) {
            String key = plot.getDataset().getSeriesKey(s).toString();
            if (key.equals("special points")) {
                continue;
            }
            BasicStroke stroke = (BasicStroke) plot.getRenderer().getSeriesStroke(s);
            // the convention asked of the diagram (common practice in bifurcation diagrams)
            if (key.contains(" stable")) {
                assertNull(stroke.getDashArray(), key);
                solid++;
            } else {
                assertNotNull(stroke.getDashArray(), key);
                dashed++;
            }
        }
        assertEquals(1, solid);
        assertEquals(1, dashed);
        List<String> labels = plot.getAnnotations().stream().filter(XYTextAnnotation.class::isInstance)
                .map(a -> ((XYTextAnnotation) a).getText().strip()).toList();
        assertEquals(List.of("fold"), labels);
        XYTextAnnotation fold = (XYTextAnnotation) plot.getAnnotations().get(0);
        assertEquals(0.0, fold.getX(), 1e-9); // at r = 0 (Strogatz §3.1)
        assertTrue(chart.getXYPlot().getFixedLegendItems().getItemCount() >= 2);
        assertEquals("unstable equilibria (dashed)", chart.getXYPlot().getFixedLegendItems().get(1).getLabel());
    }

    @Test
    void unclassifiedPointsAreDashedAndTheLegendSaysSo() {
        // our own drawing rule: a point whose stability is unknown is not drawn as stable
        ContinuationPoint known = new ContinuationPoint(0, new double[] {-1}, new double[] {-2}, new double[] {0},
                new Classification("stable node", 1, 0, 0), null);
        ContinuationPoint unknown = new ContinuationPoint(0.5, new double[] {-0.7}, new double[0], new double[0],
                new Classification("not classified: the rightmost of its 1 eigenvalues did not converge", 0, 0, 0),
                null);
        ContinuationOutcome o = new ContinuationOutcome("r", 0, 1, ContinuationOutcome.Ending.COMPLETED,
                List.of(new Branch(1, "start", List.of(known, unknown), "reached r = 1")), List.of(), 2, Double.NaN, 0);
        JFreeChart chart = BifurcationDiagram.chart(new ContinuationResult(o, Status.COMPLETED, "COMPLETED",
                o.message()), 0, "r", "x", "title", null);
        assertEquals("unstable or unclassified equilibria (dashed)",
                chart.getXYPlot().getFixedLegendItems().get(1).getLabel());
    }

    @Test
    void crowdedSpecialPointsKeepTheirMarksButOnlyLegibleLabels() {
        // our own drawing rule: 30 Hopf points within 3% of the parameter range (as a ring's cascade of modes) and
        // a fold far from them; every point stays marked, overlapping labels are left out and the subtitle says so
        List<ContinuationPoint> points = new ArrayList<>();
        List<SpecialPoint> specials = new ArrayList<>();
        for (int k = 0; k <= 100; k++) {
            points.add(new ContinuationPoint(k / 100.0, new double[] {k / 100.0}, new double[] {-1},
                    new double[] {0}, new Classification("stable node", 1, 0, 0), null));
        }
        specials.add(new SpecialPoint(SpecialPoint.Kind.FOLD, 1, 0.2, new double[] {0.2}, Double.NaN, Double.NaN));
        for (int k = 0; k < 30; k++) {
            double r = 0.9 + 0.001 * k;
            specials.add(new SpecialPoint(SpecialPoint.Kind.HOPF, 1, r, new double[] {r}, 1, -0.01));
        }
        ContinuationOutcome o = new ContinuationOutcome("r", 0, 1, ContinuationOutcome.Ending.COMPLETED,
                List.of(new Branch(1, "start", points, "reached r = 1")), specials, 2, Double.NaN, 0);
        JFreeChart chart = BifurcationDiagram.chart(new ContinuationResult(o, Status.COMPLETED, "COMPLETED",
                o.message()), 0, "r", "x", "title", "1 branch");
        XYPlot plot = chart.getXYPlot();
        List<String> labels = plot.getAnnotations().stream().filter(XYTextAnnotation.class::isInstance)
                .map(a -> ((XYTextAnnotation) a).getText().strip()).toList();
        assertEquals(List.of("fold", "Hopf (supercritical)"), labels);
        // the fold's label reads rightwards; the Hopf label, in the right quarter, leftwards (not cut by the edge)
        List<org.jfree.chart.ui.TextAnchor> anchors = plot.getAnnotations().stream()
                .map(a -> ((XYTextAnnotation) a).getTextAnchor()).toList();
        assertEquals(List.of(org.jfree.chart.ui.TextAnchor.BOTTOM_LEFT, org.jfree.chart.ui.TextAnchor.BOTTOM_RIGHT),
                anchors);
        int marks = plot.getDataset().getItemCount(plot.getDataset().indexOf("special points"));
        assertEquals(31, marks);
        List<String> subtitles = new ArrayList<>();
        for (int k = 0; k < chart.getSubtitleCount(); k++) {
            if (chart.getSubtitle(k) instanceof org.jfree.chart.title.TextTitle t) {
                subtitles.add(t.getText());
            }
        }
        assertTrue(subtitles.contains("1 branch; labels on 2 of 31 special points (all are listed in summary.txt)"),
                subtitles.toString());
    }
}
