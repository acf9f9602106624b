package org.phasewright.spark;

import java.io.Serializable;
import java.util.function.BooleanSupplier;

import org.apache.spark.TaskContext;
import org.apache.spark.api.java.function.Function;
import org.apache.spark.util.LongAccumulator;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.ensemble.ModelRecipe;
import org.phasewright.runtime.ensemble.PointTask;

/**
 * What a Spark task runs for one point: the model from the recipe (compiled once per executor JVM), then the
 * runtime's own point function, so a row computed here equals the row computed by the local executor.
 *
 * @param modelKey            the recipe's key, computed once on the driver (hashing the source per point would
 *                            repeat the same work millions of times)
 * @param deadlineEpochMillis wall-clock deadline shared by every JVM, or Long.MAX_VALUE
 * @param done                counts finished points for the driver's progress
 */
record PointFunction<R extends Serializable>(ModelRecipe recipe, String modelKey, PointTask<R> task,
        long deadlineEpochMillis,
        LongAccumulator done) implements Function<Integer, R> {

    @Override
    public R call(Integer point) {
        CompiledModel model = RecipeCache.model(modelKey, recipe);
        task.checkModel(model);
        long deadlineNanos = Long.MAX_VALUE;
        if (deadlineEpochMillis != Long.MAX_VALUE) {
            long left = deadlineEpochMillis - System.currentTimeMillis();
            if (left <= 0) {
                return null; // like the local executor: no point starts after the deadline
            }
            deadlineNanos = System.nanoTime() + left * 1_000_000L;
        }
        TaskContext context = TaskContext.get();
        BooleanSupplier cancelled = () -> context != null && context.isInterrupted();
        R row;
        if (model.backend() == CompiledModel.Backend.GENERATED_CODE) {
            row = task.compute(model, point, deadlineNanos, cancelled);
        } else {
            synchronized (model) { // the interpreter is not thread-safe; tasks of one executor share the model
                row = task.compute(model, point, deadlineNanos, cancelled);
            }
        }
        done.add(1);
        return row;
    }
}
