package org.phasewright.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.BasicStroke;
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
}
