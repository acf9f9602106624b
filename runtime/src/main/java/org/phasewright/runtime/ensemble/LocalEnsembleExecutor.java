package org.phasewright.runtime.ensemble;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.Future;

import org.phasewright.runtime.compile.CompiledModel;

/**
 * Runs the points on a thread pool of its own in this JVM. Generated vector fields are stateless and shared by all
 * threads; the interpreter is not thread-safe, so a model that fell back to it runs on one thread.
 */
public final class LocalEnsembleExecutor implements EnsembleExecutor {
    /** All cores. */
    public static final LocalEnsembleExecutor DEFAULT = new LocalEnsembleExecutor(0);

    private final int threads;

    /** @param threads pool size, or 0 for one per core */
    public LocalEnsembleExecutor(int threads) {
        if (threads < 0) {
            throw new IllegalArgumentException("threads must be 0 (all cores) or positive");
        }
        this.threads = threads;
    }

    @Override
    public <R extends Serializable> EnsembleRun<R> run(PointTask<R> task, CompiledModel model,
            EnsembleControl control) {
        int points = task.points();
        int wanted = threads == 0 ? Runtime.getRuntime().availableProcessors() : threads;
        int size = model.backend() == CompiledModel.Backend.GENERATED_CODE ? Math.max(1, Math.min(points, wanted))
                : 1;
        ForkJoinPool pool = new ForkJoinPool(size);
        List<Future<R>> futures = new ArrayList<>(points);
        List<R> rows = new ArrayList<>(points);
        String where = size + (size == 1 ? " thread" : " threads");
        try {
            for (int k = 0; k < points; k++) {
                int point = k;
                futures.add(pool.submit(() -> control.cancelled().getAsBoolean() || control.expired() ? null
                        : task.compute(model, point, control.deadlineNanos(), control.cancelled())));
            }
            int done = 0;
            for (Future<R> f : futures) {
                rows.add(f.get());
                if (control.progress() != null) {
                    control.progress().accept(++done / (double) points);
                }
            }
            return new EnsembleRun<>(rows, where, size, control.cancelled().getAsBoolean());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            while (rows.size() < points) {
                rows.add(null);
            }
            return new EnsembleRun<>(rows, where, size, true);
        } catch (ExecutionException e) {
            throw new IllegalStateException("ensemble point: " + e.getCause(), e.getCause());
        } finally {
            pool.shutdownNow();
        }
    }
}
