package org.phasewright.runtime.lyapunov;

import java.util.ArrayList;
import java.util.List;

import org.phasewright.runtime.compile.SparseJacobian;
import org.phasewright.runtime.compile.VectorField;
import org.phasewright.runtime.integrate.DormandPrince853;
import org.phasewright.runtime.integrate.IntegrationOutcome;
import org.phasewright.runtime.integrate.IntegratorSettings;

/**
 * The Lyapunov spectrum, or its k largest exponents, by the method of Benettin, Galgani, Giorgilli &amp; Strelcyn
 * (Meccanica 15, 1980): integrate the orbit with the variational equations of k tangent vectors (exact Jacobian),
 * re-orthonormalise them by a QR factorisation (modified Gram–Schmidt) at intervals, and average the logarithms of
 * the diagonal of R. The first k columns of R are those of the full QR, so k vectors give the k largest exponents.
 * Models above {@link SparseJacobian#DENSE_LIMIT} states take J·V from the sparse Jacobian: memory O(n·k).
 * <p>
 * The interval between QR steps adapts so that the tangent vectors grow or shrink by about e^2 between them: short
 * enough to keep them well separated in floating point, long enough not to waste restarts.
 */
public final class LyapunovSpectrum {
    /** Growth exponent targeted between two QR steps. */
    private static final double TARGET_LOG_GROWTH = 2.0;
    private static final int HISTORY_ROWS = 1000;
    /** n·k beyond which the tangent vectors (and the integrator's stages over them) would not fit in memory. */
    public static final long MAX_TANGENT_ENTRIES = 20_000_000L;

    private final VectorField field;
    private final double[] p;
    private final int n;
    /** Number of tangent vectors, hence of exponents. */
    private final int k;
    private final boolean sparse;

    /** The whole spectrum. */
    public LyapunovSpectrum(VectorField field, double[] parameters) {
        this(field, parameters, 0);
    }

    /** The {@code leading} largest exponents (0 or at least n: all of them). */
    public LyapunovSpectrum(VectorField field, double[] parameters, int leading) {
        this(field, parameters, leading, field.large());
    }

    /** @param sparse use the sparse Jacobian even for a small model (tests compare both paths) */
    LyapunovSpectrum(VectorField field, double[] parameters, int leading, boolean sparse) {
        if (leading < 0) {
            throw new IllegalArgumentException("leading must be 0 (all) or positive, got " + leading);
        }
        this.field = field;
        this.p = parameters.clone();
        this.n = field.dimension();
        this.k = leading == 0 ? n : Math.min(leading, n);
        this.sparse = sparse;
        if (field.large() && !sparse) {
            throw new IllegalArgumentException("a model of " + n + " states needs the sparse Jacobian");
        }
        if ((long) n * k > MAX_TANGENT_ENTRIES) {
            throw new IllegalArgumentException(k + " tangent vectors of " + n + " states are too many; ask for "
                    + "fewer leading exponents");
        }
    }

    /** Number of exponents computed. */
    public int count() {
        return k;
    }

    public LyapunovOutcome compute(double[] u0, double endTime, IntegratorSettings settings) {
        return compute(u0, endTime, settings, null);
    }

