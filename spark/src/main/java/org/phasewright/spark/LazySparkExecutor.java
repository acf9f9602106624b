package org.phasewright.spark;

import java.io.Serializable;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.apache.spark.SparkConf;
import org.apache.spark.api.java.JavaSparkContext;
import org.phasewright.runtime.compile.CompiledModel;
import org.phasewright.runtime.ensemble.EnsembleControl;
import org.phasewright.runtime.ensemble.EnsembleExecutor;
import org.phasewright.runtime.ensemble.EnsembleFailure;
import org.phasewright.runtime.ensemble.EnsembleRun;
import org.phasewright.runtime.ensemble.ModelRecipe;
import org.phasewright.runtime.ensemble.PointTask;

/**
 * An ensemble executor that starts its Spark context on first use (a run without ensembles pays nothing) and stops
 * it on {@link #close()}. Local masters ({@code local[*]}) run embedded in this JVM; any other master gets this
 * program's own jar shipped to the executors, which must run the same Spark version.
 */
public final class LazySparkExecutor implements EnsembleExecutor, AutoCloseable {
    public static final String DEFAULT_MASTER = "local[*]";

    private final String master;
    private final ModelRecipe recipe;
    private JavaSparkContext context;
    private SparkEnsembleExecutor executor;

    public LazySparkExecutor(String master, ModelRecipe recipe) {
        this.master = master == null ? DEFAULT_MASTER : master;
        this.recipe = recipe;
    }

    /** The configuration used: no web UI, and on a cluster the jar that holds this class. */
    static SparkConf configuration(String master) {
        SparkConf conf = new SparkConf().setMaster(master).setAppName("phasewright")
                .set("spark.ui.enabled", "false")
                .set("spark.ui.showConsoleProgress", "false");
        if (master.startsWith("local")) {
            conf.set("spark.driver.host", "127.0.0.1").set("spark.driver.bindAddress", "127.0.0.1");
        } else {
            ownJar().ifPresent(jar -> conf.setJars(new String[] {jar}));
        }
        return conf;
    }

    private static Optional<String> ownJar() {
        try {
            Path p = Path.of(LazySparkExecutor.class.getProtectionDomain().getCodeSource().getLocation().toURI());
            return Files.isRegularFile(p) ? Optional.of(p.toString()) : Optional.empty();
        } catch (URISyntaxException | RuntimeException e) {
            return Optional.empty();
        }
    }

    @Override
    public synchronized <R extends Serializable> EnsembleRun<R> run(PointTask<R> task, CompiledModel model,
            EnsembleControl control) {
        if (executor == null) {
            try {
                context = new JavaSparkContext(configuration(master));
            } catch (RuntimeException e) {
                throw new EnsembleFailure("Spark could not start with master " + master + ": " + e.getMessage(), e);
            }
            executor = new SparkEnsembleExecutor(context, recipe);
        }
        if (context.sc().isStopped()) {
            throw new EnsembleFailure("Spark stopped earlier in this run (master " + master + ")", null);
        }
        return executor.run(task, model, control);
    }

    @Override
    public synchronized void close() {
        if (context != null) {
            context.close();
            context = null;
            executor = null;
        }
    }
}
