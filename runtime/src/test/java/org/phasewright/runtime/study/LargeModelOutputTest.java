package org.phasewright.runtime.study;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.phasewright.runtime.assemble.ModelAssembler;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.model.Binary;
import org.phasewright.runtime.model.BinaryOperator;
import org.phasewright.runtime.model.Call;
import org.phasewright.runtime.model.Constant;
import org.phasewright.runtime.model.DynamicalModel;
import org.phasewright.runtime.model.Expr;
import org.phasewright.runtime.model.Family;
import org.phasewright.runtime.model.IndexRange;
import org.phasewright.runtime.model.IndexValue;
import org.phasewright.runtime.model.MathFunction;
import org.phasewright.runtime.model.Simulation;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.model.TimeAxis;
import org.phasewright.runtime.model.Variable;
import org.phasewright.runtime.report.ReportWriter;

class LargeModelOutputTest {

    /** Lorenz (1996) ring of n cells, F = 8, x_i(0) = F + 0.01 sin(i), with one simulation to t = 0.5. */
    private static DynamicalModel ring(int n) {
        ModelAssembler a = new ModelAssembler("ring", null, new TimeAxis("t", null));
        Variable f = a.parameter("F", new Constant(8), null, null, null);
        IndexValue i = new IndexValue("i");
        Family x = a.stateFamily("x", new IndexRange("i", 1, n, true), new Binary(BinaryOperator.ADD, f,
                new Binary(BinaryOperator.MULTIPLY, new Constant(0.01), new Call(MathFunction.SIN, List.of(i)))),
                null, null);
        Expr law = new Binary(BinaryOperator.ADD, new Binary(BinaryOperator.SUBTRACT,
                new Binary(BinaryOperator.MULTIPLY, new Binary(BinaryOperator.SUBTRACT, at(x, 1), at(x, -2)),
                        at(x, -1)), at(x, 0)), f);
        a.familyRate(x, law);
        Study study = new Study("run", List.of(new Simulation(new Constant(0.5), List.of(), new Constant(1e-6))));
        return a.build(List.of(), List.of(study));
    }

    private static Expr at(Family x, int offset) {
        return ModelAssembler.element(x, offset == 0 ? new IndexValue("i")
                : new Binary(BinaryOperator.ADD, new IndexValue("i"), new Constant(offset)));
    }

    @Test
    void largeModelsKeepAFewColumnsAndSummariesPerSample(@TempDir Path folder) throws Exception {
        int n = 2000;
        CompiledModel model = ModelCompiler.compile(ring(n));
        StudyResult result = StudyRunner.runAll(model, RunSettings.DEFAULT).get(0);
        SimulationResult s = result.simulations().get(0);
        assertEquals(Status.COMPLETED, s.status(), s.message());
        Trajectory t = s.trajectory();
        assertEquals(16, t.stateNames().size());
        assertEquals("x[1]", t.stateNames().get(0));
        assertEquals(List.of(ReducedSampler.MEAN, ReducedSampler.RMS), t.derivedNames());
        assertNotNull(t.kept());
        assertTrue(t.kept().startsWith("first 16 of 2000 states"), t.kept());
        assertTrue(s.message().contains("output keeps the first 16"), s.message());

        // row 0 is the initial state: mean and rms of F + 0.01 sin(i) computed here directly (closed form)
        double sum = 0, squares = 0;
        for (int i = 1; i <= n; i++) {
            double x = 8 + 0.01 * Math.sin(i);
            sum += x;
            squares += x * x;
        }
        assertEquals(sum / n, t.derived(0, 0), 1e-13);
        assertEquals(Math.sqrt(squares / n), t.derived(0, 1), 1e-13);

        // the last row is the end state, whose full copy stays in the outcome
        double[] end = s.integration().state();
        assertEquals(n, end.length);
        int last = t.size() - 1;
        assertEquals(0.5, t.time(last));
        assertArrayEquals(Arrays.copyOf(end, 16), t.stateRow(last));
        assertEquals(Arrays.stream(end).sum() / n, t.derived(last, 0), 1e-12);

        // reports: columns stay few, the final state goes to its own file, one row per state
        List<Path> files = ReportWriter.writeAll(result, folder);
        List<String> csv = Files.readAllLines(folder.resolve("trajectory.csv"));
        assertEquals(1 + 16 + 2, csv.get(0).split(",").length);
        List<String> fin = Files.readAllLines(folder.resolve("final-state.csv"));
        assertEquals(n + 1, fin.size());
        assertEquals("x[2000]," + end[n - 1], fin.get(n));
        assertTrue(files.contains(folder.resolve("final-state.csv")));
        String summary = Files.readString(folder.resolve("summary.txt"));
        assertTrue(summary.length() < 4000, "summary of " + summary.length() + " characters");
        assertTrue(summary.contains("(2000 states; every one in final-state.csv)"), summary);
    }