    /** @param timeReached hears the time reached after each re-orthonormalisation (for progress), or null */
    public LyapunovOutcome compute(double[] u0, double endTime, IntegratorSettings settings,
            java.util.function.DoubleConsumer timeReached) {
        if (!(endTime > 0)) {
            throw new IllegalArgumentException("end time must be positive, got " + endTime);
        }
        VariationalField augmented = new VariationalField(field, k, sparse);
        int m = augmented.dimension();
        DormandPrince853 integrator = new DormandPrince853(augmented, p);
        double[] y = new double[m];
        System.arraycopy(u0, 0, y, 0, n);
        for (int i = 0; i < k; i++) {
            y[n + i * k + i] = 1; // V(0) = the first k columns of I
        }
        double[] logSum = new double[k];
        double[] halfway = new double[k];
        boolean halfwayTaken = false;
        double[] norms = new double[k];
        List<Double> historyTimes = new ArrayList<>();
        List<double[]> history = new ArrayList<>();
        double nextHistory = endTime / HISTORY_ROWS;

        double t = 0, interval = firstInterval(augmented, u0, endTime);
        double divergenceIntegral = 0;
        long qrSteps = 0, evaluations = 0, accepted = 0, rejected = 0;
        IntegrationOutcome last = null;
        double stepHint = 0; // the last step size carries over, so restarts cost no step-size search
        while (t < endTime) {
            double tNext = Math.min(endTime, t + interval);
            if (endTime - tNext < 1e-9 * interval) {
                tNext = endTime;
            }
            IntegratorSettings chunk = settings.withSteps(stepHint, settings.maxStep())
                    .withMaxSteps(Math.max(1, settings.maxSteps() - accepted - rejected));
            last = integrator.integrate(t, y, tNext, chunk, null);
            evaluations += last.rhsEvaluations();
            accepted += last.acceptedSteps();
            rejected += last.rejectedSteps();
            if (!last.completed()) {
                break;
            }
            y = last.state();
            stepHint = Math.min(Math.abs(last.lastStepSize()), tNext - t);
            divergenceIntegral += y[m - 1];
            y[m - 1] = 0; // restart the divergence integral each chunk to keep its rounding small
            double maxLog = orthonormalise(y, norms);
            qrSteps++;
            for (int i = 0; i < k; i++) {
                logSum[i] += Math.log(norms[i]);
            }
            double done = tNext;
            if (!halfwayTaken && done >= endTime / 2) {
                for (int i = 0; i < k; i++) {
                    halfway[i] = logSum[i] / done;
                }
                halfwayTaken = true;
            }
            if (done >= nextHistory || done == endTime) {
                double[] row = new double[k];
                for (int i = 0; i < k; i++) {
                    row[i] = logSum[i] / done;
                }
                historyTimes.add(done);
                history.add(row);
                nextHistory = done + endTime / HISTORY_ROWS;
            }
            double factor = maxLog > 0 ? TARGET_LOG_GROWTH / maxLog : 2;
            interval = Math.min(endTime / 10, interval * Math.max(0.5, Math.min(2, factor)));
            t = tNext;
            if (timeReached != null) {
                timeReached.accept(t);
            }
        }
        double reached = last != null && !last.completed() ? last.time() : t;
        double[] exponents = new double[k];
        for (int i = 0; i < k; i++) {
            exponents[i] = t > 0 ? logSum[i] / t : Double.NaN;
        }
        if (!halfwayTaken) {
            halfway = exponents.clone();
        }
        IntegrationOutcome summary = new IntegrationOutcome(last == null ? IntegrationOutcome.Ending.COMPLETED
                : last.ending(), reached, java.util.Arrays.copyOf(last == null ? y : last.state(), n), evaluations,
                accepted, rejected, last == null ? 0 : last.lastStepSize(), settings.blowUpBound());
        double[] times = new double[historyTimes.size()];
        for (int k = 0; k < times.length; k++) {
            times[k] = historyTimes.get(k);
        }
        return new LyapunovOutcome(exponents, halfway, t > 0 ? divergenceIntegral / t : Double.NaN, t, times,
                history.toArray(new double[0][]), qrSteps, summary);
    }

    /** A first interval short against the fastest rate at the start: 1/‖J(u0)‖∞, at most a tenth of the run. */
    private double firstInterval(VariationalField augmented, double[] u0, double endTime) {
        double norm = augmented.jacobianNorm(u0, p);
        double interval = norm > 0 && Double.isFinite(norm) ? 1 / norm : endTime / 100;
        return Math.min(interval, endTime / 10);
    }

    /**
     * Modified Gram–Schmidt on the k columns of V (n×k, stored row-major after the states): V becomes Q and the
     * column norms (the diagonal of R) go to {@code norms}. Returns the largest |log R_ii|.
     */
    private double orthonormalise(double[] y, double[] norms) {
        double maxLog = 0;
        for (int c = 0; c < k; c++) {
            for (int j = 0; j < c; j++) {
                double dot = 0;
                for (int i = 0; i < n; i++) {
                    dot += y[n + i * k + j] * y[n + i * k + c];
                }
                for (int i = 0; i < n; i++) {
                    y[n + i * k + c] -= dot * y[n + i * k + j];
                }
            }
            double norm = 0;
            for (int i = 0; i < n; i++) {
                norm += y[n + i * k + c] * y[n + i * k + c];
            }
            norm = Math.sqrt(norm);
            norms[c] = norm;
            for (int i = 0; i < n; i++) {
                y[n + i * k + c] /= norm;
            }
            maxLog = Math.max(maxLog, Math.abs(Math.log(norm)));
        }
        return maxLog;
    }
}
