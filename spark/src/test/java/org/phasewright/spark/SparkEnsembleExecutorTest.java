package org.phasewright.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;

import org.apache.spark.api.java.JavaSparkContext;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.ensemble.Axis;
import org.phasewright.runtime.ensemble.BasinPoint;
import org.phasewright.runtime.ensemble.BasinPoints;
import org.phasewright.runtime.ensemble.EnsembleControl;
import org.phasewright.runtime.ensemble.EnsembleRun;
import org.phasewright.runtime.ensemble.IntegrationRecipe;
import org.phasewright.runtime.ensemble.LocalEnsembleExecutor;
import org.phasewright.runtime.ensemble.LyapunovPoint;
import org.phasewright.runtime.ensemble.LyapunovPoints;
import org.phasewright.runtime.ensemble.OrbitColumn;
import org.phasewright.runtime.ensemble.OrbitPoints;
import org.phasewright.runtime.ensemble.PointTask;

/** The same ensembles on the local thread pool and on Spark in local[2] mode must agree bit for bit. */
class SparkEnsembleExecutorTest {
    private static final IntegrationRecipe ACCURATE = new IntegrationRecipe(1e-9, 1e-12, 10_000_000L, 1e12);
    private static JavaSparkContext context;

    @BeforeAll
    static void start() {
        context = new JavaSparkContext(LazySparkExecutor.configuration("local[2]"));
    }

    @AfterAll
    static void stop() {
        context.close();
    }

    private static <R extends java.io.Serializable> List<List<R>> both(JavaModels recipe, PointTask<R> task,
            CompiledModel model) {
        EnsembleRun<R> local = new LocalEnsembleExecutor(2).run(task, model, EnsembleControl.NONE);
        EnsembleRun<R> spark = new SparkEnsembleExecutor(context, recipe).run(task, model, EnsembleControl.NONE);
        assertEquals(task.points(), spark.completed());
        assertTrue(spark.executor().startsWith("Spark local[2]"), spark.executor());
        return List.of(local.rows(), spark.rows());
    }

    @Test
    void lyapunovMapAgreesAndMatchesPublishedValues() {
        CompiledModel model = RecipeCache.model(JavaModels.LORENZ);
        LyapunovPoints task = LyapunovPoints.of(model, new Axis("r", 1, 10, 28, 2), new Axis("sigma", 0, 9, 10, 2),
                600, ACCURATE);
        List<List<LyapunovPoint>> rows = both(JavaModels.LORENZ, task, model);
        // records compare doubles with Double.compare: equal means the same bits (common practice)
        assertEquals(rows.get(0), rows.get(1));
        // Sprott, Chaos and Time-Series Analysis (2003): 0.9056 at σ = 10, r = 28, b = 8/3 (finite-time estimate)
        assertEquals(0.9056, rows.get(1).get(3).exponent(), 0.04);
        // r = 10: C± are stable foci (Lorenz 1963), so the largest exponent is negative
        assertTrue(rows.get(1).get(0).exponent() < 0 && rows.get(1).get(1).exponent() < 0);
    }

    @Test
    void basinsAgreeAndLabelTheWells() {
        CompiledModel model = RecipeCache.model(JavaModels.DUFFING);
        int n = 7;
        // equilibria of x' = v, v' = x − x³ − δv: (−1, 0), (0, 0), (1, 0) (closed form)
        BasinPoints task = BasinPoints.of(model, new Axis("x", 0, -1.5, 1.5, n), new Axis("v", 1, -1.5, 1.5, n), 60,
                ACCURATE, new double[][] {{-1, 0}, {0, 0}, {1, 0}});
        List<List<BasinPoint>> rows = both(JavaModels.DUFFING, task, model);
        assertEquals(rows.get(0), rows.get(1));
        List<BasinPoint> spark = rows.get(1);
        assertEquals(2, spark.get(5 * n + 3).label()); // (1, 0) is a stable well: it stays (closed form)
        for (int k = 0; k < n * n; k++) {
            int mirror = spark.get(n * n - 1 - k).label(); // (x, v) ↦ (−x, −v): the model's odd symmetry
            int label = spark.get(k).label();
            assertEquals(label < 0 ? label : 2 - label, mirror);
        }
    }

    @Test
    void orbitDiagramAgreesAndMatchesTheHopfCycle() {
        CompiledModel model = RecipeCache.model(JavaModels.HOPF);
        OrbitPoints task = OrbitPoints.of(model, new Axis("mu", 0, 0.25, 1, 5), 120, ACCURATE);
        List<List<OrbitColumn>> rows = both(JavaModels.HOPF, task, model);
        for (int k = 0; k < 5; k++) {
            OrbitColumn local = rows.get(0).get(k), spark = rows.get(1).get(k);
            assertEquals(local.parameter(), spark.parameter(), 0.0);
            assertTrue(Arrays.deepEquals(local.maxima(), spark.maxima()), "column " + k);
            for (double v : spark.maxima()[0]) {
                // Strogatz, Nonlinear Dynamics and Chaos, §8.2: the stable cycle has radius √μ
                assertEquals(Math.sqrt(spark.parameter()), v, 1e-6);
            }
        }
    }

    @Test
    void aCancelledRunReturnsNoRows() {
        CompiledModel model = RecipeCache.model(JavaModels.DUFFING);
        BasinPoints task = BasinPoints.of(model, new Axis("x", 0, -1, 1, 3), new Axis("v", 1, -1, 1, 3), 30,
                ACCURATE, new double[][] {{1, 0}});
        EnsembleRun<BasinPoint> run = new SparkEnsembleExecutor(context, JavaModels.DUFFING).run(task, model,
                new EnsembleControl(Long.MAX_VALUE, () -> true, null));
        assertTrue(run.cancelled());
        assertEquals(0, run.completed()); // common practice: nothing starts once cancelled
    }
}
