package org.phasewright.runtime.study;

import java.time.Duration;
import java.util.function.BooleanSupplier;

import org.phasewright.runtime.ensemble.EnsembleExecutor;
import org.phasewright.runtime.ensemble.LocalEnsembleExecutor;
import org.phasewright.runtime.equilibria.EquilibriumSettings;

/**
 * Budgets for running a study. The wall-time limit covers the whole study; the cancellation flag is polled in every
 * integration step and before every Newton start, so a UI or a signal handler can stop a run promptly.
 *
 * @param maxSteps      integration steps (accepted plus rejected) allowed per simulation
 * @param wallTimeLimit for the whole study, or null for none
 * @param outputSamples minimum number of evenly spaced output times per simulation (at least 1000 are used)
 * @param blowUpBound   |u|_inf beyond which a simulation is reported as blowing up
 * @param progress      hears the fraction of simulated time done by integrations ({@link ProgressListener#NONE})
 * @param ensembles     runs the points of orbit diagrams, Lyapunov maps and basins (default: all local cores)
 */
public record RunSettings(long maxSteps, Duration wallTimeLimit, BooleanSupplier cancelled, int outputSamples,
        double blowUpBound, EquilibriumSettings equilibria, ProgressListener progress, EnsembleExecutor ensembles) {

    public static final int MIN_OUTPUT_SAMPLES = 1000;
    /** Caps memory: a trajectory never stores more rows than this. */
    public static final int MAX_OUTPUT_SAMPLES = 2_000_000;

    public static final RunSettings DEFAULT = new RunSettings(5_000_000L, null, () -> false, MIN_OUTPUT_SAMPLES,
            1e12, EquilibriumSettings.DEFAULT);

    public RunSettings {
        if (maxSteps <= 0 || !(blowUpBound > 0)) {
            throw new IllegalArgumentException("maxSteps and blowUpBound must be positive");
        }
        if (cancelled == null) {
            cancelled = () -> false;
        }
        if (equilibria == null) {
            equilibria = EquilibriumSettings.DEFAULT;
        }
        if (progress == null) {
            progress = ProgressListener.NONE;
        }
        if (ensembles == null) {
            ensembles = LocalEnsembleExecutor.DEFAULT;
        }
    }

    /** On the local ensemble executor. */
    public RunSettings(long maxSteps, Duration wallTimeLimit, BooleanSupplier cancelled, int outputSamples,
            double blowUpBound, EquilibriumSettings equilibria, ProgressListener progress) {
        this(maxSteps, wallTimeLimit, cancelled, outputSamples, blowUpBound, equilibria, progress, null);
    }

    /** Without a progress listener. */
    public RunSettings(long maxSteps, Duration wallTimeLimit, BooleanSupplier cancelled, int outputSamples,
            double blowUpBound, EquilibriumSettings equilibria) {
        this(maxSteps, wallTimeLimit, cancelled, outputSamples, blowUpBound, equilibria, ProgressListener.NONE);
    }

    public RunSettings withProgress(ProgressListener listener) {
        return new RunSettings(maxSteps, wallTimeLimit, cancelled, outputSamples, blowUpBound, equilibria, listener,
                ensembles);
    }

    public RunSettings withMaxSteps(long steps) {
        return new RunSettings(steps, wallTimeLimit, cancelled, outputSamples, blowUpBound, equilibria, progress,
                ensembles);
    }

    public RunSettings withWallTimeLimit(Duration limit) {
        return new RunSettings(maxSteps, limit, cancelled, outputSamples, blowUpBound, equilibria, progress, ensembles);
    }

    public RunSettings withCancellation(BooleanSupplier flag) {
        return new RunSettings(maxSteps, wallTimeLimit, flag, outputSamples, blowUpBound, equilibria, progress,
                ensembles);
    }

    public RunSettings withOutputSamples(int samples) {
        return new RunSettings(maxSteps, wallTimeLimit, cancelled, samples, blowUpBound, equilibria, progress,
                ensembles);
    }

    public RunSettings withBlowUpBound(double bound) {
        return new RunSettings(maxSteps, wallTimeLimit, cancelled, outputSamples, bound, equilibria, progress,
                ensembles);
    }

    public RunSettings withEquilibria(EquilibriumSettings settings) {
        return new RunSettings(maxSteps, wallTimeLimit, cancelled, outputSamples, blowUpBound, settings, progress,
                ensembles);
    }

    public RunSettings withEnsembles(EnsembleExecutor executor) {
        return new RunSettings(maxSteps, wallTimeLimit, cancelled, outputSamples, blowUpBound, equilibria, progress,
                executor);
    }

    /** Number of output times a simulation uses. */
    int samples() {
        return Math.min(MAX_OUTPUT_SAMPLES, Math.max(MIN_OUTPUT_SAMPLES, outputSamples));
    }
}