    @Test
    void sectionsOfLargeModelsKeepTheSameFewColumns() {
        int n = 2000;
        DynamicalModel ring = ring(n);
        // x[1] - 8 crosses zero (both ways) as the cell leaves its initial value 8 + 0.01 sin(1)
        Expr surface = new Binary(BinaryOperator.SUBTRACT, new Variable(org.phasewright.runtime.model.VariableKind
                .STATE, 0, "x[1]"), new Constant(8));
        Study study = new Study("cut", List.of(new org.phasewright.runtime.model.Section(surface,
                org.phasewright.runtime.model.Section.Crossing.BOTH, new Constant(2), new Constant(1e-6), null)));
        CompiledModel model = ModelCompiler.compile(ring);
        StudyResult result = StudyRunner.run(model, study, RunSettings.DEFAULT);
        SectionResult x = result.sections().get(0);
        assertEquals(Status.COMPLETED, x.status(), x.message());
        Trajectory points = x.points();
        assertTrue(points.size() > 0, x.message());
        assertEquals(16, points.stateNames().size());
        assertEquals(List.of(ReducedSampler.MEAN, ReducedSampler.RMS), points.derivedNames());
        for (int k = 0; k < points.size(); k++) {
            assertEquals(8.0, points.state(k, 0), 1e-6, "on the section x[1] = 8 (its definition)");
        }
        assertTrue(x.message().contains("each keeps the first 16 of 2000 states"), x.message());
        assertTrue(SectionRunner.largeModelCrossings(1_000_000) >= 10);
    }

    /**
     * A ring large enough for the tiled explicit method: the study's samples (dense output between steps) and end
     * state agree with the same study on the interpreter, which has no window rates and runs the whole-state method
     * (reference: DormandPrince54, itself checked against DOPRI5 and closed forms).
     */
    @Test
    void largeRingsRunTileByTileWithTheWholeStateResults() {
        int n = org.phasewright.runtime.integrate.ExplicitMethod.TILED_FROM_CELLS + 1000;
        DynamicalModel ring = ring(n);
        CompiledModel tiled = ModelCompiler.compile(ring);
        CompiledModel whole = ModelCompiler.interpret(ring);
        assertNotNull(tiled.lattice());
        assertNull(whole.lattice());
        SimulationResult a = StudyRunner.runAll(tiled, RunSettings.DEFAULT).get(0).simulations().get(0);
        SimulationResult b = StudyRunner.runAll(whole, RunSettings.DEFAULT).get(0).simulations().get(0);
        assertEquals(Status.COMPLETED, a.status(), a.message());
        assertEquals(b.integration().acceptedSteps(), a.integration().acceptedSteps());
        double[] ea = a.integration().state(), eb = b.integration().state();
        for (int i = 0; i < n; i++) {
            assertEquals(eb[i], ea[i], 1e-9, "cell " + (i + 1));
        }
        assertEquals(b.trajectory().size(), a.trajectory().size());
        for (int k = 0; k < a.trajectory().size(); k += 97) {
            assertArrayEquals(b.trajectory().stateRow(k), a.trajectory().stateRow(k), 1e-9, "sample " + k);
        }
    }

    /**
     * A damped, driven ring dx_i/dt = 1 − x_i + (x_{i+1} − x_{i−1})/4 of 1500 cells has the single equilibrium
     * x_i = 1 (closed form: the uniform state cancels the difference term). equilibria.csv keeps the first 16
     * coordinates with their mean and rms; equilibria-states.csv has every one, one row per state.
     */
    @Test
    void equilibriaOfLargeModelsKeepAFewColumnsAndListEveryCoordinateByRow(@TempDir Path folder) throws Exception {
        int n = 1500;
        ModelAssembler a = new ModelAssembler("damped", null, new TimeAxis("t", null));
        Family x = a.stateFamily("x", new IndexRange("i", 1, n, true), new Constant(0.5), null, null);
        a.familyRate(x, new Binary(BinaryOperator.ADD, new Binary(BinaryOperator.SUBTRACT, new Constant(1), at(x, 0)),
                new Binary(BinaryOperator.MULTIPLY, new Constant(0.25),
                        new Binary(BinaryOperator.SUBTRACT, at(x, 1), at(x, -1)))));
        Study study = new Study("eq", List.of(new org.phasewright.runtime.model.EquilibriumSearch()));
        CompiledModel model = ModelCompiler.compile(a.build(List.of(), List.of(study)));
        StudyResult result = StudyRunner.runAll(model, RunSettings.DEFAULT).get(0);
        EquilibriumResult search = (EquilibriumResult) result.results().get(0);
        assertEquals(1, search.equilibria().size(), search.message());
        List<Path> files = ReportWriter.writeAll(result, folder);
        List<String> csv = Files.readAllLines(folder.resolve("equilibria.csv"));
        List<String> header = List.of(csv.get(0).split(","));
        assertEquals("x[16]", header.get(16));
        assertEquals(List.of(ReducedSampler.MEAN, ReducedSampler.RMS), header.subList(17, 19));
        String[] row = csv.get(1).split(",");
        assertEquals(1.0, Double.parseDouble(row[17]), 1e-9, "mean");
        assertEquals(1.0, Double.parseDouble(row[18]), 1e-9, "rms");
        assertTrue(files.contains(folder.resolve("equilibria-states.csv")));
        List<String> byState = Files.readAllLines(folder.resolve("equilibria-states.csv"));
        assertEquals("state,E1", byState.get(0));
        assertEquals(n + 1, byState.size());
        assertEquals(1.0, Double.parseDouble(byState.get(n).split(",")[1]), 1e-9);
        assertTrue(Files.readString(folder.resolve("summary.txt"))
                .contains("(1500 states; every coordinate in equilibria-states.csv)"));
    }

    @Test
    void smallModelsKeepEveryColumn() {
        CompiledModel model = ModelCompiler.compile(ring(40));
        SimulationResult s = StudyRunner.runAll(model, RunSettings.DEFAULT).get(0).simulations().get(0);
        assertNull(s.trajectory().kept());
        assertEquals(40, s.trajectory().stateNames().size());
        assertTrue(s.trajectory().size() >= RunSettings.MIN_OUTPUT_SAMPLES);
    }
}
