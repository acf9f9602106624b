package org.phasewright.cli;

import java.io.PrintStream;
import java.io.Serializable;
import java.util.regex.Pattern;

import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.ensemble.EnsembleControl;
import org.phasewright.runtime.ensemble.EnsembleExecutor;
import org.phasewright.runtime.ensemble.EnsembleRun;
import org.phasewright.runtime.ensemble.LocalEnsembleExecutor;
import org.phasewright.runtime.ensemble.PointTask;
import org.phasewright.spark.LazySparkExecutor;

/**
 * Where `run` sends the points of orbit diagrams, Lyapunov maps and basins: Spark (embedded {@code local[*]} by
 * default, or the cluster of {@code --master}), or with {@code --no-spark} this JVM's threads. Spark starts only when
 * a study has an ensemble, and is stopped by {@link #close()}.
 */
final class EnsembleChoice implements AutoCloseable {
    /** local, local[N], local[*], local[N,F], or a cluster URL scheme://... */
    private static final Pattern MASTER = Pattern.compile(
            "local(\\[(\\*|\\d+)(,\\d+)?\\])?|yarn|[a-z][a-z0-9+.-]*://\\S+");

    private final EnsembleExecutor executor;
    private final AutoCloseable closer;

    private EnsembleChoice(EnsembleExecutor executor, AutoCloseable closer) {
        this.executor = executor;
        this.closer = closer;
    }

    /**
     * @param err hears a one-line note when an ensemble runs on local threads because Spark was wanted but is
     *            missing
     */
    static EnsembleChoice of(String master, boolean noSpark, PhaseSourceRecipe recipe, PrintStream err)
            throws UsageException {
        return of(master, noSpark, recipe, err, sparkPresent());
    }

    /** As {@link #of(String, boolean, PhaseSourceRecipe, PrintStream)} with Spark's presence given. */
    static EnsembleChoice of(String master, boolean noSpark, PhaseSourceRecipe recipe, PrintStream err,
            boolean sparkPresent) throws UsageException {
        if (noSpark) {
            if (master != null) {
                throw new UsageException("--master and --no-spark exclude each other");
            }
            return new EnsembleChoice(LocalEnsembleExecutor.DEFAULT, null);
        }
        if (master != null && !MASTER.matcher(master).matches()) {
            throw new UsageException("--master wants local, local[N], local[*] or a cluster URL such as "
                    + "spark://host:7077; got '" + master + "'");
        }
        if (!sparkPresent || recipe.text() == null) {
            if (master != null) {
                throw new UsageException("--master needs Spark, which is not next to phasewright.jar (spark-lib/); "
                        + "rebuild the command line, or use --no-spark");
            }
            // a bare jar still runs everything, on this JVM's threads; say so when an ensemble actually runs
            return new EnsembleChoice(recipe.text() == null ? LocalEnsembleExecutor.DEFAULT
                    : new NotedLocalExecutor(err), null);
        }
        LazySparkExecutor spark = new LazySparkExecutor(master, recipe);
        return new EnsembleChoice(spark, spark);
    }

    /** Local threads, with a note on the first ensemble that Spark would have run it. */
    private static final class NotedLocalExecutor implements EnsembleExecutor {
        private final PrintStream err;
        private boolean noted;

        NotedLocalExecutor(PrintStream err) {
            this.err = err;
        }

        @Override
        public <R extends Serializable> EnsembleRun<R> run(PointTask<R> task, CompiledModel model,
                EnsembleControl control) {
            if (!noted) {
                noted = true;
                err.println("phasewright: note: Spark is not next to phasewright.jar (spark-lib/); orbit diagrams, "
                        + "Lyapunov maps and basins run on local threads");
            }
            return LocalEnsembleExecutor.DEFAULT.run(task, model, control);
        }
    }

    private static boolean sparkPresent() {
        try {
            Class.forName("org.apache.spark.api.java.JavaSparkContext", false, EnsembleChoice.class.getClassLoader());
            return true;
        } catch (ClassNotFoundException | LinkageError e) {
            return false;
        }
    }

    EnsembleExecutor executor() {
        return executor;
    }

    @Override
    public void close() {
        if (closer != null) {
            try {
                closer.close();
            } catch (Exception e) {
                // stopping Spark after the results are written must not change the exit code
            }
        }
    }
}
