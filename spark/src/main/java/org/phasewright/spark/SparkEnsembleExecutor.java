package org.phasewright.spark;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.stream.IntStream;

import org.apache.spark.api.java.JavaFutureAction;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.util.LongAccumulator;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.ensemble.EnsembleControl;
import org.phasewright.runtime.ensemble.EnsembleExecutor;
import org.phasewright.runtime.ensemble.EnsembleFailure;
import org.phasewright.runtime.ensemble.EnsembleRun;
import org.phasewright.runtime.ensemble.ModelRecipe;
import org.phasewright.runtime.ensemble.PointTask;

/**
 * Runs the points of an ensemble as one Spark job: the driver ships the model recipe and the task (both small), each
 * Spark task computes its points with the runtime's point function and returns the rows; {@code collect} keeps the
 * grid order. The compiled model passed in is not shipped: executors rebuild it from the recipe.
 */
public final class SparkEnsembleExecutor implements EnsembleExecutor {
    /** Partitions per core: enough for load balance (Lyapunov points differ in cost) and regular progress. */
    private static final int SLICES_PER_CORE = 4;
    private static final long POLL_MILLIS = 200;
    /** A cluster that gives no executor within this time is reported instead of waited for. */
    static final long REGISTRATION_MILLIS = 60_000;

    private final JavaSparkContext context;
    private final ModelRecipe recipe;
    private final String recipeKey;

    public SparkEnsembleExecutor(JavaSparkContext context, ModelRecipe recipe) {
        this.context = context;
        this.recipe = recipe;
        this.recipeKey = recipe.key();
    }

    @Override
    public <R extends Serializable> EnsembleRun<R> run(PointTask<R> task, CompiledModel model,
            EnsembleControl control) {
        int points = task.points();
        int cores = Math.max(1, context.defaultParallelism());
        String where = "Spark " + context.master() + " (" + cores + (cores == 1 ? " core)" : " cores)");
        if (control.cancelled().getAsBoolean() || control.expired()) {
            return new EnsembleRun<>(nulls(points), where, cores, control.cancelled().getAsBoolean());
        }
        long left = control.remainingMillis();
        long deadline = left == Long.MAX_VALUE ? Long.MAX_VALUE : System.currentTimeMillis() + left;
        List<Integer> indices = IntStream.range(0, points).boxed().toList();
        int slices = Math.max(1, Math.min(points, cores * SLICES_PER_CORE));
        String group = "phasewright-" + System.nanoTime();
        LongAccumulator done;
        JavaFutureAction<List<R>> future;
        try {
            done = context.sc().longAccumulator("points done");
            context.setJobGroup(group, "ensemble of " + points + " points", true); // interrupt tasks on cancel
            future = context.parallelize(indices, slices)
                    .map(new PointFunction<>(recipe, recipeKey, task, deadline, done)).collectAsync();
        } catch (RuntimeException e) { // Spark says "stopped SparkContext" with both stack traces in the message
            String why = stuck(System.currentTimeMillis());
            throw new EnsembleFailure(why != null ? why : "the Spark job could not start: " + firstLine(e), e);
        }
        long started = System.currentTimeMillis();
        try {
            while (true) {
                try {
                    List<R> rows = future.get(POLL_MILLIS, TimeUnit.MILLISECONDS);
                    progress(control, points, points);
                    return new EnsembleRun<>(rows, where, cores, control.cancelled().getAsBoolean());
                } catch (TimeoutException e) {
                    progress(control, done.value(), points);
                    if (control.cancelled().getAsBoolean()) {
                        context.cancelJobGroup(group);
                        future.cancel(true);
                        return new EnsembleRun<>(nulls(points), where, cores, true);
                    }
                    String stuck = stuck(started);
                    if (stuck != null) {
                        if (!context.sc().isStopped()) {
                            context.cancelJobGroup(group);
                        }
                        future.cancel(true);
                        throw new EnsembleFailure(stuck, null);
                    }
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            context.cancelJobGroup(group);
            return new EnsembleRun<>(nulls(points), where, cores, true);
        } catch (ExecutionException e) {
            throw new EnsembleFailure("the Spark job failed: " + rootMessage(e), e);
        } finally {
            if (!context.sc().isStopped()) {
                context.clearJobGroup();
            }
        }
    }

    /**
     * Why waiting longer is pointless, or null: Spark gave up on the cluster (its context stopped), or no executor
     * registered in time. Local masters run in this JVM and always have their executor.
     */
    private String stuck(long started) {
        if (context.sc().isStopped()) {
            return "Spark stopped before the job finished; for a cluster: is the master at " + context.master()
                    + " reachable?";
        }
        boolean local = context.master().startsWith("local");
        // the driver counts as one entry; executors add theirs when they register
        if (!local && context.sc().getExecutorMemoryStatus().size() <= 1
                && System.currentTimeMillis() - started > REGISTRATION_MILLIS) {
            return "no Spark executor registered within " + REGISTRATION_MILLIS / 1000 + " s at " + context.master()
                    + "; is the master reachable, and does it have free cores and memory?";
        }
        return null;
    }

    private static void progress(EnsembleControl control, long done, int points) {
        if (control.progress() != null) {
            control.progress().accept(Math.min(1.0, done / (double) points));
        }
    }

    private static <R> List<R> nulls(int n) {
        List<R> rows = new ArrayList<>(n);
        for (int k = 0; k < n; k++) {
            rows.add(null);
        }
        return rows;
    }

    private static String rootMessage(Throwable e) {
        Throwable t = e;
        while (t.getCause() != null && t.getCause() != t) {
            t = t.getCause();
        }
        return t.getClass().getSimpleName() + (t.getMessage() == null ? "" : ": " + firstLine(t));
    }

    private static String firstLine(Throwable t) {
        String m = String.valueOf(t.getMessage()).strip();
        int end = m.indexOf('\n');
        return end < 0 ? m : m.substring(0, end).strip();
    }
}
