package org.phasewright.runtime.study;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.phasewright.runtime.TestModels.c;
import static org.phasewright.runtime.TestModels.equilibria;
import static org.phasewright.runtime.TestModels.param;
import static org.phasewright.runtime.TestModels.state;
import static org.phasewright.runtime.TestModels.study;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.phasewright.runtime.TestModels;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.compile.ModelCompiler;
import org.phasewright.runtime.ensemble.BasinPoints;
import org.phasewright.runtime.model.Basins;
import org.phasewright.runtime.model.GridAxis;
import org.phasewright.runtime.model.LyapunovMap;
import org.phasewright.runtime.model.Study;
import org.phasewright.runtime.report.ReportWriter;

class EnsembleStudyTest {

    @Test
    void lyapunovMapRunsAsAStudyAndIsWritten(@TempDir Path dir) throws Exception {
        Study s = study("map", new LyapunovMap(new GridAxis(param(1, "r"), c(10), c(28), 2),
                new GridAxis(param(0, "sigma"), c(10), c(10), 1), c(1000), null));
        CompiledModel m = ModelCompiler.compile(TestModels.lorenz(s));
        StudyResult result = StudyRunner.run(m, s, RunSettings.DEFAULT);
        LyapunovMapResult map = (LyapunovMapResult) result.results().get(0);
        assertEquals(Status.COMPLETED, map.status(), map.message());
        // Sprott (2003): 0.9056 at r = 28; negative at r = 10 where C± are stable (Lorenz 1963)
        assertEquals(0.9056, map.exponent(1, 0), 0.03);
        assertTrue(map.exponent(0, 0) < -0.1);
        ReportWriter.writeAll(result, dir);
        List<String> csv = Files.readAllLines(dir.resolve("lyapunov-map.csv"));
        assertEquals("r,sigma,largest_exponent,converged,ending", csv.get(0));
        assertEquals(3, csv.size());
        assertTrue(Files.readString(dir.resolve("summary.txt")).contains("Lyapunov map over r and sigma"));
    }

    @Test
    void basinsFindTheEquilibriaFirstAndLabelByThem(@TempDir Path dir) throws Exception {
        Study s = study("wells", new Basins(new GridAxis(state(0, "x"), c(-1.5), c(1.5), 3),
                new GridAxis(state(1, "v"), c(0), c(0), 1), c(60), null));
        CompiledModel m = ModelCompiler.compile(org.phasewright.runtime.ensemble.EnsembleModels.duffing(0.5,
                s));
        BasinsResult basins = (BasinsResult) StudyRunner.run(m, s, RunSettings.DEFAULT).results().get(0);
        assertEquals(Status.COMPLETED, basins.status(), basins.message());
        assertEquals(3, basins.equilibria().size()); // (−1, 0), (0, 0), (1, 0): closed form
        // each start on the x axis settles where x' = v, v' = x − x³ − δv says (closed form equilibria)
        for (int i = 0; i < 3; i++) {
            int label = basins.label(i, 0);
            assertTrue(label != BasinPoints.NONE);
            double x = basins.equilibria().get(label).coordinates()[0];
            assertEquals(new double[] {-1, 0, 1}[i], x, 1e-6);
        }
        ReportWriter.writeAll(StudyRunner.run(m, s, RunSettings.DEFAULT), dir);
        assertEquals(4, Files.readAllLines(dir.resolve("basins.csv")).size());
    }

    @Test
    void basinsAfterAnEquilibriumSearchLabelByItsEquilibria() {
        // the study's own search names the equilibria in its report; basins after it use that set, not a new search
        Study s = study("wells", equilibria(), new Basins(new GridAxis(state(0, "x"), c(-1.5), c(1.5), 3),
                new GridAxis(state(1, "v"), c(0), c(0), 1), c(60), null));
        CompiledModel m = ModelCompiler.compile(org.phasewright.runtime.ensemble.EnsembleModels.duffing(0.5,
                s));
        List<AnalysisResult> results = StudyRunner.run(m, s, RunSettings.DEFAULT).results();
        EquilibriumResult search = (EquilibriumResult) results.get(0);
        BasinsResult basins = (BasinsResult) results.get(1);
        assertEquals(Status.COMPLETED, basins.status(), basins.message());
        assertSame(search.equilibria(), basins.equilibria());
        assertEquals(3, basins.equilibria().size()); // (−1, 0), (0, 0), (1, 0): closed form
    }

    @Test
    void aGridOverOneVariableTwiceIsInvalidInput() {
        Study s = study("bad", new LyapunovMap(new GridAxis(param(1, "r"), c(10), c(28), 2),
                new GridAxis(param(1, "r"), c(10), c(28), 2), c(10), null));
        CompiledModel m = ModelCompiler.compile(TestModels.lorenz(s));
        LyapunovMapResult map = (LyapunovMapResult) StudyRunner.run(m, s, RunSettings.DEFAULT).results().get(0);
        assertEquals(Status.FAILED, map.status());
        assertEquals("INVALID_INPUT", map.outcome()); // common practice: a named outcome, not an exception
    }
}
